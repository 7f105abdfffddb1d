/**
 * Renewal models for the time between large earthquakes: the distribution of the recurrence
 * interval, parameterised for the user by its mean recurrence mu (years) and its aperiodicity
 * alpha (coefficient of variation, SD / mean), as the paleoseismic literature reports them.
 *
 * Everything is evaluated through the log-survival function so that the conditional probability
 * of an event in a window [T, T + dT] given none by T,
 *   P = (F(T + dT) - F(T)) / (1 - F(T)) = 1 - S(T + dT) / S(T),
 * is computed as -expm1(ln S(T + dT) - ln S(T)) and stays accurate when T is far in the tail and
 * both S values underflow.
 */
import { jStat } from '../common/jstat';
import {
  LOG_SQRT_2PI,
  logStandardNormalPdf,
  logUpperTailNormal,
  millsRatio,
  millsRatioDifference,
} from './normal-tail';

export type RenewalModel = 'POISSON' | 'BPT' | 'LOGNORMAL' | 'WEIBULL';

/** All renewal models, in the order the product lists them. */
export const RENEWAL_MODELS: readonly RenewalModel[] = ['POISSON', 'BPT', 'LOGNORMAL', 'WEIBULL'];

/** How each model is named in notes and labels. */
export const RENEWAL_MODEL_LABELS: Readonly<Record<RenewalModel, string>> = {
  POISSON: 'Poisson (exponential)',
  BPT: 'Brownian Passage Time',
  LOGNORMAL: 'lognormal',
  WEIBULL: 'Weibull',
};

/** Each model's own parameters, as its formulas use them. */
export type RenewalParameters =
  | { readonly model: 'POISSON'; readonly mu: number }
  | { readonly model: 'BPT'; readonly mu: number; readonly alpha: number }
  /** `logMean` and `logSd` are the mean and SD of ln t. */
  | { readonly model: 'LOGNORMAL'; readonly logMean: number; readonly logSd: number }
  | { readonly model: 'WEIBULL'; readonly shape: number; readonly scale: number };

/** A recurrence-interval distribution; times in years since the last event. */
export interface RenewalDistribution {
  readonly model: RenewalModel;
  /** Mean recurrence, years. */
  readonly mu: number;
  /** Aperiodicity: coefficient of variation of the recurrence interval (1 for Poisson). */
  readonly alpha: number;
  readonly parameters: RenewalParameters;
  pdf(t: number): number;
  logPdf(t: number): number;
  cdf(t: number): number;
  survival(t: number): number;
  logSurvival(t: number): number;
  /** Hazard rate f(t) / S(t), events per year. */
  hazard(t: number): number;
  /**
   * Probability of the next event within `windowYears` after `elapsedYears` have passed
   * without one: (F(T + dT) - F(T)) / (1 - F(T)).
   */
  conditionalProbability(elapsedYears: number, windowYears: number): number;
}

/** Largest aperiodicity the Weibull conversion accepts (shape 0.05; CV near 5e3). */
const WEIBULL_SHAPE_MIN = 0.05;
const WEIBULL_SHAPE_MAX = 1e4;

function requirePositive(name: string, value: number): void {
  if (!(value > 0) || !Number.isFinite(value)) {
    throw new RangeError(`${name} must be a positive finite number (got ${value})`);
  }
}

/**
 * Builds the common parts from ln f and ln S. The conditional probability is 1 - S(T+dT)/S(T)
 * evaluated as -expm1 of a log difference, so it has no 0/0 far in the tail.
 */
function fromLogFunctions(
  model: RenewalModel,
  mu: number,
  alpha: number,
  parameters: RenewalParameters,
  logPdf: (t: number) => number,
  logSurvival: (t: number) => number,
  conditionalProbability?: (elapsed: number, window: number) => number,
): RenewalDistribution {
  return {
    model,
    mu,
    alpha,
    parameters,
    logPdf,
    logSurvival,
    pdf: (t) => Math.exp(logPdf(t)),
    cdf: (t) => -Math.expm1(logSurvival(t)),
    survival: (t) => Math.exp(logSurvival(t)),
    hazard: (t) => Math.exp(logPdf(t) - logSurvival(t)),
    conditionalProbability:
      conditionalProbability ??
      ((elapsed, window) => {
        checkWindow(elapsed, window);
        if (window === 0) return 0;
        return -Math.expm1(logSurvival(elapsed + window) - logSurvival(elapsed));
      }),
  };
}

function checkWindow(elapsed: number, window: number): void {
  if (!(elapsed >= 0) || !Number.isFinite(elapsed)) {
    throw new RangeError(`elapsed time must be zero or more years (got ${elapsed})`);
  }
  if (!(window >= 0) || !Number.isFinite(window)) {
    throw new RangeError(`forecast window must be zero or more years (got ${window})`);
  }
}

/**
 * Poisson process: exponential intervals with mean mu, memoryless, so the conditional
 * probability in any window is 1 - exp(-dT / mu) whatever the elapsed time.
 */
export function poissonDistribution(mu: number): RenewalDistribution {
  requirePositive('mean recurrence', mu);
  const logMu = Math.log(mu);
  return fromLogFunctions(
    'POISSON',
    mu,
    1,
    { model: 'POISSON', mu },
    (t) => (t < 0 ? -Infinity : -logMu - t / mu),
    (t) => (t <= 0 ? 0 : -t / mu),
    (elapsed, window) => {
      checkWindow(elapsed, window);
      return -Math.expm1(-window / mu);
    },
  );
}

/**
 * Brownian Passage Time: the inverse Gaussian with mean mu and shape lambda = mu / alpha^2
 * (Matthews, Ellsworth & Reasenberg 2002, BSSA 92(6):2233-2250):
 *   f(t) = sqrt(mu / (2 pi alpha^2 t^3)) exp(-(t - mu)^2 / (2 mu alpha^2 t)),
 *   F(t) = Phi(a) + exp(2 lambda / mu) Phi(-b), a = sqrt(lambda/t)(t/mu - 1), b = sqrt(lambda/t)(t/mu + 1).
 * The survival function is `bptLogSurvival`.
 */
export function bptDistribution(mu: number, alpha: number): RenewalDistribution {
  requirePositive('mean recurrence', mu);
  requirePositive('aperiodicity', alpha);
  const alphaSquared = alpha * alpha;
  const lambda = mu / alphaSquared;
  const logPdfConstant = 0.5 * Math.log(lambda) - LOG_SQRT_2PI;

  const logPdf = (t: number): number => {
    if (!(t > 0)) return -Infinity;
    const d = t - mu;
    return logPdfConstant - 1.5 * Math.log(t) - (lambda * d * d) / (2 * mu * mu * t);
  };

  const logSurvival = (t: number): number => bptLogSurvival(t, mu, alpha);

  return fromLogFunctions('BPT', mu, alpha, { model: 'BPT', mu, alpha }, logPdf, logSurvival);
}

/**
 * ln S(t) of the BPT, S = Q(a) - exp(2/alpha^2) Q(b) with a, b as in `bptDistribution`,
 * evaluated without ever forming exp(2/alpha^2), which overflows for small alpha:
 * - for a >= 3, because b^2 - a^2 = 4 lambda / mu exactly, exp(2/alpha^2) phi(b) = phi(a) and
 *   S = phi(a) (R(a) - R(b)) with Mills' ratio R; for a >= 30 the difference comes from the
 *   asymptotic series term by term, so S keeps its digits as t grows without bound and the
 *   hazard settles to its limit 1 / (2 alpha^2 mu);
 * - otherwise ln S = ln Q(a) + log1p(-exp(2/alpha^2 + ln Q(b) - ln Q(a))), all in log space.
 */
export function bptLogSurvival(t: number, mu: number, alpha: number): number {
  if (!(t > 0)) return 0;
  const lambda = mu / (alpha * alpha);
  const root = Math.sqrt(lambda / t);
  const a = root * (t / mu - 1);
  const b = root * (t / mu + 1);
  if (a >= 3) {
    const gap = 2 * root;
    const difference = a >= 30 ? millsRatioDifference(a, b, gap) : millsRatio(a) - millsRatio(b);
    return logStandardNormalPdf(a) + Math.log(difference);
  }
  const logQa = logUpperTailNormal(a);
  return logQa + Math.log1p(-Math.exp(2 / (alpha * alpha) + logUpperTailNormal(b) - logQa));
}

/** The long-run BPT hazard, 1 / (2 alpha^2 mu) events per year (Matthews et al. 2002). */
export function bptHazardLimit(mu: number, alpha: number): number {
  return 1 / (2 * alpha * alpha * mu);
}

/**
 * Lognormal from its log-scale parameters: ln t ~ N(logMean, logSd^2). Mean
 * exp(logMean + logSd^2 / 2), aperiodicity sqrt(exp(logSd^2) - 1) [analytic].
 */
export function lognormalFromLogParameters(logMean: number, logSd: number): RenewalDistribution {
  if (!Number.isFinite(logMean)) throw new RangeError(`log-mean must be finite (got ${logMean})`);
  requirePositive('log-SD', logSd);
  const variance = logSd * logSd;
  const mu = Math.exp(logMean + variance / 2);
  const alpha = Math.sqrt(Math.expm1(variance));
  const logSdLog = Math.log(logSd);
  return fromLogFunctions(
    'LOGNORMAL',
    mu,
    alpha,
    { model: 'LOGNORMAL', logMean, logSd },
    (t) => {
      if (!(t > 0)) return -Infinity;
      const logT = Math.log(t);
      const z = (logT - logMean) / logSd;
      return -logT - logSdLog - LOG_SQRT_2PI - 0.5 * z * z;
    },
    (t) => (t > 0 ? logUpperTailNormal((Math.log(t) - logMean) / logSd) : 0),
  );
}

/**
 * Lognormal with mean mu and aperiodicity alpha: sigma^2 = ln(1 + alpha^2),
 * m = ln mu - sigma^2 / 2 [analytic].
 */
export function lognormalDistribution(mu: number, alpha: number): RenewalDistribution {
  requirePositive('mean recurrence', mu);
  requirePositive('aperiodicity', alpha);
  const variance = Math.log1p(alpha * alpha);
  return lognormalFromLogParameters(Math.log(mu) - variance / 2, Math.sqrt(variance));
}

/** ln Gamma(x), from jstat. */
export function logGamma(x: number): number {
  return jStat.gammaln(x);
}

/** ln(1 + CV^2) of a Weibull with shape k: ln Gamma(1 + 2/k) - 2 ln Gamma(1 + 1/k) [analytic]. */
function weibullLogOnePlusCvSquared(shape: number): number {
  return logGamma(1 + 2 / shape) - 2 * logGamma(1 + 1 / shape);
}

/** Weibull aperiodicity from its shape: CV^2 = Gamma(1 + 2/k) / Gamma(1 + 1/k)^2 - 1 [analytic]. */
export function weibullAperiodicity(shape: number): number {
  return Math.sqrt(Math.expm1(weibullLogOnePlusCvSquared(shape)));
}

/**
 * The Weibull shape k whose coefficient of variation is `alpha`, solving
 * Gamma(1 + 2/k) / Gamma(1 + 1/k)^2 = 1 + alpha^2 by bisection on ln k (the CV falls steadily
 * as k grows, so bisection cannot miss). Shapes are held to 0.05-10,000.
 */
export function weibullShapeFromAperiodicity(alpha: number): number {
  requirePositive('aperiodicity', alpha);
  const target = Math.log1p(alpha * alpha);
  let low = Math.log(WEIBULL_SHAPE_MIN);
  let high = Math.log(WEIBULL_SHAPE_MAX);
  if (weibullLogOnePlusCvSquared(Math.exp(low)) < target || weibullLogOnePlusCvSquared(Math.exp(high)) > target) {
    throw new RangeError(`aperiodicity ${alpha} is outside what a Weibull model can take here`);
  }
  for (let i = 0; i < 200 && high - low > 1e-15; i++) {
    const middle = 0.5 * (low + high);
    if (weibullLogOnePlusCvSquared(Math.exp(middle)) > target) low = middle;
    else high = middle;
  }
  return Math.exp(0.5 * (low + high));
}

/**
 * Weibull with shape k and scale s: S(t) = exp(-(t/s)^k), mean s Gamma(1 + 1/k) [analytic].
 * The window probability uses ((T+dT)/s)^k - (T/s)^k = (T/s)^k expm1(k log1p(dT/T)), which has
 * no cancellation when T is large.
 */
export function weibullFromShapeScale(shape: number, scale: number): RenewalDistribution {
  requirePositive('Weibull shape', shape);
  requirePositive('Weibull scale', scale);
  const mu = scale * Math.exp(logGamma(1 + 1 / shape));
  const alpha = weibullAperiodicity(shape);
  const logShapeOverScale = Math.log(shape / scale);
  return fromLogFunctions(
    'WEIBULL',
    mu,
    alpha,
    { model: 'WEIBULL', shape, scale },
    (t) => {
      if (t < 0) return -Infinity;
      if (t === 0) return shape === 1 ? logShapeOverScale : shape < 1 ? Infinity : -Infinity;
      const logRatio = Math.log(t / scale);
      return logShapeOverScale + (shape - 1) * logRatio - Math.exp(shape * logRatio);
    },
    (t) => (t > 0 ? -Math.pow(t / scale, shape) : 0),
    (elapsed, window) => {
      checkWindow(elapsed, window);
      if (elapsed === 0) return -Math.expm1(-Math.pow(window / scale, shape));
      const increment = Math.pow(elapsed / scale, shape) * Math.expm1(shape * Math.log1p(window / elapsed));
      return -Math.expm1(-increment);
    },
  );
}

/** Weibull with mean mu and aperiodicity alpha: shape from the CV, scale = mu / Gamma(1 + 1/k). */
export function weibullDistribution(mu: number, alpha: number): RenewalDistribution {
  requirePositive('mean recurrence', mu);
  const shape = weibullShapeFromAperiodicity(alpha);
  return weibullFromShapeScale(shape, mu / Math.exp(logGamma(1 + 1 / shape)));
}

/**
 * A renewal model with mean recurrence `mu` (years) and aperiodicity `alpha`. Poisson has no
 * aperiodicity of its own (it is always 1) and ignores `alpha`.
 */
export function renewalDistribution(model: RenewalModel, mu: number, alpha = 1): RenewalDistribution {
  switch (model) {
    case 'POISSON':
      return poissonDistribution(mu);
    case 'BPT':
      return bptDistribution(mu, alpha);
    case 'LOGNORMAL':
      return lognormalDistribution(mu, alpha);
    case 'WEIBULL':
      return weibullDistribution(mu, alpha);
  }
}

/** Rebuilds a distribution from its own parameters (as stored with a fit). */
export function distributionFromParameters(parameters: RenewalParameters): RenewalDistribution {
  switch (parameters.model) {
    case 'POISSON':
      return poissonDistribution(parameters.mu);
    case 'BPT':
      return bptDistribution(parameters.mu, parameters.alpha);
    case 'LOGNORMAL':
      return lognormalFromLogParameters(parameters.logMean, parameters.logSd);
    case 'WEIBULL':
      return weibullFromShapeScale(parameters.shape, parameters.scale);
  }
}
