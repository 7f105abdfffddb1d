import type { CreateSegmentInput } from '@/gql/graphql';
import { FieldReader, numberText, optionalText, type FormResult } from '@/modules/ui/utils/formFields';

export type SegmentFormValues = { name: string; startKm: string; endKm: string; downDipWidthKm: string; notes: string };
export type SegmentFormField = keyof SegmentFormValues;
export const SEGMENT_FORM_FIELDS: readonly SegmentFormField[] = ['name', 'startKm', 'endKm', 'downDipWidthKm', 'notes'];

export const EMPTY_SEGMENT_FORM: SegmentFormValues = { name: '', startKm: '', endKm: '', downDipWidthKm: '', notes: '' };

/** Largest down-dip width the server takes, km. */
export const MAX_DOWN_DIP_WIDTH_KM = 1000;

export function segmentFormFrom(segment: {
  name: string;
  startKm: number;
  endKm: number;
  downDipWidthKm?: number | null;
  notes?: string | null;
}): SegmentFormValues {
  return {
    name: segment.name,
    startKm: numberText(segment.startKm),
    endKm: numberText(segment.endKm),
    downDipWidthKm: numberText(segment.downDipWidthKm),
    notes: segment.notes ?? '',
  };
}

/**
 * Check a segment form: a name and an along-strike extent that ends after it starts; the down-dip
 * width is optional (blank clears it), above 0 and at most 1,000 km.
 */
export function readSegmentForm(values: SegmentFormValues): FormResult<Omit<CreateSegmentInput, 'projectId'>, SegmentFormField> {
  const reader = new FieldReader<SegmentFormField>();
  const name = reader.text('name', values.name, { required: true });
  const startKm = reader.number('startKm', values.startKm, { required: true });
  const endKm = reader.number('endKm', values.endKm, { required: true });
  if (startKm !== null && endKm !== null && !(endKm > startKm)) reader.fail('endKm', 'must be greater than the start');
  const downDipWidthKm = reader.number('downDipWidthKm', values.downDipWidthKm, { above: 0, max: MAX_DOWN_DIP_WIDTH_KM });
  return reader.result({ name, startKm: startKm ?? 0, endKm: endKm ?? 0, downDipWidthKm, notes: optionalText(values.notes) });
}
