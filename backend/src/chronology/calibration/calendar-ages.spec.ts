import { describe, expect, it } from 'vitest';
import { calBpToYearCe, formatCeBce, totalMass } from '../common/density';
import { CalibrationInputError } from './errors';
import { calendarRange, calibrateLuminescence } from './calendar-ages';

function fieldOf(run: () => unknown): string | undefined {
  try {
    run();
  } catch (error) {
    if (error instanceof CalibrationInputError) return error.field;
    throw error;
  }
  return undefined;
}

describe(calibrateLuminescence.name, () => {
  it('counts the age back from the measurement year: 1075 +- 70 a measured in 2019', () => {
    // [analytic] 1075 - (2019 - 1950) = 1006 cal BP, i.e. 2019 - 1075 = 944 CE, sd 70.
    // CHECKS.md quotes the published OSL table as 945 +- 70 CE [published]: one year from the
    // arithmetic, which is the table's rounding or reference year, not a different convention.
    const result = calibrateLuminescence({ ageYears: 1075, errorYears: 70, measurementYear: 2019, latestMeasurementYear: 2026 });
    expect(result.meanCalBp).toBeCloseTo(1006, 6);
    expect(result.medianCalBp).toBeCloseTo(1006, 6);
    expect(formatCeBce(calBpToYearCe(result.meanCalBp))).toBe('944 CE');
    expect(Math.abs(calBpToYearCe(result.meanCalBp) - 945)).toBeLessThanOrEqual(1);
    expect(result.sdYears).toBeCloseTo(70, 0);
    expect(totalMass(result.density)).toBeCloseTo(1, 12);
    expect(result.warnings).toEqual([]);
  });

  it('differs from counting back from 1950 by exactly the years since 1950 [analytic]', () => {
    const in1950 = calibrateLuminescence({ ageYears: 3000, errorYears: 200, measurementYear: 1950, latestMeasurementYear: 2026 });
    const in2010 = calibrateLuminescence({ ageYears: 3000, errorYears: 200, measurementYear: 2010, latestMeasurementYear: 2026 });
    expect(in1950.meanCalBp - in2010.meanCalBp).toBeCloseTo(60, 6);
  });

  it('gives 68.3 % and 95.4 % ranges of about +-1 and +-2 sigma [analytic]', () => {
    const result = calibrateLuminescence({ ageYears: 5069, errorYears: 100, measurementYear: 2019, latestMeasurementYear: 2026 });
    // mean 5069 - 69 = 5000 cal BP.
    expect(result.hpd68).toHaveLength(1);
    expect(Math.abs(result.hpd68[0].youngerCalBp - 4900)).toBeLessThanOrEqual(1);
    expect(Math.abs(result.hpd68[0].olderCalBp - 5100)).toBeLessThanOrEqual(1);
    expect(Math.abs(result.hpd95[0].youngerCalBp - 4800)).toBeLessThanOrEqual(1);
    expect(Math.abs(result.hpd95[0].olderCalBp - 5200)).toBeLessThanOrEqual(1);
  });

  it('refuses a non-positive age, a non-positive error and a measurement year outside 1950..latest', () => {
    const base = { ageYears: 1075, errorYears: 70, measurementYear: 2019, latestMeasurementYear: 2026 };
    expect(fieldOf(() => calibrateLuminescence({ ...base, ageYears: 0 }))).toBe('ageYears');
    expect(fieldOf(() => calibrateLuminescence({ ...base, ageYears: Number.NaN }))).toBe('ageYears');
    expect(fieldOf(() => calibrateLuminescence({ ...base, errorYears: 0 }))).toBe('errorYears');
    expect(fieldOf(() => calibrateLuminescence({ ...base, errorYears: -3 }))).toBe('errorYears');
    expect(fieldOf(() => calibrateLuminescence({ ...base, measurementYear: 1949 }))).toBe('measurementYear');
    expect(fieldOf(() => calibrateLuminescence({ ...base, measurementYear: 2027 }))).toBe('measurementYear');
    expect(fieldOf(() => calibrateLuminescence({ ...base, measurementYear: 2026 }))).toBeUndefined();
  });

  it('by default accepts next year by the clock and refuses the year after', () => {
    const next = new Date().getUTCFullYear() + 1;
    expect(fieldOf(() => calibrateLuminescence({ ageYears: 500, errorYears: 30, measurementYear: next }))).toBeUndefined();
    expect(fieldOf(() => calibrateLuminescence({ ageYears: 500, errorYears: 30, measurementYear: next + 1 }))).toBe(
      'measurementYear',
    );
  });
});

describe(calendarRange.name, () => {
  it('is uniform over the whole years of the range, inclusive [analytic]', () => {
    // 1700 CE +- 0 is 250 cal BP; a tie to 1690-1710 CE is 240-260 cal BP: 21 years.
    const result = calendarRange({ youngerCalBp: 240, olderCalBp: 260 });
    expect(result.density.startCalBp).toBe(240);
    expect(result.density.probabilities).toHaveLength(21);
    for (const p of result.density.probabilities) expect(p).toBeCloseTo(1 / 21, 12);
    expect(result.meanCalBp).toBeCloseTo(250, 9);
    // The sd of a discrete uniform on n = 21 points is sqrt((n^2 - 1) / 12) [analytic].
    expect(result.sdYears).toBeCloseTo(Math.sqrt((21 * 21 - 1) / 12), 9);
    expect(result.hpd95.reduce((sum, r) => sum + r.probability, 0)).toBeGreaterThanOrEqual(0.9545);
  });

  it('allows a single exactly known year', () => {
    const result = calendarRange({ youngerCalBp: 250, olderCalBp: 250 });
    expect(Array.from(result.density.probabilities)).toEqual([1]);
    expect(result.hpd68).toEqual([{ youngerCalBp: 250, olderCalBp: 250, probability: 1 }]);
  });

  it('refuses an older end younger than the younger end, and non-finite ends', () => {
    expect(fieldOf(() => calendarRange({ youngerCalBp: 300, olderCalBp: 200 }))).toBe('olderCalBp');
    expect(fieldOf(() => calendarRange({ youngerCalBp: Number.NaN, olderCalBp: 200 }))).toBe('youngerCalBp');
    expect(fieldOf(() => calendarRange({ youngerCalBp: 100, olderCalBp: Infinity }))).toBe('olderCalBp');
  });
});
