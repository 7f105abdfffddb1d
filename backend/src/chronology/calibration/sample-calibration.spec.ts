import { describe, expect, it } from 'vitest';
import { builtInCurve, isBuiltInCurve } from '../../reference-data/reference-data';
import { CalibrationInputError } from './errors';
import { calibrateRadiocarbon } from './calibrate';
import { calibrateLuminescence, calendarRange } from './calendar-ages';
import { CurveLookup, SampleDating, calibrationForSample } from './sample-calibration';

const builtInOnly: CurveLookup = (code) => (isBuiltInCurve(code) ? builtInCurve(code) : undefined);
const options = { latestMeasurementYear: 2026 };

function errorOf(sample: SampleDating): CalibrationInputError {
  try {
    calibrationForSample(sample, builtInOnly, options);
  } catch (error) {
    if (error instanceof CalibrationInputError) return error;
    throw error;
  }
  throw new Error('expected a CalibrationInputError');
}

describe(calibrationForSample.name, () => {
  describe('RADIOCARBON', () => {
    it('calibrates on the curve the sample names, passing Delta-R and latitude through', () => {
      const sample: SampleDating = {
        method: 'RADIOCARBON',
        c14Age: 4200,
        c14Error: 35,
        curve: 'MARINE20',
        deltaR: 120,
        deltaRError: 45,
        latitude: 66,
      };
      const direct = calibrateRadiocarbon({
        c14Age: 4200,
        c14Error: 35,
        curve: builtInCurve('MARINE20'),
        deltaR: 120,
        deltaRError: 45,
        latitude: 66,
      });
      expect(calibrationForSample(sample, builtInOnly)).toEqual(direct);
      expect(direct.warnings[0]).toMatch(/polar waters/);
    });

    it('says a curve that is not installed can be installed by an operator (field curve)', () => {
      const error = errorOf({ method: 'RADIOCARBON', c14Age: 1500, c14Error: 30, curve: 'SHCAL20' });
      expect(error.field).toBe('curve');
      expect(error.message).toBe('curve SHCAL20 is not installed; an operator of the server can install it from its published file.');
    });

    it('names the missing field', () => {
      expect(errorOf({ method: 'RADIOCARBON', c14Error: 30, curve: 'INTCAL20' }).field).toBe('c14Age');
      expect(errorOf({ method: 'RADIOCARBON', c14Age: 1500, curve: 'INTCAL20' }).field).toBe('c14Error');
      expect(errorOf({ method: 'RADIOCARBON', c14Age: 1500, c14Error: 30, curve: ' ' }).field).toBe('curve');
      expect(errorOf({ method: 'RADIOCARBON', c14Age: 1500, c14Error: 30, curve: 'MARINE20', deltaR: 0 }).field).toBe(
        'deltaRError',
      );
    });
  });

  describe('LUMINESCENCE', () => {
    it('reads the age before measurement from calendarAgeBp and its sigma from calendarErrorYears', () => {
      const result = calibrationForSample(
        { method: 'LUMINESCENCE', calendarAgeBp: 1075, calendarErrorYears: 70, measurementYear: 2019 },
        builtInOnly,
        options,
      );
      expect(result).toEqual(calibrateLuminescence({ ageYears: 1075, errorYears: 70, measurementYear: 2019, ...options }));
      expect(result.meanCalBp).toBeCloseTo(1006, 6); // 1075 - (2019 - 1950) [analytic]
    });

    it("reports errors under the sample's field names", () => {
      expect(errorOf({ method: 'LUMINESCENCE', calendarAgeBp: 1075, calendarErrorYears: 0, measurementYear: 2019 }).field).toBe(
        'calendarErrorYears',
      );
      expect(errorOf({ method: 'LUMINESCENCE', calendarAgeBp: -5, calendarErrorYears: 10, measurementYear: 2019 }).field).toBe(
        'calendarAgeBp',
      );
      expect(errorOf({ method: 'LUMINESCENCE', calendarAgeBp: 1075, calendarErrorYears: 70 }).field).toBe('measurementYear');
      expect(
        errorOf({ method: 'LUMINESCENCE', calendarAgeBp: 1075, calendarErrorYears: 70, measurementYear: 1900 }).field,
      ).toBe('measurementYear');
    });
  });

  describe('HISTORICAL and TEPHRA', () => {
    it('turns centre and half-width into a uniform range', () => {
      const result = calibrationForSample(
        { method: 'HISTORICAL', calendarAgeBp: 250, calendarErrorYears: 10 },
        builtInOnly,
        options,
      );
      expect(result).toEqual(calendarRange({ youngerCalBp: 240, olderCalBp: 260 }));
    });

    it('uses an explicit range when one is given', () => {
      const result = calibrationForSample(
        { method: 'TEPHRA', calendarRange: { youngerCalBp: 7600, olderCalBp: 7700 }, calendarAgeBp: 1, calendarErrorYears: 1 },
        builtInOnly,
        options,
      );
      expect(result.density.startCalBp).toBe(7600);
      expect(result.density.probabilities).toHaveLength(101);
    });

    it('refuses a negative half-width and a reversed explicit range', () => {
      expect(errorOf({ method: 'TEPHRA', calendarAgeBp: 7650, calendarErrorYears: -1 }).field).toBe('calendarErrorYears');
      expect(errorOf({ method: 'HISTORICAL', calendarErrorYears: 5 }).field).toBe('calendarAgeBp');
      expect(
        errorOf({ method: 'HISTORICAL', calendarRange: { youngerCalBp: 300, olderCalBp: 200 } }).field,
      ).toBe('calendarRange');
    });
  });
});
