/**
 * Ward & Wilson (1978, Archaeometry 20(1):19-31) test of whether several age estimates can be
 * of one event, applied to the Gaussian summaries (mean and SD) of the members' densities.
 */

import { jStat } from '../common/jstat';

/** An age as a mean and a 1-sigma error, in the same unit for all members (here cal BP). */
export interface GaussianAge {
  readonly mean: number;
  readonly sd: number;
}

export interface WardWilsonTest {
  /** Weighted mean A_p. */
  readonly pooledMean: number;
  /** Its error E_p. */
  readonly pooledSd: number;
  /** The test statistic T. */
  readonly t: number;
  /** Degrees of freedom, n - 1. */
  readonly df: number;
  /** The 95 % point of chi-square(df): T above it rejects "one event" at the 5 % level. */
  readonly critical5: number;
  /** T <= critical5. */
  readonly passes: boolean;
}

const criticalValues = new Map<number, number>();

/** The 5 % critical value of chi-square with `df` degrees of freedom (jstat's inverse CDF). */
export function chiSquareCritical5(df: number): number {
  let value = criticalValues.get(df);
  if (value === undefined) {
    value = jStat.chisquare.inv(0.95, df);
    criticalValues.set(df, value);
  }
  return value;
}

/**
 * Ward & Wilson (1978) chi-square test of n >= 2 ages A_i +- E_i:
 *
 *     A_p = sum(A_i / E_i^2) / sum(1 / E_i^2),   E_p = (sum 1 / E_i^2)^(-1/2),
 *     T = sum (A_i - A_p)^2 / E_i^2  ~  chi-square(n - 1) if all ages are of one event.
 *
 * Throws RangeError for fewer than two ages or an error that is not positive and finite.
 */
export function wardWilsonTest(ages: readonly GaussianAge[]): WardWilsonTest {
  if (ages.length < 2) throw new RangeError('the Ward & Wilson test needs at least two ages');
  let weightSum = 0;
  let weightedSum = 0;
  for (const { mean, sd } of ages) {
    if (!(sd > 0) || !Number.isFinite(sd) || !Number.isFinite(mean)) {
      throw new RangeError(`age ${mean} +- ${sd} needs a finite mean and a positive, finite error`);
    }
    const weight = 1 / (sd * sd);
    weightSum += weight;
    weightedSum += weight * mean;
  }
  const pooledMean = weightedSum / weightSum;
  let t = 0;
  for (const { mean, sd } of ages) t += ((mean - pooledMean) / sd) ** 2;
  const df = ages.length - 1;
  const critical5 = chiSquareCritical5(df);
  return { pooledMean, pooledSd: 1 / Math.sqrt(weightSum), t, df, critical5, passes: t <= critical5 };
}
