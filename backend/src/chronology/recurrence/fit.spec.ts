import { describe, expect, it } from 'vitest';
import { SeededRandom } from '../common/random';
import {
  distributionFromParameters,
  type RenewalDistribution,
  renewalDistribution,
  type RenewalModel,
  type RenewalParameters,
} from './distributions';
import { RecurrenceInputError } from './errors';
import {
  compareModels,
  distributionFromFit,
  fitAllModels,
  fitBpt,
  fitLognormal,
  fitPoisson,
  fitRenewalModel,
  fitWeibull,
  type RenewalFit,
} from './fit';

/**
 * Inverse Gaussian variates (Michael, Schucany & Haas 1976, The American Statistician 30(2):88-90):
 * y = z^2, x = mu + mu^2 y / (2 lambda) - (mu / (2 lambda)) sqrt(4 mu lambda y + mu^2 y^2), and
 * x is kept with probability mu / (mu + x), else mu^2 / x.
 */
function bptVariate(rng: SeededRandom, mu: number, alpha: number): number {
  const lambda = mu / (alpha * alpha);
  const y = rng.normal() ** 2;
  const x = mu + (mu * mu * y) / (2 * lambda) - (mu / (2 * lambda)) * Math.sqrt(4 * mu * lambda * y + mu * mu * y * y);
  return rng.uniform() <= mu / (mu + x) ? x : (mu * mu) / x;
}

/** Samplers of each model given its mean and aperiodicity. */
const samplers: Record<
  Exclude<RenewalModel, 'POISSON'>,
  (mu: number, alpha: number) => (rng: SeededRandom) => number
> = {
  BPT: (mu, alpha) => (rng) => bptVariate(rng, mu, alpha),
  LOGNORMAL: (mu, alpha) => {
    const variance = Math.log1p(alpha * alpha);
    return (rng) => Math.exp(Math.log(mu) - variance / 2 + Math.sqrt(variance) * rng.normal());
  },
  WEIBULL: (mu, alpha) => {
    const parameters = renewalDistribution('WEIBULL', mu, alpha).parameters;
    if (parameters.model !== 'WEIBULL') throw new Error('expected Weibull parameters');
    // Inversion of S(t) = exp(-(t/s)^k).
    return (rng) => parameters.scale * Math.pow(-Math.log(1 - rng.uniform()), 1 / parameters.shape);
  },
};

/**
 * A renewal process watched from one event until a fixed time chosen in advance: the record is the
 * intervals completed by then plus the time since the last event, right-censored.
 */
function simulateRecord(
  next: () => number,
  observedYears: number,
): { closedIntervals: number[]; openInterval: number } {
  const closedIntervals: number[] = [];
  let lastEvent = 0;
  for (;;) {
    const interval = next();
    if (lastEvent + interval > observedYears) return { closedIntervals, openInterval: observedYears - lastEvent };
    closedIntervals.push(interval);
    lastEvent += interval;
  }
}

/** ln L = sum ln f(tau_i) + ln S(t_e), straight from a distribution's own functions. */
function censoredLogLikelihood(distribution: RenewalDistribution, closed: readonly number[], open: number): number {
  return closed.reduce((sum, tau) => sum + distribution.logPdf(tau), 0) + distribution.logSurvival(open);
}

const smallRecord = { closedIntervals: [420, 610, 380, 520, 700], openInterval: 900 };

describe(fitPoisson.name, () => {
  it('gives mu = (sum of closed intervals + open interval) / n_closed [analytic]', () => {
    const fit = fitPoisson({ closedIntervals: [200, 300, 250], openInterval: 150 });
    expect(fit.mu).toBeCloseTo(300, 12);
    expect(fit.alpha).toBe(1);
    expect(fit.logLikelihood).toBeCloseTo(-3 * Math.log(300) - 3, 12);
    expect(fit.aic).toBeCloseTo(2 - 2 * (-3 * Math.log(300) - 3), 12);
    // AICc with n = 4 intervals (the open one counts), k = 1: + 2*1*2/(4-1-1) = 2 [analytic].
    expect(fit.aicc).toBeCloseTo(fit.aic + 2, 12);
    expect(fit.parameterCount).toBe(1);
    // Without the open interval n = 3 and k = 1 gives 4/1; a 2-parameter fit has none (n <= k + 1).
    expect(fitPoisson({ closedIntervals: [200, 300, 250] }).aicc).toBeCloseTo(fitPoisson({ closedIntervals: [200, 300, 250] }).aic + 4, 12);
    expect(fitBpt({ closedIntervals: [200, 300, 250] }).aicc).toBeNull();
  });

  it('gives the sample mean without an open interval [analytic]', () => {
    expect(fitPoisson({ closedIntervals: [200, 300, 250] }).mu).toBeCloseTo(250, 12);
  });
});

describe(fitRenewalModel.name, () => {
  it('refuses fewer than 2 closed intervals with a RecurrenceInputError on closedIntervals', () => {
    for (const model of ['POISSON', 'BPT', 'LOGNORMAL', 'WEIBULL'] as const) {
      let error: unknown;
      try {
        fitRenewalModel(model, { closedIntervals: [500], openInterval: 100 });
      } catch (caught) {
        error = caught;
      }
      expect(error).toBeInstanceOf(RecurrenceInputError);
      expect((error as RecurrenceInputError).field).toBe('closedIntervals');
      expect((error as RecurrenceInputError).message).toMatch(/at least 2 closed intervals/i);
    }
  });

  it('refuses an interval that is not a positive number of years', () => {
    expect(() => fitBpt({ closedIntervals: [500, 0, 300] })).toThrow(RecurrenceInputError);
    expect(() => fitBpt({ closedIntervals: [500, Number.NaN, 300] })).toThrow(RecurrenceInputError);
    expect(() => fitBpt({ closedIntervals: [500, 400], openInterval: -3 })).toThrow(/open interval/);
  });
});

describe(fitBpt.name, () => {
  it('matches the inverse Gaussian closed form without an open interval: mu = mean, alpha^2 = mean x mean(1/tau) - 1 [analytic]', () => {
    const closed = [420, 610, 380, 520, 700, 455];
    const mean = closed.reduce((s, t) => s + t, 0) / closed.length;
    const meanInverse = closed.reduce((s, t) => s + 1 / t, 0) / closed.length;
    const fit = fitBpt({ closedIntervals: closed });
    expect(fit.converged).toBe(true);
    expect(fit.mu / mean - 1).toBeCloseTo(0, 6);
    expect(fit.alpha / Math.sqrt(mean * meanInverse - 1) - 1).toBeCloseTo(0, 6);
  });
});

describe(fitLognormal.name, () => {
  it('matches the closed form without an open interval: mean and population SD of ln tau [analytic]', () => {
    const closed = [420, 610, 380, 520, 700, 455];
    const logs = closed.map(Math.log);
    const m = logs.reduce((s, x) => s + x, 0) / logs.length;
    const sigma = Math.sqrt(logs.reduce((s, x) => s + (x - m) ** 2, 0) / logs.length);
    const fit = fitLognormal({ closedIntervals: closed });
    if (fit.parameters.model !== 'LOGNORMAL') throw new Error('expected lognormal parameters');
    expect(fit.parameters.logMean).toBeCloseTo(m, 7);
    expect(fit.parameters.logSd / sigma - 1).toBeCloseTo(0, 6);
  });
});

describe(fitWeibull.name, () => {
  it('solves the Weibull likelihood equations without an open interval [analytic]', () => {
    // 1/k + mean(ln tau) - sum tau^k ln tau / sum tau^k = 0 and s^k = mean(tau^k).
    const closed = [420, 610, 380, 520, 700, 455];
    const fit = fitWeibull({ closedIntervals: closed });
    if (fit.parameters.model !== 'WEIBULL') throw new Error('expected Weibull parameters');
    const { shape, scale } = fit.parameters;
    const powers = closed.map((t) => t ** shape);
    const sumPowers = powers.reduce((s, x) => s + x, 0);
    const meanLog = closed.reduce((s, t) => s + Math.log(t), 0) / closed.length;
    const weightedLog = closed.reduce((s, t, i) => s + powers[i] * Math.log(t), 0) / sumPowers;
    expect(1 / shape + meanLog - weightedLog).toBeCloseTo(0, 6);
    expect(scale ** shape / (sumPowers / closed.length) - 1).toBeCloseTo(0, 6);
  });
});

describe(fitAllModels.name, () => {
  // Brute force: ln L from the distributions' own pdf and survival, maximised on a grid of each
  // model's parameters that is refined around its best point; independent of the optimiser and of
  // the prepared sums the fits use.
  function gridMaximum(
    build: (x: number, y: number) => RenewalParameters,
    box: [number, number, number, number],
  ): { logLikelihood: number; parameters: RenewalParameters } {
    let [x0, x1, y0, y1] = box;
    let best = { logLikelihood: -Infinity, parameters: build(x0, y0) };
    for (let round = 0; round < 6; round++) {
      const steps = 60;
      let bestX = x0;
      let bestY = y0;
      for (let i = 0; i <= steps; i++) {
        for (let j = 0; j <= steps; j++) {
          const x = x0 + ((x1 - x0) * i) / steps;
          const y = y0 + ((y1 - y0) * j) / steps;
          const parameters = build(x, y);
          const value = censoredLogLikelihood(
            distributionFromParameters(parameters),
            smallRecord.closedIntervals,
            smallRecord.openInterval,
          );
          if (value > best.logLikelihood) {
            best = { logLikelihood: value, parameters };
            bestX = x;
            bestY = y;
          }
        }
      }
      const dx = (x1 - x0) / 10;
      const dy = (y1 - y0) / 10;
      [x0, x1, y0, y1] = [bestX - dx, bestX + dx, bestY - dy, bestY + dy];
    }
    return best;
  }

  const grids: Record<Exclude<RenewalModel, 'POISSON'>, () => ReturnType<typeof gridMaximum>> = {
    BPT: () =>
      gridMaximum((x, y) => ({ model: 'BPT', mu: Math.exp(x), alpha: Math.exp(y) }), [
        Math.log(200), Math.log(5000), Math.log(0.02), Math.log(3),
      ]),
    LOGNORMAL: () =>
      gridMaximum((x, y) => ({ model: 'LOGNORMAL', logMean: x, logSd: Math.exp(y) }), [
        5, 8, Math.log(0.02), Math.log(3),
      ]),
    WEIBULL: () =>
      gridMaximum((x, y) => ({ model: 'WEIBULL', scale: Math.exp(x), shape: Math.exp(y) }), [
        Math.log(200), Math.log(5000), Math.log(0.2), Math.log(30),
      ]),
  };

  it.each(['BPT', 'LOGNORMAL', 'WEIBULL'] as const)(
    'reaches the brute-force maximum of the censored likelihood L = prod f(tau) x S(t_e) for %s (Parsons 2008; Biasi et al. 2002)',
    (model) => {
      const fit = fitAllModels(smallRecord).find((candidate) => candidate.model === model) as RenewalFit;
      const grid = grids[model]();
      const direct = censoredLogLikelihood(distributionFromFit(fit), smallRecord.closedIntervals, smallRecord.openInterval);
      expect(fit.converged).toBe(true);
      expect(fit.logLikelihood).toBeCloseTo(direct, 9);
      expect(fit.logLikelihood).toBeGreaterThanOrEqual(grid.logLikelihood - 1e-8);
      expect(fit.logLikelihood - grid.logLikelihood).toBeLessThan(1e-6);
      const gridDistribution = distributionFromParameters(grid.parameters);
      expect(fit.mu / gridDistribution.mu - 1).toBeCloseTo(0, 3);
      expect(fit.alpha / gridDistribution.alpha - 1).toBeCloseTo(0, 3);
      expect(fit.aic).toBeCloseTo(4 - 2 * fit.logLikelihood, 12);
    },
  );

  it('shifts the fitted mean up when a long open interval is censored rather than ignored', () => {
    const withOpen = fitAllModels(smallRecord);
    const withoutOpen = fitAllModels({ closedIntervals: smallRecord.closedIntervals });
    for (let m = 0; m < withOpen.length; m++) expect(withOpen[m].mu).toBeGreaterThan(withoutOpen[m].mu);
  });

  describe.each([
    ['BPT', 500, 0.5, 11],
    ['LOGNORMAL', 500, 0.5, 12],
    ['WEIBULL', 500, 0.5, 13],
    ['BPT', 300, 0.25, 14],
    ['WEIBULL', 300, 1.1, 15],
  ] as const)('recovering %s(mu %d, alpha %d) from about 2000 simulated intervals', (model, mu, alpha, seed) => {
    const rng = new SeededRandom(seed);
    const sample = samplers[model](mu, alpha);
    const record = simulateRecord(() => sample(rng), 2000 * mu);
    // Large-sample standard errors are near alpha / sqrt(n) (relative, for mu) and
    // alpha / sqrt(2n) (for alpha) [analytic, normal approximation]; allow about five.
    const muTolerance = (5 * alpha) / Math.sqrt(2000);
    const alphaTolerance = (5 * alpha) / Math.sqrt(4000);

    it('with the open interval', () => {
      expect(record.closedIntervals.length).toBeGreaterThan(1900);
      const fit = fitRenewalModel(model, record);
      expect(fit.converged).toBe(true);
      expect(Math.abs(fit.mu / mu - 1)).toBeLessThan(muTolerance);
      expect(Math.abs(fit.alpha - alpha)).toBeLessThan(alphaTolerance);
    });

    it('without it', () => {
      const fit = fitRenewalModel(model, { closedIntervals: record.closedIntervals });
      expect(fit.converged).toBe(true);
      expect(Math.abs(fit.mu / mu - 1)).toBeLessThan(muTolerance);
      expect(Math.abs(fit.alpha - alpha)).toBeLessThan(alphaTolerance);
    });
  });

  it('recovers the Poisson rate from simulated exponential intervals with the open interval [analytic closed form]', () => {
    const rng = new SeededRandom(21);
    const record = simulateRecord(() => rng.exponential(400), 2000 * 400);
    const fit = fitPoisson(record);
    const total = record.closedIntervals.reduce((s, t) => s + t, 0) + record.openInterval;
    expect(fit.mu).toBeCloseTo(total / record.closedIntervals.length, 9);
    expect(Math.abs(fit.mu / 400 - 1)).toBeLessThan(4 / Math.sqrt(2000));
  });
});

describe(compareModels.name, () => {
  function fakeFit(model: RenewalModel, aic: number): RenewalFit {
    return {
      model,
      mu: 500,
      alpha: 0.5,
      parameters: { model: 'BPT', mu: 500, alpha: 0.5 },
      logLikelihood: -aic / 2 + 2,
      aic,
      aicc: aic + 12 / 7,
      parameterCount: 2,
      closedIntervalCount: 10,
      openIntervalYears: null,
      converged: true,
    };
  }

  it('computes delta AIC and Akaike weights exp(-delta/2) / sum (Burnham & Anderson 2002) [analytic]', () => {
    const comparison = compareModels([fakeFit('POISSON', 104), fakeFit('BPT', 102)]);
    expect(comparison.rows.map((row) => row.model)).toEqual(['BPT', 'POISSON']);
    expect(comparison.rows[1].deltaAic).toBeCloseTo(2, 12);
    expect(comparison.rows[0].akaikeWeight).toBeCloseTo(1 / (1 + Math.exp(-1)), 12);
    expect(comparison.rows[0].akaikeWeight + comparison.rows[1].akaikeWeight).toBeCloseTo(1, 14);
    expect(comparison.preferred).toBe('BPT');
    expect(comparison.rows[1].deltaAicc).toBeCloseTo(2, 12);
    expect(comparison.weightsFrom).toBe('AICC');
  });

  it('weighs by AICc: a 2-parameter model that wins on AIC by 1 loses with 6 intervals (Hurvich & Tsai 1989) [analytic]', () => {
    // n = 6 intervals (5 closed + open): AICc adds 2k(k+1)/(n-k-1) = 4/4 = 1 for k = 1, 12/3 = 4 for k = 2.
    const poisson = { ...fakeFit('POISSON', 101), parameterCount: 1, aicc: 101 + 1 };
    const bpt = { ...fakeFit('BPT', 100), aicc: 100 + 4 };
    const comparison = compareModels([poisson, bpt]);
    expect(comparison.preferred).toBe('POISSON');
    expect(comparison.rows[0].deltaAic).toBeCloseTo(1, 12);
    expect(comparison.rows[1].deltaAicc).toBeCloseTo(2, 12);
    expect(comparison.rows[0].akaikeWeight).toBeCloseTo(1 / (1 + Math.exp(-1)), 12);
  });

  it('gives no weight to a model the record is too short to score by AICc', () => {
    const comparison = compareModels([{ ...fakeFit('POISSON', 104), parameterCount: 1, aicc: 106 }, { ...fakeFit('BPT', 100), aicc: null }]);
    expect(comparison.preferred).toBe('POISSON');
    expect(comparison.rows[1].akaikeWeight).toBe(0);
    expect(comparison.note).toMatch(/too few intervals for AICc with Brownian Passage Time/);
  });

  it('says the record cannot tell the models apart when every delta AIC is below 2 [common practice]', () => {
    const comparison = compareModels([
      fakeFit('POISSON', 100.9),
      fakeFit('BPT', 100),
      fakeFit('LOGNORMAL', 101.5),
      fakeFit('WEIBULL', 100.2),
    ]);
    expect(comparison.distinguishable).toBe(false);
    expect(comparison.note).toMatch(/cannot tell these models apart/);
  });

  it('names the models it cannot separate and how weakly the others are supported', () => {
    const comparison = compareModels([
      fakeFit('POISSON', 125),
      fakeFit('BPT', 100.5),
      fakeFit('LOGNORMAL', 100),
      fakeFit('WEIBULL', 105),
    ]);
    expect(comparison.distinguishable).toBe(true);
    expect(comparison.note).toMatch(/cannot tell lognormal and Brownian Passage Time apart/);
    expect(comparison.note).toMatch(/Weibull is considerably less supported \(delta AICc 5\.0\)/);
    expect(comparison.note).toMatch(/Poisson \(exponential\) is essentially unsupported \(delta AICc 25\.0\)/);
  });
});
