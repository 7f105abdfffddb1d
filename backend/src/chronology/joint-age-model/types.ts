/**
 * The joint age model's interface (issue 13): one chronology over every site of a correlation
 * hypothesis, each regional event a single age shared by its members' columns. The computation
 * (`runJointChain`, `summariseJointChains`) lives beside this file; the run plumbing (jobs,
 * storage, GraphQL) in `backend/src/correlation/joint-runs/` builds on these types only.
 *
 * Chains run as separate jobs: each job calls `runJointChain` for one chain index and stores its
 * `JointChainDraws`; when every chain is done, `summariseJointChains` turns them into the result.
 * Everything here is structured-cloneable (plain objects and typed arrays).
 */
import type { AgeModelDiagnostics, AgeModelHooks, AgeModelSettings, EventPosterior, SamplePosterior } from '../age-model/age-model';
import type { AgeModelInput } from '../age-model/column';
import type { CalendarDensity, DensitySummary } from '../common/density';

export type JointDepthModel = 'ORDER_ONLY' | 'HEMIPELAGIC_RATE';

export interface JointSiteInput {
  readonly siteId: string;
  /** For messages. */
  readonly siteName: string;
  /** The site's column exactly as the site age model takes it. */
  readonly column: AgeModelInput;
  /** How the site's ages relate to depth (cores may use HEMIPELAGIC_RATE). */
  readonly depthModel: JointDepthModel;
}

export interface JointRegionalEventInput {
  readonly regionalEventId: string;
  /** For messages. */
  readonly name: string;
  /** The site events tied into this regional event: at most one per site. */
  readonly members: readonly { readonly siteId: string; readonly eventHorizonId: string }[];
}

export interface JointModelInput {
  readonly sites: readonly JointSiteInput[];
  readonly regionalEvents: readonly JointRegionalEventInput[];
}

/** Settings of one chain: the site model's settings, one chain at a time. */
export type JointChainSettings = Pick<
  AgeModelSettings,
  'iterations' | 'burnIn' | 'thin' | 'outlierPrior' | 'outlierShiftScaleYears' | 'inheritanceScaleYears' | 'windowMarginYears'
> & {
  /** The run's seed; a chain's random stream is derived from (seed, chainIndex). */
  readonly seed: number;
  /** 0-based; chains start from dispersed states by index. */
  readonly chainIndex: number;
};

/** One chain's kept draws (after burn-in and thinning). */
export interface JointChainDraws {
  readonly chainIndex: number;
  readonly drawCount: number;
  /** Column order of `regionalEvents` (input order). */
  readonly regionalEventIds: readonly string[];
  /** drawCount x regional events, cal BP (continuous). */
  readonly regionalEvents: Float64Array;
  /** Every site event of every site (tied or not), site by site, oldest first within a site. */
  readonly siteEvents: readonly { readonly siteId: string; readonly eventHorizonId: string }[];
  /** drawCount x site events, cal BP. */
  readonly siteEventDraws: Float64Array;
  /** Every modelled sample, site by site. */
  readonly samples: readonly { readonly siteId: string; readonly sampleId: string }[];
  /** drawCount x samples: the deposit age of the sample's level, cal BP. */
  readonly sampleDraws: Float64Array;
  /** Per sample: the share of this chain's kept draws in which it was an outlier. */
  readonly outlierShare: Float64Array;
  /** Acceptance rates of the Metropolis moves in this chain. */
  readonly acceptance: Readonly<Record<string, number>>;
  /**
   * Optional (added by the computation; keep it when storing a chain): per entry of `siteEvents`,
   * the chain's Rao-Blackwellised posterior density of the event's age (normalised, 1-year grid).
   * `summariseJointChains` averages these when every chain has them, which gives smoother
   * densities and tighter honest HPD ranges than smoothing the draws; without them it smooths.
   */
  readonly siteEventDensities?: readonly CalendarDensity[];
}

export interface RegionalEventPosterior {
  readonly regionalEventId: string;
  readonly density: CalendarDensity;
  readonly summary: DensitySummary;
  readonly rhat: number;
  readonly ess: number;
}

export interface JointAgeModelResult {
  readonly regionalEvents: readonly RegionalEventPosterior[];
  readonly siteEvents: readonly (EventPosterior & { readonly siteId: string })[];
  readonly samples: readonly (SamplePosterior & { readonly siteId: string })[];
  readonly diagnostics: AgeModelDiagnostics;
  /**
   * Joint draws of the regional events (evenly thinned over all chains, at most `maxStoredDraws`),
   * row-major drawCount x regional events in `regionalEventIds` order: what a segment recurrence
   * analysis under the hypothesis draws from.
   */
  readonly regionalEventDraws: {
    readonly regionalEventIds: readonly string[];
    readonly drawCount: number;
    readonly draws: Float64Array;
  };
}

/** The computation's entry points (implemented in `joint-age-model.ts`). */
export type RunJointChain = (input: JointModelInput, settings: JointChainSettings, hooks?: AgeModelHooks) => JointChainDraws;
export type SummariseJointChains = (
  input: JointModelInput,
  chains: readonly JointChainDraws[],
  options: { readonly maxStoredDraws: number },
) => JointAgeModelResult;
