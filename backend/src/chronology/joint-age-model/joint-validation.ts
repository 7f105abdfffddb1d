/**
 * Validation of the joint age model from outside (issue 13, item 8): records simulated by
 * `simulateRecord` (a generator that is not the model's prior) are run end to end through
 * `runJointChain` and `summariseJointChains`, and through the method the joint model replaces
 * (each site's own age model, then the normalised product of the members' posteriors,
 * `combineAges`). For every regional event: whether its 95.4 % and 68.3 % HPD ranges cover the
 * true age, and the total length of its 95.4 % ranges. A well-calibrated model covers the truth at
 * about the nominal rates [analytic]. Used by the spec (a few records) and the bench (100+ events).
 *
 * Measured on 2026-12-05 (after 875e592, which moved records with an event in the future; the
 * bench's settings, 4 chains of 1,000 + 4,000 sweeps kept every 4th; 4 sites and 6 true events per
 * record; machine shared, so no timings):
 * - seeds 1000-1023 (24 records, 134 regional events, 419 site events): joint 95.4 % ranges cover
 *   93.3 %, 68.3 % ranges 59.0 % (mean 95.4 % width 291 years); product of marginals 91.8 % /
 *   62.7 % (278 years); each site's own model 93.6 % / 68.0 % (621 years); max R-hat 1.005, min
 *   ESS 795;
 * - seeds 2000-2023 (24 records, 137 regional events, 445 site events): joint 94.2 % / 61.3 %
 *   (288 years); product 93.4 % / 63.5 % (280 years, 2 events without a product); site alone
 *   93.7 % / 70.3 % (665 years); max R-hat 1.027, min ESS 275.
 * Together (271 regional events) the joint 95.4 % ranges cover 93.7 % (in the 90-99 % band), but
 * its 68.3 % ranges cover only 60.1 % (binomial sd 2.8 %), and its 95.4 % ranges are 3-5 % wider
 * than the product's (the issue asks for no wider). The figures first stated here (86.4 % /
 * 60.7 % on 140 events, seeds 1000-1023) were measured before 24109c0 reseeded every random
 * stream, so every record and chain differs; they are not comparable.
 *
 * Diagnosis of the shortfall (scripted, not kept: 40 records, seeds 2000-2039, 2 chains of
 * 500 + 2,000 sweeps, central ranges from each posterior's distribution function; switches are
 * the generator's options; "joint" is regional events, n about 230; "site" is site events alone,
 * n about 730):
 * - Sampler or summary (ESS, thinning, density grid): four times the sweeps changes nothing
 *   (Poisson counts and outliers, below: joint 89.2 % / 59.1 % at 2,000 sweeps, 89.2 % / 58.6 %
 *   at 8,000). Ruled out.
 * - The prior counted once per member site. In the joint target a site's count m enters only its
 *   boundaries' factor s^-m / (W - s); every event and deposit is uniform between its neighbours
 *   in every site, as in one site. Given its age the member sites are independent, so a shared
 *   event's prior is the product of its member sites' priors for it (on a 2-site case with the
 *   shared event alone at each site, g(t) = integral over b < t < a of 1 / (s (W - s)): g(0.02 W)
 *   / g(0.5 W) = 0.14 for one site, 0.02 for the product), and the boundaries' prior is
 *   V / prod s^m (V the joint order's volume), which favours short spans by one factor of the
 *   scale per extra member. Splitting each shared node's count between its members (exponent
 *   1 / n per member site, a logarithmic pool) changed the joint's coverage by under one point
 *   (seeds 2000-2039 before 875e592: 87.9 % / 54.1 % to 88.7 % / 54.1 % with everything off;
 *   92.5 % / 62.4 % to 93.1 % / 61.8 % with uniform deposition, 30 records). Not the cause; the
 *   model is kept as the issue states it.
 * - The generator: ages are calendar ages with Gaussian errors (no calibration curve, so no curve
 *   error to share); a regional event's truth is one age at every member site; switching offsets
 *   off does switch them off. One defect, fixed in 875e592: about 3 % of records had events in
 *   the future and top units dated older than the event beneath them (none among seeds
 *   1000-1023).
 * - Misfit to the uniform deposition prior, which takes events and dated deposits as one
 *   uniform scatter over a site's span. The generator dates 0-3 samples per unit whatever its
 *   duration and crowds them towards a unit's base or top. Erosion, outliers and offsets off:
 *   site 92.4 % / 65.1 %, joint 89.2 % / 55.4 %, the sequence squeezed at both ends (mean
 *   standardised error of a site's oldest event -0.45, of its youngest +0.73, pair correlation of
 *   members' errors 0.22). Deposits spread uniformly within units (depositionLogSd 0): site
 *   94.5 % / 67.0 %, joint 92.2 % / 63.2 %. Poisson counts in proportion to duration
 *   (samplesPerYear 0.0033) but crowded: site 93.4 % / 68.5 %, joint 90.9 % / 58.4 %, the young
 *   end no longer squeezed (oldest -0.35, youngest +0.13). Both, the prior's own deposition:
 *   site 97.3 % / 76.3 %, joint 98.7 % / 70.6 %, and 97.8 % / 72.4 % with 5 % outliers drawn from
 *   the model's own outlier form (outlierLaplaceYears 500). With Poisson counts and crowding, adding erosion,
 *   outliers or offset samples leaves the joint's 68.3 % coverage at 59-67 % and the site model
 *   alone at 68-72 %. So sampling unrelated to duration squeezes the ends, and crowding within
 *   units costs the joint's 68.3 % ranges about ten points while one site's ranges, about twice
 *   as wide, absorb it. The bench with samplesPerYear 0.0033 and everything else on (seeds
 *   1000-1023, 140 regional events): joint 92.9 % / 57.1 % (298 years), product 95.7 % / 55.7 %
 *   (297 years), site alone 94.3 % / 68.9 %.
 * So no defect was found in the joint model: the shortfall at 68.3 % is the published uniform
 * deposition prior (Buck, Kenworthy, Litton & Smith 1991) meeting deposition that is not
 * uniform (crowded units, sampling unrelated to duration), which the generator simulates on
 * purpose. Closing it needs a prior that does not read sample counts as durations (for example
 * units as contiguous phases with their own boundaries, Buck, Litton & Smith 1992, J. Archaeol.
 * Sci. 19:497-512 [memory]), a change to the site model, not to the joint run.
 */
import { runAgeModel } from '../age-model/age-model';
import { CalendarDensity, HpdRange, summariseReadable } from '../common/density';
import { combineAges } from '../correlation/combined-age';
import { runJointChain, summariseJointChains } from './joint-age-model';
import { SimulatedRecordOptions, simulateRecord } from './simulated-record';

export interface JointValidationOptions {
  readonly records: number;
  readonly firstSeed: number;
  readonly siteCount: number;
  readonly eventCount: number;
  /** Per chain of the joint model (4 chains) and of each site model. */
  readonly iterations: number;
  readonly burnIn: number;
  readonly thin: number;
  /** Generator settings other than seed and sizes (defaults: the generator's own). */
  readonly generator?: Omit<SimulatedRecordOptions, 'seed' | 'siteCount' | 'eventCount'>;
}

/**
 * The bench's run: 20 records of 4 sites and 6 true events (about 110 regional events), each
 * model at 1,000 + 4,000 sweeps per chain kept every 4th.
 */
export const JOINT_VALIDATION_BENCH: JointValidationOptions = {
  records: 20,
  firstSeed: 1_000,
  siteCount: 4,
  eventCount: 6,
  iterations: 4_000,
  burnIn: 1_000,
  thin: 4,
};

export interface CoverageFigures {
  readonly events: number;
  readonly covered95: number;
  readonly covered68: number;
  readonly coverage95: number;
  readonly coverage68: number;
  /** Mean total length (years) of the 95.4 % ranges. */
  readonly meanWidth95: number;
}

export interface JointValidationFigures {
  readonly records: number;
  readonly joint: CoverageFigures;
  readonly product: CoverageFigures;
  /** Regional events whose members' posteriors do not overlap (no product; counted as missed). */
  readonly productEmpty: number;
  /** Site events tied into no regional event, by the joint model. */
  readonly untied: CoverageFigures;
  /** Every site event by its own site's age model alone (the generator against the site model). */
  readonly siteAlone: CoverageFigures;
  /** Every site event by the joint model (a tied one through its regional event). */
  readonly siteJoint: CoverageFigures;
  /** Largest split R-hat and smallest ESS of the joint runs. */
  readonly maxRhat: number;
  readonly minEss: number;
}

function inside(ranges: readonly HpdRange[], age: number): boolean {
  return ranges.some((r) => age >= r.youngerCalBp - 0.5 && age <= r.olderCalBp + 0.5);
}

function width(ranges: readonly HpdRange[]): number {
  return ranges.reduce((n, r) => n + r.olderCalBp - r.youngerCalBp + 1, 0);
}

class Tally {
  events = 0;
  covered95 = 0;
  covered68 = 0;
  widthSum = 0;
  widthCount = 0;

  add(summary: { hpd95: readonly HpdRange[]; hpd68: readonly HpdRange[] } | null, truth: number): void {
    this.events++;
    if (!summary) return;
    if (inside(summary.hpd95, truth)) this.covered95++;
    if (inside(summary.hpd68, truth)) this.covered68++;
    this.widthSum += width(summary.hpd95);
    this.widthCount++;
  }

  figures(): CoverageFigures {
    return {
      events: this.events,
      covered95: this.covered95,
      covered68: this.covered68,
      coverage95: this.covered95 / Math.max(1, this.events),
      coverage68: this.covered68 / Math.max(1, this.events),
      meanWidth95: this.widthSum / Math.max(1, this.widthCount),
    };
  }
}

export function validateJointModel(options: JointValidationOptions): JointValidationFigures {
  const joint = new Tally();
  const product = new Tally();
  const untied = new Tally();
  const siteAlone = new Tally();
  const siteJoint = new Tally();
  let productEmpty = 0;
  let maxRhat = 1;
  let minEss = Infinity;
  for (let r = 0; r < options.records; r++) {
    const seed = options.firstSeed + r;
    const { input, regionalTruth, siteEventTruth } = simulateRecord({
      ...options.generator,
      seed,
      siteCount: options.siteCount,
      eventCount: options.eventCount,
    });
    const settings = {
      seed,
      iterations: options.iterations,
      burnIn: options.burnIn,
      thin: options.thin,
      outlierPrior: 0.05,
      outlierShiftScaleYears: 500,
      inheritanceScaleYears: 100,
      windowMarginYears: 1_000,
    };
    const chains = [0, 1, 2, 3].map((chainIndex) => runJointChain(input, { ...settings, chainIndex }));
    const result = summariseJointChains(input, chains, { maxStoredDraws: 100 });
    maxRhat = Math.max(maxRhat, result.diagnostics.maxRhat);
    minEss = Math.min(minEss, result.diagnostics.minEss);
    const byRegional = new Map(result.regionalEvents.map((e) => [e.regionalEventId, e]));
    const tied = new Set(input.regionalEvents.flatMap((e) => e.members.map((m) => `${m.siteId}/${m.eventHorizonId}`)));
    for (const event of result.siteEvents) {
      const key = `${event.siteId}/${event.eventHorizonId}`;
      if (!tied.has(key)) untied.add(event.summary, siteEventTruth.get(key) as number);
      siteJoint.add(event.summary, siteEventTruth.get(key) as number);
    }
    // The current method: each site alone, then the product of the members' posteriors.
    const siteDensities = new Map<string, CalendarDensity>();
    input.sites.forEach((site, s) => {
      const run = runAgeModel(site.column, { seed: seed * 31 + s, iterations: options.iterations, burnIn: options.burnIn, thin: options.thin, maxStoredDraws: 10 });
      for (const event of run.events) {
        const key = `${site.siteId}/${event.eventHorizonId}`;
        siteDensities.set(key, event.density);
        siteAlone.add(event.summary, siteEventTruth.get(key) as number);
      }
    });
    for (const regional of input.regionalEvents) {
      const truth = regionalTruth.get(regional.regionalEventId) as number;
      joint.add((byRegional.get(regional.regionalEventId) as { summary: { hpd95: HpdRange[]; hpd68: HpdRange[] } }).summary, truth);
      const combined = combineAges(regional.members.map((m) => siteDensities.get(`${m.siteId}/${m.eventHorizonId}`) as CalendarDensity));
      if (!combined.density) productEmpty++;
      product.add(combined.density ? summariseReadable(combined.density) : null, truth);
    }
  }
  return {
    records: options.records,
    joint: joint.figures(),
    product: product.figures(),
    productEmpty,
    untied: untied.figures(),
    siteAlone: siteAlone.figures(),
    siteJoint: siteJoint.figures(),
    maxRhat,
    minEss,
  };
}
