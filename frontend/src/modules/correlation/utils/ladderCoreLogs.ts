/**
 * Pure layout of core logs on the event ladder. The ladder's vertical axis is time, which a
 * core's depth does not share, so a log is placed bed by bed: each turbidite's readings are drawn
 * with the bed's base (its event horizon) at that event's median age on the ladder, and the bed's
 * thickness at a fixed number of pixels per metre, the same for every core so that thicknesses
 * compare. Mud between beds has no single age on the ladder and is not drawn. Beds come from the
 * core-drawing module's `coreScale` (facies TURBIDITE).
 */
import { coreScale, type CoreUnit } from '@/modules/core-drawing/utils/coreDepth';
import type { EventAnchor } from '@/modules/correlation/utils/ladderLayout';

/** A core's log channel as the API draws it: block means at increasing depths (m). */
export type LogTraceLike = { depthsM: readonly number[]; values: readonly number[] };

/** A core as the ladder's log lane needs it. */
export type LadderCoreLike = {
  siteId: string;
  units: readonly CoreUnit[];
  /** Event horizons with the unit above them: a bed's event is the horizon at its base. */
  horizons: readonly { id: string; unitAboveId: string }[];
  trace: LogTraceLike | null;
};

/** One bed's readings placed on the ladder. */
export type BedLogMark = {
  siteId: string;
  eventId: string;
  bedName: string;
  /** Pixel points top down: the bed's top reading first, its base at the event's median. */
  points: { x: number; y: number }[];
  /** The bed's span on screen, top and base (px), and the lane's left edge (px). */
  top: number;
  base: number;
  laneLeft: number;
};

/** Pixels per metre of bed thickness: `preferred`, or less if the thickest bed would pass `maxPixels`. */
export function bedPixelsPerMetre(cores: readonly Pick<LadderCoreLike, 'units'>[], preferred = 200, maxPixels = 60): number {
  let thickest = 0;
  for (const core of cores) {
    for (const segment of coreScale(core.units)?.segments ?? []) if (segment.isBed) thickest = Math.max(thickest, segment.baseDepthM - segment.topDepthM);
  }
  return thickest > 0 ? Math.min(preferred, maxPixels / thickest) : preferred;
}

/** The log lane left of a column's axis: from `axisX - gap - width` to `axisX - gap`. */
export type LogLane = { width: number; gap: number };

/**
 * Each bed of each core with an event on the ladder and readings inside the bed, as a polyline:
 * y = time(event median) - (bed base - depth) x pixelsPerMetre, x across the lane from the core's
 * lowest reading (left) to its highest (right) over the whole log, so a bed's excursion reads
 * against the core's own range.
 */
export function bedLogMarks(
  cores: readonly LadderCoreLike[],
  anchors: ReadonlyMap<string, EventAnchor>,
  columnX: (columnId: string) => number | undefined,
  time: (calBp: number) => number,
  pixelsPerMetre: number,
  lane: LogLane,
): BedLogMark[] {
  const marks: BedLogMark[] = [];
  for (const core of cores) {
    const axisX = columnX(core.siteId);
    const scale = coreScale(core.units);
    if (axisX === undefined || !scale || !core.trace) continue;
    const readings = core.trace.depthsM
      .map((depth, index) => ({ depth, value: core.trace!.values[index]! }))
      .filter((reading) => Number.isFinite(reading.depth) && Number.isFinite(reading.value));
    if (readings.length === 0) continue;
    const low = Math.min(...readings.map((reading) => reading.value));
    const high = Math.max(...readings.map((reading) => reading.value));
    const laneLeft = axisX - lane.gap - lane.width;
    const across = (value: number) => laneLeft + (high > low ? ((value - low) / (high - low)) * lane.width : lane.width / 2);
    for (const segment of scale.segments) {
      if (!segment.isBed) continue;
      const horizon = core.horizons.find((entry) => entry.unitAboveId === segment.unit.id);
      const anchor = horizon ? anchors.get(horizon.id) : undefined;
      if (!horizon || !anchor || anchor.medianCalBp === null) continue;
      const base = time(anchor.medianCalBp);
      const top = base - (segment.baseDepthM - segment.topDepthM) * pixelsPerMetre;
      const points = readings
        .filter((reading) => reading.depth >= segment.topDepthM && reading.depth <= segment.baseDepthM)
        .map((reading) => ({ x: across(reading.value), y: base - (segment.baseDepthM - reading.depth) * pixelsPerMetre }));
      if (points.length === 0) continue;
      marks.push({ siteId: core.siteId, eventId: horizon.id, bedName: segment.unit.name, points, top, base, laneLeft });
    }
  }
  return marks;
}

/** The channels a set of logs offers, in first-seen order, each once. */
export function logChannels(logs: readonly { channels: readonly string[] }[]): string[] {
  return [...new Set(logs.flatMap((log) => log.channels))];
}
