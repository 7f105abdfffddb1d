import { area, select, zoom, zoomIdentity, type ZoomBehavior, type ZoomTransform } from 'd3';
import { useEffect, useId, useMemo, useRef, useState, type KeyboardEvent, type ReactNode, type RefObject } from 'react';
import type { HypothesisQuery } from '@/gql/graphql';
import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { TimeGridTicks } from '@/modules/ages/components/TimeGridTicks';
import { ageAxisTitle } from '@/modules/ages/utils/formatAge';
import { closeDensity, densityPeak, type DensityPoint } from '@/modules/calibration/utils/calibrationChart';
import { CHART_COLOURS } from '@/modules/correlation/utils/chartPalette';
import { shownMedian } from '@/modules/correlation/utils/jointRun';
import { ChartLegendSvg, HatchPattern, legendHeight, type LegendEntry } from '@/modules/correlation/components/ChartLegendSvg';
import { conflictingTieIds, eventAnchors, loopRegionalEventIds, regionalEventFailures, regionalEventNumbers } from '@/modules/correlation/utils/ladderData';
import {
  createColumnScale,
  createDensityWidthScale,
  createTimeScale,
  eventInDirection,
  hpdExtent,
  ladderTimeWindow,
  regionalBands,
  tieSegments,
  zoomedTimeWindow,
} from '@/modules/correlation/utils/ladderLayout';
import type { LadderGeometry } from '@/modules/correlation/utils/ladderOverlays';
import { useParentSize } from '@/modules/ui/hooks/useParentSize';
import { fitText, placeLabels, textWidth } from '@/modules/ui/utils/labelPlacement';

const MARGIN = { top: 84, right: 16, bottom: 16, left: 64 };
/** Column headers: two rows of a name and a second line each. */
const HEADER_ROW_PX = 32;
const MAX_ZOOM = 40;

const calBpOf = (point: DensityPoint) => point.calBp;
const probabilityOf = (point: DensityPoint) => point.probability;

export type { LadderColumn } from '@/modules/correlation/hooks/ladderQueries';
import type { LadderColumn } from '@/modules/correlation/hooks/ladderQueries';
export type LadderHypothesis = HypothesisQuery['hypothesis'];

export type EventLadderChartProps = {
  /** Columns already in along-strike order. */
  columns: readonly LadderColumn[];
  hypothesis: LadderHypothesis | null;
  selectedEventIds: readonly string[];
  onSelectEvent: (eventId: string) => void;
  figure: RefObject<SVGSVGElement | null>;
  /** Drawn over the ties with the chart's current scales (order loops, suggestions, core logs). */
  overlay?: (geometry: LadderGeometry) => ReactNode;
  /** Ties this hypothesis has and the one beside it lacks (side by side), drawn marked. */
  differingTieIds?: ReadonlySet<string>;
};

type Hover = { x: number; y: number; siteName: string; event: LadderColumn['events'][number] };

/**
 * The event ladder: a column per site, calendar time down the page, each event's density as a
 * one-sided shape off its column's axis (scaled to its own peak), ties between medians,
 * regional events as faint bands. The wheel zooms and dragging pans the time axis.
 */
export function EventLadderChart({ columns, hypothesis, selectedEventIds, onSelectEvent, figure, overlay, differingTieIds }: EventLadderChartProps) {
  const { ref, width, height } = useParentSize();
  const { age, range, scale } = useAgeScale();
  const clipId = useId().replace(/:/g, '');
  const hatchId = `${clipId}-hatch`;
  const [transform, setTransform] = useState<ZoomTransform>(zoomIdentity);
  const [hover, setHover] = useState<Hover | null>(null);
  const eventRefs = useRef(new Map<string, SVGGElement>());

  const regionalChecks = useMemo(() => {
    const loops = loopRegionalEventIds(hypothesis?.orderConflicts ?? []);
    const numbers = regionalEventNumbers(hypothesis?.regionalEvents ?? [], shownMedian);
    return new Map((hypothesis?.regionalEvents ?? []).map((regional) => [regional.id, { number: numbers.get(regional.id) ?? 0, failures: regionalEventFailures(regional, loops) }]));
  }, [hypothesis]);
  const anyFailing = [...regionalChecks.values()].some((check) => check.failures.length > 0);
  const legendEntries = useMemo<LegendEntry[]>(
    () => [
      { swatch: 'density', label: 'event age (density, own peak)' },
      { swatch: 'median', label: 'median' },
      { swatch: 'tie', label: 'tie' },
      ...(hypothesis?.orderConflicts.length ? [{ swatch: 'tie-conflict' as const, label: 'tie crossing another’s order' }] : []),
      ...(differingTieIds && differingTieIds.size > 0 ? [{ swatch: 'tie-differs' as const, label: 'tie only in this hypothesis' }] : []),
      { swatch: 'band', label: 'regional event (R#), combined 95.4 %' },
      ...(anyFailing ? [{ swatch: 'band-fails' as const, label: 'fails a check (✕)' }] : []),
    ],
    [hypothesis, differingTieIds, anyFailing],
  );
  const legendPx = legendHeight(legendEntries, Math.max(width - 16, 100)) + 8;
  const bottom = Math.max(height - MARGIN.bottom - legendPx, MARGIN.top + 1);

  const baseWindow = useMemo(() => ladderTimeWindow(columns.flatMap((column) => column.events.map((event) => event.density))), [columns]);
  const baseTime = useMemo(() => createTimeScale(baseWindow, MARGIN.top, bottom), [baseWindow, bottom]);
  const time = useMemo(() => createTimeScale(zoomedTimeWindow(baseTime, transform), MARGIN.top, bottom), [baseTime, transform, bottom]);
  const columnScale = useMemo(() => createColumnScale(columns.map((column) => column.site.id), MARGIN.left, width - MARGIN.right), [columns, width]);
  const anchors = useMemo(() => eventAnchors(columns), [columns]);

  // d3-zoom only listens to the pointer and reports a transform; React draws with it.
  const svgRef = useRef<SVGSVGElement | null>(null);
  const behaviourRef = useRef<ZoomBehavior<SVGSVGElement, unknown> | null>(null);
  useEffect(() => {
    const element = svgRef.current;
    if (!element) return;
    const behaviour = zoom<SVGSVGElement, unknown>()
      .scaleExtent([1, MAX_ZOOM])
      .translateExtent([
        [0, MARGIN.top],
        [width, bottom],
      ])
      .extent([
        [0, MARGIN.top],
        [width, bottom],
      ])
      .on('zoom', (event: { transform: ZoomTransform }) => setTransform(event.transform));
    const selection = select(element);
    selection.call(behaviour).on('dblclick.zoom', null);
    behaviourRef.current = behaviour;
    return () => {
      selection.on('.zoom', null);
    };
  }, [width, bottom]);

  const shapes = useMemo(
    () =>
      columns.flatMap((column) => {
        const x0 = columnScale(column.site.id) ?? 0;
        return column.events.map((event) => {
          const spread = createDensityWidthScale(densityPeak(event.density), columnScale.bandwidth());
          const path =
            area<DensityPoint>()
              .y((point) => time(calBpOf(point)))
              .x0(x0)
              .x1((point) => x0 + spread(probabilityOf(point)))(closeDensity(event.density)) ?? '';
          return { column, event, x0, path };
        });
      }),
    [columns, columnScale, time],
  );

  const conflicts = useMemo(() => conflictingTieIds(hypothesis?.orderConflicts ?? []), [hypothesis]);
  const ties = useMemo(
    () => tieSegments(hypothesis?.ties ?? [], anchors, (id) => columnScale(id), time, conflicts),
    [hypothesis, anchors, columnScale, time, conflicts],
  );
  const bands = useMemo(() => regionalBands(hypothesis?.regionalEvents ?? [], anchors, columnScale, time), [hypothesis, anchors, columnScale, time]);

  // Site names over the columns, on two rows, shortened only where they would touch.
  const headerLabels = useMemo(() => {
    const placed = placeLabels(
      columns.map((column) => ({ id: column.site.id, x: columnScale(column.site.id) ?? 0, text: column.site.name })),
      { rows: 2, minX: 4, maxX: width - 4, measure: (text) => textWidth(text, '600 12px') },
    );
    return new Map(placed.map((label) => [label.id, label]));
  }, [columns, columnScale, width]);

  const focusEvent = (eventId: string | null) => {
    if (eventId) eventRefs.current.get(eventId)?.focus();
  };
  const handleEventKey = (eventId: string) => (keyEvent: KeyboardEvent<SVGGElement>) => {
    if (keyEvent.key === 'Enter' || keyEvent.key === ' ') {
      keyEvent.preventDefault();
      onSelectEvent(eventId);
    } else if (keyEvent.key === 'ArrowUp' || keyEvent.key === 'ArrowDown' || keyEvent.key === 'ArrowLeft' || keyEvent.key === 'ArrowRight') {
      keyEvent.preventDefault();
      focusEvent(eventInDirection(columns, eventId, keyEvent.key));
    } else if (keyEvent.key === 'Escape') {
      setHover(null);
    }
  };

  const handleDoubleClick = () => {
    if (svgRef.current && behaviourRef.current) select(svgRef.current).call(behaviourRef.current.transform, zoomIdentity);
  };
  const attachSvg = (element: SVGSVGElement | null) => {
    svgRef.current = element;
    figure.current = element;
  };

  return (
    <div ref={ref} className="sc-chart-frame sc-ladder-chart">
      {width > 0 && height > 0 && (
        <svg ref={attachSvg} width={width} height={height} role="img" aria-label="Event ladder" onDoubleClick={handleDoubleClick}>
          <defs>
            <HatchPattern id={hatchId} />
            <clipPath id={clipId}>
              <rect x={0} y={MARGIN.top} width={width} height={bottom - MARGIN.top} />
            </clipPath>
          </defs>
          {columns.map((column) => {
            const x = columnScale(column.site.id) ?? 0;
            const label = headerLabels.get(column.site.id);
            const labelTop = (label?.row ?? 0) * HEADER_ROW_PX;
            const detail = `${column.site.kind.toLowerCase()} · ${column.site.alongStrikeKm.toFixed(0)} km`;
            return (
              <g key={column.site.id} className="sc-ladder-header">
                <text x={label?.x ?? x} y={18 + labelTop} fontSize={12} fontWeight={600} fill={CHART_COLOURS.text}>
                  <title>{column.site.name}</title>
                  {label?.text ?? column.site.name}
                </text>
                <text x={label?.x ?? x} y={34 + labelTop} fontSize={11} fill={CHART_COLOURS.mutedText}>
                  {fitText(detail, label?.room ?? 200, (text) => textWidth(text, '11px'), 2)}
                </text>
                <line x1={x} x2={x} y1={MARGIN.top} y2={bottom} stroke={CHART_COLOURS.axis} strokeWidth={0.75} />
              </g>
            );
          })}
          <g clipPath={`url(#${clipId})`}>
            <TimeGridTicks time={time} count={10} left={MARGIN.left} right={width - MARGIN.right} />
            {bands.map((band) => {
              const check = regionalChecks.get(band.regionalEventId);
              const fails = (check?.failures.length ?? 0) > 0;
              return (
                <g key={band.regionalEventId} data-regional-event={check?.number} data-fails={fails ? 'true' : undefined}>
                  <rect
                    x={band.x}
                    y={band.y}
                    width={band.width}
                    height={band.height}
                    fill={fails ? `url(#${hatchId})` : CHART_COLOURS.regionalBand}
                    fillOpacity={fails ? 1 : 0.22}
                    stroke={fails ? CHART_COLOURS.danger : 'none'}
                    strokeDasharray={fails ? '3 2' : undefined}
                  >
                    <title>{`Regional event R${check?.number ?? '?'}${fails ? `: ${check!.failures.join(', ')}` : ''}`}</title>
                  </rect>
                </g>
              );
            })}
            {shapes.map(({ column, event, x0, path }) => {
              const selected = selectedEventIds.includes(event.eventHorizon.id);
              const median = event.medianCalBp;
              const handleClick = () => onSelectEvent(event.eventHorizon.id);
              const handleEnter = () =>
                setHover({ x: x0 + columnScale.bandwidth() * 0.5, y: median === null || median === undefined ? MARGIN.top : time(median), siteName: column.site.name, event });
              const handleLeave = () => setHover(null);
              return (
                <g
                  key={event.eventHorizon.id}
                  ref={(element) => {
                    if (element) eventRefs.current.set(event.eventHorizon.id, element);
                    else eventRefs.current.delete(event.eventHorizon.id);
                  }}
                  className="sc-ladder-event"
                  tabIndex={0}
                  role="button"
                  aria-pressed={selected}
                  aria-label={`${event.eventHorizon.name} at ${column.site.name}${median === null || median === undefined ? '' : `, median ${age(median)}`}`}
                  onClick={handleClick}
                  onKeyDown={handleEventKey(event.eventHorizon.id)}
                  onMouseEnter={handleEnter}
                  onMouseLeave={handleLeave}
                  onFocus={handleEnter}
                  onBlur={handleLeave}
                  style={{ cursor: 'pointer' }}
                >
                  <path
                    d={path}
                    fill={CHART_COLOURS.posteriorFill}
                    fillOpacity={selected ? 0.95 : 0.7}
                    stroke={selected ? CHART_COLOURS.selected : CHART_COLOURS.posterior}
                    strokeWidth={selected ? 2 : 0.75}
                  />
                  {median !== null && median !== undefined && (
                    <line x1={x0 - 4} x2={x0 + 10} y1={time(median)} y2={time(median)} stroke={CHART_COLOURS.text} strokeWidth={1.25} />
                  )}
                  {median !== null && median !== undefined && (
                    <text x={x0 - 6} y={time(median)} dy="0.32em" textAnchor="end" fontSize={9} fill={CHART_COLOURS.mutedText} pointerEvents="none">
                      {event.eventHorizon.name}
                    </text>
                  )}
                </g>
              );
            })}
            {ties.map((segment) => {
              const differs = differingTieIds?.has(segment.tieId) ?? false;
              const mx = (segment.x1 + segment.x2) / 2;
              const my = (segment.y1 + segment.y2) / 2;
              return (
                <g key={segment.tieId} pointerEvents="none" data-tie-differs={differs ? 'true' : undefined}>
                  <line
                    x1={segment.x1}
                    y1={segment.y1}
                    x2={segment.x2}
                    y2={segment.y2}
                    stroke={segment.conflict ? CHART_COLOURS.warning : CHART_COLOURS.tie}
                    strokeWidth={segment.conflict ? 2 : differs ? 2.5 : 1.25}
                    strokeDasharray={segment.conflict ? '6 3' : undefined}
                  />
                  {differs && <rect x={mx - 3} y={my - 3} width={6} height={6} transform={`rotate(45 ${mx} ${my})`} fill="#fff" stroke={CHART_COLOURS.tie} />}
                </g>
              );
            })}
            {overlay?.({ time, columnScale, anchors, top: MARGIN.top, bottom })}
          </g>
          <g clipPath={`url(#${clipId})`} pointerEvents="none">
            {/* Regional event numbers over everything, on a white halo so shapes and ties do not hide them. */}
            {bands.map((band) => {
              const check = regionalChecks.get(band.regionalEventId);
              const fails = (check?.failures.length ?? 0) > 0;
              return (
                <text
                  key={band.regionalEventId}
                  x={band.x + band.width - 2}
                  y={band.y + 10}
                  textAnchor="end"
                  fontSize={10}
                  fontWeight={600}
                  fill={fails ? CHART_COLOURS.danger : CHART_COLOURS.mutedText}
                  stroke="#ffffff"
                  strokeWidth={3}
                  paintOrder="stroke"
                >
                  R{check?.number ?? '?'}
                  {fails ? ' ✕' : ''}
                </text>
              );
            })}
          </g>
          <text x={8} y={MARGIN.top - 6} fontSize={10} fill={CHART_COLOURS.mutedText}>
            {ageAxisTitle(scale)} · younger ↑
          </text>
          <ChartLegendSvg entries={legendEntries} x={8} y={bottom + 10} maxWidth={Math.max(width - 16, 100)} hatchId={hatchId} />
        </svg>
      )}
      {hover && (
        <div className="sc-chart-tooltip" style={{ left: Math.min(hover.x + 12, Math.max(width - 220, 0)), top: hover.y + 8 }}>
          <strong>{hover.event.eventHorizon.name}</strong> · {hover.siteName}
          <div>
            median <span className="num">{hover.event.medianCalBp === null || hover.event.medianCalBp === undefined ? '–' : age(hover.event.medianCalBp)}</span>
          </div>
          <div>
            95.4 %{' '}
            <span className="num">
              {(() => {
                const extent = hpdExtent(hover.event.hpd95);
                return extent ? range(extent[1], extent[0]) : '–';
              })()}
            </span>
            {hover.event.hpd95.length > 1 && ` (${hover.event.hpd95.length} ranges)`}
          </div>
          <div>quality {hover.event.eventHorizon.quality}</div>
        </div>
      )}
    </div>
  );
}
