import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { verticalTicks } from '@/modules/ages/utils/ageAxis';
import { CHART_COLOURS } from '@/modules/correlation/utils/chartPalette';

export type TimeGridTicksProps = {
  /** The chart's vertical time scale (cal BP -> y). */
  time: { (calBp: number): number; domain: () => number[] };
  /** How many ticks to aim for. */
  count: number;
  /** x of the plot's left edge: labels end 8 px before it, grid lines start 4 px before it. */
  left: number;
  /** x of the plot's right edge, where grid lines end. */
  right: number;
};

/**
 * Grid lines and labels of a calendar axis drawn down the page (ladder, space-time, a site's
 * events), at round years of the chosen age scale (see `verticalTicks`).
 */
export function TimeGridTicks({ time, count, left, right }: TimeGridTicksProps) {
  const { tick, axisTicks } = useAgeScale();
  return (
    <>
      {verticalTicks(time, axisTicks, count).map((value) => (
        <g key={value} transform={`translate(0,${time(value)})`}>
          <line x1={left - 4} x2={right} stroke={CHART_COLOURS.grid} />
          <text x={left - 8} dy="0.32em" textAnchor="end" fontSize={10} fill={CHART_COLOURS.mutedText} className="num">
            {tick(value)}
          </text>
        </g>
      ))}
    </>
  );
}
