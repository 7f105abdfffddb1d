/**
 * Metropolis-within-Gibbs sampler for the ordering model (Gelfand & Smith 1990, JASA 85:398-409;
 * for chronologies Buck, Litton & Smith 1992, J. Archaeol. Sci. 19:497-512 [memory for pages]).
 *
 * The state is one continuous calendar age (cal BP) per node of the order graph: the end and start
 * boundaries beta <= ... <= alpha, every event and every modelled sample's deposit age. Each
 * likelihood is constant within a whole year (year y holds ages in [y - 0.5, y + 0.5)), so the
 * 1-year grid only discretises the data, never the prior. The unnormalised posterior is
 *
 *   p(alpha, beta, theta) ∝ 1[order] s^-m / (W - s)  prod_j L_q,j(d_j),   s = alpha - beta,
 *
 * on the window of length W, with m the number of events and deposits. s^-m is the uniform
 * deposition prior between two boundaries (Buck, Kenworthy, Litton & Smith 1991, Antiquity
 * 65:808-821): given the boundaries, the ordered ages are uniform on the order's polytope, whose
 * volume is proportional to s^m for any partial order. 1 / (W - s) is the span correction of
 * Nicholls & Jones (2001, J. R. Stat. Soc. C 50(4):503-521 [memory for pages]): W - s is the
 * measure of boundary pairs with span s in the window, so this factor makes the prior on the span
 * flat instead of falling towards W.
 *
 * Because ages are continuous, two ages share a year only as a short stretch of their joint
 * volume; on a grid with ties every collapsed configuration counted as a whole cell and short
 * spans gained up to m! times their mass (issue 12).
 *
 * Moves, all leaving this posterior invariant and never leaving the order:
 *  - Gibbs for each event and deposit from its full conditional between its neighbours in the
 *    order: uniform for an event, L_q restricted to [lo, hi] for a deposit (inverse of its
 *    piecewise-linear cumulative integral), scanned young to old and old to young in turn;
 *  - independence Metropolis-Hastings for each boundary, proposing exactly from (c + x)^-m and
 *    accepting by the ratio of the span correction, (W - s) / (W - s');
 *  - random-walk Metropolis shifts of a block of consecutive stages (the whole sequence, the
 *    part above or below a level, or a run in the middle) by a symmetric Gaussian step at one of
 *    several scales (a translation: Jacobian 1), which moves tightly packed parts of the column
 *    together where single-site updates would crawl;
 *  - an independence Metropolis-Hastings draw of every path of the order (a run of nodes each with
 *    one younger and one older neighbour, possibly ending in the start boundary) given the nodes at
 *    its two ends: years by forward filtering and backward sampling on the 1-year grid (Carter &
 *    Kohn 1994, Biometrika 81(3):541-553; Frühwirth-Schnatter 1994, J. Time Series Anal.
 *    15(2):183-202 [memory for pages]), then ages uniform and ordered within their years, and the
 *    difference from the continuous target corrected by the acceptance ratio; see `pathUpdate`.
 */
import { SeededRandom } from '../common/random';
import { NodeKind, OrderGraph } from './column';
import { MixtureLikelihoods, yearOf } from './likelihood';

/** Step scales (years) of the block shift, chosen uniformly per proposal. */
export const SHIFT_SCALES = [1, 3, 10, 30, 100, 300];

/** Share of block shifts that move the whole column with its boundaries. */
export const GLOBAL_SHIFT_SHARE = 0.25;

/**
 * Below this share of a sample's total mass the cumulative sums lose too many digits to invert;
 * the conditional is then summed year by year (only reachable with an outlier prior of 0).
 */
const BISECTION_FLOOR = 1e-9;

/** Share of a year that initial ages keep clear of their bounds, so no two start tied. */
export const INITIAL_CLEARANCE = 1e-3;

/**
 * The paths of two or more nodes in the order graph, young to old. Consecutive nodes u (younger)
 * and v are joined when v is u's only older neighbour and u is v's only younger neighbour. The end
 * boundary is never joined, so a path's weight depends on one free node at most (the start
 * boundary at its top); the nodes bounding a path from outside stay fixed while it is drawn.
 */
export function orderPaths(graph: OrderAdjacency): Int32Array[] {
  const g = graph;
  const olderOf = new Int32Array(g.nodeCount).fill(-1);
  const youngerOf = new Int32Array(g.nodeCount).fill(-1);
  for (let u = 0; u < g.nodeCount; u++) {
    if (g.kind[u] === NodeKind.END || g.kind[u] === NodeKind.START) continue;
    if (g.olderOffsets[u + 1] - g.olderOffsets[u] !== 1) continue;
    const v = g.olderNeighbours[g.olderOffsets[u]];
    if (g.youngerOffsets[v + 1] - g.youngerOffsets[v] !== 1) continue;
    olderOf[u] = v;
    youngerOf[v] = u;
  }
  const paths: Int32Array[] = [];
  for (let start = 0; start < g.nodeCount; start++) {
    if (g.kind[start] === NodeKind.END || g.kind[start] === NodeKind.START) continue;
    if (youngerOf[start] !== -1 || olderOf[start] === -1) continue;
    const nodes: number[] = [start];
    while (olderOf[nodes[nodes.length - 1]] !== -1) nodes.push(olderOf[nodes[nodes.length - 1]]);
    paths.push(Int32Array.from(nodes));
  }
  return paths;
}

/** The covering relation of an order on ages, in compressed rows (an OrderGraph is one). */
export interface OrderAdjacency {
  readonly nodeCount: number;
  /** NodeKind of each node. */
  readonly kind: Uint8Array;
  readonly olderOffsets: Int32Array;
  readonly olderNeighbours: Int32Array;
  readonly youngerOffsets: Int32Array;
  readonly youngerNeighbours: Int32Array;
}

/** Youngest age `node` may take given its younger neighbours' `values` (at least `youngEdge`). */
export function youngestAllowed(g: OrderAdjacency, values: Float64Array, node: number, youngEdge: number): number {
  let lo = youngEdge;
  for (let k = g.youngerOffsets[node]; k < g.youngerOffsets[node + 1]; k++) {
    const v = values[g.youngerNeighbours[k]];
    if (v > lo) lo = v;
  }
  return lo;
}

/** Oldest age `node` may take given its older neighbours' `values` (at most `oldEdge`). */
export function oldestAllowed(g: OrderAdjacency, values: Float64Array, node: number, oldEdge: number): number {
  let hi = oldEdge;
  for (let k = g.olderOffsets[node]; k < g.olderOffsets[node + 1]; k++) {
    const v = values[g.olderNeighbours[k]];
    if (v < hi) hi = v;
  }
  return hi;
}

export interface SamplerModel {
  readonly graph: OrderGraph;
  /** Deposit likelihoods, indexed by sample (node - firstDeposit). */
  readonly likelihoods: MixtureLikelihoods;
}

/**
 * Rao-Blackwellised posterior densities (Gelfand & Smith 1990): at each kept draw, the full
 * conditional of every event (uniform between its neighbours) and every deposit (L_q between its
 * neighbours) is added instead of a single count, which gives smooth 1-year histograms from a few
 * thousand draws and no Monte Carlo splinters in the HPD ranges. Whole years inside a conditional
 * are added as range coefficients in difference arrays, the two partly covered end years
 * directly; a deposit's density is L_q(y) times its summed coefficient at y.
 */
export class PosteriorAccumulator {
  readonly youngCalBp: number;
  readonly width: number;
  readonly eventDifferences: Float64Array[];
  readonly depositDifferences: Float64Array[];
  /** Partly covered end years, added directly. */
  readonly eventDirect: Float64Array[];
  readonly depositDirect: Float64Array[];
  /** Counts of open ranges in the same difference form: exactly zero where no range reached. */
  readonly eventOpen: Int32Array[];
  readonly depositOpen: Int32Array[];
  /** Sum over kept draws of each sample's conditional outlier probability. */
  readonly outlierSums: Float64Array;
  draws = 0;

  constructor(eventCount: number, sampleCount: number, youngCalBp: number, width: number) {
    this.youngCalBp = youngCalBp;
    this.width = width;
    this.eventDifferences = Array.from({ length: eventCount }, () => new Float64Array(width + 1));
    this.depositDifferences = Array.from({ length: sampleCount }, () => new Float64Array(width + 1));
    this.eventDirect = Array.from({ length: eventCount }, () => new Float64Array(width + 1));
    this.depositDirect = Array.from({ length: sampleCount }, () => new Float64Array(width + 1));
    this.eventOpen = Array.from({ length: eventCount }, () => new Int32Array(width + 1));
    this.depositOpen = Array.from({ length: sampleCount }, () => new Int32Array(width + 1));
    this.outlierSums = new Float64Array(sampleCount);
  }

  /** Add a whole draw's mass at one age (an event whose neighbours meet). */
  addPoint(direct: Float64Array, open: Int32Array, calBp: number): void {
    const i = Math.min(yearOf(calBp), this.youngCalBp + this.width - 1) - this.youngCalBp;
    open[i]++;
    open[i + 1]--;
    direct[i] += 1;
  }

  /**
   * Add `coefficient` per unit length over the continuous interval [lo, hi] to one density:
   * whole years through the difference array, the end years' covered shares directly.
   */
  addInterval(differences: Float64Array, direct: Float64Array, open: Int32Array, lo: number, hi: number, coefficient: number): void {
    const first = yearOf(lo) - this.youngCalBp;
    const last = Math.min(yearOf(hi), this.youngCalBp + this.width - 1) - this.youngCalBp;
    open[first]++;
    open[last + 1]--;
    if (first === last) {
      direct[first] += coefficient * (hi - lo);
      return;
    }
    direct[first] += coefficient * (this.youngCalBp + first + 0.5 - lo);
    direct[last] += coefficient * (hi - (this.youngCalBp + last - 0.5));
    if (last > first + 1) {
      differences[first + 1] += coefficient;
      differences[last] -= coefficient;
    }
  }
}

/** Index of the first deposit node. */
export function firstDepositNode(graph: OrderGraph): number {
  return 2 + graph.events.length;
}

/** Young-to-old order of the nodes (a linear extension of the order). */
function topologicalOrder(graph: OrderGraph): Int32Array {
  const nodes = Array.from({ length: graph.nodeCount }, (_, i) => i);
  nodes.sort((a, b) => graph.stageMin[a] - graph.stageMin[b] || graph.stageMax[a] - graph.stageMax[b] || a - b);
  return Int32Array.from(nodes);
}

/** log of the prior's span factor s^-m / (W - s). */
export function logSpanPrior(span: number, m: number, windowLength: number): number {
  return -m * Math.log(span) - Math.log(windowLength - span);
}

/** One Markov chain over the ordering model. */
export class OrderChain {
  private readonly graph: OrderGraph;
  private readonly likelihoods: MixtureLikelihoods;
  private readonly random: SeededRandom;
  private readonly values: Float64Array;
  private readonly youngToOld: Int32Array;
  private readonly firstDeposit: number;
  /** m: events plus deposits, the exponent of the uniform deposition prior. */
  private readonly uniformCount: number;
  private readonly inBlock: Uint8Array;
  private readonly blockNodes: Int32Array;
  /** firstAtStage[s + 1]: index in youngToOld of the first node whose first stage is >= s. */
  private readonly firstAtStage: Int32Array;
  /** The window's continuous edges and length. */
  private readonly youngEdge: number;
  private readonly oldEdge: number;
  private readonly windowLength: number;
  /** Events placed so far while initialising. */
  private readonly placedEvents = new Set<number>();
  private readonly paths: Int32Array[];
  /** Work arrays of `drawPath` for the longest path. */
  private readonly pathBuffers: PathBuffers;
  blockShiftProposed = 0;
  blockShiftAccepted = 0;
  boundaryProposed = 0;
  boundaryAccepted = 0;
  pathProposed = 0;
  pathAccepted = 0;

  constructor(model: SamplerModel, seed: number, startFromYoung: boolean) {
    this.graph = model.graph;
    this.likelihoods = model.likelihoods;
    this.random = new SeededRandom(seed);
    this.values = new Float64Array(this.graph.nodeCount);
    this.youngToOld = topologicalOrder(this.graph);
    this.firstDeposit = firstDepositNode(this.graph);
    this.uniformCount = this.graph.nodeCount - 2;
    this.inBlock = new Uint8Array(this.graph.nodeCount);
    this.blockNodes = new Int32Array(this.graph.nodeCount);
    this.firstAtStage = new Int32Array(this.graph.stageCount + 3);
    for (let stage = -1, k = 0; stage <= this.graph.stageCount + 1; stage++) {
      while (k < this.youngToOld.length && this.graph.stageMin[this.youngToOld[k]] < stage) k++;
      this.firstAtStage[stage + 1] = k;
    }
    this.youngEdge = this.likelihoods.youngEdge;
    this.oldEdge = this.likelihoods.oldEdge;
    this.windowLength = this.oldEdge - this.youngEdge;
    this.paths = orderPaths(this.graph);
    const longest = this.paths.reduce((n, path) => Math.max(n, path.length), 0);
    this.pathBuffers = pathBuffers(this.likelihoods, this.random, this.graph.kind, depositIndex(this.graph), longest);
    this.initialise(startFromYoung);
  }

  /** The current state (continuous cal BP per node); a view, not a copy. */
  get state(): Float64Array {
    return this.values;
  }

  /** Youngest age a node may take given its younger neighbours. */
  private lowerBound(node: number): number {
    return youngestAllowed(this.graph, this.values, node, this.youngEdge);
  }

  /** Oldest age a node may take given its older neighbours. */
  private upperBound(node: number): number {
    return oldestAllowed(this.graph, this.values, node, this.oldEdge);
  }

  /**
   * A dispersed, order-respecting start. Deposits are first drawn from their own likelihoods;
   * walking the order from one end, each is kept if it respects what is already placed and
   * otherwise redrawn from its likelihood beyond that bound. Events are then placed uniformly
   * between their neighbours, the boundaries a little outside everything. Chains that start from
   * the young end lean old and those from the old end lean young, so chains begin on both sides.
   */
  private initialise(fromYoung: boolean): void {
    const g = this.graph;
    const order = fromYoung ? this.youngToOld : this.youngToOld.slice().reverse();
    // Bounds passed through events that are not placed yet.
    const passLow = new Float64Array(g.nodeCount).fill(this.youngEdge);
    const passHigh = new Float64Array(g.nodeCount).fill(this.oldEdge);
    const isDeposit = (node: number): boolean => g.kind[node] === NodeKind.DEPOSIT;
    for (const node of order) {
      if (g.kind[node] === NodeKind.START || g.kind[node] === NodeKind.END) continue;
      let lo = this.youngEdge;
      let hi = this.oldEdge;
      if (fromYoung) {
        for (let k = g.youngerOffsets[node]; k < g.youngerOffsets[node + 1]; k++) {
          const b = g.youngerNeighbours[k];
          if (b === 0) continue;
          lo = Math.max(lo, isDeposit(b) ? this.values[b] : passLow[b]);
        }
        passLow[node] = lo;
      } else {
        for (let k = g.olderOffsets[node]; k < g.olderOffsets[node + 1]; k++) {
          const b = g.olderNeighbours[k];
          if (b === 1) continue;
          hi = Math.min(hi, isDeposit(b) ? this.values[b] : passHigh[b]);
        }
        passHigh[node] = hi;
      }
      if (!isDeposit(node)) continue;
      const j = node - this.firstDeposit;
      const own = this.drawPlain(j, this.youngEdge, this.oldEdge, fromYoung ? lo : hi);
      this.values[node] = own > lo && own < hi ? own : this.drawPlain(j, lo, hi, fromYoung ? lo : hi);
      if (fromYoung) passLow[node] = this.values[node];
      else passHigh[node] = this.values[node];
    }
    // Events, walking the same way, between what is placed on both sides.
    for (const node of order) {
      if (g.kind[node] !== NodeKind.EVENT) continue;
      const lo = this.boundOver(node, false);
      const hi = this.boundOver(node, true);
      const low = lo ?? Math.max(this.youngEdge, (hi ?? this.oldEdge) - 100);
      const high = hi ?? Math.min(this.oldEdge, low + 100);
      this.values[node] = low + (high - low) * (INITIAL_CLEARANCE + (1 - 2 * INITIAL_CLEARANCE) * this.random.uniform());
      this.placedEvents.add(node);
    }
    let oldest = -Infinity;
    let youngest = Infinity;
    for (let node = 2; node < g.nodeCount; node++) {
      oldest = Math.max(oldest, this.values[node]);
      youngest = Math.min(youngest, this.values[node]);
    }
    this.values[1] = oldest + (this.oldEdge - oldest) * (INITIAL_CLEARANCE + Math.min(0.5, 100 / this.windowLength) * this.random.uniform());
    this.values[0] = youngest - (youngest - this.youngEdge) * (INITIAL_CLEARANCE + Math.min(0.5, 100 / this.windowLength) * this.random.uniform());
  }

  /**
   * The tightest bound on an event from placed nodes on one side (older when `older`), passing
   * through events on that side; undefined if only a boundary lies there.
   */
  private boundOver(node: number, older: boolean): number | undefined {
    const g = this.graph;
    const offsets = older ? g.olderOffsets : g.youngerOffsets;
    const neighbours = older ? g.olderNeighbours : g.youngerNeighbours;
    let bound: number | undefined;
    for (let k = offsets[node]; k < offsets[node + 1]; k++) {
      const b = neighbours[k];
      if (b === 0 || b === 1) continue;
      const v = g.kind[b] === NodeKind.EVENT ? this.eventBoundForInit(b, older) : this.values[b];
      if (v === undefined) continue;
      bound = bound === undefined ? v : older ? Math.min(bound, v) : Math.max(bound, v);
    }
    return bound;
  }

  private eventBoundForInit(event: number, older: boolean): number | undefined {
    // An event already placed bounds directly; one not placed yet passes its own bound through.
    if (this.placedEvents.has(event)) return this.values[event];
    return this.boundOver(event, older);
  }

  /** A draw from L (no outlier term) on [lo, hi]; `fallback` when L has no mass there. */
  private drawPlain(sample: number, lo: number, hi: number, fallback: number): number {
    return drawPlainDeposit(this.likelihoods, sample, lo, hi, fallback, this.random);
  }

  /** Gibbs draw of a deposit from L_q on [lo, hi]. */
  private drawDeposit(sample: number, lo: number, hi: number, current: number): number {
    return drawDepositAge(this.likelihoods, sample, lo, hi, current, this.random);
  }

  /**
   * Independence MH update of a boundary. With the rest fixed, k = distance of the boundary
   * beyond the extreme node has target (c + k)^-m / (W - c - k) on [0, K], c = distance from that
   * node to the other boundary. The proposal is (c + x)^-m on [0, K] drawn exactly by inversion,
   * so the acceptance ratio is the span correction's, (W - s) / (W - s').
   */
  private updateBoundary(isStart: boolean): void {
    const m = this.uniformCount;
    const g = this.graph;
    const node = isStart ? 1 : 0;
    const other = this.values[isStart ? 0 : 1];
    const limit = isStart ? this.lowerBound(node) : this.upperBound(node);
    const room = isStart ? this.oldEdge - limit : limit - this.youngEdge;
    if (g.nodeCount <= 2 || !(room > 0)) {
      this.values[node] = limit;
      return;
    }
    const c = isStart ? limit - other : other - limit;
    if (!(c > 0)) return;
    const proposed = proposeBoundaryOffset(c, room, m, this.random.uniform());
    const current = isStart ? this.values[node] - limit : limit - this.values[node];
    this.boundaryProposed++;
    const W = this.windowLength;
    const logAccept = Math.log(W - c - current) - Math.log(W - c - proposed);
    if (!(W - c - proposed > 0)) return;
    if (logAccept >= 0 || Math.log(this.random.uniform()) < logAccept) {
      this.values[node] = isStart ? limit + proposed : limit - proposed;
      this.boundaryAccepted++;
    }
  }

  /** Whether the order graph has a path for `pathUpdate` to draw. */
  get hasPaths(): boolean {
    return this.paths.length > 0;
  }

  /**
   * Independence Metropolis-Hastings update of each path of the order given the rest (`drawPath`:
   * years by forward filtering and backward sampling, ages uniform within their years, the
   * difference from the continuous target corrected by the acceptance ratio).
   *
   * Why: with outliers allowed, a column with one sample per unit has a second mode where the
   * older samples are all outliers and the column shrinks to a short span. Leaving or entering it
   * means moving the start boundary and every age below it together, which single-site Gibbs and
   * block shifts (which cannot change the span) do only slowly; this draw crosses in one step.
   */
  pathUpdate(): void {
    const end = this.values[0];
    for (const path of this.paths) {
      const n = path.length;
      const topIsStart = path[n - 1] === 1;
      const lo = this.lowerBound(path[0]);
      const hi = topIsStart ? this.oldEdge : this.upperBound(path[n - 1]);
      if (!(hi > lo)) continue;
      const outcome = drawPath(this.pathBuffers, this.values, path, lo, hi, topIsStart ? { end, m: this.uniformCount } : null);
      if (outcome === 'stop') return;
      this.pathProposed++;
      if (outcome === 'accepted') this.pathAccepted++;
    }
  }

  /** One Gibbs pass over every node in order, young to old or old to young. */
  sweep(fromYoung: boolean): void {
    const g = this.graph;
    const order = this.youngToOld;
    const n = order.length;
    for (let step = 0; step < n; step++) {
      const node = order[fromYoung ? step : n - 1 - step];
      const kind = g.kind[node];
      if (kind === NodeKind.START) this.updateBoundary(true);
      else if (kind === NodeKind.END) this.updateBoundary(false);
      else {
        const lo = this.lowerBound(node);
        const hi = this.upperBound(node);
        if (kind === NodeKind.EVENT) this.values[node] = lo + (hi - lo) * this.random.uniform();
        else this.values[node] = this.drawDeposit(node - this.firstDeposit, lo, hi, this.values[node]);
      }
    }
  }

  /**
   * Metropolis shift of every node whose stages lie within a block by a symmetric Gaussian step.
   * Shifting preserves the order inside the block; the edges leaving it are checked. The prior
   * changes only through the span when one boundary moves without the other.
   */
  blockShift(): void {
    const g = this.graph;
    const r = this.random;
    let first: number;
    let last: number;
    if (r.uniform() < GLOBAL_SHIFT_SHARE) {
      first = -1;
      last = g.stageCount;
    } else {
      first = -1 + r.integer(g.stageCount + 2);
      last = -1 + r.integer(g.stageCount + 2);
      if (first > last) [first, last] = [last, first];
    }
    const scale = SHIFT_SCALES[r.integer(SHIFT_SCALES.length)];
    const step = scale * r.normal();
    if (step === 0) return;
    // Nodes are sorted by their first stage, so the block is a run of that order, filtered.
    const order = this.youngToOld;
    const block = this.blockNodes;
    let size = 0;
    for (let k = this.firstAtStage[first + 1]; k < order.length && g.stageMin[order[k]] <= last; k++) {
      const node = order[k];
      if (g.stageMax[node] <= last) block[size++] = node;
    }
    if (size === 0) return;
    this.blockShiftProposed++;
    for (let k = 0; k < size; k++) this.inBlock[block[k]] = 1;
    const accepted = this.acceptShift(block, size, step);
    for (let k = 0; k < size; k++) this.inBlock[block[k]] = 0;
    if (!accepted) return;
    for (let k = 0; k < size; k++) this.values[block[k]] += step;
    this.blockShiftAccepted++;
  }

  /** The Metropolis decision for shifting the marked block by `step`. */
  private acceptShift(block: Int32Array, size: number, step: number): boolean {
    const g = this.graph;
    const v = this.values;
    const inBlock = this.inBlock;
    if (inBlock[1] && v[1] + step > this.oldEdge) return false;
    if (inBlock[0] && v[0] + step < this.youngEdge) return false;
    const L = this.likelihoods;
    let ratio = 1;
    for (let k = 0; k < size; k++) {
      const node = block[k];
      const moved = v[node] + step;
      if (step > 0) {
        for (let e = g.olderOffsets[node]; e < g.olderOffsets[node + 1]; e++) {
          const b = g.olderNeighbours[e];
          if (!inBlock[b] && v[b] < moved) return false;
        }
      } else {
        for (let e = g.youngerOffsets[node]; e < g.youngerOffsets[node + 1]; e++) {
          const b = g.youngerNeighbours[e];
          if (!inBlock[b] && v[b] > moved) return false;
        }
      }
      if (g.kind[node] === NodeKind.DEPOSIT) {
        const j = node - this.firstDeposit;
        // With q > 0 each factor is bounded away from 0 and infinity where the chain can be, so
        // the product of a few hundred stays inside the double range.
        ratio *= L.at(j, moved) / L.at(j, v[node]);
        if (!(ratio > 0)) return false;
      }
    }
    if (inBlock[0] !== inBlock[1]) {
      const span = v[1] - v[0];
      const movedSpan = span + (inBlock[1] ? step : -step);
      if (!(movedSpan > 0 && movedSpan < this.windowLength)) return false;
      ratio *= Math.exp(logSpanPrior(movedSpan, this.uniformCount, this.windowLength) - logSpanPrior(span, this.uniformCount, this.windowLength));
    }
    return ratio >= 1 || this.random.uniform() < ratio;
  }

  /** Add the current state's full conditionals to the accumulator. */
  accumulate(into: PosteriorAccumulator): void {
    const g = this.graph;
    const L = this.likelihoods;
    for (let k = 0; k < g.events.length; k++) {
      const node = 2 + k;
      const lo = this.lowerBound(node);
      const hi = this.upperBound(node);
      if (hi > lo) into.addInterval(into.eventDifferences[k], into.eventDirect[k], into.eventOpen[k], lo, hi, 1 / (hi - lo));
      else into.addPoint(into.eventDirect[k], into.eventOpen[k], lo);
    }
    for (let j = 0; j < g.samples.length; j++) {
      const node = this.firstDeposit + j;
      const lo = this.lowerBound(node);
      const hi = this.upperBound(node);
      const mass = L.cumulativeAt(j, hi) - L.cumulativeAt(j, lo);
      if (!(mass > 0)) continue;
      into.addInterval(into.depositDifferences[j], into.depositDirect[j], into.depositOpen[j], lo, hi, 1 / mass);
      into.outlierSums[j] += (L.outlierCumulativeAt(j, hi) - L.outlierCumulativeAt(j, lo)) / mass;
    }
    into.draws++;
  }

  /** Deposits whose likelihood, outlier term included, is zero in the current state. */
  impossibleDeposits(): number[] {
    const out: number[] = [];
    for (let j = 0; j < this.graph.samples.length; j++) {
      if (!(this.likelihoods.at(j, this.values[this.firstDeposit + j]) > 0)) out.push(j);
    }
    return out;
  }
}

/** Index of each node's likelihood among the deposits, or -1 for a boundary or an event. */
function depositIndex(graph: OrderGraph): Int32Array {
  const first = firstDepositNode(graph);
  const out = new Int32Array(graph.nodeCount).fill(-1);
  for (let node = first; node < graph.nodeCount; node++) out[node] = node - first;
  return out;
}

/**
 * The age x in [lo, hi] where a piecewise-linear cumulative integral (slope `valueOf(year)` in
 * each year) reaches `target`: bisection over whole years (none after `oldYear`), then linear
 * within the year.
 */
export function invertCumulative(
  cumulativeAt: (calBp: number) => number,
  valueOf: (year: number) => number,
  lo: number,
  hi: number,
  target: number,
  oldYear: number,
): number {
  let a = yearOf(lo);
  let b = Math.min(yearOf(hi), oldYear);
  // The first year whose end (capped at hi) reaches the target.
  while (a < b) {
    const mid = (a + b) >> 1;
    if (cumulativeAt(Math.min(mid + 0.5, hi)) >= target) b = mid;
    else a = mid + 1;
  }
  const from = Math.max(lo, a - 0.5);
  const slope = valueOf(a);
  const x = slope > 0 ? from + (target - cumulativeAt(from)) / slope : from;
  return Math.min(hi, Math.max(lo, x));
}

/** A draw of a deposit age from L (no outlier term) on [lo, hi]; `fallback` when L has no mass there. */
export function drawPlainDeposit(
  L: MixtureLikelihoods,
  sample: number,
  lo: number,
  hi: number,
  fallback: number,
  random: SeededRandom,
): number {
  const below = L.plainCumulativeAt(sample, lo);
  const mass = L.plainCumulativeAt(sample, hi) - below;
  if (!(mass > BISECTION_FLOOR * L.plainTotalMass(sample))) return fallback;
  const target = below + (INITIAL_CLEARANCE + (1 - 2 * INITIAL_CLEARANCE) * random.uniform()) * mass;
  return invertCumulative((x) => L.plainCumulativeAt(sample, x), (y) => L.plain(sample, y), lo, hi, target, L.oldCalBp);
}

/** Gibbs draw of a deposit age from its full conditional, L_q restricted to [lo, hi]. */
export function drawDepositAge(
  L: MixtureLikelihoods,
  sample: number,
  lo: number,
  hi: number,
  current: number,
  random: SeededRandom,
): number {
  const below = L.cumulativeAt(sample, lo);
  const mass = L.cumulativeAt(sample, hi) - below;
  if (mass > BISECTION_FLOOR * L.totalMass(sample)) {
    const target = below + random.uniform() * mass;
    return invertCumulative((x) => L.cumulativeAt(sample, x), (y) => L.mixture(sample, y), lo, hi, target, L.oldCalBp);
  }
  // Too little mass for the cumulative sums' digits: weigh the years directly.
  const first = yearOf(lo);
  const last = Math.min(yearOf(hi), L.oldCalBp);
  let sum = 0;
  for (let y = first; y <= last; y++) sum += L.mixture(sample, y) * (Math.min(hi, y + 0.5) - Math.max(lo, y - 0.5));
  if (!(sum > 0)) return current;
  let target = random.uniform() * sum;
  for (let y = first; y <= last; y++) {
    const from = Math.max(lo, y - 0.5);
    const length = Math.min(hi, y + 0.5) - from;
    const weight = L.mixture(sample, y) * length;
    if (target <= weight && weight > 0) return from + (target / weight) * length;
    target -= weight;
  }
  return hi;
}

/**
 * An exact draw of the distance x in [0, room] of a boundary beyond the extreme node from the
 * density (c + x)^-m (inversion with the uniform u); see `OrderChain.updateBoundary`.
 */
export function proposeBoundaryOffset(c: number, room: number, m: number, u: number): number {
  const logRatio = Math.log((c + room) / c);
  let x: number;
  if (m === 1) {
    x = c * Math.exp(u * logRatio) - c;
  } else {
    const tailShare = -Math.expm1((1 - m) * logRatio); // 1 - ((c + K) / c)^(1 - m)
    x = c * Math.exp(Math.log1p(-u * tailShare) / (1 - m)) - c;
  }
  return Math.min(room, Math.max(0, x));
}

/** What `drawPath` works with: the likelihoods, the chain's random stream and work arrays. */
export interface PathBuffers {
  readonly likelihoods: MixtureLikelihoods;
  readonly random: SeededRandom;
  /** Node kinds (NodeKind) and each node's deposit likelihood index (-1 if none). */
  readonly kind: Uint8Array;
  readonly depositOf: Int32Array;
  /** Forward cumulative sums, longest path x window width. */
  readonly forward: Float64Array;
  /** Proposed path ages. */
  readonly proposal: Float64Array;
}

export function pathBuffers(
  likelihoods: MixtureLikelihoods,
  random: SeededRandom,
  kind: Uint8Array,
  depositOf: Int32Array,
  longestPath: number,
): PathBuffers {
  return {
    likelihoods,
    random,
    kind,
    depositOf,
    forward: new Float64Array(longestPath * likelihoods.width),
    proposal: new Float64Array(longestPath),
  };
}

/**
 * Independence Metropolis-Hastings draw of one path of the order given the rest: the nodes
 * x_1 <= ... <= x_n (young to old) in [lo, hi], whose full conditional is prod_k g_k(x_k), with
 * g = L_q for a deposit, 1 for an event and s^-m / (W - s) for a start boundary at the top (its
 * end boundary `top.end` fixed; W the window's length).
 *
 * Proposal: years y_1 <= ... <= y_n are drawn exactly from prod_k w_k(y_k), w_k(y) = g^_k(y)
 * l(y), where l(y) is the length of year y inside [lo, hi] and g^ is g (the start boundary's
 * evaluated at the middle of its clipped year), by forward cumulative sums C_k(y) = sum_{z <= y}
 * w_k(z) C_{k-1}(z) and sampling back from the top (Carter & Kohn 1994); then the ages of each
 * run of r nodes sharing a year are r uniform points sorted, density r! / l^r. So the proposal
 * density is q(x) = prod g^_k(y_k) prod_runs r! / Z, and with the target pi(x) ∝ prod g_k(x_k)
 * the weight pi / q ∝ [g_start / g^_start] / prod_runs r! decides acceptance (Z cancels).
 *
 * Writes the accepted ages into `values`. Returns 'stop' (nothing proposed; the forward sums
 * vanished) or whether the proposal was accepted.
 */
export function drawPath(
  buffers: PathBuffers,
  values: Float64Array,
  path: Int32Array,
  lo: number,
  hi: number,
  top: { readonly end: number; readonly m: number } | null,
): 'stop' | 'accepted' | 'rejected' {
  const { likelihoods: L, random: r, forward: f, kind: kinds, depositOf } = buffers;
  const W = L.oldEdge - L.youngEdge;
  const n = path.length;
  const topIsStart = top !== null;
  const end = top?.end ?? 0;
  const m = top?.m ?? 0;
  const firstYear = yearOf(lo);
  const lastYear = Math.min(yearOf(hi), L.oldCalBp);
  const width = lastYear - firstYear + 1;
  const lengthOf = (y: number): number => Math.min(hi, y + 0.5) - Math.max(lo, y - 0.5);
  // The start boundary's weight at the middle of its clipped year, relative to its largest.
  const logStartAt = (y: number): number => {
    const middle = (Math.max(lo, y - 0.5) + Math.min(hi, y + 0.5)) / 2;
    return logSpanPrior(middle - end, m, W);
  };
  const logStartTop = topIsStart ? logStartAt(firstYear) : 0;
  const firstLength = lengthOf(firstYear);
  const lastLength = lengthOf(lastYear);
  const offset = firstYear - L.youngCalBp;
  for (let k = 0; k < n; k++) {
    const node = path[k];
    const kind = kinds[node];
    const row = k * width;
    const previous = row - width;
    let running = 0;
    if (kind === NodeKind.DEPOSIT) {
      const likelihood = L.mixtureValues(depositOf[node]);
      for (let i = 0; i < width; i++) {
        const w = likelihood[offset + i] * (i === 0 ? firstLength : i === width - 1 ? lastLength : 1);
        running += k === 0 ? w : w * f[previous + i];
        f[row + i] = running;
      }
    } else if (kind === NodeKind.START) {
      for (let i = 0; i < width; i++) {
        const length = i === 0 ? firstLength : i === width - 1 ? lastLength : 1;
        const w = Math.exp(logStartAt(firstYear + i) - logStartTop) * length;
        running += k === 0 ? w : w * f[previous + i];
        f[row + i] = running;
      }
    } else {
      for (let i = 0; i < width; i++) {
        const w = i === 0 ? firstLength : i === width - 1 ? lastLength : 1;
        running += k === 0 ? w : w * f[previous + i];
        f[row + i] = running;
      }
    }
    // Rescale each row to end at 1 so that long paths neither underflow nor overflow.
    if (!(running > 0)) return 'stop';
    const scale = 1 / running;
    for (let i = 0; i < width; i++) f[row + i] *= scale;
  }
  const proposal = buffers.proposal;
  let upper = width - 1;
  for (let k = n - 1; k >= 0; k--) {
    const row = k * width;
    const target = (1 - r.uniform()) * f[row + upper];
    let a = 0;
    let b = upper;
    while (a < b) {
      const mid = (a + b) >> 1;
      if (f[row + mid] >= target) b = mid;
      else a = mid + 1;
    }
    proposal[k] = firstYear + a;
    upper = a;
  }
  // Ages within years: each run sharing a year gets sorted uniform points in its clipped year.
  let logWeightProposed = 0;
  for (let k = 0; k < n; ) {
    const y = proposal[k];
    let e = k;
    while (e + 1 < n && proposal[e + 1] === y) e++;
    const from = Math.max(lo, y - 0.5);
    const length = lengthOf(y);
    for (let t = k; t <= e; t++) proposal[t] = from + length * r.uniform();
    if (e > k) sortRange(proposal, k, e + 1);
    logWeightProposed -= logFactorial(e - k + 1);
    k = e + 1;
  }
  let logWeightCurrent = 0;
  for (let k = 0; k < n; ) {
    const y = yearOf(values[path[k]]);
    let e = k;
    while (e + 1 < n && yearOf(values[path[e + 1]]) === y) e++;
    logWeightCurrent -= logFactorial(e - k + 1);
    k = e + 1;
  }
  if (topIsStart) {
    const proposedTop = proposal[n - 1];
    const currentTop = values[path[n - 1]];
    logWeightProposed += logSpanPrior(proposedTop - end, m, W) - logStartAt(yearOf(proposedTop));
    logWeightCurrent += logSpanPrior(currentTop - end, m, W) - logStartAt(yearOf(currentTop));
  }
  const logAccept = logWeightProposed - logWeightCurrent;
  if (logAccept >= 0 || Math.log(r.uniform()) < logAccept) {
    for (let k = 0; k < n; k++) values[path[k]] = proposal[k];
    return 'accepted';
  }
  return 'rejected';
}

const LOG_FACTORIALS = [0, 0];

/** ln r! (exact sums, cached). */
function logFactorial(r: number): number {
  while (LOG_FACTORIALS.length <= r) LOG_FACTORIALS.push(LOG_FACTORIALS[LOG_FACTORIALS.length - 1] + Math.log(LOG_FACTORIALS.length));
  return LOG_FACTORIALS[r];
}

/** Sort values[from, to) in place (insertion sort: runs within a year are short). */
function sortRange(values: Float64Array, from: number, to: number): void {
  for (let i = from + 1; i < to; i++) {
    const v = values[i];
    let k = i - 1;
    while (k >= from && values[k] > v) {
      values[k + 1] = values[k];
      k--;
    }
    values[k + 1] = v;
  }
}
