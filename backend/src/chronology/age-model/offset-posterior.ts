/**
 * The posterior of a detrital or intrusive sample's age offset: sample age minus deposit age
 * (positive for inherited material, OLDER_THAN_DEPOSIT; negative for intrusive material,
 * YOUNGER_THAN_DEPOSIT).
 *
 * The models integrate the offset out (`depositLikelihood`): with the offset delta on whole years,
 * P(delta = k) = (1 - r) r^k, r = exp(-1 / scale), and the sample's own calendar likelihood L_s,
 * the deposit likelihood is L(d) = sum_k L_s(d +- k) P(k). Given the deposit's year y and that the
 * sample is not an outlier, the offset's conditional is exactly
 *
 *   p(k | y, not outlier) = L_s(y +- k) P(k) / L(y),
 *
 * and the posterior probability of "not an outlier" given y is (1 - q) L(y) / L_q(y). Summing over
 * the deposit's posterior p(y) (Rao-Blackwellised, Gelfand & Smith 1990, JASA 85:398-409) gives
 *
 *   p(k, not outlier) = sum_y p(y) (1 - q) L_s(y +- k) P(k) / L_q(y),
 *
 * which normalised is the offset's posterior given that the sample is not an outlier (an outlier's
 * offset is confounded with its shift and is not reported). Pure post-processing of the deposit's
 * posterior: nothing in the chain changes.
 */
import { CalendarDensity } from '../common/density';
import { AgeRelation } from './column';

export interface OffsetPosterior {
  /** The scale (mean, years) of the exponential prior the model used for this sample. */
  readonly scaleYears: number;
  /** Posterior median of sample age minus deposit age, years (negative for intrusive material). */
  readonly medianYears: number;
  /** Central 95 % range (2.5 % and 97.5 % quantiles) of the same, lower value first. */
  readonly low95Years: number;
  readonly high95Years: number;
}

/**
 * The offset posterior of one sample. `deposit` is the deposit age's posterior on whole years;
 * `notOutlierWeight(y)` is (1 - q) / L_q(y) for the deposit year y (L_q the deposit likelihood with
 * the outlier term, on the scale where L_s sums to 1); `own` is the sample's calendar likelihood.
 * Undefined for DATES_DEPOSIT samples or when no mass remains.
 */
export function offsetPosterior(
  own: CalendarDensity,
  ageRelation: AgeRelation,
  scaleYears: number,
  deposit: CalendarDensity,
  notOutlierWeight: (calBp: number) => number,
): OffsetPosterior | undefined {
  if (ageRelation === 'DATES_DEPOSIT') return undefined;
  const sign = ageRelation === 'OLDER_THAN_DEPOSIT' ? 1 : -1;
  let ownMass = 0;
  for (const p of own.probabilities) ownMass += p;
  if (!(ownMass > 0)) return undefined;
  const r = Math.exp(-1 / scaleYears);
  // Offsets beyond 40 scales carry less than e^-40 of the prior: not worth summing.
  const maxOffset = Math.ceil(40 * scaleYears);
  const ownStart = own.startCalBp;
  const ownEnd = own.startCalBp + own.probabilities.length - 1;
  const counts = new Float64Array(maxOffset + 1);
  for (let i = 0; i < deposit.probabilities.length; i++) {
    const mass = deposit.probabilities[i];
    if (!(mass > 0)) continue;
    const y = deposit.startCalBp + i;
    const weight = mass * notOutlierWeight(y);
    if (!(weight > 0) || !Number.isFinite(weight)) continue;
    // Offsets k with y + sign k inside the sample's own years.
    const kFrom = sign > 0 ? Math.max(0, ownStart - y) : Math.max(0, y - ownEnd);
    const kTo = Math.min(maxOffset, sign > 0 ? ownEnd - y : y - ownStart);
    if (kTo < kFrom) continue;
    let prior = (1 - r) * Math.pow(r, kFrom);
    for (let k = kFrom; k <= kTo; k++) {
      counts[k] += weight * (own.probabilities[y + sign * k - ownStart] / ownMass) * prior;
      prior *= r;
    }
  }
  let total = 0;
  for (const c of counts) total += c;
  if (!(total > 0)) return undefined;
  // Offset k stands for [k, k + 1) years of the continuous offset; quantiles interpolate within it.
  const quantileOf = (q: number): number => {
    const target = q * total;
    let running = 0;
    for (let k = 0; k < counts.length; k++) {
      if (running + counts[k] >= target && counts[k] > 0) return k + (target - running) / counts[k];
      running += counts[k];
    }
    return counts.length;
  };
  const median = quantileOf(0.5);
  const low = quantileOf(0.025);
  const high = quantileOf(0.975);
  return sign > 0
    ? { scaleYears, medianYears: median, low95Years: low, high95Years: high }
    : { scaleYears, medianYears: -median, low95Years: -high, high95Years: -low };
}
