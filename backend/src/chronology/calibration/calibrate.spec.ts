import { describe, expect, it } from 'vitest';
import { SeededRandom } from '../common/random';
import { HPD68_LEVEL, HPD95_LEVEL, densityAt, normalise, totalMass, trim } from '../common/density';
import { builtInCurve } from '../../reference-data/reference-data';
import { CalibrationCurve } from './curve';
import { CalibrationInputError } from './errors';
import { TRIM_RELATIVE_THRESHOLD, calibrateRadiocarbon } from './calibrate';

const intcal20 = builtInCurve('INTCAL20');
const marine20 = builtInCurve('MARINE20');

/** A curve defined by formulas on whole calendar years, for analytic checks. */
function syntheticCurve(
  startCalBp: number,
  endCalBp: number,
  mu: (t: number) => number,
  sigma: (t: number) => number,
  marine = false,
): CalibrationCurve {
  const length = endCalBp - startCalBp + 1;
  const muValues = new Float64Array(length);
  const sigmaValues = new Float64Array(length);
  for (let i = 0; i < length; i++) {
    muValues[i] = mu(startCalBp + i);
    sigmaValues[i] = sigma(startCalBp + i);
  }
  return { code: 'TEST', name: 'test curve', marine, startCalBp, endCalBp, mu: muValues, sigma: sigmaValues };
}

/**
 * Brute-force reference: the likelihood N(x; mu(t) + DeltaR, S(t)) evaluated at every year of the
 * curve with no window, normalised and trimmed the same way.
 */
function bruteForceDensity(curve: CalibrationCurve, x: number, s: number, deltaR = 0, deltaRError = 0) {
  const p = new Float64Array(curve.mu.length);
  for (let i = 0; i < p.length; i++) {
    const variance = s * s + curve.sigma[i] ** 2 + deltaRError ** 2;
    p[i] = Math.exp((-0.5 * (x - deltaR - curve.mu[i]) ** 2) / variance) / Math.sqrt(variance);
  }
  return normalise(trim({ startCalBp: curve.startCalBp, probabilities: p }, TRIM_RELATIVE_THRESHOLD));
}

function expectInputError(run: () => unknown, field: string, messagePattern?: RegExp): CalibrationInputError {
  let caught: unknown;
  try {
    run();
  } catch (error) {
    caught = error;
  }
  expect(caught).toBeInstanceOf(CalibrationInputError);
  const error = caught as CalibrationInputError;
  expect(error.field).toBe(field);
  if (messagePattern) expect(error.message).toMatch(messagePattern);
  return error;
}

describe(calibrateRadiocarbon.name, () => {
  describe('on a linear test curve mu(t) = t, sigma 20 (CHECKS.md, [analytic])', () => {
    const linear = syntheticCurve(0, 3000, (t) => t, () => 20);
    const result = calibrateRadiocarbon({ c14Age: 1000, c14Error: 30, curve: linear });

    it('is a unit-mass density', () => {
      expect(totalMass(result.density)).toBeCloseTo(1, 12);
    });

    it('has the combined sigma sqrt(30^2 + 20^2) = 36.06 and its centre at 1000 cal BP', () => {
      expect(result.sdYears).toBeCloseTo(36.06, 1);
      expect(result.meanCalBp).toBeCloseTo(1000, 6);
      expect(result.medianCalBp).toBeCloseTo(1000, 6);
    });

    it('gives one 68.3 % range about 964-1036 and one 95.4 % range about 928-1071 (+-1 yr)', () => {
      expect(result.hpd68).toHaveLength(1);
      expect(Math.abs(result.hpd68[0].youngerCalBp - 964)).toBeLessThanOrEqual(1);
      expect(Math.abs(result.hpd68[0].olderCalBp - 1036)).toBeLessThanOrEqual(1);
      expect(result.hpd95).toHaveLength(1);
      expect(Math.abs(result.hpd95[0].youngerCalBp - 928)).toBeLessThanOrEqual(1);
      expect(Math.abs(result.hpd95[0].olderCalBp - 1071)).toBeLessThanOrEqual(1);
      expect(result.hpd68[0].probability).toBeGreaterThanOrEqual(HPD68_LEVEL);
      expect(result.hpd95[0].probability).toBeGreaterThanOrEqual(HPD95_LEVEL);
    });

    it('trims only years below 1e-6 of the mass', () => {
      const p = result.density.probabilities;
      expect(p[0]).toBeGreaterThan(TRIM_RELATIVE_THRESHOLD);
      expect(p[p.length - 1]).toBeGreaterThan(TRIM_RELATIVE_THRESHOLD);
      // The year just outside each end would hold less than the threshold [analytic: normal 36.06].
      const sd = Math.sqrt(30 ** 2 + 20 ** 2);
      const beyond = (t: number) => Math.exp(-0.5 * ((t - 1000) / sd) ** 2) / (sd * Math.sqrt(2 * Math.PI));
      expect(beyond(result.density.startCalBp - 1)).toBeLessThanOrEqual(TRIM_RELATIVE_THRESHOLD);
      expect(beyond(result.density.startCalBp + p.length)).toBeLessThanOrEqual(TRIM_RELATIVE_THRESHOLD);
    });
  });

  it('on a constant-slope curve is the normal density N((x - a)/b, S/b) in calendar years [analytic]', () => {
    // mu(t) = 200 + 0.8 t, sigma 15; x = 2600 +- 25 -> t ~ N(3000, sqrt(25^2 + 15^2) / 0.8 = 36.44).
    const sloped = syntheticCurve(0, 6000, (t) => 200 + 0.8 * t, () => 15);
    const result = calibrateRadiocarbon({ c14Age: 2600, c14Error: 25, curve: sloped });
    const sd = Math.sqrt(25 ** 2 + 15 ** 2) / 0.8;
    const pdf = (t: number) => Math.exp(-0.5 * ((t - 3000) / sd) ** 2) / (sd * Math.sqrt(2 * Math.PI));
    const p = result.density.probabilities;
    // The result is trimmed to the years above 1e-6 of the mass and renormalised over them.
    let keptMass = 0;
    for (let i = 0; i < p.length; i++) keptMass += pdf(result.density.startCalBp + i);
    expect(keptMass).toBeGreaterThan(0.9999);
    for (let i = 0; i < p.length; i++) {
      const expected = pdf(result.density.startCalBp + i) / keptMass;
      expect(Math.abs(p[i] - expected)).toBeLessThanOrEqual(1e-10 * expected + 1e-15);
    }
    expect(result.sdYears).toBeCloseTo(sd, 1);
    expect(result.meanCalBp).toBeCloseTo(3000, 6);
  });

  it('keeps the 1/S(t) factor: on a flat curve the year with the smaller curve sigma is likelier [analytic]', () => {
    // mu = 1000 everywhere; sigma 10 before 500 cal BP, 40 after. At x = mu the exponent is 0, so
    // p(young)/p(old) = S_old/S_young = sqrt(10^2 + 40^2) / sqrt(10^2 + 10^2) = sqrt(8.5).
    const flat = syntheticCurve(0, 1000, () => 1000, (t) => (t < 500 ? 10 : 40));
    const result = calibrateRadiocarbon({ c14Age: 1000, c14Error: 10, curve: flat });
    expect(densityAt(result.density, 100) / densityAt(result.density, 800)).toBeCloseTo(Math.sqrt(8.5), 10);
    // The masses split in the same ratio: 500 years each side.
    expect(result.hpd68.every((range) => range.olderCalBp < 500)).toBe(true);
  });

  it('finds every crossing of a curve that turns back on itself [analytic]', () => {
    // mu rises to 1000 at t = 1000, falls to 500 at t = 1500, rises again: x = 700 crosses it at
    // 700, 1300 and 1700 cal BP, each with slope +-1 and equal sigma, so each holds a third.
    const folded = syntheticCurve(0, 3000, (t) => (t <= 1000 ? t : t <= 1500 ? 2000 - t : t - 1000), () => 10);
    const result = calibrateRadiocarbon({ c14Age: 700, c14Error: 20, curve: folded });
    expect(result.hpd95.map((range) => Math.round((range.youngerCalBp + range.olderCalBp) / 2))).toEqual([
      1700, 1300, 700,
    ]);
    for (const range of result.hpd95) expect(range.probability).toBeCloseTo(HPD95_LEVEL / 3, 2);
  });

  it('equals a brute-force evaluation over the whole of IntCal20 and Marine20 [brute force]', () => {
    const random = new SeededRandom(7);
    for (let n = 0; n < 60; n++) {
      const marine = n % 3 === 0;
      const curve = marine ? marine20 : intcal20;
      const x = Math.round(1500 + 45_000 * random.uniform());
      const s = Math.round(15 + 200 * random.uniform());
      const deltaR = marine ? Math.round(-100 + 400 * random.uniform()) : null;
      const deltaRError = marine ? Math.round(80 * random.uniform()) : null;
      const result = calibrateRadiocarbon({ c14Age: x, c14Error: s, curve, deltaR, deltaRError });
      const reference = bruteForceDensity(curve, x, s, deltaR ?? 0, deltaRError ?? 0);
      expect(result.density.startCalBp).toBe(reference.startCalBp);
      expect(result.density.probabilities.length).toBe(reference.probabilities.length);
      for (let i = 0; i < reference.probabilities.length; i++) {
        expect(Math.abs(result.density.probabilities[i] - reference.probabilities[i])).toBeLessThan(1e-12);
      }
    }
  });

  it('places the 14C age IntCal20 gives a year at that year, where the curve crosses that age once', () => {
    // 2346 cal BP: the curve rises steadily (about 5 14C yr per year) and its sigma is flat nearby,
    // so nothing but the crossing itself can move the mode. Checked below, not assumed.
    const t0 = 2346;
    const i0 = t0 - intcal20.startCalBp;
    const x = intcal20.mu[i0];
    const s = 10;
    for (let i = i0 - 15; i < i0 + 15; i++) expect(intcal20.mu[i + 1]).toBeGreaterThan(intcal20.mu[i]);
    for (let i = i0 - 2; i <= i0 + 2; i++) expect(intcal20.sigma[i]).toBe(intcal20.sigma[i0]);
    for (let i = 0; i < intcal20.mu.length; i++) {
      if (Math.abs(i - i0) <= 15) continue;
      expect(Math.abs(intcal20.mu[i] - x)).toBeGreaterThan(3 * Math.sqrt(s * s + intcal20.sigma[i] ** 2));
    }
    const result = calibrateRadiocarbon({ c14Age: x, c14Error: s, curve: intcal20 });
    const p = result.density.probabilities;
    let mode = 0;
    for (let i = 1; i < p.length; i++) if (p[i] > p[mode]) mode = i;
    expect(result.density.startCalBp + mode).toBe(t0);
  });

  it("keeps IntCal20's tabulated year inside the ranges of the curve's own value there (reference-data/SOURCES.md)", () => {
    // 1000 cal BP -> 1126 +- 13 [published]. The curve wiggles here (it reads 1136 at 1020 and
    // 1102 at 1040), so calibrating 1126 +- 13 does not return 1000 as its median; what must hold
    // is that 1000 cal BP lies in the 68.3 % and 95.4 % ranges.
    expect(intcal20.mu[1000]).toBe(1126);
    expect(intcal20.sigma[1000]).toBe(13);
    const result = calibrateRadiocarbon({ c14Age: 1126, c14Error: 13, curve: intcal20 });
    const inside = (ranges: typeof result.hpd68) => ranges.some((r) => r.youngerCalBp <= 1000 && 1000 <= r.olderCalBp);
    expect(inside(result.hpd68)).toBe(true);
    expect(inside(result.hpd95)).toBe(true);
    // 5000 cal BP -> 4439 +- 15 and 10000 -> 8872 +- 21 [published] behave the same way.
    for (const [year, age, error] of [
      [5000, 4439, 15],
      [10000, 8872, 21],
    ]) {
      const spot = calibrateRadiocarbon({ c14Age: age, c14Error: error, curve: intcal20 });
      expect(spot.hpd95.some((r) => r.youngerCalBp <= year && year <= r.olderCalBp)).toBe(true);
    }
  });

  it('on Marine20, Delta-R d is the same as shifting the age by -d (identical densities) [analytic]', () => {
    // 30^2 + 40^2 = 50^2 exactly, so both calls see the same combined variance bit for bit.
    const withDeltaR = calibrateRadiocarbon({ c14Age: 5000, c14Error: 30, curve: marine20, deltaR: 150, deltaRError: 40 });
    const shifted = calibrateRadiocarbon({ c14Age: 4850, c14Error: 50, curve: marine20, deltaR: 0, deltaRError: 0 });
    expect(withDeltaR.density.startCalBp).toBe(shifted.density.startCalBp);
    expect(Array.from(withDeltaR.density.probabilities)).toEqual(Array.from(shifted.density.probabilities));
    expect(withDeltaR.hpd95).toEqual(shifted.hpd95);
    // A positive Delta-R makes the same measured age younger in calendar years.
    const noOffset = calibrateRadiocarbon({ c14Age: 5000, c14Error: 50, curve: marine20, deltaR: 0, deltaRError: 0 });
    expect(withDeltaR.medianCalBp).toBeLessThan(noOffset.medianCalBp - 100);
  });

  it("keeps Marine20's tabulated year inside the ranges of its own value (reference-data/SOURCES.md)", () => {
    // 1000 cal BP -> 1620.53 +- 59.97 [published].
    const result = calibrateRadiocarbon({ c14Age: 1620.53, c14Error: 20, curve: marine20, deltaR: 0, deltaRError: 0 });
    expect(result.hpd68.some((r) => r.youngerCalBp <= 1000 && 1000 <= r.olderCalBp)).toBe(true);
  });

  describe('warnings', () => {
    it('warns on Marine20 above 60 degrees latitude, north or south (Heaton et al. 2020; 60 degrees [common practice])', () => {
      const at = (latitude: number) =>
        calibrateRadiocarbon({ c14Age: 5000, c14Error: 30, curve: marine20, deltaR: 100, deltaRError: 50, latitude })
          .warnings;
      expect(at(72)).toEqual([expect.stringMatching(/^Marine20 is not meant for polar waters \(latitude above 60 degrees\)/)]);
      expect(at(-65)).toHaveLength(1);
      expect(at(60)).toEqual([]);
      expect(at(45)).toEqual([]);
    });

    it('does not warn about latitude on a terrestrial curve', () => {
      expect(calibrateRadiocarbon({ c14Age: 5000, c14Error: 30, curve: intcal20, latitude: 78 }).warnings).toEqual([]);
    });

    it('warns when the 95.4 % range reaches the young or the old end of the curve', () => {
      const young = calibrateRadiocarbon({ c14Age: 200, c14Error: 20, curve: intcal20 });
      expect(young.hpd95.at(-1)?.youngerCalBp).toBe(0);
      expect(young.warnings).toEqual([expect.stringMatching(/reaches 0 cal BP, the young end of IntCal20/)]);
      const old = calibrateRadiocarbon({ c14Age: 50_100, c14Error: 300, curve: intcal20 });
      expect(old.hpd95[0].olderCalBp).toBe(55_000);
      expect(old.warnings).toEqual([expect.stringMatching(/reaches 55,000 cal BP, the old end of IntCal20/)]);
      expect(calibrateRadiocarbon({ c14Age: 3000, c14Error: 30, curve: intcal20 }).warnings).toEqual([]);
    });
  });

  describe('input errors', () => {
    it('refuses an error that is zero, negative or not a number (field c14Error)', () => {
      for (const c14Error of [0, -5, Number.NaN, Infinity]) {
        expectInputError(() => calibrateRadiocarbon({ c14Age: 3000, c14Error, curve: intcal20 }), 'c14Error');
      }
    });

    it('refuses an age that is not a finite number (field c14Age)', () => {
      for (const c14Age of [Number.NaN, Infinity, -Infinity]) {
        expectInputError(() => calibrateRadiocarbon({ c14Age, c14Error: 30, curve: intcal20 }), 'c14Age', /finite/);
      }
    });

    it('refuses a negative (post-bomb) age and says what the curve covers', () => {
      expectInputError(
        () => calibrateRadiocarbon({ c14Age: -120, c14Error: 20, curve: intcal20 }),
        'c14Age',
        /post-bomb.*95 to 50,193 14C yr BP over 0 to 55,000 cal BP/,
      );
    });

    it('refuses ages beyond the curve by more than two combined sigmas, in both directions', () => {
      // IntCal20's 14C ages span 95 (sigma 10) to 50,193 (sigma 568) 14C yr BP.
      expect(intcal20.mu.reduce((a, b) => Math.min(a, b))).toBe(95);
      expect(intcal20.mu.reduce((a, b) => Math.max(a, b))).toBe(50_193);
      expectInputError(
        () => calibrateRadiocarbon({ c14Age: 40, c14Error: 10, curve: intcal20 }),
        'c14Age',
        /younger than IntCal20.*95 to 50,193 14C yr BP over 0 to 55,000 cal BP/,
      );
      expectInputError(
        () => calibrateRadiocarbon({ c14Age: 52_000, c14Error: 100, curve: intcal20 }),
        'c14Age',
        /older than IntCal20/,
      );
      // 95 - 2 sqrt(10^2 + 10^2) = 66.7: just inside still calibrates.
      expect(() => calibrateRadiocarbon({ c14Age: 67, c14Error: 10, curve: intcal20 })).not.toThrow();
      expectInputError(() => calibrateRadiocarbon({ c14Age: 66, c14Error: 10, curve: intcal20 }), 'c14Age');
    });

    it('judges a marine age after removing Delta-R', () => {
      // Marine20's youngest 14C age is 602.57; 700 - 400 = 300 is far below it.
      expectInputError(
        () => calibrateRadiocarbon({ c14Age: 700, c14Error: 30, curve: marine20, deltaR: 400, deltaRError: 30 }),
        'c14Age',
        /300 yr BP after Delta-R 400.*younger than Marine20/,
      );
    });

    it('refuses a Delta-R or its error on a terrestrial curve (fields deltaR, deltaRError)', () => {
      expectInputError(() => calibrateRadiocarbon({ c14Age: 3000, c14Error: 30, curve: intcal20, deltaR: 0 }), 'deltaR', /not a marine curve/);
      expectInputError(
        () => calibrateRadiocarbon({ c14Age: 3000, c14Error: 30, curve: intcal20, deltaRError: 20 }),
        'deltaRError',
      );
      expect(() => calibrateRadiocarbon({ c14Age: 3000, c14Error: 30, curve: intcal20, deltaR: null, deltaRError: null })).not.toThrow();
    });

    it('requires Delta-R and a non-negative Delta-R error on a marine curve; an error of 0 is allowed', () => {
      expectInputError(() => calibrateRadiocarbon({ c14Age: 3000, c14Error: 30, curve: marine20 }), 'deltaR', /marine curve/);
      expectInputError(() => calibrateRadiocarbon({ c14Age: 3000, c14Error: 30, curve: marine20, deltaR: 50 }), 'deltaRError');
      expectInputError(
        () => calibrateRadiocarbon({ c14Age: 3000, c14Error: 30, curve: marine20, deltaR: 50, deltaRError: -1 }),
        'deltaRError',
        /negative/,
      );
      expectInputError(
        () => calibrateRadiocarbon({ c14Age: 3000, c14Error: 30, curve: marine20, deltaR: Number.NaN, deltaRError: 10 }),
        'deltaR',
      );
      expect(() => calibrateRadiocarbon({ c14Age: 3000, c14Error: 30, curve: marine20, deltaR: 50, deltaRError: 0 })).not.toThrow();
    });

    it('refuses a latitude outside -90..90', () => {
      expectInputError(
        () => calibrateRadiocarbon({ c14Age: 3000, c14Error: 30, curve: marine20, deltaR: 0, deltaRError: 0, latitude: 95 }),
        'latitude',
      );
    });

    it('refuses an age inside the span that no year of the curve can explain (no mass)', () => {
      // A curve known to a thousandth of a year, mu(t) = t: 1000.5 +- 0.001 lies 350 sigmas from
      // both neighbouring years, so no year has any likelihood.
      const exact = syntheticCurve(0, 2000, (t) => t, () => 0.001);
      expectInputError(() => calibrateRadiocarbon({ c14Age: 1000.5, c14Error: 0.001, curve: exact }), 'c14Age', /matches no calendar year/);
    });
  });
});
