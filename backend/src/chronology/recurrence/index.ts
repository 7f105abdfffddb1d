/** The recurrence engine's public surface: import from here, not from the files behind it. */
export type { RenewalDistribution, RenewalModel, RenewalParameters } from './distributions';
export {
  RENEWAL_MODEL_LABELS,
  RENEWAL_MODELS,
  bptDistribution,
  bptHazardLimit,
  distributionFromParameters,
  lognormalDistribution,
  lognormalFromLogParameters,
  poissonDistribution,
  renewalDistribution,
  weibullDistribution,
  weibullFromShapeScale,
  weibullShapeFromAperiodicity,
} from './distributions';
export { RecurrenceCancelledError, RecurrenceInputError } from './errors';
export type { ModelComparison, ModelComparisonRow, RecurrenceIntervals, RenewalFit } from './fit';
export {
  akaikeWeights,
  compareModels,
  distributionFromFit,
  smallSampleAic,
  fitAllModels,
  fitBpt,
  fitLognormal,
  fitPoisson,
  fitRenewalModel,
  fitWeibull,
} from './fit';
export type {
  CredibleRange,
  IntervalStatistics,
  MedianSequenceFits,
  ModelRecurrence,
  PointWindowProbability,
  RecurrenceOptions,
  RecurrenceSummary,
  SimulationOptions,
  WindowProbability,
} from './monte-carlo';
export { credibleRange, intervalStatistics, simulateRecurrence, spreadWithinYears, summariseRecurrence } from './monte-carlo';
export type { ParameterDraw, PosteriorSampler } from './posterior';
export { APERIODICITY_LIMIT, gammaVariate, posteriorSampler, RENEWAL_PRIOR_NOTE } from './posterior';
export type { ForecastInput, ForecastResult } from './forecast';
export { FORECAST_DEFAULT_DRAWS, forecastRenewal } from './forecast';
export type { OrderedSequenceSampler } from './ordered-sequence';
export { drawOrderedSequence, orderedSequenceSampler } from './ordered-sequence';
export type { HistogramBin, HistogramOptions, RenewalCurve, RenewalCurves } from './curves';
export { intervalHistogram, renewalCurves } from './curves';
export type { CandidateEvent, CandidateMember, CountingRule, EventTableRow, RecordSize, SegmentExtent } from './event-counting';
export {
  applyCountingRule,
  checkCountingRule,
  DEFAULT_COUNTING_RULE,
  GRADE_COUNT,
  INCLUSION_METHOD_NOTE,
  recordSize,
  spanShare,
} from './event-counting';
