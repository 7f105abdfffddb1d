/** Problems with a form's fields, by field name; a field with no entry is fine. */
export type FieldErrors<TField extends string = string> = Partial<Record<TField, string>>;

/** The outcome of checking a form: the API input, or the field problems to show. */
export type FormResult<TInput, TField extends string = string> =
  | { ok: true; input: TInput }
  | { ok: false; errors: FieldErrors<TField> };

export type NumberRule = {
  required?: boolean;
  integer?: boolean;
  min?: number;
  max?: number;
  /** Strictly greater than this (for errors and thicknesses). */
  above?: number;
};

export type NumberReading = { value: number | null; error?: undefined } | { value?: undefined; error: string };

/**
 * Read a typed number. Blank is null (or an error when required); a lone decimal comma is read
 * as a point, since lab sheets are written both ways.
 */
export function readNumber(text: string, rule: NumberRule = {}): NumberReading {
  const trimmed = text.trim();
  if (trimmed === '') {
    return rule.required ? { error: 'required' } : { value: null };
  }
  const normalised = /^[-+]?\d+,\d+$/.test(trimmed) ? trimmed.replace(',', '.') : trimmed;
  const value = Number(normalised);
  if (!Number.isFinite(value) || !/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(normalised)) {
    return { error: 'not a number' };
  }
  if (rule.integer && !Number.isInteger(value)) {
    return { error: 'must be a whole number' };
  }
  if (rule.min !== undefined && value < rule.min) {
    return { error: `must be at least ${rule.min}` };
  }
  if (rule.max !== undefined && value > rule.max) {
    return { error: `must be at most ${rule.max}` };
  }
  if (rule.above !== undefined && !(value > rule.above)) {
    return { error: `must be greater than ${rule.above}` };
  }
  return { value };
}

/** A number as form text: empty for null, else as typed by JavaScript. */
export function numberText(value: number | null | undefined): string {
  return value === null || value === undefined ? '' : String(value);
}

/** Trimmed text, or null when blank (for optional text fields such as notes). */
export function optionalText(text: string): string | null {
  const trimmed = text.trim();
  return trimmed === '' ? null : trimmed;
}

/**
 * Collects field readings so a form function can read every field, then report all problems at
 * once rather than the first.
 */
export class FieldReader<TField extends string> {
  readonly errors: FieldErrors<TField> = {};

  number(field: TField, text: string, rule: NumberRule = {}): number | null {
    const reading = readNumber(text, rule);
    if (reading.error !== undefined) {
      this.errors[field] = reading.error;
      return null;
    }
    return reading.value;
  }

  text(field: TField, text: string, { required = false, pattern }: { required?: boolean; pattern?: [RegExp, string] } = {}): string {
    const trimmed = text.trim();
    if (required && trimmed === '') {
      this.errors[field] = 'required';
    } else if (pattern && trimmed !== '' && !pattern[0].test(trimmed)) {
      this.errors[field] = pattern[1];
    }
    return trimmed;
  }

  fail(field: TField, message: string): void {
    this.errors[field] ??= message;
  }

  get ok(): boolean {
    return Object.keys(this.errors).length === 0;
  }

  /** The input when every field was fine, else the problems. */
  result<TInput>(input: TInput): FormResult<TInput, TField> {
    return this.ok ? { ok: true, input } : { ok: false, errors: this.errors };
  }
}
