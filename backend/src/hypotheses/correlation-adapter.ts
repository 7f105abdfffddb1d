/**
 * Adapts a project's stored events to the pure correlation checks (chronology/correlation):
 * events whose site has no successful age model yet take part in the grouping and the order and
 * length checks, but get no age-based figures. Also thins densities for drawing. No I/O here.
 */
import {
  checkHypothesis,
  type HypothesisCheck,
  type RegionalEventCheck,
  type SiteEvent,
  type TectonicSetting,
  type Tie,
} from '../chronology/correlation';
import type { CalendarDensity, DensitySummary } from '../chronology/common/density';
import { loadDensity, type StoredAgeModelResults } from '../age-models/age-model-results';

/** A site event as loaded for correlation; `posterior` is null until its site has a model. */
export interface ProjectEvent extends Omit<SiteEvent, 'posterior'> {
  readonly posterior: CalendarDensity | null;
}

/** One year of a density, as the API sends it. */
export interface DensityPoint {
  readonly calBp: number;
  readonly probability: number;
}

/** Points per event density the API sends for drawing (the ladder and combined ages). */
export const MAX_DENSITY_POINTS = 400;

/**
 * Stand-in density for an event with no posterior, so that the grouping, the order check and
 * the rupture length (which need no ages) still run; every age figure it touches is discarded.
 */
const NO_AGE: CalendarDensity = { startCalBp: 0, probabilities: Float64Array.of(1) };

/** The events with a stand-in density where they have none, for the checks that need no ages. */
export function forGrouping(events: readonly ProjectEvent[]): SiteEvent[] {
  return events.map((event) => ({ ...event, posterior: event.posterior ?? NO_AGE }));
}

function densityMean({ startCalBp, probabilities }: CalendarDensity): number {
  let mass = 0;
  let first = 0;
  for (let i = 0; i < probabilities.length; i++) {
    mass += probabilities[i];
    first += probabilities[i] * i;
  }
  return startCalBp + first / mass;
}

function label(event: ProjectEvent): string {
  return `"${event.name}" at ${event.siteName}`;
}

/**
 * The checks of a group some of whose members have no age: combined age, concordance and the
 * chi-square test are null (an age-free member could agree with anything, so no figure would be
 * honest), with a warning naming the members without an age. The rupture length and magnitude
 * stay: they depend on the member sites only. `checkHypothesis` writes the length note last, so
 * the last note is kept when the length is missing.
 */
function withoutAges(check: RegionalEventCheck, unaged: readonly ProjectEvent[]): RegionalEventCheck {
  const which = unaged.map(label).join(', ');
  const warning =
    `${which} ${unaged.length === 1 ? 'has' : 'have'} no age model posterior yet (run the site's age model): ` +
    'no combined age, concordance or chi-square test.';
  const lengthNote = check.ruptureLengthKm === null && check.notes.length > 0 ? [check.notes[check.notes.length - 1]] : [];
  return {
    ...check,
    agesOverlap: false,
    combined: null,
    combinedDensity: null,
    concordance: null,
    concordanceWarning: false,
    chiSquare: null,
    notes: [warning, ...lengthNote],
  };
}

/**
 * `checkHypothesis` over a project's events, some of which may lack a posterior (see
 * `withoutAges`). Regional events come young to old by combined median; groups without one by the
 * mean of their aged members' means; groups with no aged member last; ties broken by id.
 * Throws `CorrelationInputError` as `checkHypothesis` does.
 */
export function checkProjectHypothesis(
  events: readonly ProjectEvent[],
  ties: readonly Tie[],
  tectonicSetting: TectonicSetting,
): HypothesisCheck {
  const check = checkHypothesis({ events: forGrouping(events), ties, tectonicSetting });
  const byId = new Map(events.map((event) => [event.id, event]));

  const keyed = check.regionalEvents.map((regional) => {
    const members = regional.memberIds.map((id) => byId.get(id) as ProjectEvent);
    const unaged = members.filter((member) => member.posterior === null);
    const adapted = unaged.length > 0 ? withoutAges(regional, unaged) : regional;
    const aged = members.filter((member) => member.posterior !== null);
    const sortKey = adapted.combined
      ? adapted.combined.medianCalBp
      : aged.length > 0
        ? aged.reduce((sum, member) => sum + densityMean(member.posterior as CalendarDensity), 0) / aged.length
        : Number.POSITIVE_INFINITY;
    return { adapted, sortKey };
  });
  keyed.sort((p, q) =>
    p.sortKey === q.sortKey ? (p.adapted.id < q.adapted.id ? -1 : p.adapted.id > q.adapted.id ? 1 : 0) : p.sortKey < q.sortKey ? -1 : 1,
  );
  return { regionalEvents: keyed.map(({ adapted }) => adapted), orderConflicts: check.orderConflicts };
}

/**
 * A density as at most `maxPoints` points for drawing: years are pooled into bins of
 * ceil(length / maxPoints) consecutive years, each bin given the mean probability of its years at
 * its middle year. Means (not sums) keep the per-year scale of the 1-year grid, so thinned and
 * unthinned densities draw at the same height, and the area (mean x bin width) is preserved.
 */
export function thinDensity(density: CalendarDensity, maxPoints = MAX_DENSITY_POINTS): DensityPoint[] {
  if (!(maxPoints >= 1)) throw new RangeError(`maxPoints must be at least 1, got ${maxPoints}`);
  const p = density.probabilities;
  const width = Math.max(1, Math.ceil(p.length / Math.floor(maxPoints)));
  const points: DensityPoint[] = [];
  for (let from = 0; from < p.length; from += width) {
    const to = Math.min(p.length, from + width);
    let sum = 0;
    for (let i = from; i < to; i++) sum += p[i];
    points.push({ calBp: density.startCalBp + from + Math.floor((to - from - 1) / 2), probability: sum / (to - from) });
  }
  return points;
}

/** A density on a regular calendar grid: `values[i]` is the mean probability per year around `startCalBp + i * stepYears`. */
export interface DensityGrid {
  readonly startCalBp: number;
  readonly stepYears: number;
  readonly values: readonly number[];
}

/** Values per event the ladder sends: enough for a smooth shape a column wide; fewer keep the ladder answer small. */
export const LADDER_GRID_POINTS = 64;

/**
 * A density pooled into bins of ceil(length / maxPoints) years, as a regular grid for drawing.
 * Each value is the bin's mean probability per year (years past the end count as 0, so the area,
 * value x step summed, equals the density's mass) at the bin's middle year. Values are rounded to
 * 4 significant digits: plenty for a drawing, and a quarter of the bytes.
 */
export function thinToGrid(density: CalendarDensity, maxPoints = LADDER_GRID_POINTS): DensityGrid {
  const p = density.probabilities;
  const step = Math.max(1, Math.ceil(p.length / Math.floor(maxPoints)));
  const values: number[] = [];
  for (let from = 0; from < p.length; from += step) {
    let sum = 0;
    for (let i = from; i < Math.min(p.length, from + step); i++) sum += p[i];
    values.push(Number((sum / step).toPrecision(4)));
  }
  return { startCalBp: density.startCalBp + (step - 1) / 2, stepYears: step, values };
}

/** The grid as (calBp, probability) points, for clients that want points. */
export function gridPoints(grid: DensityGrid): DensityPoint[] {
  return grid.values.map((probability, i) => ({ calBp: Math.round(grid.startCalBp + i * grid.stepYears), probability }));
}

/** An event's posterior from one run, ready for the checks (grid) and for drawing (points). */
export interface DisplayPosterior {
  readonly runId: string;
  readonly summary: DensitySummary;
  readonly density: CalendarDensity;
  /** `density` thinned for drawing by `thinToGrid`. */
  readonly grid: DensityGrid;
}

/** Every event posterior of a run's stored results, by event horizon id. */
export function displayPosteriors(runId: string, results: Pick<StoredAgeModelResults, 'events'> | null): Map<string, DisplayPosterior> {
  const posteriors = new Map<string, DisplayPosterior>();
  for (const event of results?.events ?? []) {
    const density = loadDensity(event.density);
    posteriors.set(event.eventHorizonId, { runId, summary: event.summary, density, grid: thinToGrid(density) });
  }
  return posteriors;
}
