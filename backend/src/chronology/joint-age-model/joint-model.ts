/**
 * The joint model's structure: every site's column turned into its order graph (the site model's
 * `buildOrderGraph`), the graphs joined into one order on ages in which each regional event is a
 * single node shared by its members' columns, and the inputs that cannot be modelled refused with
 * a message naming the sites and events concerned.
 *
 * Nodes of the joint graph: per site its end and start boundaries, its events that are tied into
 * no regional event and the deposit ages of its modelled samples; and one node per regional
 * event, standing for every member site event. An edge joins two nodes when they are neighbours
 * in some site's covering relation (younger -> older), so a regional event node has neighbours in
 * every member site.
 */
import { ColumnProblemError, NodeKind, OrderGraph, buildOrderGraph } from '../age-model/column';
import { CalendarWindow, DepositLikelihood, MixtureLikelihoods, depositLikelihood, modelWindow } from '../age-model/likelihood';
import type { OrderAdjacency } from '../age-model/sampler';
import { CalendarDensity } from '../common/density';
import { orderGraphCheck } from '../correlation/order-conflicts';
import type { RegionalEventGroup, SiteEvent, Tie } from '../correlation/regional-events';
import type { JointChainSettings, JointModelInput } from './types';

/**
 * The input cannot be modelled jointly: a member that is not in its site's column, two members at
 * one site, a site event in two regional events, an order cycle through the ties, or a site whose
 * column has problems. `subjectIds` names the sites, regional events and site events concerned.
 */
export class JointModelInputError extends Error {
  constructor(
    message: string,
    readonly subjectIds: readonly string[],
  ) {
    super(message);
    this.name = 'JointModelInputError';
  }
}

/** One site of the joint graph. */
export interface JointSite {
  readonly siteId: string;
  readonly siteName: string;
  /** The site's own order graph (local node numbering of the site model). */
  readonly graph: OrderGraph;
  /** Global node of each local node. */
  readonly nodes: Int32Array;
  readonly endNode: number;
  readonly startNode: number;
  /** m: the site's events plus deposits, the exponent of its uniform deposition prior. */
  readonly uniformCount: number;
  /** Index of the site's first sample among all deposit likelihoods. */
  readonly firstSample: number;
  /** Local nodes sorted by first stage (young to old), and where each stage begins in that list. */
  readonly localYoungToOld: Int32Array;
  readonly firstAtStage: Int32Array;
}

export interface JointGraph extends OrderAdjacency {
  readonly sites: readonly JointSite[];
  /** Deposit likelihood index of each node (-1 if none). */
  readonly depositOf: Int32Array;
  /** Site of each node, -1 for a regional event node shared by two or more sites. */
  readonly siteOf: Int32Array;
  /** For a start or end boundary node, the other boundary of its site (else -1). */
  readonly otherBoundary: Int32Array;
  /** Node of each regional event (input order). */
  readonly regionalNodes: Int32Array;
  /** Every site event, site by site, oldest first within a site, and its node. */
  readonly siteEvents: readonly { readonly siteId: string; readonly eventHorizonId: string }[];
  readonly siteEventNodes: Int32Array;
  /** Every modelled sample, site by site, and its node. */
  readonly samples: readonly { readonly siteId: string; readonly sampleId: string; readonly site: number; readonly local: number }[];
  readonly sampleNodes: Int32Array;
  /** A young-to-old linear extension of the joint order. */
  readonly youngToOld: Int32Array;
}

export interface JointModel {
  readonly graph: JointGraph;
  readonly likelihoods: MixtureLikelihoods;
  readonly window: CalendarWindow;
}

function quoted(text: string | undefined, fallback: string): string {
  return `"${text !== undefined && text.trim() !== '' ? text : fallback}"`;
}

/** Check ties against the columns and build the joint order graph (throws JointModelInputError). */
export function buildJointGraph(input: JointModelInput): JointGraph {
  if (input.sites.length === 0) throw new JointModelInputError('A joint age model needs at least one site.', []);
  const siteIndex = new Map<string, number>();
  input.sites.forEach((site, s) => {
    if (siteIndex.has(site.siteId)) {
      throw new JointModelInputError(`Site ${quoted(site.siteName, site.siteId)} is given twice.`, [site.siteId]);
    }
    siteIndex.set(site.siteId, s);
  });
  const graphs = input.sites.map((site) => {
    try {
      return buildOrderGraph(site.column);
    } catch (error) {
      if (error instanceof ColumnProblemError) {
        throw new JointModelInputError(
          `The column of site ${quoted(site.siteName, site.siteId)} cannot be modelled: ${error.problems.map((p) => p.message).join(' ')}`,
          [site.siteId, ...error.problems.flatMap((p) => p.subjectIds)],
        );
      }
      throw error;
    }
  });

  // Which regional event each site event belongs to.
  const regionalOf = new Map<string, number>();
  const key = (siteId: string, eventId: string): string => `${siteId}\u0000${eventId}`;
  input.regionalEvents.forEach((regional, r) => {
    const label = quoted(regional.name, regional.regionalEventId);
    if (regional.members.length === 0) {
      throw new JointModelInputError(`Regional event ${label} has no member site event.`, [regional.regionalEventId]);
    }
    const seenSites = new Map<string, string>();
    for (const member of regional.members) {
      const s = siteIndex.get(member.siteId);
      if (s === undefined) {
        throw new JointModelInputError(
          `Regional event ${label} has a member at site "${member.siteId}", which is not among the sites of the run.`,
          [regional.regionalEventId, member.siteId],
        );
      }
      const site = input.sites[s];
      const horizon = site.column.eventHorizons.find((h) => h.id === member.eventHorizonId);
      if (!horizon) {
        throw new JointModelInputError(
          `Regional event ${label} has member "${member.eventHorizonId}" at site ${quoted(site.siteName, site.siteId)}, ` +
            "but that event horizon is not in the site's column.",
          [regional.regionalEventId, member.siteId, member.eventHorizonId],
        );
      }
      const other = seenSites.get(member.siteId);
      if (other !== undefined) {
        const otherHorizon = site.column.eventHorizons.find((h) => h.id === other);
        throw new JointModelInputError(
          `Regional event ${label} has two members at site ${quoted(site.siteName, site.siteId)}: ` +
            `${quoted(otherHorizon?.name, other)} and ${quoted(horizon.name, horizon.id)}; two horizons of one column are ` +
            'two earthquakes, so they cannot be one regional event.',
          [regional.regionalEventId, member.siteId, other, horizon.id],
        );
      }
      seenSites.set(member.siteId, member.eventHorizonId);
      const k = key(member.siteId, member.eventHorizonId);
      const previous = regionalOf.get(k);
      if (previous !== undefined) {
        const first = input.regionalEvents[previous];
        throw new JointModelInputError(
          `Event ${quoted(horizon.name, horizon.id)} at site ${quoted(site.siteName, site.siteId)} is a member of two ` +
            `regional events, ${quoted(first.name, first.regionalEventId)} and ${label}.`,
          [first.regionalEventId, regional.regionalEventId, member.siteId, horizon.id],
        );
      }
      regionalOf.set(k, r);
    }
  });
  refuseOrderCycles(input, graphs);

  // Global numbering: regional events first, then per site its boundaries, free events, deposits.
  const regionalNodes = Int32Array.from(input.regionalEvents.map((_, r) => r));
  let next = input.regionalEvents.length;
  let sampleCount = 0;
  const kinds: number[] = input.regionalEvents.map(() => NodeKind.EVENT);
  const siteOfList: number[] = input.regionalEvents.map(() => -1);
  const depositOfList: number[] = input.regionalEvents.map(() => -1);
  const regionalSiteCount = new Int32Array(input.regionalEvents.length);
  const regionalSite = new Int32Array(input.regionalEvents.length).fill(-1);
  const sites: JointSite[] = input.sites.map((site, s) => {
    const graph = graphs[s];
    const nodes = new Int32Array(graph.nodeCount);
    const firstSample = sampleCount;
    for (let local = 0; local < graph.nodeCount; local++) {
      const kind = graph.kind[local];
      if (kind === NodeKind.EVENT) {
        const r = regionalOf.get(key(site.siteId, graph.events[local - 2].id));
        if (r !== undefined) {
          nodes[local] = regionalNodes[r];
          regionalSiteCount[r]++;
          regionalSite[r] = s;
          continue;
        }
      }
      nodes[local] = next++;
      kinds.push(kind);
      siteOfList.push(s);
      depositOfList.push(kind === NodeKind.DEPOSIT ? sampleCount++ : -1);
    }
    const localYoungToOld = Int32Array.from(
      Array.from({ length: graph.nodeCount }, (_, i) => i).sort(
        (a, b) => graph.stageMin[a] - graph.stageMin[b] || graph.stageMax[a] - graph.stageMax[b] || a - b,
      ),
    );
    const firstAtStage = new Int32Array(graph.stageCount + 3);
    for (let stage = -1, k = 0; stage <= graph.stageCount + 1; stage++) {
      while (k < localYoungToOld.length && graph.stageMin[localYoungToOld[k]] < stage) k++;
      firstAtStage[stage + 1] = k;
    }
    return {
      siteId: site.siteId,
      siteName: site.siteName,
      graph,
      nodes,
      endNode: nodes[0],
      startNode: nodes[1],
      uniformCount: graph.nodeCount - 2,
      firstSample,
      localYoungToOld,
      firstAtStage,
    };
  });
  // A regional event of one member belongs to that member's site.
  regionalSiteCount.forEach((count, r) => {
    if (count === 1) siteOfList[regionalNodes[r]] = regionalSite[r];
  });
  const nodeCount = next;
  const kind = Uint8Array.from(kinds);
  const otherBoundary = new Int32Array(nodeCount).fill(-1);
  for (const site of sites) {
    otherBoundary[site.endNode] = site.startNode;
    otherBoundary[site.startNode] = site.endNode;
  }

  // Edges: the union of the sites' covering relations, without repeats.
  const older: Set<number>[] = Array.from({ length: nodeCount }, () => new Set());
  const younger: Set<number>[] = Array.from({ length: nodeCount }, () => new Set());
  for (const site of sites) {
    const g = site.graph;
    for (let a = 0; a < g.nodeCount; a++) {
      for (let e = g.olderOffsets[a]; e < g.olderOffsets[a + 1]; e++) {
        const u = site.nodes[a];
        const v = site.nodes[g.olderNeighbours[e]];
        older[u].add(v);
        younger[v].add(u);
      }
    }
  }
  const compress = (rows: Set<number>[]): { offsets: Int32Array; neighbours: Int32Array } => {
    const offsets = new Int32Array(rows.length + 1);
    rows.forEach((row, i) => (offsets[i + 1] = offsets[i] + row.size));
    return { offsets, neighbours: Int32Array.from(rows.flatMap((row) => [...row])) };
  };
  const o = compress(older);
  const y = compress(younger);
  const youngToOld = linearExtension(nodeCount, y.offsets, y.neighbours, o.offsets, o.neighbours);

  const siteEvents: { siteId: string; eventHorizonId: string }[] = [];
  const siteEventNodes: number[] = [];
  const samples: { siteId: string; sampleId: string; site: number; local: number }[] = [];
  const sampleNodes: number[] = [];
  sites.forEach((site, s) => {
    site.graph.events.forEach((event, k) => {
      siteEvents.push({ siteId: site.siteId, eventHorizonId: event.id });
      siteEventNodes.push(site.nodes[2 + k]);
    });
    const firstDeposit = 2 + site.graph.events.length;
    site.graph.samples.forEach((sample, j) => {
      samples.push({ siteId: site.siteId, sampleId: sample.id, site: s, local: j });
      sampleNodes.push(site.nodes[firstDeposit + j]);
    });
  });

  return {
    nodeCount,
    kind,
    olderOffsets: o.offsets,
    olderNeighbours: o.neighbours,
    youngerOffsets: y.offsets,
    youngerNeighbours: y.neighbours,
    sites,
    depositOf: Int32Array.from(depositOfList),
    siteOf: Int32Array.from(siteOfList),
    otherBoundary,
    regionalNodes,
    siteEvents,
    siteEventNodes: Int32Array.from(siteEventNodes),
    samples,
    sampleNodes: Int32Array.from(sampleNodes),
    youngToOld,
  };
}

/** Kahn's algorithm (1962, CACM 5(11):558-562): a young-to-old order of the nodes, or null on a cycle. */
function linearExtension(
  nodeCount: number,
  youngerOffsets: Int32Array,
  youngerNeighbours: Int32Array,
  olderOffsets: Int32Array,
  olderNeighbours: Int32Array,
): Int32Array {
  const waiting = new Int32Array(nodeCount);
  for (let v = 0; v < nodeCount; v++) waiting[v] = youngerOffsets[v + 1] - youngerOffsets[v];
  const order = new Int32Array(nodeCount);
  let size = 0;
  for (let v = 0; v < nodeCount; v++) if (waiting[v] === 0) order[size++] = v;
  for (let head = 0; head < size; head++) {
    const u = order[head];
    for (let e = olderOffsets[u]; e < olderOffsets[u + 1]; e++) {
      const v = olderNeighbours[e];
      if (--waiting[v] === 0) order[size++] = v;
    }
  }
  if (size < nodeCount) {
    // Unreachable after refuseOrderCycles; kept so a cycle can never reach the sampler.
    throw new JointModelInputError('The ties make an order cycle between the sites: some event would be older than itself.', []);
  }
  return order;
}

/**
 * Refuse ties whose regional events form a directed order cycle across the sites, found by the
 * correlation module's cycle finder (`orderGraphCheck`), each cycle named by its steps.
 */
function refuseOrderCycles(input: JointModelInput, graphs: readonly OrderGraph[]): void {
  const empty: CalendarDensity = { startCalBp: 0, probabilities: new Float64Array(1) };
  const events: SiteEvent[] = [];
  input.sites.forEach((site, s) => {
    graphs[s].events.forEach((horizon, k) => {
      events.push({
        id: `${s}:${horizon.id}`,
        name: horizon.name !== undefined && horizon.name.trim() !== '' ? horizon.name : horizon.id,
        siteId: site.siteId,
        siteName: site.siteName,
        alongStrikeKm: s,
        orderIndexFromBase: k,
        posterior: empty,
      });
    });
  });
  const siteIndex = new Map(input.sites.map((site, s) => [site.siteId, s]));
  const groups: RegionalEventGroup[] = [];
  const ties: Tie[] = [];
  for (const regional of input.regionalEvents) {
    const memberIds = regional.members.map((m) => `${siteIndex.get(m.siteId)}:${m.eventHorizonId}`);
    const tieIds: string[] = [];
    for (let i = 1; i < memberIds.length; i++) {
      const id = `${regional.regionalEventId}#${i}`;
      ties.push({ id, eventAId: memberIds[0], eventBId: memberIds[i] });
      tieIds.push(id);
    }
    groups.push({ id: regional.regionalEventId, memberIds, tieIds });
  }
  const { conflicts } = orderGraphCheck(events, groups, ties);
  if (conflicts.length === 0) return;
  const names = new Map(input.regionalEvents.map((r) => [r.regionalEventId, quoted(r.name, r.regionalEventId)]));
  const byId = new Map(events.map((event) => [event.id, event]));
  const described = conflicts.slice(0, 3).map((conflict) => {
    const steps = conflict.steps.map((step) => {
      const older = byId.get(step.olderEventId) as SiteEvent;
      const younger = byId.get(step.youngerEventId) as SiteEvent;
      return (
        `at ${quoted(step.siteName, step.siteId)} ${quoted(older.name, older.id)} (in ${names.get(step.fromRegionalEventId)}) ` +
        `is older than ${quoted(younger.name, younger.id)} (in ${names.get(step.toRegionalEventId)})`
      );
    });
    return `${steps.join('; ')}, so ${names.get(conflict.regionalEventIds[0])} would be older than itself`;
  });
  const more = conflicts.length > 3 ? ` (and ${conflicts.length - 3} more cycles)` : '';
  throw new JointModelInputError(
    `The ties make ${conflicts.length === 1 ? 'an order cycle' : `${conflicts.length} order cycles`} between the sites: ` +
      `${described.join('. ')}${more}. Correct the correlation before a joint run.`,
    [...new Set(conflicts.flatMap((c) => [...c.regionalEventIds, ...c.siteIds]))],
  );
}

/** Deposit likelihoods of every site on one common window, with the outlier mixture. */
export function buildJointModel(
  input: JointModelInput,
  settings: Pick<JointChainSettings, 'outlierPrior' | 'outlierShiftScaleYears' | 'inheritanceScaleYears' | 'windowMarginYears'>,
): JointModel {
  const graph = buildJointGraph(input);
  const deposits: DepositLikelihood[] = [];
  const own: CalendarDensity[] = [];
  for (const site of graph.sites) {
    for (const sample of site.graph.samples) {
      own.push(sample.likelihood);
      deposits.push(depositLikelihood(sample.likelihood, sample.ageRelation, settings.inheritanceScaleYears));
    }
  }
  const window = modelWindow(deposits, own, settings.windowMarginYears);
  const likelihoods = new MixtureLikelihoods(deposits, window, settings.outlierPrior, settings.outlierShiftScaleYears);
  return { graph, likelihoods, window };
}

/** For messages: a sample by its name in its site. */
export function sampleLabel(graph: JointGraph, index: number): string {
  const entry = graph.samples[index];
  const site = graph.sites[entry.site];
  const sample = site.graph.samples[entry.local];
  return `${quoted(sample.name, sample.id)} at ${quoted(site.siteName, site.siteId)}`;
}
