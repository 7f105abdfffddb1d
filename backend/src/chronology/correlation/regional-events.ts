/**
 * Regional events: the connected groups of a correlation hypothesis's ties. Each tie says "these
 * two site events are the same earthquake", so sameness is transitive and the groups are the
 * connected components of the tie graph (found here by union-find with union by size and path
 * halving, Tarjan 1975, J. ACM 22(2):215-225). An event with no tie is a regional event of one.
 *
 * Two events of one site column are two earthquakes by construction (each horizon is a separate
 * contact), so a group may never hold two events of one site; ties that would do so are refused.
 */
import type { CalendarDensity } from '../common/density';

/** An event horizon at one site, as the correlation checks need it. */
export interface SiteEvent {
  readonly id: string;
  /** The researcher's label for the event, shown in messages (e.g. "E3"). */
  readonly name: string;
  readonly siteId: string;
  readonly siteName: string;
  /** Position of the site along the strike of the segment or margin (km). */
  readonly alongStrikeKm: number;
  /**
   * Stratigraphic order of the event within its site column, counted from the base: a larger
   * index is higher in the column, so younger. Only the order matters, not the spacing.
   */
  readonly orderIndexFromBase: number;
  /** Posterior calendar-age density of the event from the site's age model. */
  readonly posterior: CalendarDensity;
}

/** A correlator's claim that two site events are the same earthquake. */
export interface Tie {
  readonly id: string;
  readonly eventAId: string;
  readonly eventBId: string;
}

/** One connected group of tied events. */
export interface RegionalEventGroup {
  /** Stable id: the sorted member ids joined by "|", so the same members give the same id. */
  readonly id: string;
  /** Member event ids ordered along strike (then by id). */
  readonly memberIds: readonly string[];
  /** Ids of the ties inside the group. */
  readonly tieIds: readonly string[];
}

/** Input that no correlation can accept; the message is written for the correlator. */
export class CorrelationInputError extends Error {
  override readonly name = 'CorrelationInputError';
}

/** The separator of member ids in a regional event id. */
export const REGIONAL_EVENT_ID_SEPARATOR = '|';

/** The stable id of a regional event from its member ids, in any order. */
export function regionalEventId(memberIds: readonly string[]): string {
  return [...memberIds].sort().join(REGIONAL_EVENT_ID_SEPARATOR);
}

/**
 * Union-find over event indices that also keeps, per group, which event holds each site, so a
 * join of two groups can be refused in time proportional to the smaller group.
 */
class EventUnion {
  private readonly parent: Int32Array;
  private readonly size: Int32Array;
  /** Per root: siteId -> index of the group's event at that site. */
  private readonly sites: (Map<string, number> | undefined)[];

  constructor(private readonly events: readonly SiteEvent[]) {
    this.parent = new Int32Array(events.length);
    this.size = new Int32Array(events.length).fill(1);
    this.sites = events.map((event, i) => new Map([[event.siteId, i]]));
    for (let i = 0; i < events.length; i++) this.parent[i] = i;
  }

  root(i: number): number {
    let x = i;
    while (this.parent[x] !== x) {
      this.parent[x] = this.parent[this.parent[x]];
      x = this.parent[x];
    }
    return x;
  }

  /**
   * The pair of events (one from each group) at the same site, if joining the groups of `a` and
   * `b` would put two events of one site together; undefined when the join is allowed.
   */
  clash(a: number, b: number): [number, number] | undefined {
    const ra = this.root(a);
    const rb = this.root(b);
    if (ra === rb) return undefined;
    const [small, large] = this.size[ra] <= this.size[rb] ? [ra, rb] : [rb, ra];
    const largeSites = this.sites[large] as Map<string, number>;
    for (const [siteId, member] of this.sites[small] as Map<string, number>) {
      const other = largeSites.get(siteId);
      if (other !== undefined) return small === ra ? [member, other] : [other, member];
    }
    return undefined;
  }

  /** Join the groups of `a` and `b`; the caller has checked `clash` first. */
  join(a: number, b: number): void {
    const ra = this.root(a);
    const rb = this.root(b);
    if (ra === rb) return;
    const [small, large] = this.size[ra] <= this.size[rb] ? [ra, rb] : [rb, ra];
    const largeSites = this.sites[large] as Map<string, number>;
    for (const [siteId, member] of this.sites[small] as Map<string, number>) largeSites.set(siteId, member);
    this.sites[small] = undefined;
    this.parent[small] = large;
    this.size[large] += this.size[small];
  }
}

function indexEvents(events: readonly SiteEvent[]): Map<string, number> {
  const index = new Map<string, number>();
  events.forEach((event, i) => {
    if (index.has(event.id)) {
      throw new CorrelationInputError(`Event ${event.id} ("${event.name}") is listed twice.`);
    }
    index.set(event.id, i);
  });
  return index;
}

function tieEnds(tie: Tie, index: Map<string, number>): [number, number] {
  const a = index.get(tie.eventAId);
  const b = index.get(tie.eventBId);
  if (a === undefined || b === undefined) {
    const missing = a === undefined ? tie.eventAId : tie.eventBId;
    throw new CorrelationInputError(
      `Tie ${tie.id} refers to event ${missing}, which is not in this project's events.`,
    );
  }
  if (a === b) throw new CorrelationInputError(`Tie ${tie.id} ties an event to itself.`);
  return [a, b];
}

function eventLabel(event: SiteEvent): string {
  return `"${event.name}" at ${event.siteName}`;
}

/** Apply one tie to the union, refusing it with a message naming the events when it clashes. */
function applyTie(union: EventUnion, events: readonly SiteEvent[], tie: Tie, a: number, b: number): void {
  const clash = union.clash(a, b);
  if (clash) {
    const [x, y] = clash;
    const pair = `"${events[x].name}" and "${events[y].name}", both at ${events[x].siteName},`;
    const direct = (x === a && y === b) || (x === b && y === a);
    const how = direct
      ? `would tie ${pair} together`
      : `would join ${eventLabel(events[a])} with ${eventLabel(events[b])} and so, through their other ties, ` +
        `put ${pair} in one regional event`;
    throw new CorrelationInputError(`Tie ${tie.id} ${how}: two events of one site cannot be the same earthquake.`);
  }
  union.join(a, b);
}

function buildUnion(
  events: readonly SiteEvent[],
  ties: readonly Tie[],
): { union: EventUnion; index: Map<string, number> } {
  const index = indexEvents(events);
  const union = new EventUnion(events);
  for (const tie of ties) {
    const [a, b] = tieEnds(tie, index);
    applyTie(union, events, tie, a, b);
  }
  return { union, index };
}

/**
 * The regional events of a set of ties: every connected group of tied events, and every untied
 * event on its own. Throws `CorrelationInputError` when the ties put two events of one site in
 * one group, or name an event that is not given. Groups come in the order of their first event.
 */
export function regionalEvents(events: readonly SiteEvent[], ties: readonly Tie[]): RegionalEventGroup[] {
  const { union, index } = buildUnion(events, ties);
  const membersByRoot = new Map<number, number[]>();
  events.forEach((_, i) => {
    const root = union.root(i);
    const members = membersByRoot.get(root);
    if (members) members.push(i);
    else membersByRoot.set(root, [i]);
  });
  const tiesByRoot = new Map<number, string[]>();
  for (const tie of ties) {
    const root = union.root(index.get(tie.eventAId) as number);
    const groupTies = tiesByRoot.get(root);
    if (groupTies) groupTies.push(tie.id);
    else tiesByRoot.set(root, [tie.id]);
  }
  return [...membersByRoot].map(([root, members]) => {
    const memberIds = members
      .map((i) => events[i])
      .sort((p, q) => p.alongStrikeKm - q.alongStrikeKm || (p.id < q.id ? -1 : p.id > q.id ? 1 : 0))
      .map((event) => event.id);
    return { id: regionalEventId(memberIds), memberIds, tieIds: tiesByRoot.get(root) ?? [] };
  });
}

/**
 * Check that `newTie` can be added to `existingTies`: both events exist, they differ, and the
 * tie does not put two events of one site into one regional event, directly or through the
 * other ties of either group. Throws `CorrelationInputError` naming the events otherwise.
 */
export function validateTie(events: readonly SiteEvent[], existingTies: readonly Tie[], newTie: Tie): void {
  const { union, index } = buildUnion(events, existingTies);
  const [a, b] = tieEnds(newTie, index);
  applyTie(union, events, newTie, a, b);
}
