import { extent, line, scaleLinear } from 'd3';
import { useId, useMemo, type Ref } from 'react';
import type { Facies } from '@/gql/graphql';
import { FaciesPatterns } from '@/modules/column/components/FaciesPatterns';
import { spreadLabels, truncateLabel } from '@/modules/column/utils/columnLayout';
import { FACIES_ORDER, FACIES_STYLES, faciesGroundFill, faciesPatternId } from '@/modules/column/utils/facies';
import type { DepthAxis } from '@/modules/core-drawing/utils/ageDepth';
import { coreScale, depthLinks, erosionMarks, thicknessLabel, traceOnAxis, type CoreUnit } from '@/modules/core-drawing/utils/coreDepth';
import { flowLegend, LEGEND_SWATCH } from '@/modules/core-drawing/utils/legendLayout';
import { CHART_COLOURS } from '@/modules/correlation/utils/chartPalette';

export type CoreDrawingUnit = CoreUnit & { facies: Facies };
export type CoreDrawingHorizon = { id: string; name: string; unitAboveId: string };
export type CoreDrawingLevel = { id: string; label: string; depthM: number; excluded: boolean };
export type CoreDrawingTrace = {
  key: string;
  /** The channel's name, and the log it belongs to. */
  channel: string;
  source: string;
  unit: string;
  depthsM: readonly number[];
  values: readonly number[];
};

export type CoreDrawingProps = {
  units: readonly CoreDrawingUnit[];
  horizons: readonly CoreDrawingHorizon[];
  levels: readonly CoreDrawingLevel[];
  traces?: readonly CoreDrawingTrace[];
  /** The depth the logs are drawn on. */
  logsOn?: DepthAxis;
  title: string;
  svgRef?: Ref<SVGSVGElement>;
};

const INK = CHART_COLOURS.text;
const MUTED = CHART_COLOURS.mutedText;
const TOP = 52;
const LEGEND_ROW = 18;
const BOTTOM = 14;
const X = {
  horizonLabel: 66,
  trueColumn: 92,
  trueWidth: 56,
  /** Link lines start right of the true depth labels. */
  linkStart: 182,
  efColumn: 246,
  efWidth: 38,
  levelLabel: 334,
  logs: 410,
};
const LOG_WIDTH = 116;
const LOG_GAP = 22;
/** A white edge behind labels drawn over other marks. */
const HALO = { stroke: '#ffffff', strokeWidth: 3, paintOrder: 'stroke' } as const;

/** The short word written inside a unit: its kind for beds and mud, else its name. */
function unitWord(unit: CoreDrawingUnit): string {
  if (unit.facies === 'TURBIDITE') return 'bed';
  if (unit.facies === 'HEMIPELAGIC_MUD') return 'mud';
  return truncateLabel(unit.name.trim().split(/\s+/)[0] ?? '', 9);
}
const FONT = 10;

/** Pixels per metre: a short core is stretched to a readable height, a long one kept on screen. */
export function coreDrawingHeight(lengthM: number): number {
  return Math.min(860, Math.max(380, lengthM * 150));
}

/** A zigzag across a column at a scoured base: erosion marked by shape, not by colour. */
function zigzag(x0: number, x1: number, y: number): string {
  const step = 5;
  let path = `M${x0},${y}`;
  for (let x = x0 + step, up = true; x <= x1 + 0.01; x += step, up = !up) path += ` L${Math.min(x, x1)},${y + (up ? -2.5 : 2.5)}`;
  return path;
}

/** The swatch of one legend entry: a facies tile, or the mark it explains. */
function LegendSwatch({ entry, idPrefix }: { entry: string; idPrefix: string }) {
  switch (entry) {
    case 'erosion':
      return <path d={zigzag(0, 16, 5)} fill="none" stroke={INK} strokeWidth={1.3} />;
    case 'horizon':
      return <path d="M4,1 L12,5 L4,9 Z" fill={INK} />;
    case 'level':
      return <path d="M8,1 L12,5 L8,9 L4,5 Z" fill={CHART_COLOURS.likelihoodBelow} />;
    case 'link':
      return <line x1={0} x2={16} y1={1} y2={9} stroke={CHART_COLOURS.axis} strokeWidth={0.6} strokeDasharray="2 2" />;
    default: {
      const facies = entry as Facies;
      return (
        <>
          <rect x={0} y={0} width={16} height={11} fill={faciesGroundFill(idPrefix, facies)} />
          <rect x={0} y={0} width={16} height={11} fill={`url(#${faciesPatternId(idPrefix, facies)})`} stroke={CHART_COLOURS.axis} strokeWidth={0.5} />
        </>
      );
    }
  }
}

/**
 * A turbidite core drawn to depth: the column on true depth with its beds and hemipelagic mud
 * (each by tone, texture and legend), erosion at bed bases as a zigzag with its thickness, the
 * event horizons named on the left, the same core on event-free depth beside it (each bed shrunk
 * to a line) with the true depth ticks linked across, the dated levels on both, and the core's
 * logs on the chosen depth. Presentation attributes only, so the SVG exports as it looks.
 */
export function CoreDrawing({ units, horizons, levels, traces = [], logsOn = 'TRUE', title, svgRef }: CoreDrawingProps) {
  const idPrefix = useId().replace(/:/g, '');
  const scale = useMemo(() => coreScale(units), [units]);
  if (!scale) return null;
  const lengthM = scale.baseDepthM - scale.topDepthM;
  const plotHeight = coreDrawingHeight(lengthM);
  const erosions = erosionMarks(scale);
  const width = X.logs + (traces.length > 0 ? traces.length * (LOG_WIDTH + LOG_GAP) : 0) + 8;
  const faciesPresent = FACIES_ORDER.filter((facies) => units.some((unit) => unit.facies === facies));
  const legend = flowLegend(
    [
      ...faciesPresent.map((facies) => ({
        key: facies,
        label: facies === 'TURBIDITE' ? 'turbidite bed (removed from event-free depth)' : FACIES_STYLES[facies].label.toLowerCase(),
      })),
      ...(erosions.length > 0 ? [{ key: 'erosion', label: 'eroded base' }] : []),
      { key: 'horizon', label: 'event horizon' },
      { key: 'level', label: 'dated level' },
      { key: 'link', label: 'same level on both depths' },
    ],
    width - 16,
  );
  const legendRows = Math.max(1, ...legend.map((entry) => entry.row + 1));
  const height = TOP + plotHeight + BOTTOM + legendRows * LEGEND_ROW + 10;
  const yTrue = scaleLinear().domain([scale.topDepthM, scale.baseDepthM]).range([TOP, TOP + plotHeight]);
  const yEventFree = (eventFreeM: number) => yTrue(scale.topDepthM + eventFreeM);
  const trueTicks = yTrue.ticks(Math.max(4, Math.round(plotHeight / 60)));
  const efTicks = scaleLinear().domain([0, scale.eventFreeLengthM]).ticks(Math.max(3, Math.round((yEventFree(scale.eventFreeLengthM) - TOP) / 60)));
  const links = depthLinks(scale, trueTicks);
  const erosionByUnit = new Map(erosions.map((mark) => [mark.unitId, mark]));
  const unitsById = new Map(units.map((unit) => [unit.id, unit]));
  const trueRight = X.trueColumn + X.trueWidth;
  const efRight = X.efColumn + X.efWidth;

  const placedHorizons = horizons.flatMap((horizon) => {
    const above = unitsById.get(horizon.unitAboveId);
    if (!above) return [];
    const depthM = above.baseDepthM;
    return [{ horizon, depthM, y: yTrue(depthM), yEf: yEventFree(scale.eventFreeDepth(depthM)), erosion: erosionByUnit.get(above.id) }];
  });
  const horizonLabelYs = spreadLabels(placedHorizons.map((item) => item.y), 24, [TOP + 6, TOP + plotHeight - 6]);

  const placedLevels = levels
    .filter((level) => level.depthM >= scale.topDepthM && level.depthM <= scale.baseDepthM)
    .map((level) => ({ level, y: yTrue(level.depthM), yEf: yEventFree(scale.eventFreeDepth(level.depthM)) }));
  const levelLabelYs = spreadLabels(placedLevels.map((item) => item.yEf), 12, [TOP, TOP + plotHeight]);

  const logY = (depth: number) => (logsOn === 'TRUE' ? yTrue(depth) : yEventFree(depth));
  const bedSegments = scale.segments.filter((segment) => segment.isBed);

  return (
    <svg ref={svgRef} width={width} height={height} role="img" aria-label={title} fontSize={FONT} fill={INK}>
      <title>{title}</title>
      <defs>
        <FaciesPatterns idPrefix={idPrefix} />
      </defs>

      {/* column headings */}
      <text x={X.trueColumn + X.trueWidth / 2} y={14} textAnchor="middle" fontWeight={600}>
        true depth
      </text>
      <text x={X.trueColumn + X.trueWidth / 2} y={27} textAnchor="middle" fill={MUTED}>
        m below core top
      </text>
      <text x={X.efColumn + X.efWidth / 2} y={14} textAnchor="middle" fontWeight={600}>
        event-free
      </text>
      <text x={X.efColumn + X.efWidth / 2} y={27} textAnchor="middle" fill={MUTED}>
        {bedSegments.length > 0 ? 'm, beds removed' : 'm, no beds here'}
      </text>

      {/* links between the two depths: beds as wedges that close to a line, round depths as thin lines */}
      <g aria-hidden="true">
        {bedSegments.map((segment) => (
          <polygon
            key={segment.unit.id}
            points={`${trueRight},${yTrue(segment.topDepthM)} ${trueRight},${yTrue(segment.baseDepthM)} ${X.efColumn},${yEventFree(segment.eventFreeTopM)}`}
            fill={FACIES_STYLES.TURBIDITE.ground}
            fillOpacity={0.45}
            stroke={FACIES_STYLES.TURBIDITE.ink}
            strokeWidth={0.5}
          />
        ))}
        {links.map((link) => (
          <line key={link.depthM} x1={X.linkStart} x2={X.efColumn} y1={yTrue(link.depthM)} y2={yEventFree(link.eventFreeDepthM)} stroke={CHART_COLOURS.axis} strokeWidth={0.6} strokeDasharray="2 2" />
        ))}
      </g>

      {/* the two columns */}
      {scale.segments.map((segment) => {
        const { unit } = segment;
        const style = FACIES_STYLES[unit.facies];
        const y0 = yTrue(segment.topDepthM);
        const h = Math.max(1, yTrue(segment.baseDepthM) - y0);
        const e0 = yEventFree(segment.eventFreeTopM);
        const eh = yEventFree(segment.eventFreeBaseM) - e0;
        return (
          <g key={unit.id}>
            <title>{`${unit.name} · ${style.label} · ${segment.topDepthM}–${segment.baseDepthM} m${segment.isBed ? ' · event bed, removed from event-free depth' : ''}`}</title>
            <rect x={X.trueColumn} y={y0} width={X.trueWidth} height={h} fill={faciesGroundFill(idPrefix, unit.facies)} />
            <rect x={X.trueColumn} y={y0} width={X.trueWidth} height={h} fill={`url(#${faciesPatternId(idPrefix, unit.facies)})`} stroke={CHART_COLOURS.axis} strokeWidth={0.5} />
            {h >= 13 && (
              <text x={X.trueColumn + X.trueWidth / 2 - 4} y={y0 + h / 2} dy="0.32em" textAnchor="middle" fill={style.labelInk} fontSize={9}>
                {unitWord(unit)}
              </text>
            )}
            {segment.isBed ? (
              <line x1={X.efColumn} x2={efRight} y1={e0} y2={e0} stroke={FACIES_STYLES.TURBIDITE.ink} strokeWidth={1.5} />
            ) : (
              <>
                <rect x={X.efColumn} y={e0} width={X.efWidth} height={Math.max(0.5, eh)} fill={faciesGroundFill(idPrefix, unit.facies)} />
                <rect x={X.efColumn} y={e0} width={X.efWidth} height={Math.max(0.5, eh)} fill={`url(#${faciesPatternId(idPrefix, unit.facies)})`} stroke={CHART_COLOURS.axis} strokeWidth={0.5} />
              </>
            )}
          </g>
        );
      })}

      {/* erosion at bed bases: a zigzag on both columns */}
      {erosions.map((mark) => (
        <g key={mark.unitId}>
          <title>{`${mark.unitName}: its base eroded about ${thicknessLabel(mark.erosionM)} of the mud below`}</title>
          <path d={zigzag(X.trueColumn, trueRight, yTrue(mark.depthM))} fill="none" stroke={INK} strokeWidth={1.3} />
          <path d={zigzag(X.efColumn, efRight, yEventFree(mark.eventFreeDepthM))} fill="none" stroke={INK} strokeWidth={1.1} />
        </g>
      ))}

      {/* true depth axis on the column's right edge, its labels where the links start */}
      {trueTicks.map((tick) => (
        <g key={tick} transform={`translate(0,${yTrue(tick)})`}>
          <line x1={trueRight} x2={trueRight + 5} stroke={CHART_COLOURS.axis} />
          <text x={trueRight + 7} dy="0.32em" className="num" fill={MUTED} {...HALO}>
            {tick.toFixed(tick % 1 === 0 ? 0 : 1)}
          </text>
        </g>
      ))}

      {/* event horizons: named on the left with a leader to the contact */}
      {placedHorizons.map(({ horizon, y, yEf, erosion }, index) => {
        const labelY = horizonLabelYs[index] ?? y;
        return (
          <g key={horizon.id}>
            <title>{`${horizon.name}: event horizon at ${placedHorizons[index]!.depthM} m${erosion ? `, base scoured about ${thicknessLabel(erosion.erosionM)}` : ''}`}</title>
            <path d={`M${X.horizonLabel + 3},${labelY} L${X.trueColumn - 16},${labelY} L${X.trueColumn - 3},${y}`} fill="none" stroke={MUTED} strokeWidth={0.7} />
            <path d={`M${X.trueColumn - 8},${y - 4} L${X.trueColumn},${y} L${X.trueColumn - 8},${y + 4} Z`} fill={INK} />
            <line x1={X.trueColumn} x2={trueRight} y1={y} y2={y} stroke={INK} strokeWidth={1.4} />
            <line x1={X.efColumn} x2={efRight + 4} y1={yEf} y2={yEf} stroke={INK} strokeWidth={1.4} />
            <text x={X.horizonLabel} y={labelY} dy={erosion ? '-0.15em' : '0.32em'} textAnchor="end" fontWeight={600}>
              {truncateLabel(horizon.name, 12)}
            </text>
            {erosion && (
              <text x={X.horizonLabel} y={labelY} dy="1.05em" textAnchor="end" fill={MUTED} fontSize={9}>
                {`scour ${thicknessLabel(erosion.erosionM)}`}
              </text>
            )}
          </g>
        );
      })}

      {/* event-free depth axis, right of its column */}
      <line x1={efRight + 6} x2={efRight + 6} y1={TOP} y2={yEventFree(scale.eventFreeLengthM)} stroke={CHART_COLOURS.axis} />
      {efTicks.map((tick) => (
        <g key={tick} transform={`translate(0,${yEventFree(tick)})`}>
          <line x1={efRight + 6} x2={efRight + 10} stroke={CHART_COLOURS.axis} />
          <text x={efRight + 12} dy="0.32em" className="num" fill={MUTED}>
            {tick.toFixed(tick % 1 === 0 ? 0 : 1)}
          </text>
        </g>
      ))}

      {/* dated levels: a diamond on each column, the lab code right of the event-free axis */}
      {placedLevels.map(({ level, y, yEf }, index) => {
        const labelY = levelLabelYs[index] ?? yEf;
        const fill = level.excluded ? '#ffffff' : CHART_COLOURS.likelihoodBelow;
        const diamond = (cx: number, cy: number) => `M${cx},${cy - 4} L${cx + 4},${cy} L${cx},${cy + 4} L${cx - 4},${cy} Z`;
        return (
          <g key={level.id}>
            <title>{`${level.label}: dated level at ${level.depthM} m${level.excluded ? ' (excluded)' : ''}`}</title>
            <path d={diamond(trueRight - 7, y)} fill={fill} stroke={CHART_COLOURS.likelihoodBelow} strokeWidth={1} />
            <path d={diamond(efRight - 7, yEf)} fill={fill} stroke={CHART_COLOURS.likelihoodBelow} strokeWidth={1} />
            <path d={`M${efRight + 30},${yEf} L${X.levelLabel - 3},${labelY}`} fill="none" stroke={MUTED} strokeWidth={0.5} />
            <text x={X.levelLabel} y={labelY} dy="0.32em" className="num" fontSize={9} fill={level.excluded ? MUTED : INK}>
              {truncateLabel(level.label, 11)}
            </text>
          </g>
        );
      })}

      {/* logs on the chosen depth */}
      {traces.map((trace, index) => {
        const left = X.logs + index * (LOG_WIDTH + LOG_GAP);
        const points = traceOnAxis(trace.depthsM, trace.values, scale, logsOn);
        const [low = 0, high = 1] = extent(points, (point) => point.value);
        const x = scaleLinear().domain([low, high === low ? low + 1 : high]).nice(3).range([left, left + LOG_WIDTH]);
        const path = line<{ depth: number; value: number }>()
          .x((point) => x(point.value))
          .y((point) => logY(point.depth))(points);
        const bottomY = logsOn === 'TRUE' ? TOP + plotHeight : yEventFree(scale.eventFreeLengthM);
        return (
          <g key={trace.key}>
            <title>{`${trace.channel} · ${trace.source} (${trace.unit || 'no unit'}) on ${logsOn === 'TRUE' ? 'true' : 'event-free'} depth`}</title>
            <text x={left} y={14} fontWeight={600}>
              {truncateLabel(trace.channel, 21)}
            </text>
            <text x={left} y={27} fill={MUTED}>
              {truncateLabel(`${trace.unit || 'no unit'} · ${trace.source}`, 24)}
            </text>
            {x.ticks(3).map((tick, tickIndex, all) => (
              <g key={tick}>
                <line x1={x(tick)} x2={x(tick)} y1={TOP - 4} y2={bottomY} stroke={CHART_COLOURS.grid} />
                {(all.length <= 3 || tickIndex % 2 === 0) && <text
                  x={x(tick)}
                  y={TOP - 7}
                  textAnchor={tickIndex === 0 ? 'start' : tickIndex === all.length - 1 ? 'end' : 'middle'}
                  className="num"
                  fontSize={9}
                  fill={MUTED}
                >
                  {tick}
                </text>}
              </g>
            ))}
            {bedSegments.map((segment) =>
              logsOn === 'TRUE' ? (
                <rect key={segment.unit.id} x={left} width={LOG_WIDTH} y={yTrue(segment.topDepthM)} height={Math.max(1, yTrue(segment.baseDepthM) - yTrue(segment.topDepthM))} fill={FACIES_STYLES.TURBIDITE.ground} fillOpacity={0.35} />
              ) : (
                <line key={segment.unit.id} x1={left} x2={left + LOG_WIDTH} y1={yEventFree(segment.eventFreeTopM)} y2={yEventFree(segment.eventFreeTopM)} stroke={FACIES_STYLES.TURBIDITE.ink} strokeDasharray="3 2" strokeWidth={0.8} />
              ),
            )}
            <rect x={left} y={TOP} width={LOG_WIDTH} height={bottomY - TOP} fill="none" stroke={CHART_COLOURS.axis} strokeWidth={0.5} />
            {path && <path d={path} fill="none" stroke="#33505f" strokeWidth={1.1} />}
          </g>
        );
      })}

      {/* legend: the facies present, then the marks */}
      <g transform={`translate(8,${TOP + plotHeight + BOTTOM + 6})`} fontSize={9.5}>
        {legend.map((entry) => (
          <g key={entry.key} transform={`translate(${entry.x},${entry.row * LEGEND_ROW})`}>
            <LegendSwatch entry={entry.key} idPrefix={idPrefix} />
            <text x={LEGEND_SWATCH} y={9}>
              {entry.label}
            </text>
          </g>
        ))}
      </g>
    </svg>
  );
}
