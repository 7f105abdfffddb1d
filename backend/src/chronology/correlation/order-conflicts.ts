/**
 * Stratigraphic order check of a correlation: superposition fixes the order of events within each
 * site column, and one earthquake cannot be both before and after another. So if regional events
 * X and Y both have members at sites S1 and S2, X must be younger than Y at both or older at both;
 * otherwise their ties cross on the event ladder (SPEC, Computation 3: "ties must not cross").
 */
import type { RegionalEventGroup, SiteEvent, Tie } from './regional-events';

export interface OrderConflict {
  readonly regionalEventAId: string;
  readonly regionalEventBId: string;
  /**
   * A tie of each regional event on the chain joining its members at the two sites; when a
   * single tie joins them directly, that tie. `tieAPathIds` / `tieBPathIds` hold the whole chain.
   */
  readonly tieAId: string;
  readonly tieBId: string;
  readonly tieAPathIds: readonly string[];
  readonly tieBPathIds: readonly string[];
  /** The two sites where the order is opposite, in along-strike order. */
  readonly siteIds: readonly [string, string];
  /** A plain-language statement of the conflict for the correlator. */
  readonly message: string;
}

interface GroupView {
  readonly group: RegionalEventGroup;
  /** siteId -> the group's event there. */
  readonly bySite: Map<string, SiteEvent>;
}

/** Tie ids on the chain from event `from` to event `to` inside one group (breadth-first). */
function tiePath(group: RegionalEventGroup, tiesById: Map<string, Tie>, from: string, to: string): string[] {
  const adjacency = new Map<string, { tieId: string; other: string }[]>();
  const link = (a: string, b: string, tieId: string): void => {
    const list = adjacency.get(a);
    if (list) list.push({ tieId, other: b });
    else adjacency.set(a, [{ tieId, other: b }]);
  };
  for (const tieId of group.tieIds) {
    const tie = tiesById.get(tieId) as Tie;
    link(tie.eventAId, tie.eventBId, tie.id);
    link(tie.eventBId, tie.eventAId, tie.id);
  }
  const reachedBy = new Map<string, { tieId: string; previous: string }>();
  const queue = [from];
  const seen = new Set([from]);
  for (let head = 0; head < queue.length && !seen.has(to); head++) {
    for (const { tieId, other } of adjacency.get(queue[head]) ?? []) {
      if (seen.has(other)) continue;
      seen.add(other);
      reachedBy.set(other, { tieId, previous: queue[head] });
      queue.push(other);
    }
  }
  const path: string[] = [];
  for (let at = to; at !== from; ) {
    const step = reachedBy.get(at);
    if (!step) return path;
    path.push(step.tieId);
    at = step.previous;
  }
  return path.reverse();
}

function youngerOrOlder(a: SiteEvent, b: SiteEvent): string {
  return a.orderIndexFromBase > b.orderIndexFromBase ? 'younger' : 'older';
}

/**
 * Every pair of regional events whose members are in opposite stratigraphic order at two shared
 * sites. One conflict is reported per pair of regional events, at the first crossing found going
 * along strike. Events of equal order index at one site carry no order and are skipped.
 */
export function orderConflicts(
  events: readonly SiteEvent[],
  groups: readonly RegionalEventGroup[],
  ties: readonly Tie[],
): OrderConflict[] {
  const eventsById = new Map(events.map((event) => [event.id, event]));
  const tiesById = new Map(ties.map((tie) => [tie.id, tie]));
  const views: GroupView[] = groups
    .filter((group) => group.memberIds.length >= 2)
    .map((group) => ({
      group,
      bySite: new Map(group.memberIds.map((id) => {
        const event = eventsById.get(id) as SiteEvent;
        return [event.siteId, event] as const;
      })),
    }));

  const conflicts: OrderConflict[] = [];
  for (let i = 0; i < views.length; i++) {
    for (let j = i + 1; j < views.length; j++) {
      const conflict = crossing(views[i], views[j], tiesById);
      if (conflict) conflicts.push(conflict);
    }
  }
  return conflicts;
}

function crossing(x: GroupView, y: GroupView, tiesById: Map<string, Tie>): OrderConflict | undefined {
  const [small, large] = x.bySite.size <= y.bySite.size ? [x, y] : [y, x];
  const shared: [SiteEvent, SiteEvent][] = [];
  for (const [siteId, event] of small.bySite) {
    const other = large.bySite.get(siteId);
    if (!other) continue;
    shared.push(small === x ? [event, other] : [other, event]);
  }
  if (shared.length < 2) return undefined;
  shared.sort(([p], [q]) => p.alongStrikeKm - q.alongStrikeKm || (p.siteId < q.siteId ? -1 : 1));

  let first: [SiteEvent, SiteEvent] | undefined;
  let firstSign = 0;
  for (const pair of shared) {
    const sign = Math.sign(pair[0].orderIndexFromBase - pair[1].orderIndexFromBase);
    if (sign === 0) continue;
    if (!first) {
      first = pair;
      firstSign = sign;
    } else if (sign !== firstSign) {
      return describeCrossing(x, y, first, pair, tiesById);
    }
  }
  return undefined;
}

function describeCrossing(
  x: GroupView,
  y: GroupView,
  [x1, y1]: [SiteEvent, SiteEvent],
  [x2, y2]: [SiteEvent, SiteEvent],
  tiesById: Map<string, Tie>,
): OrderConflict {
  const tieAPathIds = tiePath(x.group, tiesById, x1.id, x2.id);
  const tieBPathIds = tiePath(y.group, tiesById, y1.id, y2.id);
  const tieAId = tieAPathIds[0];
  const tieBId = tieBPathIds[0];
  const through = (path: readonly string[]): string =>
    path.length === 1 ? `tie ${path[0]}` : `ties ${path.join(', ')}`;
  const message =
    `At ${x1.siteName} "${x1.name}" is ${youngerOrOlder(x1, y1)} than "${y1.name}", but at ${x2.siteName} ` +
    `"${x2.name}" (tied to "${x1.name}" by ${through(tieAPathIds)}) is ${youngerOrOlder(x2, y2)} than ` +
    `"${y2.name}" (tied to "${y1.name}" by ${through(tieBPathIds)}): these correlations cross and cannot both hold.`;
  return {
    regionalEventAId: x.group.id,
    regionalEventBId: y.group.id,
    tieAId,
    tieBId,
    tieAPathIds,
    tieBPathIds,
    siteIds: [x1.siteId, x2.siteId],
    message,
  };
}
