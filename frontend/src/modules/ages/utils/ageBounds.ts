/**
 * The largest age error the server accepts, years (or 14C years): a 14C 1-sigma, a Delta-R
 * 1-sigma, a luminescence 1-sigma or a calendar range's half-width. The server's bound
 * (backend chronology/calibration/bounds.ts) keeps every density's grid within a calibration
 * curve's span; the forms say so before a request is sent.
 */
export const MAX_AGE_ERROR_YEARS = 20_000;
