import { IconNames } from '@blueprintjs/icons';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import type { SiteKind } from '@/gql/graphql';
import { fieldErrorsOf, formErrorOf, isEditConflict } from '@/modules/api/utils/apiError';
import { useSiteMutations } from '@/modules/projects/hooks/projectMutations';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import {
  EMPTY_SITE_FORM,
  readSiteForm,
  SITE_FORM_FIELDS,
  SITE_KIND_LABELS,
  SITE_KINDS,
  siteFormFrom,
  type SiteFormField,
  type SiteFormValues,
} from '@/modules/projects/utils/siteForm';
import { FormDialog } from '@/modules/ui/components/FormDialog';
import { NumberField, SelectField, TextAreaField, TextField } from '@/modules/ui/components/FormFields';
import type { FieldErrors } from '@/modules/ui/utils/formFields';

/** What the dialog needs of a stored site. */
export type EditableSite = {
  id: string;
  version: number;
  name: string;
  kind: SiteKind;
  segment?: { id: string } | null;
  latitude: number;
  longitude: number;
  alongStrikeKm: number;
  elevationM?: number | null;
  waterDepthM?: number | null;
  notes?: string | null;
};

export type SiteDialogProps = {
  projectId: string;
  segments: readonly { id: string; name: string }[];
  /** The site to edit, or null for a new one. */
  site: EditableSite | null;
  onClose: () => void;
};

const KIND_OPTIONS = SITE_KINDS.map((kind) => ({ value: kind, label: SITE_KIND_LABELS[kind] }));

/** Add or edit a site: kind, segment, position (WGS84 and along strike), elevation or water depth. */
export function SiteDialog({ projectId, segments, site, onClose }: SiteDialogProps) {
  const [values, setValues] = useState<SiteFormValues>(site ? siteFormFrom(site) : EMPTY_SITE_FORM);
  const [errors, setErrors] = useState<FieldErrors<SiteFormField>>({});
  const { create, update } = useSiteMutations(projectId);
  const mutation = site ? update : create;
  const queryClient = useQueryClient();

  const set = (field: SiteFormField) => (value: string) => setValues((previous) => ({ ...previous, [field]: value }));
  const serverErrors = fieldErrorsOf(mutation.error);
  const errorOf = (field: SiteFormField) => errors[field] ?? serverErrors[field];
  const segmentOptions = [{ value: '', label: 'No segment' }, ...segments.map((segment) => ({ value: segment.id, label: segment.name }))];

  const handleSubmit = () => {
    const result = readSiteForm(values);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    if (site) {
      update.mutate({ id: site.id, version: site.version, input: result.input }, { onSuccess: onClose });
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
      title={site ? `Edit site ${site.name}` : 'New site'}
      icon={IconNames.MAP_MARKER}
      isOpen
      onClose={onClose}
      onSubmit={handleSubmit}
      submitting={mutation.isPending}
      submitLabel={site ? 'Save' : 'Add site'}
      formError={formErrorOf(mutation.error, SITE_FORM_FIELDS)}
      conflict={Boolean(site) && isEditConflict(mutation.error)}
      onReload={handleReload}
      width={600}
    >
      <TextField name="name" label="Name" value={values.name} onValueChange={set('name')} error={errorOf('name')} autoFocus />
      <div className="sc-field-row">
        <SelectField name="kind" label="Kind" value={values.kind} options={KIND_OPTIONS} onValueChange={set('kind')} error={errorOf('kind')} />
        <SelectField
          name="segmentId"
          label="Segment"
          value={values.segmentId}
          options={segmentOptions}
          onValueChange={set('segmentId')}
          error={errorOf('segmentId')}
        />
      </div>
      <div className="sc-field-row">
        <NumberField name="latitude" label="Latitude" unit="° N" helperText="WGS84, south negative" value={values.latitude} onValueChange={set('latitude')} error={errorOf('latitude')} />
        <NumberField name="longitude" label="Longitude" unit="° E" helperText="WGS84, west negative" value={values.longitude} onValueChange={set('longitude')} error={errorOf('longitude')} />
        <NumberField name="alongStrikeKm" label="Along strike" unit="km" value={values.alongStrikeKm} onValueChange={set('alongStrikeKm')} error={errorOf('alongStrikeKm')} />
      </div>
      <div className="sc-field-row">
        <NumberField name="elevationM" label="Ground elevation" unit="m a.s.l." helperText="land sites" value={values.elevationM} onValueChange={set('elevationM')} error={errorOf('elevationM')} />
        <NumberField name="waterDepthM" label="Water depth" unit="m" helperText="cores" value={values.waterDepthM} onValueChange={set('waterDepthM')} error={errorOf('waterDepthM')} />
      </div>
      <TextAreaField name="notes" label="Notes" value={values.notes} onValueChange={set('notes')} error={errorOf('notes')} rows={3} />
    </FormDialog>
  );
}
