import { describe, expect, it } from 'vitest';
import { intervalEnds } from './interval-events';

// The convention is the API's (schema.graphql IntervalEstimate.index: from event index+1, older,
// to event index, younger, counted from the youngest) and the snapshot's (site: oldest first;
// segment: young to old).

const names = new Map([['e1', 'E1'], ['e2', 'E2'], ['e3', 'E3']]);

describe(intervalEnds.name, () => {
  it('names the event horizons of a site analysis, youngest interval first', () => {
    const snapshot = { kind: 'site' as const, eventHorizonIds: ['e3', 'e2', 'e1'] };
    expect(intervalEnds(snapshot, 0, names)).toEqual({ youngerEvent: 'E1', olderEvent: 'E2' });
    expect(intervalEnds(snapshot, 1, names)).toEqual({ youngerEvent: 'E2', olderEvent: 'E3' });
  });

  it('names regional events by their event-table label, and not at all when weights vary the record', () => {
    const snapshot = {
      kind: 'segment' as const,
      regionalEvents: [{ id: 'r1', memberIds: ['e1'] }, { id: 'r2', memberIds: ['e2', 'e3'] }],
      eventTable: { rows: [{ regionalEventId: 'r1', label: 'Marsh E1' }] as never },
    };
    expect(intervalEnds(snapshot, 0, names)).toEqual({ youngerEvent: 'Marsh E1', olderEvent: 'E2 + E3' });
    const weighted = { ...snapshot, regionalEvents: [{ id: 'r1', memberIds: ['e1'], inclusionProbability: 0.8 }, { id: 'r2', memberIds: ['e2'] }] };
    expect(intervalEnds(weighted, 0, names)).toEqual({ youngerEvent: null, olderEvent: null });
  });
});
