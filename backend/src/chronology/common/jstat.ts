/**
 * The jstat functions Stratochron uses, typed at the boundary: jstat ships no type
 * declarations and there is no @types package. Its CommonJS export carries itself as `.jStat`,
 * which works both under tsc's CommonJS output and vitest's SWC transform.
 */
interface JStatSubset {
  /** Error function (Chebyshev fit; absolute error near 1e-16). */
  erf(x: number): number;
  /**
   * ln Gamma(x) (Lanczos series): absolute error near 1e-15 for 1 <= x <= 3, the range the
   * Weibull conversions use. jstat's gammafn is worse there (2.5e-9 at x = 1.5).
   */
  gammaln(x: number): number;
  lognormal: {
    pdf(x: number, logMean: number, logSd: number): number;
    cdf(x: number, logMean: number, logSd: number): number;
  };
  weibull: {
    pdf(x: number, scale: number, shape: number): number;
    cdf(x: number, scale: number, shape: number): number;
  };
  /** Inverse normal CDF (split R-hat rank normalisation). */
  normal: { cdf(x: number, mean: number, sd: number): number; inv(p: number, mean: number, sd: number): number };
  /** Chi-square inverse CDF (Ward & Wilson critical values). */
  chisquare: { inv(p: number, df: number): number };
  /** Sample mean and standard deviation (reference values in tests). */
  mean(values: number[]): number;
  stdev(values: number[], sample?: boolean): number;
  exponential: {
    pdf(x: number, rate: number): number;
    cdf(x: number, rate: number): number;
  };
  /** Gamma (shape, scale) and beta densities (priors in the hemipelagic exact-posterior spec). */
  gamma: { pdf(x: number, shape: number, scale: number): number };
  beta: { pdf(x: number, a: number, b: number): number };
}

export const { jStat } = require('jstat') as { jStat: JStatSubset };
