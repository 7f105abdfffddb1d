/**
 * The one error the calibration engine throws for input it cannot turn into a calendar age. It
 * names the offending input field so the API can attach the message to that field of a form or
 * of an import row; the message is written for the researcher who typed the value.
 */
export class CalibrationInputError extends Error {
  constructor(
    /** The input field at fault, in the sample's own names (`c14Age`, `deltaR`, `curve`, ...). */
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = 'CalibrationInputError';
  }
}

/** Whole years with thousands separators, independent of the server's locale: 50193 -> "50,193". */
export function formatYears(value: number): string {
  const rounded = Math.round(value);
  const digits = String(Math.abs(rounded)).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return rounded < 0 ? `-${digits}` : digits;
}

/**
 * Re-label the field of a CalibrationInputError thrown by `run`, for adapters whose inputs use
 * other names than the function they call (a luminescence age arrives as `calendarAgeBp`).
 */
export function withFieldNames<T>(fieldNames: Readonly<Record<string, string>>, run: () => T): T {
  try {
    return run();
  } catch (error) {
    if (error instanceof CalibrationInputError && error.field in fieldNames) {
      throw new CalibrationInputError(fieldNames[error.field], error.message);
    }
    throw error;
  }
}
