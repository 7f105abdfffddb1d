import { IconNames } from '@blueprintjs/icons';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { fieldErrorsOf, formErrorOf, isEditConflict } from '@/modules/api/utils/apiError';
import { useSegmentMutations } from '@/modules/projects/hooks/projectMutations';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import {
  EMPTY_SEGMENT_FORM,
  readSegmentForm,
  SEGMENT_FORM_FIELDS,
  segmentFormFrom,
  type SegmentFormField,
  type SegmentFormValues,
} from '@/modules/projects/utils/segmentForm';
import type { SegmentRow } from '@/modules/projects/utils/projectTypes';
import { FormDialog } from '@/modules/ui/components/FormDialog';
import { NumberField, TextAreaField, TextField } from '@/modules/ui/components/FormFields';
import type { FieldErrors } from '@/modules/ui/utils/formFields';

export type SegmentDialogProps = {
  projectId: string;
  /** The segment to edit, or null for a new one. */
  segment: SegmentRow | null;
  onClose: () => void;
};

/** Add or edit a segment: its name, along-strike extent and, optionally, its down-dip width. */
export function SegmentDialog({ projectId, segment, onClose }: SegmentDialogProps) {
  const [values, setValues] = useState<SegmentFormValues>(segment ? segmentFormFrom(segment) : EMPTY_SEGMENT_FORM);
  const [errors, setErrors] = useState<FieldErrors<SegmentFormField>>({});
  const { create, update } = useSegmentMutations(projectId);
  const mutation = segment ? update : create;
  const queryClient = useQueryClient();

  const set = (field: SegmentFormField) => (value: string) => setValues((previous) => ({ ...previous, [field]: value }));
  const serverErrors = fieldErrorsOf(mutation.error);
  const errorOf = (field: SegmentFormField) => errors[field] ?? serverErrors[field];

  const handleSubmit = () => {
    const result = readSegmentForm(values);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    if (segment) {
      update.mutate({ id: segment.id, version: segment.version, input: result.input }, { onSuccess: onClose });
    } else {
      create.mutate({ input: { ...result.input, projectId } }, { onSuccess: onClose });
    }
  };
  const handleReload = () => {
    void queryClient.invalidateQueries({ queryKey: projectQueries.detail(projectId) });
    onClose();
  };

  return (
    <FormDialog
      title={segment ? `Edit segment ${segment.name}` : 'New segment'}
      icon={IconNames.TIMELINE_LINE_CHART}
      isOpen
      onClose={onClose}
      onSubmit={handleSubmit}
      submitting={mutation.isPending}
      submitLabel={segment ? 'Save' : 'Add segment'}
      formError={formErrorOf(mutation.error, SEGMENT_FORM_FIELDS)}
      conflict={Boolean(segment) && isEditConflict(mutation.error)}
      onReload={handleReload}
    >
      <TextField name="name" label="Name" value={values.name} onValueChange={set('name')} error={errorOf('name')} autoFocus />
      <div className="sc-field-row">
        <NumberField name="startKm" label="Starts at" unit="km" value={values.startKm} onValueChange={set('startKm')} error={errorOf('startKm')} />
        <NumberField name="endKm" label="Ends at" unit="km" value={values.endKm} onValueChange={set('endKm')} error={errorOf('endKm')} />
      </div>
      <NumberField
        name="downDipWidthKm"
        label="Down-dip width"
        labelInfo="(optional)"
        unit="km"
        value={values.downDipWidthKm}
        onValueChange={set('downDipWidthKm')}
        error={errorOf('downDipWidthKm')}
        helperText="With a width, a regional event also gets Mw from rupture area (site span × width) beside Mw from the minimum rupture length."
      />
      <TextAreaField name="notes" label="Notes" value={values.notes} onValueChange={set('notes')} error={errorOf('notes')} />
    </FormDialog>
  );
}
