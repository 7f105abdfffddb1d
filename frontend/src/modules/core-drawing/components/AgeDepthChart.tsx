import { area, line, scaleLinear } from 'd3';
import { useId, useMemo, type Ref } from 'react';
import { FaciesPatterns } from '@/modules/column/components/FaciesPatterns';
import { spreadLabels, truncateLabel } from '@/modules/column/utils/columnLayout';
import { FACIES_STYLES, faciesGroundFill, faciesPatternId } from '@/modules/column/utils/facies';
import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { verticalTicks } from '@/modules/ages/utils/ageAxis';
import { ageScaleLabel } from '@/modules/ages/utils/formatAge';
import {
  ageWindow,
  bedsOnAxis,
  curveOnAxis,
  DEPTH_AXIS_LABELS,
  depthWindow,
  levelsOnAxis,
  type AgeDepthPoint,
  type CurvePoint,
  type DatedLevel,
  type DepthAxis,
} from '@/modules/core-drawing/utils/ageDepth';
import type { CoreScale } from '@/modules/core-drawing/utils/coreDepth';
import { CHART_COLOURS } from '@/modules/correlation/utils/chartPalette';

export type AgeDepthChartProps = {
  points: readonly AgeDepthPoint[];
  scale: CoreScale;
  levels: readonly DatedLevel[];
  /** Event horizons at their true depths. */
  horizons: readonly { id: string; name: string; depthM: number }[];
  axis: DepthAxis;
  width: number;
  height: number;
  title: string;
  svgRef?: Ref<SVGSVGElement>;
};

const MARGIN = { top: 46, right: 78, bottom: 54, left: 58 };
const INK = CHART_COLOURS.text;
const MUTED = CHART_COLOURS.mutedText;

/**
 * A core's age-depth curve: depth down the page (true or event-free), age across (older to the
 * right, in the reader's age scale), the posterior median with its central 95 % band, each
 * dated level as a bar over its calibrated 95.4 % ranges, the beds as textured bands (lines on
 * event-free depth), and the event horizons named at the right. Presentation attributes only,
 * so the SVG exports as it looks.
 */
export function AgeDepthChart({ points, scale, levels, horizons, axis, width, height, title, svgRef }: AgeDepthChartProps) {
  const idPrefix = useId().replace(/:/g, '');
  const ages = useAgeScale();
  const curve = useMemo(() => curveOnAxis(points, axis), [points, axis]);
  const placedLevels = useMemo(() => levelsOnAxis(levels, scale, axis), [levels, scale, axis]);
  const [young, old] = ageWindow(curve, placedLevels);
  const x = scaleLinear().domain([young, old]).range([MARGIN.left, width - MARGIN.right]);
  const y = scaleLinear().domain(depthWindow(scale, axis)).range([MARGIN.top, height - MARGIN.bottom]);
  const plotRight = width - MARGIN.right;
  const plotBottom = height - MARGIN.bottom;
  const toDepth = (depthM: number) => (axis === 'TRUE' ? depthM : scale.eventFreeDepth(depthM));

  const band = area<CurvePoint>()
    .y((point) => y(point.depth))
    .x0((point) => x(point.young))
    .x1((point) => x(point.old))(curve);
  const median = line<CurvePoint>()
    .x((point) => x(point.median))
    .y((point) => y(point.depth))(curve);
  const ageTicks = verticalTicks(x, ages.axisTicks, Math.max(3, Math.round((plotRight - MARGIN.left) / 90)));
  const depthTicks = y.ticks(Math.max(4, Math.round((plotBottom - MARGIN.top) / 55)));
  const beds = bedsOnAxis(scale, axis);
  const horizonYs = horizons.map((horizon) => y(toDepth(horizon.depthM)));
  const horizonLabelYs = spreadLabels(horizonYs, 12, [MARGIN.top, plotBottom]);

  return (
    <svg ref={svgRef} width={width} height={height} role="img" aria-label={title} fontSize={10} fill={INK}>
      <title>{title}</title>
      <defs>
        <FaciesPatterns idPrefix={idPrefix} />
        <clipPath id={`${idPrefix}-plot`}>
          <rect x={MARGIN.left} y={MARGIN.top} width={Math.max(0, plotRight - MARGIN.left)} height={Math.max(0, plotBottom - MARGIN.top)} />
        </clipPath>
      </defs>

      {/* age axis on top */}
      <text x={(MARGIN.left + plotRight) / 2} y={13} textAnchor="middle" fontWeight={600}>
        {`age (${ageScaleLabel(ages.scale)}), older to the right →`}
      </text>
      {ageTicks.map((tick) => (
        <g key={tick} transform={`translate(${x(tick)},0)`}>
          <line y1={MARGIN.top - 4} y2={plotBottom} stroke={CHART_COLOURS.grid} />
          <text y={MARGIN.top - 8} textAnchor="middle" className="num" fill={MUTED}>
            {ages.tick(tick)}
          </text>
        </g>
      ))}

      {/* depth axis on the left */}
      <text transform={`translate(14,${(MARGIN.top + plotBottom) / 2}) rotate(-90)`} textAnchor="middle" fontWeight={600}>
        {DEPTH_AXIS_LABELS[axis]}
      </text>
      {depthTicks.map((tick) => (
        <g key={tick} transform={`translate(0,${y(tick)})`}>
          <line x1={MARGIN.left - 4} x2={plotRight} stroke={CHART_COLOURS.grid} />
          <text x={MARGIN.left - 7} dy="0.32em" textAnchor="end" className="num" fill={MUTED}>
            {tick.toFixed(tick % 1 === 0 ? 0 : 1)}
          </text>
        </g>
      ))}

      <g clipPath={`url(#${idPrefix}-plot)`}>
        {/* beds: textured bands on true depth, a line on event-free depth */}
        {beds.map((bed) =>
          axis === 'TRUE' ? (
            <g key={bed.id}>
              <title>{`${bed.name}: event bed, ${bed.top}–${bed.base} m`}</title>
              <rect x={MARGIN.left} width={plotRight - MARGIN.left} y={y(bed.top)} height={Math.max(1, y(bed.base) - y(bed.top))} fill={faciesGroundFill(idPrefix, 'TURBIDITE')} fillOpacity={0.55} />
              <rect x={MARGIN.left} width={plotRight - MARGIN.left} y={y(bed.top)} height={Math.max(1, y(bed.base) - y(bed.top))} fill={`url(#${faciesPatternId(idPrefix, 'TURBIDITE')})`} />
            </g>
          ) : (
            <line key={bed.id} x1={MARGIN.left} x2={plotRight} y1={y(bed.top)} y2={y(bed.top)} stroke={FACIES_STYLES.TURBIDITE.ink} strokeDasharray="4 3">
              <title>{`${bed.name}: event bed (no thickness on event-free depth)`}</title>
            </line>
          ),
        )}
        {band && <path d={band} fill={CHART_COLOURS.posteriorFill} fillOpacity={0.4} stroke="none" />}
        {median && <path d={median} fill="none" stroke={CHART_COLOURS.posterior} strokeWidth={1.8} />}

        {/* dated levels: a bar over each calibrated 95.4 % range, a diamond at the median */}
        {placedLevels.map((level) => {
          const ly = y(level.depth);
          const ink = level.excluded ? MUTED : CHART_COLOURS.likelihoodBelow;
          return (
            <g key={level.id}>
              <title>{`${level.label} at ${level.depthM} m: calibrated ${level.ranges.length > 0 ? ages.ranges(level.ranges) : 'range not known'} (95.4 %)${level.excluded ? ', excluded from the model' : ''}`}</title>
              {level.ranges.map((range) => (
                <g key={`${range.olderCalBp}-${range.youngerCalBp}`} stroke={ink} strokeWidth={1.6} strokeDasharray={level.excluded ? '3 2' : undefined}>
                  <line x1={x(range.youngerCalBp)} x2={x(range.olderCalBp)} y1={ly} y2={ly} />
                  <line x1={x(range.youngerCalBp)} x2={x(range.youngerCalBp)} y1={ly - 3} y2={ly + 3} />
                  <line x1={x(range.olderCalBp)} x2={x(range.olderCalBp)} y1={ly - 3} y2={ly + 3} />
                </g>
              ))}
              {level.medianCalBp !== null && (
                <path
                  d={`M${x(level.medianCalBp)},${ly - 4} L${x(level.medianCalBp) + 4},${ly} L${x(level.medianCalBp)},${ly + 4} L${x(level.medianCalBp) - 4},${ly} Z`}
                  fill={level.excluded ? '#ffffff' : ink}
                  stroke={ink}
                />
              )}
            </g>
          );
        })}
      </g>
      <rect x={MARGIN.left} y={MARGIN.top} width={Math.max(0, plotRight - MARGIN.left)} height={Math.max(0, plotBottom - MARGIN.top)} fill="none" stroke={CHART_COLOURS.axis} strokeWidth={0.6} />

      {/* event horizons named at the right */}
      {horizons.map((horizon, index) => {
        const hy = horizonYs[index]!;
        const labelY = horizonLabelYs[index] ?? hy;
        return (
          <g key={horizon.id}>
            <path d={`M${plotRight},${hy} L${plotRight + 8},${hy} L${plotRight + 14},${labelY}`} fill="none" stroke={INK} strokeWidth={0.8} />
            <text x={plotRight + 17} y={labelY} dy="0.32em">
              {truncateLabel(horizon.name, 10)}
            </text>
          </g>
        );
      })}

      {/* legend */}
      <g transform={`translate(${MARGIN.left},${plotBottom + 20})`} fontSize={9.5}>
        <line x1={0} x2={18} y1={5} y2={5} stroke={CHART_COLOURS.posterior} strokeWidth={1.8} />
        <text x={23} y={8}>median age</text>
        <rect x={92} y={0} width={18} height={10} fill={CHART_COLOURS.posteriorFill} fillOpacity={0.4} />
        <text x={115} y={8}>central 95 % of the posterior</text>
        <line x1={0} x2={18} y1={22} y2={22} stroke={CHART_COLOURS.likelihoodBelow} strokeWidth={1.6} />
        <path d="M9,18 L13,22 L9,26 L5,22 Z" fill={CHART_COLOURS.likelihoodBelow} />
        <text x={23} y={25}>dated level: calibrated 95.4 % range, median</text>
        {axis === 'TRUE' ? (
          <>
            <rect x={240} y={17} width={18} height={10} fill={faciesGroundFill(idPrefix, 'TURBIDITE')} fillOpacity={0.55} />
            <rect x={240} y={17} width={18} height={10} fill={`url(#${faciesPatternId(idPrefix, 'TURBIDITE')})`} />
          </>
        ) : (
          <line x1={240} x2={258} y1={22} y2={22} stroke={FACIES_STYLES.TURBIDITE.ink} strokeDasharray="4 3" />
        )}
        <text x={263} y={25}>{axis === 'TRUE' ? 'turbidite bed' : 'turbidite bed (no thickness here)'}</text>
      </g>
    </svg>
  );
}
