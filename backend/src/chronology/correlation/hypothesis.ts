/**
 * Checks of one correlation hypothesis (SPEC, Computation 3): its regional events, each with a
 * combined age, an age concordance, the Ward & Wilson chi-square test, rupture length and
 * magnitude, and the order conflicts between regional events.
 */
import { summarise, type CalendarDensity, type DensitySummary } from '../common/density';
import { wardWilsonTest, type GaussianAge, type WardWilsonTest } from './chi-square';
import { combineAges, concordanceWarningThreshold } from './combined-age';
import { orderConflicts, type OrderConflict } from './order-conflicts';
import {
  CorrelationInputError,
  regionalEventId,
  regionalEvents,
  type SiteEvent,
  type Tie,
} from './regional-events';
import {
  alongStrikeSpanKm,
  defaultScalingRelation,
  magnitudeFromLength,
  type MagnitudeEstimate,
  type ScalingRelationCode,
  type TectonicSetting,
} from './rupture-scaling';

export interface HypothesisInput {
  readonly events: readonly SiteEvent[];
  readonly ties: readonly Tie[];
  readonly tectonicSetting: TectonicSetting;
  /** Overrides the setting's default relation (e.g. Wells & Coppersmith reverse faults). */
  readonly scalingRelation?: ScalingRelationCode;
}

export interface RegionalEventCheck {
  /** Stable id from the sorted member ids (see `regionalEventId`). */
  readonly id: string;
  /** Member event ids, ordered along strike. */
  readonly memberIds: readonly string[];
  /** Distinct sites, ordered along strike. */
  readonly siteIds: readonly string[];
  readonly tieIds: readonly string[];
  /** False when the members' densities share no year: then there is no combined age. */
  readonly agesOverlap: boolean;
  /** Summary of the combined age density; null when the ages do not overlap. */
  readonly combined: DensitySummary | null;
  /** The combined density itself, trimmed and normalised, for drawing; null with `combined`. */
  readonly combinedDensity: CalendarDensity | null;
  /** Age concordance in [0, 1]; null for an event seen at one site only. */
  readonly concordance: number | null;
  /** The concordance below which this many members are flagged; null for a single member. */
  readonly concordanceThreshold: number | null;
  /** Concordance below `concordanceThreshold` (a true same-event group is flagged about 5 % of the time). */
  readonly concordanceWarning: boolean;
  /** Ward & Wilson test on the members' posterior means and SDs; null for a single member. */
  readonly chiSquare: WardWilsonTest | null;
  /** Along-strike span of the member sites (a minimum length); null for one site or no span. */
  readonly ruptureLengthKm: number | null;
  readonly magnitude: MagnitudeEstimate | null;
  /** Plain-language remarks for the correlator (no overlap, failed tests, no length). */
  readonly notes: readonly string[];
}

export interface HypothesisCheck {
  /** Young to old by combined median (mean of member means when the ages do not overlap). */
  readonly regionalEvents: readonly RegionalEventCheck[];
  readonly orderConflicts: readonly OrderConflict[];
}

/**
 * The smallest SD used in the chi-square test: the spread of one grid year taken as uniform
 * (1/sqrt(12) yr), so a posterior held in a single year (a historical event) still has a weight.
 */
const GRID_YEAR_SD = 1 / Math.sqrt(12);

/** Mean and SD of an event's posterior, refusing densities that are not densities. */
function posteriorMoments(event: SiteEvent): GaussianAge {
  const { startCalBp, probabilities: p } = event.posterior;
  let mass = 0;
  let first = 0;
  for (let i = 0; i < p.length; i++) {
    if (!(p[i] >= 0) || !Number.isFinite(p[i])) {
      throw new CorrelationInputError(
        `The age density of "${event.name}" at ${event.siteName} has a negative or non-finite value.`,
      );
    }
    mass += p[i];
    first += p[i] * i;
  }
  if (!(mass > 0) || !Number.isFinite(mass)) {
    throw new CorrelationInputError(`The age density of "${event.name}" at ${event.siteName} has no mass.`);
  }
  const meanIndex = first / mass;
  let second = 0;
  for (let i = 0; i < p.length; i++) second += p[i] * (i - meanIndex) ** 2;
  return { mean: startCalBp + meanIndex, sd: Math.max(GRID_YEAR_SD, Math.sqrt(second / mass)) };
}

function checkPosition(event: SiteEvent): void {
  if (!Number.isFinite(event.alongStrikeKm) || !Number.isFinite(event.orderIndexFromBase)) {
    throw new CorrelationInputError(
      `"${event.name}" at ${event.siteName} needs a finite along-strike position and order index.`,
    );
  }
}

function formatNumber(x: number, digits: number): string {
  return x.toFixed(digits);
}

/**
 * Run every correlation check of a hypothesis. Throws `CorrelationInputError` when ties name
 * unknown events or put two events of one site together, or an event's data is unusable.
 */
export function checkHypothesis({
  events,
  ties,
  tectonicSetting,
  scalingRelation,
}: HypothesisInput): HypothesisCheck {
  events.forEach(checkPosition);
  const groups = regionalEvents(events, ties);
  const eventsById = new Map(events.map((event) => [event.id, event]));
  const moments = new Map(events.map((event) => [event.id, posteriorMoments(event)]));
  const relation = scalingRelation ?? defaultScalingRelation(tectonicSetting);

  const checked = groups.map((group): { check: RegionalEventCheck; sortKey: number } => {
    const members = group.memberIds.map((id) => eventsById.get(id) as SiteEvent);
    const memberMoments = group.memberIds.map((id) => moments.get(id) as GaussianAge);
    const notes: string[] = [];

    const { density, concordance } = combineAges(members.map((member) => member.posterior));
    const combined = density ? summarise(density) : null;
    if (!density) {
      notes.push(
        "The members' age densities share no year, so they cannot date one earthquake; no combined age is given.",
      );
    }
    const single = members.length === 1;
    const concordanceThreshold = concordanceWarningThreshold(members.length);
    const concordanceWarning = concordanceThreshold !== null && concordance < concordanceThreshold;
    if (concordanceWarning && density) {
      notes.push(
        `Age concordance ${formatNumber(concordance, 4)} is below ${formatNumber(concordanceThreshold, 4)}, ` +
          `the level a true same-event group of ${members.length} falls below 5 % of the time: ` +
          "the members' ages barely overlap.",
      );
    }

    const chiSquare = single ? null : wardWilsonTest(memberMoments);
    if (chiSquare && !chiSquare.passes) {
      notes.push(
        `Ward & Wilson test fails: T = ${formatNumber(chiSquare.t, 2)} exceeds the 5 % critical value ` +
          `${formatNumber(chiSquare.critical5, 2)} (df ${chiSquare.df}).`,
      );
    }

    const siteIds = [...new Set(members.map((member) => member.siteId))];
    let ruptureLengthKm: number | null = null;
    let magnitude: MagnitudeEstimate | null = null;
    if (siteIds.length === 1) {
      notes.push('Recorded at one site only: no rupture length or magnitude.');
    } else {
      const span = alongStrikeSpanKm(members.map((member) => member.alongStrikeKm));
      if (span > 0) {
        ruptureLengthKm = span;
        magnitude = magnitudeFromLength(span, relation);
      } else {
        notes.push('All member sites are at one along-strike position: no rupture length or magnitude.');
      }
    }

    const sortKey = combined
      ? combined.medianCalBp
      : memberMoments.reduce((sum, age) => sum + age.mean, 0) / memberMoments.length;
    return {
      sortKey,
      check: {
        id: group.id,
        memberIds: group.memberIds,
        siteIds,
        tieIds: group.tieIds,
        agesOverlap: density !== null,
        combined,
        combinedDensity: density,
        concordance: single ? null : concordance,
        concordanceThreshold,
        concordanceWarning,
        chiSquare,
        ruptureLengthKm,
        magnitude,
        notes,
      },
    };
  });

  checked.sort((p, q) => p.sortKey - q.sortKey || (p.check.id < q.check.id ? -1 : p.check.id > q.check.id ? 1 : 0));
  return {
    regionalEvents: checked.map(({ check }) => check),
    orderConflicts: orderConflicts(events, groups, ties),
  };
}

export interface HypothesisComparison<T> {
  /** Regional events of hypothesis A whose member set is not a regional event of B. */
  readonly onlyInA: readonly T[];
  readonly onlyInB: readonly T[];
  /** Regional events with the same member set in both, paired. */
  readonly inBoth: readonly { readonly a: T; readonly b: T }[];
}

/**
 * Side-by-side comparison of two hypotheses' regional events by member set (order of members
 * and the events' ids do not matter). Keeps each hypothesis's order.
 */
export function compareHypotheses<T extends { readonly memberIds: readonly string[] }>(
  a: { readonly regionalEvents: readonly T[] },
  b: { readonly regionalEvents: readonly T[] },
): HypothesisComparison<T> {
  const inB = new Map(b.regionalEvents.map((event) => [regionalEventId(event.memberIds), event]));
  const matchedInB = new Set<string>();
  const onlyInA: T[] = [];
  const inBoth: { a: T; b: T }[] = [];
  for (const event of a.regionalEvents) {
    const key = regionalEventId(event.memberIds);
    const partner = inB.get(key);
    if (partner) {
      inBoth.push({ a: event, b: partner });
      matchedInB.add(key);
    } else {
      onlyInA.push(event);
    }
  }
  const onlyInB = b.regionalEvents.filter((event) => !matchedInB.has(regionalEventId(event.memberIds)));
  return { onlyInA, onlyInB, inBoth };
}
