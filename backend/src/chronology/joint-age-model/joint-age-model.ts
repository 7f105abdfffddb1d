/**
 * The joint age model of a correlation hypothesis (issue 13, item 2): one Bayesian chronology over
 * every site of the hypothesis, in which each regional event is a single age shared by its member
 * site events, so a tie constrains both columns at once instead of multiplying two answers
 * computed apart.
 *
 * The model is the site model's (`../age-model/`), site by site: each site keeps its own start and
 * end boundaries and its own continuous uniform-deposition prior between them (Buck, Kenworthy,
 * Litton & Smith 1991, Antiquity 65:808-821), with flat boundary priors and the span correction
 * 1 / (W - s) of Nicholls & Jones (2001, J. R. Stat. Soc. C 50(4):503-521 [memory for pages]);
 * each deposit's likelihood carries its inheritance or intrusion offset and the outlier mixture of
 * Christen (1994, Applied Statistics 43(3):489-503 [memory for pages]) with the shifted outlier
 * likelihood of `../age-model/likelihood.ts`. The joint posterior is the product of the sites'
 * priors and all likelihoods, with a regional event's age standing in for each member:
 *
 *   p ∝ prod_sites [1[order_s] s_s^-m_s / (W - s_s)]  prod_j L_q,j(d_j).
 *
 * Given everything else, a regional event is uniform on the intersection of its members' intervals
 * between their neighbours. All sites share one calendar window (the union of their site-model
 * windows), so W is common; a site run alone uses its own window, which changes its span
 * correction only weakly.
 *
 * Limitations, stated plainly:
 * - Cores whose depth model is HEMIPELAGIC_RATE are modelled here by the ordering model of their
 *   column (order by depth within units, no accumulation-rate model): their ages are constrained
 *   by superposition and the ties only, not by the hemipelagic mud's thickness. A joint
 *   hemipelagic model is future work.
 * - Event densities are Rao-Blackwellised as the site model's (each chain accumulates every
 *   event's full conditional, uniform between its neighbours in all its sites, and hands them over
 *   in `siteEventDensities`); sample (deposit) densities are kernel-smoothed from the pooled draws
 *   (Gaussian kernel, Silverman's bandwidth, `kernelDensity`), as are event densities of chains
 *   stored without theirs. HPD ranges are quoted readable (`summariseReadable`).
 * - Reservoir offsets are integrated per sample as in the site model's likelihoods.
 *
 * Each chain runs as its own job (`runJointChain`), from a dispersed start set by its index and a
 * random stream derived from (seed, chainIndex) exactly as the site model derives its chains';
 * `summariseJointChains` pools the chains: densities, rank-normalised split R-hat and bulk ESS
 * (Vehtari et al. 2021, `../age-model/convergence.ts`) per regional event, site event and sample,
 * outlier probabilities and evenly thinned joint draws of the regional events.
 */
import {
  densityFromDifferences,
  AgeModelCancelled,
  AgeModelDiagnostics,
  AgeModelHooks,
  AgeModelSettingsError,
  DEFAULT_AGE_MODEL_SETTINGS,
  ESS_MINIMUM,
  EventPosterior,
  RHAT_LIMIT,
  SamplePosterior,
} from '../age-model/age-model';
import { ChainDiagnostics, chainDiagnostics } from '../age-model/convergence';
import { kernelDensity } from '../age-model/hemipelagic/hemipelagic-model';
import { PosteriorAccumulator } from '../age-model/sampler';
import { CalendarDensity, normalise, summariseReadable, trim } from '../common/density';
import { SeededRandom } from '../common/random';
import { JointChain } from './joint-chain';
import { buildJointGraph, buildJointModel, sampleLabel } from './joint-model';
import type {
  JointAgeModelResult,
  JointChainDraws,
  JointChainSettings,
  JointModelInput,
  RegionalEventPosterior,
  RunJointChain,
  SummariseJointChains,
} from './types';

/**
 * Chain settings other than seed and index. Outliers, offsets and window are the site model's
 * defaults. The joint sampler mixes faster per sweep than the site model needs (cut shifts move
 * all sites together), so fewer sweeps suffice: on the demo's preferred hypothesis (14 sites, 11
 * regional events, 82 samples) four chains of 1,000 + 3,000 sweeps kept every 3rd give a smallest
 * ESS above 400 (`npm run bench`); raise `iterations` for a larger hypothesis until the
 * diagnostics say converged.
 */
export const DEFAULT_JOINT_CHAIN_SETTINGS: Omit<JointChainSettings, 'seed' | 'chainIndex'> = {
  iterations: 3_000,
  burnIn: 1_000,
  thin: 3,
  outlierPrior: DEFAULT_AGE_MODEL_SETTINGS.outlierPrior,
  outlierShiftScaleYears: DEFAULT_AGE_MODEL_SETTINGS.outlierShiftScaleYears,
  inheritanceScaleYears: DEFAULT_AGE_MODEL_SETTINGS.inheritanceScaleYears,
  windowMarginYears: DEFAULT_AGE_MODEL_SETTINGS.windowMarginYears,
};

/** Sweeps between polls of `shouldCancel` and progress reports (as the site model). */
const POLL_SWEEPS = 200;
/**
 * Sweeps between path draws. A path draw costs its length times the window's width, and a joint
 * window spans every site's record; cut shifts already carry the chain between modes, so the
 * joint model draws paths four times less often than the site model (16).
 */
const PATH_UPDATE_PERIOD = 64;
/** Cut shifts per sweep (moves of everything older or younger than an age, in all sites). */
const CUT_SHIFTS_PER_SWEEP = 4;
/** Kept values (ages x draws) of one chain above this would need too much memory. */
const MAX_KEPT_VALUES = 20_000_000;

function checkChainSettings(settings: JointChainSettings): void {
  const whole = (field: 'seed' | 'burnIn' | 'thin' | 'windowMarginYears', min: number, what: string): void => {
    const value = settings[field];
    if (!Number.isInteger(value) || value < min) {
      throw new AgeModelSettingsError(field, `${what} must be a whole number of at least ${min}; got ${String(value)}.`);
    }
  };
  if (!Number.isInteger(settings.seed)) {
    throw new AgeModelSettingsError('seed', `The seed must be a whole number; got ${String(settings.seed)}.`);
  }
  if (!Number.isInteger(settings.chainIndex) || settings.chainIndex < 0) {
    throw new RangeError(`The chain index must be a whole number from 0; got ${String(settings.chainIndex)}.`);
  }
  whole('thin', 1, 'The thinning interval');
  whole('burnIn', 0, 'The burn-in');
  whole('windowMarginYears', 0, 'The window margin');
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

/** The chain's seed: the (chainIndex + 1)-th draw of the run's seed stream, as the site model's chains. */
export function jointChainSeed(seed: number, chainIndex: number): number {
  const master = new SeededRandom(seed);
  let chainSeed = 0;
  for (let c = 0; c <= chainIndex; c++) chainSeed = master.integer(2 ** 31);
  return chainSeed;
}

/**
 * Run one chain of the joint model. Throws JointModelInputError for input that cannot be modelled
 * (naming the sites and events), AgeModelSettingsError for unusable settings or dates that cannot
 * be placed with an outlier prior of 0, AgeModelCancelled when `hooks.shouldCancel` asks.
 */
export const runJointChain: RunJointChain = (input, settings, hooks: AgeModelHooks = {}) => {
  checkChainSettings(settings);
  const model = buildJointModel(input, settings);
  const g = model.graph;
  const keptCount = Math.floor(settings.iterations / settings.thin);
  const width = g.regionalNodes.length + g.siteEventNodes.length + g.sampleNodes.length;
  if (width * keptCount > MAX_KEPT_VALUES) {
    throw new AgeModelSettingsError(
      'thin',
      `Keeping ${keptCount} draws of ${width} ages in one chain needs too much memory; raise the thinning interval.`,
    );
  }
  const chain = new JointChain(model, jointChainSeed(settings.seed, settings.chainIndex), settings.chainIndex % 2 === 0);
  const impossible = chain.impossibleDeposits();
  if (impossible.length > 0) {
    throw new AgeModelSettingsError(
      'outlierPrior',
      `With an outlier prior of 0 the samples ${impossible.map((j) => sampleLabel(g, j)).join(', ')} cannot be ` +
        'placed in stratigraphic order; allow outliers or check the columns.',
    );
  }
  const regionalEvents = new Float64Array(keptCount * g.regionalNodes.length);
  const siteEventDraws = new Float64Array(keptCount * g.siteEventNodes.length);
  const sampleDraws = new Float64Array(keptCount * g.sampleNodes.length);
  const outlierSums = new Float64Array(g.sampleNodes.length);
  // Rao-Blackwellised event densities, one per distinct event node (a regional event once).
  const eventNodes = Int32Array.from(new Set(g.siteEventNodes));
  const accumulator = new PosteriorAccumulator(eventNodes.length, 0, model.window.youngCalBp, model.likelihoods.width);
  const sweeps = settings.burnIn + settings.iterations;
  const blockShifts = chain.blockShiftsPerSweep;
  let kept = 0;
  let lastReported = -1;
  const state = chain.state;
  for (let sweep = 0; sweep < sweeps; sweep++) {
    if (sweep % POLL_SWEEPS === 0) {
      if (hooks.shouldCancel?.()) throw new AgeModelCancelled();
      const fraction = sweep / sweeps;
      if (hooks.onProgress && fraction - lastReported >= 0.01) {
        hooks.onProgress(fraction);
        lastReported = fraction;
      }
    }
    chain.sweep(sweep % 2 === 0);
    for (let b = 0; b < blockShifts; b++) chain.blockShift();
    for (let c = 0; c < CUT_SHIFTS_PER_SWEEP; c++) chain.cutShift();
    if (sweep % PATH_UPDATE_PERIOD === 0 && chain.hasPaths) chain.pathUpdate();
    const after = sweep - settings.burnIn + 1;
    if (after > 0 && after % settings.thin === 0 && kept < keptCount) {
      const copy = (nodes: Int32Array, into: Float64Array): void => {
        const row = kept * nodes.length;
        for (let k = 0; k < nodes.length; k++) into[row + k] = state[nodes[k]];
      };
      copy(g.regionalNodes, regionalEvents);
      copy(g.siteEventNodes, siteEventDraws);
      copy(g.sampleNodes, sampleDraws);
      chain.addOutlierShares(outlierSums);
      chain.accumulateEvents(accumulator, eventNodes);
      kept++;
    }
  }
  const rate = (accepted: number, proposed: number): number => (proposed > 0 ? accepted / proposed : 0);
  const densityOfNode = new Map<number, CalendarDensity>();
  eventNodes.forEach((node, k) =>
    densityOfNode.set(
      node,
      densityFromDifferences(accumulator.eventDifferences[k], accumulator.eventDirect[k], accumulator.eventOpen[k], model.window.youngCalBp),
    ),
  );
  hooks.onProgress?.(1);
  return {
    chainIndex: settings.chainIndex,
    drawCount: kept,
    regionalEventIds: input.regionalEvents.map((r) => r.regionalEventId),
    regionalEvents,
    siteEvents: g.siteEvents,
    siteEventDraws,
    samples: g.samples.map(({ siteId, sampleId }) => ({ siteId, sampleId })),
    sampleDraws,
    outlierShare: outlierSums.map((sum) => (kept > 0 ? sum / kept : 0)),
    acceptance: {
      blockShift: rate(chain.blockShiftAccepted, chain.blockShiftProposed),
      cutShift: rate(chain.cutShiftAccepted, chain.cutShiftProposed),
      boundaries: rate(chain.boundaryAccepted, chain.boundaryProposed),
      paths: rate(chain.pathAccepted, chain.pathProposed),
    },
    siteEventDensities: Array.from(g.siteEventNodes, (node) => densityOfNode.get(node) as CalendarDensity),
  };
};

function quoted(text: string | undefined, fallback: string): string {
  return `"${text !== undefined && text.trim() !== '' ? text : fallback}"`;
}

function formatRhat(rhat: number): string {
  return Number.isFinite(rhat) ? rhat.toFixed(3) : 'infinite';
}

/** Column `k` of every chain's row-major draws (each chain's first `perChain` rows). */
function seriesOf(chains: readonly JointChainDraws[], pick: (chain: JointChainDraws) => Float64Array, columns: number, k: number, perChain: number): Float64Array[] {
  return chains.map((chain) => {
    const values = pick(chain);
    const out = new Float64Array(perChain);
    for (let d = 0; d < perChain; d++) out[d] = values[d * columns + k];
    return out;
  });
}

function pooled(series: readonly Float64Array[]): Float64Array {
  const out = new Float64Array(series.reduce((n, s) => n + s.length, 0));
  let at = 0;
  for (const s of series) {
    out.set(s, at);
    at += s.length;
  }
  return out;
}

/** The weighted mixture of densities on the 1-year grid, normalised and trimmed. */
function averageDensities(densities: readonly CalendarDensity[], weights: readonly number[]): CalendarDensity {
  let young = Infinity;
  let old = -Infinity;
  for (const d of densities) {
    young = Math.min(young, d.startCalBp);
    old = Math.max(old, d.startCalBp + d.probabilities.length - 1);
  }
  const probabilities = new Float64Array(old - young + 1);
  densities.forEach((d, c) => {
    let mass = 0;
    for (const p of d.probabilities) mass += p;
    if (!(mass > 0)) return;
    const w = weights[c] / mass;
    const offset = d.startCalBp - young;
    for (let i = 0; i < d.probabilities.length; i++) probabilities[offset + i] += w * d.probabilities[i];
  });
  return normalise(trim({ startCalBp: young, probabilities }, 1e-7));
}

interface Posterior extends ChainDiagnostics {
  readonly density: CalendarDensity;
}

function posteriorOf(series: readonly Float64Array[]): Posterior {
  return { density: kernelDensity(pooled(series)), ...chainDiagnostics(series) };
}

/**
 * Pool the chains of one joint run. Throws RangeError when the chains do not belong to `input`
 * (other regional events, site events or samples) or keep fewer than 4 draws each.
 */
export const summariseJointChains: SummariseJointChains = (input, chains, options) => {
  if (chains.length === 0) throw new RangeError('summariseJointChains needs at least one chain');
  const graph = buildJointGraph(input);
  const perChain = Math.min(...chains.map((c) => c.drawCount));
  if (!(perChain >= 4)) throw new RangeError('every chain must keep at least 4 draws');
  const regionalIds = input.regionalEvents.map((r) => r.regionalEventId);
  for (const chain of chains) {
    const same =
      chain.regionalEventIds.length === regionalIds.length &&
      chain.regionalEventIds.every((id, k) => id === regionalIds[k]) &&
      chain.siteEvents.length === graph.siteEvents.length &&
      chain.siteEvents.every((e, k) => e.siteId === graph.siteEvents[k].siteId && e.eventHorizonId === graph.siteEvents[k].eventHorizonId) &&
      chain.samples.length === graph.samples.length &&
      chain.samples.every((s, k) => s.siteId === graph.samples[k].siteId && s.sampleId === graph.samples[k].sampleId);
    if (!same) throw new RangeError(`chain ${chain.chainIndex} was run on another input`);
  }
  const R = regionalIds.length;
  const E = graph.siteEvents.length;
  const S = graph.samples.length;

  // Rao-Blackwellised densities when every chain brought them, else the draws smoothed.
  const rb = chains.every((c) => c.siteEventDensities !== undefined && c.siteEventDensities.length === E);
  const eventDensity = (siteEvent: number, draws: readonly Float64Array[]): CalendarDensity =>
    rb
      ? averageDensities(
          chains.map((c) => (c.siteEventDensities as readonly CalendarDensity[])[siteEvent]),
          chains.map((c) => c.drawCount),
        )
      : kernelDensity(pooled(draws));
  const firstMember = new Map<number, number>();
  graph.siteEventNodes.forEach((node, k) => {
    if (!firstMember.has(node)) firstMember.set(node, k);
  });
  const regionalEvents: RegionalEventPosterior[] = input.regionalEvents.map((regional, k) => {
    const series = seriesOf(chains, (c) => c.regionalEvents, R, k, perChain);
    const density = eventDensity(firstMember.get(graph.regionalNodes[k]) as number, series);
    const { rhat, ess } = chainDiagnostics(series);
    return { regionalEventId: regional.regionalEventId, density, summary: summariseReadable(density), rhat, ess };
  });
  // A tied site event's draws are its regional event's: its posterior is computed once.
  const regionalOfNode = new Map<number, number>();
  graph.regionalNodes.forEach((node, k) => regionalOfNode.set(node, k));
  const siteEvents: (EventPosterior & { readonly siteId: string })[] = graph.siteEvents.map((event, k) => {
    const regional = regionalOfNode.get(graph.siteEventNodes[k]);
    if (regional !== undefined) {
      const r = regionalEvents[regional];
      return { siteId: event.siteId, eventHorizonId: event.eventHorizonId, density: r.density, summary: r.summary, rhat: r.rhat, ess: r.ess };
    }
    const series = seriesOf(chains, (c) => c.siteEventDraws, E, k, perChain);
    const density = eventDensity(k, series);
    const { rhat, ess } = chainDiagnostics(series);
    return { siteId: event.siteId, eventHorizonId: event.eventHorizonId, density, summary: summariseReadable(density), rhat, ess };
  });
  const totalDraws = chains.reduce((n, c) => n + c.drawCount, 0);
  const samples: (SamplePosterior & { readonly siteId: string })[] = graph.samples.map((entry, j) => {
    const sample = graph.sites[entry.site].graph.samples[entry.local];
    const p = posteriorOf(seriesOf(chains, (c) => c.sampleDraws, S, j, perChain));
    const summary = summariseReadable(p.density);
    let outlier = 0;
    for (const chain of chains) outlier += chain.outlierShare[j] * chain.drawCount;
    return {
      siteId: entry.siteId,
      sampleId: entry.sampleId,
      ageRelation: sample.ageRelation,
      outlierProbability: outlier / totalDraws,
      density: p.density,
      medianCalBp: summary.medianCalBp,
      summary,
      rhat: p.rhat,
      ess: p.ess,
    };
  });

  // Convergence is judged on every event (each regional event through its members), or on the
  // samples when no site has an event.
  const eventLabel = (k: number): string => {
    const event = graph.siteEvents[k];
    const site = graph.sites.find((s) => s.siteId === event.siteId);
    const horizon = site?.graph.events.find((h) => h.id === event.eventHorizonId);
    return `event ${quoted(horizon?.name, event.eventHorizonId)} at ${quoted(site?.siteName, event.siteId)}`;
  };
  const judged =
    E > 0
      ? siteEvents.map((e, k) => ({ label: eventLabel(k), rhat: e.rhat, ess: e.ess }))
      : samples.map((s, j) => ({ label: `sample ${sampleLabel(graph, j)}`, rhat: s.rhat, ess: s.ess }));
  const mean = (key: string): number => chains.reduce((n, c) => n + (c.acceptance[key] ?? 0), 0) / chains.length;
  const diagnostics = convergence(judged, E > 0 ? `${E} site events` : `${S} samples`, {
    blockShift: mean('blockShift'),
    boundaries: mean('boundaries'),
    paths: mean('paths'),
  }, perChain);

  const stored = Math.min(Math.max(1, Math.floor(options.maxStoredDraws)), totalDraws);
  const draws = new Float64Array(stored * R);
  const starts = chains.map((_, c) => chains.slice(0, c).reduce((n, x) => n + x.drawCount, 0));
  for (let i = 0; i < stored; i++) {
    const index = Math.floor((i * totalDraws) / stored);
    let c = 0;
    while (c + 1 < chains.length && starts[c + 1] <= index) c++;
    const row = index - starts[c];
    for (let k = 0; k < R; k++) draws[i * R + k] = chains[c].regionalEvents[row * R + k];
  }

  const result: JointAgeModelResult = {
    regionalEvents,
    siteEvents,
    samples,
    diagnostics,
    regionalEventDraws: { regionalEventIds: regionalIds, drawCount: stored, draws },
  };
  return result;
};

function convergence(
  judged: readonly { label: string; rhat: number; ess: number }[],
  what: string,
  acceptance: AgeModelDiagnostics['acceptance'],
  keptDrawsPerChain: number,
): AgeModelDiagnostics {
  if (judged.length === 0) {
    return { converged: true, maxRhat: 1, minEss: 0, message: 'Nothing to judge: the run has no event and no sample.', acceptance, keptDrawsPerChain };
  }
  const worstRhat = judged.reduce((a, b) => (b.rhat > a.rhat ? b : a));
  const worstEss = judged.reduce((a, b) => (b.ess < a.ess ? b : a));
  const rhatFails = judged.filter((q) => !(q.rhat <= RHAT_LIMIT));
  const essFails = judged.filter((q) => !(q.ess >= ESS_MINIMUM));
  const converged = rhatFails.length === 0 && essFails.length === 0;
  const listed = (items: readonly { label: string }[]): string =>
    items.length <= 5 ? items.map((q) => q.label).join(', ') : `${items.slice(0, 5).map((q) => q.label).join(', ')} and ${items.length - 5} more`;
  let message: string;
  if (converged) {
    message =
      `Converged: over ${what} the worst split R-hat is ${formatRhat(worstRhat.rhat)} and the smallest effective ` +
      `sample size ${Math.round(worstEss.ess)}.`;
  } else {
    const parts: string[] = [];
    if (rhatFails.length > 0) {
      parts.push(
        `${listed(rhatFails)} ${rhatFails.length === 1 ? 'has' : 'have'} split R-hat above ${RHAT_LIMIT} ` +
          `(worst ${formatRhat(worstRhat.rhat)}, ${worstRhat.label}): the chains disagree`,
      );
    }
    if (essFails.length > 0) {
      parts.push(
        `${listed(essFails)} ${essFails.length === 1 ? 'has' : 'have'} fewer than ${ESS_MINIMUM} effective draws ` +
          `(smallest ${Math.round(worstEss.ess)}, ${worstEss.label})`,
      );
    }
    message = `Not converged: ${parts.join('; ')}. Run the joint model again with more iterations before using these ages.`;
  }
  return { converged, maxRhat: worstRhat.rhat, minEss: worstEss.ess, message, acceptance, keptDrawsPerChain };
}
