import { Callout, Classes, Intent, Switch } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQueryClient } from '@tanstack/react-query';
import { useState, type ChangeEvent } from 'react';
import type { AgeRelation, CurveCode, DatingMethod, SampleMaterial } from '@/gql/graphql';
import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { fieldErrorsOf, formErrorOf, isEditConflict } from '@/modules/api/utils/apiError';
import { projectQueries } from '@/modules/projects/hooks/projectQueries';
import { useSampleMutations } from '@/modules/samples/hooks/sampleMutations';
import {
  emptySampleForm,
  methodFields,
  readSampleForm,
  sampleFormFields,
  sampleFormFrom,
  withMaterial,
  type SampleFormField,
  type SampleFormValues,
} from '@/modules/samples/utils/sampleForm';
import { calBpFromYear, radiocarbonFromF14C, yearFromCalBp, type CalendarEntry } from '@/modules/samples/utils/ageEntry';
import { luminescenceCalBp } from '@/modules/samples/utils/sampleSummary';
import {
  AGE_RELATION_LABELS,
  AGE_RELATIONS,
  CURVE_CODES,
  CURVE_LABELS,
  DATING_METHOD_LABELS,
  DATING_METHODS,
  DEFAULT_INHERITANCE_SCALE_YEARS,
  SAMPLE_MATERIAL_LABELS,
  SAMPLE_MATERIALS,
} from '@/modules/samples/utils/sampleVocabulary';
import type { SampleRow, SiteDetail } from '@/modules/sites/utils/siteTypes';
import { FormDialog } from '@/modules/ui/components/FormDialog';
import { NumberField, SelectField, TextAreaField, TextField } from '@/modules/ui/components/FormFields';
import { readNumber, type FieldErrors } from '@/modules/ui/utils/formFields';

export type SampleDialogProps = {
  site: Pick<SiteDetail, 'id' | 'latitude' | 'units' | 'project'>;
  /** The sample to edit, or null for a new one. */
  sample: SampleRow | null;
  onClose: () => void;
};

const METHOD_OPTIONS = DATING_METHODS.map((method) => ({ value: method, label: DATING_METHOD_LABELS[method] }));
const MATERIAL_OPTIONS = SAMPLE_MATERIALS.map((material) => ({ value: material, label: SAMPLE_MATERIAL_LABELS[material] }));
const RELATION_OPTIONS = AGE_RELATIONS.map((relation) => ({ value: relation, label: AGE_RELATION_LABELS[relation] }));
const CURVE_OPTIONS = [{ value: '' as const, label: 'Choose a curve' }, ...CURVE_CODES.map((curve) => ({ value: curve, label: CURVE_LABELS[curve] }))];

/** Latitude above which Marine20 is not meant to be used (Heaton et al. 2020) [common practice for the line]. */
const MARINE20_POLAR_LATITUDE = 60;

/**
 * Add or edit a dated sample. The method decides the fields: a radiocarbon age with its curve
 * (and Delta-R on Marine20), a luminescence age before its measurement year, or the centre and
 * half-width of a historical or tephra calendar range.
 */
export function SampleDialog({ site, sample, onClose }: SampleDialogProps) {
  const { age, range } = useAgeScale();
  const [values, setValues] = useState<SampleFormValues>(() =>
    sample ? sampleFormFrom({ ...sample, unitId: sample.unit.id }) : emptySampleForm([...site.units].sort((a, b) => b.position - a.position)[0]?.id ?? ''),
  );
  const [errors, setErrors] = useState<FieldErrors<SampleFormField>>({});
  // How the age is typed: a 14C age or F14C; a calendar age in cal BP or as a year CE/BCE. The
  // form keeps what the sample stores (14C age, cal BP) and these convert into it as they are typed.
  const [c14Entry, setC14Entry] = useState<'AGE' | 'F14C'>('AGE');
  const [f14c, setF14c] = useState({ value: '', error: '' });
  const [calendarEntry, setCalendarEntry] = useState<CalendarEntry>('CAL_BP');
  const [calendarYear, setCalendarYear] = useState('');
  const projectId = site.project.id;
  const { create, update } = useSampleMutations(projectId);
  const mutation = sample ? update : create;
  const queryClient = useQueryClient();

  const set = (field: Exclude<SampleFormField, 'excluded'>) => (value: string) => setValues((previous) => ({ ...previous, [field]: value }));
  const serverErrors = fieldErrorsOf(mutation.error);
  const errorOf = (field: SampleFormField) => errors[field] ?? serverErrors[field];
  const shown = new Set(methodFields(values.method, values.curve));
  const unitOptions = [
    { value: '', label: 'Choose a unit' },
    ...[...site.units].sort((a, b) => b.position - a.position).map((unit) => ({ value: unit.id, label: `${unit.position} · ${unit.name}` })),
  ];

  const handleMethodChange = (method: DatingMethod) => setValues((previous) => ({ ...previous, method }));
  const handleMaterialChange = (material: SampleMaterial) => setValues((previous) => withMaterial(previous, material));
  const handleRelationChange = (ageRelation: AgeRelation) => setValues((previous) => ({ ...previous, ageRelation }));
  const handleCurveChange = (curve: CurveCode | '') => setValues((previous) => ({ ...previous, curve }));
  const handleExcludedChange = (event: ChangeEvent<HTMLInputElement>) => {
    const excluded = event.target.checked;
    setValues((previous) => ({ ...previous, excluded }));
  };
  const f14cValue = readNumber(f14c.value).value;
  const f14cErrorValue = readNumber(f14c.error).value;
  const fromF14c = f14cValue != null && f14cErrorValue != null ? radiocarbonFromF14C(f14cValue, f14cErrorValue) : null;
  const handleF14cChange = (part: 'value' | 'error') => (text: string) => {
    const next = { ...f14c, [part]: text };
    setF14c(next);
    const value = readNumber(next.value).value;
    const error = readNumber(next.error).value;
    const converted = value != null && error != null ? radiocarbonFromF14C(value, error) : null;
    setValues((previous) => ({
      ...previous,
      c14Age: converted?.ok ? String(converted.c14Age) : '',
      c14Error: converted?.ok ? String(converted.c14Error) : '',
    }));
  };
  const handleC14EntryChange = (entry: 'AGE' | 'F14C') => {
    setC14Entry(entry);
    if (entry === 'F14C') handleF14cChange('value')(f14c.value);
  };
  const handleCalendarYearChange = (text: string, entry: CalendarEntry = calendarEntry) => {
    setCalendarYear(text);
    const year = readNumber(text, { integer: true }).value;
    if (entry !== 'CAL_BP') setValues((previous) => ({ ...previous, calendarAgeBp: year != null && year >= 1 ? String(calBpFromYear(year, entry)) : '' }));
  };
  const handleCalendarEntryChange = (entry: CalendarEntry) => {
    setCalendarEntry(entry);
    if (entry === 'CAL_BP') return;
    // Switching to years shows the age already typed (or stored) as a year.
    const calBp = readNumber(values.calendarAgeBp).value;
    if (calBp != null) {
      const { year, era } = yearFromCalBp(Math.round(calBp));
      if (era !== entry) setCalendarEntry(era);
      setCalendarYear(String(year));
    } else {
      handleCalendarYearChange(calendarYear, entry);
    }
  };
  const f14cProblem = c14Entry === 'F14C' && values.method === 'RADIOCARBON' ? (fromF14c && !fromF14c.ok ? fromF14c : null) : null;

  const handleSubmit = () => {
    if (f14cProblem) return;
    const result = readSampleForm(values, site.units);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    if (sample) {
      update.mutate({ id: sample.id, version: sample.version, input: result.input }, { onSuccess: onClose });
    } else {
      create.mutate({ input: { ...result.input, siteId: site.id } }, { onSuccess: onClose });
    }
  };
  const handleReload = () => {
    void queryClient.invalidateQueries({ queryKey: projectQueries.detail(projectId) });
    onClose();
  };

  const luminescenceAge = readNumber(values.calendarAgeBp).value;
  const measurementYear = readNumber(values.measurementYear, { integer: true }).value;
  const tieCentre = readNumber(values.calendarAgeBp).value;
  const tieHalfWidth = readNumber(values.calendarErrorYears).value;
  const polarMarine = values.curve === 'MARINE20' && Math.abs(site.latitude) > MARINE20_POLAR_LATITUDE;

  return (
    <FormDialog
      title={sample ? `Edit sample ${sample.labCode}` : 'New sample'}
      icon={IconNames.LAB_TEST}
      isOpen
      onClose={onClose}
      onSubmit={handleSubmit}
      submitting={mutation.isPending}
      submitLabel={sample ? 'Save' : 'Add sample'}
      formError={formErrorOf(mutation.error, sampleFormFields(values.method, values.curve, values.ageRelation))}
      conflict={Boolean(sample) && isEditConflict(mutation.error)}
      onReload={handleReload}
      width={680}
    >
      <div className="sc-field-row">
        <TextField name="labCode" label="Lab code" value={values.labCode} onValueChange={set('labCode')} error={errorOf('labCode')} autoFocus />
        <SelectField name="unitId" label="Unit" value={values.unitId} options={unitOptions} onValueChange={set('unitId')} error={errorOf('unitId')} />
        <NumberField name="depthM" label="Depth" unit="m" value={values.depthM} onValueChange={set('depthM')} error={errorOf('depthM')} className="sc-field-narrow" />
      </div>
      <div className="sc-field-row">
        <SelectField name="method" label="Method" value={values.method} options={METHOD_OPTIONS} onValueChange={handleMethodChange} error={errorOf('method')} />
        <SelectField name="material" label="Material" value={values.material} options={MATERIAL_OPTIONS} onValueChange={handleMaterialChange} error={errorOf('material')} />
      </div>
      <SelectField
        name="ageRelation"
        label="Age relation to the deposit"
        value={values.ageRelation}
        options={RELATION_OPTIONS}
        onValueChange={handleRelationChange}
        error={errorOf('ageRelation')}
      />
      {values.ageRelation !== 'DATES_DEPOSIT' && (
        <NumberField
          name="inheritanceScaleYears"
          label={values.ageRelation === 'OLDER_THAN_DEPOSIT' ? 'Mean inherited age' : 'Mean intrusion age'}
          unit="years"
          labelInfo="(optional)"
          helperText={`Scale of the age model's prior on how much ${values.ageRelation === 'OLDER_THAN_DEPOSIT' ? 'older' : 'younger'} the material is than its deposit; empty takes ${DEFAULT_INHERITANCE_SCALE_YEARS[values.material]} years for ${SAMPLE_MATERIAL_LABELS[values.material].toLowerCase()}.`}
          value={values.inheritanceScaleYears}
          onValueChange={set('inheritanceScaleYears')}
          error={errorOf('inheritanceScaleYears')}
        />
      )}

      <fieldset className="sc-fieldset">
        <legend>{DATING_METHOD_LABELS[values.method]} age</legend>
        {values.method === 'RADIOCARBON' && (
          <>
            <div className="sc-field-row">
              <SelectField
                name="c14Entry"
                label="Reported as"
                value={c14Entry}
                options={[
                  { value: 'AGE', label: '14C age (yr BP)' },
                  { value: 'F14C', label: 'F14C (fraction modern)' },
                ]}
                onValueChange={handleC14EntryChange}
                className="sc-field-narrow"
              />
              {c14Entry === 'AGE' ? (
                <>
                  <NumberField name="c14Age" label="Conventional age" unit="14C yr BP" value={values.c14Age} onValueChange={set('c14Age')} error={errorOf('c14Age')} />
                  <NumberField name="c14Error" label="Error (1σ)" unit="14C yr" value={values.c14Error} onValueChange={set('c14Error')} error={errorOf('c14Error')} />
                </>
              ) : (
                <>
                  <NumberField
                    name="f14c"
                    label="F14C"
                    value={f14c.value}
                    onValueChange={handleF14cChange('value')}
                    error={f14cProblem?.field === 'f14c' ? f14cProblem.message : (errorOf('c14Age') ?? undefined)}
                  />
                  <NumberField
                    name="f14cError"
                    label="F14C error (1σ)"
                    value={f14c.error}
                    onValueChange={handleF14cChange('error')}
                    error={f14cProblem?.field === 'f14cError' ? f14cProblem.message : (errorOf('c14Error') ?? undefined)}
                  />
                </>
              )}
              <NumberField name="delta13C" label="δ13C" unit="‰" labelInfo="(optional)" value={values.delta13C} onValueChange={set('delta13C')} error={errorOf('delta13C')} />
            </div>
            {c14Entry === 'F14C' && fromF14c?.ok && (
              <p className={`${Classes.TEXT_MUTED} sc-form-note`}>
                Stored as the conventional age <span className="num">{fromF14c.c14Age} ± {fromF14c.c14Error}</span> 14C yr BP (−8033 ln F; Stuiver &amp; Polach 1977).
              </p>
            )}
            <div className="sc-field-row">
              <SelectField name="curve" label="Calibration curve" value={values.curve} options={CURVE_OPTIONS} onValueChange={handleCurveChange} error={errorOf('curve')} />
              {shown.has('deltaR') && (
                <>
                  <NumberField name="deltaR" label="Delta-R" unit="14C yr" value={values.deltaR} onValueChange={set('deltaR')} error={errorOf('deltaR')} />
                  <NumberField name="deltaRError" label="Delta-R error" unit="14C yr" value={values.deltaRError} onValueChange={set('deltaRError')} error={errorOf('deltaRError')} />
                </>
              )}
            </div>
            {shown.has('deltaRSource') && (
              <TextField
                name="deltaRSource"
                label="Delta-R source"
                labelInfo="(optional)"
                helperText="The regional Delta-R entry this value comes from. Marine samples of the site with one source share one reservoir offset in the age model; without a source, samples with the same Delta-R and error share it."
                value={values.deltaRSource}
                onValueChange={set('deltaRSource')}
                error={errorOf('deltaRSource')}
              />
            )}
            {polarMarine && (
              <Callout intent={Intent.WARNING} icon={IconNames.WARNING_SIGN} compact>
                This site lies above 60° latitude: Marine20 is not meant for polar waters.
              </Callout>
            )}
          </>
        )}
        {values.method === 'LUMINESCENCE' && (
          <>
            <div className="sc-field-row">
              <NumberField
                name="calendarAgeBp"
                label="Age"
                unit="years"
                helperText="before the measurement year"
                value={values.calendarAgeBp}
                onValueChange={set('calendarAgeBp')}
                error={errorOf('calendarAgeBp')}
              />
              <NumberField name="calendarErrorYears" label="Error (1σ)" unit="years" value={values.calendarErrorYears} onValueChange={set('calendarErrorYears')} error={errorOf('calendarErrorYears')} />
              <NumberField name="measurementYear" label="Measured in" unit="CE" value={values.measurementYear} onValueChange={set('measurementYear')} error={errorOf('measurementYear')} />
            </div>
            {luminescenceAge !== null && luminescenceAge !== undefined && measurementYear !== null && measurementYear !== undefined && (
              <p className={`${Classes.TEXT_MUTED} sc-form-note`}>
                That is <span className="num">{age(luminescenceCalBp(luminescenceAge, measurementYear))}</span>.
              </p>
            )}
          </>
        )}
        {(values.method === 'HISTORICAL' || values.method === 'TEPHRA') && (
          <>
            <div className="sc-field-row">
              <SelectField
                name="calendarEntry"
                label="Given as"
                value={calendarEntry}
                options={[
                  { value: 'CAL_BP', label: 'cal BP' },
                  { value: 'CE', label: 'year CE' },
                  { value: 'BCE', label: 'year BCE' },
                ]}
                onValueChange={handleCalendarEntryChange}
                className="sc-field-narrow"
              />
              {calendarEntry === 'CAL_BP' ? (
                <NumberField name="calendarAgeBp" label="Centre of the range" unit="cal BP" value={values.calendarAgeBp} onValueChange={set('calendarAgeBp')} error={errorOf('calendarAgeBp')} />
              ) : (
                <NumberField
                  name="calendarYear"
                  label="Centre of the range"
                  unit={calendarEntry}
                  value={calendarYear}
                  onValueChange={(text) => handleCalendarYearChange(text)}
                  error={errorOf('calendarAgeBp')}
                />
              )}
              <NumberField name="calendarErrorYears" label="Half-width" unit="years" value={values.calendarErrorYears} onValueChange={set('calendarErrorYears')} error={errorOf('calendarErrorYears')} />
            </div>
            {tieCentre != null && tieHalfWidth != null && (
              <p className={`${Classes.TEXT_MUTED} sc-form-note`}>
                The range is <span className="num">{range(tieCentre + tieHalfWidth, tieCentre - tieHalfWidth)}</span>.
              </p>
            )}
          </>
        )}
      </fieldset>

      <div className="sc-field-row sc-field-row-center">
        <Switch checked={values.excluded} onChange={handleExcludedChange} label="Exclude from age models" className="sc-switch" />
        {values.excluded && (
          <TextField name="exclusionReason" label="Reason" value={values.exclusionReason} onValueChange={set('exclusionReason')} error={errorOf('exclusionReason')} />
        )}
      </div>
      <TextAreaField name="notes" label="Notes" value={values.notes} onValueChange={set('notes')} error={errorOf('notes')} />
      {sample?.calibrationError && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} compact title="Not calibrated">
          {sample.calibrationError}
        </Callout>
      )}
    </FormDialog>
  );
}
