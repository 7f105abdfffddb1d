/**
 * Recurrence statistics with their uncertainty, by Monte Carlo over joint draws of the event ages
 * (SPEC "Computation 4"): every draw is one possible history, ordered; from it come the
 * inter-event times, their mean, median, SD and coefficient of variation, the open interval to
 * the forecast start, maximum-likelihood fits of every renewal model (the open interval
 * censored) and each model's conditional probability for each forecast window. Each quantity is
 * reported as the median and the 2.5-97.5 % range over draws. Point fits on the median sequence
 * sit beside them, as analysts often quote those.
 *
 * Parameter uncertainty: a maximum-likelihood fit per draw shows the dating error only, and with
 * 5-15 intervals the parameters are far less certain than the dating (a BPT mean recurrence from
 * six intervals is known to perhaps +-20 %). So, for every age draw, each model's parameters are
 * also drawn once from their posterior given that draw's record (posterior.ts), and the window
 * probabilities computed from those parameters: over all draws this is the posterior mixed over
 * the dating, the headline range. The plug-in (dating-only) ranges are kept beside it. The
 * model-averaged row weights each draw's probabilities by that draw's Akaike weights from AICc.
 *
 * Ages are cal BP (years before AD 1950), so a forecast starting in year Y CE is 1950 - Y cal BP
 * and the open interval is (age of the last event) - (1950 - Y).
 */
import type { CalendarDensity } from '../common/density';
import { SeededRandom } from '../common/random';
import { RENEWAL_MODELS, type RenewalModel } from './distributions';
import { RecurrenceCancelledError, RecurrenceInputError } from './errors';
import {
  akaikeWeights,
  compareModels,
  distributionFromFit,
  fitAllModels,
  type ModelComparison,
  prepareIntervals,
  type RenewalFit,
} from './fit';
import { type HistogramBin, intervalHistogram } from './curves';
import { orderedSequenceSampler } from './ordered-sequence';
import { posteriorSampler } from './posterior';

/** The median and central 95 % range of a quantity over Monte Carlo draws. */
export interface CredibleRange {
  readonly median: number;
  readonly low95: number;
  readonly high95: number;
}

export interface WindowProbability {
  readonly windowYears: number;
  /**
   * The headline range: dating and parameter uncertainty together (parameters drawn from their
   * posterior per age draw) unless the summary was asked for plug-in figures only.
   */
  readonly probability: CredibleRange;
  /** Dating uncertainty only: the maximum-likelihood fit of each age draw, plugged in. */
  readonly datingOnly: CredibleRange;
}

export interface ModelRecurrence {
  readonly model: RenewalModel;
  /** Mean recurrence, dating and parameters (headline). */
  readonly mu: CredibleRange;
  /** Aperiodicity, dating and parameters (headline). */
  readonly alpha: CredibleRange;
  /** Mean recurrence of the per-draw maximum-likelihood fits: dating only. */
  readonly muDatingOnly: CredibleRange;
  readonly alphaDatingOnly: CredibleRange;
  readonly probabilities: readonly WindowProbability[];
  /** Share of draws in which this model has the lowest AICc (AIC where no AICc exists). */
  readonly preferredShare: number;
  /** Median over draws of the model's Akaike weight from AICc. */
  readonly medianAkaikeWeight: number;
  /** Draws whose fit did not converge (kept, but worth a warning above a few per cent). */
  readonly unconvergedDraws: number;
  /** Parameter draws that fell back to importance resampling (posterior.ts). */
  readonly approximateDraws: number;
}

export interface PointWindowProbability {
  readonly windowYears: number;
  readonly probability: number;
}

/** Fits and probabilities on the sequence of per-event median ages. */
export interface MedianSequenceFits {
  /** Median age of each event over the draws, cal BP, oldest first. */
  readonly eventAgesCalBp: readonly number[];
  readonly closedIntervals: readonly number[];
  readonly openInterval: number;
  readonly fits: readonly RenewalFit[];
  readonly comparison: ModelComparison;
  readonly probabilities: ReadonlyArray<{ readonly model: RenewalModel; readonly windows: readonly PointWindowProbability[] }>;
  /** 1 - exp(-dT / mean recurrence) from the median sequence's mean interval. */
  readonly poissonFromMeanRecurrence: readonly PointWindowProbability[];
}

export interface RecurrenceSummary {
  readonly drawCount: number;
  readonly eventCount: number;
  readonly forecastStartYearCe: number;
  readonly forecastStartCalBp: number;
  readonly windowsYears: readonly number[];
  /** Interval i runs from event i to event i + 1, oldest first. */
  readonly intervals: readonly CredibleRange[];
  readonly meanRecurrence: CredibleRange;
  readonly medianRecurrence: CredibleRange;
  readonly sdRecurrence: CredibleRange;
  /** Coefficient of variation of the intervals, SD / mean (sample SD, n - 1). */
  readonly aperiodicity: CredibleRange;
  readonly openInterval: CredibleRange;
  readonly models: readonly ModelRecurrence[];
  /** The plain Poisson figure 1 - exp(-dT / mean recurrence), per draw, beside the models (dating only). */
  readonly poissonFromMeanRecurrence: readonly WindowProbability[];
  /**
   * Per draw, the models' probabilities weighted by that draw's Akaike weights from AICc
   * (Burnham & Anderson 2002, section 4.3, model averaging); headline and dating-only.
   */
  readonly modelAveraged: readonly WindowProbability[];
  /** Whether the headline ranges include parameter uncertainty. */
  readonly parameterUncertainty: boolean;
  readonly medianSequence: MedianSequenceFits;
  /** All draws' intervals pooled, for the interval histogram. */
  readonly intervalHistogram: readonly HistogramBin[];
  /**
   * With inclusion probabilities: for each interval of `intervals`, the share of draws in which
   * its younger event was kept with an older one before it (1 for every interval without them).
   */
  readonly intervalShares: readonly number[];
  /** Events in a draw's record (the event count in every draw without inclusion probabilities). */
  readonly recordEvents: CredibleRange;
  /** Median age of every event over the draws, cal BP, oldest first (kept or not). */
  readonly eventMedianAgesCalBp: readonly number[];
}

export interface RecurrenceOptions {
  /** Calendar year (CE, astronomical) the forecast windows start from. */
  readonly forecastStartYearCe: number;
  /** Forecast window lengths, years (e.g. 30, 50, 100). */
  readonly windowsYears: readonly number[];
  /** Models to fit; all four by default. */
  readonly models?: readonly RenewalModel[];
  /** Called every `progressInterval` draws and at the end. */
  readonly onProgress?: (completedDraws: number, totalDraws: number) => void;
  /** Polled every `progressInterval` draws; returning true stops with RecurrenceCancelledError. */
  readonly shouldCancel?: () => boolean;
  /** Draws between progress reports and cancellation checks (default 200). */
  readonly progressInterval?: number;
  /**
   * Seed for spreading tied ages (default 1). A site model's draws are grid years, each standing
   * for the year centred on it (as the ordered sampler reads it); events that share a year become
   * ordered uniform points in that year, so they still give intervals longer than zero.
   */
  readonly spreadSeed?: number;
  /**
   * Draw each model's parameters from their posterior per age draw (default true). False gives
   * the plug-in figures (maximum-likelihood fit per draw) as the headline, for comparison only.
   */
  readonly parameterUncertainty?: boolean;
  /** Seed of the parameter draws (default 1). */
  readonly parameterSeed?: number;
  /**
   * Probability (0-1] that each event is in a draw's record, oldest first (the k-th oldest age of
   * every draw; for ordered draws that is the k-th event). Absent: every event in every draw.
   * Each draw keeps each event with its probability, independently, and is drawn again while it
   * keeps fewer than three (see INCLUSION_METHOD_NOTE in event-counting.ts).
   */
  readonly inclusionProbabilities?: readonly number[];
  /** Seed of the inclusion draws (default 1). */
  readonly inclusionSeed?: number;
}

/** Most attempts at a record of at least three events before the weights are refused. */
const INCLUSION_ATTEMPTS = 10_000;

/**
 * Recurrence statistics from joint event-age draws. Each draw is the ages of the same events in
 * cal BP, in any order: a draw is sorted oldest first, so event k is the k-th oldest in every
 * draw and interval i joins the i-th and (i+1)-th oldest events.
 */
export function summariseRecurrence(
  eventAgeDraws: ReadonlyArray<ArrayLike<number>>,
  options: RecurrenceOptions,
): RecurrenceSummary {
  const models = options.models ?? RENEWAL_MODELS;
  const windows = checkOptions(options, models);
  const drawCount = eventAgeDraws.length;
  if (drawCount === 0) throw new RecurrenceInputError('eventAgeDraws', 'There are no event-age draws to summarise.');
  const eventCount = eventAgeDraws[0].length;
  if (eventCount < 3) {
    throw new RecurrenceInputError(
      'eventAgeDraws',
      `At least 3 events (2 closed intervals) are needed for recurrence statistics; there are ${eventCount}.`,
    );
  }
  const forecastStartCalBp = 1950 - options.forecastStartYearCe;
  const intervalCount = eventCount - 1;
  const progressInterval = Math.max(1, Math.floor(options.progressInterval ?? 200));

  const sortedAges = Array.from({ length: eventCount }, () => new Float64Array(drawCount));
  const intervalDraws = Array.from({ length: intervalCount }, () => new Float64Array(drawCount));
  const meanDraws = new Float64Array(drawCount);
  const medianDraws = new Float64Array(drawCount);
  const sdDraws = new Float64Array(drawCount);
  const cvDraws = new Float64Array(drawCount);
  const openDraws = new Float64Array(drawCount);
  const withParameters = options.parameterUncertainty ?? true;
  const parameterRandom = new SeededRandom(options.parameterSeed ?? 1);
  const muDraws = models.map(() => new Float64Array(drawCount));
  const alphaDraws = models.map(() => new Float64Array(drawCount));
  const probabilityDraws = models.map(() => windows.map(() => new Float64Array(drawCount)));
  const muTotal = withParameters ? models.map(() => new Float64Array(drawCount)) : muDraws;
  const alphaTotal = withParameters ? models.map(() => new Float64Array(drawCount)) : alphaDraws;
  const probabilityTotal = withParameters ? models.map(() => windows.map(() => new Float64Array(drawCount))) : probabilityDraws;
  const weightDraws = models.map(() => new Float64Array(drawCount));
  const averagedTotal = windows.map(() => new Float64Array(drawCount));
  const averagedDatingOnly = windows.map(() => new Float64Array(drawCount));
  const poissonDraws = windows.map(() => new Float64Array(drawCount));
  const preferredCounts = new Float64Array(models.length);
  const unconverged = new Float64Array(models.length);
  const approximate = new Float64Array(models.length);
  const scores = new Float64Array(models.length);
  const weights = new Float64Array(models.length);

  const ages = new Float64Array(eventCount);
  const spreadRandom = new SeededRandom(options.spreadSeed ?? 1);
  const intervals = new Float64Array(intervalCount);
  const scratch = new Float64Array(intervalCount);
  const inclusion = checkInclusion(options.inclusionProbabilities, eventCount);
  const inclusionRandom = new SeededRandom(options.inclusionSeed ?? 1);
  const kept = new Uint8Array(eventCount).fill(1);
  const record = new Float64Array(eventCount);
  const intervalPresent = new Float64Array(intervalCount);
  const recordSizes = new Float64Array(drawCount);
  for (let d = 0; d < drawCount; d++) {
    if (d % progressInterval === 0) {
      if (options.shouldCancel?.()) throw new RecurrenceCancelledError(d);
      if (d > 0) options.onProgress?.(d, drawCount);
    }
    readDraw(eventAgeDraws[d], d, eventCount, ages, spreadRandom);
    for (let k = 0; k < eventCount; k++) sortedAges[k][d] = ages[k];
    if (inclusion) chooseRecord(inclusion, kept, inclusionRandom);
    // The draw's record (the events kept, oldest first); interval i of `intervalDraws` ends at
    // event i + 1 and starts at the next older event kept.
    let size = 0;
    for (let k = 0; k < eventCount; k++) {
      if (kept[k] === 0) {
        if (k > 0) intervalDraws[k - 1][d] = Number.NaN;
        continue;
      }
      if (k > 0) {
        if (size > 0) {
          intervalDraws[k - 1][d] = record[size - 1] - ages[k];
          intervalPresent[k - 1]++;
        } else {
          intervalDraws[k - 1][d] = Number.NaN;
        }
      }
      record[size++] = ages[k];
    }
    recordSizes[d] = size;
    const closedCount = size - 1;
    for (let i = 0; i < closedCount; i++) intervals[i] = record[i] - record[i + 1];
    const closed = closedCount === intervalCount ? intervals : intervals.subarray(0, closedCount);
    const stats = intervalStatistics(closed, closedCount === intervalCount ? scratch : scratch.subarray(0, closedCount));
    meanDraws[d] = stats.mean;
    medianDraws[d] = stats.median;
    sdDraws[d] = stats.sd;
    cvDraws[d] = stats.sd / stats.mean;
    const open = record[size - 1] - forecastStartCalBp;
    if (open < 0) {
      throw new RecurrenceInputError(
        'forecastStartYearCe',
        `The forecast starts before the last event in draw ${d + 1} (last event ${formatAge(record[size - 1])} cal BP, forecast start ${formatAge(forecastStartCalBp)} cal BP).`,
      );
    }
    openDraws[d] = open;
    for (let w = 0; w < windows.length; w++) poissonDraws[w][d] = -Math.expm1(-windows[w] / stats.mean);

    const prepared = prepareIntervals({ closedIntervals: closed, openInterval: open });
    const fits = fitAllModels(prepared, models);
    const anyAicc = fits.some((fit) => fit.aicc !== null);
    for (let m = 0; m < fits.length; m++) scores[m] = anyAicc ? (fits[m].aicc ?? Infinity) : fits[m].aic;
    akaikeWeights(scores, weights);
    let preferred = 0;
    for (let m = 0; m < fits.length; m++) {
      const fit = fits[m];
      if (scores[m] < scores[preferred]) preferred = m;
      if (!fit.converged) unconverged[m]++;
      weightDraws[m][d] = weights[m];
      muDraws[m][d] = fit.mu;
      alphaDraws[m][d] = fit.alpha;
      const distribution = distributionFromFit(fit);
      for (let w = 0; w < windows.length; w++) {
        const probability = distribution.conditionalProbability(open, windows[w]);
        probabilityDraws[m][w][d] = probability;
        averagedDatingOnly[w][d] += weights[m] * probability;
      }
      if (withParameters) {
        const draw = posteriorSampler(fit.model, prepared)(parameterRandom);
        if (draw.approximate) approximate[m]++;
        muTotal[m][d] = draw.distribution.mu;
        alphaTotal[m][d] = draw.distribution.alpha;
        for (let w = 0; w < windows.length; w++) {
          const probability = draw.distribution.conditionalProbability(open, windows[w]);
          probabilityTotal[m][w][d] = probability;
          averagedTotal[w][d] += weights[m] * probability;
        }
      } else {
        for (let w = 0; w < windows.length; w++) averagedTotal[w][d] += weights[m] * probabilityDraws[m][w][d];
      }
    }
    preferredCounts[preferred]++;
  }
  options.onProgress?.(drawCount, drawCount);

  const medianAges = sortedAges.map((values) => credibleRange(values).median);
  // The point fits use the events kept in at least half the draws by their probabilities.
  const medianRecordAges = inclusion ? medianAges.filter((_, k) => inclusion[k] >= 0.5) : medianAges;
  if (medianRecordAges.length < 3) {
    throw new RecurrenceInputError(
      'inclusionProbabilities',
      `Only ${medianRecordAges.length} events have an inclusion probability of at least 0.5; at least 3 are needed for the point fits.`,
    );
  }
  return {
    drawCount,
    eventCount,
    forecastStartYearCe: options.forecastStartYearCe,
    forecastStartCalBp,
    windowsYears: windows,
    intervals: intervalDraws.map((values) => credibleRange(inclusion ? present(values) : values)),
    meanRecurrence: credibleRange(meanDraws),
    medianRecurrence: credibleRange(medianDraws),
    sdRecurrence: credibleRange(sdDraws),
    aperiodicity: credibleRange(cvDraws),
    openInterval: credibleRange(openDraws),
    models: models.map((model, m) => ({
      model,
      mu: credibleRange(muTotal[m]),
      alpha: credibleRange(alphaTotal[m]),
      muDatingOnly: credibleRange(muDraws[m]),
      alphaDatingOnly: credibleRange(alphaDraws[m]),
      probabilities: windows.map((windowYears, w) => ({
        windowYears,
        probability: credibleRange(probabilityTotal[m][w]),
        datingOnly: credibleRange(probabilityDraws[m][w]),
      })),
      preferredShare: preferredCounts[m] / drawCount,
      medianAkaikeWeight: credibleRange(weightDraws[m]).median,
      unconvergedDraws: unconverged[m],
      approximateDraws: approximate[m],
    })),
    poissonFromMeanRecurrence: windows.map((windowYears, w) => {
      const range = credibleRange(poissonDraws[w]);
      return { windowYears, probability: range, datingOnly: range };
    }),
    modelAveraged: windows.map((windowYears, w) => ({
      windowYears,
      probability: credibleRange(averagedTotal[w]),
      datingOnly: credibleRange(averagedDatingOnly[w]),
    })),
    parameterUncertainty: withParameters,
    medianSequence: fitMedianSequence(medianRecordAges, forecastStartCalBp, windows, models),
    intervalHistogram: intervalHistogram(concatenate(inclusion ? intervalDraws.map(present) : intervalDraws)),
    intervalShares: Array.from(intervalPresent, (count) => count / drawCount),
    recordEvents: credibleRange(recordSizes),
    eventMedianAgesCalBp: medianAges,
  };
}

export interface SimulationOptions extends RecurrenceOptions {
  readonly drawCount: number;
  /** Seed for SeededRandom, stored with the analysis so it can be rerun. */
  readonly seed: number;
}

/**
 * Recurrence statistics from the age densities of events in a known order (young to old, e.g.
 * the combined densities of a hypothesis' regional events): `drawCount` exact ordered draws
 * (see ordered-sequence.ts), then `summariseRecurrence`. The same seed gives the same result.
 */
export function simulateRecurrence(densities: readonly CalendarDensity[], options: SimulationOptions): RecurrenceSummary {
  if (!Number.isInteger(options.drawCount) || options.drawCount < 1) {
    throw new RecurrenceInputError('drawCount', `The number of draws must be a whole number of at least 1; it is ${options.drawCount}.`);
  }
  const sampler = orderedSequenceSampler(densities);
  const rng = new SeededRandom(options.seed);
  const draws: Float64Array[] = new Array(options.drawCount);
  for (let d = 0; d < options.drawCount; d++) draws[d] = sampler(rng);
  return summariseRecurrence(draws, options);
}

/** Checks inclusion probabilities (null when absent or all 1). */
function checkInclusion(probabilities: readonly number[] | undefined, eventCount: number): Float64Array | null {
  if (!probabilities) return null;
  if (probabilities.length !== eventCount) {
    throw new RecurrenceInputError(
      'inclusionProbabilities',
      `Give one inclusion probability for each of the ${eventCount} events; there are ${probabilities.length}.`,
    );
  }
  for (const p of probabilities) {
    if (!(p > 0 && p <= 1)) {
      throw new RecurrenceInputError('inclusionProbabilities', `Inclusion probabilities must be above 0 and at most 1; one is ${p}.`);
    }
  }
  return probabilities.every((p) => p === 1) ? null : Float64Array.from(probabilities);
}

/**
 * Keeps each event with its probability, independently, drawing again until at least three are
 * kept (rejection: the kept sets are then distributed as the independent draws conditioned on
 * holding three or more).
 */
function chooseRecord(inclusion: Float64Array, kept: Uint8Array, random: SeededRandom): void {
  for (let attempt = 0; attempt < INCLUSION_ATTEMPTS; attempt++) {
    let size = 0;
    for (let k = 0; k < inclusion.length; k++) {
      kept[k] = inclusion[k] >= 1 || random.uniform() < inclusion[k] ? 1 : 0;
      size += kept[k];
    }
    if (size >= 3) return;
  }
  throw new RecurrenceInputError(
    'inclusionProbabilities',
    `The inclusion probabilities leave fewer than three events in almost every draw (${INCLUSION_ATTEMPTS} attempts); raise the weights or count more events.`,
  );
}

function present(values: Float64Array): Float64Array {
  return values.filter((value) => !Number.isNaN(value));
}

/** Median and 2.5 % / 97.5 % quantiles (linear interpolation between order statistics, Hyndman & Fan 1996 type 7). */
export function credibleRange(values: ArrayLike<number>): CredibleRange {
  const sorted = Float64Array.from(values).sort();
  return {
    median: sortedQuantile(sorted, 0.5),
    low95: sortedQuantile(sorted, 0.025),
    high95: sortedQuantile(sorted, 0.975),
  };
}

function sortedQuantile(sorted: Float64Array, q: number): number {
  if (sorted.length === 0) return Number.NaN;
  const position = (sorted.length - 1) * q;
  const below = Math.floor(position);
  const above = Math.min(below + 1, sorted.length - 1);
  return sorted[below] + (position - below) * (sorted[above] - sorted[below]);
}

export interface IntervalStatistics {
  readonly mean: number;
  readonly median: number;
  /** Sample SD (n - 1 in the denominator). */
  readonly sd: number;
  /** SD / mean. */
  readonly cv: number;
}

/** Mean, median, sample SD and CV of a set of inter-event times. */
export function intervalStatistics(intervals: ArrayLike<number>, scratch?: Float64Array): IntervalStatistics {
  const n = intervals.length;
  const sorted = scratch && scratch.length === n ? scratch : new Float64Array(n);
  let sum = 0;
  for (let i = 0; i < n; i++) {
    sorted[i] = intervals[i];
    sum += intervals[i];
  }
  const mean = sum / n;
  let squares = 0;
  for (let i = 0; i < n; i++) squares += (intervals[i] - mean) ** 2;
  sorted.sort();
  const median = n % 2 === 1 ? sorted[(n - 1) / 2] : 0.5 * (sorted[n / 2 - 1] + sorted[n / 2]);
  const sd = n > 1 ? Math.sqrt(squares / (n - 1)) : Number.NaN;
  return { mean, median, sd, cv: sd / mean };
}

function checkOptions(options: RecurrenceOptions, models: readonly RenewalModel[]): number[] {
  if (!Number.isFinite(options.forecastStartYearCe)) {
    throw new RecurrenceInputError('forecastStartYearCe', 'The forecast start year must be a calendar year.');
  }
  if (models.length === 0) throw new RecurrenceInputError('models', 'Choose at least one renewal model.');
  const windows = [...options.windowsYears];
  if (windows.length === 0) throw new RecurrenceInputError('windowsYears', 'Give at least one forecast window.');
  for (const window of windows) {
    if (!(window > 0) || !Number.isFinite(window)) {
      throw new RecurrenceInputError('windowsYears', `Forecast windows must be positive numbers of years; one is ${window}.`);
    }
  }
  return windows;
}

/**
 * Copies a draw into `ages`, oldest first, checking it. Ages that tie are spread as ordered
 * uniform points in the year centred on them (sorted uniforms, so the order is kept): events a
 * site model puts in one grid year get an interval below a year rather than an error. Spreading
 * keeps the mean interval: two grid years d apart stay d apart on average either way.
 */
function readDraw(draw: ArrayLike<number>, index: number, eventCount: number, ages: Float64Array, random: SeededRandom): void {
  if (draw.length !== eventCount) {
    throw new RecurrenceInputError(
      'eventAgeDraws',
      `Draw ${index + 1} has ${draw.length} event ages where the first draw has ${eventCount}.`,
    );
  }
  for (let k = 0; k < eventCount; k++) {
    if (!Number.isFinite(draw[k])) {
      throw new RecurrenceInputError('eventAgeDraws', `Draw ${index + 1} has an age that is not a number.`);
    }
    ages[k] = draw[k];
  }
  ages.sort().reverse();
  spreadWithinYears(ages, random);
}

/**
 * Spreads ties in ages sorted oldest first: each run of equal ages becomes sorted uniform points
 * in the year centred on it, [age - 0.5, age + 0.5), held strictly between its neighbours when a
 * continuous neighbour lies inside that year. Ages that do not tie are left as they are.
 */
export function spreadWithinYears(ages: Float64Array, random: SeededRandom): void {
  const n = ages.length;
  let start = 0;
  while (start < n) {
    let end = start + 1;
    while (end < n && ages[end] === ages[start]) end++;
    if (end - start > 1) {
      const centre = ages[start];
      const high = start > 0 ? Math.min(centre + 0.5, ages[start - 1]) : centre + 0.5;
      const low = end < n ? Math.max(centre - 0.5, ages[end]) : centre - 0.5;
      for (let k = start; k < end; k++) {
        let value: number;
        do value = low + (high - low) * random.uniform();
        while (value <= low || value >= high);
        ages[k] = value;
      }
      // Oldest first: descending within the run.
      ages.subarray(start, end).sort().reverse();
    }
    start = end;
  }
}

function fitMedianSequence(
  medianAges: readonly number[],
  forecastStartCalBp: number,
  windows: readonly number[],
  models: readonly RenewalModel[],
): MedianSequenceFits {
  const closedIntervals = medianAges.slice(0, -1).map((age, i) => age - medianAges[i + 1]);
  const openInterval = Math.max(0, medianAges[medianAges.length - 1] - forecastStartCalBp);
  const fits = fitAllModels({ closedIntervals, openInterval }, models);
  const mean = closedIntervals.reduce((sum, value) => sum + value, 0) / closedIntervals.length;
  return {
    eventAgesCalBp: medianAges,
    closedIntervals,
    openInterval,
    fits,
    comparison: compareModels(fits),
    probabilities: fits.map((fit) => {
      const distribution = distributionFromFit(fit);
      return {
        model: fit.model,
        windows: windows.map((windowYears) => ({
          windowYears,
          probability: distribution.conditionalProbability(openInterval, windowYears),
        })),
      };
    }),
    poissonFromMeanRecurrence: windows.map((windowYears) => ({
      windowYears,
      probability: -Math.expm1(-windowYears / mean),
    })),
  };
}

function concatenate(arrays: readonly Float64Array[]): Float64Array {
  const total = arrays.reduce((sum, array) => sum + array.length, 0);
  const joined = new Float64Array(total);
  let offset = 0;
  for (const array of arrays) {
    joined.set(array, offset);
    offset += array.length;
  }
  return joined;
}

function formatAge(calBp: number): string {
  return calBp.toFixed(0);
}
