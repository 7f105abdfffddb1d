import { IconNames } from '@blueprintjs/icons';
import { useQueryClient } from '@tanstack/react-query';
import { Callout, Intent } from '@blueprintjs/core';
import { useState } from 'react';
import type { Facies } from '@/gql/graphql';
import { fieldErrorsOf, formErrorOf, isEditConflict } from '@/modules/api/utils/apiError';
import { FACIES_OPTIONS } from '@/modules/column/utils/facies';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import { useUnitMutations } from '@/modules/sites/hooks/columnMutations';
import type { UnitRow } from '@/modules/sites/utils/siteTypes';
import { emptyUnitForm, insertUnitForm, readUnitForm, UNIT_FORM_FIELDS, unitFormFrom, unitsDisplacedBy, type UnitFormField, type UnitFormValues } from '@/modules/sites/utils/unitForm';
import { FormDialog } from '@/modules/ui/components/FormDialog';
import { NumberField, SelectField, TextAreaField, TextField } from '@/modules/ui/components/FormFields';
import type { FieldErrors } from '@/modules/ui/utils/formFields';

export type UnitDialogProps = {
  projectId: string;
  siteId: string;
  units: readonly UnitRow[];
  /** The unit to edit, or null for a new one. */
  unit: UnitRow | null;
  /** For a new unit: insert it next to this unit, above (younger) or below (older). */
  insertNextTo?: { unit: UnitRow; side: 'above' | 'below' };
  onClose: () => void;
};

/** Add or edit a stratigraphic unit: position from the base, depths and facies. */
export function UnitDialog({ projectId, siteId, units, unit, insertNextTo, onClose }: UnitDialogProps) {
  const [values, setValues] = useState<UnitFormValues>(
    unit ? unitFormFrom(unit) : insertNextTo ? insertUnitForm(units, insertNextTo.unit, insertNextTo.side) : emptyUnitForm(units),
  );
  const [errors, setErrors] = useState<FieldErrors<UnitFormField>>({});
  const { create, update } = useUnitMutations(projectId);
  const mutation = unit ? update : create;
  const queryClient = useQueryClient();

  const set = (field: UnitFormField) => (value: string) => setValues((previous) => ({ ...previous, [field]: value }));
  const serverErrors = fieldErrorsOf(mutation.error);
  const errorOf = (field: UnitFormField) => errors[field] ?? serverErrors[field];

  // A new unit at a taken position is inserted there: the server moves the displaced units up
  // one position in the same transaction (makeRoom), and the form says which ones beforehand.
  const enteredPosition = Number(values.position);
  const displaced = !unit && Number.isInteger(enteredPosition) && enteredPosition >= 1 ? unitsDisplacedBy(units, enteredPosition) : [];

  const handleSubmit = () => {
    const result = readUnitForm(values);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    if (unit) {
      update.mutate({ id: unit.id, version: unit.version, input: result.input }, { onSuccess: onClose });
    } else {
      create.mutate({ input: { ...result.input, siteId, makeRoom: displaced.length > 0 } }, { onSuccess: onClose });
    }
  };
  const handleReload = () => {
    void queryClient.invalidateQueries({ queryKey: projectQueries.detail(projectId) });
    onClose();
  };
  const handleFaciesChange = (facies: Facies) => setValues((previous) => ({ ...previous, facies }));

  return (
    <FormDialog
      title={unit ? `Edit unit ${unit.name}` : insertNextTo ? `New unit ${insertNextTo.side} ${insertNextTo.unit.name}` : 'New unit'}
      icon={IconNames.LAYERS}
      isOpen
      onClose={onClose}
      onSubmit={handleSubmit}
      submitting={mutation.isPending}
      submitLabel={unit ? 'Save' : displaced.length > 0 ? 'Insert unit' : 'Add unit'}
      formError={formErrorOf(mutation.error, UNIT_FORM_FIELDS)}
      conflict={Boolean(unit) && isEditConflict(mutation.error)}
      onReload={handleReload}
    >
      <div className="sc-field-row">
        <TextField name="name" label="Name" value={values.name} onValueChange={set('name')} error={errorOf('name')} autoFocus />
        <NumberField
          name="position"
          label="Position"
          helperText="1 = oldest, at the base"
          value={values.position}
          onValueChange={set('position')}
          error={errorOf('position')}
          className="sc-field-narrow"
        />
      </div>
      {displaced.length > 0 && (
        <Callout intent={Intent.PRIMARY} compact className="sc-insert-note" data-testid="unit-insert-note">
          Position {enteredPosition} is taken: inserting here moves {displacedList(displaced)} up one position. The depths must fit
          between the neighbouring units; to split a unit, first edit its depths to leave room.
        </Callout>
      )}
      <div className="sc-field-row">
        <NumberField name="topDepthM" label="Top" unit="m" value={values.topDepthM} onValueChange={set('topDepthM')} error={errorOf('topDepthM')} />
        <NumberField name="baseDepthM" label="Base" unit="m" value={values.baseDepthM} onValueChange={set('baseDepthM')} error={errorOf('baseDepthM')} />
        <SelectField name="facies" label="Facies" value={values.facies} options={FACIES_OPTIONS} onValueChange={handleFaciesChange} error={errorOf('facies')} />
      </div>
      <NumberField
        name="basalErosionM"
        label="Eroded below base"
        unit="m"
        helperText="Estimated thickness of mud this unit's base removed (a turbidite's scour); blank if none"
        value={values.basalErosionM}
        onValueChange={set('basalErosionM')}
        error={errorOf('basalErosionM')}
        className="sc-field-narrow"
      />
      <TextAreaField name="notes" label="Notes" value={values.notes} onValueChange={set('notes')} error={errorOf('notes')} />
    </FormDialog>
  );
}

function displacedList(units: readonly { name: string; position: number }[]): string {
  const named = units.slice(0, 3).map((u) => `${u.name} (${u.position} → ${u.position + 1})`);
  const rest = units.length - named.length;
  return rest > 0 ? `${named.join(', ')} and ${rest} more` : named.join(', ');
}
