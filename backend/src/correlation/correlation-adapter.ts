/**
 * Adapts a project's stored events to the pure correlation checks (chronology/correlation):
 * events whose site has no successful age model yet take part in the grouping and the order and
 * length checks, but get no age-based figures. No I/O here.
 */
import {
  checkHypothesis,
  type HypothesisCheck,
  type RegionalEventCheck,
  type SiteEvent,
  type TectonicSetting,
  type Tie,
} from '../chronology/correlation';
import type { CalendarDensity } from '../chronology/common/density';

/** A site event as loaded for correlation; `posterior` is null until its site has a model. */
export interface ProjectEvent extends Omit<SiteEvent, 'posterior'> {
  readonly posterior: CalendarDensity | null;
}


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
