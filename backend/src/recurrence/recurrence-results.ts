/**
 * Adapts the recurrence engine (chronology/recurrence) to stored analyses: picks the event-age
 * draws an analysis uses, runs the Monte Carlo, and turns its summary into the JSON stored in
 * `recurrence_analyses.results`, already in the shapes the API and exports serve. Pure functions
 * of plain data, shared by the API, the worker and its computation thread.
 */
import type { CalendarDensity } from '../chronology/common/density';
import { SeededRandom } from '../chronology/common/random';
import {
  type CredibleRange,
  distributionFromFit,
  RENEWAL_PRIOR_NOTE,
  type WindowProbability,
  RENEWAL_MODEL_LABELS,
  type RecurrenceSummary,
  type RenewalModel,
  renewalCurves,
  simulateRecurrence,
  summariseRecurrence,
} from '../chronology/recurrence';

/** Where an analysis' event ages come from. */
export type RecurrenceSource =
  /** Regional events of a hypothesis, young to old, sampled in that order. */
  | {
      readonly kind: 'ordered-densities';
      readonly densities: readonly CalendarDensity[];
      /** Each event's probability of being in a draw's record, young to old like `densities`; absent: all 1. */
      readonly inclusionProbabilities?: readonly number[];
    }
  /** A site age model's (or a joint run's regional) joint draws, row-major drawCount x eventCount. */
  | {
      readonly kind: 'joint-draws';
      readonly eventCount: number;
      readonly drawCount: number;
      readonly draws: ArrayLike<number>;
      /** Each event's probability of being in a draw's record, oldest first (a segment's joint-run draws); absent: all 1. */
      readonly inclusionProbabilities?: readonly number[];
    };

export interface RecurrenceComputeSettings {
  readonly forecastStartYearCe: number;
  readonly windowsYears: readonly number[];
  readonly drawCount: number;
  readonly seed: number;
  /** Points per model curve (default 200). */
  readonly curvePoints?: number;
}

export interface StoredRange {
  median: number;
  low95: number;
  high95: number;
}

export interface StoredWindowProbability extends StoredRange {
  windowYears: number;
  /** The range from dating uncertainty alone (plug-in fits); absent in analyses stored before it. */
  datingOnlyMedian?: number;
  datingOnlyLow95?: number;
  datingOnlyHigh95?: number;
}

/** A headline range (dating and parameters) with the dating-only range beside it. */
export interface StoredParameterRange extends StoredRange {
  datingOnlyLow95?: number;
  datingOnlyHigh95?: number;
}

export interface StoredIntervalEstimate {
  /** 0 is the youngest interval: from event index + 1 (older) to event index (younger). */
  index: number;
  medianYears: number;
  low95: number;
  high95: number;
  /**
   * Share of draws holding the interval: with inclusion weights an interval ends at event index
   * and starts at the next older event kept in the draw, and exists only in draws keeping event
   * index with an older one. Absent (1) without weights.
   */
  shareOfDraws?: number;
}

export interface StoredModelResult {
  model: RenewalModel;
  /** AIC, AICc, deltas, weight (from AICc), parameters and ln L of the fit to the median event sequence. */
  aic: number;
  deltaAic: number;
  /** Null when the record is too short for AICc (n <= k + 1). */
  aicc?: number | null;
  deltaAicc?: number | null;
  akaikeWeight: number;
  meanRecurrenceYears: number;
  aperiodicity: number;
  logLikelihood: number;
  converged: boolean;
  /** Ranges over draws: dating and parameters (headline), with the dating-only range beside. */
  meanRecurrenceRange: StoredParameterRange;
  aperiodicityRange: StoredParameterRange;
  /** Share of draws in which this model had the lowest AICc. */
  preferredShare: number;
  unconvergedDraws: number;
  /** Parameter draws taken by importance resampling (an open interval far beyond the record). */
  approximateDraws?: number;
  probabilities: StoredWindowProbability[];
}

export interface StoredCurvePoint {
  years: number;
  value: number;
}

export interface StoredModelCurves {
  model: RenewalModel;
  density: StoredCurvePoint[];
  hazard: StoredCurvePoint[];
  survival: StoredCurvePoint[];
}

export interface StoredHistogramBin {
  fromYears: number;
  toYears: number;
  count: number;
  /** count / (total x width), on the scale of the model densities. */
  density: number;
}

export interface StoredRecurrenceResults {
  drawCount: number;
  eventCount: number;
  forecastStartCalBp: number;
  /** Median age of each event over the draws, cal BP, oldest first. */
  eventAgesCalBp: number[];
  lastEventMedianCalBp: number;
  openInterval: StoredRange;
  intervals: StoredIntervalEstimate[];
  meanRecurrence: StoredRange;
  medianRecurrence: StoredRange;
  sdRecurrence: StoredRange;
  aperiodicity: StoredRange;
  /** 1 - exp(-dT / mean recurrence) over the draws. */
  poisson: StoredWindowProbability[];
  models: StoredModelResult[];
  /** Per draw, the models' probabilities weighted by that draw's Akaike weights from AICc. */
  modelAveraged?: StoredWindowProbability[];
  /** How the parameters were drawn, with the priors (absent before parameter uncertainty). */
  parameterNote?: string;
  /** Events in a draw's record when inclusion weights make it vary; absent otherwise. */
  recordEvents?: StoredRange;
  preferredModel: RenewalModel;
  modelComparisonNote: string;
  curves: StoredModelCurves[];
  histogram: StoredHistogramBin[];
}

/** Above this share of unconverged draws a model's figures get a warning in the note. */
const UNCONVERGED_WARNING_SHARE = 0.05;

/**
 * The rows of a site's joint draws an analysis uses: all of them, in order, when `count` is at
 * least the number stored; otherwise a seeded sample of `count` distinct rows (partial
 * Fisher-Yates shuffle, Knuth TAOCP vol. 2, algorithm 3.4.2P), so a smaller analysis is still
 * spread over the whole chain. Rows are not repeated: resampling cannot add information.
 */
export function selectJointDraws(
  source: Extract<RecurrenceSource, { kind: 'joint-draws' }>,
  count: number,
  seed: number,
): Float64Array[] {
  const { eventCount, drawCount, draws } = source;
  if (draws.length !== eventCount * drawCount) {
    throw new RangeError(`joint draws hold ${draws.length} values, not ${drawCount} x ${eventCount}`);
  }
  const row = (r: number) => Float64Array.from({ length: eventCount }, (_, k) => draws[r * eventCount + k]);
  if (count >= drawCount) return Array.from({ length: drawCount }, (_, r) => row(r));
  const order = Uint32Array.from({ length: drawCount }, (_, r) => r);
  const rng = new SeededRandom(seed);
  for (let i = 0; i < count; i++) {
    const j = i + rng.integer(drawCount - i);
    const swap = order[i];
    order[i] = order[j];
    order[j] = swap;
  }
  return Array.from(order.subarray(0, count), row);
}

/**
 * Runs one analysis: exact ordered draws of the regional events (segment) or the site age
 * model's joint draws, then the Monte Carlo summary and the curves, as stored results.
 */
export function computeRecurrence(
  source: RecurrenceSource,
  settings: RecurrenceComputeSettings,
  onProgress: (fraction: number) => void = () => undefined,
): StoredRecurrenceResults {
  const options = {
    forecastStartYearCe: settings.forecastStartYearCe,
    windowsYears: settings.windowsYears,
    onProgress: (done: number, total: number) => onProgress(done / total),
  };
  const summary =
    source.kind === 'ordered-densities'
      ? simulateRecurrence(source.densities, {
          ...options,
          drawCount: settings.drawCount,
          seed: settings.seed,
          // The engine reads draws oldest first; the densities run young to old.
          ...(source.inclusionProbabilities ? { inclusionProbabilities: [...source.inclusionProbabilities].reverse(), inclusionSeed: settings.seed + 1 } : {}),
        })
      : summariseRecurrence(selectJointDraws(source, settings.drawCount, settings.seed), {
          ...options,
          ...(source.inclusionProbabilities ? { inclusionProbabilities: source.inclusionProbabilities, inclusionSeed: settings.seed + 1 } : {}),
        });
  return storeSummary(summary, settings.curvePoints ?? 200);
}

/** The stored (and served) form of a Monte Carlo summary. */
export function storeSummary(summary: RecurrenceSummary, curvePoints = 200): StoredRecurrenceResults {
  const median = summary.medianSequence;
  const comparison = new Map(median.comparison.rows.map((row) => [row.model, row]));
  const models = summary.models.map((mc): StoredModelResult => {
    const fit = median.fits.find((f) => f.model === mc.model);
    const row = comparison.get(mc.model);
    if (!fit || !row) throw new Error(`no median-sequence fit for ${mc.model}`);
    return {
      model: mc.model,
      aic: fit.aic,
      deltaAic: row.deltaAic,
      aicc: row.aicc,
      deltaAicc: row.deltaAicc,
      akaikeWeight: row.akaikeWeight,
      meanRecurrenceYears: fit.mu,
      aperiodicity: fit.alpha,
      logLikelihood: fit.logLikelihood,
      converged: fit.converged,
      meanRecurrenceRange: { ...range(mc.mu), datingOnlyLow95: mc.muDatingOnly.low95, datingOnlyHigh95: mc.muDatingOnly.high95 },
      aperiodicityRange: { ...range(mc.alpha), datingOnlyLow95: mc.alphaDatingOnly.low95, datingOnlyHigh95: mc.alphaDatingOnly.high95 },
      preferredShare: mc.preferredShare,
      unconvergedDraws: mc.unconvergedDraws,
      approximateDraws: mc.approximateDraws,
      probabilities: mc.probabilities.map(windowProbability),
    };
  });

  const intervalCount = summary.intervals.length;
  const longestWindow = Math.max(...summary.windowsYears);
  const lastBin = summary.intervalHistogram[summary.intervalHistogram.length - 1];
  const span = Math.max(
    2.5 * summary.meanRecurrence.median,
    lastBin ? lastBin.toYears : 0,
    summary.openInterval.high95 + longestWindow,
  );
  const curves = renewalCurves(median.fits.map(distributionFromFit), Math.ceil(span / 50) * 50, curvePoints);
  const points = (values: readonly number[]) =>
    curves.timesYears.map((years, i) => ({ years, value: values[i] })).filter((p) => Number.isFinite(p.value));

  return {
    drawCount: summary.drawCount,
    eventCount: summary.eventCount,
    forecastStartCalBp: summary.forecastStartCalBp,
    eventAgesCalBp: [...summary.eventMedianAgesCalBp],
    lastEventMedianCalBp: summary.eventMedianAgesCalBp[summary.eventMedianAgesCalBp.length - 1],
    openInterval: range(summary.openInterval),
    // The engine counts intervals oldest first; the API counts from the youngest.
    intervals: summary.intervals
      .map((interval, i): StoredIntervalEstimate => ({
        index: intervalCount - 1 - i,
        medianYears: interval.median,
        low95: interval.low95,
        high95: interval.high95,
        ...(summary.intervalShares[i] < 1 ? { shareOfDraws: summary.intervalShares[i] } : {}),
      }))
      // An interval no draw held has no range to show.
      .filter((interval) => interval.shareOfDraws !== 0)
      .reverse(),
    ...(summary.recordEvents.low95 < summary.recordEvents.high95 || summary.recordEvents.median < summary.eventCount
      ? { recordEvents: range(summary.recordEvents) }
      : {}),
    meanRecurrence: range(summary.meanRecurrence),
    medianRecurrence: range(summary.medianRecurrence),
    sdRecurrence: range(summary.sdRecurrence),
    aperiodicity: range(summary.aperiodicity),
    poisson: summary.poissonFromMeanRecurrence.map((w) => ({ windowYears: w.windowYears, ...range(w.probability) })),
    models,
    modelAveraged: summary.modelAveraged.map(windowProbability),
    parameterNote: summary.parameterUncertainty
      ? RENEWAL_PRIOR_NOTE
      : 'Probabilities are plug-in figures: the maximum-likelihood fit of each age draw, so their ranges show dating uncertainty only.',
    preferredModel: median.comparison.preferred,
    modelComparisonNote: comparisonNote(median.comparison.note, models, summary.drawCount),
    curves: curves.curves.map((curve) => ({
      model: curve.model,
      density: points(curve.pdf),
      hazard: points(curve.hazard),
      survival: points(curve.survival),
    })),
    histogram: summary.intervalHistogram.map((bin) => ({ fromYears: bin.fromYears, toYears: bin.toYears, count: bin.count, density: bin.density })),
  };
}

function windowProbability(w: WindowProbability): StoredWindowProbability {
  return {
    windowYears: w.windowYears,
    ...range(w.probability),
    datingOnlyMedian: w.datingOnly.median,
    datingOnlyLow95: w.datingOnly.low95,
    datingOnlyHigh95: w.datingOnly.high95,
  };
}

function range(value: CredibleRange): StoredRange {
  return { median: value.median, low95: value.low95, high95: value.high95 };
}

function comparisonNote(note: string, models: readonly StoredModelResult[], drawCount: number): string {
  const warnings = models
    .filter((m) => m.unconvergedDraws > UNCONVERGED_WARNING_SHARE * drawCount)
    .map((m) => ` The ${RENEWAL_MODEL_LABELS[m.model]} fit did not converge in ${m.unconvergedDraws} of ${drawCount} draws; treat its dating-only ranges with care.`);
  const approximate = models
    .filter((m) => (m.approximateDraws ?? 0) > 0)
    .map((m) => ` ${m.approximateDraws} ${RENEWAL_MODEL_LABELS[m.model]} parameter draws were importance-resampled (the open interval is far beyond the record).`);
  return (
    `${note} AIC, AICc and the point parameters are from the fit to the median event ages; ranges are over all draws, ` +
    'with parameter uncertainty (headline) and from dating alone (beside it).' +
    warnings.join('') +
    approximate.join('')
  );
}
