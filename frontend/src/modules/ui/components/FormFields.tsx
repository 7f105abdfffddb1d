import { FormGroup, HTMLSelect, InputGroup, Intent, TextArea, Tag } from '@blueprintjs/core';
import type { ChangeEvent, ReactNode } from 'react';

type BaseFieldProps = {
  /** Input name; also the id the label points at. */
  name: string;
  label: ReactNode;
  error?: string | undefined;
  helperText?: ReactNode;
  labelInfo?: ReactNode;
  disabled?: boolean;
  inline?: boolean;
  className?: string;
};

export type TextFieldProps = BaseFieldProps & {
  value: string;
  onValueChange: (value: string) => void;
  placeholder?: string;
  autoFocus?: boolean;
  type?: 'text' | 'email' | 'password';
  autoComplete?: string;
};

/** A labelled text input that shows its problem beneath it in the danger colour. */
export function TextField({
  name,
  label,
  error,
  helperText,
  labelInfo,
  disabled,
  inline,
  className,
  value,
  onValueChange,
  placeholder,
  autoFocus,
  type = 'text',
  autoComplete,
}: TextFieldProps) {
  const intent = error ? Intent.DANGER : Intent.NONE;
  const handleChange = (event: ChangeEvent<HTMLInputElement>) => onValueChange(event.target.value);
  return (
    <FormGroup
      label={label}
      labelFor={name}
      labelInfo={labelInfo}
      helperText={error ?? helperText}
      intent={intent}
      disabled={disabled}
      inline={inline}
      className={className}
    >
      <InputGroup
        id={name}
        name={name}
        type={type}
        value={value}
        onChange={handleChange}
        intent={intent}
        disabled={disabled}
        placeholder={placeholder}
        autoFocus={autoFocus}
        autoComplete={autoComplete}
      />
    </FormGroup>
  );
}

export type NumberFieldProps = BaseFieldProps & {
  value: string;
  onValueChange: (value: string) => void;
  /** Unit shown at the right of the input ("m", "14C yr", "km"). */
  unit?: string;
  placeholder?: string;
};

/**
 * A labelled number input kept as text (so "1," can be typed on the way to "1,5"), in the
 * monospaced face, with its unit at the right.
 */
export function NumberField({
  name,
  label,
  error,
  helperText,
  labelInfo,
  disabled,
  inline,
  className,
  value,
  onValueChange,
  unit,
  placeholder,
}: NumberFieldProps) {
  const intent = error ? Intent.DANGER : Intent.NONE;
  const handleChange = (event: ChangeEvent<HTMLInputElement>) => onValueChange(event.target.value);
  return (
    <FormGroup
      label={label}
      labelFor={name}
      labelInfo={labelInfo}
      helperText={error ?? helperText}
      intent={intent}
      disabled={disabled}
      inline={inline}
      className={className}
    >
      <InputGroup
        id={name}
        name={name}
        className="num"
        inputMode="decimal"
        value={value}
        onChange={handleChange}
        intent={intent}
        disabled={disabled}
        placeholder={placeholder}
        rightElement={unit ? <Tag minimal>{unit}</Tag> : undefined}
      />
    </FormGroup>
  );
}

export type SelectOption<TValue extends string> = { value: TValue; label: string; disabled?: boolean };

export type SelectFieldProps<TValue extends string> = BaseFieldProps & {
  value: TValue;
  options: readonly SelectOption<TValue>[];
  onValueChange: (value: TValue) => void;
  fill?: boolean;
};

/** A labelled native select over a fixed set of values. */
export function SelectField<TValue extends string>({
  name,
  label,
  error,
  helperText,
  labelInfo,
  disabled,
  inline,
  className,
  value,
  options,
  onValueChange,
  fill = true,
}: SelectFieldProps<TValue>) {
  const handleChange = (event: ChangeEvent<HTMLSelectElement>) => onValueChange(event.target.value as TValue);
  return (
    <FormGroup
      label={label}
      labelFor={name}
      labelInfo={labelInfo}
      helperText={error ?? helperText}
      intent={error ? Intent.DANGER : Intent.NONE}
      disabled={disabled}
      inline={inline}
      className={className}
    >
      <HTMLSelect id={name} name={name} value={value} onChange={handleChange} disabled={disabled} fill={fill}>
        {options.map((option) => (
          <option key={option.value} value={option.value} disabled={option.disabled}>
            {option.label}
          </option>
        ))}
      </HTMLSelect>
    </FormGroup>
  );
}

export type TextAreaFieldProps = BaseFieldProps & {
  value: string;
  onValueChange: (value: string) => void;
  rows?: number;
};

/** A labelled multi-line text input for notes. */
export function TextAreaField({ name, label, error, helperText, disabled, className, value, onValueChange, rows = 2 }: TextAreaFieldProps) {
  const handleChange = (event: ChangeEvent<HTMLTextAreaElement>) => onValueChange(event.target.value);
  return (
    <FormGroup
      label={label}
      labelFor={name}
      helperText={error ?? helperText}
      intent={error ? Intent.DANGER : Intent.NONE}
      disabled={disabled}
      className={className}
    >
      <TextArea id={name} name={name} value={value} onChange={handleChange} disabled={disabled} rows={rows} fill />
    </FormGroup>
  );
}
