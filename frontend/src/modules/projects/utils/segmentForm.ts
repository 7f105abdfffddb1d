import type { CreateSegmentInput } from '@/gql/graphql';
import { FieldReader, numberText, optionalText, type FormResult } from '@/modules/ui/utils/formFields';

export type SegmentFormValues = { name: string; startKm: string; endKm: string; notes: string };
export type SegmentFormField = keyof SegmentFormValues;
export const SEGMENT_FORM_FIELDS: readonly SegmentFormField[] = ['name', 'startKm', 'endKm', 'notes'];

export const EMPTY_SEGMENT_FORM: SegmentFormValues = { name: '', startKm: '', endKm: '', notes: '' };

export function segmentFormFrom(segment: { name: string; startKm: number; endKm: number; notes?: string | null }): SegmentFormValues {
  return { name: segment.name, startKm: numberText(segment.startKm), endKm: numberText(segment.endKm), notes: segment.notes ?? '' };
}

/** Check a segment form: a name and an along-strike extent that ends after it starts. */
export function readSegmentForm(values: SegmentFormValues): FormResult<Omit<CreateSegmentInput, 'projectId'>, SegmentFormField> {
  const reader = new FieldReader<SegmentFormField>();
  const name = reader.text('name', values.name, { required: true });
  const startKm = reader.number('startKm', values.startKm, { required: true });
  const endKm = reader.number('endKm', values.endKm, { required: true });
  if (startKm !== null && endKm !== null && !(endKm > startKm)) reader.fail('endKm', 'must be greater than the start');
  return reader.result({ name, startKm: startKm ?? 0, endKm: endKm ?? 0, notes: optionalText(values.notes) });
}
