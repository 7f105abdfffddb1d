import { describe, expect, it } from 'vitest';
import { builtInCurve } from '../../reference-data/reference-data';
import { MAX_AGE_ERROR_YEARS, MAX_CALENDAR_GRID_YEARS } from './bounds';
import { calibrateRadiocarbon } from './calibrate';
import { calendarRange, calibrateLuminescence } from './calendar-ages';
import { CalibrationInputError } from './errors';
import { calibrationForSample } from './sample-calibration';

const intcal = builtInCurve('INTCAL20');
const lookup = () => intcal;

function fieldOf(run: () => unknown): string | undefined {
  try {
    run();
  } catch (error) {
    if (error instanceof CalibrationInputError) return error.field;
    throw error;
  }
  return undefined;
}

describe('calibration bounds (issue 17: a 1e6-year error grew memory without limit)', () => {
  it('refuses a 14C or Delta-R error above 20,000 years, naming the field', () => {
    expect(fieldOf(() => calibrateRadiocarbon({ c14Age: 3000, c14Error: 1_000_000, curve: intcal }))).toBe('c14Error');
    expect(fieldOf(() => calibrateRadiocarbon({ c14Age: 3000, c14Error: MAX_AGE_ERROR_YEARS + 1, curve: intcal }))).toBe('c14Error');
    const marine = builtInCurve('MARINE20');
    expect(fieldOf(() => calibrateRadiocarbon({ c14Age: 3000, c14Error: 30, curve: marine, deltaR: 0, deltaRError: 30_000 }))).toBe('deltaRError');
  });

  it('calibrates the widest accepted 14C error on a grid no wider than the curve', () => {
    const result = calibrateRadiocarbon({ c14Age: 3000, c14Error: MAX_AGE_ERROR_YEARS, curve: intcal });
    expect(result.density.probabilities.length).toBeLessThanOrEqual(MAX_CALENDAR_GRID_YEARS);
  });

  it('refuses a luminescence error whose +-6 sd grid is wider than IntCal20, and accepts one that fits', () => {
    expect(() => calibrateLuminescence({ ageYears: 5000, errorYears: 1_000_000, measurementYear: 2020 })).toThrow(/beyond the largest accepted, 20,000 years/);
    expect(fieldOf(() => calibrateLuminescence({ ageYears: 50_000, errorYears: 5_000, measurementYear: 2020 }))).toBe('errorYears');
    const fits = calibrateLuminescence({ ageYears: 50_000, errorYears: 4_500, measurementYear: 2020 });
    expect(fits.density.probabilities.length).toBeLessThanOrEqual(MAX_CALENDAR_GRID_YEARS);
  });

  it('refuses a calendar range wider than IntCal20 and names the sample field', () => {
    expect(fieldOf(() => calendarRange({ youngerCalBp: 0, olderCalBp: 60_000 }))).toBe('olderCalBp');
    expect(fieldOf(() => calibrationForSample({ method: 'HISTORICAL', calendarAgeBp: 30_000, calendarErrorYears: 30_000 }, lookup))).toBe('calendarErrorYears');
    expect(fieldOf(() => calibrationForSample({ method: 'LUMINESCENCE', calendarAgeBp: 5000, calendarErrorYears: 1e5, measurementYear: 2020 }, lookup, { latestMeasurementYear: 2026 }))).toBe('calendarErrorYears');
    expect(fieldOf(() => calibrationForSample({ method: 'TEPHRA', calendarAgeBp: 7_000, calendarErrorYears: 50 }, lookup))).toBeUndefined();
  });
});
