/**
 * Metropolis-within-Gibbs sampler for the ordering model (Gelfand & Smith 1990, JASA 85:398-409;
 * for chronologies Buck, Litton & Smith 1992, J. Archaeol. Sci. 19:497-512 [memory for pages]).
 *
 * The state is one whole calendar year (cal BP) per node of the order graph: the end and start
 * boundaries beta <= ... <= alpha, every event and every modelled sample's deposit age. The
 * unnormalised posterior is
 *
 *   p(alpha, beta, theta) ∝ 1[order] (alpha - beta + 1)^-m  prod_j L_q,j(d_j)
 *
 * over the window's years, with m the number of events and deposits: the uniform deposition
 * prior between two boundaries with a flat prior on the boundaries (Buck, Kenworthy, Litton &
 * Smith 1991, Antiquity 65:808-821; Bronk Ramsey 2009, Radiocarbon 51(1):337-360). Ties are
 * allowed: on a 1-year grid two things may share a year. (alpha - beta + 1)^-m is the continuous
 * normaliser of m ordered uniforms up to a constant; on the grid it is the model's definition.
 *
 * Moves, all leaving the posterior invariant and never leaving the order:
 *  - Gibbs for each event and deposit from its full conditional between its neighbours in the
 *    order: uniform for an event, L_q restricted to [lo, hi] for a deposit (bisection on its
 *    cumulative sum), scanned young to old and old to young in turn;
 *  - independence Metropolis-Hastings for each boundary, proposing from the continuous
 *    (c + x)^-m density binned to years, which is almost the exact conditional;
 *  - random-walk Metropolis shifts of a block of consecutive stages (the whole sequence, the
 *    part above or below a level, or a run in the middle) by a symmetric integer step drawn at
 *    one of several scales, which moves tightly packed parts of the column together where
 *    single-site updates would crawl;
 *  - an exact joint Gibbs draw of every path of the order (a run of nodes each with one younger
 *    and one older neighbour, possibly ending in a boundary) given the nodes at its two ends, by
 *    forward filtering and backward sampling on the 1-year grid (Carter & Kohn 1994, Biometrika
 *    81(3):541-553; Frühwirth-Schnatter 1994, J. Time Series Anal. 15(2):183-202 [memory for
 *    pages]); see `pathGibbs`.
 */
import { SeededRandom } from '../common/random';
import { NodeKind, OrderGraph } from './column';
import { MixtureLikelihoods } from './likelihood';

/** Step scales (years) of the block shift, chosen uniformly per proposal. */
const SHIFT_SCALES = [1, 3, 10, 30, 100, 300];

/** Share of block shifts that move the whole column with its boundaries. */
const GLOBAL_SHIFT_SHARE = 0.25;

/**
 * Below this share of a sample's total mass the cumulative sums lose too many digits to bisect;
 * the conditional is then summed year by year (only reachable with an outlier prior of 0).
 */
const BISECTION_FLOOR = 1e-9;

/**
 * The paths of two or more nodes in the order graph, young to old. Consecutive nodes u (younger)
 * and v are joined when v is u's only older neighbour and u is v's only younger neighbour. The end
 * boundary is never joined, so a path's weight depends on one free node at most (the start
 * boundary at its top); the nodes bounding a path from outside stay fixed while it is drawn.
 */
function orderPaths(graph: OrderGraph): Int32Array[] {
  const g = graph;
  const olderOf = new Int32Array(g.nodeCount).fill(-1);
  const youngerOf = new Int32Array(g.nodeCount).fill(-1);
  for (let u = 2; u < g.nodeCount; u++) {
    if (g.olderOffsets[u + 1] - g.olderOffsets[u] !== 1) continue;
    const v = g.olderNeighbours[g.olderOffsets[u]];
    if (g.youngerOffsets[v + 1] - g.youngerOffsets[v] !== 1) continue;
    olderOf[u] = v;
    youngerOf[v] = u;
  }
  const paths: Int32Array[] = [];
  for (let start = 2; start < g.nodeCount; start++) {
    if (youngerOf[start] !== -1 || olderOf[start] === -1) continue;
    const nodes: number[] = [start];
    while (olderOf[nodes[nodes.length - 1]] !== -1) nodes.push(olderOf[nodes[nodes.length - 1]]);
    paths.push(Int32Array.from(nodes));
  }
  return paths;
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
 * thousand draws. Conditionals are added as range coefficients in difference arrays; a deposit's
 * density is L_q(d) times the summed coefficient at d.
 */
export class PosteriorAccumulator {
  readonly youngCalBp: number;
  readonly width: number;
  readonly eventDifferences: Float64Array[];
  readonly depositDifferences: Float64Array[];
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
    this.eventOpen = Array.from({ length: eventCount }, () => new Int32Array(width + 1));
    this.depositOpen = Array.from({ length: sampleCount }, () => new Int32Array(width + 1));
    this.outlierSums = new Float64Array(sampleCount);
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

/** One Markov chain over the ordering model. */
export class OrderChain {
  private readonly graph: OrderGraph;
  private readonly likelihoods: MixtureLikelihoods;
  private readonly random: SeededRandom;
  private readonly values: Int32Array;
  private readonly youngToOld: Int32Array;
  private readonly firstDeposit: number;
  /** m: events plus deposits, the exponent of the uniform deposition prior. */
  private readonly uniformCount: number;
  private readonly inBlock: Uint8Array;
  private readonly blockNodes: Int32Array;
  /** firstAtStage[s + 1]: index in youngToOld of the first node whose first stage is >= s. */
  private readonly firstAtStage: Int32Array;
  private readonly young: number;
  private readonly old: number;
  /** Events placed so far while initialising. */
  private readonly placedEvents = new Set<number>();
  private readonly paths: Int32Array[];
  /** Forward cumulative sums of the longest path, path length x window width. */
  private readonly forward: Float64Array;
  blockShiftProposed = 0;
  blockShiftAccepted = 0;
  boundaryProposed = 0;
  boundaryAccepted = 0;

  constructor(model: SamplerModel, seed: number, startFromYoung: boolean) {
    this.graph = model.graph;
    this.likelihoods = model.likelihoods;
    this.random = new SeededRandom(seed);
    this.values = new Int32Array(this.graph.nodeCount);
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
    this.young = this.likelihoods.youngCalBp;
    this.old = this.likelihoods.oldCalBp;
    this.paths = orderPaths(this.graph);
    const longest = this.paths.reduce((n, path) => Math.max(n, path.length), 0);
    this.forward = new Float64Array(longest * (this.old - this.young + 1));
    this.initialise(startFromYoung);
  }

  /** The current state (whole years cal BP per node); a view, not a copy. */
  get state(): Int32Array {
    return this.values;
  }

  /** Youngest year a node may take given its younger neighbours. */
  private lowerBound(node: number): number {
    const g = this.graph;
    let lo = this.young;
    for (let k = g.youngerOffsets[node]; k < g.youngerOffsets[node + 1]; k++) {
      const v = this.values[g.youngerNeighbours[k]];
      if (v > lo) lo = v;
    }
    return lo;
  }

  /** Oldest year a node may take given its older neighbours. */
  private upperBound(node: number): number {
    const g = this.graph;
    let hi = this.old;
    for (let k = g.olderOffsets[node]; k < g.olderOffsets[node + 1]; k++) {
      const v = this.values[g.olderNeighbours[k]];
      if (v < hi) hi = v;
    }
    return hi;
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
    const passLow = new Float64Array(g.nodeCount).fill(this.young);
    const passHigh = new Float64Array(g.nodeCount).fill(this.old);
    const isDeposit = (node: number): boolean => g.kind[node] === NodeKind.DEPOSIT;
    for (const node of order) {
      if (g.kind[node] === NodeKind.START || g.kind[node] === NodeKind.END) continue;
      let lo = this.young;
      let hi = this.old;
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
      const own = this.drawPlain(j, this.young, this.old, fromYoung ? lo : hi);
      this.values[node] = own >= lo && own <= hi ? own : this.drawPlain(j, lo, hi, fromYoung ? lo : hi);
      if (fromYoung) passLow[node] = this.values[node];
      else passHigh[node] = this.values[node];
    }
    // Events, walking the same way, between what is placed on both sides.
    for (const node of order) {
      if (g.kind[node] !== NodeKind.EVENT) continue;
      const lo = this.boundOver(node, false);
      const hi = this.boundOver(node, true);
      const low = lo ?? Math.max(this.young, (hi ?? this.old) - 100);
      const high = hi ?? Math.min(this.old, low + 100);
      this.values[node] = low + this.random.integer(high - low + 1);
      this.placedEvents.add(node);
    }
    let oldest = -Infinity;
    let youngest = Infinity;
    for (let node = 2; node < g.nodeCount; node++) {
      oldest = Math.max(oldest, this.values[node]);
      youngest = Math.min(youngest, this.values[node]);
    }
    this.values[1] = oldest + this.random.integer(Math.min(100, this.old - oldest) + 1);
    this.values[0] = youngest - this.random.integer(Math.min(100, youngest - this.young) + 1);
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
    const L = this.likelihoods;
    const below = L.plainCumulativeTo(sample, lo - 1);
    const mass = L.plainCumulativeTo(sample, hi) - below;
    if (!(mass > BISECTION_FLOOR * L.plainCumulativeTo(sample, this.old))) return fallback;
    const target = below + (1 - this.random.uniform()) * mass;
    let a = lo;
    let b = hi;
    while (a < b) {
      const mid = (a + b) >> 1;
      if (L.plainCumulativeTo(sample, mid) >= target) b = mid;
      else a = mid + 1;
    }
    return a;
  }

  /** Gibbs draw of a deposit from L_q on [lo, hi]. */
  private drawDeposit(sample: number, lo: number, hi: number, current: number): number {
    const L = this.likelihoods;
    const below = L.cumulativeTo(sample, lo - 1);
    const mass = L.cumulativeTo(sample, hi) - below;
    if (mass > BISECTION_FLOOR * L.totalMass(sample)) {
      const target = below + (1 - this.random.uniform()) * mass;
      let a = lo;
      let b = hi;
      while (a < b) {
        const mid = (a + b) >> 1;
        if (L.cumulativeTo(sample, mid) >= target) b = mid;
        else a = mid + 1;
      }
      return a;
    }
    let sum = 0;
    for (let x = lo; x <= hi; x++) sum += L.mixture(sample, x);
    if (!(sum > 0)) return current;
    let target = (1 - this.random.uniform()) * sum;
    for (let x = lo; x <= hi; x++) {
      target -= L.mixture(sample, x);
      if (target <= 0) return x;
    }
    return hi;
  }

  /**
   * Independence MH update of a boundary. With the rest fixed, k = distance of the boundary
   * beyond the extreme node has target (c + k)^-m on 0..K, c = span to the other boundary + 1.
   * The proposal is the continuous density (c + x)^-m on [0, K + 1) binned to whole years, whose
   * ratio to the target, w(k) = (c + k)^-m / int_k^k+1 (c + x)^-m dx, is near 1.
   */
  private updateBoundary(isStart: boolean): void {
    const m = this.uniformCount;
    const g = this.graph;
    const node = isStart ? 1 : 0;
    const other = this.values[isStart ? 0 : 1];
    const limit = isStart ? this.lowerBound(node) : this.upperBound(node);
    const room = isStart ? this.old - limit : limit - this.young;
    if (g.nodeCount <= 2 || room <= 0) {
      this.values[node] = limit;
      return;
    }
    const c = isStart ? limit - other + 1 : other - limit + 1;
    const logRatio = Math.log((c + room + 1) / c);
    const u = this.random.uniform();
    let x: number;
    if (m === 1) {
      x = c * Math.exp(u * logRatio) - c;
    } else {
      const tailShare = -Math.expm1((1 - m) * logRatio); // 1 - ((c + K + 1) / c)^(1 - m)
      x = c * Math.exp(Math.log1p(-u * tailShare) / (1 - m)) - c;
    }
    const proposed = Math.min(room, Math.max(0, Math.floor(x)));
    const current = isStart ? this.values[node] - limit : limit - this.values[node];
    const logWeight = (k: number): number => {
      const y = c + k;
      const binned = m === 1 ? Math.log(Math.log1p(1 / y)) : Math.log(-Math.expm1((1 - m) * Math.log1p(1 / y)));
      return -Math.log(y) - binned;
    };
    this.boundaryProposed++;
    if (Math.log(this.random.uniform()) < logWeight(proposed) - logWeight(current)) {
      this.values[node] = isStart ? limit + proposed : limit - proposed;
      this.boundaryAccepted++;
    }
  }

  /** Whether the order graph has a path for `pathGibbs` to draw. */
  get hasPaths(): boolean {
    return this.paths.length > 0;
  }

  /**
   * Exact joint Gibbs draw of each path of the order given the rest. Along a path the full
   * conditional is a chain: prod_k g_k(x_k) 1[lo <= x_1 <= ... <= x_n <= hi], with g = L_q for a
   * deposit, 1 for an event and (alpha - beta + 1)^-m for the start boundary (beta is fixed), so
   * forward cumulative sums C_k(x) = sum_{y <= x} g_k(y) C_{k-1}(y) and sampling back from the top
   * (x_n from g_n C_{n-1}, then x_k from g_k C_{k-1} up to x_{k+1}) give an exact draw
   * (Carter & Kohn 1994).
   *
   * Why: with outliers allowed, a column with one sample per unit has a second mode where the
   * older samples are all outliers and the whole column shrinks to a short span, which the span
   * prior (alpha - beta + 1)^-m rewards. Leaving or entering it means moving the start boundary and
   * every age below it together; single-site Gibbs must pass states where either the span is long
   * with nothing yet on its likelihood or a sample sits off it, and a block shift cannot change
   * the span's length, so chains stayed in one mode for thousands of sweeps (split R-hat 1.16 on
   * the inherited-gap test column). This draw crosses in one step with the right probability.
   */
  pathGibbs(): void {
    const L = this.likelihoods;
    const m = this.uniformCount;
    const f = this.forward;
    const r = this.random;
    for (const path of this.paths) {
      const n = path.length;
      const topIsStart = path[n - 1] === 1;
      const lo = this.lowerBound(path[0]);
      const hi = topIsStart ? this.old : this.upperBound(path[n - 1]);
      const width = hi - lo + 1;
      const end = this.values[0];
      // The span weight relative to its largest value, ((x - beta + 1) / (lo - beta + 1))^-m <= 1.
      const logShortest = Math.log(lo - end + 1);
      for (let k = 0; k < n; k++) {
        const node = path[k];
        const kind = this.graph.kind[node];
        const row = k * width;
        const j = node - this.firstDeposit;
        let running = 0;
        for (let i = 0; i < width; i++) {
          const x = lo + i;
          const g =
            kind === NodeKind.DEPOSIT
              ? L.mixture(j, x)
              : kind === NodeKind.START
                ? Math.exp(-m * (Math.log(x - end + 1) - logShortest))
                : 1;
          running += k === 0 ? g : g * f[row - width + i];
          f[row + i] = running;
        }
        // Rescale each row to end at 1 so that long paths neither underflow nor overflow.
        if (!(running > 0)) return;
        for (let i = 0; i < width; i++) f[row + i] /= running;
      }
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
        this.values[path[k]] = lo + a;
        upper = a;
      }
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
        if (kind === NodeKind.EVENT) this.values[node] = lo + this.random.integer(hi - lo + 1);
        else this.values[node] = this.drawDeposit(node - this.firstDeposit, lo, hi, this.values[node]);
      }
    }
  }

  /**
   * Metropolis shift of every node whose stages lie within a block by a symmetric integer step.
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
    const step = Math.round(scale * r.normal());
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
    if (inBlock[1] && v[1] + step > this.old) return false;
    if (inBlock[0] && v[0] + step < this.young) return false;
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
        // With q > 0 each factor lies within about [q / W / max L, max L W / q], so the product of
        // a few hundred stays far inside the double range.
        ratio *= L.mixture(j, moved) / L.mixture(j, v[node]);
        if (!(ratio > 0)) return false;
      }
    }
    if (inBlock[0] !== inBlock[1]) {
      const span = v[1] - v[0] + 1;
      const movedSpan = span + (inBlock[1] ? step : -step);
      ratio *= Math.pow(span / movedSpan, this.uniformCount);
    }
    return ratio >= 1 || this.random.uniform() < ratio;
  }

  /** Add the current state's full conditionals to the accumulator. */
  accumulate(into: PosteriorAccumulator): void {
    const g = this.graph;
    const L = this.likelihoods;
    const young = into.youngCalBp;
    for (let k = 0; k < g.events.length; k++) {
      const node = 2 + k;
      const lo = this.lowerBound(node);
      const hi = this.upperBound(node);
      const d = into.eventDifferences[k];
      const weight = 1 / (hi - lo + 1);
      d[lo - young] += weight;
      d[hi - young + 1] -= weight;
      into.eventOpen[k][lo - young]++;
      into.eventOpen[k][hi - young + 1]--;
    }
    for (let j = 0; j < g.samples.length; j++) {
      const node = this.firstDeposit + j;
      const lo = this.lowerBound(node);
      const hi = this.upperBound(node);
      const mass = L.massBetween(j, lo, hi);
      if (!(mass > 0)) continue;
      const d = into.depositDifferences[j];
      d[lo - young] += 1 / mass;
      d[hi - young + 1] -= 1 / mass;
      into.depositOpen[j][lo - young]++;
      into.depositOpen[j][hi - young + 1]--;
      into.outlierSums[j] += (L.flat * (hi - lo + 1)) / mass;
    }
    into.draws++;
  }

  /** Deposits whose likelihood, outlier term included, is zero in the current state. */
  impossibleDeposits(): number[] {
    const out: number[] = [];
    for (let j = 0; j < this.graph.samples.length; j++) {
      if (!(this.likelihoods.mixture(j, this.values[this.firstDeposit + j]) > 0)) out.push(j);
    }
    return out;
  }
}
