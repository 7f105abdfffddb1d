/**
 * One entry point from a stored dating to its calendar age, whatever the method, so services and
 * the CSV import preview validate and compute a sample the same way. Errors name the sample's own
 * fields.
 */
import { CalibrationResult, calibrateRadiocarbon } from './calibrate';
import { CalendarRangeInput, calendarRange, calibrateLuminescence } from './calendar-ages';
import { CalibrationCurve } from './curve';
import { requireBoundedError } from './bounds';
import { CalibrationInputError, withFieldNames } from './errors';

export type DatingMethod = 'RADIOCARBON' | 'LUMINESCENCE' | 'HISTORICAL' | 'TEPHRA';

/** The dating fields of a sample, as plain data (an API row, an import line). */
export interface SampleDating {
  readonly method: DatingMethod;
  /** RADIOCARBON: conventional 14C age, 14C yr BP, and its 1-sigma. */
  readonly c14Age?: number | null;
  readonly c14Error?: number | null;
  /** RADIOCARBON: code of the calibration curve (`INTCAL20`, `MARINE20`, an installed curve). */
  readonly curve?: string | null;
  /** RADIOCARBON on a marine curve: local reservoir offset and its 1-sigma, 14C yr. */
  readonly deltaR?: number | null;
  readonly deltaRError?: number | null;
  /** Sampling latitude, degrees; only used to warn about Marine20 in polar waters. */
  readonly latitude?: number | null;
  /**
   * LUMINESCENCE: the age in years before `measurementYear`.
   * HISTORICAL / TEPHRA: the centre of the calendar range, cal BP.
   */
  readonly calendarAgeBp?: number | null;
  /** LUMINESCENCE: 1-sigma of the age, years. HISTORICAL / TEPHRA: half-width of the range, years. */
  readonly calendarErrorYears?: number | null;
  /** LUMINESCENCE: calendar year (CE) of measurement. */
  readonly measurementYear?: number | null;
  /** HISTORICAL / TEPHRA: an explicit range; when given it is used instead of centre and half-width. */
  readonly calendarRange?: CalendarRangeInput | null;
}

/** Finds an installed curve by code; undefined when none is installed under that code. */
export type CurveLookup = (code: string) => CalibrationCurve | undefined;

export interface SampleCalibrationOptions {
  /** Passed to calibrateLuminescence (tests fix it; the default follows the clock). */
  readonly latestMeasurementYear?: number;
}

function required(value: number | null | undefined, field: string, message: string): number {
  if (value === null || value === undefined) throw new CalibrationInputError(field, message);
  return value;
}

/**
 * The calendar age of one dated sample: a calibrated 14C age, a luminescence age placed on the
 * cal BP scale, or a uniform historical or tephra range. Throws CalibrationInputError whose
 * `field` is the sample field at fault (`curve` for a curve code that is not installed).
 */
export function calibrationForSample(
  sample: SampleDating,
  curves: CurveLookup,
  options: SampleCalibrationOptions = {},
): CalibrationResult {
  switch (sample.method) {
    case 'RADIOCARBON': {
      const c14Age = required(sample.c14Age, 'c14Age', 'A radiocarbon sample needs its conventional 14C age (14C yr BP).');
      const c14Error = required(sample.c14Error, 'c14Error', 'A radiocarbon sample needs the 1-sigma error of its 14C age.');
      const code = sample.curve?.trim();
      if (!code) throw new CalibrationInputError('curve', 'Choose the calibration curve for this radiocarbon sample.');
      const curve = curves(code);
      if (!curve) {
        throw new CalibrationInputError(
          'curve',
          `curve ${code} is not installed; an operator of the server can install it from its published file.`,
        );
      }
      return calibrateRadiocarbon({
        c14Age,
        c14Error,
        curve,
        deltaR: sample.deltaR,
        deltaRError: sample.deltaRError,
        latitude: sample.latitude,
      });
    }
    case 'LUMINESCENCE': {
      const ageYears = required(
        sample.calendarAgeBp,
        'calendarAgeBp',
        'A luminescence sample needs its age in years before the measurement year.',
      );
      const errorYears = required(
        sample.calendarErrorYears,
        'calendarErrorYears',
        'A luminescence sample needs the 1-sigma error of its age in years.',
      );
      const measurementYear = required(
        sample.measurementYear,
        'measurementYear',
        'A luminescence sample needs the year it was measured: its age counts back from that year, not from 1950.',
      );
      return withFieldNames({ ageYears: 'calendarAgeBp', errorYears: 'calendarErrorYears' }, () =>
        calibrateLuminescence({
          ageYears,
          errorYears,
          measurementYear,
          latestMeasurementYear: options.latestMeasurementYear,
        }),
      );
    }
    case 'HISTORICAL':
    case 'TEPHRA': {
      if (sample.calendarRange) {
        const range = sample.calendarRange;
        return withFieldNames({ youngerCalBp: 'calendarRange', olderCalBp: 'calendarRange' }, () =>
          calendarRange(range),
        );
      }
      const what = sample.method === 'HISTORICAL' ? 'A historical tie' : 'A tephra tie';
      const centre = required(sample.calendarAgeBp, 'calendarAgeBp', `${what} needs its calendar age (cal BP).`);
      const halfWidth = required(
        sample.calendarErrorYears,
        'calendarErrorYears',
        `${what} needs the half-width of its calendar range in years (0 for an exactly known year).`,
      );
      if (!Number.isFinite(centre)) {
        throw new CalibrationInputError('calendarAgeBp', `The calendar age must be a number (cal BP); got ${centre}.`);
      }
      if (!Number.isFinite(halfWidth) || halfWidth < 0) {
        throw new CalibrationInputError(
          'calendarErrorYears',
          `The half-width of the calendar range must be zero or a positive number of years; got ${halfWidth}.`,
        );
      }
      requireBoundedError('calendarErrorYears', halfWidth, 'A half-width');
      return withFieldNames({ youngerCalBp: 'calendarAgeBp', olderCalBp: 'calendarErrorYears' }, () =>
        calendarRange({ youngerCalBp: centre - halfWidth, olderCalBp: centre + halfWidth }),
      );
    }
    default: {
      const unknown: never = sample.method;
      throw new CalibrationInputError('method', `Unknown dating method ${String(unknown)}.`);
    }
  }
}
