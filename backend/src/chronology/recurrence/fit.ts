/**
 * Maximum-likelihood fits of renewal models to a paleoseismic record: the closed inter-event
 * intervals tau_i plus, optionally, the open interval t_e since the last event, which is
 * right-censored (no event yet), so the likelihood is
 *   L = prod_i f(tau_i) x S(t_e),  S = 1 - F
 * (Biasi, Weldon, Fumal & Seitz 2002, BSSA 92(7); Parsons 2008, JGR 113, B03302).
 * Models are compared by AIC = 2k - 2 ln L (Akaike 1974, IEEE Trans. Autom. Control 19(6)) and,
 * because records hold 5-15 intervals, by its small-sample correction
 *   AICc = AIC + 2k(k + 1) / (n - k - 1)
 * (Hurvich & Tsai 1989, Biometrika 76(2):297-307 [memory for the pages]), with n the number of
 * intervals, the open one counted; AICc is undefined (null) when n <= k + 1.
 *
 * The exponential (Poisson) fit has a closed form. The others are maximised by Nelder-Mead over
 * unbounded coordinates of each model's own parameters (BPT: ln mu, ln alpha; lognormal:
 * m, ln sigma; Weibull: ln scale, ln shape); the maximum likelihood estimate does not depend on
 * the parameterisation, and these keep every evaluation cheap (sums prepared once per record).
 */
import {
  bptLogSurvival,
  distributionFromParameters,
  logGamma,
  RENEWAL_MODEL_LABELS,
  RENEWAL_MODELS,
  type RenewalDistribution,
  type RenewalModel,
  type RenewalParameters,
  weibullAperiodicity,
} from './distributions';
import { RecurrenceInputError } from './errors';
import { minimiseNelderMead } from './nelder-mead';
import { LOG_SQRT_2PI, logUpperTailNormal } from './normal-tail';

/** A record of inter-event times, in years. */
export interface RecurrenceIntervals {
  /** Closed intervals between consecutive events. */
  readonly closedIntervals: ArrayLike<number>;
  /** Years from the last event to the forecast start: a right-censored interval. */
  readonly openInterval?: number | null;
}

/** One renewal model fitted by maximum likelihood. Plain data: safe to store as JSON. */
export interface RenewalFit {
  readonly model: RenewalModel;
  /** Mean recurrence, years. */
  readonly mu: number;
  /** Aperiodicity (coefficient of variation); 1 for Poisson. */
  readonly alpha: number;
  /** The model's own parameters, for `distributionFromFit`. */
  readonly parameters: RenewalParameters;
  readonly logLikelihood: number;
  /** 2k - 2 ln L. */
  readonly aic: number;
  /** AIC + 2k(k+1)/(n-k-1), n intervals with the open one; null when n <= k + 1. */
  readonly aicc: number | null;
  /** k: 1 for Poisson, 2 for the others. */
  readonly parameterCount: number;
  readonly closedIntervalCount: number;
  readonly openIntervalYears: number | null;
  /** False when the optimiser ran out of budget or stopped on a parameter bound. */
  readonly converged: boolean;
}

/** Sums of a record computed once and shared by every model's likelihood. */
export interface PreparedIntervals {
  readonly closed: Float64Array;
  readonly logClosed: Float64Array;
  readonly count: number;
  /** 0 when there is no open interval (S(0) = 1 adds nothing to ln L). */
  readonly openInterval: number;
  readonly hasOpenInterval: boolean;
  readonly sum: number;
  readonly mean: number;
  /** Harmonic mean h = n / sum(1/tau). */
  readonly harmonicMean: number;
  /** sum (tau - h)^2 / tau, which equals sum(tau) - n h without its cancellation. */
  readonly harmonicDispersion: number;
  readonly sumLog: number;
  readonly meanLog: number;
  /** sum (ln tau - mean ln tau)^2. */
  readonly logSumOfSquares: number;
  readonly sd: number;
}

/**
 * Checks a record and prepares its sums. At least two closed intervals are needed: one interval
 * says nothing about variability, so no two-parameter model can be fitted.
 */
export function prepareIntervals(intervals: RecurrenceIntervals): PreparedIntervals {
  const n = intervals.closedIntervals.length;
  if (n < 2) {
    throw new RecurrenceInputError(
      'closedIntervals',
      `At least 2 closed intervals between events are needed to fit a renewal model; this record has ${n}.`,
    );
  }
  const closed = Float64Array.from(intervals.closedIntervals);
  for (let i = 0; i < n; i++) {
    if (!(closed[i] > 0) || !Number.isFinite(closed[i])) {
      throw new RecurrenceInputError(
        'closedIntervals',
        `Closed interval ${i + 1} must be a positive number of years; it is ${closed[i]}.`,
      );
    }
  }
  const open = intervals.openInterval ?? null;
  if (open !== null && (!(open >= 0) || !Number.isFinite(open))) {
    throw new RecurrenceInputError(
      'openInterval',
      `The open interval since the last event must be zero or more years; it is ${open}.`,
    );
  }
  const logClosed = new Float64Array(n);
  let sum = 0;
  let sumInverse = 0;
  let sumLog = 0;
  for (let i = 0; i < n; i++) {
    sum += closed[i];
    sumInverse += 1 / closed[i];
    logClosed[i] = Math.log(closed[i]);
    sumLog += logClosed[i];
  }
  const mean = sum / n;
  const harmonicMean = n / sumInverse;
  const meanLog = sumLog / n;
  let harmonicDispersion = 0;
  let logSumOfSquares = 0;
  let sumOfSquares = 0;
  for (let i = 0; i < n; i++) {
    const fromHarmonic = closed[i] - harmonicMean;
    harmonicDispersion += (fromHarmonic * fromHarmonic) / closed[i];
    logSumOfSquares += (logClosed[i] - meanLog) ** 2;
    sumOfSquares += (closed[i] - mean) ** 2;
  }
  return {
    closed,
    logClosed,
    count: n,
    openInterval: open ?? 0,
    hasOpenInterval: open !== null && open > 0,
    sum,
    mean,
    harmonicMean,
    harmonicDispersion,
    sumLog,
    meanLog,
    logSumOfSquares,
    sd: Math.sqrt(sumOfSquares / (n - 1)),
  };
}

function isPrepared(intervals: RecurrenceIntervals | PreparedIntervals): intervals is PreparedIntervals {
  return 'logClosed' in intervals;
}

function prepared(intervals: RecurrenceIntervals | PreparedIntervals): PreparedIntervals {
  return isPrepared(intervals) ? intervals : prepareIntervals(intervals);
}

function makeFit(
  data: PreparedIntervals,
  model: RenewalModel,
  mu: number,
  alpha: number,
  parameters: RenewalParameters,
  logLikelihood: number,
  parameterCount: number,
  converged: boolean,
): RenewalFit {
  const aic = 2 * parameterCount - 2 * logLikelihood;
  return {
    model,
    mu,
    alpha,
    parameters,
    logLikelihood,
    aic,
    aicc: smallSampleAic(aic, parameterCount, data.count + (data.hasOpenInterval ? 1 : 0)),
    parameterCount,
    closedIntervalCount: data.count,
    openIntervalYears: data.hasOpenInterval ? data.openInterval : null,
    converged,
  };
}

/** AICc (Hurvich & Tsai 1989); null when n <= k + 1, where the correction is undefined. */
export function smallSampleAic(aic: number, parameterCount: number, intervalCount: number): number | null {
  const denominator = intervalCount - parameterCount - 1;
  return denominator > 0 ? aic + (2 * parameterCount * (parameterCount + 1)) / denominator : null;
}

/**
 * Exponential (Poisson) maximum likelihood with the open interval: ln L = -n ln mu - (sum tau +
 * t_e) / mu is largest at mu = (sum tau + t_e) / n [analytic], where ln L = -n ln mu - n.
 */
export function fitPoisson(intervals: RecurrenceIntervals | PreparedIntervals): RenewalFit {
  const data = prepared(intervals);
  const mu = (data.sum + data.openInterval) / data.count;
  return makeFit(data, 'POISSON', mu, 1, { model: 'POISSON', mu }, -data.count * Math.log(mu) - data.count, 1, true);
}

/** Coordinates of a two-parameter search, kept within bounds that no real record reaches. */
interface Bounds {
  readonly low: readonly [number, number];
  readonly high: readonly [number, number];
}

const SEARCH_OPTIONS = { initialStep: 0.15, valueTolerance: 1e-9, pointTolerance: 1e-7, maxEvaluations: 2000 };

function searchMaximum(
  negativeLogLikelihood: (x0: number, x1: number) => number,
  start: readonly [number, number],
  bounds: Bounds,
): { point: Float64Array; logLikelihood: number; converged: boolean } {
  const inBounds = (x0: number, x1: number): boolean =>
    x0 >= bounds.low[0] && x0 <= bounds.high[0] && x1 >= bounds.low[1] && x1 <= bounds.high[1];
  const clamped: [number, number] = [
    Math.min(Math.max(start[0], bounds.low[0]), bounds.high[0]),
    Math.min(Math.max(start[1], bounds.low[1]), bounds.high[1]),
  ];
  const result = minimiseNelderMead(
    (x) => (inBounds(x[0], x[1]) ? negativeLogLikelihood(x[0], x[1]) : Infinity),
    clamped,
    SEARCH_OPTIONS,
  );
  const margin = 1e-6;
  const onBound =
    result.point[0] - bounds.low[0] < margin ||
    bounds.high[0] - result.point[0] < margin ||
    result.point[1] - bounds.low[1] < margin ||
    bounds.high[1] - result.point[1] < margin;
  return { point: result.point, logLikelihood: -result.value, converged: result.converged && !onBound };
}

/**
 * BPT (inverse Gaussian) maximum likelihood (Matthews et al. 2002 for the density). With
 * m1 = mean tau and h the harmonic mean, sum (tau - mu)^2 / tau = D + (n / h)(mu - h)^2 with
 * D = sum (tau - h)^2 / tau, so each evaluation costs O(1) plus one survival term. The start is
 * the uncensored closed form mu = m1, alpha^2 = m1 / h - 1 (the inverse-Gaussian MLE).
 */
export function fitBpt(intervals: RecurrenceIntervals | PreparedIntervals): RenewalFit {
  const data = prepared(intervals);
  const n = data.count;
  const inverseHarmonic = 1 / data.harmonicMean;
  const constant = -n * LOG_SQRT_2PI - 1.5 * data.sumLog;
  const negativeLogLikelihood = (logMu: number, logAlpha: number): number => {
    const mu = Math.exp(logMu);
    const alpha = Math.exp(logAlpha);
    const offset = mu - data.harmonicMean;
    const squares = data.harmonicDispersion + n * inverseHarmonic * offset * offset;
    let logLikelihood = constant + n * (0.5 * logMu - logAlpha) - squares / (2 * mu * alpha * alpha);
    if (data.hasOpenInterval) logLikelihood += bptLogSurvival(data.openInterval, mu, alpha);
    return -logLikelihood;
  };
  const alphaStart = Math.sqrt(Math.max(data.harmonicDispersion / (n * data.harmonicMean), 1e-4));
  const logMean = Math.log(data.mean);
  const search = searchMaximum(negativeLogLikelihood, [logMean, Math.log(alphaStart)], {
    low: [logMean - 7, Math.log(1e-3)],
    high: [logMean + 7, Math.log(20)],
  });
  const mu = Math.exp(search.point[0]);
  const alpha = Math.exp(search.point[1]);
  return makeFit(data, 'BPT', mu, alpha, { model: 'BPT', mu, alpha }, search.logLikelihood, 2, search.converged);
}

/**
 * Lognormal maximum likelihood on (m, ln sigma), ln tau ~ N(m, sigma^2). The uncensored MLE
 * (mean and population SD of ln tau) is the start.
 */
export function fitLognormal(intervals: RecurrenceIntervals | PreparedIntervals): RenewalFit {
  const data = prepared(intervals);
  const n = data.count;
  const logOpen = data.hasOpenInterval ? Math.log(data.openInterval) : 0;
  const constant = -data.sumLog - n * LOG_SQRT_2PI;
  const negativeLogLikelihood = (logMean: number, logLogSd: number): number => {
    const logSd = Math.exp(logLogSd);
    const offset = data.meanLog - logMean;
    const squares = data.logSumOfSquares + n * offset * offset;
    let logLikelihood = constant - n * logLogSd - squares / (2 * logSd * logSd);
    if (data.hasOpenInterval) logLikelihood += logUpperTailNormal((logOpen - logMean) / logSd);
    return -logLikelihood;
  };
  const logSdStart = Math.sqrt(Math.max(data.logSumOfSquares / n, 1e-6));
  const search = searchMaximum(negativeLogLikelihood, [data.meanLog, Math.log(logSdStart)], {
    low: [data.meanLog - 20, Math.log(1e-3)],
    high: [data.meanLog + 20, Math.log(10)],
  });
  const logMean = search.point[0];
  const logSd = Math.exp(search.point[1]);
  const variance = logSd * logSd;
  return makeFit(
    data,
    'LOGNORMAL',
    Math.exp(logMean + variance / 2),
    Math.sqrt(Math.expm1(variance)),
    { model: 'LOGNORMAL', logMean, logSd },
    search.logLikelihood,
    2,
    search.converged,
  );
}

/**
 * Weibull maximum likelihood on (ln scale, ln shape):
 * ln L = n ln k - n k ln s + (k - 1) sum ln tau - sum (tau/s)^k - (t_e/s)^k.
 * Start: shape from the sample CV by the approximation k = CV^-1.086 (Justus, Hargraves,
 * Mikhail & Graber 1978, J. Appl. Meteorol. 17(3) [memory]; only a starting point), scale from the
 * mean.
 */
export function fitWeibull(intervals: RecurrenceIntervals | PreparedIntervals): RenewalFit {
  const data = prepared(intervals);
  const n = data.count;
  const logClosed = data.logClosed;
  const logOpen = data.hasOpenInterval ? Math.log(data.openInterval) : 0;
  const negativeLogLikelihood = (logScale: number, logShape: number): number => {
    const shape = Math.exp(logShape);
    let powers = 0;
    for (let i = 0; i < n; i++) powers += Math.exp(shape * (logClosed[i] - logScale));
    if (data.hasOpenInterval) powers += Math.exp(shape * (logOpen - logScale));
    const logLikelihood = n * logShape - n * shape * logScale + (shape - 1) * data.sumLog - powers;
    return -logLikelihood;
  };
  const cv = Math.min(Math.max(data.sd / data.mean, 0.02), 5);
  const shapeStart = Math.pow(cv, -1.086);
  const scaleStart = data.mean / Math.exp(logGamma(1 + 1 / shapeStart));
  const logMean = Math.log(data.mean);
  const search = searchMaximum(negativeLogLikelihood, [Math.log(scaleStart), Math.log(shapeStart)], {
    low: [logMean - 7, Math.log(0.05)],
    high: [logMean + 7, Math.log(5000)],
  });
  const scale = Math.exp(search.point[0]);
  const shape = Math.exp(search.point[1]);
  return makeFit(
    data,
    'WEIBULL',
    scale * Math.exp(logGamma(1 + 1 / shape)),
    weibullAperiodicity(shape),
    { model: 'WEIBULL', shape, scale },
    search.logLikelihood,
    2,
    search.converged,
  );
}

/** Fits one model. */
export function fitRenewalModel(model: RenewalModel, intervals: RecurrenceIntervals | PreparedIntervals): RenewalFit {
  switch (model) {
    case 'POISSON':
      return fitPoisson(intervals);
    case 'BPT':
      return fitBpt(intervals);
    case 'LOGNORMAL':
      return fitLognormal(intervals);
    case 'WEIBULL':
      return fitWeibull(intervals);
  }
}

/** Fits each of `models` (all four by default) to one record, preparing its sums once. */
export function fitAllModels(
  intervals: RecurrenceIntervals | PreparedIntervals,
  models: readonly RenewalModel[] = RENEWAL_MODELS,
): RenewalFit[] {
  const data = prepared(intervals);
  return models.map((model) => fitRenewalModel(model, data));
}

/** The fitted distribution, rebuilt from the fit's own parameters. */
export function distributionFromFit(fit: RenewalFit): RenewalDistribution {
  return distributionFromParameters(fit.parameters);
}

export interface ModelComparisonRow {
  readonly model: RenewalModel;
  readonly aic: number;
  /** AIC minus the lowest AIC. */
  readonly deltaAic: number;
  /** Null when the record is too short for the correction (n <= k + 1). */
  readonly aicc: number | null;
  /** AICc minus the lowest AICc; null with `aicc`. */
  readonly deltaAicc: number | null;
  /**
   * exp(-delta/2) normalised over the models compared, from AICc; a model without an AICc gets
   * weight 0. Only when no model has an AICc do the weights come from AIC (`weightsFrom`).
   */
  readonly akaikeWeight: number;
}

export interface ModelComparison {
  /** Rows in order of increasing AICc (AIC when no model has one). */
  readonly rows: readonly ModelComparisonRow[];
  readonly preferred: RenewalModel;
  /** False when every model is within 2 units of the best. */
  readonly distinguishable: boolean;
  /** Which criterion ranks and weighs the models. */
  readonly weightsFrom: 'AICC' | 'AIC';
  /** A plain-language reading of the table. */
  readonly note: string;
}

/** Support levels for a delta AIC (Burnham & Anderson 2002, Model Selection and Multimodel Inference, 2nd ed., section 2.6 [common practice]). */
function supportWording(deltaAic: number): string {
  if (deltaAic <= 4) return 'less supported';
  if (deltaAic <= 7) return 'considerably less supported';
  if (deltaAic <= 10) return 'poorly supported';
  return 'essentially unsupported';
}

/** Akaike weights exp(-delta/2) / sum over scores (Burnham & Anderson 2002); Infinity scores weigh 0. */
export function akaikeWeights(scores: ArrayLike<number>, out = new Float64Array(scores.length)): Float64Array {
  let lowest = Infinity;
  for (let i = 0; i < scores.length; i++) if (scores[i] < lowest) lowest = scores[i];
  let total = 0;
  for (let i = 0; i < scores.length; i++) {
    out[i] = Number.isFinite(scores[i]) ? Math.exp(-(scores[i] - lowest) / 2) : 0;
    total += out[i];
  }
  for (let i = 0; i < scores.length; i++) out[i] = total > 0 ? out[i] / total : 1 / scores.length;
  return out;
}

/**
 * Delta AIC, delta AICc and Akaike weights from AICc (Burnham & Anderson 2002, who recommend AICc
 * whenever n / k is below about 40), with a note that says when the record cannot tell the models
 * apart: the rule of thumb that models within 2 units of the best have substantial support
 * [common practice].
 */
export function compareModels(fits: readonly RenewalFit[]): ModelComparison {
  if (fits.length === 0) throw new RecurrenceInputError('fits', 'There are no model fits to compare.');
  const anyAicc = fits.some((fit) => fit.aicc !== null);
  const weightsFrom = anyAicc ? 'AICC' : 'AIC';
  const score = (fit: RenewalFit): number => (anyAicc ? (fit.aicc ?? Infinity) : fit.aic);
  const sorted = [...fits].sort((x, y) => score(x) - score(y) || x.aic - y.aic);
  const lowestAic = Math.min(...fits.map((fit) => fit.aic));
  const finiteAicc = fits.map((fit) => fit.aicc).filter((value): value is number => value !== null);
  const lowestAicc = finiteAicc.length > 0 ? Math.min(...finiteAicc) : null;
  const weights = akaikeWeights(sorted.map(score));
  const rows = sorted.map((fit, i) => ({
    model: fit.model,
    aic: fit.aic,
    deltaAic: fit.aic - lowestAic,
    aicc: fit.aicc,
    deltaAicc: fit.aicc !== null && lowestAicc !== null ? fit.aicc - lowestAicc : null,
    akaikeWeight: weights[i],
  }));
  const preferred = rows[0].model;
  const delta = (row: ModelComparisonRow): number => (anyAicc ? (row.deltaAicc ?? Infinity) : row.deltaAic);
  const distinguishable = rows.length > 1 && rows.some((row) => delta(row) >= 2);
  const undefinedFor = rows.filter((row) => row.aicc === null).map((row) => RENEWAL_MODEL_LABELS[row.model]);
  const caveat =
    undefinedFor.length === 0
      ? ''
      : anyAicc
        ? ` The record has too few intervals for AICc with ${listed(undefinedFor)} (n <= k + 1), so they get no weight.`
        : ' The record has too few intervals for AICc with any model (n <= k + 1); the weights come from AIC, which favours the richer models here.';
  return {
    rows,
    preferred,
    distinguishable,
    weightsFrom,
    note: comparisonNote(rows, distinguishable, anyAicc ? 'AICc' : 'AIC', delta) + caveat,
  };
}

function comparisonNote(
  rows: readonly ModelComparisonRow[],
  distinguishable: boolean,
  criterion: string,
  delta: (row: ModelComparisonRow) => number,
): string {
  const label = (model: RenewalModel): string => RENEWAL_MODEL_LABELS[model];
  if (rows.length === 1) return `Only the ${label(rows[0].model)} model was fitted; there is nothing to compare.`;
  if (!distinguishable) {
    return (
      `The record cannot tell these models apart: every model is within 2 ${criterion} units of the best ` +
      '(a common rule of thumb), so report their probabilities side by side rather than choosing one.'
    );
  }
  const close = rows.filter((row) => delta(row) < 2);
  const others = rows.slice(close.length).filter((row) => Number.isFinite(delta(row)));
  const lead =
    close.length > 1
      ? `The record cannot tell ${listed(close.map((row) => label(row.model)))} apart (all within 2 ${criterion} units of the lowest, a common rule of thumb)`
      : `${label(rows[0].model)} has the lowest ${criterion} (Akaike weight ${rows[0].akaikeWeight.toFixed(2)})`;
  const rest = others.map(
    (row) => `${label(row.model)} is ${supportWording(delta(row))} (delta ${criterion} ${delta(row).toFixed(1)})`,
  );
  return rest.length > 0 ? `${lead}; ${rest.join('; ')}.` : `${lead}.`;
}

function listed(names: readonly string[]): string {
  return names.length <= 2 ? names.join(' and ') : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}
