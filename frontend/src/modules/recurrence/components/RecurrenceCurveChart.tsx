import { line, scaleLinear } from 'd3';
import { useMemo, type RefObject } from 'react';
import type { RenewalModel } from '@/gql/graphql';
import { CHART_COLOURS } from '@/modules/correlation/utils/chartPalette';
import { MODEL_LABELS, valuePeak, yearsExtent, type CurvePointLike, type DensityBin } from '@/modules/recurrence/utils/recurrenceCharts';
import { useParentSize } from '@/modules/ui/hooks/useParentSize';

const HEIGHT = 260;
const MARGIN = { top: 28, right: 16, bottom: 36, left: 74 };

const yearsOf = (point: CurvePointLike) => point.years;
const valueOf = (point: CurvePointLike) => point.value;

/** Models in a fixed order so each keeps its colour in every figure. */
export const MODEL_ORDER: readonly RenewalModel[] = ['POISSON', 'BPT', 'LOGNORMAL', 'WEIBULL'];

/** The colour of a renewal model's curves. */
export function modelColour(model: RenewalModel): string {
  return CHART_COLOURS.models[MODEL_ORDER.indexOf(model)] ?? CHART_COLOURS.axis;
}

export type ModelCurve = { model: RenewalModel; points: readonly CurvePointLike[] };

export type RecurrenceCurveChartProps = {
  curves: readonly ModelCurve[];
  /** Histogram bars on the curves' scale (interval histogram only). */
  bars?: readonly DensityBin[];
  /** A vertical marker, e.g. the time elapsed since the last event. */
  marker?: { years: number; label: string } | null;
  xLabel: string;
  yLabel: string;
  /** Upper end of the vertical axis; the data's peak when not given. */
  yMax?: number;
  /** Far end of the years axis (shared by both sides of a comparison); the data's when not given. */
  yearsMax?: number;
  figure: RefObject<SVGSVGElement | null>;
};

/** Renewal-model curves over years, with optional histogram bars and a marker; a legend on top. */
export function RecurrenceCurveChart({ curves, bars = [], marker, xLabel, yLabel, yMax, yearsMax, figure }: RecurrenceCurveChartProps) {
  const { ref, width } = useParentSize();
  const innerRight = width - MARGIN.right;
  const innerBottom = HEIGHT - MARGIN.bottom;
  const x = useMemo(
    () =>
      scaleLinear()
        .domain(yearsMax !== undefined ? [0, yearsMax] : yearsExtent(curves.map((curve) => curve.points), bars.map((bar) => ({ ...bar, count: 0 })), [marker?.years]))
        .range([MARGIN.left, innerRight]),
    [curves, bars, marker, innerRight, yearsMax],
  );
  const y = useMemo(
    () =>
      scaleLinear()
        .domain([0, (yMax ?? valuePeak(curves.map((curve) => curve.points), bars)) * 1.05])
        .range([innerBottom, MARGIN.top]),
    [curves, bars, yMax, innerBottom],
  );
  const paths = useMemo(() => {
    const path = line<CurvePointLike>()
      .defined((point) => Number.isFinite(valueOf(point)))
      .x((point) => x(yearsOf(point)))
      .y((point) => y(Math.min(valueOf(point), y.domain()[1]!)));
    return curves.map((curve) => ({ model: curve.model, d: path(curve.points as CurvePointLike[]) ?? '' }));
  }, [curves, x, y]);

  return (
    <div ref={ref} className="sc-chart-frame">
      {width > 0 && (
        <svg ref={figure} width={width} height={HEIGHT} role="img" aria-label={`${yLabel} against ${xLabel}`}>
          {y.ticks(5).map((value) => (
            <g key={value} transform={`translate(0,${y(value)})`}>
              <line x1={MARGIN.left} x2={innerRight} stroke={CHART_COLOURS.grid} />
              <text x={MARGIN.left - 6} dy="0.32em" textAnchor="end" fontSize={10} fill={CHART_COLOURS.mutedText} className="num">
                {y.tickFormat(5)(value)}
              </text>
            </g>
          ))}
          {x.ticks(6).map((value) => (
            <text key={value} x={x(value)} y={innerBottom + 14} textAnchor="middle" fontSize={10} fill={CHART_COLOURS.mutedText} className="num">
              {value}
            </text>
          ))}
          <text x={(MARGIN.left + innerRight) / 2} y={HEIGHT - 4} textAnchor="middle" fontSize={11} fill={CHART_COLOURS.text}>
            {xLabel}
          </text>
          <text transform={`translate(12,${(MARGIN.top + innerBottom) / 2}) rotate(-90)`} textAnchor="middle" fontSize={11} fill={CHART_COLOURS.text}>
            {yLabel}
          </text>
          {bars.map((bar) => (
            <rect
              key={bar.fromYears}
              x={x(bar.fromYears)}
              y={y(bar.density)}
              width={Math.max(x(bar.toYears) - x(bar.fromYears) - 1, 0.5)}
              height={innerBottom - y(bar.density)}
              fill={CHART_COLOURS.histogram}
            />
          ))}
          <line x1={MARGIN.left} x2={innerRight} y1={innerBottom} y2={innerBottom} stroke={CHART_COLOURS.axis} />
          {paths.map((path) => (
            <path key={path.model} d={path.d} fill="none" stroke={modelColour(path.model)} strokeWidth={1.75} />
          ))}
          {marker && Number.isFinite(marker.years) && (
            <g>
              <line x1={x(marker.years)} x2={x(marker.years)} y1={MARGIN.top} y2={innerBottom} stroke={CHART_COLOURS.warning} strokeWidth={1.5} strokeDasharray="5 3" />
              <text x={x(marker.years) + 4} y={MARGIN.top + 10} fontSize={10} fill={CHART_COLOURS.warning}>
                {marker.label}
              </text>
            </g>
          )}
          {curves.map((curve, index) => (
            <g key={curve.model} transform={`translate(${MARGIN.left + index * 92},12)`}>
              <line x2={16} stroke={modelColour(curve.model)} strokeWidth={2} />
              <text x={20} dy="0.32em" fontSize={10} fill={CHART_COLOURS.text}>
                {MODEL_LABELS[curve.model]}
              </text>
            </g>
          ))}
        </svg>
      )}
    </div>
  );
}
