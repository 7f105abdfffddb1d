import { area, scaleLinear } from 'd3';
import { useMemo } from 'react';
import { TimeGridTicks } from '@/modules/ages/components/TimeGridTicks';
import { closeDensity, densityPeak, type DensityPoint } from '@/modules/calibration/utils/calibrationChart';
import { CHART_COLOURS } from '@/modules/correlation/utils/chartPalette';
import { createTimeScale, ladderTimeWindow } from '@/modules/correlation/utils/ladderLayout';
import { useParentSize } from '@/modules/ui/hooks/useParentSize';

const HEIGHT = 420;
const MARGIN = { top: 12, right: 12, bottom: 12, left: 64 };

const calBpOf = (point: DensityPoint) => point.calBp;
const probabilityOf = (point: DensityPoint) => point.probability;

export type CompactLadderEvent = { id: string; name: string; medianCalBp: number; density: readonly DensityPoint[] };

export type CompactSiteLadderProps = { events: readonly CompactLadderEvent[] };

/**
 * The site's events down its column: calendar time down the page (young at top), each
 * posterior a one-sided shape off the column line, labelled at its median.
 */
export function CompactSiteLadder({ events }: CompactSiteLadderProps) {
  const { ref, width } = useParentSize();
  const densities = useMemo(() => events.map((event) => event.density), [events]);
  const time = useMemo(() => createTimeScale(ladderTimeWindow(densities), MARGIN.top, HEIGHT - MARGIN.bottom), [densities]);
  const shapes = useMemo(() => {
    const peak = Math.max(...densities.map(densityPeak), 0) || 1;
    const spread = scaleLinear().domain([0, peak]).range([0, Math.max(width - MARGIN.left - MARGIN.right - 70, 20)]);
    return events.map((event) => ({
      ...event,
      path:
        area<DensityPoint>()
          .y((point) => time(calBpOf(point)))
          .x0(MARGIN.left)
          .x1((point) => MARGIN.left + spread(probabilityOf(point)))(closeDensity(event.density)) ?? '',
    }));
  }, [events, densities, time, width]);

  return (
    <div ref={ref} className="sc-chart-frame">
      {width > 0 && (
        <svg width={width} height={HEIGHT} role="img" aria-label="Events of this site down its column">
          <TimeGridTicks time={time} count={8} left={MARGIN.left} right={width - MARGIN.right} />
          <line x1={MARGIN.left} x2={MARGIN.left} y1={MARGIN.top} y2={HEIGHT - MARGIN.bottom} stroke={CHART_COLOURS.axis} />
          {shapes.map((event) => (
            <g key={event.id}>
              <path d={event.path} fill={CHART_COLOURS.posteriorFill} fillOpacity={0.75} stroke={CHART_COLOURS.posterior} strokeWidth={0.75} />
              <text x={width - MARGIN.right} y={time(event.medianCalBp)} dy="0.32em" textAnchor="end" fontSize={11} fill={CHART_COLOURS.text}>
                {event.name}
              </text>
            </g>
          ))}
        </svg>
      )}
    </div>
  );
}
