/**
 * Two finished analyses side by side (issue 14, item 6): typically one setting run on two
 * correlation hypotheses of a segment. Their event tables are aligned by regional event id (the
 * sorted member ids, the same event under any hypothesis), their statistics and window
 * probabilities row by row, and the differences named: events present in only one, events
 * counted or weighted differently, probabilities that moved. For the screen, the CSV and the
 * JSON export. Pure functions.
 */
import { RENEWAL_MODEL_LABELS } from '../chronology/recurrence';
import { type CsvValue, toCsv } from '../common/csv';
import { RECURRENCE_CAUTION } from './recurrence-caution';
import type { StoredRange, StoredRecurrenceResults, StoredWindowProbability } from './recurrence-results';
import type { StoredEventTable, StoredEventTableRow } from './segment-event-table';

export interface ComparedSide {
  id: string;
  segmentId: string | null;
  siteId: string | null;
  hypothesisId: string | null;
  hypothesisName: string | null;
  hypothesisVersion: number | null;
  seed: number;
  forecastStartYear: number;
  windowsYears: number[];
  draws: number;
  results: StoredRecurrenceResults;
  eventTable: StoredEventTable | null;
}

export type EventDifference = 'ONLY_IN_A' | 'ONLY_IN_B' | 'COUNTED_IN_A_ONLY' | 'COUNTED_IN_B_ONLY' | 'INCLUSION_CHANGED' | 'SAME';

export interface ComparedEventSide {
  counted: boolean;
  inclusionProbability: number;
  spanShare: number;
  throughGoing: boolean;
  untied: boolean;
  medianCalBp: number | null;
  reason: string;
}

export interface ComparedEventRow {
  regionalEventId: string;
  label: string;
  a: ComparedEventSide | null;
  b: ComparedEventSide | null;
  difference: EventDifference;
}

export interface ComparedProbability {
  /** A renewal model, or MODEL_AVERAGED. */
  model: string;
  windowYears: number;
  a: StoredWindowProbability;
  b: StoredWindowProbability;
  /** b's median minus a's. */
  medianDifference: number;
  /** Whether the two 95 % ranges overlap: a difference inside overlapping ranges is not resolved by the data. */
  rangesOverlap: boolean;
}

export interface ComparedStatistic {
  quantity: string;
  unit: string;
  a: StoredRange;
  b: StoredRange;
  medianDifference: number;
  rangesOverlap: boolean;
}

export interface RecurrenceComparison {
  caution: string;
  note: string;
  a: Omit<ComparedSide, 'results' | 'eventTable'>;
  b: Omit<ComparedSide, 'results' | 'eventTable'>;
  /** Settings in which the two analyses differ (empty when one setting was run on two hypotheses). */
  settingDifferences: string[];
  events: ComparedEventRow[];
  statistics: ComparedStatistic[];
  probabilities: ComparedProbability[];
}

/** Inclusion probabilities closer than this are the same. */
const SAME_PROBABILITY = 1e-9;

export const COMPARISON_NOTE =
  'Events are matched by their member site events: the same members under both hypotheses are one row. ' +
  'A median difference inside overlapping 95 % ranges is not resolved by the data; the choice between the hypotheses ' +
  'is a correlation judgement these numbers do not make.';

export function compareAnalyses(a: ComparedSide, b: ComparedSide): RecurrenceComparison {
  return {
    caution: RECURRENCE_CAUTION,
    note: COMPARISON_NOTE,
    a: sideHeader(a),
    b: sideHeader(b),
    settingDifferences: settingDifferences(a, b),
    events: compareEvents(a.eventTable?.rows ?? [], b.eventTable?.rows ?? []),
    statistics: [
      statistic('mean recurrence', 'years', a.results.meanRecurrence, b.results.meanRecurrence),
      statistic('median recurrence', 'years', a.results.medianRecurrence, b.results.medianRecurrence),
      statistic('aperiodicity (coefficient of variation)', '', a.results.aperiodicity, b.results.aperiodicity),
      statistic('open interval since the last event', 'years', a.results.openInterval, b.results.openInterval),
    ],
    probabilities: compareProbabilities(a.results, b.results),
  };
}

function sideHeader(side: ComparedSide): RecurrenceComparison['a'] {
  const { results: _results, eventTable: _table, ...header } = side;
  return header;
}

function settingDifferences(a: ComparedSide, b: ComparedSide): string[] {
  const differences: string[] = [];
  if (a.segmentId !== b.segmentId || a.siteId !== b.siteId) differences.push('They are analyses of different segments or sites.');
  if (a.forecastStartYear !== b.forecastStartYear) differences.push(`Forecast start ${a.forecastStartYear} CE against ${b.forecastStartYear} CE.`);
  if (a.windowsYears.join(',') !== b.windowsYears.join(',')) differences.push(`Windows ${a.windowsYears.join(', ')} against ${b.windowsYears.join(', ')} years.`);
  if (a.draws !== b.draws) differences.push(`${a.draws} draws against ${b.draws}.`);
  const ruleA = JSON.stringify(a.eventTable?.rule ?? null);
  const ruleB = JSON.stringify(b.eventTable?.rule ?? null);
  if (ruleA !== ruleB) differences.push('The counting rules differ.');
  if (a.hypothesisId !== null && a.hypothesisId === b.hypothesisId && a.hypothesisVersion === b.hypothesisVersion) {
    differences.push('Both used the same hypothesis version.');
  }
  return differences;
}

/** The two tables' rows aligned by regional event id, young to old by the median age either side gives. */
export function compareEvents(rowsA: readonly StoredEventTableRow[], rowsB: readonly StoredEventTableRow[]): ComparedEventRow[] {
  const byIdB = new Map(rowsB.map((row) => [row.regionalEventId, row]));
  const ids = [...new Set([...rowsA.map((row) => row.regionalEventId), ...rowsB.map((row) => row.regionalEventId)])];
  const byIdA = new Map(rowsA.map((row) => [row.regionalEventId, row]));
  const rows = ids.map((id): ComparedEventRow & { sortKey: number } => {
    const rowA = byIdA.get(id) ?? null;
    const rowB = byIdB.get(id) ?? null;
    const label = (rowA ?? rowB)!.label;
    const sortKey = rowA?.medianCalBp ?? rowB?.medianCalBp ?? Number.POSITIVE_INFINITY;
    return { regionalEventId: id, label, a: rowA && side(rowA), b: rowB && side(rowB), difference: difference(rowA, rowB), sortKey };
  });
  rows.sort((p, q) => p.sortKey - q.sortKey || (p.regionalEventId < q.regionalEventId ? -1 : 1));
  return rows.map(({ sortKey: _sortKey, ...row }) => row);
}

function side(row: StoredEventTableRow): ComparedEventSide {
  return {
    counted: row.counted,
    inclusionProbability: row.inclusionProbability,
    spanShare: row.spanShare,
    throughGoing: row.throughGoing,
    untied: row.untied,
    medianCalBp: row.medianCalBp,
    reason: row.reason,
  };
}

function difference(a: StoredEventTableRow | null, b: StoredEventTableRow | null): EventDifference {
  if (!a) return 'ONLY_IN_B';
  if (!b) return 'ONLY_IN_A';
  if (a.counted && !b.counted) return 'COUNTED_IN_A_ONLY';
  if (!a.counted && b.counted) return 'COUNTED_IN_B_ONLY';
  return Math.abs(a.inclusionProbability - b.inclusionProbability) > SAME_PROBABILITY ? 'INCLUSION_CHANGED' : 'SAME';
}

function statistic(quantity: string, unit: string, a: StoredRange, b: StoredRange): ComparedStatistic {
  return { quantity, unit, a, b, medianDifference: b.median - a.median, rangesOverlap: overlap(a, b) };
}

function compareProbabilities(a: StoredRecurrenceResults, b: StoredRecurrenceResults): ComparedProbability[] {
  const rowsOf = (results: StoredRecurrenceResults) => [
    ...results.models.flatMap((m) => m.probabilities.map((w) => ({ model: m.model as string, w }))),
    ...(results.modelAveraged ?? []).map((w) => ({ model: 'MODEL_AVERAGED', w })),
  ];
  const key = (model: string, windowYears: number) => `${model}|${windowYears}`;
  const inB = new Map(rowsOf(b).map((row) => [key(row.model, row.w.windowYears), row.w]));
  return rowsOf(a).flatMap(({ model, w }) => {
    const other = inB.get(key(model, w.windowYears));
    return other ? [{ model, windowYears: w.windowYears, a: w, b: other, medianDifference: other.median - w.median, rangesOverlap: overlap(w, other) }] : [];
  });
}

function overlap(a: StoredRange, b: StoredRange): boolean {
  return a.low95 <= b.high95 && b.low95 <= a.high95;
}

const DIFFERENCE_LABELS: Record<EventDifference, string> = {
  ONLY_IN_A: 'only in A',
  ONLY_IN_B: 'only in B',
  COUNTED_IN_A_ONLY: 'counted in A only',
  COUNTED_IN_B_ONLY: 'counted in B only',
  INCLUSION_CHANGED: 'inclusion probability changed',
  SAME: '',
};

/** The comparison as CSV: the caution, both analyses, then events, statistics and probabilities side by side. */
export function recurrenceComparisonCsv(comparison: RecurrenceComparison): string {
  const name = (side: RecurrenceComparison['a']) => side.hypothesisName ?? side.siteId ?? side.id;
  const sideCells = (s: ComparedEventSide | null) => (s ? [s.counted ? 'yes' : 'no', s.inclusionProbability, s.spanShare] : ['absent', null, null]);
  const rows: CsvValue[][] = [
    [RECURRENCE_CAUTION],
    [],
    ['comparison'],
    ['', 'A', 'B'],
    ['analysis', comparison.a.id, comparison.b.id],
    ['hypothesis', comparison.a.hypothesisName, comparison.b.hypothesisName],
    ['hypothesis id', comparison.a.hypothesisId, comparison.b.hypothesisId],
    ['hypothesis version', comparison.a.hypothesisVersion, comparison.b.hypothesisVersion],
    ['seed', comparison.a.seed, comparison.b.seed],
    ['forecast start year (CE)', comparison.a.forecastStartYear, comparison.b.forecastStartYear],
    ['draws', comparison.a.draws, comparison.b.draws],
    ...comparison.settingDifferences.map((d) => ['setting difference', d]),
    ['note', comparison.note],
    [],
    ['events'],
    [
      'regional event id',
      'members',
      `counted in A (${name(comparison.a)})`,
      'inclusion probability A',
      'span share A',
      `counted in B (${name(comparison.b)})`,
      'inclusion probability B',
      'span share B',
      'difference',
    ],
    ...comparison.events.map((e) => [e.regionalEventId, e.label, ...sideCells(e.a), ...sideCells(e.b), DIFFERENCE_LABELS[e.difference]]),
    [],
    ['statistics'],
    ['quantity', 'unit', 'A median', 'A low95', 'A high95', 'B median', 'B low95', 'B high95', 'B - A median', '95 % ranges overlap'],
    ...comparison.statistics.map((s) => [s.quantity, s.unit, s.a.median, s.a.low95, s.a.high95, s.b.median, s.b.low95, s.b.high95, s.medianDifference, s.rangesOverlap ? 'yes' : 'no']),
    [],
    ['probabilities'],
    ['model', 'window (years)', 'A median', 'A low95', 'A high95', 'B median', 'B low95', 'B high95', 'B - A median', '95 % ranges overlap'],
    ...comparison.probabilities.map((p) => [
      p.model === 'MODEL_AVERAGED' ? 'model-averaged (AICc weights)' : (RENEWAL_MODEL_LABELS[p.model as keyof typeof RENEWAL_MODEL_LABELS] ?? p.model),
      p.windowYears,
      p.a.median,
      p.a.low95,
      p.a.high95,
      p.b.median,
      p.b.low95,
      p.b.high95,
      p.medianDifference,
      p.rangesOverlap ? 'yes' : 'no',
    ]),
  ];
  return toCsv(rows);
}
