import { area, select, zoom, zoomIdentity, type ZoomBehavior, type ZoomTransform } from 'd3';
import { useEffect, useId, useMemo, useRef, useState, type ReactNode, type RefObject } from 'react';
import type { HypothesisQuery } from '@/gql/graphql';
import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { TimeGridTicks } from '@/modules/ages/components/TimeGridTicks';
import { ageAxisTitle } from '@/modules/ages/utils/formatAge';
import { closeDensity, densityPeak, type DensityPoint } from '@/modules/calibration/utils/calibrationChart';
import { CHART_COLOURS } from '@/modules/correlation/utils/chartPalette';
import { conflictingTieIds, eventAnchors } from '@/modules/correlation/utils/ladderData';
import {
  columnLabel,
  createColumnScale,
  createDensityWidthScale,
  createTimeScale,
  hpdExtent,
  ladderTimeWindow,
  regionalBands,
  tieSegments,
  zoomedTimeWindow,
} from '@/modules/correlation/utils/ladderLayout';
import type { LadderGeometry } from '@/modules/correlation/utils/ladderOverlays';
import { useParentSize } from '@/modules/ui/hooks/useParentSize';

const MARGIN = { top: 84, right: 16, bottom: 16, left: 64 };
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
};

type Hover = { x: number; y: number; siteName: string; event: LadderColumn['events'][number] };

/**
 * The event ladder: a column per site, calendar time down the page, each event's density as a
 * one-sided shape off its column's axis (scaled to its own peak), ties between medians,
 * regional events as faint bands. The wheel zooms and dragging pans the time axis.
 */
export function EventLadderChart({ columns, hypothesis, selectedEventIds, onSelectEvent, figure, overlay }: EventLadderChartProps) {
  const { ref, width, height } = useParentSize();
  const { age, range, scale } = useAgeScale();
  const clipId = useId().replace(/:/g, '');
  const [transform, setTransform] = useState<ZoomTransform>(zoomIdentity);
  const [hover, setHover] = useState<Hover | null>(null);
  const bottom = Math.max(height - MARGIN.bottom, MARGIN.top + 1);

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
            <clipPath id={clipId}>
              <rect x={0} y={MARGIN.top} width={width} height={bottom - MARGIN.top} />
            </clipPath>
          </defs>
          {columns.map((column, index) => {
            const x = columnScale(column.site.id) ?? 0;
            const label = columnLabel(column.site.name, index, columnScale.step());
            const labelTop = label.row * 32;
            return (
              <g key={column.site.id}>
                <text x={x} y={18 + labelTop} fontSize={12} fontWeight={600} fill={CHART_COLOURS.text}>
                  <title>{column.site.name}</title>
                  {label.text}
                </text>
                <text x={x} y={34 + labelTop} fontSize={11} fill={CHART_COLOURS.mutedText}>
                  {column.site.kind.toLowerCase()} · <tspan className="num">{column.site.alongStrikeKm.toFixed(0)} km</tspan>
                </text>
                <line x1={x} x2={x} y1={MARGIN.top} y2={bottom} stroke={CHART_COLOURS.axis} strokeWidth={0.75} />
              </g>
            );
          })}
          <g clipPath={`url(#${clipId})`}>
            <TimeGridTicks time={time} count={10} left={MARGIN.left} right={width - MARGIN.right} />
            {bands.map((band) => (
              <rect key={band.regionalEventId} x={band.x} y={band.y} width={band.width} height={band.height} fill={CHART_COLOURS.regionalBand} fillOpacity={0.22} />
            ))}
            {shapes.map(({ column, event, x0, path }) => {
              const selected = selectedEventIds.includes(event.eventHorizon.id);
              const median = event.medianCalBp;
              const handleClick = () => onSelectEvent(event.eventHorizon.id);
              const handleEnter = () =>
                setHover({ x: x0 + columnScale.bandwidth() * 0.5, y: median === null || median === undefined ? MARGIN.top : time(median), siteName: column.site.name, event });
              const handleLeave = () => setHover(null);
              return (
                <g key={event.eventHorizon.id} onClick={handleClick} onMouseEnter={handleEnter} onMouseLeave={handleLeave} style={{ cursor: 'pointer' }}>
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
                </g>
              );
            })}
            {ties.map((segment) => (
              <line
                key={segment.tieId}
                x1={segment.x1}
                y1={segment.y1}
                x2={segment.x2}
                y2={segment.y2}
                stroke={segment.conflict ? CHART_COLOURS.warning : CHART_COLOURS.tie}
                strokeWidth={segment.conflict ? 2 : 1.25}
                strokeDasharray={segment.conflict ? '6 3' : undefined}
                pointerEvents="none"
              />
            ))}
            {overlay?.({ time, columnScale, anchors, top: MARGIN.top, bottom })}
          </g>
          <text x={8} y={MARGIN.top - 6} fontSize={10} fill={CHART_COLOURS.mutedText}>
            {ageAxisTitle(scale)} · younger ↑
          </text>
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
