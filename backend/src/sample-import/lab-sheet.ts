/**
 * Reading and checking a lab sheet (CSV, one sample per row) for one site, before anything is
 * written. Plain code: the caller supplies the site's units, the project's taken lab codes, a
 * calibrator and the sample form's field rules, so a sheet row is refused for exactly the reasons
 * and in the words a single sample would be. Every problem is collected; none stops the check.
 *
 * Row numbers count data records from 1 (the record after the header), blank records included,
 * so row n is line n + 1 of a sheet without multi-line cells. Row 0 is the header (field: the
 * column, or `header` for the list of unrecognised columns) or the sheet as a whole (field `csv`).
 *
 * A header is read as the field it names (ignoring case, spaces and punctuation), or as a choice
 * the caller passes (a user's mapping of "Conventional age" to c14Age, or to nothing).
 */
import Papa from 'papaparse';
import type { HpdRange } from '../chronology/common/density';
import type { DatingMethod, SampleDating } from '../chronology/calibration/sample-calibration';
import { AGE_RELATIONS, AgeRelation, DATING_METHODS, depthOutsideUnit, SAMPLE_MATERIALS, SampleMaterial } from '../samples/sample-rules';

/** The columns of a lab sheet, in template order; must equal frontend/src/modules/import/utils/template.ts. */
export const LAB_SHEET_COLUMNS = [
  'labCode',
  'unit',
  'depthM',
  'method',
  'material',
  'ageRelation',
  'c14Age',
  'c14Error',
  'delta13C',
  'curve',
  'deltaR',
  'deltaRError',
  'deltaRSource',
  'inheritanceScaleYears',
  'calendarAgeBp',
  'calendarErrorYears',
  'measurementYear',
  'excluded',
  'exclusionReason',
  'notes',
] as const;

export type LabSheetColumn = (typeof LAB_SHEET_COLUMNS)[number];

/** Columns a sheet must have; the others may be left out and then read as empty. */
export const REQUIRED_LAB_SHEET_COLUMNS: readonly LabSheetColumn[] = ['labCode', 'unit', 'method', 'material'];

/** Beyond this a sheet is refused whole: it bounds the memory and time one request may take. */
export const MAX_LAB_SHEET_ROWS = 50_000;

const NUMBER_COLUMNS = [
  'depthM', 'c14Age', 'c14Error', 'delta13C', 'deltaR', 'deltaRError', 'inheritanceScaleYears', 'calendarAgeBp', 'calendarErrorYears',
  'measurementYear',
] as const;
type NumberColumn = (typeof NUMBER_COLUMNS)[number];

/** One problem in one row (row 0: the header or the sheet as a whole). */
export interface LabSheetProblem {
  readonly row: number;
  readonly field: string;
  readonly message: string;
}

/** A data row read into typed values. A cell that could not be read is null here and has a problem. */
export interface LabSheetSample extends Record<NumberColumn, number | null> {
  readonly row: number;
  labCode: string | null;
  /** The unit cell as written: a unit name or a position number. */
  unit: string | null;
  method: DatingMethod | null;
  material: SampleMaterial | null;
  /** DATES_DEPOSIT when the cell is empty, as in the sample form. */
  ageRelation: AgeRelation | null;
  /** Upper-cased curve code; whether it is installed is the calibrator's call. */
  curve: string | null;
  /** Name of the regional Delta-R entry. */
  deltaRSource: string | null;
  excluded: boolean;
  exclusionReason: string | null;
  notes: string | null;
}

export interface LabSheetReading {
  /** Data rows that are not blank. */
  readonly rowCount: number;
  readonly samples: LabSheetSample[];
  readonly problems: LabSheetProblem[];
  /** How each non-empty header cell was read, in sheet order (empty when the sheet is empty). */
  readonly columns: LabSheetHeaderColumn[];
}

/**
 * How a header was read: by its own name (our field name, ignoring case, spaces and punctuation),
 * by a choice made for this sheet, by a choice the project remembers, or not at all.
 */
export type HeaderSource = 'NAME' | 'CHOSEN' | 'REMEMBERED' | 'UNKNOWN';

export interface LabSheetHeaderColumn {
  readonly header: string;
  /** The field the column gives; null when unknown or chosen to be ignored. */
  readonly field: LabSheetColumn | null;
  readonly source: HeaderSource;
}

/** A choice for one header: the field it gives, or null to ignore the column. */
export interface HeaderChoice {
  readonly field: LabSheetColumn | null;
  readonly source: 'CHOSEN' | 'REMEMBERED';
}

/** Choices by `headerKey`. */
export type HeaderChoices = ReadonlyMap<string, HeaderChoice>;

/** The key a header is remembered by: trimmed, lower-cased, runs of white space as one space. */
export function headerKey(header: string): string {
  return header.trim().toLowerCase().replace(/\s+/g, ' ');
}

/** "Lab code", "lab_code" and "LABCODE" all name labCode; "Depth (m)" names depthM. */
function nameKey(header: string): string {
  return header.toLowerCase().replace(/[^a-z0-9]/g, '');
}

const COLUMNS_BY_NAME_KEY = new Map<string, LabSheetColumn>(LAB_SHEET_COLUMNS.map((column) => [nameKey(column), column]));

/** The field a header names by itself, if any. */
export function columnNamedBy(header: string): LabSheetColumn | null {
  return COLUMNS_BY_NAME_KEY.get(nameKey(header)) ?? null;
}

export function isLabSheetColumn(value: string): value is LabSheetColumn {
  return (LAB_SHEET_COLUMNS as readonly string[]).includes(value);
}

/** A unit of the site the sheet is imported into. */
export interface LabSheetUnit {
  readonly id: string;
  readonly name: string;
  /** 1 is the oldest unit at the base of the column. */
  readonly position: number;
  readonly topDepthM: number;
  readonly baseDepthM: number;
}

/** What a calibrator must give back for the preview. */
export interface LabSheetCalibration {
  readonly medianCalBp: number;
  readonly hpd95: readonly HpdRange[];
  readonly warnings: readonly string[];
}

/** A field-level refusal, as the calibrator and the field rules report it. */
export interface FieldProblem {
  readonly field: string;
  readonly message: string;
}

export interface LabSheetContext<C extends LabSheetCalibration> {
  readonly units: readonly LabSheetUnit[];
  /** Lab codes already used in the project, among those of the sheet. */
  readonly takenLabCodes: ReadonlySet<string>;
  /** The site's latitude (Marine20 warns in polar waters). */
  readonly latitude: number | null;
  /** The calendar age of a row's dating, or why it cannot be had (`row` is the sheet row). */
  readonly calibrate: (dating: SampleDating, row: number) => C | FieldProblem;
  /** The sample form's type and range rules on a row placed in `unit`; none when it passes. */
  readonly fieldRules?: (sample: LabSheetSample, unit: LabSheetUnit | null) => readonly FieldProblem[];
}

/** A row that passed every check, with its unit and calibration. */
export interface CheckedLabSheetRow<C extends LabSheetCalibration> {
  readonly sample: LabSheetSample & { labCode: string; method: DatingMethod; material: SampleMaterial; ageRelation: AgeRelation };
  readonly unit: LabSheetUnit;
  readonly calibration: C;
}

export interface LabSheetCheck<C extends LabSheetCalibration> {
  readonly rowCount: number;
  /** Every problem, ordered by row (header first); at most one per row and field. */
  readonly problems: LabSheetProblem[];
  /** The rows without problems, in sheet order. */
  readonly accepted: CheckedLabSheetRow<C>[];
}

/** Read a sheet and check every row against the site, the project and the sample rules. */
export function checkLabSheet<C extends LabSheetCalibration>(csv: string, context: LabSheetContext<C>): LabSheetCheck<C> {
  return checkLabSheetRows(readLabSheet(csv), context);
}

/**
 * Parse the CSV text: header, then each cell to its type. Comma, semicolon or tab separated (the
 * separator the header uses), quoted cells as in RFC 4180, CRLF or LF, with or without a BOM.
 */
export function readLabSheet(csv: string, choices: HeaderChoices = new Map()): LabSheetReading {
  const text = csv.charCodeAt(0) === 0xfeff ? csv.slice(1) : csv;
  const problems: LabSheetProblem[] = [];
  if (text.trim() === '') {
    return {
      rowCount: 0, samples: [], columns: [],
      problems: [{ row: 0, field: 'csv', message: 'The sheet is empty: it needs a header row and one row per sample.' }],
    };
  }
  const parsed = Papa.parse<string[]>(text, { delimiter: headerDelimiter(text), header: false, skipEmptyLines: false });
  for (const error of parsed.errors) {
    problems.push({ row: error.row ?? 0, field: 'csv', message: `The CSV is malformed here: ${describeParseError(error)}.` });
  }
  const [header = [], ...records] = parsed.data;
  const { columns, read: headerColumns } = readHeader(header, choices, problems);
  const filled = records
    .map((cells, index) => ({ cells, row: index + 1 }))
    .filter(({ cells }) => cells.some((cell) => cell.trim() !== ''));
  if (filled.length === 0 && problems.length === 0) {
    problems.push({ row: 0, field: 'csv', message: 'The sheet has a header but no sample rows.' });
  }
  if (filled.length > MAX_LAB_SHEET_ROWS) {
    problems.push({
      row: 0, field: 'csv', message: `The sheet has ${filled.length} rows; at most ${MAX_LAB_SHEET_ROWS} can be imported at once. Split it.`,
    });
  }
  if (!columns || problems.some((p) => p.row === 0)) return { rowCount: filled.length, samples: [], problems, columns: headerColumns };
  // Columns chosen to be ignored are known: their cells are not "under no column".
  const knownIndices = new Set(header.flatMap((cell, index) => (cell.trim() !== '' ? [index] : [])));
  const samples = filled.map(({ cells, row }) => readRow(cells, row, columns, knownIndices, problems));
  return { rowCount: filled.length, samples, problems: sortProblems(problems), columns: headerColumns };
}

/** Check read rows against the site's units, the project's lab codes, the sample rules and the calibrator. */
export function checkLabSheetRows<C extends LabSheetCalibration>(reading: LabSheetReading, context: LabSheetContext<C>): LabSheetCheck<C> {
  const problems = new ProblemList(reading.problems);
  const rowsByLabCode = new Map<string, number[]>();
  for (const sample of reading.samples) {
    if (sample.labCode === null) continue;
    const rows = rowsByLabCode.get(sample.labCode);
    if (rows) rows.push(sample.row);
    else rowsByLabCode.set(sample.labCode, [sample.row]);
  }
  const findUnit = unitFinder(context.units);
  const accepted: CheckedLabSheetRow<C>[] = [];

  for (const sample of reading.samples) {
    const { row } = sample;
    let unit: LabSheetUnit | null = null;
    if (sample.unit !== null) {
      const found = findUnit(sample.unit);
      if (typeof found === 'string') problems.add(row, 'unit', found);
      else unit = found;
    }
    if (unit && sample.depthM !== null) {
      const outside = depthOutsideUnit(sample.depthM, unit);
      if (outside) problems.add(row, 'depthM', outside);
    }
    if (sample.labCode !== null) {
      const rows = rowsByLabCode.get(sample.labCode) ?? [];
      if (rows.length > 1) {
        // Name a few of the other rows, not all: n duplicates naming each other would be n^2 long.
        const others = rows.slice(0, LISTED_DUPLICATE_ROWS + 1).filter((other) => other !== row).slice(0, LISTED_DUPLICATE_ROWS);
        const unlisted = rows.length - 1 - others.length;
        const more = unlisted > 0 ? ` and ${formatCount(unlisted)} more` : '';
        problems.add(row, 'labCode', `lab code ${sample.labCode} appears more than once in the sheet: also on ${plural('row', others)}${more}`);
      }
      if (context.takenLabCodes.has(sample.labCode)) {
        problems.add(row, 'labCode', `lab code ${sample.labCode} is already used by another sample in this project`);
      }
    }
    for (const problem of context.fieldRules?.(sample, unit) ?? []) problems.add(row, problem.field, problem.message);

    let calibration: C | null = null;
    if (sample.method !== null) {
      const result = context.calibrate(datingOf(sample, context.latitude), row);
      if (isFieldProblem(result)) problems.add(row, result.field, result.message);
      else calibration = result;
    }
    const { labCode, method, material, ageRelation } = sample;
    if (!problems.hasRow(row) && unit && calibration && labCode !== null && method && material && ageRelation) {
      accepted.push({ sample: { ...sample, labCode, method, material, ageRelation }, unit, calibration });
    }
  }
  return { rowCount: reading.rowCount, problems: sortProblems(problems.all()), accepted };
}

/** Other rows named in a duplicate lab code's message. */
const LISTED_DUPLICATE_ROWS = 5;

/** Most problems an answer lists; the rest are counted in a last entry ("and N more"). */
export const MAX_LISTED_PROBLEMS = 200;

function formatCount(n: number): string {
  return String(n).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

/**
 * The problems as an answer lists them: the first `max` in row order and, when there are more,
 * one last entry (row 0, field `csv`) saying how many were left out, so a sheet with thousands of
 * bad rows answers in kilobytes.
 */
export function listedProblems(problems: readonly LabSheetProblem[], max = MAX_LISTED_PROBLEMS): LabSheetProblem[] {
  if (problems.length <= max) return [...problems];
  const rest = problems.length - max;
  return [
    ...problems.slice(0, max),
    { row: 0, field: 'csv', message: `and ${formatCount(rest)} more ${rest === 1 ? 'problem' : 'problems'} not listed; fix these and check the sheet again` },
  ];
}

/** Problems keyed by row, keeping the first for each field so one bad cell is reported once. */
class ProblemList {
  private readonly byRow = new Map<number, Map<string, string>>();

  constructor(initial: readonly LabSheetProblem[]) {
    for (const problem of initial) this.add(problem.row, problem.field, problem.message);
  }

  add(row: number, field: string, message: string): void {
    let fields = this.byRow.get(row);
    if (!fields) this.byRow.set(row, (fields = new Map()));
    if (!fields.has(field)) fields.set(field, message);
  }

  hasRow(row: number): boolean {
    return this.byRow.has(row);
  }

  all(): LabSheetProblem[] {
    const list: LabSheetProblem[] = [];
    for (const [row, fields] of this.byRow) for (const [field, message] of fields) list.push({ row, field, message });
    return list;
  }
}

function sortProblems(problems: LabSheetProblem[]): LabSheetProblem[] {
  // Array.prototype.sort is stable, so problems of one row keep the order they were found in.
  return problems.sort((a, b) => a.row - b.row);
}

function isFieldProblem(value: LabSheetCalibration | FieldProblem): value is FieldProblem {
  return 'field' in value && 'message' in value;
}

/** The datings `checkLabSheetRows` will ask the calibrator for, with their rows (to calibrate them beforehand). */
export function labSheetDatings(reading: LabSheetReading, latitude: number | null): { row: number; dating: SampleDating }[] {
  return reading.samples.filter((sample) => sample.method !== null).map((sample) => ({ row: sample.row, dating: datingOf(sample, latitude) }));
}

function datingOf(sample: LabSheetSample, latitude: number | null): SampleDating {
  return {
    method: sample.method as DatingMethod,
    c14Age: sample.c14Age,
    c14Error: sample.c14Error,
    curve: sample.curve,
    deltaR: sample.deltaR,
    deltaRError: sample.deltaRError,
    latitude,
    calendarAgeBp: sample.calendarAgeBp,
    calendarErrorYears: sample.calendarErrorYears,
    measurementYear: sample.measurementYear,
  };
}

/** The separator the header line uses most; header names never contain one. */
function headerDelimiter(text: string): string {
  const firstLine = text.slice(0, text.search(/\r|\n|$/));
  const candidates = [',', ';', '\t'];
  const counts = candidates.map((candidate) => firstLine.split(candidate).length);
  return candidates[counts.indexOf(Math.max(...counts))];
}

function describeParseError(error: Papa.ParseError): string {
  switch (error.code) {
    case 'MissingQuotes':
      return 'a quoted cell is never closed (a " is missing)';
    case 'InvalidQuotes':
      return 'a quote " inside a quoted cell must be doubled ("")';
    default:
      return error.message;
  }
}

/**
 * Column index of each field, or null when the header is unusable (problems say why), with how
 * each header was read. Every header not read is named in one problem, not one per column.
 */
function readHeader(
  header: readonly string[],
  choices: HeaderChoices,
  problems: LabSheetProblem[],
): { columns: Map<LabSheetColumn, number> | null; read: LabSheetHeaderColumn[] } {
  const columns = new Map<LabSheetColumn, number>();
  const headersByColumn = new Map<LabSheetColumn, string>();
  const read: LabSheetHeaderColumn[] = [];
  const unknown: string[] = [];
  let usable = true;
  header.forEach((raw, index) => {
    const name = raw.trim();
    if (name === '') return; // a trailing separator; its cells must then be empty (checked per row)
    const choice = choices.get(headerKey(name));
    const named = columnNamedBy(name);
    const column = choice ? choice.field : named;
    read.push({ header: name, field: column, source: choice ? choice.source : named ? 'NAME' : 'UNKNOWN' });
    if (choice && choice.field === null) return; // chosen to be ignored
    if (!column) {
      unknown.push(name);
      usable = false;
    } else if (columns.has(column)) {
      const first = headersByColumn.get(column);
      const both = first !== undefined && nameKey(first) === nameKey(name) ? `Column ${column} appears twice in the header.` : `Columns "${first}" and "${name}" both give ${column}; keep one, or choose another field for one of them.`;
      problems.push({ row: 0, field: column, message: both });
      usable = false;
    } else {
      columns.set(column, index);
      headersByColumn.set(column, name);
    }
  });
  if (unknown.length > 0) {
    const listed = unknown.map((name) => `"${name}"`);
    const names = listed.length === 1 ? listed[0] : `${listed.slice(0, -1).join(', ')} and ${listed[listed.length - 1]}`;
    problems.push({
      row: 0,
      field: 'header',
      message:
        `${unknown.length === 1 ? 'This column is' : `These ${unknown.length} columns are`} not recognised: ${names}. ` +
        `Choose the field each one holds, or ignore it; the fields are ${LAB_SHEET_COLUMNS.join(', ')}.`,
    });
  }
  for (const column of REQUIRED_LAB_SHEET_COLUMNS) {
    if (!columns.has(column)) {
      problems.push({ row: 0, field: column, message: `The sheet needs a ${column} column.` });
      usable = false;
    }
  }
  return { columns: usable ? columns : null, read };
}

function readRow(
  cells: readonly string[],
  row: number,
  columns: Map<LabSheetColumn, number>,
  knownIndices: ReadonlySet<number>,
  problems: LabSheetProblem[],
): LabSheetSample {
  cells.forEach((cell, index) => {
    if (!knownIndices.has(index) && cell.trim() !== '') {
      problems.push({
        row, field: 'csv', message: `Cell ${index + 1} ("${cell.trim()}") is under no column of the header; check for an unquoted separator.`,
      });
    }
  });
  const refused = new Set<string>();
  const problem = (field: string, message: string) => {
    refused.add(field);
    problems.push({ row, field, message });
  };
  const text = (column: LabSheetColumn): string | null => {
    const index = columns.get(column);
    const value = index === undefined ? '' : (cells[index] ?? '').trim();
    if (value === '') return null;
    if (value.startsWith('=')) {
      problem(column, `${column} holds a spreadsheet formula (${value}); save the sheet with values, not formulas.`);
      return null;
    }
    return value;
  };
  const required = (column: LabSheetColumn): string | null => {
    const value = text(column);
    if (value === null && !refused.has(column)) problem(column, `${column} is required in every row.`);
    return value;
  };
  const choice = <T extends string>(column: LabSheetColumn, value: string | null, allowed: readonly T[]): T | null => {
    if (value === null) return null;
    const normalised = enumSpelling(value);
    if ((allowed as readonly string[]).includes(normalised)) return normalised as T;
    problem(column, `${column} "${value}" is not one of ${allowed.join(', ')}.`);
    return null;
  };

  const numbers = {} as Record<NumberColumn, number | null>;
  for (const column of NUMBER_COLUMNS) {
    const value = text(column);
    if (value === null) {
      numbers[column] = null;
      continue;
    }
    const read = readNumber(value);
    if (typeof read === 'string') {
      problem(column, `${column}: ${read}`);
      numbers[column] = null;
    } else {
      numbers[column] = read;
    }
  }

  const ageRelationCell = text('ageRelation');
  return {
    row,
    labCode: required('labCode'),
    unit: required('unit'),
    method: choice('method', required('method'), DATING_METHODS),
    material: choice('material', required('material'), SAMPLE_MATERIALS),
    ageRelation: ageRelationCell === null ? 'DATES_DEPOSIT' : choice('ageRelation', ageRelationCell, AGE_RELATIONS),
    curve: ((value) => (value === null ? null : enumSpelling(value)))(text('curve')),
    deltaRSource: text('deltaRSource'),
    excluded: ((value) => {
      if (value === null) return false;
      const read = readBoolean(value);
      if (read === null) problem('excluded', `excluded "${value}" must be true or false (yes/no and 1/0 are read too).`);
      return read ?? false;
    })(text('excluded')),
    exclusionReason: text('exclusionReason'),
    notes: text('notes'),
    ...numbers,
  };
}

/** "Detrital charcoal", "detrital-charcoal" and "DETRITAL_CHARCOAL" all name DETRITAL_CHARCOAL. */
export function enumSpelling(value: string): string {
  return value.trim().replace(/[\s-]+/g, '_').toUpperCase();
}

const PLAIN_NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

/**
 * A cell as a number, or why it is not one. Only plain decimal notation with a point is read:
 * a comma could be a thousands separator ("1,234") or a decimal comma ("1,5"), and guessing wrong
 * would silently change an age by a factor of a thousand, so both are refused with advice.
 */
export function readNumber(cell: string): number | string {
  const value = cell.trim();
  if (PLAIN_NUMBER.test(value)) return Number(value);
  if (value.startsWith('=')) return `"${value}" is a spreadsheet formula; save the sheet with values, not formulas`;
  if (/^[+-]?[\d.,\s]+$/.test(value) && value.includes(',')) {
    return `"${value}" has a comma; write numbers with a point for decimals and no thousands separator (1234.5)`;
  }
  return `"${value}" is not a number`;
}

/** true/false, yes/no, 1/0 in any case; null for anything else. */
export function readBoolean(cell: string): boolean | null {
  const value = cell.trim().toLowerCase();
  if (value === 'true' || value === 'yes' || value === '1') return true;
  if (value === 'false' || value === 'no' || value === '0') return false;
  return null;
}

/**
 * Resolve a unit cell: a unit name (any case) first, else a position number. A name shared by
 * two units of the site is refused rather than guessed.
 */
function unitFinder(units: readonly LabSheetUnit[]): (cell: string) => LabSheetUnit | string {
  const byName = new Map<string, LabSheetUnit[]>();
  for (const unit of units) {
    const key = unit.name.trim().toLowerCase();
    byName.set(key, [...(byName.get(key) ?? []), unit]);
  }
  const byPosition = new Map(units.map((unit) => [unit.position, unit]));
  return (cell) => {
    const named = byName.get(cell.trim().toLowerCase());
    if (named?.length === 1) return named[0];
    if (named && named.length > 1) {
      return `${named.length} units of this site are named "${cell}"; give the unit's position number instead`;
    }
    if (/^\d+$/.test(cell.trim())) {
      const positioned = byPosition.get(Number(cell.trim()));
      if (positioned) return positioned;
      return `this site has no unit at position ${cell.trim()}`;
    }
    return `this site has no unit named "${cell}"`;
  };
}

function plural(word: string, numbers: readonly number[]): string {
  return numbers.length === 1 ? `${word} ${numbers[0]}` : `${word}s ${numbers.join(', ')}`;
}
