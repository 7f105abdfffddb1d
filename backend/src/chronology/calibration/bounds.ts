/**
 * Bounds on the uncertainties and ranges the calibration engine accepts, so that one request,
 * one stored sample or one imported row costs a bounded amount of memory and time: a calendar
 * density lives on a 1-year grid, and every read of a sample recomputes it.
 *
 * - An age error (a 14C 1-sigma, a Delta-R 1-sigma, a luminescence 1-sigma, the half-width of a
 *   calendar range) of at most 20,000 years: far beyond any usable dating in paleoseismology,
 *   where 1-sigmas are tens to a few thousand years [common practice].
 * - A calendar grid never wider than the widest built-in curve: IntCal20 tabulates 0-55,000 cal BP
 *   (Reimer et al. 2020, Radiocarbon 62(4):725-757), so a calibrated 14C age already fits; a
 *   normal calendar density spans mean +- 6 sd (`normalDensity`), which caps a luminescence
 *   1-sigma at (55,001 - 1) / 12, about 4,583 years.
 */
import { CalibrationInputError, formatYears } from './errors';

/** Largest age error accepted anywhere, years (or 14C years). */
export const MAX_AGE_ERROR_YEARS = 20_000;

/** Widest calendar grid of one density, years: the span of IntCal20, 0-55,000 cal BP inclusive. */
export const MAX_CALENDAR_GRID_YEARS = 55_001;

/** Largest magnitude of an age or a Delta-R, years: beyond any curve and any luminescence range used here. */
export const MAX_AGE_YEARS = 1_000_000;

/** Refuse an error above MAX_AGE_ERROR_YEARS, naming the field. */
export function requireBoundedError(field: string, value: number, what: string): void {
  if (value > MAX_AGE_ERROR_YEARS) {
    throw new CalibrationInputError(
      field,
      `${what} of ${formatYears(value)} years is beyond the largest accepted, ${formatYears(MAX_AGE_ERROR_YEARS)} years.`,
    );
  }
}

/** Refuse an age or offset whose magnitude is above MAX_AGE_YEARS, naming the field. */
export function requireBoundedAge(field: string, value: number, what: string): void {
  if (Math.abs(value) > MAX_AGE_YEARS) {
    throw new CalibrationInputError(
      field,
      `${what} of ${formatYears(value)} years is beyond the largest accepted, ${formatYears(MAX_AGE_YEARS)} years.`,
    );
  }
}

/** Refuse a calendar grid of `years` wider than MAX_CALENDAR_GRID_YEARS, naming the field at fault. */
export function requireGridWidth(field: string, years: number, what: string): void {
  if (years > MAX_CALENDAR_GRID_YEARS) {
    throw new CalibrationInputError(
      field,
      `${what} would span ${formatYears(years)} years on the calendar grid; the widest accepted is ` +
        `${formatYears(MAX_CALENDAR_GRID_YEARS)} years (the span of IntCal20).`,
    );
  }
}
