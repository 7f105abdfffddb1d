/** The calibration engine's public surface: import from here, not from the files behind it. */
export type { CalibrationCurve, CurvePoint } from './curve';
export { CurveFormatError, curveC14Range, curveFromPoints, parseCurve, parseCurvePoints } from './curve';
export { CalibrationInputError } from './errors';
export type { CalibrationResult, RadiocarbonInput } from './calibrate';
export { TRIM_RELATIVE_THRESHOLD, calibrateRadiocarbon, calibrationResult } from './calibrate';
export type { CalendarRangeInput, LuminescenceInput } from './calendar-ages';
export { calendarRange, calibrateLuminescence } from './calendar-ages';
export type { CurveLookup, DatingMethod, SampleCalibrationOptions, SampleDating } from './sample-calibration';
export { calibrationForSample } from './sample-calibration';
export { MAX_AGE_ERROR_YEARS, MAX_AGE_YEARS, MAX_CALENDAR_GRID_YEARS } from './bounds';
export type { CurveCoverage, CurveMeta } from './custom-curve';
export { validateCurveText } from './custom-curve';
