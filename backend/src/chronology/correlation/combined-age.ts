/**
 * Combined age of a regional event: if several site events are one earthquake, they share one
 * calendar age, and the densities of that age given each site's independent evidence multiply
 * (Bayes' rule; the same-event combination of Bronk Ramsey 2009, Radiocarbon 51(1)). The members
 * are site posteriors, each already shaped by its own site's ordering prior, so the product is
 * the usual approximation for checking a correlation, not a joint multi-site model. The product
 * is zero wherever any member is zero, so it is computed only on the overlap of the supports.
 */
import { normalise, trim, type CalendarDensity } from '../common/density';
import { chiSquareCritical5 } from './chi-square';

/**
 * The age concordance below which a regional event of `memberCount` members is flagged as
 * unlikely to share one age: exp(-chi2_0.95(n - 1) / 2).
 *
 * For Gaussian members of equal spread the concordance equals exp(-T/2), where T is the Ward &
 * Wilson (1978) statistic, which is chi-square with n - 1 degrees of freedom when the members
 * date one event (see `combineAges`). So C < exp(-c/2) exactly when T > c, and taking c the 95 %
 * point of chi-square(n - 1) flags a true same-event group 5 % of the time whatever its size
 * [analytic]: n = 2 -> 0.147, n = 3 -> 0.050, n = 8 -> 0.00088 (CHECKS.md). A fixed threshold
 * would flag large groups far more often (the chi-square's mean grows with n - 1). Null for a
 * single member, which has nothing to disagree with.
 */
export function concordanceWarningThreshold(memberCount: number): number | null {
  if (!Number.isInteger(memberCount) || memberCount < 1) {
    throw new RangeError(`a regional event has a whole number of members, at least 1 (got ${memberCount})`);
  }
  if (memberCount === 1) return null;
  return Math.exp(-chiSquareCritical5(memberCount - 1) / 2);
}

/** Relative mass below which the grid years at either end of a combined density are dropped. */
const COMBINED_TRIM_THRESHOLD = 1e-9;

/**
 * Below this maximum a plain product has lost the years whose product is under 1e-308, which
 * are then within 1e-108 of the maximum: kept in logarithms instead, as they may be all there is.
 */
const DIRECT_PRODUCT_FLOOR = 1e-200;

export interface CombinedAge {
  /** Normalised product of the member densities; null when the product has no mass. */
  readonly density: CalendarDensity | null;
  /** Age concordance in [0, 1] (see `combineAges`); 0 when the members do not overlap. */
  readonly concordance: number;
}

/** A member density seen through its non-zero span, scaled so its highest year is 1. */
interface ScaledMember {
  readonly probabilities: Float64Array;
  readonly startCalBp: number;
  /** cal BP of the youngest and oldest non-zero years. */
  readonly youngestCalBp: number;
  readonly oldestCalBp: number;
  readonly inverseMax: number;
}

function scaleMember(density: CalendarDensity, position: number): ScaledMember {
  const p = density.probabilities;
  let max = 0;
  let first = -1;
  let last = -1;
  for (let i = 0; i < p.length; i++) {
    const value = p[i];
    if (!(value >= 0) || !Number.isFinite(value)) {
      throw new RangeError(`member ${position} has a negative or non-finite probability at index ${i}`);
    }
    if (value > 0) {
      if (first < 0) first = i;
      last = i;
      if (value > max) max = value;
    }
  }
  if (first < 0) throw new RangeError(`member ${position} has no mass`);
  return {
    probabilities: p,
    startCalBp: density.startCalBp,
    youngestCalBp: density.startCalBp + first,
    oldestCalBp: density.startCalBp + last,
    inverseMax: 1 / max,
  };
}

/** log of sum_t q(t)^n for the scaled member q (its highest year is 1, so the sum is >= 1). */
function logPowerSum(member: ScaledMember, n: number): number {
  const p = member.probabilities;
  const from = member.youngestCalBp - member.startCalBp;
  const to = member.oldestCalBp - member.startCalBp;
  let sum = 0;
  for (let i = from; i <= to; i++) sum += Math.pow(p[i] * member.inverseMax, n);
  return Math.log(sum);
}

/**
 * prod_i q_i(t) over `length` years from `youngestCalBp`, divided by its maximum, and the log
 * of that maximum. Each q_i is at most 1, so a plain product can only underflow; when its
 * maximum falls below `DIRECT_PRODUCT_FLOOR` the product is redone in logarithms.
 */
function scaledProduct(
  scaled: readonly ScaledMember[],
  youngestCalBp: number,
  length: number,
): { weights: Float64Array; logMax: number } {
  const weights = new Float64Array(length).fill(1);
  for (const member of scaled) {
    const p = member.probabilities;
    const offset = youngestCalBp - member.startCalBp;
    for (let i = 0; i < length; i++) weights[i] *= p[offset + i] * member.inverseMax;
  }
  let max = 0;
  for (let i = 0; i < length; i++) if (weights[i] > max) max = weights[i];
  if (max >= DIRECT_PRODUCT_FLOOR) {
    for (let i = 0; i < length; i++) weights[i] /= max;
    return { weights, logMax: Math.log(max) };
  }

  const logProduct = weights.fill(0);
  for (const member of scaled) {
    const p = member.probabilities;
    const offset = youngestCalBp - member.startCalBp;
    for (let i = 0; i < length; i++) logProduct[i] += Math.log(p[offset + i] * member.inverseMax);
  }
  let logMax = -Infinity;
  for (let i = 0; i < length; i++) if (logProduct[i] > logMax) logMax = logProduct[i];
  if (logMax === -Infinity) return { weights: logProduct, logMax };
  for (let i = 0; i < length; i++) logProduct[i] = Math.exp(logProduct[i] - logMax);
  return { weights: logProduct, logMax };
}

/**
 * Combine the age densities of the members of one regional event.
 *
 * Combined density: p(t) = prod_i p_i(t) / sum_u prod_i p_i(u), on the overlap of the members'
 * supports; null when the overlap is empty or the product is zero throughout.
 *
 * Age concordance, for n members with densities p_1..p_n on the 1-year grid:
 *
 *     C = sum_t prod_i p_i(t) / prod_i ( sum_t p_i(t)^n )^(1/n)
 *
 * C does not change when any member is rescaled, so members need not be normalised.
 * C <= 1 by the generalised Hölder inequality with all exponents n (sum of 1/n over n members
 * is 1). Proof, with F_i = p_i / ||p_i||_n so that sum_t F_i(t)^n = 1: by the inequality of
 * arithmetic and geometric means prod_i F_i(t) <= (1/n) sum_i F_i(t)^n at each t; summing over t
 * gives sum_t prod_i F_i(t) <= 1, which is C <= 1. Equality needs equality of the means at every
 * t, i.e. F_1 = ... = F_n, i.e. the p_i proportional; normalised densities that are proportional
 * are identical. So C = 1 exactly when all members are the same density, and C -> 0 as their
 * overlap vanishes (the numerator goes to 0, the denominator does not). For one member C = 1.
 *
 * For Gaussian members N(m_i, s) of equal s (continuous limit), writing
 * sum_i (x - m_i)^2 = n (x - m)^2 + sum_i (m_i - m)^2 with m the mean of the m_i, both the
 * numerator and the reference integral carry the same factor, leaving
 * C = exp(-sum_i (m_i - m)^2 / (2 s^2)) = exp(-T/2) with T the Ward & Wilson statistic [analytic].
 *
 * Each member is scaled to a maximum of 1, so the n-th power sums are at least 1, and the
 * product is redone in logarithms when a plain product would underflow (many members, or
 * members that meet only in their tails).
 *
 * Throws RangeError when a member has no mass or holds a negative or non-finite value.
 */
export function combineAges(members: readonly CalendarDensity[]): CombinedAge {
  if (members.length === 0) throw new RangeError('a regional event needs at least one member');
  const scaled = members.map(scaleMember);
  const n = scaled.length;
  let youngest = -Infinity;
  let oldest = Infinity;
  for (const member of scaled) {
    youngest = Math.max(youngest, member.youngestCalBp);
    oldest = Math.min(oldest, member.oldestCalBp);
  }
  if (youngest > oldest) return { density: null, concordance: 0 };

  const length = oldest - youngest + 1;
  const { weights, logMax } = scaledProduct(scaled, youngest, length);
  if (logMax === -Infinity) return { density: null, concordance: 0 };
  let mass = 0;
  for (let i = 0; i < length; i++) mass += weights[i];

  // The scale factors 1/max_i appear to the first power in the numerator and in each reference
  // term, so they cancel in C and the scaled members can be used throughout.
  let logReference = 0;
  for (const member of scaled) logReference += logPowerSum(member, n) / n;
  const concordance = Math.min(1, Math.exp(logMax + Math.log(mass) - logReference));

  const density = normalise(trim({ startCalBp: youngest, probabilities: weights }, COMBINED_TRIM_THRESHOLD));
  return { density, concordance };
}
