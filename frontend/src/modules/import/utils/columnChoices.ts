import { SAMPLE_IMPORT_COLUMNS, type SampleImportColumn } from './template';

/** How the server read one header (`ImportColumn`). */
export type ReadColumn = { header: string; field?: string | null; source: 'NAME' | 'CHOSEN' | 'REMEMBERED' | 'UNKNOWN' };

/** The user's choices for this sheet, by header as written: a field, or null to ignore the column. */
export type ColumnChoices = Readonly<Record<string, SampleImportColumn | null>>;

/** The value of a header's select: a field, IGNORE, or UNCHOSEN for an unrecognised header. */
export const IGNORE = 'ignore';
export const UNCHOSEN = '';
export type ChoiceValue = SampleImportColumn | typeof IGNORE | typeof UNCHOSEN;

export function isSampleImportColumn(value: string): value is SampleImportColumn {
  return (SAMPLE_IMPORT_COLUMNS as readonly string[]).includes(value);
}

/** What a header's select shows: the user's choice if any, else how the server read it. */
export function choiceValueOf(column: ReadColumn, choices: ColumnChoices): ChoiceValue {
  if (column.header in choices) return choices[column.header] ?? IGNORE;
  if (column.field && isSampleImportColumn(column.field)) return column.field;
  return column.source === 'UNKNOWN' ? UNCHOSEN : IGNORE;
}

/** The choices after the user picks `value` for `header` (UNCHOSEN forgets the choice). */
export function withChoice(choices: ColumnChoices, header: string, value: ChoiceValue): ColumnChoices {
  const { [header]: _dropped, ...rest } = choices;
  if (value === UNCHOSEN) return rest;
  return { ...rest, [header]: value === IGNORE ? null : value };
}

/** The `columnChoices` of the import request. */
export function choicesInput(choices: ColumnChoices): { header: string; field: SampleImportColumn | null }[] {
  return Object.entries(choices).map(([header, field]) => ({ header, field }));
}

/** Where an import problem lies, as the problem table's first column says it. */
export function problemPlace(problem: { row: number; scope: 'HEADER' | 'SHEET' | 'ROW' }): string {
  if (problem.scope === 'HEADER') return 'Header';
  if (problem.scope === 'SHEET') return 'Sheet';
  return `Row ${problem.row}`;
}

/** Words for how a header was read, beside its select. */
export const SOURCE_LABELS: Readonly<Record<ReadColumn['source'], string>> = {
  NAME: 'our field name',
  CHOSEN: 'chosen for this sheet',
  REMEMBERED: 'remembered for this project',
  UNKNOWN: 'not recognised',
};
