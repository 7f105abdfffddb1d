import type { AgeRelation, CreateSampleInput, CurveCode, DatingMethod, SampleMaterial, UpdateSampleInput } from '@/gql/graphql';
import { FieldReader, numberText, optionalText, type FormResult } from '@/modules/ui/utils/formFields';
import { INHERITANCE_SCALE_LIMITS, isMarineCurve, isMarineMaterial } from './sampleVocabulary';
import { MAX_AGE_ERROR_YEARS } from '@/modules/ages/utils/ageBounds';

/** A sample form as typed: numbers stay text until the form is checked. */
export type SampleFormValues = {
  unitId: string;
  labCode: string;
  method: DatingMethod;
  material: SampleMaterial;
  depthM: string;
  ageRelation: AgeRelation;
  c14Age: string;
  c14Error: string;
  delta13C: string;
  curve: CurveCode | '';
  deltaR: string;
  deltaRError: string;
  deltaRSource: string;
  inheritanceScaleYears: string;
  calendarAgeBp: string;
  calendarErrorYears: string;
  measurementYear: string;
  excluded: boolean;
  exclusionReason: string;
  notes: string;
};

export type SampleFormField = keyof SampleFormValues;

/** The fields a sample sends whatever its method. */
const COMMON_FIELDS: readonly SampleFormField[] = [
  'unitId',
  'labCode',
  'method',
  'material',
  'depthM',
  'ageRelation',
  'excluded',
  'exclusionReason',
  'notes',
];

/**
 * The method-specific fields a form shows: a radiocarbon age with its curve (and Delta-R on a
 * marine curve); a luminescence age before its measurement year; a historical or tephra tie as
 * the centre and half-width of a calendar range.
 */
export function methodFields(method: DatingMethod, curve: CurveCode | ''): SampleFormField[] {
  switch (method) {
    case 'RADIOCARBON':
      return ['c14Age', 'c14Error', 'delta13C', 'curve', ...(isMarineCurve(curve || null) ? (['deltaR', 'deltaRError', 'deltaRSource'] as const) : [])];
    case 'LUMINESCENCE':
      return ['calendarAgeBp', 'calendarErrorYears', 'measurementYear'];
    case 'HISTORICAL':
    case 'TEPHRA':
      return ['calendarAgeBp', 'calendarErrorYears'];
  }
}

/** Every field the form shows for a method (for matching server errors to fields). */
export function sampleFormFields(method: DatingMethod, curve: CurveCode | '', ageRelation: AgeRelation = 'DATES_DEPOSIT'): SampleFormField[] {
  return [...COMMON_FIELDS, ...(ageRelation !== 'DATES_DEPOSIT' ? (['inheritanceScaleYears'] as const) : []), ...methodFields(method, curve)];
}

/** Lab codes as the server accepts them: letters, digits, spaces and . - _ / (1 to 64 characters). */
const LAB_CODE_PATTERN = /^[\w.\-/ ]{1,64}$/;

/** A new sample's form: radiocarbon on IntCal20, dating its deposit. */
export function emptySampleForm(unitId = ''): SampleFormValues {
  return {
    unitId,
    labCode: '',
    method: 'RADIOCARBON',
    material: 'DETRITAL_CHARCOAL',
    depthM: '',
    ageRelation: 'DATES_DEPOSIT',
    c14Age: '',
    c14Error: '',
    delta13C: '',
    curve: 'INTCAL20',
    deltaR: '',
    deltaRError: '',
    deltaRSource: '',
    inheritanceScaleYears: '',
    calendarAgeBp: '',
    calendarErrorYears: '',
    measurementYear: '',
    excluded: false,
    exclusionReason: '',
    notes: '',
  };
}

/** What the form needs of a stored sample. */
export type StoredSample = Omit<CreateSampleInput, 'siteId'> & { unitId: string };

/** The form for editing a stored sample. */
export function sampleFormFrom(sample: StoredSample): SampleFormValues {
  return {
    unitId: sample.unitId,
    labCode: sample.labCode,
    method: sample.method,
    material: sample.material,
    depthM: numberText(sample.depthM),
    ageRelation: sample.ageRelation,
    c14Age: numberText(sample.c14Age),
    c14Error: numberText(sample.c14Error),
    delta13C: numberText(sample.delta13C),
    curve: sample.curve ?? '',
    deltaR: numberText(sample.deltaR),
    deltaRError: numberText(sample.deltaRError),
    deltaRSource: sample.deltaRSource ?? '',
    inheritanceScaleYears: numberText(sample.inheritanceScaleYears),
    calendarAgeBp: numberText(sample.calendarAgeBp),
    calendarErrorYears: numberText(sample.calendarErrorYears),
    measurementYear: numberText(sample.measurementYear),
    excluded: sample.excluded ?? false,
    exclusionReason: sample.exclusionReason ?? '',
    notes: sample.notes ?? '',
  };
}

/**
 * Changing the material to marine carbon suggests the marine curve, and back; the user can
 * still pick another curve afterwards.
 */
export function withMaterial(values: SampleFormValues, material: SampleMaterial): SampleFormValues {
  const marine = isMarineMaterial(material);
  const curve = values.method !== 'RADIOCARBON' ? values.curve : marine ? 'MARINE20' : isMarineCurve(values.curve || null) ? 'INTCAL20' : values.curve;
  return { ...values, material, curve };
}

export type UnitDepths = { id: string; name: string; topDepthM: number; baseDepthM: number };

/** Depths are logged by hand: a sample this close outside its unit still belongs to it (as the server allows). */
const DEPTH_TOLERANCE_M = 0.005;

export type SampleInputFields = Omit<CreateSampleInput, 'siteId'> & Required<Pick<UpdateSampleInput, 'unitId'>>;

/**
 * Check a sample form and build the API input. Fields of other methods are sent as null, so
 * switching a sample's method clears what no longer applies.
 */
export function readSampleForm(
  values: SampleFormValues,
  units: readonly UnitDepths[],
): FormResult<SampleInputFields, SampleFormField> {
  const reader = new FieldReader<SampleFormField>();
  const labCode = reader.text('labCode', values.labCode, {
    required: true,
    pattern: [LAB_CODE_PATTERN, 'letters, digits, spaces and . - _ / only (at most 64)'],
  });
  const unit = units.find((candidate) => candidate.id === values.unitId);
  if (!unit) reader.fail('unitId', 'choose the unit the sample came from');
  const depthM = reader.number('depthM', values.depthM, { min: 0 });
  if (unit && depthM !== null && (depthM < unit.topDepthM - DEPTH_TOLERANCE_M || depthM > unit.baseDepthM + DEPTH_TOLERANCE_M)) {
    reader.fail('depthM', `outside unit ${unit.name} (${unit.topDepthM}–${unit.baseDepthM} m)`);
  }

  const shown = new Set(methodFields(values.method, values.curve));
  const radiocarbon = values.method === 'RADIOCARBON';
  const luminescence = values.method === 'LUMINESCENCE';
  const c14Age = shown.has('c14Age') ? reader.number('c14Age', values.c14Age, { required: true, min: 0 }) : null;
  const c14Error = shown.has('c14Error') ? reader.number('c14Error', values.c14Error, { required: true, above: 0, max: MAX_AGE_ERROR_YEARS }) : null;
  const delta13C = shown.has('delta13C') ? reader.number('delta13C', values.delta13C, { min: -60, max: 20 }) : null;
  if (radiocarbon && values.curve === '') reader.fail('curve', 'choose a calibration curve');
  const deltaR = shown.has('deltaR') ? reader.number('deltaR', values.deltaR, { min: -2000, max: 5000 }) : null;
  const deltaRError = shown.has('deltaRError') ? reader.number('deltaRError', values.deltaRError, { min: 0, max: MAX_AGE_ERROR_YEARS }) : null;
  if (deltaRError !== null && deltaR === null && !reader.errors.deltaR) reader.fail('deltaR', 'give Delta-R with its error');
  const deltaRSource = shown.has('deltaRSource') ? optionalText(values.deltaRSource) : null;
  if (deltaRSource !== null && deltaRSource.length > 100) reader.fail('deltaRSource', 'at most 100 characters');
  const inheritanceScaleYears =
    values.ageRelation !== 'DATES_DEPOSIT'
      ? reader.number('inheritanceScaleYears', values.inheritanceScaleYears, { min: INHERITANCE_SCALE_LIMITS.min, max: INHERITANCE_SCALE_LIMITS.max })
      : null;
  const calendarAgeBp = shown.has('calendarAgeBp')
    ? reader.number('calendarAgeBp', values.calendarAgeBp, luminescence ? { required: true, above: 0 } : { required: true })
    : null;
  const calendarErrorYears = shown.has('calendarErrorYears')
    ? reader.number('calendarErrorYears', values.calendarErrorYears, { required: true, above: 0, max: MAX_AGE_ERROR_YEARS })
    : null;
  const measurementYear = shown.has('measurementYear')
    ? reader.number('measurementYear', values.measurementYear, { required: true, integer: true, min: 1950, max: 2100 })
    : null;
  const exclusionReason = optionalText(values.exclusionReason);
  if (values.excluded && exclusionReason === null) reader.fail('exclusionReason', 'say why the sample is excluded');

  return reader.result({
    unitId: values.unitId,
    labCode,
    method: values.method,
    material: values.material,
    depthM,
    ageRelation: values.ageRelation,
    c14Age,
    c14Error,
    delta13C,
    curve: radiocarbon && values.curve !== '' ? values.curve : null,
    deltaR,
    deltaRError,
    deltaRSource,
    inheritanceScaleYears,
    calendarAgeBp,
    calendarErrorYears,
    measurementYear,
    excluded: values.excluded,
    exclusionReason: values.excluded ? exclusionReason : null,
    notes: optionalText(values.notes),
  });
}
