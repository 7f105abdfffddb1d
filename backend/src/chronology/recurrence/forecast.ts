/**
 * A forecast for a record whose intervals are known exactly (scripts, checks, teaching a reviewer
 * what the numbers mean): draws of one model's parameters from their posterior (posterior.ts),
 * and for each draw the conditional probability of the next event in each window given the open
 * interval, (F(t_e + dT) - F(t_e)) / S(t_e). Ranges are the median and central 95 % of the draws.
 */
import { SeededRandom } from '../common/random';
import type { RenewalModel } from './distributions';
import { RecurrenceInputError } from './errors';
import { prepareIntervals } from './fit';
import { credibleRange, type CredibleRange } from './monte-carlo';
import { posteriorSampler } from './posterior';

export interface ForecastInput {
  readonly model: RenewalModel;
  readonly intervalsYears: readonly number[];
  readonly openIntervalYears: number;
  readonly windowsYears: readonly number[];
  readonly seed?: number;
  /** Parameter draws (default 4,000). */
  readonly draws?: number;
}

export interface ForecastResult {
  readonly model: RenewalModel;
  readonly draws: number;
  readonly meanRecurrence: CredibleRange;
  readonly aperiodicity: CredibleRange;
  readonly probabilities: ReadonlyArray<{ readonly windowYears: number; readonly range: CredibleRange }>;
  /** Draws that fell back to importance resampling (an open interval far beyond the record). */
  readonly approximateDraws: number;
}

export const FORECAST_DEFAULT_DRAWS = 4_000;

/** Posterior ranges of the mean recurrence, aperiodicity and window probabilities. */
export function forecastRenewal(input: ForecastInput): ForecastResult {
  const draws = input.draws ?? FORECAST_DEFAULT_DRAWS;
  if (!Number.isInteger(draws) || draws < 100) {
    throw new RecurrenceInputError('draws', `The number of parameter draws must be a whole number of at least 100; it is ${draws}.`);
  }
  if (!(input.openIntervalYears >= 0) || !Number.isFinite(input.openIntervalYears)) {
    throw new RecurrenceInputError('openIntervalYears', `The open interval must be zero or more years; it is ${input.openIntervalYears}.`);
  }
  if (input.windowsYears.length === 0) throw new RecurrenceInputError('windowsYears', 'Give at least one forecast window.');
  for (const window of input.windowsYears) {
    if (!(window > 0) || !Number.isFinite(window)) {
      throw new RecurrenceInputError('windowsYears', `Forecast windows must be positive numbers of years; one is ${window}.`);
    }
  }
  const data = prepareIntervals({ closedIntervals: input.intervalsYears, openInterval: input.openIntervalYears });
  const sampler = posteriorSampler(input.model, data);
  const random = new SeededRandom(input.seed ?? 1);
  const mu = new Float64Array(draws);
  const alpha = new Float64Array(draws);
  const probabilities = input.windowsYears.map(() => new Float64Array(draws));
  let approximateDraws = 0;
  for (let d = 0; d < draws; d++) {
    const draw = sampler(random);
    if (draw.approximate) approximateDraws++;
    mu[d] = draw.distribution.mu;
    alpha[d] = draw.distribution.alpha;
    for (let w = 0; w < input.windowsYears.length; w++) {
      probabilities[w][d] = draw.distribution.conditionalProbability(input.openIntervalYears, input.windowsYears[w]);
    }
  }
  return {
    model: input.model,
    draws,
    meanRecurrence: credibleRange(mu),
    aperiodicity: credibleRange(alpha),
    probabilities: input.windowsYears.map((windowYears, w) => ({ windowYears, range: credibleRange(probabilities[w]) })),
    approximateDraws,
  };
}
