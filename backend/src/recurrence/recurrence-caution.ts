/**
 * The notice every recurrence figure carries (SPEC, "Cautions the product shows"), on the result
 * page and in every export. Written without commas or quotes so it is also a plain CSV line.
 */
export const RECURRENCE_CAUTION =
  'CAUTION: These recurrence intervals and conditional probabilities are research results that carry large uncertainties. ' +
  'They are not an official seismic hazard assessment and not a basis for design. ' +
  'Defer to the national seismic hazard model and the applicable building code and consult licensed professionals.';
