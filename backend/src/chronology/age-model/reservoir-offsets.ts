/**
 * One reservoir offset per Delta-R source (issue 12, item 4).
 *
 * Marine samples of a site whose Delta-R comes from one regional entry share one local offset:
 * the true Delta-R of the site is one unknown, not one per sample. Drawing it independently per
 * sample (calibrating each with its own Delta-R error) lets its uncertainty average down across
 * samples, as if n samples measured n different offsets.
 *
 * The model here: each source s has one offset R_s with a normal prior N(Delta-R, sigma^2) from
 * its entry, discretised on a grid of GRID_POINTS values from -GRID_HALF_WIDTH_SD to
 * +GRID_HALF_WIDTH_SD standard deviations, each weighted by the normal density there (renormalised).
 * Every sample of the source is calibrated at each grid value with no Delta-R error
 * (`SampleReservoir.gridLikelihoods`), so its likelihood given R_s = r_k is exact on the grid.
 *
 * The ordering model carries the grid index k_s in its state. Its update is a Gibbs draw from the
 * full conditional
 *
 *   p(k | rest) ∝ pi_k prod_{j in s} L_q,j^(k)(d_j),
 *
 * and, when no two samples of the source are neighbours in the order (their deposit ages are then
 * independent given the rest), a block Gibbs draw of (k, the source's deposit ages): k from
 * pi_k prod_j int_{lo_j}^{hi_j} L_q,j^(k), then each deposit from L_q,j^(k) on its [lo_j, hi_j]. Both
 * leave the posterior invariant (Gelfand & Smith 1990, JASA 85:398-409); the block draw lets the
 * offset move without waiting for the deposit ages. The offset's posterior is Rao-Blackwellised:
 * each kept state adds its full conditional over the grid.
 *
 * The hemipelagic model sums the offset out exactly instead (`marginalLogLikelihood`).
 */
import { CalendarDensity } from '../common/density';
import { SeededRandom } from '../common/random';
import type { AgeRelation, ColumnSample, OrderGraph } from './column';
import { NodeKind } from './column';
import { CalendarWindow, depositLikelihood, MixtureLikelihoods, yearOf } from './likelihood';
import { drawDepositAge } from './sampler';

/** Values of the offset's grid: 21 points over +-4 standard deviations (0.4 sd apart). */
export const GRID_POINTS = 21;
export const GRID_HALF_WIDTH_SD = 4;

/** A regional Delta-R entry shared by samples of one site. */
export interface ReservoirSource {
  /** Identifies the source within the run. */
  readonly key: string;
  /** As shown: the source's name, or its Delta-R and error when the samples name none. */
  readonly label: string;
  /** True when the samples name the source (`Sample.deltaRSource`). */
  readonly named: boolean;
  /** The entry's Delta-R and its 1-sigma error (14C years): the offset's prior. */
  readonly priorMeanYears: number;
  readonly priorSdYears: number;
  /** Delta-R values of the grid (14C years), ascending (`reservoirGrid`). */
  readonly grid: readonly number[];
}

/** A marine sample's part in a shared offset. */
export interface SampleReservoir {
  readonly sourceKey: string;
  /** The sample's calendar likelihood with Delta-R fixed at each grid value of its source (normalised). */
  readonly gridLikelihoods: readonly CalendarDensity[];
  /**
   * log of each grid likelihood's mass before normalising (radiocarbon: the sum over years of the
   * 14C age's Gaussian density), so the grid values are weighed by how well the measurement fits
   * the curve at each offset, not only by where it falls. Absent: equal masses.
   */
  readonly gridLogMass?: readonly number[];
}

/** The posterior of one source's offset. */
export interface ReservoirOffsetPosterior {
  readonly key: string;
  readonly label: string;
  readonly named: boolean;
  readonly priorMeanYears: number;
  readonly priorSdYears: number;
  readonly sampleIds: readonly string[];
  readonly medianYears: number;
  /** Central 95 % range (2.5 % and 97.5 % quantiles), 14C years. */
  readonly low95Years: number;
  readonly high95Years: number;
}

/** The grid of Delta-R values for a prior mean and standard deviation (> 0). */
export function reservoirGrid(meanYears: number, sdYears: number): number[] {
  const step = (2 * GRID_HALF_WIDTH_SD * sdYears) / (GRID_POINTS - 1);
  return Array.from({ length: GRID_POINTS }, (_, k) => meanYears - GRID_HALF_WIDTH_SD * sdYears + k * step);
}

/**
 * log pi_k: the normal prior at each grid value, renormalised over the grid; with the samples'
 * likelihood masses (`SampleReservoir.gridLogMass`) added, as every sample of the source shares k.
 */
export function logGridPrior(source: ReservoirSource, members: readonly (SampleReservoir | undefined)[] = []): Float64Array {
  const raw = source.grid.map(
    (r, k) => -0.5 * ((r - source.priorMeanYears) / source.priorSdYears) ** 2 + members.reduce((sum, m) => sum + (m?.gridLogMass?.[k] ?? 0), 0),
  );
  const top = Math.max(...raw);
  const total = raw.reduce((sum, v) => sum + Math.exp(v - top), 0);
  return Float64Array.from(raw, (v) => v - top - Math.log(total));
}

/**
 * Quantiles of a distribution on the grid, each grid value standing for the interval halfway to
 * its neighbours (the prior's discretisation), linearly interpolated within it.
 */
export function gridQuantile(grid: readonly number[], weights: ArrayLike<number>, q: number): number {
  let total = 0;
  for (let k = 0; k < grid.length; k++) total += weights[k];
  const half = grid.length > 1 ? (grid[1] - grid[0]) / 2 : 0;
  let running = 0;
  for (let k = 0; k < grid.length; k++) {
    const next = running + weights[k];
    if (next >= q * total && weights[k] > 0) return grid[k] - half + ((q * total - running) / weights[k]) * 2 * half;
    running = next;
  }
  return grid[grid.length - 1] + half;
}

/** One source as the ordering model holds it. */
interface SourceState {
  readonly source: ReservoirSource;
  readonly logPrior: Float64Array;
  /** The source's samples (indices into the graph's samples). */
  readonly samples: Int32Array;
  /** Per grid value, the likelihoods of the source's samples (local index = position in `samples`). */
  readonly alternatives: MixtureLikelihoods[];
  /** True when no two of the source's deposits are neighbours in the order. */
  readonly independent: boolean;
  /** Rao-Blackwellised posterior weights over the grid. */
  readonly posterior: Float64Array;
}

/** The shared offsets of an ordering model: their grid likelihoods, updates and posteriors. */
export class SharedOffsets {
  private readonly states: SourceState[];
  private readonly firstDeposit: number;
  private readonly work: Float64Array;
  /** Rao-Blackwellised deposit densities of the shared samples, per window year, by sample index. */
  readonly depositSums = new Map<number, Float64Array>();

  constructor(
    private readonly graph: OrderGraph,
    sources: readonly ReservoirSource[],
    window: CalendarWindow,
    outlierPrior: number,
    shiftScaleYears: number,
    scaleOf: (sample: ColumnSample) => number,
  ) {
    this.firstDeposit = 2 + graph.events.length;
    const bySource = new Map<string, number[]>();
    graph.samples.forEach((sample, j) => {
      const key = sample.reservoir?.sourceKey;
      if (key === undefined) return;
      const list = bySource.get(key) ?? [];
      list.push(j);
      bySource.set(key, list);
    });
    this.states = [];
    for (const source of sources) {
      const members = bySource.get(source.key);
      if (!members || members.length === 0) continue;
      const samples = Int32Array.from(members);
      const alternatives = source.grid.map(
        (_, k) =>
          new MixtureLikelihoods(
            members.map((j) => {
              const sample = graph.samples[j];
              const own = sample.reservoir!.gridLikelihoods[k];
              return depositLikelihood(own, sample.ageRelation as AgeRelation, scaleOf(sample));
            }),
            window,
            outlierPrior,
            shiftScaleYears,
          ),
      );
      const nodes = new Set(members.map((j) => this.firstDeposit + j));
      let independent = true;
      for (const node of nodes) {
        for (let e = graph.olderOffsets[node]; e < graph.olderOffsets[node + 1]; e++) if (nodes.has(graph.olderNeighbours[e])) independent = false;
      }
      for (const j of members) this.depositSums.set(j, new Float64Array(window.oldCalBp - window.youngCalBp + 1));
      this.states.push({ source, logPrior: logGridPrior(source, members.map((j) => graph.samples[j].reservoir)), samples, alternatives, independent, posterior: new Float64Array(source.grid.length) });
    }
    this.work = new Float64Array(Math.max(1, ...sources.map((s) => s.grid.length)));
  }

  get count(): number {
    return this.states.length;
  }

  /** A chain's starting offsets: the grid value nearest each prior mean, put into `likelihoods`. */
  start(likelihoods: MixtureLikelihoods): Int32Array {
    const state = new Int32Array(this.states.length);
    this.states.forEach((s, i) => {
      state[i] = (s.source.grid.length - 1) >> 1;
      this.use(likelihoods, s, state[i]);
    });
    return state;
  }

  private use(likelihoods: MixtureLikelihoods, s: SourceState, k: number): void {
    for (let local = 0; local < s.samples.length; local++) likelihoods.adopt(s.samples[local], s.alternatives[k], local);
  }

  private bounds(node: number, values: Float64Array, likelihoods: MixtureLikelihoods): [number, number] {
    const g = this.graph;
    let lo = likelihoods.youngEdge;
    let hi = likelihoods.oldEdge;
    for (let e = g.youngerOffsets[node]; e < g.youngerOffsets[node + 1]; e++) lo = Math.max(lo, values[g.youngerNeighbours[e]]);
    for (let e = g.olderOffsets[node]; e < g.olderOffsets[node + 1]; e++) hi = Math.min(hi, values[g.olderNeighbours[e]]);
    return [lo, hi];
  }

  /** log of each grid value's full-conditional weight, into `this.work`; the largest is returned. */
  private conditional(s: SourceState, values: Float64Array, likelihoods: MixtureLikelihoods, block: boolean): number {
    const w = this.work;
    let top = -Infinity;
    for (let k = 0; k < s.alternatives.length; k++) {
      const L = s.alternatives[k];
      let lw = s.logPrior[k];
      for (let local = 0; local < s.samples.length && lw > -Infinity; local++) {
        const node = this.firstDeposit + s.samples[local];
        let value: number;
        if (block) {
          const [lo, hi] = this.bounds(node, values, likelihoods);
          value = hi > lo ? L.cumulativeAt(local, hi) - L.cumulativeAt(local, lo) : L.at(local, lo);
        } else {
          value = L.at(local, values[node]);
        }
        lw += value > 0 ? Math.log(value) : -Infinity;
      }
      w[k] = lw;
      if (lw > top) top = lw;
    }
    return top;
  }

  private drawIndex(s: SourceState, top: number, random: SeededRandom): number {
    const w = this.work;
    const n = s.alternatives.length;
    let total = 0;
    for (let k = 0; k < n; k++) total += w[k] = Math.exp(w[k] - top);
    let target = random.uniform() * total;
    for (let k = 0; k < n; k++) {
      target -= w[k];
      if (target < 0) return k;
    }
    return n - 1;
  }

  /**
   * Update every source's offset in a chain's state: the block draw with its deposits where they
   * are independent given the rest, else the Gibbs draw of the offset alone.
   */
  update(likelihoods: MixtureLikelihoods, state: Int32Array, values: Float64Array, random: SeededRandom): void {
    this.states.forEach((s, i) => {
      const top = this.conditional(s, values, likelihoods, s.independent);
      if (!(top > -Infinity)) return;
      const k = this.drawIndex(s, top, random);
      state[i] = k;
      this.use(likelihoods, s, k);
      if (!s.independent) return;
      for (let local = 0; local < s.samples.length; local++) {
        const j = s.samples[local];
        const node = this.firstDeposit + j;
        const [lo, hi] = this.bounds(node, values, likelihoods);
        if (hi > lo && this.graph.kind[node] === NodeKind.DEPOSIT) values[node] = drawDepositAge(likelihoods, j, lo, hi, values[node], random);
      }
    });
  }

  /**
   * Add each source's full conditional over the grid (given the deposits) to its posterior, and each
   * shared deposit's full conditional (L_q at the current offset between its neighbours) to its
   * density: the ordering model's Rao-Blackwellised densities assume a fixed likelihood.
   */
  accumulate(values: Float64Array, likelihoods: MixtureLikelihoods): void {
    const L = likelihoods;
    for (const [j, sums] of this.depositSums) {
      const node = this.firstDeposit + j;
      const [lo, hi] = this.bounds(node, values, likelihoods);
      const first = yearOf(lo);
      if (!(hi > lo)) {
        sums[Math.min(sums.length - 1, Math.max(0, first - L.youngCalBp))] += 1;
        continue;
      }
      const mass = L.cumulativeAt(j, hi) - L.cumulativeAt(j, lo);
      if (!(mass > 0)) continue;
      const last = Math.min(yearOf(hi), L.oldCalBp);
      for (let y = first; y <= last; y++) {
        const length = Math.min(hi, y + 0.5) - Math.max(lo, y - 0.5);
        sums[y - L.youngCalBp] += (L.mixture(j, y) * length) / mass;
      }
    }
    for (const s of this.states) {
      const top = this.conditional(s, values, likelihoods, false);
      if (!(top > -Infinity)) continue;
      let total = 0;
      for (let k = 0; k < s.alternatives.length; k++) total += this.work[k] = Math.exp(this.work[k] - top);
      for (let k = 0; k < s.alternatives.length; k++) s.posterior[k] += this.work[k] / total;
    }
  }

  /** The offsets' posteriors. */
  posteriors(): ReservoirOffsetPosterior[] {
    return this.states.map((s) => summariseOffset(s.source, s.posterior, [...s.samples].map((j) => this.graph.samples[j].id)));
  }
}

/** A source's posterior from its weights over the grid. */
export function summariseOffset(source: ReservoirSource, weights: ArrayLike<number>, sampleIds: readonly string[]): ReservoirOffsetPosterior {
  return {
    key: source.key,
    label: source.label,
    named: source.named,
    priorMeanYears: source.priorMeanYears,
    priorSdYears: source.priorSdYears,
    sampleIds,
    medianYears: gridQuantile(source.grid, weights, 0.5),
    low95Years: gridQuantile(source.grid, weights, 0.025),
    high95Years: gridQuantile(source.grid, weights, 0.975),
  };
}

/** What grouping needs of a marine sample: its Delta-R entry. */
export interface MarineEntry {
  readonly id: string;
  /** Shown in messages. */
  readonly name: string;
  readonly deltaR: number;
  readonly deltaRError: number;
  /** The regional entry's name, or null. */
  readonly source: string | null;
}

/**
 * Which marine samples share an offset: samples naming one source share it; samples naming none
 * share it when their Delta-R and error are identical [common practice: one regional value and its
 * error, quoted for every sample of a site, stands for one unknown local offset]. Entries with no
 * error carry no uncertainty to share and are left out. A named source whose samples give different
 * Delta-R values or errors is a problem (returned, worded for the researcher).
 */
export function reservoirSources(entries: readonly MarineEntry[]): {
  sources: ReservoirSource[];
  keyOf: Map<string, string>;
  problems: string[];
} {
  const groups = new Map<string, MarineEntry[]>();
  for (const entry of entries) {
    if (!(entry.deltaRError > 0)) continue;
    const key = entry.source !== null ? `source:${entry.source}` : `value:${entry.deltaR}:${entry.deltaRError}`;
    const list = groups.get(key) ?? [];
    list.push(entry);
    groups.set(key, list);
  }
  const sources: ReservoirSource[] = [];
  const keyOf = new Map<string, string>();
  const problems: string[] = [];
  for (const [key, members] of groups) {
    const first = members[0];
    const other = members.find((m) => m.deltaR !== first.deltaR || m.deltaRError !== first.deltaRError);
    if (other) {
      problems.push(
        `samples "${first.name}" and "${other.name}" name the Delta-R source "${first.source}" but give different values ` +
          `(${first.deltaR} ± ${first.deltaRError} and ${other.deltaR} ± ${other.deltaRError} 14C yr); one source has one Delta-R`,
      );
      continue;
    }
    sources.push({
      key,
      label: first.source ?? `Delta-R ${first.deltaR} ± ${first.deltaRError}`,
      named: first.source !== null,
      priorMeanYears: first.deltaR,
      priorSdYears: first.deltaRError,
      grid: reservoirGrid(first.deltaR, first.deltaRError),
    });
    for (const m of members) keyOf.set(m.id, key);
  }
  return { sources, keyOf, problems };
}

/**
 * A source's grid kept to the values at which every one of its samples can be calibrated: at an
 * offset that puts a 14C age beyond the curve, the measurement's likelihood is taken as zero and the
 * grid value dropped (only the far tails of the prior, at a curve's ends). `perSample[i][k]` is
 * sample i's calibration at grid value k, or null when it cannot be calibrated there.
 */
export function calibratedGrid<T>(source: ReservoirSource, perSample: readonly (readonly (T | null)[])[]): { source: ReservoirSource; perSample: T[][] } {
  const keep = source.grid.map((_, k) => perSample.every((row) => row[k] !== null));
  return {
    source: { ...source, grid: source.grid.filter((_, k) => keep[k]) },
    perSample: perSample.map((row) => row.filter((_, k) => keep[k]) as T[]),
  };
}
