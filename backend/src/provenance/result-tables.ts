/**
 * The tables a paper needs, as CSV and JSON: a run's event ages, a hypothesis' regional events and
 * an analysis' event table. Every table names its inputs (with names first and ids beside them)
 * and its seed; ages are given in cal BP (years before AD 1950) and as calendar years CE/BCE, as
 * the median and the 68.3 % and 95.4 % highest-density ranges. Pure functions.
 */
import { calBpToYearCe, formatCeBce, type HpdRange } from '../chronology/common/density';
import { type CsvValue, toCsv } from '../common/csv';

/** One line of a table's inputs block: what the numbers came from. */
export interface TableInput {
  readonly field: string;
  readonly value: CsvValue;
}

/** A column: its key in the JSON rows and its title in the CSV. */
export interface TableColumn {
  readonly key: string;
  readonly title: string;
}

/** A downloadable table: its title, inputs, columns and rows. JSON rows may hold more (range arrays). */
export interface ResultTable {
  readonly table: string;
  /** A caution shown first (recurrence tables). */
  readonly caution?: string;
  readonly inputs: readonly TableInput[];
  readonly columns: readonly TableColumn[];
  readonly rows: readonly Record<string, unknown>[];
}

/** The age columns every table shares, in order. */
export const AGE_COLUMNS: readonly TableColumn[] = [
  { key: 'medianCalBp', title: 'median (cal BP)' },
  { key: 'medianCeBce', title: 'median (CE/BCE)' },
  { key: 'hpd68CalBp', title: '68.3 % range (cal BP)' },
  { key: 'hpd68CeBce', title: '68.3 % range (CE/BCE)' },
  { key: 'hpd95CalBp', title: '95.4 % range (cal BP)' },
  { key: 'hpd95CeBce', title: '95.4 % range (CE/BCE)' },
  { key: 'hpd95OldestCalBp', title: '95.4 % oldest (cal BP)' },
  { key: 'hpd95YoungestCalBp', title: '95.4 % youngest (cal BP)' },
];

/** A cal BP age as a calendar year label ("801 BCE", "1700 CE"). */
export function ceBce(calBp: number): string {
  return formatCeBce(calBpToYearCe(calBp));
}

/** Ranges as "older to younger" joined by "; " (cal BP), oldest first. */
export function rangesCalBp(ranges: readonly HpdRange[]): string {
  return ranges.map((r) => `${r.olderCalBp} to ${r.youngerCalBp}`).join('; ');
}

/** The same ranges as calendar years. */
export function rangesCeBce(ranges: readonly HpdRange[]): string {
  return ranges.map((r) => `${ceBce(r.olderCalBp)} to ${ceBce(r.youngerCalBp)}`).join('; ');
}

/** Reads `rangesCalBp` text back into [older, younger] pairs (for checking a download). */
export function parseRangesCalBp(text: string): [number, number][] {
  if (text.trim() === '') return [];
  return text.split(';').map((part) => {
    const match = /^\s*(-?[\d.]+) to (-?[\d.]+)\s*$/.exec(part);
    if (!match) throw new Error(`not a range: "${part}"`);
    return [Number(match[1]), Number(match[2])];
  });
}

/** The shared age cells of one summary; JSON keeps the ranges as arrays too. */
export function ageCells(summary: { medianCalBp: number; hpd68: readonly HpdRange[]; hpd95: readonly HpdRange[] } | null): Record<string, unknown> {
  if (!summary) return Object.fromEntries(AGE_COLUMNS.map((c) => [c.key, null]));
  return {
    medianCalBp: summary.medianCalBp,
    medianCeBce: ceBce(summary.medianCalBp),
    hpd68CalBp: rangesCalBp(summary.hpd68),
    hpd68CeBce: rangesCeBce(summary.hpd68),
    hpd95CalBp: rangesCalBp(summary.hpd95),
    hpd95CeBce: rangesCeBce(summary.hpd95),
    hpd95OldestCalBp: summary.hpd95.length > 0 ? Math.max(...summary.hpd95.map((r) => r.olderCalBp)) : null,
    hpd95YoungestCalBp: summary.hpd95.length > 0 ? Math.min(...summary.hpd95.map((r) => r.youngerCalBp)) : null,
    hpd68: summary.hpd68,
    hpd95: summary.hpd95,
  };
}

/** The CSV: the caution (if any), the inputs block, then the table under its title. */
export function tableCsv(table: ResultTable): string {
  const rows: CsvValue[][] = [
    ...(table.caution ? [[table.caution], []] : []),
    ['inputs'],
    ['field', 'value'],
    ...table.inputs.map((i) => [i.field, i.value]),
    [],
    [table.table],
    table.columns.map((c) => c.title),
    ...table.rows.map((row) => table.columns.map((c) => asCell(row[c.key]))),
  ];
  return toCsv(rows);
}

/** The JSON: the same inputs as an object list and the rows with every field. */
export function tableJson(table: ResultTable) {
  return {
    table: table.table,
    ...(table.caution ? { caution: table.caution } : {}),
    inputs: table.inputs,
    columns: table.columns,
    rows: table.rows,
  };
}

function asCell(value: unknown): CsvValue {
  if (value === null || value === undefined) return null;
  if (typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean') return value;
  return JSON.stringify(value);
}
