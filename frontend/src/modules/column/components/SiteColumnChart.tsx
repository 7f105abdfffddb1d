import { symbol, symbolCircle, symbolDiamond, symbolSquare, symbolTriangle, type SymbolType } from 'd3';
import { useId, useMemo, type KeyboardEvent } from 'react';
import type { DatingMethod, Facies } from '@/gql/graphql';
import { FaciesPatterns } from '@/modules/column/components/FaciesPatterns';
import {
  columnDepthDomain,
  columnHeightFor,
  columnLanes,
  createDepthScale,
  DEPTH_TICK_COUNT,
  eventContactDepth,
  layoutUnitBoxes,
  sampleDrawingDepth,
  spreadLabels,
  truncateLabel,
  type ColumnEventHorizon,
  type ColumnSample,
  type ColumnUnit,
  type UnitBox,
} from '@/modules/column/utils/columnLayout';
import { FACIES_STYLES, faciesGroundFill, faciesPatternId } from '@/modules/column/utils/facies';
import { useParentSize } from '@/modules/ui/hooks/useParentSize';

export type ChartUnit = ColumnUnit & { facies: Facies };
export type ChartSample = ColumnSample & { method: DatingMethod; marine: boolean; title: string };

export type SiteColumnChartProps = {
  units: readonly ChartUnit[];
  eventHorizons: readonly ColumnEventHorizon[];
  samples: readonly ChartSample[];
  onUnitClick?: (unitId: string) => void;
  onEventHorizonClick?: (eventHorizonId: string) => void;
  onSampleClick?: (sampleId: string) => void;
};

const MARGIN = { top: 28, bottom: 16 };
const HORIZON_LABEL_GAP = 26;
const SAMPLE_LABEL_GAP = 13;
/** Width of one character of the 11 px label face, for cutting unit names to the column. */
const LABEL_CHAR_WIDTH = 6.2;

const METHOD_SYMBOLS: Record<DatingMethod, SymbolType> = {
  RADIOCARBON: symbolDiamond,
  LUMINESCENCE: symbolCircle,
  HISTORICAL: symbolSquare,
  TEPHRA: symbolTriangle,
};

const unitKey = (box: UnitBox<ChartUnit>) => box.unit.id;
const tickLabel = (depth: number) => depth.toFixed(depth % 1 === 0 ? 0 : 1);

/** Colour of a sample marker: sea-blue for marine carbon, peat for land carbon, ochre for luminescence. */
function sampleInk(sample: ChartSample): string {
  if (sample.excluded) return 'var(--sc-silt-500)';
  if (sample.method === 'LUMINESCENCE') return 'var(--sc-ochre-600)';
  if (sample.method !== 'RADIOCARBON') return 'var(--sc-slate-600)';
  return sample.marine ? 'var(--sc-sea-600)' : 'var(--sc-peat-700)';
}

/** Enter and space act as a click on focusable chart parts. */
function keyActivates(action: () => void) {
  return (event: KeyboardEvent<SVGElement>) => {
    if (event.key === 'Enter' || event.key === ' ') {
      event.preventDefault();
      action();
    }
  };
}

/**
 * A site's column drawn to scale: units as boxes toned and textured by facies, event horizons
 * as marked contacts named on the left, samples as markers at their depth with their lab
 * codes on the right. React draws the SVG; d3 gives the depth scale, its ticks and the marker
 * shapes.
 */
export function SiteColumnChart({ units, eventHorizons, samples, onUnitClick, onEventHorizonClick, onSampleClick }: SiteColumnChartProps) {
  const { ref, width } = useParentSize();
  const idPrefix = useId().replace(/:/g, '');
  const domain = useMemo(() => columnDepthDomain(units, samples), [units, samples]);
  const height = columnHeightFor(domain, units.length) + MARGIN.top + MARGIN.bottom;
  const bottom = height - MARGIN.bottom;
  const [shallowest, deepest] = domain;
  const depthScale = useMemo(
    () => createDepthScale([shallowest, deepest], { top: MARGIN.top, bottom }),
    [shallowest, deepest, bottom],
  );
  const lanes = useMemo(() => columnLanes(width), [width]);
  const unitsById = useMemo(() => new Map(units.map((unit) => [unit.id, unit])), [units]);
  const boxes = useMemo(() => layoutUnitBoxes(units, depthScale), [units, depthScale]);

  const horizons = useMemo(() => {
    const placed = eventHorizons.flatMap((horizon) => {
      const depth = eventContactDepth(horizon, unitsById);
      return depth === null ? [] : [{ horizon, y: depthScale(depth) }];
    });
    const labelYs = spreadLabels(placed.map((item) => item.y), HORIZON_LABEL_GAP, [MARGIN.top, bottom]);
    return placed.map((item, index) => ({ ...item, labelY: labelYs[index]! }));
  }, [eventHorizons, unitsById, depthScale, bottom]);

  const markers = useMemo(() => {
    const placed = samples.flatMap((sample) => {
      const depth = sampleDrawingDepth(sample, unitsById);
      return depth === null ? [] : [{ sample, y: depthScale(depth) }];
    });
    const labelYs = spreadLabels(placed.map((item) => item.y), SAMPLE_LABEL_GAP, [MARGIN.top, bottom]);
    return placed.map((item, index) => ({ ...item, labelY: labelYs[index]! }));
  }, [samples, unitsById, depthScale, bottom]);

  const markerPaths = useMemo(() => {
    const paths = new Map<DatingMethod, string>();
    for (const method of Object.keys(METHOD_SYMBOLS) as DatingMethod[]) {
      paths.set(method, symbol(METHOD_SYMBOLS[method], 44)() ?? '');
    }
    return paths;
  }, []);

  const ticks = depthScale.ticks(DEPTH_TICK_COUNT);
  const columnRight = lanes.columnX + lanes.columnWidth;
  const maxLabelChars = Math.floor((lanes.columnWidth - 8) / LABEL_CHAR_WIDTH);

  return (
    <div ref={ref} className="sc-chart-frame">
      {width > 0 && (
        <svg width={width} height={height} className="sc-column-chart" role="img" aria-label="Stratigraphic column drawn to scale">
          <defs>
            <FaciesPatterns idPrefix={idPrefix} />
          </defs>

          <g className="sc-axis">
            <text x={lanes.axisX} y={12} textAnchor="end" className="sc-axis-title">
              depth m
            </text>
            <line x1={lanes.axisX} x2={lanes.axisX} y1={depthScale.range()[0]} y2={depthScale.range()[1]} />
            {ticks.map((tick) => (
              <g key={tick} transform={`translate(0,${depthScale(tick)})`}>
                <line x1={lanes.axisX - 4} x2={lanes.axisX} />
                <line x1={lanes.columnX} x2={columnRight} className="sc-grid-line" />
                <text x={lanes.axisX - 7} dy="0.32em" textAnchor="end" className="num">
                  {tickLabel(tick)}
                </text>
              </g>
            ))}
          </g>

          <g className="sc-units">
            {boxes.map((box) => {
              const { unit } = box;
              const style = FACIES_STYLES[unit.facies];
              const handleClick = onUnitClick ? () => onUnitClick(unit.id) : undefined;
              return (
                <g
                  key={unitKey(box)}
                  className={handleClick ? 'sc-clickable' : undefined}
                  onClick={handleClick}
                  onKeyDown={handleClick && keyActivates(handleClick)}
                  tabIndex={handleClick ? 0 : undefined}
                  role={handleClick ? 'button' : undefined}
                >
                  <title>{`${unit.position} · ${unit.name} · ${style.label} · ${unit.topDepthM}–${unit.baseDepthM} m`}</title>
                  <rect x={lanes.columnX} y={box.y} width={lanes.columnWidth} height={box.height} fill={faciesGroundFill(idPrefix, unit.facies)} />
                  <rect
                    x={lanes.columnX}
                    y={box.y}
                    width={lanes.columnWidth}
                    height={box.height}
                    fill={`url(#${faciesPatternId(idPrefix, unit.facies)})`}
                    className="sc-unit-box"
                  />
                  {box.height >= 15 && (
                    <text
                      x={lanes.columnX + lanes.columnWidth / 2}
                      y={box.y + box.height / 2}
                      dy="0.32em"
                      textAnchor="middle"
                      className="sc-unit-label"
                      fill={style.labelInk}
                    >
                      {truncateLabel(unit.name, maxLabelChars)}
                    </text>
                  )}
                </g>
              );
            })}
          </g>

          <g className="sc-horizons">
            {horizons.map(({ horizon, y, labelY }) => {
              const handleClick = onEventHorizonClick ? () => onEventHorizonClick(horizon.id) : undefined;
              const uncertain = horizon.quality >= 3;
              return (
                <g
                  key={horizon.id}
                  className={handleClick ? 'sc-horizon sc-clickable' : 'sc-horizon'}
                  onClick={handleClick}
                  onKeyDown={handleClick && keyActivates(handleClick)}
                  tabIndex={handleClick ? 0 : undefined}
                  role={handleClick ? 'button' : undefined}
                >
                  <title>{`${horizon.name}: event horizon, quality ${horizon.quality}`}</title>
                  <path
                    d={`M${lanes.horizonLabelX + 3},${labelY} L${lanes.columnX - 10},${labelY} L${lanes.columnX - 2},${y}`}
                    className="sc-horizon-leader"
                  />
                  <line
                    x1={lanes.columnX}
                    x2={columnRight}
                    y1={y}
                    y2={y}
                    className={uncertain ? 'sc-horizon-line sc-horizon-uncertain' : 'sc-horizon-line'}
                  />
                  <path d={`M${lanes.columnX - 7},${y - 4} L${lanes.columnX},${y} L${lanes.columnX - 7},${y + 4} Z`} className="sc-horizon-mark" />
                  <text x={lanes.horizonLabelX} y={labelY} dy="-0.1em" textAnchor="end" className="sc-horizon-label">
                    {truncateLabel(horizon.name, 14)}
                  </text>
                  <text x={lanes.horizonLabelX} y={labelY} dy="1.05em" textAnchor="end" className="sc-horizon-quality num">
                    {`Q${horizon.quality}`}
                  </text>
                </g>
              );
            })}
          </g>

          <g className="sc-samples">
            {markers.map(({ sample, y, labelY }) => {
              const handleClick = onSampleClick ? () => onSampleClick(sample.id) : undefined;
              const ink = sampleInk(sample);
              return (
                <g
                  key={sample.id}
                  className={handleClick ? 'sc-sample sc-clickable' : 'sc-sample'}
                  onClick={handleClick}
                  onKeyDown={handleClick && keyActivates(handleClick)}
                  tabIndex={handleClick ? 0 : undefined}
                  role={handleClick ? 'button' : undefined}
                >
                  <title>{sample.title}</title>
                  <line x1={columnRight} x2={lanes.sampleMarkerX - 5} y1={y} y2={y} stroke={ink} className="sc-sample-tick" />
                  <path
                    d={markerPaths.get(sample.method)}
                    transform={`translate(${lanes.sampleMarkerX},${y})`}
                    fill={sample.excluded ? 'var(--sc-paper)' : ink}
                    stroke={ink}
                    strokeWidth={sample.excluded ? 1.2 : 0.6}
                  />
                  {Math.abs(labelY - y) > 1 && (
                    <path d={`M${lanes.sampleMarkerX + 5},${y} L${lanes.sampleLabelX - 2},${labelY}`} className="sc-sample-leader" />
                  )}
                  <text
                    x={lanes.sampleLabelX}
                    y={labelY}
                    dy="0.32em"
                    className={sample.excluded ? 'sc-sample-label sc-sample-excluded num' : 'sc-sample-label num'}
                  >
                    {sample.labCode}
                  </text>
                </g>
              );
            })}
          </g>
        </svg>
      )}
    </div>
  );
}
