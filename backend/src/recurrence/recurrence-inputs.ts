/**
 * The event sequence a recurrence analysis runs on, chosen before it is queued so that unusable
 * input is refused at once: the regional events of a hypothesis on a segment (with their
 * combined age densities, young to old) or a site age model's joint draws. Pure functions.
 */
import type { CalendarDensity } from '../chronology/common/density';
import {
  checkHypothesis,
  CorrelationInputError,
  type OrderConflict,
  type RegionalEventCheck,
  type SiteEvent,
  type TectonicSetting,
  type Tie,
} from '../chronology/correlation';
import { RecurrenceInputError } from '../chronology/recurrence';

/** Fewest events with which intervals can be fitted: 3 events give 2 closed intervals. */
export const MINIMUM_EVENTS = 3;

export interface SegmentEventsInput {
  /** Site events of the whole project that have an age model posterior. */
  readonly events: readonly SiteEvent[];
  /** The hypothesis' ties; ties naming events without a posterior are left out. */
  readonly ties: readonly Tie[];
  readonly tectonicSetting: TectonicSetting;
  /** Sites lying in the segment. */
  readonly segmentSiteIds: ReadonlySet<string>;
  /**
   * The counting rule's inclusion probability of each regional event by id (see
   * chronology/recurrence/event-counting.ts); events absent or at 0 are left out. Absent: every
   * regional event recorded on the segment, with probability 1.
   */
  readonly inclusion?: ReadonlyMap<string, number>;
}

export interface SegmentRegionalEvent {
  readonly id: string;
  readonly memberIds: readonly string[];
  readonly siteIds: readonly string[];
  readonly medianCalBp: number;
  readonly density: CalendarDensity;
  /** Probability that the event is in a draw's record (1 unless the rule weights it). */
  readonly inclusionProbability: number;
}

export interface SegmentEvents {
  /** Young to old by combined median. */
  readonly regionalEvents: readonly SegmentRegionalEvent[];
  /** Ties skipped because one of their events has no posterior yet. */
  readonly skippedTieIds: readonly string[];
  /** Order conflicts of the hypothesis among the chosen regional events. */
  readonly orderConflictCount: number;
}

/**
 * The regional events of a hypothesis recorded at any site of the segment. The whole project's
 * events and ties are checked together, so an earthquake that also ruptured a neighbouring
 * segment keeps the ages of all its members in its combined density. Throws
 * `RecurrenceInputError` when a regional event has no combined age or there are too few events.
 */
export function segmentRegionalEvents(input: SegmentEventsInput, onSegment: HypothesisOnSegment = hypothesisOnSegment(input)): SegmentEvents {
  const inclusion = input.inclusion;
  const chosen = onSegment.candidates.filter((event) => !inclusion || (inclusion.get(event.id) ?? 0) > 0);
  const regionalEvents = chosen.map((event): SegmentRegionalEvent => {
    if (!event.combinedDensity || !event.combined) {
      throw new RecurrenceInputError(
        'hypothesisId',
        `The members of regional event ${event.memberIds.join(' + ')} share no calendar year, so it has no age; correct the hypothesis first.`,
      );
    }
    return {
      id: event.id,
      memberIds: event.memberIds,
      siteIds: event.siteIds,
      medianCalBp: event.combined.medianCalBp,
      density: event.combinedDensity,
      inclusionProbability: inclusion ? (inclusion.get(event.id) as number) : 1,
    };
  });
  if (regionalEvents.length < MINIMUM_EVENTS) {
    throw new RecurrenceInputError(
      inclusion ? 'countingRule' : 'segmentId',
      `The segment has ${regionalEvents.length} dated regional events ${inclusion ? 'counted by the rule ' : ''}under this hypothesis; at least ${MINIMUM_EVENTS} are needed (2 closed intervals). ` +
        (inclusion ? "Count more events (untied events in, a lower span share) or run the sites' age models first." : "Run the sites' age models first."),
    );
  }
  const likely = regionalEvents.filter((event) => event.inclusionProbability >= 0.5).length;
  if (likely < MINIMUM_EVENTS) {
    throw new RecurrenceInputError(
      'countingRule',
      `Only ${likely} counted events have an inclusion probability of at least 0.5; at least ${MINIMUM_EVENTS} are needed for the point fits. Raise the weights.`,
    );
  }
  const chosenIds = new Set(chosen.map((event) => event.id));
  return {
    regionalEvents,
    skippedTieIds: onSegment.skippedTieIds,
    orderConflictCount: onSegment.orderConflicts.filter((conflict) => conflictTouches(conflict, chosenIds)).length,
  };
}

/** A hypothesis's regional events recorded at the segment's sites, checked, before any counting rule. */
export interface HypothesisOnSegment {
  /** Young to old by combined median. */
  readonly candidates: readonly RegionalEventCheck[];
  readonly skippedTieIds: readonly string[];
  readonly orderConflicts: readonly OrderConflict[];
}

/**
 * Checks the whole project's events and ties together, so an earthquake that also ruptured a
 * neighbouring segment keeps the ages of all its members, and keeps the regional events with a
 * member at a site of the segment.
 */
export function hypothesisOnSegment(input: SegmentEventsInput): HypothesisOnSegment {
  const known = new Set(input.events.map((event) => event.id));
  const ties = input.ties.filter((tie) => known.has(tie.eventAId) && known.has(tie.eventBId));
  let check;
  try {
    check = checkHypothesis({ events: input.events, ties, tectonicSetting: input.tectonicSetting });
  } catch (error) {
    if (error instanceof CorrelationInputError) throw new RecurrenceInputError('hypothesisId', error.message);
    throw error;
  }
  return {
    candidates: check.regionalEvents.filter((event) => event.siteIds.some((siteId) => input.segmentSiteIds.has(siteId))),
    skippedTieIds: input.ties.filter((tie) => !ties.includes(tie)).map((tie) => tie.id),
    orderConflicts: check.orderConflicts,
  };
}

function conflictTouches(conflict: OrderConflict, ids: ReadonlySet<string>): boolean {
  return conflict.regionalEventIds.some((id) => ids.has(id));
}

/**
 * Refuses a forecast that starts before the youngest event could have happened: the open
 * interval would be negative in some draws. `youngestPossibleCalBp` is the youngest age the last
 * event can take (grid years stand for +-0.5 year).
 */
export function checkForecastStart(youngestPossibleCalBp: number, forecastStartYearCe: number): void {
  const forecastStartCalBp = 1950 - forecastStartYearCe;
  if (forecastStartCalBp > youngestPossibleCalBp) {
    throw new RecurrenceInputError(
      'forecastStartYear',
      `The forecast starts in ${forecastStartYearCe} CE, before the last event may have happened (as young as ${Math.round(1950 - youngestPossibleCalBp)} CE); choose a later start year.`,
    );
  }
}

/** The youngest age a site's joint draws give the youngest event, cal BP. */
export function youngestDrawnAge(draws: ArrayLike<number>): number {
  let youngest = Infinity;
  for (let i = 0; i < draws.length; i++) if (draws[i] < youngest) youngest = draws[i];
  return youngest;
}
