import { describe, expect, it } from 'vitest';
import { normalDensity, uniformDensity } from '../common/density';
import {
  depositLikelihood,
  DepositLikelihood,
  LATEST_CAL_BP,
  MixtureLikelihoods,
  modelWindow,
  outlierShiftLikelihood,
} from './likelihood';

function valueAt(likelihood: DepositLikelihood, calBp: number): number {
  return likelihood.values[calBp - likelihood.startCalBp] ?? 0;
}

function moments(likelihood: DepositLikelihood): { mass: number; mean: number } {
  let mass = 0;
  let first = 0;
  likelihood.values.forEach((p, i) => {
    mass += p;
    first += p * (likelihood.startCalBp + i);
  });
  return { mass, mean: first / mass };
}

describe(depositLikelihood.name, () => {
  const sampleAge = normalDensity(2000, 40);

  it('keeps a sample that dates its deposit as its own (normalised) likelihood', () => {
    const d = depositLikelihood(uniformDensity(100, 103), 'DATES_DEPOSIT', 100);
    expect(d.startCalBp).toBe(100);
    expect(Array.from(d.values)).toEqual([0.25, 0.25, 0.25, 0.25]);
  });

  it('matches the direct sum over inheritance offsets for detrital material', () => {
    // Source: L(d) = sum_k L_s(d + k) (1 - r) r^k with r = exp(-1/scale), summed directly [analytic].
    const own = uniformDensity(1000, 1049);
    const d = depositLikelihood(own, 'OLDER_THAN_DEPOSIT', 30);
    const r = Math.exp(-1 / 30);
    for (const year of [1049, 1020, 1000, 990, 900]) {
      let direct = 0;
      for (let k = 0; k < 5000; k++) {
        const t = year + k;
        if (t >= 1000 && t <= 1049) direct += (1 / 50) * (1 - r) * r ** k;
      }
      expect(valueAt(d, year)).toBeCloseTo(direct, 12);
    }
    expect(valueAt(d, 1050)).toBe(0);
  });

  it('moves the mean by the mean inheritance, younger for detrital and older for intrusive samples', () => {
    // Source: the year-binned exponential is geometric with mean r / (1 - r) = 1 / (e^(1/s) - 1),
    // 99.50 years for s = 100; the offset's convolution adds or removes its mean, and the
    // likelihood keeps unit mass over deposit ages [analytic].
    const meanOffset = 1 / Math.expm1(1 / 100);
    const older = moments(depositLikelihood(sampleAge, 'OLDER_THAN_DEPOSIT', 100));
    const younger = moments(depositLikelihood(sampleAge, 'YOUNGER_THAN_DEPOSIT', 100));
    expect(meanOffset).toBeCloseTo(99.5, 2);
    expect(older.mass).toBeCloseTo(1, 9);
    expect(younger.mass).toBeCloseTo(1, 9);
    expect(older.mean).toBeCloseTo(2000 - meanOffset, 6);
    expect(younger.mean).toBeCloseTo(2000 + meanOffset, 6);
  });
});

describe(modelWindow.name, () => {
  it('widens the likelihoods by the margin on both sides', () => {
    const a = depositLikelihood(uniformDensity(3000, 3100), 'DATES_DEPOSIT', 100);
    const b = depositLikelihood(uniformDensity(4000, 4050), 'DATES_DEPOSIT', 100);
    expect(modelWindow([a, b], [], 500)).toEqual({ youngCalBp: 2500, oldCalBp: 4550 });
  });

  it('stops at the present unless a likelihood itself is younger', () => {
    const recent = depositLikelihood(uniformDensity(100, 200), 'DATES_DEPOSIT', 100);
    expect(modelWindow([recent], [uniformDensity(100, 200)], 1000).youngCalBp).toBe(LATEST_CAL_BP);
    const modern = depositLikelihood(uniformDensity(-80, 20), 'DATES_DEPOSIT', 100);
    expect(modelWindow([modern], [uniformDensity(-80, 20)], 1000).youngCalBp).toBe(-80);
  });
});

describe(outlierShiftLikelihood.name, () => {
  it('spreads a one-year likelihood as the binned Laplace shift prior [reference library]', () => {
    // Source: SciPy 1.17, laplace(scale=500).cdf(150.5) - laplace(scale=500).cdf(-150.5) =
    // 0.2599222 (python3 -c "from scipy.stats import laplace; ..."); the exactly binned two-sided
    // geometric sums to 0.2599226 over |k| <= 150.
    const point = depositLikelihood(uniformDensity(3000, 3000), 'DATES_DEPOSIT', 100);
    const window = { youngCalBp: 0, oldCalBp: 9000 };
    const shifted = outlierShiftLikelihood(point, window, 500);
    let near = 0;
    let total = 0;
    shifted.forEach((p, i) => {
      total += p;
      if (Math.abs(i - 3000) <= 150) near += p;
    });
    expect(near).toBeCloseTo(0.2599222, 5);
    // Shifts beyond the window's edges (more than 3000 years younger, 6000 older) are lost:
    // r^3001 / (1 + r) and r^6001 / (1 + r).
    const r = Math.exp(-1 / 500);
    expect(total).toBeCloseTo(1 - (r ** 3001 + r ** 6001) / (1 + r), 10);
    // Symmetric about the point.
    expect(shifted[3000 - 321]).toBeCloseTo(shifted[3000 + 321], 15);
  });

  it('equals the direct convolution sum_k L(d + k) P(k) [analytic]', () => {
    const likelihood = depositLikelihood(normalDensity(2000, 40), 'OLDER_THAN_DEPOSIT', 80);
    const window = { youngCalBp: 1200, oldCalBp: 2600 };
    const shifted = outlierShiftLikelihood(likelihood, window, 200);
    const r = Math.exp(-1 / 200);
    for (const d of [1200, 1700, 1950, 2400, 2600]) {
      let direct = 0;
      for (let i = 0; i < likelihood.values.length; i++) {
        const k = likelihood.startCalBp + i - d;
        direct += likelihood.values[i] * ((1 - r) / (1 + r)) * r ** Math.abs(k);
      }
      expect(shifted[d - window.youngCalBp]).toBeCloseTo(direct, 12);
    }
  });
});

describe(MixtureLikelihoods.name, () => {
  it('mixes L and the shifted term and integrates the step function exactly', () => {
    // Source: L_q = (1 - q) L + q O, and the integral of a step function [analytic].
    const window = { youngCalBp: 0, oldCalBp: 999 };
    const deposit = depositLikelihood(uniformDensity(400, 499), 'DATES_DEPOSIT', 100);
    const L = new MixtureLikelihoods([deposit], window, 0.05, 300);
    const shifted = outlierShiftLikelihood(deposit, window, 300);
    expect(L.width).toBe(1000);
    expect(L.mixture(0, 450)).toBeCloseTo(0.95 / 100 + 0.05 * shifted[450], 15);
    expect(L.mixture(0, 10)).toBeCloseTo(0.05 * shifted[10], 15);
    expect(L.at(0, 450.49)).toBe(L.mixture(0, 450));
    expect(L.at(0, 450.5)).toBe(L.mixture(0, 451));
    let direct = 0;
    for (let t = 380; t <= 420; t++) direct += L.mixture(0, t);
    expect(L.cumulativeAt(0, 420.5) - L.cumulativeAt(0, 379.5)).toBeCloseTo(direct, 12);
    const partial = 0.75 * L.mixture(0, 380) + 0.5 * L.mixture(0, 381);
    expect(L.cumulativeAt(0, 381) - L.cumulativeAt(0, 379.75)).toBeCloseTo(partial, 12);
    expect(L.outlierCumulativeAt(0, 999.5) + 0.95 * L.plainCumulativeAt(0, 999.5)).toBeCloseTo(L.totalMass(0), 12);
  });
});
