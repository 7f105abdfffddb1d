/**
 * Dated levels of a core as the hemipelagic model sees them: each modelled sample's likelihood of
 * the age of the mud at its depth, with its inheritance or intrusion offset integrated out
 * (`depositLikelihood`, shared with the ordering model) and an outlier alternative.
 *
 * The model reaches the samples only through `LevelLikelihoods`, so the per-sample likelihoods of
 * the ordering model can replace these without touching the sampler.
 */
import { CalendarDensity } from '../../common/density';
import { ColumnSample } from '../column';
import { CalendarWindow, depositLikelihood, DepositLikelihood, outlierShiftLikelihood } from '../likelihood';
import { logGridPrior, ReservoirSource } from '../reservoir-offsets';

/** What the hemipelagic sampler needs of the dated levels. */
export interface LevelLikelihoods {
  readonly count: number;
  /** log L_j(t): the likelihood of level j given its deposit age t (continuous cal BP), outlier term included. */
  logLikelihood(level: number, calBp: number): number;
  /** The outlier alternative's share of L_j(t): the outlier probability given t (Rao-Blackwellised). */
  outlierShare(level: number, calBp: number): number;
  /** Median of the level's own deposit-age likelihood (for starting values and the measured rate). */
  centreCalBp(level: number): number;
  /** Standard deviation of the level's own deposit-age likelihood, years. */
  spreadYears(level: number): number;
  /**
   * When levels share reservoir offsets, log of the joint likelihood of all levels at their ages
   * (the offsets summed out); the model then uses it instead of summing `logLikelihood`.
   */
  jointLogLikelihood?(ages: Float64Array): number;
}

export interface OutlierModel {
  /** Prior probability that a level is an outlier (Christen 1994). */
  readonly prior: number;
  /** Mean absolute shift (years) of an outlier's two-sided exponential shift prior (the ordering model's). */
  readonly shiftScaleYears: number;
}

const LOG_FLOOR = -745;

/**
 * Grid likelihoods with the ordering model's outlier mixture (`MixtureLikelihoods` and
 * `outlierShiftLikelihood` in `../likelihood.ts`; Christen 1994, Applied Statistics 43(3):489-503,
 * with the outlier-as-shift form of Bronk Ramsey 2009, Radiocarbon 51(3):1023-1045): a level is an
 * outlier with prior probability q, and an outlier's measurement is read through its likelihood
 * convolved with a two-sided exponential shift of stated scale,
 *
 *   L_q(t) = (1 - q) L(t) + q O(t).
 *
 * Both are held on whole years around the level (its likelihood widened by 25 shift scales each
 * side, beyond which O is below e^-25 of its peak) and read between years by linear interpolation.
 */
export class GridLevelLikelihoods implements LevelLikelihoods {
  readonly count: number;
  private readonly starts: Int32Array;
  private readonly plainValues: Float64Array[];
  private readonly shiftedValues: Float64Array[];
  private readonly medians: Float64Array;
  private readonly sds: Float64Array;

  constructor(
    samples: readonly Pick<ColumnSample, 'likelihood' | 'ageRelation' | 'offsetScaleYears'>[],
    inheritanceScaleYears: number,
    private readonly outliers: OutlierModel,
  ) {
    this.count = samples.length;
    this.starts = new Int32Array(this.count);
    this.plainValues = [];
    this.shiftedValues = [];
    this.medians = new Float64Array(this.count);
    this.sds = new Float64Array(this.count);
    samples.forEach((sample, j) => {
      const scale = sample.offsetScaleYears != null && sample.offsetScaleYears > 0 ? sample.offsetScaleYears : inheritanceScaleYears;
      const d = normalised(depositLikelihood(sample.likelihood, sample.ageRelation, scale));
      const margin = Math.ceil(25 * outliers.shiftScaleYears);
      const window: CalendarWindow = { youngCalBp: d.startCalBp - margin, oldCalBp: d.startCalBp + d.values.length - 1 + margin };
      const plain = new Float64Array(window.oldCalBp - window.youngCalBp + 1);
      plain.set(d.values, margin);
      this.starts[j] = window.youngCalBp;
      this.plainValues.push(plain);
      this.shiftedValues.push(outlierShiftLikelihood(d, window, outliers.shiftScaleYears));
      let mean = 0;
      d.values.forEach((p, i) => (mean += p * (d.startCalBp + i)));
      let variance = 0;
      d.values.forEach((p, i) => (variance += p * (d.startCalBp + i - mean) ** 2));
      this.sds[j] = Math.sqrt(variance);
      let cumulative = 0;
      for (let i = 0; i < d.values.length; i++) {
        cumulative += d.values[i];
        if (cumulative >= 0.5) {
          this.medians[j] = d.startCalBp + i;
          break;
        }
      }
    });
  }

  private read(values: Float64Array, level: number, calBp: number): number {
    const x = calBp - this.starts[level];
    if (!(x >= 0 && x <= values.length - 1)) return 0;
    const i = Math.floor(x);
    const f = x - i;
    return i + 1 < values.length ? values[i] * (1 - f) + values[i + 1] * f : values[i];
  }

  /** L(t) without the outlier term. */
  plain(level: number, calBp: number): number {
    return this.read(this.plainValues[level], level, calBp);
  }

  /** The outlier alternative O(t). */
  shifted(level: number, calBp: number): number {
    return this.read(this.shiftedValues[level], level, calBp);
  }

  /** The whole years on which level j's likelihood is held. */
  windowOf(level: number): CalendarWindow {
    return { youngCalBp: this.starts[level], oldCalBp: this.starts[level] + this.plainValues[level].length - 1 };
  }

  /** L_q(t) = (1 - q) L(t) + q O(t). */
  mixture(level: number, calBp: number): number {
    const q = this.outliers.prior;
    return (1 - q) * this.plain(level, calBp) + q * this.shifted(level, calBp);
  }

  logLikelihood(level: number, calBp: number): number {
    const q = this.outliers.prior;
    const value = (1 - q) * this.plain(level, calBp) + q * this.shifted(level, calBp);
    return value > 0 ? Math.log(value) : LOG_FLOOR;
  }

  outlierShare(level: number, calBp: number): number {
    const q = this.outliers.prior;
    const alternative = q * this.shifted(level, calBp);
    const total = (1 - q) * this.plain(level, calBp) + alternative;
    return total > 0 ? alternative / total : 1;
  }

  centreCalBp(level: number): number {
    return this.medians[level];
  }

  spreadYears(level: number): number {
    return this.sds[level];
  }
}

function normalised(d: DepositLikelihood): DepositLikelihood {
  let mass = 0;
  for (const p of d.values) mass += p;
  const values = new Float64Array(d.values.length);
  for (let i = 0; i < values.length; i++) values[i] = d.values[i] / mass;
  return { startCalBp: d.startCalBp, values };
}

/** The grid likelihood of one sample, for tests and plots. */
export function levelDensity(levels: GridLevelLikelihoods, level: number, youngCalBp: number, oldCalBp: number): CalendarDensity {
  const probabilities = new Float64Array(oldCalBp - youngCalBp + 1);
  for (let i = 0; i < probabilities.length; i++) probabilities[i] = Math.exp(levels.logLikelihood(level, youngCalBp + i));
  return { startCalBp: youngCalBp, probabilities };
}

/**
 * Levels of which some share reservoir offsets (`../reservoir-offsets.ts`). Each source's offset
 * takes the values of its grid with the prior weights pi_k, and is summed out exactly:
 *
 *   L(ages) = prod_(levels not shared) L_q,j(t_j) prod_s sum_k pi_k prod_(j in s) L_q,j^(k)(t_j),
 *
 * L_q,j^(k) the level's likelihood (outlier mixture included) with its source's Delta-R at grid
 * value k. The per-level methods (outlier share, centre, spread) read the likelihoods with the
 * Delta-R error integrated out (`base`), as starting values and the Rao-Blackwellised outlier
 * probability need one likelihood per level; for a shared level the outlier share is then an
 * approximation. `offsetWeights` gives each source's conditional over its grid at given ages,
 * which averaged over the draws is the offset's posterior.
 */
export class SharedLevelLikelihoods implements LevelLikelihoods {
  readonly count: number;
  private readonly shared: {
    readonly levels: Int32Array;
    readonly logPrior: Float64Array;
    /**
     * Per level of the source: log L_q on whole years from `starts[level]`, the grid values of one
     * year side by side (`values[level][year * n + k]`, n grid values), so that a level's year and
     * interpolation weight are found once for all grid values. Years outside a grid value's own
     * window hold LOG_FLOOR.
     */
    readonly values: Float32Array[];
    readonly starts: Int32Array;
    readonly lengths: Int32Array;
  }[];
  private readonly plainLevels: Int32Array;

  constructor(
    private readonly base: GridLevelLikelihoods,
    samples: readonly Pick<ColumnSample, 'ageRelation' | 'offsetScaleYears' | 'reservoir'>[],
    sources: readonly ReservoirSource[],
    inheritanceScaleYears: number,
    outliers: OutlierModel,
  ) {
    this.count = base.count;
    const inShared = new Set<number>();
    this.shared = [];
    for (const source of sources) {
      const levels: number[] = [];
      samples.forEach((sample, j) => {
        if (sample.reservoir?.sourceKey === source.key) levels.push(j);
      });
      if (levels.length === 0) continue;
      levels.forEach((j) => inShared.add(j));
      const perGrid = source.grid.map((_, k) => {
        const grid = new GridLevelLikelihoods(
          levels.map((j) => ({ ...samples[j], likelihood: samples[j].reservoir!.gridLikelihoods[k] })),
          inheritanceScaleYears,
          outliers,
        );
        return levels.map((_, local) => ({ grid, local, window: grid.windowOf(local) }));
      });
      const n = source.grid.length;
      const starts = Int32Array.from(levels, (_, local) => Math.min(...perGrid.map((g) => g[local].window.youngCalBp)));
      const ends = Int32Array.from(levels, (_, local) => Math.max(...perGrid.map((g) => g[local].window.oldCalBp)));
      const lengths = Int32Array.from(levels, (_, local) => ends[local] - starts[local] + 1);
      const values = levels.map((_, local) => {
        const table = new Float32Array(lengths[local] * n).fill(LOG_FLOOR);
        perGrid.forEach((g, k) => {
          const { grid, window } = g[local];
          for (let year = window.youngCalBp; year <= window.oldCalBp; year++) {
            const value = grid.mixture(local, year);
            table[(year - starts[local]) * n + k] = value > 0 ? Math.log(value) : LOG_FLOOR;
          }
        });
        return table;
      });
      this.shared.push({ levels: Int32Array.from(levels), logPrior: logGridPrior(source, levels.map((j) => samples[j].reservoir)), values, starts, lengths });
    }
    this.plainLevels = Int32Array.from({ length: this.count }, (_, j) => j).filter((j) => !inShared.has(j));
  }

  /**
   * Each source's log weights over its grid at the given ages (unnormalised), into `out`: the log
   * prior plus each level's log L_q at its age, read between whole years linearly in the log (LOG_FLOOR
   * outside the level's years).
   */
  private logWeights(ages: Float64Array, s: number, out: Float64Array): void {
    const src = this.shared[s];
    const n = src.logPrior.length;
    for (let k = 0; k < n; k++) out[k] = src.logPrior[k];
    for (let local = 0; local < src.levels.length; local++) {
      const x = ages[src.levels[local]] - src.starts[local];
      const length = src.lengths[local];
      if (!(x >= 0 && x <= length - 1)) {
        for (let k = 0; k < n; k++) out[k] += LOG_FLOOR;
        continue;
      }
      const values = src.values[local];
      const i = Math.floor(x);
      const f = x - i;
      const row = i * n;
      if (i + 1 < length) {
        for (let k = 0; k < n; k++) out[k] += values[row + k] * (1 - f) + values[row + n + k] * f;
      } else {
        for (let k = 0; k < n; k++) out[k] += values[row + k];
      }
    }
  }

  private readonly scratch = new Float64Array(64);

  jointLogLikelihood(ages: Float64Array): number {
    let lp = 0;
    for (const j of this.plainLevels) lp += this.base.logLikelihood(j, ages[j]);
    for (let s = 0; s < this.shared.length; s++) {
      const w = this.scratch;
      this.logWeights(ages, s, w);
      const n = this.shared[s].logPrior.length;
      let top = -Infinity;
      for (let k = 0; k < n; k++) top = Math.max(top, w[k]);
      let sum = 0;
      for (let k = 0; k < n; k++) sum += Math.exp(w[k] - top);
      lp += top + Math.log(sum);
    }
    return lp;
  }

  /** Number of sources, and each one's conditional weights over its grid (normalised) at `ages`. */
  get sourceCount(): number {
    return this.shared.length;
  }

  offsetWeights(ages: Float64Array, s: number): Float64Array {
    const n = this.shared[s].logPrior.length;
    const w = new Float64Array(n);
    this.logWeights(ages, s, w);
    let top = -Infinity;
    for (let k = 0; k < n; k++) top = Math.max(top, w[k]);
    let sum = 0;
    for (let k = 0; k < n; k++) sum += w[k] = Math.exp(w[k] - top);
    for (let k = 0; k < n; k++) w[k] /= sum;
    return w;
  }

  /** The levels (indices) of source s. */
  levelsOf(s: number): readonly number[] {
    return [...this.shared[s].levels];
  }

  logLikelihood(level: number, calBp: number): number {
    return this.base.logLikelihood(level, calBp);
  }

  outlierShare(level: number, calBp: number): number {
    return this.base.outlierShare(level, calBp);
  }

  centreCalBp(level: number): number {
    return this.base.centreCalBp(level);
  }

  spreadYears(level: number): number {
    return this.base.spreadYears(level);
  }
}
