import { Button, Callout, FormGroup, Intent, Radio, RadioGroup } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState, type FormEvent } from 'react';
import {
  initialRunSettings,
  readRunSettings,
  withDepthModel,
  type DepthModelChoice,
  type DepthModelSite,
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
  /** The site the run is for: its kind and units choose the starting depth model. */
  site: DepthModelSite;
  /** The server's problems with the form's own fields (BAD_USER_INPUT), shown on each field. */
  serverErrors?: Partial<Record<string, string>>;
};

/** The depth models in our own words, one line each. */
const DEPTH_MODEL_TEXT: Record<DepthModelChoice, { label: string; line: string }> = {
  ORDER_ONLY: {
    label: 'Order only',
    line: 'Ages only keep the order of the units; depth adds nothing. For trenches, marshes and outcrops.',
  },
  HEMIPELAGIC_RATE: {
    label: 'Hemipelagic rate',
    line: 'Ages follow the mud between event beds, settling at a slowly varying rate; each bed counts as instant. For turbidite cores.',
  },
};

/** Settings of a new age model run and the button that starts it. */
export function RunSettingsForm({ onStart, starting, busy, error, site, serverErrors = {} }: RunSettingsFormProps) {
  const [values, setValues] = useState<RunSettingsValues>(() => initialRunSettings(site));
  const [errors, setErrors] = useState<FieldErrors<RunSettingsField>>({});
  // Fields changed since the last start: the server's word on them no longer applies.
  const [edited, setEdited] = useState<ReadonlySet<RunSettingsField>>(new Set());
  const markEdited = (field: RunSettingsField) => setEdited((previous) => (previous.has(field) ? previous : new Set(previous).add(field)));
  const change = (field: Exclude<RunSettingsField, 'depthModel'>) => (value: string) => {
    markEdited(field);
    setValues((previous) => ({ ...previous, [field]: value }));
  };
  const errorOf = (field: RunSettingsField) => errors[field] ?? (edited.has(field) ? undefined : serverErrors[field]);
  const handleDepthModel = (event: FormEvent<HTMLInputElement>) => {
    const next = event.currentTarget.value as DepthModelChoice;
    markEdited('depthModel');
    setValues((previous) => withDepthModel(previous, next));
  };
  const hemipelagic = values.depthModel === 'HEMIPELAGIC_RATE';
  const handleSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const result = readRunSettings(values);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    setEdited(new Set());
    onStart(result.input);
  };
  return (
    <form className="sc-run-settings" onSubmit={handleSubmit} noValidate>
      {error && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout">
          {error}
        </Callout>
      )}
      <FormGroup
        label="Depth model"
        helperText={errorOf('depthModel') ?? DEPTH_MODEL_TEXT[values.depthModel].line}
        intent={errorOf('depthModel') ? Intent.DANGER : Intent.NONE}
        className="sc-depth-model-field"
      >
        <RadioGroup name="depthModel" inline selectedValue={values.depthModel} onChange={handleDepthModel}>
          {(['HEMIPELAGIC_RATE', 'ORDER_ONLY'] as const).map((model) => (
            <Radio key={model} value={model} label={DEPTH_MODEL_TEXT[model].label} />
          ))}
        </RadioGroup>
      </FormGroup>
      <div className="sc-run-settings-fields">
        {hemipelagic && (
          <NumberField
            name="hemipelagicRateCmPerKyr"
            label="Mud rate, prior mean"
            helperText="Blank: measured from the dated levels. Type your own estimate to set it instead"
            unit="cm/kyr"
            value={values.hemipelagicRateCmPerKyr}
            onValueChange={change('hemipelagicRateCmPerKyr')}
            error={errorOf('hemipelagicRateCmPerKyr')}
          />
        )}
        <NumberField name="seed" label="Seed" labelInfo="(blank: random)" value={values.seed} onValueChange={change('seed')} error={errorOf('seed')} />
        <NumberField name="iterations" label="Iterations per chain" value={values.iterations} onValueChange={change('iterations')} error={errorOf('iterations')} />
        <NumberField name="chains" label="Chains" value={values.chains} onValueChange={change('chains')} error={errorOf('chains')} />
        <NumberField
          name="outlierPrior"
          label="Chance a sample is misplaced"
          helperText="Before the run, for every sample alike: reworked, intruded or mislabelled. 0.05 (1 in 20) is the usual starting point"
          value={values.outlierPrior}
          onValueChange={change('outlierPrior')}
          error={errorOf('outlierPrior')}
        />
        <NumberField
          name="outlierShiftScaleYears"
          label="Misplaced sample's shift"
          helperText="Typical size of the age gap between a misplaced sample and its level. 500 yr: reworked or burrowed material is usually off by centuries; raise it for long or old sequences"
          unit="yr"
          value={values.outlierShiftScaleYears}
          onValueChange={change('outlierShiftScaleYears')}
          error={errorOf('outlierShiftScaleYears')}
        />
        <NumberField
          name="inheritanceScaleYears"
          label="Inheritance scale"
          helperText="Exponential prior on detrital age offsets"
          unit="yr"
          value={values.inheritanceScaleYears}
          onValueChange={change('inheritanceScaleYears')}
          error={errorOf('inheritanceScaleYears')}
        />
      </div>
      <Button type="submit" intent={Intent.PRIMARY} icon={IconNames.PLAY} text="Start run" loading={starting} disabled={busy} />
    </form>
  );
}
