/**
 * The site age model (SPEC, Computation 2): a Bayesian ordering model of a site's column. Events
 * and the deposit ages of dated samples lie in stratigraphic order between a start and an end
 * boundary with the uniform deposition prior (Buck, Kenworthy, Litton & Smith 1991, Antiquity
 * 65:808-821; Bronk Ramsey 2009, Radiocarbon 51(1):337-360); detrital and intrusive samples carry
 * an exponential age offset; every sample has a general outlier probability (Christen 1994). The
 * posterior is sampled by Metropolis-within-Gibbs on a 1-year grid with several seeded chains,
 * and convergence is judged by rank-normalised split R-hat and bulk effective sample size
 * (Vehtari et al. 2021, Bayesian Analysis 16(2):667-718). See `sampler.ts` and `likelihood.ts`
 * for the model's exact form.
 *
 * Posterior densities are Rao-Blackwellised (each kept state adds the full conditional of every
 * event and deposit, not a count), so they carry no Monte Carlo splinters; their HPD ranges are
 * quoted by `readableHpdRanges` (pieces closer than 10 years merged, at most four ranges, each
 * with its probability).
 */
import { CalendarDensity, DensitySummary, normalise, summariseReadable, trim } from '../common/density';
import { SeededRandom } from '../common/random';
import { AgeModelInput, AgeRelation, buildOrderGraph, ColumnSample, OrderGraph } from './column';
import { chainDiagnostics } from './convergence';
import { CalendarWindow, depositLikelihood, MixtureLikelihoods, modelWindow, yearOf } from './likelihood';
import { OffsetPosterior, offsetPosterior } from './offset-posterior';
import { ReservoirOffsetPosterior, SharedOffsets } from './reservoir-offsets';
import { firstDepositNode, OrderChain, PosteriorAccumulator } from './sampler';

export interface AgeModelSettings {
  /** Seed of every random draw: the same input, settings and seed give the same result. */
  readonly seed: number;
  /** Sweeps per chain after burn-in (each sweep updates every age once, plus block shifts). */
  readonly iterations: number;
  /** Sweeps per chain discarded before draws are kept. */
  readonly burnIn: number;
  /** Keep every thin-th sweep after burn-in. */
  readonly thin: number;
  /** Number of chains from dispersed starts; at least 4 so R-hat can compare them. */
  readonly chains: number;
  /**
   * Prior probability that any one sample is an outlier (Christen 1994); 0 <= q < 1. See
   * DEFAULT_AGE_MODEL_SETTINGS for why 0.05.
   */
  readonly outlierPrior: number;
  /**
   * Scale (mean absolute shift, years) of the two-sided exponential prior on an outlier's shift
   * (see `outlierShiftLikelihood`).
   */
  readonly outlierShiftScaleYears: number;
  /**
   * Scale (mean, years) of the exponential prior on inheritance and intrusion offsets, for samples
   * that carry no scale of their own (`ColumnSample.offsetScaleYears`).
   */
  readonly inheritanceScaleYears: number;
  /** Most joint draws returned in `eventDraws` (and `allDraws`), evenly spaced over all chains. */
  readonly maxStoredDraws: number;
  /** Also return joint draws of the boundaries and every deposit age (for checks and plots). */
  readonly storeAllDraws: boolean;
  /**
   * Years added beyond the samples' likelihoods on each side of the model's window: room for the
   * boundaries and for events with nothing dated on one side. Outlier probabilities no longer
   * depend on it; the span correction 1 / (W - s) does, weakly.
   */
  readonly windowMarginYears: number;
}

/**
 * Defaults. The outlier prior 0.05 is the share of radiocarbon determinations the trade expects to
 * disagree with their context beyond their quoted errors: the worked examples of outlier analysis
 * use 5 % per date (Bronk Ramsey 2009, Radiocarbon 51(3):1023-1045 [memory]), in line with the
 * few per cent of laboratory results found outside their quoted errors in the international
 * radiocarbon intercomparisons (Scott 2003, Radiocarbon 45(2):135-408, TIRI/FIRI [memory])
 * [common practice]. A researcher who trusts a set of dates less raises it.
 *
 * The outlier shift scale of 500 years is our own choice: broad against single-date errors (tens
 * of years) and against the centuries between events, so a misplaced or reworked date is
 * explained by the shift rather than by stretching the column, yet narrow enough that an outlier
 * still carries weak information about its layer.
 */
export const DEFAULT_AGE_MODEL_SETTINGS: AgeModelSettings = {
  seed: 1,
  iterations: 20_000,
  burnIn: 4_000,
  thin: 10,
  chains: 4,
  outlierPrior: 0.05,
  outlierShiftScaleYears: 500,
  inheritanceScaleYears: 100,
  maxStoredDraws: 2_000,
  storeAllDraws: false,
  windowMarginYears: 1_000,
};

/**
 * Split R-hat above this marks a run as not converged. Vehtari et al. (2021) recommend 1.01; 1.05
 * is the looser limit long used in practice [common practice].
 */
export const RHAT_LIMIT = 1.05;
/** An effective sample size below this marks a run as not converged [common practice]. */
export const ESS_MINIMUM = 200;

/** Callbacks for a job worker. */
export interface AgeModelHooks {
  /** Called now and then with the share of sweeps done (0-1), and with 1 at the end. */
  readonly onProgress?: (fraction: number) => void;
  /** Polled every few hundred sweeps; returning true stops the run with AgeModelCancelled. */
  readonly shouldCancel?: () => boolean;
}

/** Thrown when `shouldCancel` asked the run to stop. */
export class AgeModelCancelled extends Error {
  constructor() {
    super('The age model run was cancelled.');
    this.name = 'AgeModelCancelled';
  }
}

/** Settings that cannot be run, or dates the model cannot place (outlier prior 0). */
export class AgeModelSettingsError extends Error {
  constructor(
    readonly field: keyof AgeModelSettings,
    message: string,
  ) {
    super(message);
    this.name = 'AgeModelSettingsError';
  }
}

export interface EventPosterior {
  readonly eventHorizonId: string;
  /** Posterior of the event's age on the 1-year grid, normalised. */
  readonly density: CalendarDensity;
  readonly summary: DensitySummary;
  readonly rhat: number;
  readonly ess: number;
}

export interface SamplePosterior {
  readonly sampleId: string;
  readonly ageRelation: AgeRelation;
  /** Posterior probability that the sample is an outlier. */
  readonly outlierProbability: number;
  /**
   * Posterior of the age of the deposit the sample lies in (for DATES_DEPOSIT also the sample's
   * own age; for offset samples the deposit is younger or older than the material).
   */
  readonly density: CalendarDensity;
  readonly medianCalBp: number;
  readonly summary: DensitySummary;
  readonly rhat: number;
  readonly ess: number;
  /**
   * OLDER_THAN_DEPOSIT and YOUNGER_THAN_DEPOSIT samples: the posterior of sample age minus deposit
   * age given the sample is not an outlier, with the prior scale used (`offset-posterior.ts`).
   */
  readonly offset?: OffsetPosterior;
}

export interface BoundaryPosterior {
  readonly density: CalendarDensity;
  readonly summary: DensitySummary;
  readonly rhat: number;
  readonly ess: number;
}

export interface AgeModelDiagnostics {
  /** Every event (every sample when the column has no event) within RHAT_LIMIT and ESS_MINIMUM. */
  readonly converged: boolean;
  readonly maxRhat: number;
  readonly minEss: number;
  /** A plain sentence for the researcher. */
  readonly message: string;
  /** Acceptance rates of the Metropolis moves (Gibbs moves always accept). */
  readonly acceptance: { readonly blockShift: number; readonly boundaries: number; readonly paths: number };
  readonly keptDrawsPerChain: number;
}

/** Joint draws of the event ages, row-major drawCount x events, oldest event first. */
export interface EventDraws {
  readonly eventHorizonIds: readonly string[];
  readonly drawCount: number;
  readonly draws: Float64Array;
}

/** Joint draws of every age in the model (`storeAllDraws`), one row per draw. */
export interface AgeModelDraws {
  readonly drawCount: number;
  readonly startBoundary: Float64Array;
  readonly endBoundary: Float64Array;
  readonly eventHorizonIds: readonly string[];
  /** drawCount x events. */
  readonly events: Float64Array;
  readonly sampleIds: readonly string[];
  /** drawCount x samples: deposit ages. */
  readonly samples: Float64Array;
}

export interface AgeModelResult {
  /** In stratigraphic order, oldest event first. */
  readonly events: EventPosterior[];
  /** Modelled (not excluded) samples, in column order from the base. */
  readonly samples: SamplePosterior[];
  readonly boundaries: { readonly start: BoundaryPosterior; readonly end: BoundaryPosterior };
  readonly diagnostics: AgeModelDiagnostics;
  readonly eventDraws: EventDraws;
  readonly allDraws?: AgeModelDraws;
  /** The calendar years (cal BP) the model's ages may take. */
  readonly window: CalendarWindow;
  readonly settings: AgeModelSettings;
  /** One posterior per Delta-R source shared by marine samples (`reservoir-offsets.ts`). */
  readonly reservoirOffsets?: ReservoirOffsetPosterior[];
}

/** Sweeps between polls of `shouldCancel` and progress reports. */
const POLL_SWEEPS = 200;

/**
 * Sweeps between path updates (`OrderChain.pathUpdate`). A path draw costs about its length
 * times the window's width; one per few sweeps is enough for it to carry chains between modes.
 */
const PATH_UPDATE_PERIOD = 16;

/** Kept values (nodes x draws x chains) above this would need too much memory. */
const MAX_KEPT_VALUES = 50_000_000;

function checkSettings(settings: AgeModelSettings): void {
  const wholeAtLeast = (field: keyof AgeModelSettings, min: number, what: string): void => {
    const value = settings[field];
    if (typeof value !== 'number' || !Number.isInteger(value) || value < min) {
      throw new AgeModelSettingsError(field, `${what} must be a whole number of at least ${min}; got ${String(value)}.`);
    }
  };
  if (!Number.isInteger(settings.seed)) {
    throw new AgeModelSettingsError('seed', `The seed must be a whole number; got ${String(settings.seed)}.`);
  }
  wholeAtLeast('chains', 4, 'The number of chains');
  wholeAtLeast('thin', 1, 'The thinning interval');
  wholeAtLeast('burnIn', 0, 'The burn-in');
  wholeAtLeast('maxStoredDraws', 1, 'The number of stored draws');
  wholeAtLeast('windowMarginYears', 0, 'The window margin');
  if (!Number.isInteger(settings.iterations) || settings.iterations < 8 * settings.thin) {
    throw new AgeModelSettingsError(
      'iterations',
      `The iterations must be a whole number of at least 8 times the thinning interval (${8 * settings.thin}), ` +
        `so each chain keeps enough draws to judge convergence; got ${String(settings.iterations)}.`,
    );
  }
  if (!(settings.outlierPrior >= 0 && settings.outlierPrior < 1)) {
    throw new AgeModelSettingsError(
      'outlierPrior',
      `The outlier prior must be a probability from 0 up to (not including) 1; got ${String(settings.outlierPrior)}.`,
    );
  }
  if (!(settings.outlierShiftScaleYears >= 1 && settings.outlierShiftScaleYears <= 10_000)) {
    throw new AgeModelSettingsError(
      'outlierShiftScaleYears',
      `The outlier shift scale must be from 1 to 10,000 years; got ${String(settings.outlierShiftScaleYears)}.`,
    );
  }
  if (!(settings.inheritanceScaleYears > 0) || !Number.isFinite(settings.inheritanceScaleYears)) {
    throw new AgeModelSettingsError(
      'inheritanceScaleYears',
      `The inheritance scale must be a positive number of years; got ${String(settings.inheritanceScaleYears)}.`,
    );
  }
}

/** Most and least a sample's own offset scale may be (years); the service refuses values outside. */
export const OFFSET_SCALE_LIMITS = { min: 1, max: 10_000 } as const;

/** The offset scale a sample is modelled with: its own, else the run's. */
export function offsetScaleOf(sample: Pick<ColumnSample, 'offsetScaleYears'>, settings: Pick<AgeModelSettings, 'inheritanceScaleYears'>): number {
  const own = sample.offsetScaleYears;
  return own !== undefined && own !== null && own > 0 && Number.isFinite(own) ? own : settings.inheritanceScaleYears;
}

function labelOf(thing: { id: string; name?: string }): string {
  return thing.name !== undefined && thing.name.trim() !== '' ? `"${thing.name}"` : `"${thing.id}"`;
}

/**
 * A density from a difference array of range weights plus directly added end years, times an
 * optional per-year factor.
 */
export function densityFromDifferences(
  differences: Float64Array,
  direct: Float64Array,
  open: Int32Array,
  youngCalBp: number,
  factor?: (calBp: number) => number,
): CalendarDensity {
  const probabilities = new Float64Array(differences.length - 1);
  let running = 0;
  let openRanges = 0;
  for (let i = 0; i < probabilities.length; i++) {
    running += differences[i];
    openRanges += open[i];
    // Where no range is open the sum of +w and -w is zero but for rounding residue.
    if (openRanges > 0) {
      const value = running + direct[i];
      probabilities[i] = Math.max(0, factor ? value * factor(youngCalBp + i) : value);
    }
  }
  return normalise(trim({ startCalBp: youngCalBp, probabilities }, 1e-7));
}

/** A 1-year histogram of continuous ages (year y holds [y - 0.5, y + 0.5)). */
function histogram(values: Float64Array): CalendarDensity {
  let young = Infinity;
  let old = -Infinity;
  for (const v of values) {
    young = Math.min(young, yearOf(v));
    old = Math.max(old, yearOf(v));
  }
  const probabilities = new Float64Array(old - young + 1);
  for (const v of values) probabilities[yearOf(v) - young] += 1 / values.length;
  return { startCalBp: young, probabilities };
}

/**
 * Run the age model of a column. Throws ColumnProblemError when the column cannot be modelled,
 * AgeModelSettingsError for unusable settings, AgeModelCancelled when cancelled through `hooks`.
 * Settings not given take DEFAULT_AGE_MODEL_SETTINGS; the settings used come back in the result.
 */
export function runAgeModel(
  input: AgeModelInput,
  settings: Partial<AgeModelSettings> = {},
  hooks: AgeModelHooks = {},
): AgeModelResult {
  const resolved: AgeModelSettings = { ...DEFAULT_AGE_MODEL_SETTINGS, ...settings };
  checkSettings(resolved);
  const graph = buildOrderGraph(input);
  const own = graph.samples.map((sample) => sample.likelihood);
  const scaleOf = (sample: ColumnSample): number => offsetScaleOf(sample, resolved);
  const deposits = graph.samples.map((sample) => depositLikelihood(sample.likelihood, sample.ageRelation, scaleOf(sample)));
  const window = modelWindow(deposits, own, resolved.windowMarginYears);
  const likelihoods = new MixtureLikelihoods(deposits, window, resolved.outlierPrior, resolved.outlierShiftScaleYears);
  const shared =
    input.reservoirSources && input.reservoirSources.length > 0
      ? new SharedOffsets(graph, input.reservoirSources, window, resolved.outlierPrior, resolved.outlierShiftScaleYears, scaleOf)
      : undefined;
  const model = { graph, likelihoods, shared: shared && shared.count > 0 ? shared : undefined };

  const keptPerChain = Math.floor(resolved.iterations / resolved.thin);
  if (graph.nodeCount * keptPerChain * resolved.chains > MAX_KEPT_VALUES) {
    throw new AgeModelSettingsError(
      'thin',
      `Keeping ${keptPerChain} draws per chain of ${graph.nodeCount} ages in ${resolved.chains} chains needs too much ` +
        'memory; raise the thinning interval.',
    );
  }
  const accumulator = new PosteriorAccumulator(
    graph.events.length,
    graph.samples.length,
    window.youngCalBp,
    likelihoods.width,
  );
  const { kept, acceptance } = runChains(model, resolved, keptPerChain, accumulator, hooks);

  const series = (node: number): Float64Array[] =>
    kept.map((values) => {
      const s = new Float64Array(keptPerChain);
      for (let k = 0; k < keptPerChain; k++) s[k] = values[k * graph.nodeCount + node];
      return s;
    });
  const pooled = (node: number): Float64Array => {
    const all = new Float64Array(keptPerChain * resolved.chains);
    series(node).forEach((s, c) => all.set(s, c * keptPerChain));
    return all;
  };

  const events: EventPosterior[] = graph.events.map((horizon, k) => {
    const density = densityFromDifferences(
      accumulator.eventDifferences[k],
      accumulator.eventDirect[k],
      accumulator.eventOpen[k],
      window.youngCalBp,
    );
    const { rhat, ess } = chainDiagnostics(series(2 + k));
    return { eventHorizonId: horizon.id, density, summary: summariseReadable(density), rhat, ess };
  });
  const firstDeposit = firstDepositNode(graph);
  const integratedLikelihoods = new Map<number, MixtureLikelihoods>();
  for (const j of model.shared?.depositSums.keys() ?? []) {
    integratedLikelihoods.set(j, new MixtureLikelihoods([deposits[j]], window, resolved.outlierPrior, resolved.outlierShiftScaleYears));
  }
  const samples: SamplePosterior[] = graph.samples.map((sample, j) => {
    const sharedSums = model.shared?.depositSums.get(j);
    const density = sharedSums
      ? normalise(trim({ startCalBp: window.youngCalBp, probabilities: sharedSums }, 1e-7))
      : densityFromDifferences(
          accumulator.depositDifferences[j],
          accumulator.depositDirect[j],
          accumulator.depositOpen[j],
          window.youngCalBp,
          (calBp) => likelihoods.mixture(j, calBp),
        );
    const summary = summariseReadable(density);
    const { rhat, ess } = chainDiagnostics(series(firstDeposit + j));
    const q = resolved.outlierPrior;
    // A shared sample's likelihood moves with its offset; its offset from the deposit is read with
    // the Delta-R error integrated out (its own likelihood), an approximation.
    const integrated = sharedSums ? integratedLikelihoods.get(j) : undefined;
    const offset = offsetPosterior(sample.likelihood, sample.ageRelation, scaleOf(sample), density, (calBp) => {
      const mixed = integrated ? integrated.mixture(0, calBp) : likelihoods.mixture(j, calBp);
      return mixed > 0 ? (1 - q) / mixed : 0;
    });
    return {
      ...(offset ? { offset } : {}),
      sampleId: sample.id,
      ageRelation: sample.ageRelation,
      outlierProbability: accumulator.outlierSums[j] / accumulator.draws,
      density,
      medianCalBp: summary.medianCalBp,
      summary,
      rhat,
      ess,
    };
  });
  const boundary = (node: number): BoundaryPosterior => {
    const density = histogram(pooled(node));
    return { density, summary: summariseReadable(density), ...chainDiagnostics(series(node)) };
  };

  const diagnostics = convergence(graph, events, samples, acceptance, keptPerChain);

  const totalKept = keptPerChain * resolved.chains;
  const stored = Math.min(resolved.maxStoredDraws, totalKept);
  const rowOf = (i: number): { chain: number; draw: number } => {
    const index = Math.floor((i * totalKept) / stored);
    return { chain: Math.floor(index / keptPerChain), draw: index % keptPerChain };
  };
  const gather = (nodes: readonly number[]): Float64Array => {
    const out = new Float64Array(stored * nodes.length);
    for (let i = 0; i < stored; i++) {
      const { chain, draw } = rowOf(i);
      const row = kept[chain];
      nodes.forEach((node, k) => (out[i * nodes.length + k] = row[draw * graph.nodeCount + node]));
    }
    return out;
  };
  const eventNodes = graph.events.map((_, k) => 2 + k);
  const eventHorizonIds = graph.events.map((horizon) => horizon.id);
  const eventDraws: EventDraws = { eventHorizonIds, drawCount: stored, draws: gather(eventNodes) };
  const allDraws: AgeModelDraws | undefined = resolved.storeAllDraws
    ? {
        drawCount: stored,
        startBoundary: gather([1]),
        endBoundary: gather([0]),
        eventHorizonIds,
        events: eventDraws.draws,
        sampleIds: graph.samples.map((sample) => sample.id),
        samples: gather(graph.samples.map((_, j) => firstDeposit + j)),
      }
    : undefined;

  hooks.onProgress?.(1);
  return {
    events,
    samples,
    boundaries: { start: boundary(1), end: boundary(0) },
    diagnostics,
    eventDraws,
    ...(allDraws ? { allDraws } : {}),
    window,
    settings: resolved,
    ...(model.shared ? { reservoirOffsets: model.shared.posteriors() } : {}),
  };
}

/**
 * Run every chain in turn from its own seed, keeping every thin-th sweep after burn-in and adding
 * its full conditionals to the accumulator. Chains alternate between starting from the young and
 * the old end of the column so that their starts are dispersed.
 */
function runChains(
  model: { graph: OrderGraph; likelihoods: MixtureLikelihoods; shared?: SharedOffsets },
  settings: AgeModelSettings,
  keptPerChain: number,
  accumulator: PosteriorAccumulator,
  hooks: AgeModelHooks,
): { kept: Float32Array[]; acceptance: AgeModelDiagnostics['acceptance'] } {
  const { graph } = model;
  const master = new SeededRandom(settings.seed);
  const chainSeeds = Array.from({ length: settings.chains }, () => master.integer(2 ** 31));
  const sweepsPerChain = settings.burnIn + settings.iterations;
  const totalSweeps = sweepsPerChain * settings.chains;
  // A block shift costs about a seventh of a Gibbs sweep of a 50-age column. In trials on densely
  // dated cores, one shift per sweep let a chain started in a poor mode stay there past the
  // burn-in; one per four stages did not, for about a third more time on the benchmark column.
  const blockShiftsPerSweep = 1 + Math.floor(graph.stageCount / 4);
  const kept: Float32Array[] = [];
  let proposedShifts = 0;
  let acceptedShifts = 0;
  let proposedBoundaries = 0;
  let acceptedBoundaries = 0;
  let proposedPaths = 0;
  let acceptedPaths = 0;
  let lastReported = -1;

  for (let c = 0; c < settings.chains; c++) {
    // Shared offsets start at their prior means, before the chain draws its starting ages.
    const offsets = model.shared?.start(model.likelihoods);
    const offsetRandom = new SeededRandom(chainSeeds[c] ^ 0x5bd1e995);
    const chain = new OrderChain(model, chainSeeds[c], c % 2 === 0);
    const impossible = chain.impossibleDeposits();
    if (impossible.length > 0) {
      throw new AgeModelSettingsError(
        'outlierPrior',
        `With an outlier prior of 0 the samples ${impossible.map((j) => labelOf(graph.samples[j])).join(', ')} cannot be ` +
          'placed in stratigraphic order; allow outliers or check the column.',
      );
    }
    const values = new Float32Array(keptPerChain * graph.nodeCount);
    let keptCount = 0;
    for (let sweep = 0; sweep < sweepsPerChain; sweep++) {
      if (sweep % POLL_SWEEPS === 0) {
        if (hooks.shouldCancel?.()) throw new AgeModelCancelled();
        const fraction = (c * sweepsPerChain + sweep) / totalSweeps;
        if (hooks.onProgress && fraction - lastReported >= 0.01) {
          hooks.onProgress(fraction);
          lastReported = fraction;
        }
      }
      chain.sweep(sweep % 2 === 0);
      for (let b = 0; b < blockShiftsPerSweep; b++) chain.blockShift();
      if (sweep % PATH_UPDATE_PERIOD === 0 && chain.hasPaths) chain.pathUpdate();
      if (offsets) model.shared!.update(model.likelihoods, offsets, chain.state, offsetRandom);
      const after = sweep - settings.burnIn + 1;
      if (after > 0 && after % settings.thin === 0 && keptCount < keptPerChain) {
        values.set(chain.state, keptCount * graph.nodeCount);
        chain.accumulate(accumulator);
        model.shared?.accumulate(chain.state, model.likelihoods);
        keptCount++;
      }
    }
    kept.push(values);
    proposedShifts += chain.blockShiftProposed;
    acceptedShifts += chain.blockShiftAccepted;
    proposedBoundaries += chain.boundaryProposed;
    acceptedBoundaries += chain.boundaryAccepted;
    proposedPaths += chain.pathProposed;
    acceptedPaths += chain.pathAccepted;
  }
  return {
    kept,
    acceptance: {
      blockShift: proposedShifts > 0 ? acceptedShifts / proposedShifts : 0,
      boundaries: proposedBoundaries > 0 ? acceptedBoundaries / proposedBoundaries : 0,
      paths: proposedPaths > 0 ? acceptedPaths / proposedPaths : 0,
    },
  };
}

function formatRhat(rhat: number): string {
  return Number.isFinite(rhat) ? rhat.toFixed(3) : 'infinite';
}

function convergence(
  graph: OrderGraph,
  events: readonly EventPosterior[],
  samples: readonly SamplePosterior[],
  acceptance: AgeModelDiagnostics['acceptance'],
  keptDrawsPerChain: number,
): AgeModelDiagnostics {
  const judged: { label: string; rhat: number; ess: number }[] =
    events.length > 0
      ? events.map((e, k) => ({ label: `event ${labelOf(graph.events[k])}`, rhat: e.rhat, ess: e.ess }))
      : samples.map((s, j) => ({ label: `sample ${labelOf(graph.samples[j])}`, rhat: s.rhat, ess: s.ess }));
  const worstRhat = judged.reduce((a, b) => (b.rhat > a.rhat ? b : a));
  const worstEss = judged.reduce((a, b) => (b.ess < a.ess ? b : a));
  const rhatFails = judged.filter((q) => !(q.rhat <= RHAT_LIMIT));
  const essFails = judged.filter((q) => !(q.ess >= ESS_MINIMUM));
  const converged = rhatFails.length === 0 && essFails.length === 0;
  const what = events.length > 0 ? `${events.length} event${events.length === 1 ? '' : 's'}` : `${samples.length} samples`;
  let message: string;
  if (converged) {
    message =
      `Converged: over ${what} the worst split R-hat is ${formatRhat(worstRhat.rhat)} and the smallest effective ` +
      `sample size ${Math.round(worstEss.ess)}.`;
  } else {
    const parts: string[] = [];
    if (rhatFails.length > 0) {
      parts.push(
        `${rhatFails.map((q) => q.label).join(', ')} ${rhatFails.length === 1 ? 'has' : 'have'} split R-hat above ` +
          `${RHAT_LIMIT} (worst ${formatRhat(worstRhat.rhat)}, ${worstRhat.label}): the chains disagree`,
      );
    }
    if (essFails.length > 0) {
      parts.push(
        `${essFails.map((q) => q.label).join(', ')} ${essFails.length === 1 ? 'has' : 'have'} fewer than ` +
          `${ESS_MINIMUM} effective draws (smallest ${Math.round(worstEss.ess)}, ${worstEss.label})`,
      );
    }
    message = `Not converged: ${parts.join('; ')}. Run the model again with more iterations before using these ages.`;
  }
  return {
    converged,
    maxRhat: worstRhat.rhat,
    minEss: worstEss.ess,
    message,
    acceptance,
    keptDrawsPerChain,
  };
}
