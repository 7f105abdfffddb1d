/**
 * Validation of the joint age model from outside (issue 13, item 8): records simulated by
 * `simulateRecord` (a generator that is not the model's prior) are run end to end through
 * `runJointChain` and `summariseJointChains`, and through the method the joint model replaces
 * (each site's own age model, then the normalised product of the members' posteriors,
 * `combineAges`). For every regional event: whether its 95.4 % and 68.3 % HPD ranges cover the
 * true age, and the total length of its 95.4 % ranges. A well-calibrated model covers the truth at
 * about the nominal rates [analytic]. Used by the spec (a few records) and the bench (100+ events).
 *
 * Measured when written (24 records, seeds 1000-1023, 140 regional events, 446 site events):
 * joint 95.4 % ranges cover 86.4 %, 68.3 % ranges 60.7 % (mean 95.4 % width 291 years); the
 * product of marginals 85.0 % / 60.7 % (280 years); each site's own model on the same columns
 * 92.8 % / 70.2 % (679 years). The joint model is the intended one (it matches the exact sums of
 * joint-exact.spec.ts), so the shortfall is the model's misfit to this generator growing as sites
 * are combined: standardised errors (mean - truth) / sd of the regional events have rms about 1.18
 * with or without erosion, outliers or offset samples in the generator (12 records each), i.e.
 * ranges some 15-20 % too narrow. Not yet explained; see the report of the change.
 */
import { runAgeModel } from '../age-model/age-model';
import { CalendarDensity, HpdRange, summariseReadable } from '../common/density';
import { combineAges } from '../correlation/combined-age';
import { runJointChain, summariseJointChains } from './joint-age-model';
import { simulateRecord } from './simulated-record';

export interface JointValidationOptions {
  readonly records: number;
  readonly firstSeed: number;
  readonly siteCount: number;
  readonly eventCount: number;
  /** Per chain of the joint model (4 chains) and of each site model. */
  readonly iterations: number;
  readonly burnIn: number;
  readonly thin: number;
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
    const { input, regionalTruth, siteEventTruth } = simulateRecord({ seed, siteCount: options.siteCount, eventCount: options.eventCount });
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
