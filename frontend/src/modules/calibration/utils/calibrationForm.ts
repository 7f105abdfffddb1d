import type { CalibrateInput, CurveCode } from '@/gql/graphql';
import { MAX_AGE_ERROR_YEARS } from '@/modules/ages/utils/ageBounds';
import { FieldReader, type FormResult } from '@/modules/ui/utils/formFields';

export type CalibrationFormValues = {
  c14Age: string;
  c14Error: string;
  curve: CurveCode;
  deltaR: string;
  deltaRError: string;
  latitude: string;
};

export type CalibrationFormField = keyof CalibrationFormValues;

export const CALIBRATION_FORM_FIELDS: readonly CalibrationFormField[] = ['c14Age', 'c14Error', 'curve', 'deltaR', 'deltaRError', 'latitude'];

const CURVES: readonly CurveCode[] = ['INTCAL20', 'MARINE20', 'SHCAL20'];

/** Search parameter names of the calibration view, so a calibration can be linked to. */
const PARAMS = { c14Age: 'age', c14Error: 'error', curve: 'curve', deltaR: 'dr', deltaRError: 'drError', latitude: 'lat' } as const;

/** The form as the URL describes it (blank fields where it says nothing). */
export function calibrationFormFromSearch(search: URLSearchParams): CalibrationFormValues {
  const curve = CURVES.find((code) => code === search.get(PARAMS.curve)) ?? 'INTCAL20';
  return {
    c14Age: search.get(PARAMS.c14Age) ?? '',
    c14Error: search.get(PARAMS.c14Error) ?? '',
    curve,
    deltaR: search.get(PARAMS.deltaR) ?? '',
    deltaRError: search.get(PARAMS.deltaRError) ?? '',
    latitude: search.get(PARAMS.latitude) ?? '',
  };
}

/** The URL search of a calibration input; marine fields only for a marine curve. */
export function calibrationSearchFrom(input: CalibrateInput): URLSearchParams {
  const search = new URLSearchParams({ [PARAMS.c14Age]: String(input.c14Age), [PARAMS.c14Error]: String(input.c14Error), [PARAMS.curve]: input.curve });
  if (input.deltaR != null) search.set(PARAMS.deltaR, String(input.deltaR));
  if (input.deltaRError != null) search.set(PARAMS.deltaRError, String(input.deltaRError));
  if (input.latitude != null) search.set(PARAMS.latitude, String(input.latitude));
  return search;
}

/**
 * Check the calibration form. Delta-R and latitude apply to marine curves only and are dropped
 * for the others; a Delta-R error needs a Delta-R.
 */
export function readCalibrationForm(values: CalibrationFormValues, marine: boolean): FormResult<CalibrateInput, CalibrationFormField> {
  const reader = new FieldReader<CalibrationFormField>();
  const c14Age = reader.number('c14Age', values.c14Age, { required: true, min: 0 });
  const c14Error = reader.number('c14Error', values.c14Error, { required: true, above: 0, max: MAX_AGE_ERROR_YEARS });
  const deltaR = marine ? reader.number('deltaR', values.deltaR, { min: -2000, max: 5000 }) : null;
  const deltaRError = marine ? reader.number('deltaRError', values.deltaRError, { min: 0, max: MAX_AGE_ERROR_YEARS }) : null;
  if (deltaRError !== null && deltaR === null && !reader.errors.deltaR) reader.fail('deltaR', 'give Delta-R with its error');
  const latitude = marine ? reader.number('latitude', values.latitude, { min: -90, max: 90 }) : null;
  return reader.result({
    c14Age: c14Age ?? 0,
    c14Error: c14Error ?? 0,
    curve: values.curve,
    ...(deltaR !== null ? { deltaR } : {}),
    ...(deltaRError !== null ? { deltaRError } : {}),
    ...(latitude !== null ? { latitude } : {}),
  });
}

/** The calibration the URL asks for, or null when it asks for none (or for something invalid). */
export function calibrateInputFromSearch(search: URLSearchParams, marineCurves: ReadonlySet<CurveCode>): CalibrateInput | null {
  if (!search.has(PARAMS.c14Age)) return null;
  const values = calibrationFormFromSearch(search);
  const result = readCalibrationForm(values, marineCurves.has(values.curve));
  return result.ok ? result.input : null;
}
