/**
 * Calendar ages that need no curve: luminescence ages and historical or tephra ties, expressed as
 * the same CalibrationResult as a calibrated 14C age so every later step treats them alike.
 */
import { normalDensity, uniformDensity } from '../common/density';
import { CalibrationResult, calibrationResult } from './calibrate';
import { requireBoundedAge, requireBoundedError, requireGridWidth } from './bounds';
import { CalibrationInputError, formatYears } from './errors';

/** Year zero of the cal BP scale (AD 1950). */
const CAL_BP_ZERO_YEAR = 1950;

export interface LuminescenceInput {
  /** Luminescence age in years before the year of measurement (not before 1950). */
  readonly ageYears: number;
  /** Its 1-sigma, years. */
  readonly errorYears: number;
  /** Calendar year (CE) the sample was measured, to which the age refers. */
  readonly measurementYear: number;
  /**
   * The latest measurement year accepted; defaults to next year by the server's clock (a lab report
   * dated early next year by another time zone is still valid). Tests pass a fixed year.
   */
  readonly latestMeasurementYear?: number;
}

/**
 * A luminescence (OSL, TL, IRSL) age as a normal calendar density. Luminescence ages count back
 * from the year of measurement, not from 1950 (the reporting convention of luminescence
 * laboratories [common practice]), so mean cal BP = ageYears - (measurementYear - 1950) and the
 * density is normal with sd = errorYears.
 *
 * The measurement year must lie between 1950, the origin of cal BP and earlier than any
 * luminescence laboratory, and `latestMeasurementYear`; the age and its error must be positive.
 */
export function calibrateLuminescence(input: LuminescenceInput): CalibrationResult {
  const { ageYears, errorYears, measurementYear } = input;
  const latest = input.latestMeasurementYear ?? new Date().getUTCFullYear() + 1;
  if (typeof ageYears !== 'number' || !Number.isFinite(ageYears) || !(ageYears > 0)) {
    throw new CalibrationInputError(
      'ageYears',
      `The luminescence age must be a positive number of years before measurement; got ${String(ageYears)}.`,
    );
  }
  if (typeof errorYears !== 'number' || !Number.isFinite(errorYears) || !(errorYears > 0)) {
    throw new CalibrationInputError(
      'errorYears',
      `The luminescence age error must be a positive 1-sigma in years; got ${String(errorYears)}.`,
    );
  }
  if (
    typeof measurementYear !== 'number' ||
    !Number.isFinite(measurementYear) ||
    measurementYear < CAL_BP_ZERO_YEAR ||
    measurementYear > latest
  ) {
    throw new CalibrationInputError(
      'measurementYear',
      `The measurement year must be a calendar year from ${CAL_BP_ZERO_YEAR} to ${latest}; got ${String(measurementYear)}. ` +
        'Luminescence ages count back from the year the sample was measured, so it is needed to place the age.',
    );
  }
  requireBoundedAge('ageYears', ageYears, 'A luminescence age');
  requireBoundedError('errorYears', errorYears, 'A luminescence age error');
  // normalDensity spans mean +- 6 sd on the 1-year grid.
  requireGridWidth('errorYears', Math.ceil(12 * errorYears) + 1, `A luminescence age with a 1-sigma of ${formatYears(errorYears)} years`);
  const meanCalBp = ageYears - (measurementYear - CAL_BP_ZERO_YEAR);
  return calibrationResult(normalDensity(meanCalBp, errorYears));
}

export interface CalendarRangeInput {
  /** Youngest calendar age of the tie, cal BP. */
  readonly youngerCalBp: number;
  /** Oldest calendar age of the tie, cal BP; at least `youngerCalBp`. */
  readonly olderCalBp: number;
}

/**
 * A historical or tephra tie as a uniform density over whole years youngerCalBp..olderCalBp
 * (inclusive, rounded to whole years): the record says the event lies in the range and nothing
 * more. Note that HPD ranges of a flat density are not unique; the shared rule keeps younger years
 * first, so a 95.4 % range of a tie leaves out its oldest years.
 */
export function calendarRange(input: CalendarRangeInput): CalibrationResult {
  const { youngerCalBp, olderCalBp } = input;
  if (typeof youngerCalBp !== 'number' || !Number.isFinite(youngerCalBp)) {
    throw new CalibrationInputError(
      'youngerCalBp',
      `The younger end of the calendar range must be a number (cal BP); got ${String(youngerCalBp)}.`,
    );
  }
  if (typeof olderCalBp !== 'number' || !Number.isFinite(olderCalBp)) {
    throw new CalibrationInputError(
      'olderCalBp',
      `The older end of the calendar range must be a number (cal BP); got ${String(olderCalBp)}.`,
    );
  }
  if (Math.round(olderCalBp) < Math.round(youngerCalBp)) {
    throw new CalibrationInputError(
      'olderCalBp',
      `The older end (${formatYears(olderCalBp)} cal BP) is younger than the younger end ` +
        `(${formatYears(youngerCalBp)} cal BP); cal BP counts back from 1950, so the older end is the larger number.`,
    );
  }
  requireBoundedAge('youngerCalBp', youngerCalBp, 'The younger end of a calendar range');
  requireBoundedAge('olderCalBp', olderCalBp, 'The older end of a calendar range');
  requireGridWidth('olderCalBp', Math.round(olderCalBp) - Math.round(youngerCalBp) + 1, 'The calendar range');
  return calibrationResult(uniformDensity(youngerCalBp, olderCalBp));
}
