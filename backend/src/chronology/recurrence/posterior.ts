/**
 * Renewal parameters drawn from their posterior given a record (closed intervals tau_1..tau_n and
 * the open interval t_e, right-censored: L = prod f(tau_i) x S(t_e)), so that a probability's range
 * carries the uncertainty of the parameters and not only of the dating. Every sampler here is exact
 * (or exact up to a stated quadrature): no Markov chain, nothing to converge.
 *
 * Priors. Each is the usual reference prior of the model's own parameterisation: invariant to the
 * unit of time (so years or centuries give the same answer), proper posterior from two intervals,
 * and no preferred recurrence or aperiodicity. The one piece of information added, and the reason
 * they are called weakly informative here, is an upper limit on the aperiodicity,
 * APERIODICITY_LIMIT = 5 [our choice]: beyond it a record is a few clusters, not a renewal
 * process, and with two or three intervals an unbounded prior puts real posterior mass there.
 * - POISSON: pi(mu) ∝ 1/mu, Jeffreys' prior for a scale (Jeffreys 1961, Theory of Probability,
 *   3rd ed., section 3.1 [memory for the section]). Posterior: 1/mu ~ Gamma(n, sum tau + t_e),
 *   the censored interval included exactly.
 * - LOGNORMAL (ln tau ~ N(m, s^2)): pi(m, s) ∝ 1/s, the standard noninformative prior of a normal
 *   sample (Gelman, Carlin, Stern, Dunson, Vehtari & Rubin 2013, Bayesian Data Analysis, 3rd ed.,
 *   section 3.2). Uncensored posterior: s^2 ~ Inv-Gamma((n-1)/2, SS/2), m | s ~ N(mean ln tau, s^2/n).
 * - BPT (inverse Gaussian with mean mu, shape lambda = mu / alpha^2): pi(phi, lambda) ∝ 1/lambda
 *   with phi = 1/mu, flat in the rate (the vague prior of Banerjee & Bhattacharyya 1979,
 *   Technometrics 21(2):247-251 [memory]). Because sum (tau - mu)^2 / (mu^2 tau) = sum tau (phi -
 *   1/tau)^2, the uncensored posterior is lambda ~ Gamma((n-1)/2, rate V/2) with V = sum (tau_i -
 *   m)^2 / (tau_i m^2), m the mean interval, and phi | lambda ~ N(1/m, 1 / (lambda sum tau)) on phi > 0.
 * - WEIBULL (shape k, scale c): pi(k, c) ∝ 1/(k c) with k in the shapes whose aperiodicity lies in
 *   [0.01, APERIODICITY_LIMIT] (Jeffreys' rule for each of two scale-like parameters [common
 *   practice]). With theta = c^-k, theta | k ~ Gamma(n, sum tau^k + t_e^k) exactly, censoring
 *   included; the prior on (k, theta) is 1/(k^2 theta) (dc/c = dtheta/(k theta)), so theta integrates
 *   out to p(ln k | data) ∝ k^(n-1) prod tau_i^(k-1) / (sum tau^k + t_e^k)^n, which is drawn by inversion on an adaptive grid of ln k (uniform within a cell).
 *
 * Censoring for BPT and LOGNORMAL: a draw from the uncensored posterior is accepted with
 * probability S(t_e) <= 1. That is rejection sampling with the uncensored posterior as envelope,
 * exact for the censored posterior (von Neumann 1951; Robert & Casella 2004, Monte Carlo
 * Statistical Methods, 2nd ed., section 2.3). Should S(t_e) be tiny for almost all of the
 * posterior (an open interval far longer than every closed one), the attempts are capped and the
 * draw is taken by sampling-importance-resampling from the attempts made (Rubin 1988), which is
 * approximate; such draws are counted and reported.
 *
 * Gamma variates: Marsaglia & Tsang 2000, ACM TOMS 26(3):363-372, with the U^(1/a) boost for
 * shapes below 1 (ibid., section 5).
 */
import { SeededRandom } from '../common/random';
import {
  bptDistribution,
  bptLogSurvival,
  lognormalFromLogParameters,
  poissonDistribution,
  type RenewalDistribution,
  type RenewalModel,
  weibullAperiodicity,
  weibullFromShapeScale,
  weibullShapeFromAperiodicity,
} from './distributions';
import { RecurrenceInputError } from './errors';
import { prepareIntervals, type PreparedIntervals, type RecurrenceIntervals } from './fit';
import { logUpperTailNormal } from './normal-tail';

/** Upper limit of the aperiodicity under every two-parameter prior [our choice; see above]. */
export const APERIODICITY_LIMIT = 5;
/** Lower limit used only to bound the Weibull shape grid (CV 0.01, far below any record). */
const WEIBULL_APERIODICITY_FLOOR = 0.01;
/** Attempts before a censored draw falls back to importance resampling. */
const MAX_ATTEMPTS = 1_000;

/** The priors in words, for notes and exports. */
export const RENEWAL_PRIOR_NOTE =
  'Renewal parameters are drawn from their posterior given each record (closed intervals and the censored open interval) under reference priors: ' +
  'Poisson 1/mu (Jeffreys 1961); lognormal 1/sigma on the log scale (Gelman et al. 2013, BDA3 3.2); ' +
  'BPT flat in 1/mu and 1/lambda in its shape (Banerjee & Bhattacharyya 1979); Weibull 1/(shape x scale) (Jeffreys rule). ' +
  `Every two-parameter model's aperiodicity is held below ${APERIODICITY_LIMIT}. Draws are exact (conjugate forms, rejection for the censored interval, a ln-shape grid for Weibull).`;

/** One draw of a model's parameters. */
export interface ParameterDraw {
  readonly distribution: RenewalDistribution;
  /** True when the censored draw fell back to importance resampling (see the module note). */
  readonly approximate: boolean;
}

/** Draws parameters of one model for one record; build once per record, call per draw. */
export type PosteriorSampler = (random: SeededRandom) => ParameterDraw;

/**
 * A posterior sampler for `model` given a record. At least two closed intervals are needed
 * (the two-parameter posteriors are improper with fewer).
 */
export function posteriorSampler(model: RenewalModel, intervals: RecurrenceIntervals | PreparedIntervals): PosteriorSampler {
  const data = 'logClosed' in intervals ? intervals : prepareIntervals(intervals);
  switch (model) {
    case 'POISSON':
      return poissonSampler(data);
    case 'BPT':
      return bptSampler(data);
    case 'LOGNORMAL':
      return lognormalSampler(data);
    case 'WEIBULL':
      return weibullSampler(data);
  }
}

/** A Gamma(shape, 1) variate (Marsaglia & Tsang 2000). */
export function gammaVariate(shape: number, random: SeededRandom): number {
  if (!(shape > 0)) throw new RangeError(`gamma shape must be positive (got ${shape})`);
  if (shape < 1) {
    const boosted = gammaVariate(shape + 1, random);
    return boosted * Math.pow(1 - random.uniform(), 1 / shape);
  }
  const d = shape - 1 / 3;
  const c = 1 / Math.sqrt(9 * d);
  for (;;) {
    let x: number;
    let v: number;
    do {
      x = random.normal();
      v = 1 + c * x;
    } while (v <= 0);
    v = v * v * v;
    const u = 1 - random.uniform();
    const x2 = x * x;
    if (u < 1 - 0.0331 * x2 * x2) return d * v;
    if (Math.log(u) < 0.5 * x2 + d * (1 - v + Math.log(v))) return d * v;
  }
}

function poissonSampler(data: PreparedIntervals): PosteriorSampler {
  const exposure = data.sum + data.openInterval;
  return (random) => ({ distribution: poissonDistribution(exposure / gammaVariate(data.count, random)), approximate: false });
}

/**
 * Accepts candidates with probability exp(logSurvival) (rejection for the censored interval);
 * after MAX_ATTEMPTS, resamples one of a pool of the attempts by that weight.
 */
function censoredDraw<T>(
  random: SeededRandom,
  propose: () => T | null,
  logSurvival: (candidate: T) => number,
  build: (candidate: T) => RenewalDistribution,
  /** A candidate held at the prior's limit, when every proposal fell outside the prior. */
  atLimit: () => T | null,
): ParameterDraw {
  const pool: T[] = [];
  const weights: number[] = [];
  let best: T | null = null;
  let bestLogS = -Infinity;
  for (let attempt = 0; attempt < MAX_ATTEMPTS; attempt++) {
    const candidate = propose();
    if (candidate === null) continue;
    const logS = logSurvival(candidate);
    if (logS === 0 || Math.log(1 - random.uniform()) < logS) return { distribution: build(candidate), approximate: false };
    if (logS > bestLogS || best === null) {
      best = candidate;
      bestLogS = logS;
    }
    if (pool.length < 256) {
      pool.push(candidate);
      weights.push(Math.exp(logS));
    }
  }
  if (best === null) {
    // The record's posterior lies almost wholly beyond the aperiodicity limit (e.g. two intervals of
    // 1 and 500 years): report the limit itself, flagged approximate.
    const limited = atLimit();
    if (limited === null) throw new RecurrenceInputError('closedIntervals', 'No renewal parameters within the prior fit this record.');
    return { distribution: build(limited), approximate: true };
  }
  const total = weights.reduce((sum, w) => sum + w, 0);
  // Every weight underflowed: the open interval is beyond any drawn model; take the least unlikely.
  if (!(total > 0)) return { distribution: build(best), approximate: true };
  let target = random.uniform() * total;
  let index = 0;
  while (index < pool.length - 1 && target >= weights[index]) target -= weights[index++];
  return { distribution: build(pool[index]), approximate: true };
}

function bptSampler(data: PreparedIntervals): PosteriorSampler {
  const n = data.count;
  const m = data.mean;
  let v = 0;
  for (let i = 0; i < n; i++) {
    const d = m - data.closed[i];
    v += (d * d) / (data.closed[i] * m * m);
  }
  // Equal intervals give V = 0 and an improper posterior; a floor of CV 1e-4 per interval keeps it proper.
  v = Math.max(v, (n * 1e-8) / m);
  const shape = (n - 1) / 2;
  const open = data.hasOpenInterval ? data.openInterval : 0;
  return (random) => {
    let outside: { mu: number; alpha: number } | null = null;
    return censoredDraw(
      random,
      () => {
        const lambda = gammaVariate(shape, random) / (v / 2);
        const phi = 1 / m + random.normal() / Math.sqrt(lambda * data.sum);
        if (!(phi > 0)) return null;
        const mu = 1 / phi;
        const alpha = Math.sqrt(mu / lambda);
        if (!(alpha <= APERIODICITY_LIMIT) || !(alpha > 0)) {
          if (Number.isFinite(mu)) outside = { mu, alpha: APERIODICITY_LIMIT };
          return null;
        }
        return { mu, alpha };
      },
      (c) => (open > 0 ? bptLogSurvival(open, c.mu, c.alpha) : 0),
      (c) => bptDistribution(c.mu, c.alpha),
      () => outside,
    );
  };
}

function lognormalSampler(data: PreparedIntervals): PosteriorSampler {
  const n = data.count;
  const shape = (n - 1) / 2;
  // Equal intervals give SS = 0 and an improper posterior; floor as for BPT (log-SD 1e-4 per interval).
  const scale = Math.max(data.logSumOfSquares, n * 1e-8) / 2;
  const logOpen = data.hasOpenInterval ? Math.log(data.openInterval) : 0;
  // alpha = sqrt(exp(s^2) - 1) <= limit  <=>  s^2 <= ln(1 + limit^2).
  const maxVariance = Math.log1p(APERIODICITY_LIMIT * APERIODICITY_LIMIT);
  return (random) =>
    censoredDraw(
      random,
      () => {
        const variance = scale / gammaVariate(shape, random);
        if (!(variance <= maxVariance)) return null;
        const logSd = Math.sqrt(variance);
        return { logMean: data.meanLog + (logSd / Math.sqrt(n)) * random.normal(), logSd };
      },
      (c) => (data.hasOpenInterval ? logUpperTailNormal((logOpen - c.logMean) / c.logSd) : 0),
      (c) => lognormalFromLogParameters(c.logMean, c.logSd),
      () => ({ logMean: data.meanLog, logSd: Math.sqrt(maxVariance) }),
    );
}

const WEIBULL_SHAPE_LOW = weibullShapeFromAperiodicity(APERIODICITY_LIMIT);
const WEIBULL_SHAPE_HIGH = weibullShapeFromAperiodicity(WEIBULL_APERIODICITY_FLOOR);
const COARSE_POINTS = 48;
const FINE_POINTS = 96;
/** Log-density drop below the maximum where the fine grid ends (e^-20: negligible mass). */
const TAIL_DROP = 20;

/**
 * The Weibull sampler: p(ln k | data) on a coarse grid over the prior's range, then a fine grid
 * (midpoint rule, FINE_POINTS cells) over the region within TAIL_DROP of the maximum; a draw picks a
 * cell by its mass and a uniform point in it, then theta | k exactly.
 */
function weibullSampler(data: PreparedIntervals): PosteriorSampler {
  const n = data.count;
  const reference = data.mean;
  const scaled = Float64Array.from(data.closed, (t) => Math.log(t / reference));
  const logOpen = data.hasOpenInterval ? Math.log(data.openInterval / reference) : null;
  let sumLogScaled = 0;
  for (let i = 0; i < n; i++) sumLogScaled += scaled[i];
  const exposure = (k: number): number => {
    let total = 0;
    for (let i = 0; i < n; i++) total += Math.exp(k * scaled[i]);
    if (logOpen !== null) total += Math.exp(k * logOpen);
    return total;
  };
  const logMarginal = (u: number): number => {
    const k = Math.exp(u);
    return (n - 1) * u + (k - 1) * sumLogScaled - n * Math.log(exposure(k));
  };
  const lowU = Math.log(WEIBULL_SHAPE_LOW);
  const highU = Math.log(WEIBULL_SHAPE_HIGH);
  const coarseStep = (highU - lowU) / (COARSE_POINTS - 1);
  const coarse = Float64Array.from({ length: COARSE_POINTS }, (_, i) => logMarginal(lowU + i * coarseStep));
  let best = 0;
  for (let i = 1; i < COARSE_POINTS; i++) if (coarse[i] > coarse[best]) best = i;
  let first = best;
  while (first > 0 && coarse[first] > coarse[best] - TAIL_DROP) first--;
  let last = best;
  while (last < COARSE_POINTS - 1 && coarse[last] > coarse[best] - TAIL_DROP) last++;
  const from = lowU + first * coarseStep;
  const to = lowU + last * coarseStep;
  const step = (to - from) / FINE_POINTS;
  const logMass = Float64Array.from({ length: FINE_POINTS }, (_, i) => logMarginal(from + (i + 0.5) * step));
  let peak = -Infinity;
  for (const value of logMass) if (value > peak) peak = value;
  const cumulative = new Float64Array(FINE_POINTS);
  let total = 0;
  for (let i = 0; i < FINE_POINTS; i++) {
    total += Math.exp(logMass[i] - peak);
    cumulative[i] = total;
  }
  return (random) => {
    const cell = random.fromCumulative(cumulative);
    const k = Math.exp(from + (cell + random.uniform()) * step);
    const theta = gammaVariate(n, random) / exposure(k);
    const scale = reference * Math.pow(theta, -1 / k);
    return { distribution: weibullFromShapeScale(k, scale), approximate: false };
  };
}

/** The Weibull shape range the prior allows (for tests and notes). */
export function weibullPriorShapeRange(): { low: number; high: number } {
  return { low: WEIBULL_SHAPE_LOW, high: WEIBULL_SHAPE_HIGH };
}

/** Checks the limit above is what the Weibull range means (CV of the low shape). */
export function weibullLimitAperiodicity(): number {
  return weibullAperiodicity(WEIBULL_SHAPE_LOW);
}
