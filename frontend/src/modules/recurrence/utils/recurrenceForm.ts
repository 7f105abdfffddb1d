/** The recurrence analysis settings form: what is typed, and the API input it becomes. */
import { FieldReader, type FormResult } from '@/modules/ui/utils/formFields';

export type RecurrenceTarget = 'segment' | 'site';

export type RecurrenceSettingsForm = {
  target: RecurrenceTarget;
  segmentId: string;
  hypothesisId: string;
  siteId: string;
  forecastStartYear: string;
  /** Window lengths in years, separated by commas or spaces. */
  windows: string;
  draws: string;
  seed: string;
};

export type RecurrenceSettingsField = keyof RecurrenceSettingsForm;

export type RecurrenceSettingsInput = {
  segmentId: string | null;
  hypothesisId: string | null;
  siteId: string | null;
  forecastStartYear: number | null;
  windowsYears: number[];
  draws: number | null;
  seed: number | null;
};

/** Forecast windows offered by default, years. */
export const DEFAULT_WINDOWS_YEARS = [30, 50, 100] as const;

/** The form's first values: this year, the usual windows, 10 000 draws and a random seed. */
export function defaultRecurrenceSettings(thisYear: number, preferredHypothesisId: string | null): RecurrenceSettingsForm {
  return {
    target: 'segment',
    segmentId: '',
    hypothesisId: preferredHypothesisId ?? '',
    siteId: '',
    forecastStartYear: String(thisYear),
    windows: DEFAULT_WINDOWS_YEARS.join(', '),
    draws: '10000',
    seed: '',
  };
}

/**
 * Check the settings. A segment analysis needs a segment and a hypothesis (which events are the
 * same earthquake); a single-site analysis needs only the site. Windows are positive years,
 * duplicates dropped and sorted.
 */
export function readRecurrenceSettings(form: RecurrenceSettingsForm): FormResult<RecurrenceSettingsInput, RecurrenceSettingsField> {
  const reader = new FieldReader<RecurrenceSettingsField>();
  const bySegment = form.target === 'segment';
  if (bySegment) {
    reader.text('segmentId', form.segmentId, { required: true });
    reader.text('hypothesisId', form.hypothesisId, { required: true });
  } else {
    reader.text('siteId', form.siteId, { required: true });
  }
  const forecastStartYear = reader.number('forecastStartYear', form.forecastStartYear, { integer: true, min: 1, max: 3000 });
  const draws = reader.number('draws', form.draws, { integer: true, min: 100, max: 200_000 });
  const seed = reader.number('seed', form.seed, { integer: true, min: 0, max: 2_147_483_647 });
  const parts = form.windows.split(/[\s,;]+/).filter((part) => part !== '');
  const windows = parts.map(Number);
  if (parts.length === 0) reader.fail('windows', 'required');
  else if (windows.some((window) => !Number.isFinite(window) || window <= 0 || window > 10_000)) reader.fail('windows', 'years between 0 and 10000, separated by commas');
  return reader.result({
    segmentId: bySegment ? form.segmentId : null,
    hypothesisId: bySegment ? form.hypothesisId : null,
    siteId: bySegment ? null : form.siteId,
    forecastStartYear,
    windowsYears: [...new Set(windows)].sort((a, b) => a - b),
    draws,
    seed,
  });
}
