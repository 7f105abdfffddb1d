import { scaleLinear, type ScaleLinear } from 'd3';

/** What the column drawing needs of a unit (depths in metres below the surface or core top). */
export type ColumnUnit = {
  id: string;
  position: number;
  name: string;
  topDepthM: number;
  baseDepthM: number;
};

/** What the column drawing needs of an event horizon. */
export type ColumnEventHorizon = {
  id: string;
  name: string;
  quality: number;
  unitBelowId: string;
  unitAboveId: string;
};

/** What the column drawing needs of a sample. */
export type ColumnSample = {
  id: string;
  labCode: string;
  unitId: string;
  depthM: number | null;
  excluded: boolean;
};

export type ColumnBounds = {
  top: number;
  bottom: number;
};

/** Pixels given to one metre of section before the height is clamped. */
const PIXELS_PER_METRE = 150;
const MIN_COLUMN_HEIGHT = 420;
/** Room each unit gets on average, so thin beds of a short core still show their names. */
const PIXELS_PER_UNIT = 30;
const MAX_COLUMN_HEIGHT = 960;
/** About this many depth ticks; the scale domain is rounded out to the same steps. */
export const DEPTH_TICK_COUNT = 5;

/**
 * Depth range of a column in metres, [shallowest, deepest]: from the surface (0) or the top of
 * the shallowest unit if that is above it, to the deepest unit base or sample. An empty column
 * gets one metre so the axis still has a scale.
 */
export function columnDepthDomain(units: readonly ColumnUnit[], samples: readonly ColumnSample[]): [number, number] {
  const depths = [
    ...units.flatMap((unit) => [unit.topDepthM, unit.baseDepthM]),
    ...samples.flatMap((sample) => (sample.depthM === null ? [] : [sample.depthM])),
  ];
  if (depths.length === 0) {
    return [0, 1];
  }
  const shallowest = Math.min(0, ...depths);
  const deepest = Math.max(...depths);
  return [shallowest, deepest > shallowest ? deepest : shallowest + 1];
}

/**
 * Drawing height for a column (depth stays to scale at any height): 150 px per metre, or 30 px
 * per unit when that is more, kept within 420 to 960 px.
 */
export function columnHeightFor([shallowest, deepest]: [number, number], unitCount = 0): number {
  const natural = Math.max((deepest - shallowest) * PIXELS_PER_METRE, unitCount * PIXELS_PER_UNIT);
  return Math.min(MAX_COLUMN_HEIGHT, Math.max(MIN_COLUMN_HEIGHT, Math.round(natural)));
}

/** Depth (m, increasing downwards) to vertical pixels; the domain is rounded out to nice metres. */
export function createDepthScale(domain: [number, number], bounds: ColumnBounds): ScaleLinear<number, number> {
  return scaleLinear().domain(domain).range([bounds.top, bounds.bottom]).nice(DEPTH_TICK_COUNT);
}

export type UnitBox<TUnit extends ColumnUnit = ColumnUnit> = {
  unit: TUnit;
  y: number;
  height: number;
};

/** One box per unit from its top to its base, deepest (oldest) first so younger units draw over. */
export function layoutUnitBoxes<TUnit extends ColumnUnit>(
  units: readonly TUnit[],
  depthScale: ScaleLinear<number, number>,
): UnitBox<TUnit>[] {
  return [...units]
    .sort((a, b) => a.position - b.position)
    .map((unit) => {
      const y = depthScale(unit.topDepthM);
      return { unit, y, height: Math.max(0, depthScale(unit.baseDepthM) - y) };
    });
}

/**
 * Depth of the contact an event horizon marks: the top of the unit below it, that is the
 * surface the pre-event deposits had when the event happened. Null when the unit is unknown.
 */
export function eventContactDepth(
  horizon: ColumnEventHorizon,
  unitsById: ReadonlyMap<string, ColumnUnit>,
): number | null {
  return unitsById.get(horizon.unitBelowId)?.topDepthM ?? null;
}

/** Depth a sample is drawn at: its own depth, else the middle of its unit, else null. */
export function sampleDrawingDepth(sample: ColumnSample, unitsById: ReadonlyMap<string, ColumnUnit>): number | null {
  if (sample.depthM !== null) {
    return sample.depthM;
  }
  const unit = unitsById.get(sample.unitId);
  return unit ? (unit.topDepthM + unit.baseDepthM) / 2 : null;
}

/**
 * Vertical positions for labels that want to sit at `anchors` but must be at least `minGap`
 * apart and inside [min, max]. Labels keep their order and move as little as a push-down then
 * push-up pass allows; if they cannot fit they are spread evenly over the whole range.
 * Returned in the order of `anchors`.
 */
export function spreadLabels(anchors: readonly number[], minGap: number, [min, max]: [number, number]): number[] {
  const order = anchors.map((anchor, index) => ({ anchor, index })).sort((a, b) => a.anchor - b.anchor);
  const count = order.length;
  const placed = new Array<number>(count);
  if (count === 0) {
    return [];
  }
  if ((count - 1) * minGap > max - min) {
    const step = count > 1 ? (max - min) / (count - 1) : 0;
    order.forEach((item, rank) => {
      placed[item.index] = count > 1 ? min + rank * step : (min + max) / 2;
    });
    return placed;
  }
  const positions = order.map((item) => Math.min(max, Math.max(min, item.anchor)));
  for (let rank = 1; rank < count; rank += 1) {
    positions[rank] = Math.max(positions[rank]!, positions[rank - 1]! + minGap);
  }
  positions[count - 1] = Math.min(positions[count - 1]!, max);
  for (let rank = count - 2; rank >= 0; rank -= 1) {
    positions[rank] = Math.min(positions[rank]!, positions[rank + 1]! - minGap);
  }
  order.forEach((item, rank) => {
    placed[item.index] = positions[rank]!;
  });
  return placed;
}

/** Horizontal lanes of the column drawing, left to right. */
export type ColumnLanes = {
  /** Right edge of the depth axis labels. */
  axisX: number;
  /** Right edge of the event horizon labels (right-aligned). */
  horizonLabelX: number;
  columnX: number;
  columnWidth: number;
  /** Centre of the sample markers. */
  sampleMarkerX: number;
  /** Left edge of the sample labels. */
  sampleLabelX: number;
};

const AXIS_WIDTH = 44;
const HORIZON_LABEL_WIDTH = 104;
const SAMPLE_LABEL_WIDTH = 104;
const MIN_COLUMN_WIDTH = 72;
const MAX_COLUMN_WIDTH = 200;

/**
 * Share a width between the lanes: the axis, the horizon labels and the sample labels keep
 * fixed widths, the column takes the rest within 72 to 200 px.
 */
export function columnLanes(width: number): ColumnLanes {
  const spare = width - AXIS_WIDTH - HORIZON_LABEL_WIDTH - SAMPLE_LABEL_WIDTH - 24;
  const columnWidth = Math.min(MAX_COLUMN_WIDTH, Math.max(MIN_COLUMN_WIDTH, spare));
  const axisX = AXIS_WIDTH;
  const horizonLabelX = axisX + HORIZON_LABEL_WIDTH - 16;
  const columnX = axisX + HORIZON_LABEL_WIDTH;
  const sampleMarkerX = columnX + columnWidth + 12;
  return { axisX, horizonLabelX, columnX, columnWidth, sampleMarkerX, sampleLabelX: sampleMarkerX + 10 };
}

/** A label cut to at most `maxChars` characters, ending in an ellipsis when cut. */
export function truncateLabel(text: string, maxChars: number): string {
  if (maxChars < 1) return '';
  return text.length <= maxChars ? text : `${text.slice(0, Math.max(0, maxChars - 1)).trimEnd()}…`;
}
