/**
 * Which events count in a segment's earthquake record (issue 14, item 4). A hypothesis groups
 * site events into regional events; a segment's record is the regional events recorded at its
 * sites. The analyst chooses the counting rule:
 *
 * - every regional event recorded on the segment (share 0), or only those whose member sites span
 *   at least a stated share of the segment's along-strike extent (a partial rupture recorded at
 *   one end does not count as a segment-wide earthquake);
 * - untied single-site events (an event with no tie at all in the hypothesis) in or out, OUT by
 *   default: counted as earthquakes of their own they shorten the recurrence whenever the
 *   correlation is merely incomplete;
 * - optional inclusion weights by horizon quality (1 certain - 4 possible; the event's best member
 *   on the segment) and by tie confidence (1-4; the event's weakest tie). An event's inclusion
 *   probability is the product of its two weights (1 where a weight is not given or does not
 *   apply). These are the analyst's judgements expressed as probabilities, not a model of how
 *   correlations fail: in each Monte Carlo draw an event is in that draw's record with its
 *   probability, independently of the other events.
 *
 * Span share: the overlap of [min, max] of the member sites' along-strike positions (all members,
 * also those beyond the segment) with the segment's [startKm, endKm], divided by the segment's
 * length. Sites are points, so an event recorded at the segment's outermost sites is as
 * through-going as the data can show: `throughGoing` says the event is recorded at (or beyond) the
 * first and the last of the segment's sites along strike.
 *
 * Pure functions; no framework imports.
 */
import { RecurrenceInputError } from './errors';

/** Horizon qualities and tie confidences run 1 (certain) to 4 (possible). */
export const GRADE_COUNT = 4;

export interface CountingRule {
  /** 0-1: a tied event counts only when its member sites span at least this share of the segment; 0 counts every event. */
  readonly minimumSpanShare: number;
  /** Whether untied single-site events count (default false); the span share rule does not apply to them. */
  readonly includeUntied: boolean;
  /** Inclusion probability for horizon quality 1..4 (index 0 is quality 1); null: no quality weighting. */
  readonly qualityWeights: readonly number[] | null;
  /** Inclusion probability for tie confidence 1..4 (index 0 is confidence 1); null: no confidence weighting. */
  readonly confidenceWeights: readonly number[] | null;
}

export const DEFAULT_COUNTING_RULE: CountingRule = {
  minimumSpanShare: 0,
  includeUntied: false,
  qualityWeights: null,
  confidenceWeights: null,
};

/** One site event of a regional event. */
export interface CandidateMember {
  readonly eventHorizonId: string;
  readonly eventName: string;
  readonly siteId: string;
  readonly siteName: string;
  readonly alongStrikeKm: number;
  /** The segment the member's site lies in; null when the site has none. */
  readonly segmentId: string | null;
  /** Horizon quality, 1 (certain) to 4 (possible). */
  readonly quality: number;
}

/** A regional event of the hypothesis with at least one member on the segment. */
export interface CandidateEvent {
  /** The regional event's stable id (sorted member ids). */
  readonly id: string;
  readonly members: readonly CandidateMember[];
  /** Confidence (1-4) of every tie inside the event; empty for an untied event. */
  readonly tieConfidences: readonly number[];
  /** True when none of the members has any tie in the hypothesis (also ties skipped for lack of an age). */
  readonly untied: boolean;
  /** Median of the combined age, cal BP; null when the members share no year. */
  readonly medianCalBp: number | null;
}

export interface SegmentExtent {
  readonly segmentId: string;
  readonly startKm: number;
  readonly endKm: number;
  /** Along-strike positions of the segment's sites, km. */
  readonly siteKm: readonly number[];
}

export interface EventTableRow extends CandidateEvent {
  /** Share (0-1) of the segment's extent that the member sites span. */
  readonly spanShare: number;
  /** Recorded at (or beyond) both of the segment's outermost sites. */
  readonly throughGoing: boolean;
  /** Whether the rule counts the event at all (inclusionProbability > 0). */
  readonly counted: boolean;
  /** Probability that the event is in a draw's record: 0 when not counted, 1 without weights. */
  readonly inclusionProbability: number;
  /** Why the event is in or out, in words. */
  readonly reason: string;
}

/**
 * Refuses a rule the counting cannot use; `field` names the input (under `countingRule`).
 */
export function checkCountingRule(rule: CountingRule): void {
  if (!Number.isFinite(rule.minimumSpanShare) || rule.minimumSpanShare < 0 || rule.minimumSpanShare > 1) {
    throw new RecurrenceInputError('countingRule.minimumSpanShare', `The minimum span share must be between 0 and 1; it is ${rule.minimumSpanShare}.`);
  }
  checkWeights('countingRule.qualityWeights', 'horizon quality', rule.qualityWeights);
  checkWeights('countingRule.confidenceWeights', 'tie confidence', rule.confidenceWeights);
}

function checkWeights(field: string, what: string, weights: readonly number[] | null): void {
  if (weights === null) return;
  if (weights.length !== GRADE_COUNT) {
    throw new RecurrenceInputError(field, `Give ${GRADE_COUNT} weights, one for each ${what} from 1 (certain) to 4 (possible); there are ${weights.length}.`);
  }
  weights.forEach((weight, i) => {
    if (!Number.isFinite(weight) || weight < 0 || weight > 1) {
      throw new RecurrenceInputError(field, `The weight for ${what} ${i + 1} must be a probability between 0 and 1; it is ${weight}.`);
    }
  });
}

/**
 * The share of the segment's along-strike extent spanned by the positions `km` (0 for one point
 * or none inside the segment).
 */
export function spanShare(km: readonly number[], extent: Pick<SegmentExtent, 'startKm' | 'endKm'>): number {
  const low = Math.min(extent.startKm, extent.endKm);
  const high = Math.max(extent.startKm, extent.endKm);
  if (km.length === 0 || !(high > low)) return 0;
  const overlap = Math.min(high, Math.max(...km)) - Math.max(low, Math.min(...km));
  return overlap > 0 ? Math.min(1, overlap / (high - low)) : 0;
}

/** The table of a segment's candidate events under a rule, in the candidates' order. */
export function applyCountingRule(candidates: readonly CandidateEvent[], extent: SegmentExtent, rule: CountingRule): EventTableRow[] {
  checkCountingRule(rule);
  const firstSite = extent.siteKm.length > 0 ? Math.min(...extent.siteKm) : Number.NaN;
  const lastSite = extent.siteKm.length > 0 ? Math.max(...extent.siteKm) : Number.NaN;
  return candidates.map((event): EventTableRow => {
    const km = event.members.map((member) => member.alongStrikeKm);
    const share = spanShare(km, extent);
    const throughGoing = extent.siteKm.length > 1 && Math.min(...km) <= firstSite && Math.max(...km) >= lastSite;
    const base = { ...event, spanShare: share, throughGoing };
    if (event.untied && !rule.includeUntied) {
      return { ...base, counted: false, inclusionProbability: 0, reason: 'Untied single-site event: left out by the rule (untied events out).' };
    }
    if (!event.untied && share < rule.minimumSpanShare) {
      return {
        ...base,
        counted: false,
        inclusionProbability: 0,
        reason: `Spans ${percent(share)} of the segment, below the rule's ${percent(rule.minimumSpanShare)}.`,
      };
    }
    const { probability, parts } = inclusionProbability(event, extent.segmentId, rule);
    if (probability === 0) {
      return { ...base, counted: false, inclusionProbability: 0, reason: `Weight 0 (${parts.join(', ')}).` };
    }
    const why = event.untied ? 'Untied single-site event, counted by the rule' : rule.minimumSpanShare > 0 ? `Spans ${percent(share)} of the segment` : 'Recorded on the segment';
    return {
      ...base,
      counted: true,
      inclusionProbability: probability,
      reason: parts.length > 0 ? `${why}; in each draw with probability ${probability.toFixed(2)} (${parts.join(' x ')}).` : `${why}.`,
    };
  });
}

/**
 * Quality weight of the event's best member on the segment (all members when none lies in it)
 * times the confidence weight of its weakest tie.
 */
function inclusionProbability(event: CandidateEvent, segmentId: string, rule: CountingRule): { probability: number; parts: string[] } {
  const parts: string[] = [];
  let probability = 1;
  if (rule.qualityWeights) {
    const onSegment = event.members.filter((member) => member.segmentId === segmentId);
    const best = Math.min(...(onSegment.length > 0 ? onSegment : event.members).map((member) => member.quality));
    const weight = rule.qualityWeights[clampGrade(best) - 1];
    probability *= weight;
    parts.push(`quality ${best}: ${weight}`);
  }
  if (rule.confidenceWeights && event.tieConfidences.length > 0) {
    const weakest = Math.max(...event.tieConfidences);
    const weight = rule.confidenceWeights[clampGrade(weakest) - 1];
    probability *= weight;
    parts.push(`weakest tie confidence ${weakest}: ${weight}`);
  }
  return { probability, parts };
}

function clampGrade(grade: number): number {
  return Math.min(GRADE_COUNT, Math.max(1, Math.round(grade)));
}

function percent(share: number): string {
  return `${(share * 100).toFixed(0)} %`;
}

/** What an event table says about how many events a draw's record holds. */
export interface RecordSize {
  /** Events with an inclusion probability above 0. */
  readonly countedEvents: number;
  /** Sum of the inclusion probabilities: the mean record size before the at-least-three condition. */
  readonly expectedEvents: number;
  /** Whether any counted event has a probability below 1 (the record varies between draws). */
  readonly weighted: boolean;
}

export function recordSize(rows: readonly Pick<EventTableRow, 'inclusionProbability'>[]): RecordSize {
  const counted = rows.filter((row) => row.inclusionProbability > 0);
  return {
    countedEvents: counted.length,
    expectedEvents: counted.reduce((sum, row) => sum + row.inclusionProbability, 0),
    weighted: counted.some((row) => row.inclusionProbability < 1),
  };
}

/** How inclusion weights enter the Monte Carlo, stated with every weighted analysis. */
export const INCLUSION_METHOD_NOTE =
  'Inclusion weights are the analyst\'s judgement, used as probabilities: in each Monte Carlo draw every counted event is ' +
  'kept in that draw\'s record with its probability, independently of the others, and a draw whose record would hold fewer ' +
  'than three events is drawn again (so the figures are conditional on at least two closed intervals). The age draws keep ' +
  'the order of all counted events; intervals, fits and probabilities come from the events kept. The ranges therefore mix ' +
  'over which events happened as well as over dating and parameters: they are wider than with every event certain, and an ' +
  'interval row covers only the draws in which its younger event is kept (its share of draws is shown). The point fits ' +
  '(AIC, AICc) use the median ages of the events with probability at least 0.5.';
