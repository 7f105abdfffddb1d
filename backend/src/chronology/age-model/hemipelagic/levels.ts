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
import { depositLikelihood, DepositLikelihood } from '../likelihood';

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
  /** Scale (sd, years) of the normal prior on an outlier's unknown age offset. */
  readonly offsetScaleYears: number;
}

const LOG_FLOOR = -745;

/**
 * Grid likelihoods with the outlier-and-offset mixture of Christen (1994, Applied Statistics
 * 43(3):489-503 [memory for pages]): a level is an outlier with prior probability q, and an
 * outlier's measured age is shifted by an unknown offset delta ~ N(0, S^2) (the broad-offset form
 * of Christen & Perez 2009, Radiocarbon 51(3):1047-1059 [memory for pages]):
 *
 *   L_q(t) = (1 - q) L(t) + q (L * N(0, S^2))(t).
 *
 * The shifted alternative is evaluated with L replaced by a normal of L's own mean and sd, so
 * (L * N)(t) = N(t; mean, sd^2 + S^2): with S several times the sd, as it is by design, the shape
 * of L no longer matters after smoothing by S [analytic approximation, stated]. L is normalised to
 * unit mass over t and read between grid years by linear interpolation.
 */
export class GridLevelLikelihoods implements LevelLikelihoods {
  readonly count: number;
  private readonly deposits: DepositLikelihood[];
  private readonly means: Float64Array;
  private readonly sds: Float64Array;
  private readonly medians: Float64Array;

  constructor(
    samples: readonly Pick<ColumnSample, 'likelihood' | 'ageRelation'>[],
    inheritanceScaleYears: number,
    private readonly outliers: OutlierModel,
  ) {
    this.count = samples.length;
    this.deposits = samples.map((s) => normalised(depositLikelihood(s.likelihood, s.ageRelation, inheritanceScaleYears)));
    this.means = new Float64Array(this.count);
    this.sds = new Float64Array(this.count);
    this.medians = new Float64Array(this.count);
    this.deposits.forEach((d, j) => {
      let mean = 0;
      d.values.forEach((p, i) => (mean += p * (d.startCalBp + i)));
      let variance = 0;
      d.values.forEach((p, i) => (variance += p * (d.startCalBp + i - mean) ** 2));
      let cumulative = 0;
      let median = d.startCalBp;
      for (let i = 0; i < d.values.length; i++) {
        cumulative += d.values[i];
        if (cumulative >= 0.5) {
          median = d.startCalBp + i;
          break;
        }
      }
      this.means[j] = mean;
      this.sds[j] = Math.sqrt(variance);
      this.medians[j] = median;
    });
  }

  /** L(t) without the outlier term, linearly interpolated between grid years. */
  plain(level: number, calBp: number): number {
    const d = this.deposits[level];
    const x = calBp - d.startCalBp;
    if (x < 0 || x > d.values.length - 1) return 0;
    const i = Math.floor(x);
    const f = x - i;
    return i + 1 < d.values.length ? d.values[i] * (1 - f) + d.values[i + 1] * f : d.values[i];
  }

  /** The outlier alternative N(t; mean, sd^2 + S^2). */
  shifted(level: number, calBp: number): number {
    const variance = this.sds[level] ** 2 + this.outliers.offsetScaleYears ** 2;
    const z = calBp - this.means[level];
    return Math.exp((-0.5 * z * z) / variance) / Math.sqrt(2 * Math.PI * variance);
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
