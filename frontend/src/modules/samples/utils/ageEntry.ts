/**
 * Ages entered in the units a lab or a history reports, turned into what a sample stores: a
 * conventional radiocarbon age from a fraction modern (F14C), and cal BP from a calendar year.
 */
import { BP_ZERO_YEAR_CE } from '@/modules/ages/utils/formatAge';

/** The Libby mean-life, years: 5568 / ln 2 (Stuiver & Polach 1977). */
export const LIBBY_MEAN_LIFE = 8033;

export type RadiocarbonFromF14C = { ok: true; c14Age: number; c14Error: number } | { ok: false; field: 'f14c' | 'f14cError'; message: string };

/**
 * A conventional radiocarbon age from F14C: CRA = -8033 ln F, with its error carried to first
 * order, sigma_CRA = 8033 sigma_F / F (Stuiver & Polach 1977; F14C as defined by Reimer, Brown &
 * Reimer 2004). F above 1 is carbon fixed after 1950 (bomb carbon): it has no conventional age
 * and the curves served here end at 1950, so it is refused with that reason, not calibrated.
 * Ages are rounded to whole years, as labs report them [common practice].
 */
export function radiocarbonFromF14C(f14c: number, f14cError: number): RadiocarbonFromF14C {
  if (!Number.isFinite(f14c) || f14c <= 0) return { ok: false, field: 'f14c', message: 'F14C must be above 0' };
  if (f14c > 1) {
    return {
      ok: false,
      field: 'f14c',
      message: 'F14C above 1 is post-bomb carbon (fixed after 1950): it has no conventional age and cannot be calibrated on the installed curves',
    };
  }
  if (!Number.isFinite(f14cError) || f14cError <= 0) return { ok: false, field: 'f14cError', message: 'the error must be above 0' };
  if (f14cError >= f14c) return { ok: false, field: 'f14cError', message: 'the error must be smaller than F14C itself' };
  const c14Age = Math.round(-LIBBY_MEAN_LIFE * Math.log(f14c));
  const c14Error = Math.max(1, Math.round((LIBBY_MEAN_LIFE * f14cError) / f14c));
  return { ok: true, c14Age, c14Error };
}

/** How a calendar age is typed: cal BP, or a historical year CE or BCE. */
export type CalendarEntry = 'CAL_BP' | 'CE' | 'BCE';

/**
 * cal BP of a historical year: 1950 - year for CE; for BCE the count has no year 0, so
 * 1 BCE is astronomical year 0 and its cal BP is 1950 + year - 1.
 */
export function calBpFromYear(year: number, era: 'CE' | 'BCE'): number {
  return era === 'CE' ? BP_ZERO_YEAR_CE - year : BP_ZERO_YEAR_CE + year - 1;
}

/** The year and era of a cal BP age, for showing a stored age in the entry the user chose. */
export function yearFromCalBp(calBp: number): { year: number; era: 'CE' | 'BCE' } {
  const astronomical = BP_ZERO_YEAR_CE - calBp;
  return astronomical >= 1 ? { year: astronomical, era: 'CE' } : { year: 1 - astronomical, era: 'BCE' };
}
