import { describe, expect, it } from 'vitest';
import { RecurrenceInputError } from './errors';
import {
  applyCountingRule,
  type CandidateEvent,
  type CandidateMember,
  checkCountingRule,
  DEFAULT_COUNTING_RULE,
  recordSize,
  spanShare,
} from './event-counting';
import { summariseRecurrence } from './monte-carlo';

// A segment from 0 to 100 km with sites at 10, 50 and 90 km; a neighbour segment beyond 100 km.
const EXTENT = { segmentId: 'seg', startKm: 0, endKm: 100, siteKm: [10, 50, 90] };

function member(id: string, km: number, quality = 1, segmentId: string | null = km <= 100 ? 'seg' : 'next'): CandidateMember {
  return { eventHorizonId: id, eventName: id, siteId: `site-${km}`, siteName: `Site ${km}`, alongStrikeKm: km, segmentId, quality };
}

function candidate(id: string, members: CandidateMember[], tieConfidences: number[] = members.length > 1 ? [1] : []): CandidateEvent {
  return { id, members, tieConfidences, untied: tieConfidences.length === 0, medianCalBp: 1000 };
}

const THROUGH = candidate('through', [member('a1', 10), member('b1', 50), member('c1', 90)], [1, 2]);
const PARTIAL = candidate('partial', [member('a2', 10), member('b2', 50)], [1]);
const BEYOND = candidate('beyond', [member('c3', 90), member('d3', 160)], [2]);
const UNTIED = candidate('untied', [member('b4', 50, 3)]);

describe(spanShare.name, () => {
  it('is the overlap of the sites span with the segment over its length [analytic]', () => {
    expect(spanShare([10, 50, 90], EXTENT)).toBeCloseTo(0.8, 12);
    expect(spanShare([10, 50], EXTENT)).toBeCloseTo(0.4, 12);
    // 90..160 overlaps 90..100: 10 km of 100.
    expect(spanShare([90, 160], EXTENT)).toBeCloseTo(0.1, 12);
    expect(spanShare([-20, 130], EXTENT)).toBe(1);
    expect(spanShare([50], EXTENT)).toBe(0);
    expect(spanShare([120, 150], EXTENT)).toBe(0);
    // A segment given end first is the same segment.
    expect(spanShare([10, 50], { startKm: 100, endKm: 0 })).toBeCloseTo(0.4, 12);
  });
});

describe(applyCountingRule.name, () => {
  const candidates = [THROUGH, PARTIAL, BEYOND, UNTIED];

  it('by default counts every tied event recorded on the segment and leaves untied events out', () => {
    const rows = applyCountingRule(candidates, EXTENT, DEFAULT_COUNTING_RULE);
    expect(rows.map((row) => [row.id, row.counted, row.inclusionProbability])).toEqual([
      ['through', true, 1],
      ['partial', true, 1],
      ['beyond', true, 1],
      ['untied', false, 0],
    ]);
    expect(rows[3].reason).toMatch(/untied/i);
    expect(rows.map((row) => row.throughGoing)).toEqual([true, false, false, false]);
  });

  it('leaves out events spanning less than the stated share, and counts untied ones only when asked', () => {
    const rows = applyCountingRule(candidates, EXTENT, { ...DEFAULT_COUNTING_RULE, minimumSpanShare: 0.5, includeUntied: true });
    expect(rows.map((row) => row.counted)).toEqual([true, false, false, true]);
    expect(rows[1].reason).toContain('40 %');
    expect(rows[1].reason).toContain('50 %');
    // An event spanning exactly the share counts.
    expect(applyCountingRule([PARTIAL], EXTENT, { ...DEFAULT_COUNTING_RULE, minimumSpanShare: 0.4 })[0].counted).toBe(true);
  });

  it('weights by the best quality on the segment times the weakest tie confidence', () => {
    const rule = { ...DEFAULT_COUNTING_RULE, includeUntied: true, qualityWeights: [1, 0.9, 0.6, 0.3], confidenceWeights: [1, 0.8, 0.5, 0] };
    const mixed = candidate('mixed', [member('a5', 10, 3), member('b5', 50, 2), member('d5', 160, 1)], [2, 3]);
    const rows = applyCountingRule([THROUGH, mixed, UNTIED, candidate('doubtful', [member('a6', 10), member('b6', 50)], [4])], EXTENT, rule);
    // THROUGH: quality 1 (1) x weakest confidence 2 (0.8).
    expect(rows[0].inclusionProbability).toBeCloseTo(0.8, 12);
    // mixed: best quality on the segment is 2 (the quality-1 member lies beyond it): 0.9 x confidence 3 (0.5).
    expect(rows[1].inclusionProbability).toBeCloseTo(0.45, 12);
    // An untied event has no tie to weigh: quality 3 only.
    expect(rows[2].inclusionProbability).toBeCloseTo(0.6, 12);
    // Weight 0 leaves the event out.
    expect(rows[3].counted).toBe(false);
    expect(recordSize(rows)).toEqual({ countedEvents: 3, expectedEvents: 0.8 + 0.45 + 0.6, weighted: true });
  });

  it('refuses rules it cannot use, naming the field', () => {
    const field = (rule: Parameters<typeof checkCountingRule>[0]) => {
      try {
        checkCountingRule(rule);
        return null;
      } catch (error) {
        expect(error).toBeInstanceOf(RecurrenceInputError);
        return (error as RecurrenceInputError).field;
      }
    };
    expect(field({ ...DEFAULT_COUNTING_RULE, minimumSpanShare: 1.2 })).toBe('countingRule.minimumSpanShare');
    expect(field({ ...DEFAULT_COUNTING_RULE, minimumSpanShare: Number.NaN })).toBe('countingRule.minimumSpanShare');
    expect(field({ ...DEFAULT_COUNTING_RULE, qualityWeights: [1, 1, 1] })).toBe('countingRule.qualityWeights');
    expect(field({ ...DEFAULT_COUNTING_RULE, confidenceWeights: [1, 1, 1.5, 0] })).toBe('countingRule.confidenceWeights');
    expect(field({ ...DEFAULT_COUNTING_RULE, minimumSpanShare: 1, qualityWeights: [0, 0, 0, 0] })).toBeNull();
  });
});

describe('inclusion probabilities in the Monte Carlo', () => {
  // Five events 1000 years apart in every draw, except that all ages shift together a little.
  const draws = Array.from({ length: 1500 }, (_, d) => {
    const shift = (d % 7) - 3;
    return [5000 + shift, 4000 + shift, 3000 + shift, 2000 + shift, 1000 + shift];
  });
  const options = { forecastStartYearCe: 1950, windowsYears: [50], parameterUncertainty: false };

  it('keeps an event in about its probability of the draws [binomial: 1500 x 0.5, SD 19.4]', () => {
    const summary = summariseRecurrence(draws, { ...options, models: ['POISSON'], inclusionProbabilities: [1, 1, 0.5, 1, 1] });
    // The interval ending at the 0.5 event (index 1) and the next (index 2) which starts at it or before it.
    expect(Math.abs(summary.intervalShares[1] * 1500 - 750)).toBeLessThan(4 * 19.4);
    expect(summary.intervalShares[2]).toBe(1);
    // When the middle event is out, the next interval spans 2000 years; otherwise 1000.
    expect(summary.intervals[2].low95).toBeCloseTo(1000, 6);
    expect(summary.intervals[2].high95).toBeCloseTo(2000, 6);
    // Mean recurrence: 1000 with 5 events, (4000 / 3) with 4.
    expect(summary.meanRecurrence.low95).toBeCloseTo(1000, 6);
    expect(summary.meanRecurrence.high95).toBeCloseTo(4000 / 3, 6);
    expect(summary.recordEvents.low95).toBe(4);
    expect(summary.recordEvents.high95).toBe(5);
  });

  it('gives the same figures as no weights when every probability is 1', () => {
    const plain = summariseRecurrence(draws.slice(0, 300), options);
    const weighted = summariseRecurrence(draws.slice(0, 300), { ...options, inclusionProbabilities: [1, 1, 1, 1, 1] });
    expect(weighted.intervals).toEqual(plain.intervals);
    expect(weighted.models).toEqual(plain.models);
    expect(weighted.intervalShares).toEqual([1, 1, 1, 1]);
  });

  it('lengthens the open interval when the youngest event may be left out', () => {
    const summary = summariseRecurrence(draws.slice(0, 1000), { ...options, inclusionProbabilities: [1, 1, 1, 1, 0.3] });
    // Open interval from the youngest kept event to 0 cal BP: about 1000 (kept) or 2000 (left out), 70 % of draws the latter.
    expect(summary.openInterval.median).toBeGreaterThan(1900);
    expect(summary.openInterval.low95).toBeLessThan(1010);
    // The point fits use only the events with probability at least 0.5.
    expect(summary.medianSequence.eventAgesCalBp).toHaveLength(4);
    expect(summary.eventMedianAgesCalBp).toHaveLength(5);
  });

  it('draws a record again while it holds fewer than three events [analytic: three events at 0.5 are always all kept]', () => {
    const three = draws.slice(0, 50).map((draw) => draw.slice(2));
    const weighted = summariseRecurrence(three, { ...options, models: ['POISSON'], inclusionProbabilities: [0.5, 0.5, 0.5] });
    const plain = summariseRecurrence(three, { ...options, models: ['POISSON'] });
    expect(weighted.recordEvents).toEqual({ median: 3, low95: 3, high95: 3 });
    expect(weighted.meanRecurrence).toEqual(plain.meanRecurrence);
    // Two certain events and three at 0.5: every kept set holds 3 to 5 events.
    const summary = summariseRecurrence(draws.slice(0, 200), { ...options, models: ['POISSON'], inclusionProbabilities: [1, 0.5, 0.5, 0.5, 1] });
    expect(summary.recordEvents.low95).toBe(3);
    expect(summary.recordEvents.high95).toBe(5);
  });

  it('refuses probabilities outside (0, 1] or of the wrong count', () => {
    expect(() => summariseRecurrence(draws.slice(0, 10), { ...options, inclusionProbabilities: [1, 1, 0, 1, 1] })).toThrow(RecurrenceInputError);
    expect(() => summariseRecurrence(draws.slice(0, 10), { ...options, inclusionProbabilities: [1, 1, 1] })).toThrow(RecurrenceInputError);
  });
});
