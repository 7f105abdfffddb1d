import { describe, expect, it } from 'vitest';
import {
  bptDistribution,
  bptHazardLimit,
  distributionFromParameters,
  lognormalDistribution,
  poissonDistribution,
  RENEWAL_MODELS,
  renewalDistribution,
  weibullAperiodicity,
  weibullDistribution,
  weibullShapeFromAperiodicity,
} from './distributions';
import { jStat } from '../common/jstat';

/** Composite Simpson's rule with `steps` (even) panels. */
function simpson(f: (x: number) => number, from: number, to: number, steps = 20_000): number {
  const h = (to - from) / steps;
  let sum = f(from) + f(to);
  for (let i = 1; i < steps; i++) sum += (i % 2 === 1 ? 4 : 2) * f(from + i * h);
  return (sum * h) / 3;
}

/** Mean and CV of a distribution from its survival function: E t = int S, E t^2 = int 2t S. */
function momentsFromSurvival(survival: (t: number) => number, mu: number): { mean: number; cv: number } {
  // Integrate in u = ln t so the far tail and the neighbourhood of zero are both resolved.
  const from = Math.log(mu) - 40;
  const to = Math.log(mu) + 8;
  const mean = simpson((u) => survival(Math.exp(u)) * Math.exp(u), from, to);
  const second = simpson((u) => 2 * Math.exp(2 * u) * survival(Math.exp(u)), from, to);
  return { mean, cv: Math.sqrt(second - mean * mean) / mean };
}

describe(poissonDistribution.name, () => {
  it('gives 1 - exp(-dT/mu): mu 300, dT 30 -> 0.0951626 [analytic]', () => {
    expect(poissonDistribution(300).conditionalProbability(0, 30)).toBeCloseTo(0.0951626, 7);
  });

  it('is memoryless: the window probability does not depend on the elapsed time [analytic]', () => {
    const poisson = poissonDistribution(300);
    expect(poisson.conditionalProbability(5000, 30)).toBeCloseTo(0.0951626, 7);
    expect(poisson.hazard(10)).toBeCloseTo(1 / 300, 12);
    expect(poisson.hazard(9000)).toBeCloseTo(1 / 300, 12);
  });

  it('matches jstat exponential pdf and cdf (rate 1/mu) [reference library]', () => {
    const poisson = poissonDistribution(250);
    for (const t of [1, 100, 250, 1000, 3000]) {
      expect(poisson.cdf(t)).toBeCloseTo(jStat.exponential.cdf(t, 1 / 250), 14);
      expect(poisson.pdf(t)).toBeCloseTo(jStat.exponential.pdf(t, 1 / 250), 16);
    }
  });
});

describe(bptDistribution.name, () => {
  it('gives F(100) = 0.594411 for BPT(100, 0.5) [reference library: SciPy 1.17.1 invgauss(mu=0.25, scale=400)]', () => {
    expect(bptDistribution(100, 0.5).cdf(100)).toBeCloseTo(0.5944106413019689, 12);
  });

  it.each([0.2, 0.5, 1, 1.5])('has a cdf equal to the integral of its pdf, alpha %d [numerical integration]', (alpha) => {
    const bpt = bptDistribution(100, alpha);
    for (const t of [20, 60, 100, 180, 400]) {
      const integral = simpson((x) => (x > 0 ? bpt.pdf(x) : 0), 0, t);
      expect(bpt.cdf(t)).toBeCloseTo(integral, 9);
    }
  });

  it('has mean mu and coefficient of variation alpha [analytic: inverse Gaussian moments]', () => {
    const { mean, cv } = momentsFromSurvival(bptDistribution(500, 0.4).survival, 500);
    expect(mean).toBeCloseTo(500, 6);
    expect(cv).toBeCloseTo(0.4, 8);
  });

  // ln S from the closed form evaluated by mpmath 1.3 at 50 digits [reference library]. At
  // t = 1e6 SciPy 1.17.1's invgauss.logsf is already wrong in the 10th digit.
  const logSurvivalCases: Array<[number, number, number, number]> = [
    [100, 100, 0.5, -0.90241406300093218472],
    [5000, 100, 0.5, -102.84133206976758903],
    [500, 100, 0.1, -164.90825485219244044],
    [50, 100, 0.1, -1.0293344306134316838e-12],
    [10000, 100, 0.05, -19612.129253911115362],
    [1e6, 100, 0.5, -20010.734724074609274],
  ];
  it.each(logSurvivalCases)('has ln S(%d) for mu %d, alpha %d as mpmath gives', (t, mu, alpha, expected) => {
    const actual = bptDistribution(mu, alpha).logSurvival(t);
    expect(Math.abs(actual - expected) / Math.abs(expected)).toBeLessThan(1e-12);
  });

  it('does not overflow for small aperiodicity, where exp(2/alpha^2) is beyond double range', () => {
    // exp(2 / 0.03^2) = exp(2222): the textbook formula gives Infinity x 0 = NaN.
    const bpt = bptDistribution(100, 0.03);
    for (const t of [80, 100, 120, 200]) {
      expect(Number.isFinite(bpt.logSurvival(t))).toBe(true);
      expect(bpt.cdf(t)).toBeGreaterThanOrEqual(0);
      expect(bpt.cdf(t)).toBeLessThanOrEqual(1);
    }
    expect(bpt.cdf(100)).toBeCloseTo(
      simpson((x) => (x > 0 ? bpt.pdf(x) : 0), 50, 100),
      9,
    );
  });

  it('has a hazard that settles to 1/(2 alpha^2 mu): alpha 0.5 -> 2/mu (Matthews et al. 2002; Ellsworth et al. 1999)', () => {
    const mu = 100;
    const bpt = bptDistribution(mu, 0.5);
    expect(bptHazardLimit(mu, 0.5)).toBeCloseTo(2 / mu, 15);
    // mpmath 1.3: hazard x mu = 2.02892522894764 at t = 50 mu and 2.00014997250331 at 1e4 mu.
    expect(bpt.hazard(50 * mu) * mu).toBeCloseTo(2.02892522894764, 10);
    expect(bpt.hazard(1e4 * mu) * mu).toBeCloseTo(2.00014997250331, 8);
  });

  it('has a long-run hazard above, at or below 1/mu as alpha is below, at or above 1/sqrt(2) (Matthews et al. 2002)', () => {
    const mu = 100;
    const farOut = 1e4 * mu;
    expect(bptDistribution(mu, 0.5).hazard(farOut)).toBeGreaterThan(1.5 / mu);
    expect(bptDistribution(mu, Math.SQRT1_2).hazard(farOut) * mu).toBeCloseTo(1, 3);
    expect(bptDistribution(mu, 0.9).hazard(farOut)).toBeLessThan(0.7 / mu);
  });

  it('gives far-tail window probabilities near the hazard limit 1 - exp(-dT/(2 alpha^2 mu))', () => {
    const bpt = bptDistribution(100, 0.5);
    const limit = 1 - Math.exp(-30 / (2 * 0.25 * 100));
    // mpmath 1.3 from the closed form: 0.45591651447877916681 at T = 50 mu, 0.45121305497669931153 at 1e4 mu.
    expect(bpt.conditionalProbability(5000, 30)).toBeCloseTo(0.45591651447877916681, 11);
    expect(bpt.conditionalProbability(1e6, 30)).toBeCloseTo(0.45121305497669931153, 9);
    expect(Math.abs(bpt.conditionalProbability(1e6, 30) - limit)).toBeLessThan(1e-4);
  });
});

describe(lognormalDistribution.name, () => {
  it('sets sigma^2 = ln(1 + CV^2) and m = ln mu - sigma^2/2 [analytic]', () => {
    const parameters = lognormalDistribution(400, 0.6).parameters;
    expect(parameters.model).toBe('LOGNORMAL');
    if (parameters.model !== 'LOGNORMAL') return;
    expect(parameters.logSd ** 2).toBeCloseTo(Math.log(1.36), 14);
    expect(parameters.logMean).toBeCloseTo(Math.log(400) - Math.log(1.36) / 2, 14);
  });

  it.each([0.3, 0.5, 0.8])('has mean mu and CV alpha = %d [analytic, by numerical integration]', (alpha) => {
    const { mean, cv } = momentsFromSurvival(lognormalDistribution(300, alpha).survival, 300);
    expect(mean).toBeCloseTo(300, 5);
    expect(cv).toBeCloseTo(alpha, 7);
  });

  it('matches jstat lognormal pdf and cdf [reference library]', () => {
    const lognormal = lognormalDistribution(300, 0.5);
    const sigma = Math.sqrt(Math.log(1.25));
    const m = Math.log(300) - sigma ** 2 / 2;
    for (const t of [50, 150, 300, 600, 1200]) {
      expect(lognormal.cdf(t)).toBeCloseTo(jStat.lognormal.cdf(t, m, sigma), 13);
      expect(lognormal.pdf(t)).toBeCloseTo(jStat.lognormal.pdf(t, m, sigma), 15);
    }
  });
});

describe(weibullShapeFromAperiodicity.name, () => {
  it('gives shape 1 for CV 1 (the exponential) [analytic]', () => {
    expect(weibullShapeFromAperiodicity(1)).toBeCloseTo(1, 12);
  });

  it('gives shape 2 for CV sqrt(4/pi - 1), the Rayleigh case [analytic]', () => {
    expect(weibullShapeFromAperiodicity(Math.sqrt(4 / Math.PI - 1))).toBeCloseTo(2, 10);
  });

  it('inverts weibullAperiodicity across the range used', () => {
    for (const alpha of [0.05, 0.2, 0.5, 1.3, 3]) {
      expect(weibullAperiodicity(weibullShapeFromAperiodicity(alpha))).toBeCloseTo(alpha, 12);
    }
  });
});

describe(weibullDistribution.name, () => {
  it.each([0.3, 0.5, 1.2])('has mean mu and CV alpha = %d [analytic, by numerical integration]', (alpha) => {
    const { mean, cv } = momentsFromSurvival(weibullDistribution(300, alpha).survival, 300);
    expect(mean).toBeCloseTo(300, 5);
    expect(cv).toBeCloseTo(alpha, 7);
  });

  it('matches jstat weibull pdf and cdf [reference library]', () => {
    const weibull = weibullDistribution(300, 0.5);
    if (weibull.parameters.model !== 'WEIBULL') throw new Error('expected Weibull parameters');
    const { shape, scale } = weibull.parameters;
    for (const t of [50, 150, 300, 600, 1200]) {
      expect(weibull.cdf(t)).toBeCloseTo(jStat.weibull.cdf(t, scale, shape), 13);
      expect(weibull.pdf(t)).toBeCloseTo(jStat.weibull.pdf(t, scale, shape), 15);
    }
  });

  it('keeps its window probability accurate far in the tail [analytic: S(T+dT)/S(T) for k = 2]', () => {
    // For shape 2 and scale s: 1 - exp(-((T+dT)^2 - T^2)/s^2) = 1 - exp(-(2T dT + dT^2)/s^2).
    const shape2 = distributionFromParameters({ model: 'WEIBULL', shape: 2, scale: 100 });
    const expected = -Math.expm1(-(2 * 5000 * 0.01 + 0.01 ** 2) / 100 ** 2);
    expect(shape2.conditionalProbability(5000, 0.01)).toBeCloseTo(expected, 15);
    expect(Math.abs(shape2.conditionalProbability(5000, 0.01) / expected - 1)).toBeLessThan(1e-12);
  });
});

describe(renewalDistribution.name, () => {
  it('reports back the mean and aperiodicity it was given', () => {
    for (const model of RENEWAL_MODELS) {
      const distribution = renewalDistribution(model, 420, 0.45);
      expect(distribution.model).toBe(model);
      expect(distribution.mu).toBeCloseTo(420, 9);
      expect(distribution.alpha).toBeCloseTo(model === 'POISSON' ? 1 : 0.45, 11);
    }
  });

  it('gives window probabilities in [0, 1] that grow with the window', () => {
    for (const model of RENEWAL_MODELS) {
      const distribution = renewalDistribution(model, 300, 0.5);
      for (const elapsed of [0, 50, 300, 900, 15_000]) {
        let previous = 0;
        for (const window of [1, 10, 30, 50, 100, 500]) {
          const probability = distribution.conditionalProbability(elapsed, window);
          expect(probability).toBeGreaterThanOrEqual(previous);
          expect(probability).toBeLessThanOrEqual(1);
          previous = probability;
        }
        expect(previous).toBeGreaterThan(0);
      }
    }
  });

  it('gives finite probabilities and hazards at T = 50 mu for every model', () => {
    for (const model of RENEWAL_MODELS) {
      const distribution = renewalDistribution(model, 300, 0.5);
      expect(Number.isFinite(distribution.hazard(15_000))).toBe(true);
      const probability = distribution.conditionalProbability(15_000, 30);
      expect(probability).toBeGreaterThan(0);
      expect(probability).toBeLessThanOrEqual(1);
    }
  });

  it('gives P(0, dT) = F(dT)', () => {
    for (const model of RENEWAL_MODELS) {
      const distribution = renewalDistribution(model, 300, 0.5);
      expect(distribution.conditionalProbability(0, 120)).toBeCloseTo(distribution.cdf(120), 14);
    }
  });

  it('refuses a mean or aperiodicity that is not positive', () => {
    expect(() => renewalDistribution('BPT', 0, 0.5)).toThrow(RangeError);
    expect(() => renewalDistribution('LOGNORMAL', 300, -1)).toThrow(RangeError);
    expect(() => renewalDistribution('WEIBULL', 300, Number.NaN)).toThrow(RangeError);
    expect(() => renewalDistribution('POISSON', 300).conditionalProbability(-1, 30)).toThrow(RangeError);
  });
});
