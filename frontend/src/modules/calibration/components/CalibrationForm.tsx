import { Button, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState, type FormEvent } from 'react';
import type { CalibrateInput, CalibrationCurvesQuery, CurveCode } from '@/gql/graphql';
import {
  readCalibrationForm,
  type CalibrationFormField,
  type CalibrationFormValues,
} from '@/modules/calibration/utils/calibrationForm';
import { NumberField, SelectField } from '@/modules/ui/components/FormFields';
import type { FieldErrors } from '@/modules/ui/utils/formFields';

export type CalibrationFormProps = {
  initialValues: CalibrationFormValues;
  curves: CalibrationCurvesQuery['calibrationCurves'];
  /** Problems the server found, by field. */
  serverErrors?: Record<string, string>;
  submitting?: boolean;
  onCalibrate: (input: CalibrateInput) => void;
};

/** A radiocarbon age to calibrate: age, error, curve, and Delta-R for a marine curve. */
export function CalibrationForm({ initialValues, curves, serverErrors = {}, submitting = false, onCalibrate }: CalibrationFormProps) {
  const [values, setValues] = useState(initialValues);
  const [errors, setErrors] = useState<FieldErrors<CalibrationFormField>>({});
  const marineCurves = new Set(curves.filter((curve) => curve.marine).map((curve) => curve.code));
  const marine = marineCurves.has(values.curve);
  const curveOptions = curves.map((curve) => ({ value: curve.code as CurveCode, label: curve.name }));

  const set = (field: Exclude<CalibrationFormField, 'curve'>) => (value: string) => setValues((previous) => ({ ...previous, [field]: value }));
  const handleCurveChange = (curve: CurveCode) => setValues((previous) => ({ ...previous, curve }));
  const errorOf = (field: CalibrationFormField) => errors[field] ?? serverErrors[field];
  const handleSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const result = readCalibrationForm(values, marine);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    onCalibrate(result.input);
  };

  return (
    <form onSubmit={handleSubmit} noValidate className="sc-calibration-form">
      <NumberField name="c14Age" label="Conventional 14C age" unit="14C yr BP" value={values.c14Age} onValueChange={set('c14Age')} error={errorOf('c14Age')} />
      <NumberField name="c14Error" label="Error (1σ)" unit="14C yr" value={values.c14Error} onValueChange={set('c14Error')} error={errorOf('c14Error')} />
      <SelectField name="curve" label="Curve" value={values.curve} options={curveOptions} onValueChange={handleCurveChange} error={errorOf('curve')} />
      {marine && (
        <>
          <div className="sc-field-row">
            <NumberField name="deltaR" label="Delta-R" unit="14C yr" value={values.deltaR} onValueChange={set('deltaR')} error={errorOf('deltaR')} />
            <NumberField name="deltaRError" label="± error" unit="14C yr" value={values.deltaRError} onValueChange={set('deltaRError')} error={errorOf('deltaRError')} />
          </div>
          <NumberField
            name="latitude"
            label="Latitude"
            unit="°"
            labelInfo="(optional)"
            helperText="checked against the polar limit of the marine curve"
            value={values.latitude}
            onValueChange={set('latitude')}
            error={errorOf('latitude')}
          />
        </>
      )}
      <Button type="submit" intent={Intent.PRIMARY} icon={IconNames.CALCULATOR} text="Calibrate" loading={submitting} fill />
    </form>
  );
}
