import type { CreateEventHorizonInput } from '@/gql/graphql';
import { FieldReader, numberText, optionalText, type FormResult } from '@/modules/ui/utils/formFields';

export type EventHorizonFormValues = {
  name: string;
  unitBelowId: string;
  unitAboveId: string;
  quality: string;
  evidence: string[];
  notes: string;
  /** Coseismic subsidence, m (negative for uplift), with its 1-sigma error. */
  subsidenceM: string;
  subsidenceErrorM: string;
  /** Coseismic displacement (slip), m, with its 1-sigma error. */
  displacementM: string;
  displacementErrorM: string;
};

export type EventHorizonFormField = keyof EventHorizonFormValues;

export const EVENT_HORIZON_FORM_FIELDS: readonly EventHorizonFormField[] = [
  'name',
  'unitBelowId',
  'unitAboveId',
  'quality',
  'evidence',
  'notes',
  'subsidenceM',
  'subsidenceErrorM',
  'displacementM',
  'displacementErrorM',
];

/** Quality ranks as the trade reads them. */
export const QUALITY_LABELS: Record<1 | 2 | 3 | 4, string> = {
  1: '1 · certain',
  2: '2 · probable',
  3: '3 · likely',
  4: '4 · possible',
};

/** Evidence kinds offered as tags; any other words may be typed. */
export const EVIDENCE_SUGGESTIONS: readonly string[] = [
  'sudden subsidence',
  'tsunami sand sheet',
  'buried soil',
  'drowned vegetation',
  'colluvial wedge',
  'fissure fill',
  'upward fault termination',
  'liquefaction',
  'turbidite',
  'diatom shift',
];

type StoredHorizon = {
  name: string;
  unitBelowId: string;
  unitAboveId: string;
  quality: number;
  evidence: readonly string[];
  notes?: string | null;
  subsidenceM?: number | null;
  subsidenceErrorM?: number | null;
  displacementM?: number | null;
  displacementErrorM?: number | null;
};
type UnitOrder = { id: string; position: number };

/** A new horizon between the two youngest units, when there are two. */
export function emptyEventHorizonForm(units: readonly UnitOrder[]): EventHorizonFormValues {
  const byAge = [...units].sort((a, b) => b.position - a.position);
  return {
    name: '',
    unitBelowId: byAge[1]?.id ?? '',
    unitAboveId: byAge[0]?.id ?? '',
    quality: '2',
    evidence: [],
    notes: '',
    subsidenceM: '',
    subsidenceErrorM: '',
    displacementM: '',
    displacementErrorM: '',
  };
}

export function eventHorizonFormFrom(horizon: StoredHorizon): EventHorizonFormValues {
  return {
    name: horizon.name,
    unitBelowId: horizon.unitBelowId,
    unitAboveId: horizon.unitAboveId,
    quality: String(horizon.quality),
    evidence: [...horizon.evidence],
    notes: horizon.notes ?? '',
    subsidenceM: numberText(horizon.subsidenceM),
    subsidenceErrorM: numberText(horizon.subsidenceErrorM),
    displacementM: numberText(horizon.displacementM),
    displacementErrorM: numberText(horizon.displacementErrorM),
  };
}

/**
 * Check a horizon form: two different units of the site, the unit below older (a lower
 * position) than the unit above, quality 1 to 4. Evidence tags are trimmed and deduplicated.
 */
export function readEventHorizonForm(
  values: EventHorizonFormValues,
  units: readonly UnitOrder[],
): FormResult<Omit<CreateEventHorizonInput, 'siteId'>, EventHorizonFormField> {
  const reader = new FieldReader<EventHorizonFormField>();
  const name = reader.text('name', values.name, { required: true });
  const below = units.find((unit) => unit.id === values.unitBelowId);
  const above = units.find((unit) => unit.id === values.unitAboveId);
  if (!below) reader.fail('unitBelowId', 'choose the unit holding the pre-event deposits');
  if (!above) reader.fail('unitAboveId', 'choose the first post-event unit');
  if (below && above && below.id === above.id) reader.fail('unitAboveId', 'must be a different unit from the one below');
  if (below && above && below.position > above.position) {
    reader.fail('unitAboveId', 'must be younger (higher in the column) than the unit below');
  }
  const quality = reader.number('quality', values.quality, { required: true, integer: true, min: 1, max: 4 });
  const evidence = [...new Set(values.evidence.map((tag) => tag.trim()).filter((tag) => tag !== ''))];
  // Sizes are optional (blank clears them); an error needs its value, and errors are above 0.
  const subsidenceM = reader.number('subsidenceM', values.subsidenceM, { min: -100, max: 100 });
  const subsidenceErrorM = reader.number('subsidenceErrorM', values.subsidenceErrorM, { above: 0, max: 100 });
  const displacementM = reader.number('displacementM', values.displacementM, { min: 0, max: 200 });
  const displacementErrorM = reader.number('displacementErrorM', values.displacementErrorM, { above: 0, max: 200 });
  if (subsidenceErrorM !== null && subsidenceM === null && values.subsidenceM.trim() === '') reader.fail('subsidenceM', 'give the subsidence its error belongs to');
  if (displacementErrorM !== null && displacementM === null && values.displacementM.trim() === '') reader.fail('displacementM', 'give the displacement its error belongs to');
  return reader.result({
    name,
    unitBelowId: values.unitBelowId,
    unitAboveId: values.unitAboveId,
    quality: quality ?? 0,
    evidence,
    notes: optionalText(values.notes),
    subsidenceM,
    subsidenceErrorM,
    displacementM,
    displacementErrorM,
  });
}
