import { scaleLinear } from 'd3';
import { useId, useMemo, type RefObject } from 'react';
import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { TimeGridTicks } from '@/modules/ages/components/TimeGridTicks';
import { ageAxisTitle } from '@/modules/ages/utils/formatAge';
import { ChartLegendSvg, HatchPattern, legendHeight, type LegendEntry } from '@/modules/correlation/components/ChartLegendSvg';
import type { LadderColumn, LadderHypothesis } from '@/modules/correlation/components/EventLadderChart';
import { CHART_COLOURS } from '@/modules/correlation/utils/chartPalette';
import { shownMedian } from '@/modules/correlation/utils/jointRun';
import { eventSiteKm, loopRegionalEventIds, regionalEventFailures, regionalEventNumbers } from '@/modules/correlation/utils/ladderData';
import { createTimeScale, ladderTimeWindow, spaceTimeBars, type SpaceTimeBar } from '@/modules/correlation/utils/ladderLayout';
import { useParentSize } from '@/modules/ui/hooks/useParentSize';
import { placeLabels, textWidth } from '@/modules/ui/utils/labelPlacement';

const MARGIN = { top: 56, right: 24, bottom: 44, left: 64 };
/** A regional event recorded at one site still gets a visible bar. */
const MIN_BAR_PX = 6;

const fromKmOf = (bar: SpaceTimeBar) => bar.fromKm;
const toKmOf = (bar: SpaceTimeBar) => bar.toKm;

export type SpaceTimeSegment = { id: string; name: string; startKm: number; endKm: number };

export type SpaceTimeChartProps = {
  columns: readonly LadderColumn[];
  hypothesis: LadderHypothesis | null;
  /** The project's fault segments: their ends are drawn as boundaries along strike. */
  segments?: readonly SpaceTimeSegment[];
  figure: RefObject<SVGSVGElement | null>;
};

/**
 * Along-strike distance across, calendar time down (young at top): each regional event of the
 * hypothesis a bar over its sites' along-strike extent and its combined 95.4 % range, numbered
 * as in the list (R1 youngest), with the combined median as a line; a failing event hatched and
 * marked ✕; segment boundaries as dashed lines with the segment names; sites along the top.
 */
export function SpaceTimeChart({ columns, hypothesis, segments = [], figure }: SpaceTimeChartProps) {
  const { ref, width, height } = useParentSize();
  const { range, scale } = useAgeScale();
  const hatchId = `${useId().replace(/:/g, '')}-hatch`;
  const bars = useMemo(() => spaceTimeBars(hypothesis?.regionalEvents ?? [], eventSiteKm(columns)), [hypothesis, columns]);
  const checks = useMemo(() => {
    const loops = loopRegionalEventIds(hypothesis?.orderConflicts ?? []);
    const numbers = regionalEventNumbers(hypothesis?.regionalEvents ?? [], shownMedian);
    return new Map((hypothesis?.regionalEvents ?? []).map((regional) => [regional.id, { number: numbers.get(regional.id) ?? 0, failures: regionalEventFailures(regional, loops) }]));
  }, [hypothesis]);
  const anyFailing = [...checks.values()].some((check) => check.failures.length > 0);
  const legendEntries = useMemo<LegendEntry[]>(
    () => [
      { swatch: 'bar', label: 'regional event (R#): sites’ extent × combined 95.4 %' },
      { swatch: 'median', label: 'combined median' },
      ...(anyFailing ? [{ swatch: 'band-fails' as const, label: 'fails a check (✕)' }] : []),
      ...(segments.length > 0 ? [{ swatch: 'boundary' as const, label: 'segment boundary' }] : []),
    ],
    [anyFailing, segments.length],
  );
  const legendPx = legendHeight(legendEntries, Math.max(width - 16, 100)) + 4;
  const plotBottom = Math.max(height - MARGIN.bottom - legendPx, MARGIN.top + 1);
  const time = useMemo(() => {
    const window = ladderTimeWindow(columns.flatMap((column) => column.events.map((event) => event.density)));
    return createTimeScale(window, MARGIN.top, plotBottom);
  }, [columns, plotBottom]);
  const distance = useMemo(() => {
    const kms = [
      ...columns.map((column) => column.site.alongStrikeKm),
      ...bars.map(fromKmOf),
      ...bars.map(toKmOf),
      ...segments.flatMap((segment) => [segment.startKm, segment.endKm]),
    ];
    const low = Math.min(...kms, 0);
    const high = Math.max(...kms, 1);
    const pad = (high - low) * 0.03;
    return scaleLinear().domain([low - pad, high + pad]).range([MARGIN.left, width - MARGIN.right]);
  }, [columns, bars, segments, width]);

  const siteLabels = useMemo(() => {
    const placed = placeLabels(
      columns.map((column) => ({ id: column.site.id, x: distance(column.site.alongStrikeKm), text: column.site.name, anchor: 'middle' as const })),
      { rows: 3, minX: 2, maxX: width - 2, measure: (text) => textWidth(text, '10px') },
    );
    return new Map(placed.map((label) => [label.id, label]));
  }, [columns, distance, width]);
  const segmentLabels = useMemo(() => {
    const placed = placeLabels(
      segments.map((segment) => ({ id: segment.id, x: distance((segment.startKm + segment.endKm) / 2), text: segment.name, anchor: 'middle' as const })),
      { rows: 1, minX: MARGIN.left, maxX: width - MARGIN.right, measure: (text) => textWidth(text, 'italic 10px') },
    );
    return new Map(placed.map((label) => [label.id, label]));
  }, [segments, distance, width]);
  const boundaries = useMemo(() => [...new Set(segments.flatMap((segment) => [segment.startKm, segment.endKm]))], [segments]);

  return (
    <div ref={ref} className="sc-chart-frame sc-ladder-chart">
      {width > 0 && height > 0 && (
        <svg ref={figure} width={width} height={height} role="img" aria-label="Regional events in space and time">
          <defs>
            <HatchPattern id={hatchId} />
          </defs>
          <TimeGridTicks time={time} count={10} left={MARGIN.left} right={width - MARGIN.right} />
          {boundaries.map((km) => (
            <line key={km} x1={distance(km)} x2={distance(km)} y1={MARGIN.top} y2={plotBottom} stroke={CHART_COLOURS.axis} strokeWidth={1.25} strokeDasharray="4 2" data-segment-boundary={km} />
          ))}
          {segments.map((segment) => {
            const label = segmentLabels.get(segment.id);
            return label ? (
              <text key={segment.id} x={label.x} y={plotBottom + 12} fontSize={10} fontStyle="italic" fill={CHART_COLOURS.mutedText}>
                <title>{`${segment.name}: ${segment.startKm}–${segment.endKm} km`}</title>
                {label.text}
              </text>
            ) : null;
          })}
          {distance.ticks(8).map((km) => (
            <text key={km} x={distance(km)} y={plotBottom + 26} textAnchor="middle" fontSize={10} fill={CHART_COLOURS.mutedText} className="num">
              {km}
            </text>
          ))}
          <text x={width - MARGIN.right} y={plotBottom + 38} textAnchor="end" fontSize={10} fill={CHART_COLOURS.mutedText}>
            distance along strike, km
          </text>
          <text x={8} y={MARGIN.top - 6} fontSize={10} fill={CHART_COLOURS.mutedText}>
            {ageAxisTitle(scale)} · younger ↑
          </text>
          {columns.map((column) => {
            const x = distance(column.site.alongStrikeKm);
            const label = siteLabels.get(column.site.id);
            return (
              <g key={column.site.id}>
                <line x1={x} x2={x} y1={MARGIN.top - 6} y2={plotBottom} stroke={CHART_COLOURS.grid} strokeDasharray="2 3" />
                <path d={`M${x - 4},${MARGIN.top - 12}L${x + 4},${MARGIN.top - 12}L${x},${MARGIN.top - 5}Z`} fill={CHART_COLOURS.axis} />
                {label && (
                  <text x={label.x} y={11 + label.row * 14} fontSize={10} fill={CHART_COLOURS.text} className="sc-site-label">
                    <title>{`${column.site.name}, ${column.site.alongStrikeKm.toFixed(0)} km`}</title>
                    {label.text}
                  </text>
                )}
              </g>
            );
          })}
          {bars.map((bar) => {
            const x1 = distance(bar.fromKm);
            const x2 = distance(bar.toKm);
            const barWidth = Math.max(x2 - x1, MIN_BAR_PX);
            const x = x2 - x1 < MIN_BAR_PX ? (x1 + x2) / 2 - MIN_BAR_PX / 2 : x1;
            const y = time(bar.youngerCalBp);
            const barHeight = Math.max(time(bar.olderCalBp) - y, 1);
            const check = checks.get(bar.regionalEventId);
            const fails = (check?.failures.length ?? 0) > 0;
            return (
              <g key={bar.regionalEventId} data-regional-event={check?.number} data-fails={fails ? 'true' : undefined}>
                <rect
                  x={x}
                  y={y}
                  width={barWidth}
                  height={barHeight}
                  fill={fails ? `url(#${hatchId})` : CHART_COLOURS.posteriorFill}
                  fillOpacity={fails ? 1 : 0.55}
                  stroke={fails ? CHART_COLOURS.danger : CHART_COLOURS.posterior}
                  strokeWidth={0.75}
                  strokeDasharray={fails ? '3 2' : undefined}
                >
                  <title>{`R${check?.number ?? '?'}: ${bar.memberCount} site events, ${range(bar.olderCalBp, bar.youngerCalBp)}, ${bar.fromKm.toFixed(0)}–${bar.toKm.toFixed(0)} km${fails ? `; ${check!.failures.join(', ')}` : ''}`}</title>
                </rect>
                {bar.medianCalBp !== null && (
                  <line x1={x} x2={x + barWidth} y1={time(bar.medianCalBp)} y2={time(bar.medianCalBp)} stroke={CHART_COLOURS.text} strokeWidth={1.25} />
                )}
                <text
                  x={x + barWidth + 3 > width - MARGIN.right - 24 ? x - 3 : x + barWidth + 3}
                  textAnchor={x + barWidth + 3 > width - MARGIN.right - 24 ? 'end' : 'start'}
                  y={bar.medianCalBp !== null ? time(bar.medianCalBp) : y + 8}
                  dy="0.32em"
                  fontSize={10}
                  fontWeight={600}
                  fill={fails ? CHART_COLOURS.danger : CHART_COLOURS.text}
                >
                  R{check?.number ?? '?'}
                  {fails ? ' ✕' : ''}
                </text>
              </g>
            );
          })}
          <ChartLegendSvg entries={legendEntries} x={8} y={plotBottom + 42} maxWidth={Math.max(width - 16, 100)} hatchId={hatchId} />
        </svg>
      )}
    </div>
  );
}
