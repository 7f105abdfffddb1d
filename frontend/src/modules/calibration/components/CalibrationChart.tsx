import { area, line, scaleLinear } from 'd3';
import { useId, useMemo } from 'react';
import type { CurveCode } from '@/gql/graphql';
import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { ageScaleLabel } from '@/modules/ages/utils/formatAge';
import {
  closeDensity,
  densityPeak,
  normalDensityPoints,
  type AgeOnCurveAxis,
  type CalendarWindow,
  type CurveBandValue,
  type DensityPoint,
  type DensitySample,
  radiocarbonWindow,
} from '@/modules/calibration/utils/calibrationChart';
import { CHART_INK, CURVE_BAND_COLOURS } from '@/modules/calibration/utils/calibrationPalette';
import { useParentSize } from '@/modules/ui/hooks/useParentSize';

export type HpdRange = { olderCalBp: number; youngerCalBp: number; probability: number };

/** One calibrated age to draw: its measurement on the 14C axis and its calendar density. */
export type CalibrationSeries = {
  id: string;
  label: string;
  colour: string;
  /** The measured age as read against the unshifted curve; null for ages not measured in 14C. */
  measured: AgeOnCurveAxis | null;
  density: readonly DensityPoint[];
  hpd68: readonly HpdRange[];
  hpd95: readonly HpdRange[];
  medianCalBp: number;
};

export type CurveBand = { curve: CurveCode; name: string; points: readonly CurveBandValue[] };

export type CalibrationChartProps = {
  series: readonly CalibrationSeries[];
  bands: readonly CurveBand[];
  window: CalendarWindow;
};

const Y_AXIS_X = 52;
const STRIP_WIDTH = 64;
const STRIP_GAP = 10;
const PLOT_LEFT = Y_AXIS_X + STRIP_WIDTH + STRIP_GAP;
const RIGHT_MARGIN = 18;
const TOP = 14;
const ROW_BARS_HEIGHT = 16;
const X_AXIS_HEIGHT = 44;

/** A lone density gets room to show its shape; many share the height as ridgelines. */
function rowDensityHeight(count: number): number {
  return count <= 1 ? 64 : count <= 3 ? 44 : 30;
}

const calBpOf = (point: { calBp: number }) => point.calBp;
const probabilityOf = (point: DensityPoint) => point.probability;
const bandLowOf = (point: CurveBandValue) => point.c14Age - point.c14Sigma;
const bandHighOf = (point: CurveBandValue) => point.c14Age + point.c14Sigma;
const bandCentreOf = (point: CurveBandValue) => point.c14Age;
const sampleValueOf = (sample: DensitySample) => sample.value;
const sampleDensityOf = (sample: DensitySample) => sample.density;
const seriesKey = (series: CalibrationSeries) => series.id;

/**
 * Calibration drawn our way: the curve as a band (mu +- sigma) over 14C age against calendar
 * age; each measured age as a density standing left of the plot on the 14C axis, with its
 * +- 1 sigma shown as a faint band across the curve; each calendar density as its own row
 * below the plot, with the 68.3 % (thick) and 95.4 % (thin) highest-density ranges beneath.
 * Time runs left (older) to right (younger) in both age scales.
 */
export function CalibrationChart({ series, bands, window }: CalibrationChartProps) {
  const { ref, width } = useParentSize();
  const { tick, axisTicks, scale } = useAgeScale();
  const clipId = `calibration-clip${useId().replace(/:/g, '')}`;
  const plotRight = Math.max(PLOT_LEFT + 120, width - RIGHT_MARGIN);
  const mainHeight = Math.round(Math.min(340, Math.max(220, width * 0.36)));
  const mainBottom = TOP + mainHeight;
  const rowsTop = mainBottom + 16;
  const densityHeight = rowDensityHeight(series.length);
  const rowHeight = densityHeight + ROW_BARS_HEIGHT + 6;
  const rowsBottom = rowsTop + series.length * rowHeight;
  const height = rowsBottom + X_AXIS_HEIGHT;

  const xScale = useMemo(
    () => scaleLinear().domain([window.olderCalBp, window.youngerCalBp]).range([PLOT_LEFT, plotRight]),
    [window.olderCalBp, window.youngerCalBp, plotRight],
  );
  const measuredAges = useMemo(() => series.flatMap((item) => (item.measured ? [item.measured] : [])), [series]);
  const bandPoints = useMemo(() => bands.flatMap((band) => band.points), [bands]);
  const c14Domain = useMemo(() => radiocarbonWindow(bandPoints, measuredAges, window) ?? [0, 1], [bandPoints, measuredAges, window]);
  const yScale = useMemo(() => scaleLinear().domain(c14Domain).range([mainBottom, TOP]).nice(), [c14Domain, mainBottom]);

  const bandShapes = useMemo(() => {
    const fill = area<CurveBandValue>()
      .x((point) => xScale(calBpOf(point)))
      .y0((point) => yScale(bandLowOf(point)))
      .y1((point) => yScale(bandHighOf(point)));
    const centre = line<CurveBandValue>()
      .x((point) => xScale(calBpOf(point)))
      .y((point) => yScale(bandCentreOf(point)));
    return bands.map((band) => {
      const sorted = [...band.points].sort((a, b) => a.calBp - b.calBp);
      return { curve: band.curve, name: band.name, fill: fill(sorted) ?? '', centre: centre(sorted) ?? '' };
    });
  }, [bands, xScale, yScale]);

  const rows = useMemo(
    () =>
      series.map((item, index) => {
        const baseline = rowsTop + index * rowHeight + densityHeight;
        const peak = densityPeak(item.density) || 1;
        const calendarArea = area<DensityPoint>()
          .x((point) => xScale(calBpOf(point)))
          .y0(baseline)
          .y1((point) => baseline - (probabilityOf(point) / peak) * (densityHeight - 2));
        let measuredPath: string | null = null;
        if (item.measured) {
          const samples = normalDensityPoints(item.measured);
          const measuredPeak = Math.max(...samples.map(sampleDensityOf));
          const stripBase = PLOT_LEFT - STRIP_GAP;
          measuredPath =
            area<DensitySample>()
              .y((sample) => yScale(sampleValueOf(sample)))
              .x0(stripBase)
              .x1((sample) => stripBase - (sampleDensityOf(sample) / measuredPeak) * (STRIP_WIDTH - 6))(samples) ?? null;
        }
        return { item, baseline, calendarPath: calendarArea(closeDensity(item.density)) ?? '', measuredPath };
      }),
    [series, rowsTop, rowHeight, densityHeight, xScale, yScale],
  );

  const xTicks = axisTicks([window.olderCalBp, window.youngerCalBp], Math.max(3, Math.floor((plotRight - PLOT_LEFT) / 90)));
  const yTicks = yScale.ticks(6);
  const [yTop, yBottom] = [yScale.range()[1]!, yScale.range()[0]!];

  return (
    <div ref={ref} className="sc-chart-frame">
      {width > 0 && (
        <svg width={width} height={height} role="img" aria-label="Calibration of radiocarbon ages against the curve" className="sc-calibration-chart">
          <defs>
            <clipPath id={clipId}>
              <rect x={PLOT_LEFT} y={yTop} width={plotRight - PLOT_LEFT} height={yBottom - yTop} />
            </clipPath>
          </defs>

          {/* grid and frame of the main plot */}
          <g>
            {xTicks.map((value) => (
              <line key={`x${value}`} x1={xScale(value)} x2={xScale(value)} y1={yTop} y2={rowsBottom} stroke={CHART_INK.grid} />
            ))}
            {yTicks.map((value) => (
              <line key={`y${value}`} x1={Y_AXIS_X} x2={plotRight} y1={yScale(value)} y2={yScale(value)} stroke={CHART_INK.grid} />
            ))}
            <rect x={PLOT_LEFT} y={yTop} width={plotRight - PLOT_LEFT} height={yBottom - yTop} fill="none" stroke={CHART_INK.frame} />
          </g>

          {/* the curve bands */}
          <g clipPath={`url(#${clipId})`}>
            {bandShapes.map((shape) => (
              <g key={shape.curve}>
                <path d={shape.fill} fill={CURVE_BAND_COLOURS[shape.curve].fill} fillOpacity={0.55} />
                <path d={shape.centre} fill="none" stroke={CURVE_BAND_COLOURS[shape.curve].line} strokeWidth={0.8} />
              </g>
            ))}
            {rows.map(({ item }) =>
              item.measured ? (
                <rect
                  key={`sigma-${seriesKey(item)}`}
                  x={PLOT_LEFT}
                  width={plotRight - PLOT_LEFT}
                  y={yScale(item.measured.age + item.measured.sigma)}
                  height={yScale(item.measured.age - item.measured.sigma) - yScale(item.measured.age + item.measured.sigma)}
                  fill={item.colour}
                  fillOpacity={0.1}
                />
              ) : null,
            )}
          </g>

          {/* measured ages on the 14C axis */}
          <g>
            {rows.map(({ item, measuredPath }) =>
              measuredPath ? (
                <path key={`measured-${seriesKey(item)}`} d={measuredPath} fill={item.colour} fillOpacity={0.35} stroke={item.colour} strokeWidth={1} />
              ) : null,
            )}
          </g>

          {/* y axis: 14C age */}
          <g fontSize={11} fill={CHART_INK.text}>
            <line x1={Y_AXIS_X} x2={Y_AXIS_X} y1={yTop} y2={yBottom} stroke={CHART_INK.axis} />
            {yTicks.map((value) => (
              <g key={value} transform={`translate(${Y_AXIS_X},${yScale(value)})`}>
                <line x1={-4} x2={0} stroke={CHART_INK.axis} />
                <text x={-7} dy="0.32em" textAnchor="end" className="num">
                  {value}
                </text>
              </g>
            ))}
            <text transform={`translate(12,${(yTop + yBottom) / 2}) rotate(-90)`} textAnchor="middle" fill={CHART_INK.muted}>
              14C age (14C yr BP)
            </text>
          </g>

          {/* legend of the curves, inside the plot's top right corner */}
          <g fontSize={11} fill={CHART_INK.muted}>
            {bandShapes.map((shape, index) => (
              <g key={shape.curve} transform={`translate(${plotRight - 8},${yTop + 14 + index * 16})`}>
                <rect x={-18} y={-6} width={14} height={10} fill={CURVE_BAND_COLOURS[shape.curve].fill} stroke={CURVE_BAND_COLOURS[shape.curve].line} strokeWidth={0.6} />
                <text x={-24} dy="0.25em" textAnchor="end">
                  {shape.name} (μ ± σ)
                </text>
              </g>
            ))}
          </g>

          {/* calendar densities, one row per age */}
          <g fontSize={11}>
            {rows.map(({ item, baseline, calendarPath }) => {
              const bar68 = baseline + 5;
              const bar95 = baseline + 12;
              return (
                <g key={seriesKey(item)}>
                  <line x1={PLOT_LEFT} x2={plotRight} y1={baseline} y2={baseline} stroke={CHART_INK.frame} />
                  <path d={calendarPath} fill={item.colour} fillOpacity={0.45} stroke={item.colour} strokeWidth={1} />
                  <line
                    x1={xScale(item.medianCalBp)}
                    x2={xScale(item.medianCalBp)}
                    y1={baseline - densityHeight + 2}
                    y2={baseline}
                    stroke={item.colour}
                    strokeDasharray="2 2"
                  />
                  {item.hpd68.map((hpd) => (
                    <line
                      key={`68-${hpd.olderCalBp}`}
                      x1={xScale(hpd.olderCalBp)}
                      x2={xScale(hpd.youngerCalBp)}
                      y1={bar68}
                      y2={bar68}
                      stroke={item.colour}
                      strokeWidth={5}
                    />
                  ))}
                  {item.hpd95.map((hpd) => (
                    <g key={`95-${hpd.olderCalBp}`} stroke={item.colour} strokeWidth={1.5}>
                      <line x1={xScale(hpd.olderCalBp)} x2={xScale(hpd.youngerCalBp)} y1={bar95} y2={bar95} />
                      <line x1={xScale(hpd.olderCalBp)} x2={xScale(hpd.olderCalBp)} y1={bar95 - 3} y2={bar95 + 3} />
                      <line x1={xScale(hpd.youngerCalBp)} x2={xScale(hpd.youngerCalBp)} y1={bar95 - 3} y2={bar95 + 3} />
                    </g>
                  ))}
                  <text x={PLOT_LEFT - STRIP_GAP - 2} y={baseline - 8} textAnchor="end" fill={item.colour} fontWeight={600} className="num">
                    {item.label}
                  </text>
                </g>
              );
            })}
          </g>

          {/* x axis: calendar age */}
          <g fontSize={11} fill={CHART_INK.text} transform={`translate(0,${rowsBottom})`}>
            <line x1={PLOT_LEFT} x2={plotRight} stroke={CHART_INK.axis} />
            {xTicks.map((value) => (
              <g key={value} transform={`translate(${xScale(value)},0)`}>
                <line y1={0} y2={4} stroke={CHART_INK.axis} />
                <text y={16} textAnchor="middle" className="num">
                  {tick(value)}
                </text>
              </g>
            ))}
            <text x={(PLOT_LEFT + plotRight) / 2} y={34} textAnchor="middle" fill={CHART_INK.muted}>
              {scale === 'CAL_BP' ? 'calendar age (cal BP), older to the left' : `calendar year (${ageScaleLabel(scale)})`}
            </text>
          </g>
        </svg>
      )}
    </div>
  );
}
