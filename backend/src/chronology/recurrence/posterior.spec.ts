/**
 * The renewal-parameter posteriors against a reference library. Every reference number below was
 * computed with SciPy 1.17 (`python3 posterior-check.py`, the script is quoted at the end of this
 * file): conjugate marginals from scipy.stats t / chi2 / gamma quantiles where the posterior has a
 * closed form, and a 1,500 x 1,500 (1,200 x 1,200) grid quadrature of the censored posterior with
 * scipy.stats.invgauss / lognorm / weibull_min densities and survival functions elsewhere. The
 * record: six intervals 420, 610, 380, 550, 490, 600 years, open interval 300 years.
 */
import { describe, expect, it } from 'vitest';
import { SeededRandom } from '../common/random';
import type { RenewalModel } from './distributions';
import { forecastRenewal } from './forecast';
import { credibleRange } from './monte-carlo';
import { APERIODICITY_LIMIT, gammaVariate, posteriorSampler } from './posterior';

const TAU = [420, 610, 380, 550, 490, 600];
const OPEN = 300;
const DRAWS = 40_000;

function sample(model: RenewalModel, openInterval: number | null, seed = 3) {
  const sampler = posteriorSampler(model, { closedIntervals: TAU, openInterval });
  const random = new SeededRandom(seed);
  const mu = new Float64Array(DRAWS);
  const alpha = new Float64Array(DRAWS);
  const p50 = new Float64Array(DRAWS);
  const logMean = new Float64Array(DRAWS);
  const logVariance = new Float64Array(DRAWS);
  for (let d = 0; d < DRAWS; d++) {
    const { distribution } = sampler(random);
    mu[d] = distribution.mu;
    alpha[d] = distribution.alpha;
    p50[d] = distribution.conditionalProbability(OPEN, 50);
    const p = distribution.parameters;
    if (p.model === 'LOGNORMAL') {
      logMean[d] = p.logMean;
      logVariance[d] = p.logSd * p.logSd;
    }
  }
  return { mu: credibleRange(mu), alpha: credibleRange(alpha), p50: credibleRange(p50), logMean: credibleRange(logMean), logVariance: credibleRange(logVariance), raw: { mu, alpha } };
}

/** Expects [low, median, high] within a relative tolerance (Monte Carlo error of 40,000 draws). */
function expectRange(actual: { low95: number; median: number; high95: number }, reference: [number, number, number], relative: number) {
  expect(actual.low95).toBeGreaterThan(reference[0] * (1 - relative));
  expect(actual.low95).toBeLessThan(reference[0] * (1 + relative));
  expect(actual.median).toBeGreaterThan(reference[1] * (1 - relative));
  expect(actual.median).toBeLessThan(reference[1] * (1 + relative));
  expect(actual.high95).toBeGreaterThan(reference[2] * (1 - relative));
  expect(actual.high95).toBeLessThan(reference[2] * (1 + relative));
}

describe(gammaVariate.name, () => {
  it('has mean and variance a for shapes above and below 1 (Marsaglia & Tsang 2000) [analytic]', () => {
    const random = new SeededRandom(9);
    for (const shape of [0.5, 2.5, 30]) {
      let sum = 0;
      let squares = 0;
      const n = 60_000;
      for (let i = 0; i < n; i++) {
        const x = gammaVariate(shape, random);
        sum += x;
        squares += x * x;
      }
      const mean = sum / n;
      expect(mean).toBeCloseTo(shape, shape < 1 ? 1 : 0);
      expect(squares / n - mean * mean).toBeGreaterThan(shape * 0.9);
      expect(squares / n - mean * mean).toBeLessThan(shape * 1.1);
    }
  });
});

describe(posteriorSampler.name, () => {
  it('POISSON: 1/mu ~ Gamma(6, 3,350) with the open interval as exposure [reference library: scipy.stats.gamma]', () => {
    // 3350 / gamma.ppf([0.975, 0.5, 0.025], 6)
    expectRange(sample('POISSON', OPEN).mu, [287.10, 590.81, 1521.42], 0.03);
  });

  it('LOGNORMAL without an open interval: m is a shifted t(5), s^2 = SS / chi2(5) [reference library: scipy.stats.t, chi2]', () => {
    const { logMean, logVariance } = sample('LOGNORMAL', null);
    expectRange(logMean, [6.012374, 6.215856, 6.419339], 0.003);
    expectRange(logVariance, [0.0146488, 0.0431994, 0.2261522], 0.05);
  });

  it('BPT without an open interval: 1/mu is a shifted t(5), lambda = chi2(5) / V [reference library: scipy.stats.t, chi2]', () => {
    const { raw } = sample('BPT', null);
    const rate = credibleRange(raw.mu.map((mu) => 1 / mu));
    expectRange(rate, [0.00156451, 0.00196721, 0.00236992], 0.01);
    const lambda = credibleRange(raw.mu.map((mu, d) => mu / raw.alpha[d] ** 2));
    expectRange(lambda, [2220.94, 11626.78, 34287.51], 0.05);
  });

  it('BPT with the open interval censored matches grid quadrature of the posterior [reference library: scipy.stats.invgauss]', () => {
    const { mu, p50 } = sample('BPT', OPEN);
    expectRange(mu, [426.62, 508.94, 638.51], 0.02);
    expect(p50.median).toBeCloseTo(0.03483, 2);
    expect(p50.high95).toBeCloseTo(0.17057, 2);
    expect(p50.low95).toBeLessThan(0.003);
  });

  it('LOGNORMAL with the open interval censored matches grid quadrature [reference library: scipy.stats.lognorm]', () => {
    const { mu, p50 } = sample('LOGNORMAL', OPEN);
    expectRange(mu, [431.72, 513.02, 651.51], 0.02);
    expect(p50.median).toBeCloseTo(0.03271, 2);
    expect(p50.high95).toBeCloseTo(0.16103, 2);
  });

  it('WEIBULL with the open interval censored matches grid quadrature [reference library: scipy.stats.weibull_min]', () => {
    // This check caught a missing Jacobian (dc/c = dtheta / (k theta)) in the shape marginal: the
    // sampler's mean recurrence range was 436-594 and its 97.5 % probability 0.119 before the fix.
    const { mu, p50 } = sample('WEIBULL', OPEN);
    expectRange(mu, [421.45, 511.54, 601.43], 0.02);
    expect(p50.median).toBeCloseTo(0.03789, 2);
    expect(p50.high95).toBeCloseTo(0.13682, 2);
  });

  it('keeps every aperiodicity below the prior limit, even with two intervals', () => {
    for (const model of ['BPT', 'LOGNORMAL', 'WEIBULL'] as const) {
      const sampler = posteriorSampler(model, { closedIntervals: [100, 900], openInterval: 50 });
      const random = new SeededRandom(4);
      for (let d = 0; d < 2_000; d++) expect(sampler(random).distribution.alpha).toBeLessThanOrEqual(APERIODICITY_LIMIT * (1 + 1e-9));
    }
  });

  it('survives equal intervals and an open interval far beyond the record (flagged as approximate)', () => {
    const sampler = posteriorSampler('BPT', { closedIntervals: [200, 200, 200], openInterval: 5_000 });
    const draw = sampler(new SeededRandom(1));
    expect(draw.distribution.mu).toBeGreaterThan(0);
    expect(draw.approximate).toBe(true);
  });
});

describe(forecastRenewal.name, () => {
  it('gives a BPT mean recurrence range about as wide as the profile likelihood [reference library: scipy profile likelihood]', () => {
    // Profile-likelihood 95 % interval of the censored BPT mean (2 delta ln L <= 3.841, scipy.optimize
    // over alpha for each mu): 436-611 years. A plug-in fit has no range at all for exact intervals.
    const result = forecastRenewal({ model: 'BPT', intervalsYears: TAU, openIntervalYears: OPEN, windowsYears: [30, 50, 100], seed: 2 });
    expect(result.meanRecurrence.low95).toBeGreaterThan(436 * 0.93);
    expect(result.meanRecurrence.low95).toBeLessThan(436 * 1.03);
    expect(result.meanRecurrence.high95).toBeGreaterThan(611);
    expect(result.meanRecurrence.high95).toBeLessThan(611 * 1.12);
    expect(result.probabilities.map((p) => p.windowYears)).toEqual([30, 50, 100]);
    expect(result.probabilities[0].range.median).toBeLessThan(result.probabilities[2].range.median);
    expect(result.approximateDraws).toBe(0);
  });

  it('is reproducible from its seed', () => {
    const input = { model: 'WEIBULL' as const, intervalsYears: TAU, openIntervalYears: OPEN, windowsYears: [50], seed: 8, draws: 500 };
    expect(forecastRenewal(input)).toEqual(forecastRenewal(input));
  });
});

/*
posterior-check.py (SciPy 1.17):

import numpy as np
from scipy import stats
tau = np.array([420, 610, 380, 550, 490, 600.]); te = 300.; n = len(tau); Q = [0.025, 0.5, 0.975]
print([3350/stats.gamma.ppf(1-q, n) for q in Q])                                   # POISSON mu
lt = np.log(tau); ml = lt.mean(); SS = ((lt-ml)**2).sum()
print([ml+np.sqrt(SS/(n*(n-1)))*stats.t.ppf(q, n-1) for q in Q])                  # LOGNORMAL m
print([SS/stats.chi2.ppf(1-q, n-1) for q in Q])                                     # LOGNORMAL s^2
m = tau.mean(); V = ((m-tau)**2/(tau*m*m)).sum()
print([1/m+np.sqrt(V/((n-1)*tau.sum()))*stats.t.ppf(q, n-1) for q in Q])           # BPT 1/mu
print([stats.chi2.ppf(q, n-1)/V for q in Q])                                        # BPT lambda
def wq(x, w, qs):
    o = np.argsort(x); x = x[o]; c = np.cumsum(w[o]); c /= c[-1]
    return [float(np.interp(q, c, x)) for q in qs]
# BPT censored, prior flat in phi = 1/mu and in ln lambda, alpha <= 5
phi = np.linspace(1/3000, 1/250, 1500); ll = np.linspace(0, np.log(1e6), 1500)
P, L = np.meshgrid(phi, np.exp(ll), indexing='ij'); MU = 1/P
lp = sum(stats.invgauss.logpdf(t, MU/L, scale=L) for t in tau) + stats.invgauss.logsf(te, MU/L, scale=L)
lp[np.sqrt(MU/L) > 5] = -np.inf; w = np.exp(lp-lp.max())
p50 = 1-np.exp(stats.invgauss.logsf(te+50, MU/L, scale=L)-stats.invgauss.logsf(te, MU/L, scale=L))
print(wq(MU.ravel(), w.ravel(), Q), wq(p50.ravel(), w.ravel(), Q))
# WEIBULL censored, flat in ln k and ln c, on ln k in [ln 0.3, ln 40], c in [200, 3000]
#   (same with scipy.stats.weibull_min.logpdf / logsf; mean = c Gamma(1 + 1/k))
# LOGNORMAL censored, flat in m and ln s, m in [5.5, 7.2], s in [0.02, 1.8]
#   (same with scipy.stats.lognorm(s, scale=exp(m)); mean = exp(m + s^2/2))
# BPT profile likelihood of mu: minimize_scalar over ln alpha per mu, keep 2 (l(mu) - min) <= 3.841
*/
