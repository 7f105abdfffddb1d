/**
 * The tables of a finished recurrence analysis as CSV and JSON downloads: its inputs, the
 * inter-event intervals, the interval statistics, the model table and the probabilities, each
 * carrying the caution (the CSV's first line, the JSON's `caution` field). Pure functions.
 */
import { RENEWAL_MODEL_LABELS } from '../chronology/recurrence';
import { type CsvValue, toCsv } from '../common/csv';
import { RECURRENCE_CAUTION } from './recurrence-caution';
import type { StoredParameterRange, StoredRecurrenceResults, StoredWindowProbability } from './recurrence-results';
import type { StoredEventTable } from './segment-event-table';

/** What an export says about the analysis itself, so the numbers can be traced and rerun. */
export interface RecurrenceExportHeader {
  id: string;
  projectId: string;
  segmentId: string | null;
  siteId: string | null;
  hypothesisId: string | null;
  hypothesisVersion: number | null;
  ageModelRunIds: string[];
  /** The joint age model run whose draws it used, if any (then ageModelRunIds is empty). */
  jointRunId?: string | null;
  seed: number;
  forecastStartYear: number;
  windowsYears: number[];
  draws: number;
  createdAt: string;
  finishedAt: string | null;
  /** The names beside the ids above, for people reading the CSV (issue 15: names, not UUIDs). */
  names?: {
    project: string | null;
    segment: string | null;
    site: string | null;
    hypothesis: string | null;
    /** Per entry of ageModelRunIds: the run's site. */
    ageModelRuns: (string | null)[];
    /** What the joint run is called in its recorded input (its hypothesis). */
    jointRun?: string | null;
  };
}

export interface RecurrenceExport {
  caution: string;
  analysis: RecurrenceExportHeader;
  eventAgesCalBp: number[];
  intervals: StoredRecurrenceResults['intervals'];
  statistics: { quantity: string; unit: string; median: number; low95: number; high95: number }[];
  models: {
    model: string;
    aic: number;
    deltaAic: number;
    aicc: number | null;
    deltaAicc: number | null;
    akaikeWeight: number;
    meanRecurrenceYears: number;
    aperiodicity: number;
    logLikelihood: number;
    meanRecurrenceRange: StoredParameterRange;
    aperiodicityRange: StoredParameterRange;
    preferredShare: number;
  }[];
  modelComparisonNote: string;
  /** How the parameters were drawn, with the priors. */
  parameterNote: string | null;
  /** Headline ranges carry dating and parameter uncertainty; the dating-only range is beside them. */
  probabilities: {
    model: string;
    windowYears: number;
    median: number;
    low95: number;
    high95: number;
    datingOnlyLow95: number | null;
    datingOnlyHigh95: number | null;
  }[];
  histogram: StoredRecurrenceResults['histogram'];
  /** The segment's event table the analysis used, with its rule and weights; null for a site analysis or an older one. */
  eventTable: StoredEventTable | null;
  /** Events in a draw's record when inclusion weights make it vary; null otherwise. */
  recordEvents: StoredRecurrenceResults['recordEvents'] | null;
}

/** The JSON export. */
export function recurrenceExport(
  header: RecurrenceExportHeader,
  results: StoredRecurrenceResults,
  eventTable: StoredEventTable | null = null,
): RecurrenceExport {
  const statistic = (quantity: string, unit: string, value: StoredParameterRange) => ({ quantity, unit, ...value });
  return {
    caution: RECURRENCE_CAUTION,
    analysis: header,
    eventAgesCalBp: results.eventAgesCalBp,
    intervals: results.intervals,
    statistics: [
      statistic('mean recurrence', 'years', results.meanRecurrence),
      statistic('median recurrence', 'years', results.medianRecurrence),
      statistic('standard deviation of intervals', 'years', results.sdRecurrence),
      statistic('aperiodicity (coefficient of variation)', '', results.aperiodicity),
      statistic('open interval since the last event', 'years', results.openInterval),
    ],
    models: results.models.map((m) => ({
      model: m.model,
      aic: m.aic,
      deltaAic: m.deltaAic,
      aicc: m.aicc ?? null,
      deltaAicc: m.deltaAicc ?? null,
      akaikeWeight: m.akaikeWeight,
      meanRecurrenceYears: m.meanRecurrenceYears,
      aperiodicity: m.aperiodicity,
      logLikelihood: m.logLikelihood,
      meanRecurrenceRange: m.meanRecurrenceRange,
      aperiodicityRange: m.aperiodicityRange,
      preferredShare: m.preferredShare,
    })),
    modelComparisonNote: results.modelComparisonNote,
    parameterNote: results.parameterNote ?? null,
    probabilities: [
      ...results.models.flatMap((m) => m.probabilities.map((w) => probabilityRow(m.model, w))),
      ...(results.modelAveraged ?? []).map((w) => probabilityRow('MODEL_AVERAGED', w)),
      ...results.poisson.map((w) => probabilityRow('POISSON_FROM_MEAN_RECURRENCE', w)),
    ],
    histogram: results.histogram,
    eventTable,
    recordEvents: results.recordEvents ?? null,
  };
}

/** The CSV export: the caution first, then one titled table after another, blank lines between. */
export function recurrenceExportCsv(
  header: RecurrenceExportHeader,
  results: StoredRecurrenceResults,
  eventTable: StoredEventTable | null = null,
): string {
  const data = recurrenceExport(header, results, eventTable);
  const rows: CsvValue[][] = [
    [RECURRENCE_CAUTION],
    [],
    ['analysis'],
    ['field', 'value'],
    ['id', header.id],
    ['project', header.names?.project ?? header.projectId],
    ['project id', header.projectId],
    ['segment', header.names?.segment ?? header.segmentId],
    ['segment id', header.segmentId],
    ['site', header.names?.site ?? header.siteId],
    ['site id', header.siteId],
    ['hypothesis', header.names?.hypothesis ?? header.hypothesisId],
    ['hypothesis id', header.hypothesisId],
    ['hypothesis version', header.hypothesisVersion],
    ['age model runs', header.ageModelRunIds.map((id, i) => (header.names?.ageModelRuns[i] ? `${header.names.ageModelRuns[i]} (${id})` : id)).join('; ')],
    ['age model run ids', header.ageModelRunIds.join(' ')],
    ...(header.jointRunId ? [['joint age model run', header.names?.jointRun ? `${header.names.jointRun} (${header.jointRunId})` : header.jointRunId]] : []),
    ['seed', header.seed],
    ['forecast start year (CE)', header.forecastStartYear],
    ['windows (years)', header.windowsYears.join(' ')],
    ['draws', header.draws],
    ['created', header.createdAt],
    ['finished', header.finishedAt],
    [],
    ['intervals'],
    ['index (0 = youngest)', 'median years', 'low95', 'high95', 'share of draws'],
    ...data.intervals.map((i) => [i.index, i.medianYears, i.low95, i.high95, i.shareOfDraws ?? 1]),
    ...(data.recordEvents ? [['events in a draw\'s record', data.recordEvents.median, data.recordEvents.low95, data.recordEvents.high95]] : []),
    [],
    ['statistics'],
    ['quantity', 'unit', 'median', 'low95', 'high95'],
    ...data.statistics.map((s) => [s.quantity, s.unit, s.median, s.low95, s.high95]),
    [],
    ['models'],
    [
      'model',
      'AIC',
      'delta AIC',
      'AICc',
      'delta AICc',
      'Akaike weight (AICc)',
      'mean recurrence (years)',
      'mean recurrence low95',
      'mean recurrence high95',
      'mean recurrence dating-only low95',
      'mean recurrence dating-only high95',
      'aperiodicity',
      'aperiodicity low95',
      'aperiodicity high95',
      'log likelihood',
      'share of draws preferred',
    ],
    ...data.models.map((m) => [
      RENEWAL_MODEL_LABELS[m.model as keyof typeof RENEWAL_MODEL_LABELS] ?? m.model,
      m.aic,
      m.deltaAic,
      m.aicc,
      m.deltaAicc,
      m.akaikeWeight,
      m.meanRecurrenceYears,
      m.meanRecurrenceRange.low95,
      m.meanRecurrenceRange.high95,
      m.meanRecurrenceRange.datingOnlyLow95 ?? null,
      m.meanRecurrenceRange.datingOnlyHigh95 ?? null,
      m.aperiodicity,
      m.aperiodicityRange.low95,
      m.aperiodicityRange.high95,
      m.logLikelihood,
      m.preferredShare,
    ]),
    ['note', data.modelComparisonNote],
    ['parameters', data.parameterNote],
    [],
    ['probabilities'],
    ['model', 'window (years)', 'median', 'low95 (dating and parameters)', 'high95 (dating and parameters)', 'dating-only low95', 'dating-only high95'],
    ...data.probabilities.map((p) => [probabilityLabel(p.model), p.windowYears, p.median, p.low95, p.high95, p.datingOnlyLow95, p.datingOnlyHigh95]),
    ...(eventTable ? [[], ...eventTableCsvRows(eventTable)] : []),
  ];
  return toCsv(rows);
}

/** The event table as CSV rows: the rule, then one row per regional event, young to old. */
export function eventTableCsvRows(table: StoredEventTable): CsvValue[][] {
  return [
    ['event table'],
    ['segment', table.segmentName, 'hypothesis', table.hypothesisName, 'hypothesis version', table.hypothesisVersion],
    ['minimum span share', table.rule.minimumSpanShare, 'untied events', table.rule.includeUntied ? 'in' : 'out'],
    ['quality weights (1-4)', table.rule.qualityWeights?.join(' ') ?? 'none', 'tie confidence weights (1-4)', table.rule.confidenceWeights?.join(' ') ?? 'none'],
    ['counted events', table.countedEvents, 'expected events (sum of probabilities)', table.expectedEvents],
    ['note', table.note],
    [
      'regional event id',
      'members',
      'segments',
      'span share',
      'through-going',
      'untied',
      'tie confidences',
      'qualities',
      'median (cal BP)',
      'counted',
      'inclusion probability',
      'reason',
    ],
    ...table.rows.map((row) => [
      row.regionalEventId,
      row.label,
      row.segmentNames.join(' '),
      row.spanShare,
      row.throughGoing ? 'yes' : 'no',
      row.untied ? 'yes' : 'no',
      row.tieConfidences.join(' '),
      row.qualities.join(' '),
      row.medianCalBp,
      row.counted ? 'yes' : 'no',
      row.inclusionProbability,
      row.reason,
    ]),
  ];
}

function probabilityRow(model: string, w: StoredWindowProbability): RecurrenceExport['probabilities'][number] {
  return {
    model,
    windowYears: w.windowYears,
    median: w.median,
    low95: w.low95,
    high95: w.high95,
    datingOnlyLow95: w.datingOnlyLow95 ?? null,
    datingOnlyHigh95: w.datingOnlyHigh95 ?? null,
  };
}

function probabilityLabel(model: string): string {
  if (model === 'POISSON_FROM_MEAN_RECURRENCE') return 'Poisson 1 - exp(-dT/mean recurrence) (dating only)';
  if (model === 'MODEL_AVERAGED') return 'model-averaged (AICc weights)';
  return RENEWAL_MODEL_LABELS[model as keyof typeof RENEWAL_MODEL_LABELS] ?? model;
}
