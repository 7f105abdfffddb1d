/**
 * Benchmark of the correlation checks at the size the API meets when a hypothesis is viewed:
 * 100 regional events recorded at 6 of 12 sites each (600 site events, 500 ties). Called by the
 * project's bench script; returns figures, asserts nothing.
 */
import { normalDensity } from '../common/density';
import { SeededRandom } from '../common/random';
import { checkHypothesis } from './hypothesis';
import { validateTie, type SiteEvent, type Tie } from './regional-events';

export interface CorrelationBenchmark {
  readonly events: number;
  readonly ties: number;
  readonly regionalEvents: number;
  /** Median wall time of one `checkHypothesis` call (ms). */
  readonly checkHypothesisMs: number;
  /** Median wall time of one `validateTie` call against all other ties (ms). */
  readonly validateTieMs: number;
}

function invented(seed: number): { events: SiteEvent[]; ties: Tie[] } {
  const random = new SeededRandom(seed);
  const siteCount = 12;
  const events: SiteEvent[] = [];
  const ties: Tie[] = [];
  const perSite: SiteEvent[][] = Array.from({ length: siteCount }, () => []);
  for (let quake = 0; quake < 100; quake++) {
    const trueAgeCalBp = 100 + 60 * quake;
    const sites = Array.from({ length: siteCount }, (_, s) => s)
      .sort(() => random.uniform() - 0.5)
      .slice(0, 6)
      .sort((p, q) => p - q);
    let previous: SiteEvent | undefined;
    for (const s of sites) {
      const sd = 20 + 60 * random.uniform();
      const event: SiteEvent = {
        id: `q${quake}s${s}`,
        name: `S${s}-${quake}`,
        siteId: `site${s}`,
        siteName: `Bench site ${s}`,
        alongStrikeKm: 50 * s,
        orderIndexFromBase: 0, // set below from the true order at the site
        posterior: normalDensity(trueAgeCalBp + sd * random.normal(), sd),
      };
      events.push(event);
      perSite[s].push(event);
      if (previous) ties.push({ id: `t${ties.length}`, eventAId: previous.id, eventBId: event.id });
      previous = event;
    }
  }
  // Quakes were made young to old, so the base of each column is the last one pushed.
  const ordered = perSite.flatMap((column) =>
    column.map((event, k) => ({ ...event, orderIndexFromBase: column.length - k })),
  );
  return { events: ordered, ties };
}

function medianMs(runs: number, work: () => void): number {
  const times: number[] = [];
  for (let r = 0; r < runs; r++) {
    const start = performance.now();
    work();
    times.push(performance.now() - start);
  }
  times.sort((p, q) => p - q);
  return times[Math.floor(runs / 2)];
}

export function benchmarkCorrelationChecks(): CorrelationBenchmark {
  const { events, ties } = invented(1);
  let regionalEventCount = 0;
  checkHypothesis({ events, ties, tectonicSetting: 'SUBDUCTION_INTERFACE' }); // warm-up
  const checkHypothesisMs = medianMs(9, () => {
    const check = checkHypothesis({ events, ties, tectonicSetting: 'SUBDUCTION_INTERFACE' });
    regionalEventCount = check.regionalEvents.length;
  });
  const last = ties[ties.length - 1];
  const others = ties.slice(0, -1);
  const validateTieMs = medianMs(21, () => validateTie(events, others, last));
  return {
    events: events.length,
    ties: ties.length,
    regionalEvents: regionalEventCount,
    checkHypothesisMs,
    validateTieMs,
  };
}
