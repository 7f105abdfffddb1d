import { Button, FormGroup, Intent, TagInput } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQueryClient } from '@tanstack/react-query';
import { useState, type KeyboardEvent, type ReactNode } from 'react';
import { fieldErrorsOf, formErrorOf, isEditConflict } from '@/modules/api/utils/apiError';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import { useEventHorizonMutations } from '@/modules/sites/hooks/columnMutations';
import {
  emptyEventHorizonForm,
  EVENT_HORIZON_FORM_FIELDS,
  eventHorizonFormFrom,
  EVIDENCE_SUGGESTIONS,
  QUALITY_LABELS,
  readEventHorizonForm,
  type EventHorizonFormField,
  type EventHorizonFormValues,
} from '@/modules/sites/utils/eventHorizonForm';
import type { EventHorizonRow, UnitRow } from '@/modules/sites/utils/siteTypes';
import { FormDialog } from '@/modules/ui/components/FormDialog';
import { NumberField, SelectField, TextAreaField, TextField } from '@/modules/ui/components/FormFields';
import type { FieldErrors } from '@/modules/ui/utils/formFields';

export type EventHorizonDialogProps = {
  projectId: string;
  siteId: string;
  units: readonly UnitRow[];
  /** The horizon to edit, or null for a new one. */
  eventHorizon: EventHorizonRow | null;
  onClose: () => void;
};

const QUALITY_OPTIONS = ([1, 2, 3, 4] as const).map((quality) => ({ value: String(quality), label: QUALITY_LABELS[quality] }));

/** Add or edit an event horizon: the units on either side, a quality rank, evidence tags and any measured size. */
export function EventHorizonDialog({ projectId, siteId, units, eventHorizon, onClose }: EventHorizonDialogProps) {
  const [values, setValues] = useState<EventHorizonFormValues>(
    eventHorizon
      ? eventHorizonFormFrom({ ...eventHorizon, unitBelowId: eventHorizon.unitBelow.id, unitAboveId: eventHorizon.unitAbove.id })
      : emptyEventHorizonForm(units),
  );
  const [errors, setErrors] = useState<FieldErrors<EventHorizonFormField>>({});
  const { create, update } = useEventHorizonMutations(projectId);
  const mutation = eventHorizon ? update : create;
  const queryClient = useQueryClient();

  const set = (field: Exclude<EventHorizonFormField, 'evidence'>) => (value: string) => setValues((previous) => ({ ...previous, [field]: value }));
  const serverErrors = fieldErrorsOf(mutation.error);
  const errorOf = (field: EventHorizonFormField) => errors[field] ?? serverErrors[field];
  const unitOptions = [
    { value: '', label: 'Choose a unit' },
    ...[...units].sort((a, b) => b.position - a.position).map((unit) => ({ value: unit.id, label: `${unit.position} · ${unit.name}` })),
  ];
  const unusedSuggestions = EVIDENCE_SUGGESTIONS.filter((tag) => !values.evidence.includes(tag));

  const handleEvidenceChange = (tags: ReactNode[]) =>
    setValues((previous) => ({ ...previous, evidence: tags.map(String) }));
  // Enter adds the typed tag; left alone it would also submit the dialog's form after the first tag.
  const handleEvidenceKeyDown = (event: KeyboardEvent<HTMLElement>) => {
    if (event.key === 'Enter') event.preventDefault();
  };
  const handleAddSuggestion = (tag: string) => setValues((previous) => ({ ...previous, evidence: [...previous.evidence, tag] }));
  const handleSubmit = () => {
    const result = readEventHorizonForm(values, units);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    if (eventHorizon) {
      update.mutate({ id: eventHorizon.id, version: eventHorizon.version, input: result.input }, { onSuccess: onClose });
    } else {
      create.mutate({ input: { ...result.input, siteId } }, { onSuccess: onClose });
    }
  };
  const handleReload = () => {
    void queryClient.invalidateQueries({ queryKey: projectQueries.detail(projectId) });
    onClose();
  };

  return (
    <FormDialog
      title={eventHorizon ? `Edit event horizon ${eventHorizon.name}` : 'New event horizon'}
      icon={IconNames.FLASH}
      isOpen
      onClose={onClose}
      onSubmit={handleSubmit}
      submitting={mutation.isPending}
      submitLabel={eventHorizon ? 'Save' : 'Add event horizon'}
      formError={formErrorOf(mutation.error, EVENT_HORIZON_FORM_FIELDS)}
      conflict={Boolean(eventHorizon) && isEditConflict(mutation.error)}
      onReload={handleReload}
      width={580}
    >
      <div className="sc-field-row">
        <TextField name="name" label="Name" value={values.name} onValueChange={set('name')} error={errorOf('name')} autoFocus />
        <SelectField name="quality" label="Quality" value={values.quality} options={QUALITY_OPTIONS} onValueChange={set('quality')} error={errorOf('quality')} />
      </div>
      <div className="sc-field-row">
        <SelectField
          name="unitBelowId"
          label="Unit below"
          helperText="holds the pre-event deposits"
          value={values.unitBelowId}
          options={unitOptions}
          onValueChange={set('unitBelowId')}
          error={errorOf('unitBelowId')}
        />
        <SelectField
          name="unitAboveId"
          label="Unit above"
          helperText="the first post-event unit"
          value={values.unitAboveId}
          options={unitOptions}
          onValueChange={set('unitAboveId')}
          error={errorOf('unitAboveId')}
        />
      </div>
      <FormGroup
        label="Evidence"
        labelFor="evidence"
        helperText={errorOf('evidence') ?? 'Type and press Enter, or pick below'}
        intent={errorOf('evidence') ? Intent.DANGER : Intent.NONE}
      >
        <TagInput
          inputProps={{ id: 'evidence' }}
          values={values.evidence}
          onChange={handleEvidenceChange}
          onKeyDown={handleEvidenceKeyDown}
          addOnBlur
          placeholder="evidence kinds"
          tagProps={{ minimal: true }}
        />
        {unusedSuggestions.length > 0 && (
          <div className="sc-suggestions">
            {unusedSuggestions.map((tag) => (
              <Button key={tag} size="small" variant="minimal" icon={IconNames.PLUS} text={tag} onClick={() => handleAddSuggestion(tag)} />
            ))}
          </div>
        )}
      </FormGroup>
      <FormGroup label="Measured size" helperText="Optional; each with its 1σ error. They feed the along-strike size profile and Mw from displacement.">
        <div className="sc-field-row">
          <NumberField
            name="subsidenceM"
            label="Coseismic subsidence"
            labelInfo="(negative for uplift)"
            unit="m"
            value={values.subsidenceM}
            onValueChange={set('subsidenceM')}
            error={errorOf('subsidenceM')}
          />
          <NumberField name="subsidenceErrorM" label="± 1σ" unit="m" value={values.subsidenceErrorM} onValueChange={set('subsidenceErrorM')} error={errorOf('subsidenceErrorM')} />
        </div>
        <div className="sc-field-row">
          <NumberField
            name="displacementM"
            label="Coseismic displacement (slip)"
            unit="m"
            value={values.displacementM}
            onValueChange={set('displacementM')}
            error={errorOf('displacementM')}
          />
          <NumberField
            name="displacementErrorM"
            label="± 1σ"
            unit="m"
            value={values.displacementErrorM}
            onValueChange={set('displacementErrorM')}
            error={errorOf('displacementErrorM')}
          />
        </div>
        {eventHorizon?.bedThicknessM != null && (
          <p className="sc-chart-legend">Event bed thickness from the unit above: {eventHorizon.bedThicknessM.toFixed(2)} m.</p>
        )}
      </FormGroup>
      <TextAreaField name="notes" label="Notes" value={values.notes} onValueChange={set('notes')} error={errorOf('notes')} />
    </FormDialog>
  );
}
