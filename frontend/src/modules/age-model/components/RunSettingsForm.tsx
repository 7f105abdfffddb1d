import { Button, Callout, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState, type FormEvent } from 'react';
import {
  DEFAULT_RUN_SETTINGS,
  readRunSettings,
  type RunSettingsField,
  type RunSettingsForm as RunSettingsValues,
  type RunSettingsInput,
} from '@/modules/age-model/utils/ageModelView';
import { NumberField } from '@/modules/ui/components/FormFields';
import type { FieldErrors } from '@/modules/ui/utils/formFields';

export type RunSettingsFormProps = {
  onStart: (settings: RunSettingsInput) => void;
  starting: boolean;
  /** A run of this site is queued or running: a second one waits until it ends. */
  busy: boolean;
  error: string | null;
};

/** Settings of a new age model run and the button that starts it. */
export function RunSettingsForm({ onStart, starting, busy, error }: RunSettingsFormProps) {
  const [values, setValues] = useState<RunSettingsValues>(DEFAULT_RUN_SETTINGS);
  const [errors, setErrors] = useState<FieldErrors<RunSettingsField>>({});
  const change = (field: RunSettingsField) => (value: string) => setValues((previous) => ({ ...previous, [field]: value }));
  const handleSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const result = readRunSettings(values);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    onStart(result.input);
  };
  return (
    <form className="sc-run-settings" onSubmit={handleSubmit} noValidate>
      {error && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout">
          {error}
        </Callout>
      )}
      <div className="sc-run-settings-fields">
        <NumberField name="seed" label="Seed" labelInfo="(blank: random)" value={values.seed} onValueChange={change('seed')} error={errors.seed} />
        <NumberField name="iterations" label="Iterations per chain" value={values.iterations} onValueChange={change('iterations')} error={errors.iterations} />
        <NumberField name="chains" label="Chains" value={values.chains} onValueChange={change('chains')} error={errors.chains} />
        <NumberField
          name="outlierPrior"
          label="Chance a sample is misplaced"
          helperText="Before the run, for every sample alike: reworked, intruded or mislabelled. 0.05 (1 in 20) is the usual starting point"
          value={values.outlierPrior}
          onValueChange={change('outlierPrior')}
          error={errors.outlierPrior}
        />
        <NumberField
          name="inheritanceScaleYears"
          label="Inheritance scale"
          helperText="Exponential prior on detrital age offsets"
          unit="yr"
          value={values.inheritanceScaleYears}
          onValueChange={change('inheritanceScaleYears')}
          error={errors.inheritanceScaleYears}
        />
      </div>
      <Button type="submit" intent={Intent.PRIMARY} icon={IconNames.PLAY} text="Start run" loading={starting} disabled={busy} />
    </form>
  );
}
