/**
 * Plain reshaping of the API's ladder and hypothesis answers into what the charts look up:
 * anchors by event id, site positions by event id, conflicting tie ids.
 */
import type { DensityPoint } from '@/modules/calibration/utils/calibrationChart';
import type { EventAnchor, HpdRangeLike } from '@/modules/correlation/utils/ladderLayout';

export type LadderEventLike = {
  medianCalBp?: number | null;
  eventHorizon: { id: string; name: string };
  hpd95: readonly HpdRangeLike[];
  density: readonly DensityPoint[];
};
export type LadderColumnLike = {
  site: { id: string; name: string; kind: string; alongStrikeKm: number };
  events: readonly LadderEventLike[];
};

/** Each event's column and median, by event id. */
export function eventAnchors(columns: readonly LadderColumnLike[]): Map<string, EventAnchor> {
  const anchors = new Map<string, EventAnchor>();
  for (const column of columns) {
    for (const event of column.events) {
      anchors.set(event.eventHorizon.id, { eventId: event.eventHorizon.id, columnId: column.site.id, medianCalBp: event.medianCalBp ?? null });
    }
  }
  return anchors;
}

/** The along-strike position of each event's site, by event id. */
export function eventSiteKm(columns: readonly LadderColumnLike[]): Map<string, number> {
  const positions = new Map<string, number>();
  for (const column of columns) for (const event of column.events) positions.set(event.eventHorizon.id, column.site.alongStrikeKm);
  return positions;
}

/** Ids of every tie on an order loop (a loop's ties when sent, else its two named ties). */
export function conflictingTieIds(
  conflicts: readonly { tieA: { id: string }; tieB: { id: string }; ties?: readonly { id: string }[] }[],
): Set<string> {
  const ids = new Set<string>();
  for (const conflict of conflicts) {
    ids.add(conflict.tieA.id);
    ids.add(conflict.tieB.id);
    for (const tie of conflict.ties ?? []) ids.add(tie.id);
  }
  return ids;
}

/** A thinned posterior as the API's DensityGrid sends it (values are mean probability per year). */
export type DensityGridLike = { startCalBp: number; stepYears: number; values: readonly number[] };

/**
 * A density grid as points for drawing: value i sits at startCalBp + i x stepYears. The values
 * are per year already, so shapes drawn from a grid and from a 1-year density share one scale.
 */
export function gridToDensity(grid: DensityGridLike | null | undefined): DensityPoint[] {
  if (!grid) return [];
  return grid.values.map((probability, index) => ({ calBp: grid.startCalBp + index * grid.stepYears, probability }));
}

export type RegionalCheckLike = {
  id: string;
  combinedMedianCalBp?: number | null;
  concordanceLow?: boolean | null;
  chiSquare?: { passes: boolean } | null;
};

/**
 * The number each regional event is shown with, youngest first (by combined median; those without
 * one last), so the list, the ladder's bands and the space-time bars name them alike ("R3").
 */
export function regionalEventNumbers<T extends RegionalCheckLike>(
  regionalEvents: readonly T[],
  medianOf: (regional: T) => number = (regional) => regional.combinedMedianCalBp ?? Infinity,
): Map<string, number> {
  const ordered = [...regionalEvents].sort((a, b) => medianOf(a) - medianOf(b));
  return new Map(ordered.map((regional, index) => [regional.id, index + 1]));
}

/**
 * Why a regional event fails its checks, in words, or an empty list: low concordance of its
 * members' ages, members not of one age by the same-age test, or a place in an order loop.
 */
export function regionalEventFailures(regional: RegionalCheckLike, loopRegionalEventIds: ReadonlySet<string>): string[] {
  const reasons: string[] = [];
  if (regional.concordanceLow) reasons.push('low concordance');
  if (regional.chiSquare && !regional.chiSquare.passes) reasons.push('not one age');
  if (loopRegionalEventIds.has(regional.id)) reasons.push('in an order loop');
  return reasons;
}

/** Ids of the regional events on any order loop. */
export function loopRegionalEventIds(conflicts: readonly { regionalEventIds: readonly string[] }[]): Set<string> {
  return new Set(conflicts.flatMap((conflict) => conflict.regionalEventIds));
}

export type TieKeyLike = { id: string; eventA: { id: string }; eventB: { id: string } };

/** A tie's identity across hypotheses: its two events, in either order. */
export function tiePairKey(tie: TieKeyLike): string {
  return [tie.eventA.id, tie.eventB.id].sort().join('+');
}

/** What two hypotheses tie differently: the ties each has that the other lacks (by event pair). */
export function tieDifferences<T extends TieKeyLike>(first: readonly T[], second: readonly T[]): { onlyFirst: T[]; onlySecond: T[] } {
  const firstKeys = new Set(first.map(tiePairKey));
  const secondKeys = new Set(second.map(tiePairKey));
  return {
    onlyFirst: first.filter((tie) => !secondKeys.has(tiePairKey(tie))),
    onlySecond: second.filter((tie) => !firstKeys.has(tiePairKey(tie))),
  };
}
