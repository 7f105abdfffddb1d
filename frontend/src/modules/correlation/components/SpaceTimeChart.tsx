import { scaleLinear } from 'd3';
import { useMemo, type RefObject } from 'react';
import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { TimeGridTicks } from '@/modules/ages/components/TimeGridTicks';
import { ageAxisTitle } from '@/modules/ages/utils/formatAge';
import type { LadderColumn, LadderHypothesis } from '@/modules/correlation/components/EventLadderChart';
import { CHART_COLOURS } from '@/modules/correlation/utils/chartPalette';
import { eventSiteKm } from '@/modules/correlation/utils/ladderData';
import { createTimeScale, ladderTimeWindow, spaceTimeBars, type SpaceTimeBar } from '@/modules/correlation/utils/ladderLayout';
import { useParentSize } from '@/modules/ui/hooks/useParentSize';

const MARGIN = { top: 56, right: 24, bottom: 28, left: 64 };
/** A regional event recorded at one site still gets a visible bar. */
const MIN_BAR_PX = 6;

const fromKmOf = (bar: SpaceTimeBar) => bar.fromKm;
const toKmOf = (bar: SpaceTimeBar) => bar.toKm;

export type SpaceTimeChartProps = {
  columns: readonly LadderColumn[];
  hypothesis: LadderHypothesis | null;
  figure: RefObject<SVGSVGElement | null>;
};

/**
 * Along-strike distance across, calendar time down (young at top): each regional event of the
 * hypothesis a bar over its sites' along-strike extent and its combined 95.4 % range, with the
 * combined median as a line; sites marked along the top.
 */
export function SpaceTimeChart({ columns, hypothesis, figure }: SpaceTimeChartProps) {
  const { ref, width, height } = useParentSize();
  const { range, scale } = useAgeScale();
  const bars = useMemo(() => spaceTimeBars(hypothesis?.regionalEvents ?? [], eventSiteKm(columns)), [hypothesis, columns]);
  const time = useMemo(() => {
    const window = ladderTimeWindow(columns.flatMap((column) => column.events.map((event) => event.density)));
    return createTimeScale(window, MARGIN.top, Math.max(height - MARGIN.bottom, MARGIN.top + 1));
  }, [columns, height]);
  const distance = useMemo(() => {
    const kms = [...columns.map((column) => column.site.alongStrikeKm), ...bars.map(fromKmOf), ...bars.map(toKmOf)];
    const low = Math.min(...kms, 0);
    const high = Math.max(...kms, 1);
    const pad = (high - low) * 0.03;
    return scaleLinear().domain([low - pad, high + pad]).range([MARGIN.left, width - MARGIN.right]);
  }, [columns, bars, width]);

  return (
    <div ref={ref} className="sc-chart-frame sc-ladder-chart">
      {width > 0 && height > 0 && (
        <svg ref={figure} width={width} height={height} role="img" aria-label="Regional events in space and time">
          <TimeGridTicks time={time} count={10} left={MARGIN.left} right={width - MARGIN.right} />
          {distance.ticks(8).map((km) => (
            <text key={km} x={distance(km)} y={height - 8} textAnchor="middle" fontSize={10} fill={CHART_COLOURS.mutedText} className="num">
              {km}
            </text>
          ))}
          <text x={width - MARGIN.right} y={height - 8} textAnchor="end" fontSize={10} fill={CHART_COLOURS.mutedText} dy="-1.2em">
            along strike, km
          </text>
          <text x={8} y={MARGIN.top - 6} fontSize={10} fill={CHART_COLOURS.mutedText}>
            {ageAxisTitle(scale)} · younger ↑
          </text>
          {columns.map((column, index) => {
            const x = distance(column.site.alongStrikeKm);
            return (
              <g key={column.site.id}>
                <line x1={x} x2={x} y1={MARGIN.top - 6} y2={height - MARGIN.bottom} stroke={CHART_COLOURS.grid} strokeDasharray="2 3" />
                <path d={`M${x - 4},${MARGIN.top - 12}L${x + 4},${MARGIN.top - 12}L${x},${MARGIN.top - 5}Z`} fill={CHART_COLOURS.axis} />
                <text x={x} y={index % 2 === 0 ? 16 : 30} textAnchor="middle" fontSize={10} fill={CHART_COLOURS.text}>
                  {column.site.name}
                </text>
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
            return (
              <g key={bar.regionalEventId}>
                <rect x={x} y={y} width={barWidth} height={barHeight} fill={CHART_COLOURS.posteriorFill} fillOpacity={0.55} stroke={CHART_COLOURS.posterior} strokeWidth={0.75}>
                  <title>{`${bar.memberCount} site events, ${range(bar.olderCalBp, bar.youngerCalBp)}, ${bar.fromKm.toFixed(0)}–${bar.toKm.toFixed(0)} km`}</title>
                </rect>
                {bar.medianCalBp !== null && (
                  <line x1={x} x2={x + barWidth} y1={time(bar.medianCalBp)} y2={time(bar.medianCalBp)} stroke={CHART_COLOURS.text} strokeWidth={1.25} />
                )}
              </g>
            );
          })}
        </svg>
      )}
    </div>
  );
}
