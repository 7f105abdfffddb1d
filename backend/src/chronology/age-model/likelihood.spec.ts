import { describe, expect, it } from 'vitest';
import { normalDensity, uniformDensity } from '../common/density';
import { depositLikelihood, DepositLikelihood, LATEST_CAL_BP, MixtureLikelihoods, modelWindow } from './likelihood';

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

describe(MixtureLikelihoods.name, () => {
  it('adds the flat outlier term q / W and sums consistently', () => {
    // Source: L_q = (1 - q) L + q / W, so the window's total is (1 - q) + q [analytic].
    const window = { youngCalBp: 0, oldCalBp: 999 };
    const L = new MixtureLikelihoods([depositLikelihood(uniformDensity(400, 499), 'DATES_DEPOSIT', 100)], window, 0.05);
    expect(L.width).toBe(1000);
    expect(L.mixture(0, 450)).toBeCloseTo(0.95 / 100 + 0.05 / 1000, 15);
    expect(L.mixture(0, 10)).toBeCloseTo(0.05 / 1000, 15);
    expect(L.totalMass(0)).toBeCloseTo(1, 12);
    expect(L.massBetween(0, 400, 499)).toBeCloseTo(0.95 + 0.005, 12);
    let direct = 0;
    for (let t = 380; t <= 420; t++) direct += L.mixture(0, t);
    expect(L.massBetween(0, 380, 420)).toBeCloseTo(direct, 12);
  });
});
