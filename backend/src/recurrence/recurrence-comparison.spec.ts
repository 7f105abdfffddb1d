import { describe, expect, it } from 'vitest';
import { compareEvents } from './recurrence-comparison';
import type { StoredEventTableRow } from './segment-event-table';

function row(id: string, medianCalBp: number, counted = true, inclusionProbability = counted ? 1 : 0): StoredEventTableRow {
  return {
    regionalEventId: id,
    label: id,
    members: [],
    segmentNames: [],
    spanShare: 0.5,
    throughGoing: false,
    untied: false,
    tieConfidences: [],
    qualities: [],
    medianCalBp,
    counted,
    inclusionProbability,
    reason: '',
  };
}

describe(compareEvents.name, () => {
  it('matches events by id, names each difference and orders young to old', () => {
    const a = [row('x', 500), row('y', 1000), row('z', 1500, true, 0.5), row('w', 2000, false)];
    const b = [row('x', 505), row('v', 990), row('z', 1500, true, 0.8), row('w', 2000, true)];
    expect(compareEvents(a, b).map((e) => [e.regionalEventId, e.difference])).toEqual([
      ['x', 'SAME'],
      ['v', 'ONLY_IN_B'],
      ['y', 'ONLY_IN_A'],
      ['z', 'INCLUSION_CHANGED'],
      ['w', 'COUNTED_IN_B_ONLY'],
    ]);
    const [first] = compareEvents(a, b);
    expect(first.a?.medianCalBp).toBe(500);
    expect(first.b?.medianCalBp).toBe(505);
    expect(compareEvents([row('q', 100)], [row('q', 100, false)])[0].difference).toBe('COUNTED_IN_A_ONLY');
  });
});
