import { Button, Callout, Intent, SegmentedControl } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState, type FormEvent } from 'react';
import type { CountingRuleInput, RecurrenceSetupQuery } from '@/gql/graphql';
import { CountingRulePanel } from '@/modules/recurrence/components/CountingRulePanel';
import { defaultCountingRule, readCountingRule, type CountingRuleForm } from '@/modules/recurrence/utils/eventCounting';
import {
  defaultRecurrenceSettings,
  readRecurrenceSettings,
  type RecurrenceSettingsField,
  type RecurrenceSettingsForm,
  type RecurrenceSettingsInput,
  type RecurrenceTarget,
} from '@/modules/recurrence/utils/recurrenceForm';
import { NumberField, SelectField, TextField } from '@/modules/ui/components/FormFields';
import type { FieldErrors } from '@/modules/ui/utils/formFields';

const TARGET_OPTIONS = [
  { value: 'segment', label: 'Segment + hypothesis' },
  { value: 'site', label: 'Single site' },
];

export type RecurrenceSetupFormProps = {
  project: RecurrenceSetupQuery['project'];
  starting: boolean;
  error: string | null;
  /** `compareHypothesisId`: run the same setting (same seed) on this hypothesis too, to compare. */
  onStart: (input: RecurrenceSettingsInput & { countingRule?: CountingRuleInput | null }, compareHypothesisId: string | null) => void;
};

/** A second hypothesis is optional. */
const NO_SECOND = '';

/** Settings of a new recurrence analysis and the button that starts it. */
export function RecurrenceSetupForm({ project, starting, error, onStart }: RecurrenceSetupFormProps) {
  const [values, setValues] = useState<RecurrenceSettingsForm>(() => ({
    ...defaultRecurrenceSettings(new Date().getFullYear(), project.preferredHypothesis?.id ?? project.hypotheses[0]?.id ?? null),
    segmentId: project.segments[0]?.id ?? '',
    siteId: project.sites[0]?.id ?? '',
  }));
  const [errors, setErrors] = useState<FieldErrors<RecurrenceSettingsField>>({});
  const [rule, setRule] = useState<CountingRuleForm>(defaultCountingRule);
  const [secondHypothesisId, setSecondHypothesisId] = useState<string>(NO_SECOND);
  const change = (field: RecurrenceSettingsField) => (value: string) => setValues((previous) => ({ ...previous, [field]: value }));
  const handleTargetChange = (value: string) => setValues((previous) => ({ ...previous, target: value as RecurrenceTarget }));
  const handleSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const result = readRecurrenceSettings(values);
    const countingRule = readCountingRule(rule);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    // The rule's own fields show their problems in the panel.
    if (values.target === 'segment' && !countingRule.ok) return;
    const second = values.target === 'segment' && secondHypothesisId !== NO_SECOND && secondHypothesisId !== values.hypothesisId ? secondHypothesisId : null;
    setErrors({});
    onStart(values.target === 'segment' && countingRule.ok ? { ...result.input, countingRule: countingRule.input } : result.input, second);
  };
  const segmentOptions = project.segments.map((segment) => ({ value: segment.id, label: segment.name }));
  const hypothesisOptions = project.hypotheses.map((hypothesis) => ({ value: hypothesis.id, label: `${hypothesis.name}${hypothesis.preferred ? ' (preferred)' : ''}` }));
  const secondOptions = [
    { value: NO_SECOND, label: 'No second hypothesis' },
    ...hypothesisOptions.filter((option) => option.value !== values.hypothesisId),
  ];
  const second = secondHypothesisId !== values.hypothesisId && secondHypothesisId !== NO_SECOND ? secondHypothesisId : null;
  const siteOptions = project.sites.map((site) => ({ value: site.id, label: `${site.name} (${site.kind.toLowerCase()})` }));
  return (
    <form onSubmit={handleSubmit} noValidate>
      {error && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout">
          {error}
        </Callout>
      )}
      <SegmentedControl size="small" options={TARGET_OPTIONS} value={values.target} onValueChange={handleTargetChange} aria-label="Analyse" />
      <div className="sc-recurrence-setup">
        {values.target === 'segment' ? (
          <>
            <SelectField name="segmentId" label="Segment" value={values.segmentId} options={segmentOptions} onValueChange={change('segmentId')} error={errors.segmentId} fill />
            <SelectField name="hypothesisId" label="Hypothesis" value={values.hypothesisId} options={hypothesisOptions} onValueChange={change('hypothesisId')} error={errors.hypothesisId} fill />
            <SelectField
              name="secondHypothesisId"
              label="Also run on"
              labelInfo="(to compare)"
              value={second ?? NO_SECOND}
              options={secondOptions}
              onValueChange={setSecondHypothesisId}
              fill
            />
          </>
        ) : (
          <SelectField name="siteId" label="Site" value={values.siteId} options={siteOptions} onValueChange={change('siteId')} error={errors.siteId} fill />
        )}
        <NumberField name="forecastStartYear" label="Forecast from" unit="CE" value={values.forecastStartYear} onValueChange={change('forecastStartYear')} error={errors.forecastStartYear} />
        <TextField name="windows" label="Windows, years" value={values.windows} onValueChange={change('windows')} error={errors.windows} />
        <NumberField name="draws" label="Draws" value={values.draws} onValueChange={change('draws')} error={errors.draws} />
        <NumberField name="seed" label="Seed" labelInfo="(blank: random)" value={values.seed} onValueChange={change('seed')} error={errors.seed} />
      </div>
      {values.target === 'segment' && (
        <CountingRulePanel
          projectId={project.id}
          segmentId={values.segmentId}
          hypothesisId={values.hypothesisId}
          secondHypothesisId={second}
          form={rule}
          onChange={setRule}
        />
      )}
      <Button type="submit" intent={Intent.PRIMARY} icon={IconNames.PLAY} text="Start analysis" loading={starting} />
    </form>
  );
}
