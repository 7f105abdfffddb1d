/**
 * One Markov chain of the joint age model. The state is one continuous age (cal BP) per node of
 * the joint order graph (`joint-model.ts`); the unnormalised posterior is the product over sites
 * of each site model's prior times every deposit's likelihood,
 *
 *   p ∝ prod_sites 1[order_s] s_s^-m_s / (W - s_s)  prod_j L_q,j(d_j),   s_s = alpha_s - beta_s,
 *
 * with a regional event's node standing in each member site's order. The moves are the site
 * sampler's, generalised to the joint graph and reusing its building blocks (`age-model/sampler.ts`):
 *  - Gibbs for every event and deposit between its neighbours in every site (a regional event is
 *    uniform on the intersection of its members' intervals), scanned young to old and back;
 *  - the site sampler's independence Metropolis-Hastings draw of each site's boundaries
 *    (`proposeBoundaryOffset`, accepted by the span correction's ratio);
 *  - random-walk block shifts of a run of one site's stages (a regional event in the block keeps
 *    its other members' neighbours as limits), and "cut" shifts that move every age older (or
 *    younger) than a uniformly drawn age c by a Gaussian step in all sites at once, rejected when
 *    the step would carry the block past an age left behind, so that cutting the moved state at
 *    c + step selects the same block (the move is its own reverse, with Jacobian 1); a cut below
 *    every age moves the whole record;
 *  - the site sampler's path draw (`drawPath`) for every run of the joint graph whose nodes have
 *    one younger and one older neighbour each.
 */
import { NodeKind } from '../age-model/column';
import { MixtureLikelihoods } from '../age-model/likelihood';
import {
  GLOBAL_SHIFT_SHARE,
  INITIAL_CLEARANCE,
  PathBuffers,
  PosteriorAccumulator,
  SHIFT_SCALES,
  drawDepositAge,
  drawPath,
  drawPlainDeposit,
  logSpanPrior,
  orderPaths,
  pathBuffers,
  oldestAllowed,
  proposeBoundaryOffset,
  youngestAllowed,
} from '../age-model/sampler';
import { SeededRandom } from '../common/random';
import { JointGraph, JointModel } from './joint-model';

// Plain constants: reading NodeKind's members in the inner loops costs a property lookup each.
const END = NodeKind.END;
const START = NodeKind.START;
const EVENT = NodeKind.EVENT;
const DEPOSIT = NodeKind.DEPOSIT;

export class JointChain {
  private readonly graph: JointGraph;
  private readonly likelihoods: MixtureLikelihoods;
  private readonly random: SeededRandom;
  private readonly values: Float64Array;
  private readonly youngEdge: number;
  private readonly oldEdge: number;
  private readonly windowLength: number;
  private readonly inBlock: Uint8Array;
  private readonly blockNodes: Int32Array;
  /** Cumulative stage counts of the sites, for choosing a site's block in proportion to its size. */
  private readonly siteWeights: Float64Array;
  private readonly paths: Int32Array[];
  private readonly buffers: PathBuffers;
  blockShiftProposed = 0;
  blockShiftAccepted = 0;
  cutShiftProposed = 0;
  cutShiftAccepted = 0;
  boundaryProposed = 0;
  boundaryAccepted = 0;
  pathProposed = 0;
  pathAccepted = 0;

  constructor(model: JointModel, seed: number, startFromYoung: boolean) {
    this.graph = model.graph;
    this.likelihoods = model.likelihoods;
    this.random = new SeededRandom(seed);
    this.values = new Float64Array(this.graph.nodeCount);
    this.youngEdge = this.likelihoods.youngEdge;
    this.oldEdge = this.likelihoods.oldEdge;
    this.windowLength = this.oldEdge - this.youngEdge;
    this.inBlock = new Uint8Array(this.graph.nodeCount);
    this.blockNodes = new Int32Array(this.graph.nodeCount);
    this.siteWeights = new Float64Array(this.graph.sites.length);
    let total = 0;
    this.graph.sites.forEach((site, s) => (this.siteWeights[s] = total += site.graph.stageCount + 2));
    this.paths = orderPaths(this.graph);
    const longest = this.paths.reduce((n, path) => Math.max(n, path.length), 0);
    this.buffers = pathBuffers(this.likelihoods, this.random, this.graph.kind, this.graph.depositOf, longest);
    this.initialise(startFromYoung);
  }

  /** The current state (continuous cal BP per node); a view, not a copy. */
  get state(): Float64Array {
    return this.values;
  }

  /** Block shifts per sweep: as the site sampler, one plus a quarter of the stages, per site. */
  get blockShiftsPerSweep(): number {
    return this.graph.sites.reduce((n, site) => n + 1 + Math.floor(site.graph.stageCount / 4), 0);
  }

  private lowerBound(node: number): number {
    return youngestAllowed(this.graph, this.values, node, this.youngEdge);
  }

  private upperBound(node: number): number {
    return oldestAllowed(this.graph, this.values, node, this.oldEdge);
  }

  private isBoundary(node: number): boolean {
    const kind = this.graph.kind[node];
    return kind === START || kind === END;
  }

  /**
   * A dispersed, order-respecting start, as the site sampler's: walking the joint order from one
   * end, each deposit is drawn from its own likelihood and redrawn beyond the bound set by what is
   * already placed when it falls short; events then go uniformly between their placed
   * neighbours, each site's boundaries a little outside its ages. Even chains start from the
   * young end and lean old, odd chains the reverse.
   */
  private initialise(fromYoung: boolean): void {
    const g = this.graph;
    const L = this.likelihoods;
    const r = this.random;
    const order = fromYoung ? g.youngToOld : g.youngToOld.slice().reverse();
    const pass = new Float64Array(g.nodeCount);
    for (const node of order) {
      if (this.isBoundary(node)) continue;
      const offsets = fromYoung ? g.youngerOffsets : g.olderOffsets;
      const neighbours = fromYoung ? g.youngerNeighbours : g.olderNeighbours;
      let bound = fromYoung ? this.youngEdge : this.oldEdge;
      for (let e = offsets[node]; e < offsets[node + 1]; e++) {
        const b = neighbours[e];
        if (this.isBoundary(b)) continue;
        bound = fromYoung ? Math.max(bound, pass[b]) : Math.min(bound, pass[b]);
      }
      pass[node] = bound;
      if (g.kind[node] !== DEPOSIT) continue;
      const j = g.depositOf[node];
      const own = drawPlainDeposit(L, j, this.youngEdge, this.oldEdge, bound, r);
      const fits = fromYoung ? own > bound : own < bound;
      this.values[node] = fits
        ? own
        : drawPlainDeposit(L, j, fromYoung ? bound : this.youngEdge, fromYoung ? this.oldEdge : bound, bound, r);
      pass[node] = this.values[node];
    }
    // Events: the older limit passed through events from the deposits, then placed young to old.
    const olderLimit = new Float64Array(g.nodeCount).fill(this.oldEdge);
    for (let k = g.youngToOld.length - 1; k >= 0; k--) {
      const node = g.youngToOld[k];
      if (this.isBoundary(node)) continue;
      if (g.kind[node] === DEPOSIT) {
        olderLimit[node] = this.values[node];
        continue;
      }
      let hi = this.oldEdge;
      for (let e = g.olderOffsets[node]; e < g.olderOffsets[node + 1]; e++) {
        const b = g.olderNeighbours[e];
        if (!this.isBoundary(b)) hi = Math.min(hi, olderLimit[b]);
      }
      olderLimit[node] = hi;
    }
    for (const node of g.youngToOld) {
      if (g.kind[node] !== EVENT) continue;
      let lo: number | undefined;
      for (let e = g.youngerOffsets[node]; e < g.youngerOffsets[node + 1]; e++) {
        const b = g.youngerNeighbours[e];
        if (!this.isBoundary(b)) lo = Math.max(lo ?? -Infinity, this.values[b]);
      }
      const high = olderLimit[node];
      const low = lo ?? Math.max(this.youngEdge, high - 100);
      this.values[node] = low + (high - low) * (INITIAL_CLEARANCE + (1 - 2 * INITIAL_CLEARANCE) * r.uniform());
    }
    const spread = Math.min(0.5, 100 / this.windowLength);
    for (const site of g.sites) {
      let oldest = -Infinity;
      let youngest = Infinity;
      for (let local = 2; local < site.graph.nodeCount; local++) {
        const v = this.values[site.nodes[local]];
        oldest = Math.max(oldest, v);
        youngest = Math.min(youngest, v);
      }
      this.values[site.startNode] = oldest + (this.oldEdge - oldest) * (INITIAL_CLEARANCE + spread * r.uniform());
      this.values[site.endNode] = youngest - (youngest - this.youngEdge) * (INITIAL_CLEARANCE + spread * r.uniform());
    }
  }

  /**
   * The site sampler's boundary move: with the rest fixed, the distance k of the boundary beyond
   * its site's extreme node has target (c + k)^-m / (W - c - k); the proposal (c + x)^-m is
   * exact, so the span correction's ratio decides.
   */
  private updateBoundary(node: number): void {
    const g = this.graph;
    const isStart = g.kind[node] === START;
    const m = g.sites[g.siteOf[node]].uniformCount;
    const other = this.values[g.otherBoundary[node]];
    const limit = isStart ? this.lowerBound(node) : this.upperBound(node);
    const room = isStart ? this.oldEdge - limit : limit - this.youngEdge;
    if (!(room > 0)) {
      this.values[node] = limit;
      return;
    }
    const c = isStart ? limit - other : other - limit;
    if (!(c > 0)) return;
    const proposed = proposeBoundaryOffset(c, room, m, this.random.uniform());
    const current = isStart ? this.values[node] - limit : limit - this.values[node];
    this.boundaryProposed++;
    const W = this.windowLength;
    if (!(W - c - proposed > 0)) return;
    const logAccept = Math.log(W - c - current) - Math.log(W - c - proposed);
    if (logAccept >= 0 || Math.log(this.random.uniform()) < logAccept) {
      this.values[node] = isStart ? limit + proposed : limit - proposed;
      this.boundaryAccepted++;
    }
  }

  /** One Gibbs pass over every node, young to old or old to young. */
  sweep(fromYoung: boolean): void {
    const g = this.graph;
    const order = g.youngToOld;
    const n = order.length;
    for (let step = 0; step < n; step++) {
      const node = order[fromYoung ? step : n - 1 - step];
      const kind = g.kind[node];
      if (kind === START || kind === END) this.updateBoundary(node);
      else {
        const lo = this.lowerBound(node);
        const hi = this.upperBound(node);
        if (kind === EVENT) this.values[node] = lo + (hi - lo) * this.random.uniform();
        else this.values[node] = drawDepositAge(this.likelihoods, g.depositOf[node], lo, hi, this.values[node], this.random);
      }
    }
  }

  /** Shift a run of one site's stages (the whole site, the part above or below a level, or a middle run). */
  blockShift(): void {
    const g = this.graph;
    const r = this.random;
    const pick = r.uniform() * this.siteWeights[this.siteWeights.length - 1];
    let s = 0;
    while (s < this.siteWeights.length - 1 && this.siteWeights[s] <= pick) s++;
    const site = g.sites[s];
    const stages = site.graph.stageCount;
    let first = -1 + r.integer(stages + 2);
    let last = -1 + r.integer(stages + 2);
    if (first > last) [first, last] = [last, first];
    const step = SHIFT_SCALES[r.integer(SHIFT_SCALES.length)] * r.normal();
    if (step === 0) return;
    const order = site.localYoungToOld;
    const block = this.blockNodes;
    let size = 0;
    for (let k = site.firstAtStage[first + 1]; k < order.length && site.graph.stageMin[order[k]] <= last; k++) {
      const local = order[k];
      if (site.graph.stageMax[local] <= last) block[size++] = site.nodes[local];
    }
    if (size === 0) return;
    this.blockShiftProposed++;
    if (this.shiftBlock(size, step)) this.blockShiftAccepted++;
  }

  /**
   * Shift every age older than a cut c (or younger, half the time) in every site by one step; a
   * quarter of the cuts lie beyond every age, moving the whole record.
   */
  cutShift(): void {
    const g = this.graph;
    const r = this.random;
    const v = this.values;
    const step = SHIFT_SCALES[r.integer(SHIFT_SCALES.length)] * r.normal();
    if (step === 0) return;
    const block = this.blockNodes;
    let size = 0;
    if (r.uniform() < GLOBAL_SHIFT_SHARE) {
      for (let node = 0; node < g.nodeCount; node++) block[size++] = node;
    } else {
      const olderPart = r.uniform() < 0.5;
      const cut = this.youngEdge + this.windowLength * r.uniform();
      const moved = cut + step;
      if (!(moved > this.youngEdge && moved < this.oldEdge)) return;
      for (let node = 0; node < g.nodeCount; node++) {
        const x = v[node];
        if (olderPart ? x > cut : x < cut) block[size++] = node;
        // An age left behind between the cut and its shifted place: the reverse cut would take it.
        else if (olderPart ? step < 0 && x > moved : step > 0 && x < moved) return;
      }
      if (size === 0) return;
    }
    this.cutShiftProposed++;
    if (this.shiftBlock(size, step)) this.cutShiftAccepted++;
  }

  /** The Metropolis decision for shifting the first `size` nodes of blockNodes by `step`, applied if accepted. */
  private shiftBlock(size: number, step: number): boolean {
    const v = this.values;
    const block = this.blockNodes;
    const inBlock = this.inBlock;
    for (let k = 0; k < size; k++) inBlock[block[k]] = 1;
    const accepted = this.acceptShift(size, step);
    for (let k = 0; k < size; k++) inBlock[block[k]] = 0;
    if (accepted) for (let k = 0; k < size; k++) v[block[k]] += step;
    return accepted;
  }

  private acceptShift(size: number, step: number): boolean {
    const g = this.graph;
    const v = this.values;
    const inBlock = this.inBlock;
    const block = this.blockNodes;
    const L = this.likelihoods;
    let logRatio = 0;
    for (let k = 0; k < size; k++) {
      const node = block[k];
      const moved = v[node] + step;
      const kind = g.kind[node];
      if (kind === START || kind === END) {
        if (moved > this.oldEdge || moved < this.youngEdge) return false;
        const other = g.otherBoundary[node];
        if (!inBlock[other] && kind === START) {
          const site = g.sites[g.siteOf[node]];
          const span = v[node] - v[other];
          const movedSpan = span + step;
          if (!(movedSpan > 0 && movedSpan < this.windowLength)) return false;
          logRatio += logSpanPrior(movedSpan, site.uniformCount, this.windowLength) - logSpanPrior(span, site.uniformCount, this.windowLength);
        } else if (!inBlock[other]) {
          const site = g.sites[g.siteOf[node]];
          const span = v[other] - v[node];
          const movedSpan = span - step;
          if (!(movedSpan > 0 && movedSpan < this.windowLength)) return false;
          logRatio += logSpanPrior(movedSpan, site.uniformCount, this.windowLength) - logSpanPrior(span, site.uniformCount, this.windowLength);
        }
      }
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
      if (kind === DEPOSIT) {
        const j = g.depositOf[node];
        const now = L.at(j, v[node]);
        const then = L.at(j, moved);
        if (!(then > 0)) return false;
        logRatio += Math.log(then) - Math.log(now);
      }
    }
    return logRatio >= 0 || Math.log(this.random.uniform()) < logRatio;
  }

  /** Whether the joint graph has a path for `pathUpdate` to draw. */
  get hasPaths(): boolean {
    return this.paths.length > 0;
  }

  /** The site sampler's path draw (`drawPath`) for every path of the joint graph. */
  pathUpdate(): void {
    const g = this.graph;
    for (const path of this.paths) {
      const n = path.length;
      const top = path[n - 1];
      const topIsStart = g.kind[top] === START;
      const lo = this.lowerBound(path[0]);
      const hi = topIsStart ? this.oldEdge : this.upperBound(top);
      if (!(hi > lo)) continue;
      const startPrior = topIsStart ? { end: this.values[g.otherBoundary[top]], m: g.sites[g.siteOf[top]].uniformCount } : null;
      const outcome = drawPath(this.buffers, this.values, path, lo, hi, startPrior);
      if (outcome === 'stop') return;
      this.pathProposed++;
      if (outcome === 'accepted') this.pathAccepted++;
    }
  }

  /**
   * Add the full conditional of each event node (uniform between its neighbours in every site) to
   * the accumulator's k-th event density (Rao-Blackwellisation, Gelfand & Smith 1990).
   */
  accumulateEvents(into: PosteriorAccumulator, eventNodes: Int32Array): void {
    for (let k = 0; k < eventNodes.length; k++) {
      const node = eventNodes[k];
      const lo = this.lowerBound(node);
      const hi = this.upperBound(node);
      if (hi > lo) into.addInterval(into.eventDifferences[k], into.eventDirect[k], into.eventOpen[k], lo, hi, 1 / (hi - lo));
      else into.addPoint(into.eventDirect[k], into.eventOpen[k], lo);
    }
    into.draws++;
  }

  /** Add each sample's conditional outlier probability (Rao-Blackwellised) given the current state. */
  addOutlierShares(into: Float64Array): void {
    const g = this.graph;
    const L = this.likelihoods;
    for (let j = 0; j < g.sampleNodes.length; j++) {
      const node = g.sampleNodes[j];
      const sample = g.depositOf[node];
      const lo = this.lowerBound(node);
      const hi = this.upperBound(node);
      const mass = L.cumulativeAt(sample, hi) - L.cumulativeAt(sample, lo);
      if (mass > 0) into[j] += (L.outlierCumulativeAt(sample, hi) - L.outlierCumulativeAt(sample, lo)) / mass;
      else into[j] += L.outlierPrior;
    }
  }

  /** Samples (index in graph.samples) whose likelihood, outlier term included, is zero now. */
  impossibleDeposits(): number[] {
    const g = this.graph;
    const out: number[] = [];
    for (let j = 0; j < g.sampleNodes.length; j++) {
      const node = g.sampleNodes[j];
      if (!(this.likelihoods.at(g.depositOf[node], this.values[node]) > 0)) out.push(j);
    }
    return out;
  }
}
