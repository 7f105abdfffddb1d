import { area, line, scaleLinear, ticks as niceTicks, type ScaleLinear } from 'd3';
import { useId, useMemo, useState, type PointerEvent } from 'react';
import type { CurveCode } from '@/gql/graphql';
import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { ageAxisTitle, horizontalAgeTicks } from '@/modules/ages/utils/formatAge';
import {
  closeDensity,
  densityPeak,
  type AgeOnCurveAxis,
  type CalendarWindow,
  type CurveBandValue,
  type DensityPoint,
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

const LEFT = 112;
const RIGHT = 18;
const TOP = 10;
const PANEL_GAP = 22;
const CURVE_PANEL_HEIGHT = 150;
const AXIS_HEIGHT = 40;

/** A lone age gets a tall figure; several share the height as stacked rows. */
function rowHeight(count: number): number {
  return count <= 1 ? 150 : count <= 3 ? 90 : 60;
}

const calBpOf = (point: { calBp: number }) => point.calBp;
const probabilityOf = (point: DensityPoint) => point.probability;
const bandLowOf = (point: CurveBandValue) => point.c14Age - point.c14Sigma;
const bandHighOf = (point: CurveBandValue) => point.c14Age + point.c14Sigma;
const bandCentreOf = (point: CurveBandValue) => point.c14Age;

/** The curve's tabulated value nearest a calendar age, for the linked readout. */
function curveValueAt(points: readonly CurveBandValue[], calBp: number): CurveBandValue | null {
  let best: CurveBandValue | null = null;
  for (const point of points) if (!best || Math.abs(point.calBp - calBp) < Math.abs(best.calBp - calBp)) best = point;
  return best;
}

/**
 * Calibration drawn Stratochron's way. The main figure is the calendar age: each sample a row
 * with its density, the part inside its 95.4 % ranges shaded and the part inside its 68.3 %
 * ranges shaded darker, so the ranges are read in the density itself, with its median marked.
 * Below, in its own panel on the same calendar axis, the curve as a band (mu +- sigma) with each
 * measured age as a level band across it (its +- 1 sigma). Pointing anywhere draws one calendar
 * line through both panels and reads the curve there. Time runs left (older) to right.
 */
export function CalibrationChart({ series, bands, window }: CalibrationChartProps) {
  const { ref, width } = useParentSize();
  const { age, scale } = useAgeScale();
  const clipBase = `cal${useId().replace(/:/g, '')}`;
  const [pointerCalBp, setPointerCalBp] = useState<number | null>(null);
  const plotRight = Math.max(LEFT + 160, width - RIGHT);
  const densityRowHeight = rowHeight(series.length);
  const densityBottom = TOP + series.length * densityRowHeight;
  const curveTop = densityBottom + PANEL_GAP;
  const curveBottom = curveTop + CURVE_PANEL_HEIGHT;
  const height = curveBottom + AXIS_HEIGHT;

  const xScale = useMemo(
    () => scaleLinear().domain([window.olderCalBp, window.youngerCalBp]).range([LEFT, plotRight]),
    [window.olderCalBp, window.youngerCalBp, plotRight],
  );
  const measuredAges = useMemo(() => series.flatMap((item) => (item.measured ? [item.measured] : [])), [series]);
  const bandPoints = useMemo(() => bands.flatMap((band) => band.points), [bands]);
  const c14Domain = useMemo(() => radiocarbonWindow(bandPoints, measuredAges, window) ?? [0, 1], [bandPoints, measuredAges, window]);
  const yScale: ScaleLinear<number, number> = useMemo(() => scaleLinear().domain(c14Domain).range([curveBottom, curveTop]).nice(), [c14Domain, curveBottom, curveTop]);

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
      return { curve: band.curve, name: band.name, points: sorted, fill: fill(sorted) ?? '', centre: centre(sorted) ?? '' };
    });
  }, [bands, xScale, yScale]);

  const rows = useMemo(
    () =>
      series.map((item, index) => {
        const baseline = TOP + (index + 1) * densityRowHeight - 4;
        const peak = densityPeak(item.density) || 1;
        const path =
          area<DensityPoint>()
            .x((point) => xScale(calBpOf(point)))
            .y0(baseline)
            .y1((point) => baseline - (probabilityOf(point) / peak) * (densityRowHeight - 14))(closeDensity(item.density)) ?? '';
        return { item, index, baseline, path };
      }),
    [series, densityRowHeight, xScale],
  );

  const xTicks = horizontalAgeTicks([window.olderCalBp, window.youngerCalBp], scale, Math.max(3, Math.floor((plotRight - LEFT) / 90)), niceTicks, xScale, [LEFT - 30, width]);
  const yTicks = yScale.ticks(4);
  const [yTop, yBottom] = [yScale.range()[1]!, yScale.range()[0]!];
  const rangeClip = (item: CalibrationSeries, which: '68' | '95') => `${clipBase}-${which}-${item.id.replace(/[^\w-]/g, '')}`;

  const handlePointerMove = (event: PointerEvent<SVGRectElement>) => {
    const box = event.currentTarget.ownerSVGElement?.getBoundingClientRect();
    if (!box) return;
    const x = event.clientX - box.left;
    setPointerCalBp(x >= LEFT && x <= plotRight ? Math.round(xScale.invert(x)) : null);
  };
  const pointerCurve = pointerCalBp === null ? [] : bandShapes.map((shape) => ({ shape, value: curveValueAt(shape.points, pointerCalBp) }));

  return (
    <div ref={ref} className="sc-chart-frame">
      {width > 0 && (
        <svg width={width} height={height} role="img" aria-label="Calendar-age densities of the samples, with the calibration curve below" className="sc-calibration-chart">
          <defs>
            {rows.map(({ item, baseline }) => (
              <g key={item.id}>
                <clipPath id={rangeClip(item, '95')}>
                  {item.hpd95.map((hpd) => (
                    <rect key={hpd.olderCalBp} x={xScale(hpd.olderCalBp)} width={Math.max(xScale(hpd.youngerCalBp) - xScale(hpd.olderCalBp), 1)} y={baseline - densityRowHeight} height={densityRowHeight} />
                  ))}
                </clipPath>
                <clipPath id={rangeClip(item, '68')}>
                  {item.hpd68.map((hpd) => (
                    <rect key={hpd.olderCalBp} x={xScale(hpd.olderCalBp)} width={Math.max(xScale(hpd.youngerCalBp) - xScale(hpd.olderCalBp), 1)} y={baseline - densityRowHeight} height={densityRowHeight} />
                  ))}
                </clipPath>
              </g>
            ))}
            <clipPath id={`${clipBase}-curve`}>
              <rect x={LEFT} y={yTop} width={plotRight - LEFT} height={yBottom - yTop} />
            </clipPath>
          </defs>

          {/* calendar grid through both panels */}
          {xTicks.map(({ calBp }) => (
            <line key={`grid-${calBp}`} x1={xScale(calBp)} x2={xScale(calBp)} y1={TOP} y2={curveBottom} stroke={CHART_INK.grid} />
          ))}

          {/* main figure: one row per sample, ranges shaded inside the density */}
          <g fontSize={11}>
            {rows.map(({ item, baseline, path }) => (
              <g key={item.id}>
                <line x1={LEFT} x2={plotRight} y1={baseline} y2={baseline} stroke={CHART_INK.frame} />
                <path d={path} fill={item.colour} fillOpacity={0.12} stroke={item.colour} strokeWidth={1.25} />
                <path d={path} fill={item.colour} fillOpacity={0.35} clipPath={`url(#${rangeClip(item, '95')})`} />
                <path d={path} fill={item.colour} fillOpacity={0.45} clipPath={`url(#${rangeClip(item, '68')})`} />
                <path
                  d={`M${xScale(item.medianCalBp)},${baseline + 5}l-4,6h8z`}
                  fill={CHART_INK.text}
                  aria-label={`median ${age(item.medianCalBp)}`}
                />
                <text x={LEFT - 10} y={baseline - 10} textAnchor="end" fill={CHART_INK.text} fontWeight={600} className="num">
                  {item.label}
                </text>
                <text x={LEFT - 10} y={baseline + 3} textAnchor="end" fill={CHART_INK.muted} fontSize={10} className="num">
                  {age(item.medianCalBp)}
                </text>
              </g>
            ))}
          </g>

          {/* linked panel: the curve, each measured age a level band across it */}
          <g>
            <rect x={LEFT} y={yTop} width={plotRight - LEFT} height={yBottom - yTop} fill="none" stroke={CHART_INK.frame} />
            <g clipPath={`url(#${clipBase}-curve)`}>
              {series.map((item) =>
                item.measured ? (
                  <rect
                    key={`measured-${item.id}`}
                    x={LEFT}
                    width={plotRight - LEFT}
                    y={yScale(item.measured.age + item.measured.sigma)}
                    height={Math.max(yScale(item.measured.age - item.measured.sigma) - yScale(item.measured.age + item.measured.sigma), 1)}
                    fill={item.colour}
                    fillOpacity={0.18}
                    stroke={item.colour}
                    strokeOpacity={0.6}
                    strokeDasharray="3 2"
                  />
                ) : null,
              )}
              {bandShapes.map((shape) => (
                <g key={shape.curve}>
                  <path d={shape.fill} fill={CURVE_BAND_COLOURS[shape.curve].fill} fillOpacity={0.7} />
                  <path d={shape.centre} fill="none" stroke={CURVE_BAND_COLOURS[shape.curve].line} strokeWidth={0.9} />
                </g>
              ))}
            </g>
            <g fontSize={10} fill={CHART_INK.text}>
              {yTicks.map((value) => (
                <g key={value} transform={`translate(${LEFT},${yScale(value)})`}>
                  <line x1={-4} x2={0} stroke={CHART_INK.axis} />
                  <text x={-7} dy="0.32em" textAnchor="end" className="num">
                    {value}
                  </text>
                </g>
              ))}
              <text x={8} y={curveTop - 6} fill={CHART_INK.muted} fontSize={11}>
                Curve, 14C yr BP ({bandShapes.map((shape) => shape.name).join(', ')}; band μ ± σ, dashed bands: measured ages ± 1σ)
              </text>
            </g>
          </g>

          {/* calendar axis under both panels */}
          <g fontSize={11} fill={CHART_INK.text} transform={`translate(0,${curveBottom})`}>
            <line x1={LEFT} x2={plotRight} stroke={CHART_INK.axis} />
            {xTicks.map(({ calBp, label, anchor }) => (
              <g key={calBp} transform={`translate(${xScale(calBp)},0)`}>
                <line y1={0} y2={4} stroke={CHART_INK.axis} />
                <text y={16} textAnchor={anchor} className="num">
                  {label}
                </text>
              </g>
            ))}
            <text x={(LEFT + plotRight) / 2} y={33} textAnchor="middle" fill={CHART_INK.muted}>
              {ageAxisTitle(scale)}, older to the left
            </text>
          </g>

          {/* the linked calendar line and its readout */}
          {pointerCalBp !== null && (
            <g pointerEvents="none">
              <line x1={xScale(pointerCalBp)} x2={xScale(pointerCalBp)} y1={TOP} y2={curveBottom} stroke={CHART_INK.text} strokeDasharray="2 3" />
              <text
                x={xScale(pointerCalBp) + (xScale(pointerCalBp) > (LEFT + plotRight) / 2 ? -6 : 6)}
                y={curveTop + 12}
                textAnchor={xScale(pointerCalBp) > (LEFT + plotRight) / 2 ? 'end' : 'start'}
                fontSize={11}
                fill={CHART_INK.text}
                className="num sc-chart-readout"
              >
                {age(pointerCalBp)}
                {pointerCurve.map(({ shape, value }) => (value ? ` · ${shape.name.split(' ')[0]} ${Math.round(value.c14Age)} ± ${Math.round(value.c14Sigma)}` : ''))}
              </text>
            </g>
          )}
          <rect
            x={LEFT}
            y={TOP}
            width={plotRight - LEFT}
            height={curveBottom - TOP}
            fill="transparent"
            onPointerMove={handlePointerMove}
            onPointerLeave={() => setPointerCalBp(null)}
          />
        </svg>
      )}
    </div>
  );
}
