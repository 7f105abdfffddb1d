/**
 * A segment's event table under a hypothesis and a counting rule (issue 14, item 4), in the form
 * the API serves, an analysis stores (`input_snapshot.eventTable`) and the exports write. The
 * rule itself lives in chronology/recurrence/event-counting.ts; this module turns the checked
 * hypothesis and the rows read from the database into its candidates and back into plain JSON.
 * Pure functions.
 */
import type { RegionalEventCheck } from '../chronology/correlation';
import {
  applyCountingRule,
  type CandidateEvent,
  type CountingRule,
  DEFAULT_COUNTING_RULE,
  INCLUSION_METHOD_NOTE,
  recordSize,
} from '../chronology/recurrence';

/** What the table needs of each site event. */
export interface TableEventInfo {
  readonly name: string;
  readonly siteId: string;
  readonly siteName: string;
  readonly alongStrikeKm: number;
  readonly segmentId: string | null;
  readonly quality: number;
}

export interface TableInput {
  readonly segment: { readonly id: string; readonly name: string; readonly startKm: number; readonly endKm: number };
  /** Along-strike positions of the segment's sites, km. */
  readonly segmentSiteKm: readonly number[];
  readonly hypothesis: { readonly id: string; readonly name: string; readonly version: number };
  /** The checked regional events with a member on the segment, young to old. */
  readonly candidates: readonly RegionalEventCheck[];
  readonly events: ReadonlyMap<string, TableEventInfo>;
  /** Every tie of the hypothesis (also those skipped for lack of an age), with its confidence. */
  readonly ties: readonly { readonly id: string; readonly eventAId: string; readonly eventBId: string; readonly confidence: number }[];
  /** Segment names by id, for the segments an event spans. */
  readonly segmentNames: ReadonlyMap<string, string>;
  readonly rule: CountingRule;
}

export interface StoredCountingRule {
  minimumSpanShare: number;
  includeUntied: boolean;
  qualityWeights: number[] | null;
  confidenceWeights: number[] | null;
}

export interface StoredEventTableMember {
  eventHorizonId: string;
  eventName: string;
  siteId: string;
  siteName: string;
  alongStrikeKm: number;
  segmentId: string | null;
  segmentName: string | null;
  quality: number;
}

export interface StoredEventTableRow {
  /** The regional event's stable id (sorted member ids), the same under any hypothesis. */
  regionalEventId: string;
  /** Its members as "site event", along strike. */
  label: string;
  members: StoredEventTableMember[];
  /** Names of the segments its member sites lie in, along strike. */
  segmentNames: string[];
  spanShare: number;
  throughGoing: boolean;
  untied: boolean;
  tieConfidences: number[];
  qualities: number[];
  medianCalBp: number | null;
  counted: boolean;
  inclusionProbability: number;
  reason: string;
}

export interface StoredEventTable {
  segmentId: string;
  segmentName: string;
  segmentStartKm: number;
  segmentEndKm: number;
  hypothesisId: string;
  hypothesisName: string;
  hypothesisVersion: number;
  rule: StoredCountingRule;
  /** Young to old. */
  rows: StoredEventTableRow[];
  countedEvents: number;
  expectedEvents: number;
  weighted: boolean;
  /** How the rule and any weights enter the analysis. */
  note: string;
}

/** The rule as the API gives it (every field optional), with the defaults filled in. */
export interface CountingRuleInput {
  minimumSpanShare?: number | null;
  includeUntied?: boolean | null;
  qualityWeights?: number[] | null;
  confidenceWeights?: number[] | null;
}

export function countingRuleOf(input: CountingRuleInput | null | undefined): CountingRule {
  return {
    minimumSpanShare: input?.minimumSpanShare ?? DEFAULT_COUNTING_RULE.minimumSpanShare,
    includeUntied: input?.includeUntied ?? DEFAULT_COUNTING_RULE.includeUntied,
    qualityWeights: input?.qualityWeights ?? DEFAULT_COUNTING_RULE.qualityWeights,
    confidenceWeights: input?.confidenceWeights ?? DEFAULT_COUNTING_RULE.confidenceWeights,
  };
}

/** The segment's event table; throws RecurrenceInputError (field under `countingRule`) for a rule it cannot use. */
export function segmentEventTable(input: TableInput): StoredEventTable {
  const tied = new Set(input.ties.flatMap((tie) => [tie.eventAId, tie.eventBId]));
  const confidence = new Map(input.ties.map((tie) => [tie.id, tie.confidence]));
  const candidates = input.candidates.map((check): CandidateEvent => {
    const members = check.memberIds.map((id) => {
      const info = input.events.get(id);
      if (!info) throw new Error(`no event row for member ${id}`);
      return { eventHorizonId: id, eventName: info.name, siteId: info.siteId, siteName: info.siteName, alongStrikeKm: info.alongStrikeKm, segmentId: info.segmentId, quality: info.quality };
    });
    return {
      id: check.id,
      members,
      tieConfidences: check.tieIds.map((id) => confidence.get(id) ?? 1),
      untied: check.memberIds.every((id) => !tied.has(id)),
      medianCalBp: check.combined?.medianCalBp ?? null,
    };
  });
  const rows = applyCountingRule(
    candidates,
    { segmentId: input.segment.id, startKm: input.segment.startKm, endKm: input.segment.endKm, siteKm: input.segmentSiteKm },
    input.rule,
  );
  const size = recordSize(rows);
  const rule = input.rule;
  return {
    segmentId: input.segment.id,
    segmentName: input.segment.name,
    segmentStartKm: input.segment.startKm,
    segmentEndKm: input.segment.endKm,
    hypothesisId: input.hypothesis.id,
    hypothesisName: input.hypothesis.name,
    hypothesisVersion: input.hypothesis.version,
    rule: {
      minimumSpanShare: rule.minimumSpanShare,
      includeUntied: rule.includeUntied,
      qualityWeights: rule.qualityWeights ? [...rule.qualityWeights] : null,
      confidenceWeights: rule.confidenceWeights ? [...rule.confidenceWeights] : null,
    },
    rows: rows.map((row) => ({
      regionalEventId: row.id,
      label: row.members.map((member) => `${member.siteName} ${member.eventName}`).join(' + '),
      members: row.members.map((member) => ({
        ...member,
        segmentName: member.segmentId ? (input.segmentNames.get(member.segmentId) ?? null) : null,
      })),
      segmentNames: [...new Set(row.members.flatMap((member) => (member.segmentId ? [input.segmentNames.get(member.segmentId) ?? member.segmentId] : [])))],
      spanShare: row.spanShare,
      throughGoing: row.throughGoing,
      untied: row.untied,
      tieConfidences: [...row.tieConfidences],
      qualities: row.members.map((member) => member.quality),
      medianCalBp: row.medianCalBp,
      counted: row.counted,
      inclusionProbability: row.inclusionProbability,
      reason: row.reason,
    })),
    countedEvents: size.countedEvents,
    expectedEvents: size.expectedEvents,
    weighted: size.weighted,
    note: tableNote(rule, size.weighted),
  };
}

/** Inclusion probability by regional event id, for `segmentRegionalEvents`. */
export function inclusionOf(table: StoredEventTable): Map<string, number> {
  return new Map(table.rows.filter((row) => row.counted).map((row) => [row.regionalEventId, row.inclusionProbability]));
}

function tableNote(rule: CountingRule, weighted: boolean): string {
  const share =
    rule.minimumSpanShare > 0
      ? `Tied events count when their member sites span at least ${(rule.minimumSpanShare * 100).toFixed(0)} % of the segment's along-strike extent.`
      : 'Every tied regional event recorded at a site of the segment counts, partial or through-going.';
  const untied = rule.includeUntied
    ? 'Untied single-site events count as earthquakes of their own: if they are unrecognised records of tied events, the recurrence is too short.'
    : 'Untied single-site events are left out: if some are earthquakes that ruptured only near their site, the recurrence is too long.';
  return `${share} ${untied}${weighted ? ` ${INCLUSION_METHOD_NOTE}` : ''}`;
}
