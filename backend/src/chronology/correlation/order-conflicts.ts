/**
 * Stratigraphic order check of a whole correlation as one graph. Superposition orders the events
 * of each site column (a lower event is older), and a tie says two site events are one
 * earthquake, so each regional event is one node: at every site it shares with another regional
 * event, the older member gives a directed edge older -> younger. One earthquake cannot be both
 * before and after another, so a hypothesis is consistent exactly when this graph has no directed
 * cycle (SPEC, Computation 3: "ties must not cross"; for three or more sites the pairwise check
 * is not enough: X older than Z at one site, Z older than Y at a second and Y older than X at a
 * third is impossible although each pair agrees wherever it meets).
 *
 * Each site column contributes its full order (every older -> younger pair), so the graph is
 * transitively closed within a site. A conflict is reported as a minimal cycle: an induced
 * (chordless) directed cycle, i.e. a cycle none of whose vertex subsets carries a shorter cycle;
 * any chord u -> w of a cycle would close a shorter one through w ... u. A pair of crossing ties
 * is a cycle of two. Induced cycles are enumerated by a depth-first search from each smallest
 * vertex that only extends the path with vertices adjacent to nothing on it but its end (the
 * pruning of chordless-cycle enumeration; cf. Uno & Satoh 2014, "An efficient algorithm for
 * enumerating chordless cycles and chordless paths", Discovery Science, LNCS 8777), so each cycle
 * is found once, starting from its smallest node. The search is bounded (`MAX_ORDER_CYCLES`,
 * `MAX_SEARCH_STEPS`) and says when it stopped early.
 *
 * Within a minimal cycle of three or more nodes, consecutive edges never share a site (two
 * consecutive edges at one site would give a chord by that site's order), so the cycle changes
 * site at every node, through the ties that join the node's members there.
 */
import type { RegionalEventGroup, SiteEvent, Tie } from './regional-events';

/** At most this many cycles are reported. */
export const MAX_ORDER_CYCLES = 200;
/** The depth-first search stops after this many extensions of a path. */
export const MAX_SEARCH_STEPS = 200_000;

/** One edge of a cycle: at `siteId` the member of one regional event lies below the other's. */
export interface OrderStep {
  readonly siteId: string;
  readonly siteName: string;
  /** The member of `fromRegionalEventId` at the site: lower in the column, so older. */
  readonly olderEventId: string;
  /** The member of `toRegionalEventId` at the site: higher, so younger. */
  readonly youngerEventId: string;
  readonly fromRegionalEventId: string;
  readonly toRegionalEventId: string;
}

/** One minimal cycle of the order graph: a set of ties that cannot all hold. */
export interface OrderConflict {
  /** The regional events on the loop, each older (at `steps[i]`'s site) than the next, cyclically. */
  readonly regionalEventIds: readonly string[];
  /** `steps[i]` goes from `regionalEventIds[i]` to `regionalEventIds[(i + 1) % n]`. */
  readonly steps: readonly OrderStep[];
  /**
   * `tiePaths[i]`: the ties inside `regionalEventIds[i]` joining its member where the loop enters
   * it (at the previous step's site) to its member where the loop leaves it.
   */
  readonly tiePaths: readonly (readonly string[])[];
  /** Every tie on the loop, in loop order. */
  readonly tieIds: readonly string[];
  /** Every site event on the loop (the steps' members), in loop order, without repeats. */
  readonly eventIds: readonly string[];
  /** The sites of the steps, in along-strike order, without repeats. */
  readonly siteIds: readonly string[];
  /** The first two regional events of the loop (the pair of a two-event loop). */
  readonly regionalEventAId: string;
  readonly regionalEventBId: string;
  /** The first tie of each of the first two tie paths, and those paths whole. */
  readonly tieAId: string;
  readonly tieBId: string;
  readonly tieAPathIds: readonly string[];
  readonly tieBPathIds: readonly string[];
  /** A plain-language statement of the loop for the correlator. */
  readonly message: string;
}

export interface OrderGraphCheck {
  readonly conflicts: OrderConflict[];
  /** True when the search stopped at `MAX_ORDER_CYCLES` or `MAX_SEARCH_STEPS`: there may be more. */
  readonly truncated: boolean;
}

interface Node {
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

/** The directed order graph over regional events seen at two or more sites. */
class OrderGraph {
  /** out[u]: v -> the sites (as events of u and v there) where u's member is older than v's. */
  readonly out: Map<number, { older: SiteEvent; younger: SiteEvent }[]>[];

  constructor(readonly nodes: readonly Node[]) {
    this.out = nodes.map(() => new Map());
    const atSite = new Map<string, { node: number; event: SiteEvent }[]>();
    nodes.forEach((node, index) => {
      for (const [siteId, event] of node.bySite) {
        const list = atSite.get(siteId);
        if (list) list.push({ node: index, event });
        else atSite.set(siteId, [{ node: index, event }]);
      }
    });
    for (const members of atSite.values()) {
      for (const a of members) {
        for (const b of members) {
          // Events at one order index carry no order between them.
          if (a.event.orderIndexFromBase >= b.event.orderIndexFromBase) continue;
          const edges = this.out[a.node];
          const witnesses = edges.get(b.node);
          const witness = { older: a.event, younger: b.event };
          if (witnesses) witnesses.push(witness);
          else edges.set(b.node, [witness]);
        }
      }
    }
    for (const edges of this.out) {
      for (const witnesses of edges.values()) {
        witnesses.sort((p, q) => p.older.alongStrikeKm - q.older.alongStrikeKm || (p.older.siteId < q.older.siteId ? -1 : 1));
      }
    }
  }

  has(u: number, v: number): boolean {
    return this.out[u].has(v);
  }
}

/** Every induced directed cycle of `graph` (node indices, each from its smallest node), bounded. */
function inducedCycles(graph: OrderGraph): { cycles: number[][]; truncated: boolean } {
  const cycles: number[][] = [];
  let steps = 0;
  let truncated = false;
  const path: number[] = [];
  const successors = graph.out.map((edges) => [...edges.keys()].sort((a, b) => a - b));

  const extend = (start: number): void => {
    const end = path[path.length - 1];
    for (const next of successors[end]) {
      if (truncated) return;
      if (next <= start) continue; // a cycle through a smaller node was found from that node
      if (++steps > MAX_SEARCH_STEPS) {
        truncated = true;
        return;
      }
      if (path.includes(next)) continue;
      // The new vertex may touch nothing on the path but its end (and the start, to close).
      let chord = false;
      for (let j = 0; j < path.length - 1 && !chord; j++) {
        const p = path[j];
        if (graph.has(p, next)) chord = true;
        else if (j > 0 && graph.has(next, p)) chord = true;
      }
      if (chord) continue;
      if (path.length > 1 && graph.has(next, end)) continue;
      if (graph.has(next, start)) {
        cycles.push([...path, next]);
        if (cycles.length >= MAX_ORDER_CYCLES) truncated = true;
        continue; // closing now is the only way: going on would make next -> start a chord
      }
      path.push(next);
      extend(start);
      path.pop();
    }
  };

  for (let start = 0; start < graph.nodes.length && !truncated; start++) {
    path.length = 0;
    path.push(start);
    extend(start);
  }
  return { cycles, truncated };
}

function quoted(event: SiteEvent): string {
  return `"${event.name}"`;
}

/** An event as a correlator names it: its label and its site (`"E3" at Kestrel Marsh`). */
function placed(event: SiteEvent): string {
  return `${quoted(event)} at ${event.siteName}`;
}

/** Members of a regional event named in a loop's message; more are counted. */
const MEMBERS_NAMED = 4;

/** A regional event by its members along strike (`"K1" at Kestrel Marsh + "H2" at Harrow Core`). */
function regionalEventName(node: Node): string {
  const members = [...node.bySite.values()].sort((a, b) => a.alongStrikeKm - b.alongStrikeKm || a.siteName.localeCompare(b.siteName));
  const named = members.slice(0, MEMBERS_NAMED).map(placed).join(' + ');
  return members.length > MEMBERS_NAMED ? `${named} + ${members.length - MEMBERS_NAMED} more` : named;
}

/** The events a chain of ties passes through between `from` and its far end, in order. */
function eventsBetween(from: string, path: readonly string[], tiesById: Map<string, Tie>, eventsById: Map<string, SiteEvent>): SiteEvent[] {
  const passed: SiteEvent[] = [];
  let at = from;
  for (const tieId of path.slice(0, -1)) {
    const tie = tiesById.get(tieId) as Tie;
    at = tie.eventAId === at ? tie.eventBId : tie.eventAId;
    passed.push(eventsById.get(at) as SiteEvent);
  }
  return passed;
}

function describeCycle(graph: OrderGraph, cycle: readonly number[], tiesById: Map<string, Tie>): OrderConflict {
  const n = cycle.length;
  // Consecutive edges of a minimal cycle share no site, so the first witness of each will do.
  const witnesses = cycle.map((u, i) => (graph.out[u].get(cycle[(i + 1) % n]) as { older: SiteEvent; younger: SiteEvent }[])[0]);
  const steps: OrderStep[] = witnesses.map((witness, i) => ({
    siteId: witness.older.siteId,
    siteName: witness.older.siteName,
    olderEventId: witness.older.id,
    youngerEventId: witness.younger.id,
    fromRegionalEventId: graph.nodes[cycle[i]].group.id,
    toRegionalEventId: graph.nodes[cycle[(i + 1) % n]].group.id,
  }));
  // Node i is entered by step i - 1 (at its younger end) and left by step i (at its older end).
  const tiePaths = cycle.map((u, i) => {
    const entered = witnesses[(i - 1 + n) % n].younger;
    const left = witnesses[i].older;
    return tiePath(graph.nodes[u].group, tiesById, entered.id, left.id);
  });
  const eventIds: string[] = [];
  for (const witness of witnesses) {
    for (const id of [witness.older.id, witness.younger.id]) if (!eventIds.includes(id)) eventIds.push(id);
  }
  const siteIds = [...new Set(witnesses.map((witness) => witness.older.siteId))].sort((a, b) => {
    const p = witnesses.find((w) => w.older.siteId === a)?.older as SiteEvent;
    const q = witnesses.find((w) => w.older.siteId === b)?.older as SiteEvent;
    return p.alongStrikeKm - q.alongStrikeKm || (a < b ? -1 : a > b ? 1 : 0);
  });

  // Ties are named by the events they join and regional events by their members: ids stay in the
  // structured fields, where clients look them up.
  const eventsById = new Map(cycle.flatMap((u) => [...graph.nodes[u].bySite.values()].map((event) => [event.id, event] as const)));
  const clauses = witnesses.map((witness, i) => {
    const next = (i + 1) % n;
    const partner = witnesses[next].older;
    const passed = eventsBetween(witness.younger.id, tiePaths[next], tiesById, eventsById);
    const through = passed.length === 0 ? '' : ` through ${passed.map(placed).join(' and ')}`;
    const tied = partner.id === witness.younger.id ? '' : `, which is tied to ${placed(partner)}${through}`;
    return `at ${witness.older.siteName} ${quoted(witness.older)} is older than ${quoted(witness.younger)}${tied}`;
  });
  const start = witnesses[0].older;
  const message =
    `${clauses.join('; ')}: ${n === 2 ? 'these correlations cross' : `these ${n} correlations make a loop and cross`}, ` +
    `putting ${placed(start)} before itself, so they cannot all hold. ` +
    `The regional events on this loop: ${cycle.map((u) => regionalEventName(graph.nodes[u])).join('; ')}.`;
  return {
    regionalEventIds: cycle.map((u) => graph.nodes[u].group.id),
    steps,
    tiePaths,
    tieIds: tiePaths.flat(),
    eventIds,
    siteIds,
    regionalEventAId: graph.nodes[cycle[0]].group.id,
    regionalEventBId: graph.nodes[cycle[1]].group.id,
    tieAId: tiePaths[0][0],
    tieBId: tiePaths[1][0],
    tieAPathIds: tiePaths[0],
    tieBPathIds: tiePaths[1],
    message: message.charAt(0).toUpperCase() + message.slice(1),
  };
}

/**
 * Every minimal order cycle of a hypothesis (see the module comment), each once, with the sites,
 * events and ties on it, and whether the bounded search stopped early. Events of equal order
 * index at one site carry no order; regional events seen at one site cannot be on a minimal cycle.
 */
export function orderGraphCheck(
  events: readonly SiteEvent[],
  groups: readonly RegionalEventGroup[],
  ties: readonly Tie[],
): OrderGraphCheck {
  const eventsById = new Map(events.map((event) => [event.id, event]));
  const tiesById = new Map(ties.map((tie) => [tie.id, tie]));
  const nodes: Node[] = groups
    .filter((group) => group.memberIds.length >= 2)
    .map((group) => ({
      group,
      bySite: new Map(
        group.memberIds.map((id) => {
          const event = eventsById.get(id) as SiteEvent;
          return [event.siteId, event] as const;
        }),
      ),
    }));
  const graph = new OrderGraph(nodes);
  const { cycles, truncated } = inducedCycles(graph);
  return { conflicts: cycles.map((cycle) => describeCycle(graph, cycle, tiesById)), truncated };
}

/** The minimal order cycles of a hypothesis (`orderGraphCheck` without the truncation flag). */
export function orderConflicts(
  events: readonly SiteEvent[],
  groups: readonly RegionalEventGroup[],
  ties: readonly Tie[],
): OrderConflict[] {
  return orderGraphCheck(events, groups, ties).conflicts;
}
