/**
 * Pure pieces of the age-depth chart of a core: which depth a point is drawn at (true or
 * event-free), the chart's windows, and the dated levels with their calibrated ranges.
 */
import type { CoreScale } from './coreDepth';

/** Which depth the chart's vertical axis shows. */
export type DepthAxis = 'TRUE' | 'EVENT_FREE';

export const DEPTH_AXIS_LABELS: Record<DepthAxis, string> = {
  TRUE: 'true depth (m)',
  EVENT_FREE: 'event-free depth (m)',
};

/** A point of the run's age-depth curve, as the API gives it. */
export type AgeDepthPoint = {
  depthM: number;
  eventFreeDepthM: number;
  medianCalBp: number;
  low95CalBp: number;
  high95CalBp: number;
};

/** A curve point on the chosen axis, top down. */
export type CurvePoint = { depth: number; median: number; young: number; old: number };

/**
 * The curve on the chosen axis, top down. On event-free depth every point of a bed falls on the
 * bed's one depth: of such a run of equal depths only the first and the last are kept, so the
 * curve passes a bed at once, and a gap in time at its base (mud the bed eroded) shows as a step
 * across at that depth.
 */
export function curveOnAxis(points: readonly AgeDepthPoint[], axis: DepthAxis): CurvePoint[] {
  const sorted = [...points].sort((a, b) => a.depthM - b.depthM);
  const result: CurvePoint[] = [];
  let runStart = -1;
  for (const point of sorted) {
    const depth = axis === 'TRUE' ? point.depthM : point.eventFreeDepthM;
    const next = { depth, median: point.medianCalBp, young: Math.min(point.low95CalBp, point.high95CalBp), old: Math.max(point.low95CalBp, point.high95CalBp) };
    const previous = result[result.length - 1];
    if (previous && Math.abs(previous.depth - depth) < 1e-9) {
      // Same depth as the run so far: the new point replaces the run's last unless that is its first.
      if (result.length - 1 > runStart) result[result.length - 1] = next;
      else result.push(next);
      continue;
    }
    runStart = result.length;
    result.push(next);
  }
  return result;
}

/** A dated level drawn on the chart: its depth and the calibrated 95.4 % ranges of its sample. */
export type DatedLevel = {
  id: string;
  label: string;
  depthM: number;
  excluded: boolean;
  medianCalBp: number | null;
  ranges: readonly { olderCalBp: number; youngerCalBp: number }[];
};

/** A level placed on the chosen axis. */
export type PlacedLevel = DatedLevel & { depth: number };

/** The levels on the chosen axis, those with a depth inside the core only. */
export function levelsOnAxis(levels: readonly DatedLevel[], scale: CoreScale, axis: DepthAxis): PlacedLevel[] {
  return levels
    .filter((level) => Number.isFinite(level.depthM) && level.depthM >= scale.topDepthM && level.depthM <= scale.baseDepthM)
    .map((level) => ({ ...level, depth: axis === 'TRUE' ? level.depthM : scale.eventFreeDepth(level.depthM) }));
}

/**
 * The age window of the chart, [younger, older] cal BP: the curve's whole 95 % band and every
 * level's ranges, padded by 5 % of the span on each side (at least 20 years), and never younger
 * than the recent end a sediment can have (-75 cal BP, AD 2025).
 */
export function ageWindow(curve: readonly CurvePoint[], levels: readonly PlacedLevel[]): [number, number] {
  const ages = [
    ...curve.flatMap((point) => [point.young, point.old]),
    ...levels.flatMap((level) => level.ranges.flatMap((range) => [range.olderCalBp, range.youngerCalBp])),
  ].filter((age) => Number.isFinite(age));
  if (ages.length === 0) return [0, 1000];
  const young = Math.min(...ages);
  const old = Math.max(...ages);
  const pad = Math.max(20, (old - young) * 0.05);
  return [Math.max(-75, young - pad), old + pad];
}

/** The depth window on the chosen axis: the whole core, from its top. */
export function depthWindow(scale: CoreScale, axis: DepthAxis): [number, number] {
  return axis === 'TRUE' ? [scale.topDepthM, scale.baseDepthM] : [0, Math.max(scale.eventFreeLengthM, 1e-6)];
}

/** A bed as the chart marks it: a band on true depth, a line (its top) on event-free depth. */
export type BedMark = { id: string; name: string; top: number; base: number };

export function bedsOnAxis(scale: CoreScale, axis: DepthAxis): BedMark[] {
  return scale.segments
    .filter((segment) => segment.isBed)
    .map((segment) => ({
      id: segment.unit.id,
      name: segment.unit.name,
      top: axis === 'TRUE' ? segment.topDepthM : segment.eventFreeTopM,
      base: axis === 'TRUE' ? segment.baseDepthM : segment.eventFreeBaseM,
    }));
}
