import { area, line, scaleLinear, ticks as niceTicks } from 'd3';
import { useMemo } from 'react';
import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { ageAxisTitle, horizontalAgeTicks } from '@/modules/ages/utils/formatAge';
import { closeDensity, densityPeak, type DensityPoint } from '@/modules/calibration/utils/calibrationChart';
import { CHART_COLOURS } from '@/modules/correlation/utils/chartPalette';
import { useParentSize } from '@/modules/ui/hooks/useParentSize';

const HEIGHT = 146;
const MARGIN = { top: 8, right: 12, bottom: 38, left: 12 };

const calBpOf = (point: DensityPoint) => point.calBp;
const probabilityOf = (point: DensityPoint) => point.probability;

/** A sample's calibrated likelihood drawn as an outline beside the event. */
export type LikelihoodOutline = { id: string; labCode: string; side: 'below' | 'above'; density: readonly DensityPoint[] };

export type EventPosteriorChartProps = {
  eventName: string;
  posterior: readonly DensityPoint[];
  likelihoods: readonly LikelihoodOutline[];
  /** The event's own calendar window, [younger, older] cal BP (eventChartWindow). */
  window: readonly [number, number];
};

/**
 * One event's posterior as a filled shape over the calibrated likelihoods of the samples in the
 * units around it as outlines. Each curve is scaled to its own peak: a posterior is far
 * narrower than a single calibration, and on a shared probability axis the likelihoods would
 * be flat lines. Older ages are on the left, so time runs left to right.
 */
export function EventPosteriorChart({ eventName, posterior, likelihoods, window }: EventPosteriorChartProps) {
  const { ref, width } = useParentSize();
  const { scale, range } = useAgeScale();
  const innerWidth = Math.max(width - MARGIN.left - MARGIN.right, 0);
  const innerHeight = HEIGHT - MARGIN.top - MARGIN.bottom;

  const time = useMemo(
    () => scaleLinear().domain([window[1], window[0]]).range([MARGIN.left, MARGIN.left + innerWidth]),
    [window, innerWidth],
  );

  const shapes = useMemo(() => {
    const outline = (density: readonly DensityPoint[], heightShare: number) => {
      const peak = densityPeak(density) || 1;
      const height = scaleLinear().domain([0, peak]).range([MARGIN.top + innerHeight, MARGIN.top + innerHeight * (1 - heightShare)]);
      return {
        area: area<DensityPoint>().x((point) => time(calBpOf(point))).y0(MARGIN.top + innerHeight).y1((point) => height(probabilityOf(point)))(closeDensity(density)) ?? '',
        line: line<DensityPoint>().x((point) => time(calBpOf(point))).y((point) => height(probabilityOf(point)))(closeDensity(density)) ?? '',
      };
    };
    return {
      posterior: outline(posterior, 1).area,
      likelihoods: likelihoods.map((likelihood) => ({ ...likelihood, path: outline(likelihood.density, 0.8).line })),
    };
  }, [posterior, likelihoods, time, innerHeight]);

  const ticks = horizontalAgeTicks([window[1], window[0]], scale, Math.max(Math.floor(innerWidth / 90), 2), niceTicks, time, [0, width]);

  return (
    <div ref={ref} className="sc-chart-frame">
      {width > 0 && (
        <svg width={width} height={HEIGHT} role="img" aria-label={`Posterior of ${eventName}, ${range(window[1], window[0])} window`}>
          {likelihoods.length > 0 &&
            shapes.likelihoods.map((likelihood) => (
              <path
                key={likelihood.id}
                d={likelihood.path}
                fill="none"
                stroke={likelihood.side === 'above' ? CHART_COLOURS.likelihoodAbove : CHART_COLOURS.likelihoodBelow}
                strokeWidth={1.25}
                strokeDasharray={likelihood.side === 'above' ? undefined : '4 2'}
              >
                <title>{`${likelihood.labCode} (${likelihood.side === 'above' ? 'unit above' : 'unit below'})`}</title>
              </path>
            ))}
          <path d={shapes.posterior} fill={CHART_COLOURS.posteriorFill} fillOpacity={0.7} stroke={CHART_COLOURS.posterior} strokeWidth={1} />
          <line x1={MARGIN.left} x2={MARGIN.left + innerWidth} y1={MARGIN.top + innerHeight} y2={MARGIN.top + innerHeight} stroke={CHART_COLOURS.axis} />
          {ticks.map(({ calBp, label, anchor }) => (
            <g key={calBp} transform={`translate(${time(calBp)},${MARGIN.top + innerHeight})`}>
              <line y2={4} stroke={CHART_COLOURS.axis} />
              <text y={16} textAnchor={anchor} fontSize={10} fill={CHART_COLOURS.mutedText} className="num">
                {label}
              </text>
            </g>
          ))}
          <text x={MARGIN.left + innerWidth / 2} y={HEIGHT - 4} textAnchor="middle" fontSize={10} fill={CHART_COLOURS.mutedText}>
            {ageAxisTitle(scale)} (older left)
          </text>
        </svg>
      )}
    </div>
  );
}
