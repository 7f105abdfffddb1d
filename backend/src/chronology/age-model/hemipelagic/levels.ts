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
