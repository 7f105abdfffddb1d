import { describe, expect, it } from 'vitest';
import { conflictingTieIds, eventAnchors, gridToDensity } from './ladderData';

describe(gridToDensity.name, () => {
  it('places value i at startCalBp + i x step', () => {
    expect(gridToDensity({ startCalBp: 1200, stepYears: 5, values: [0.01, 0.02, 0.01] })).toEqual([
      { calBp: 1200, probability: 0.01 },
      { calBp: 1205, probability: 0.02 },
      { calBp: 1210, probability: 0.01 },
    ]);
    expect(gridToDensity(null)).toEqual([]);
  });
});

describe(eventAnchors.name, () => {
  it('finds each event column and median, null when unmodelled', () => {
    const anchors = eventAnchors([
      { site: { id: 's', name: 'S', kind: 'CORE', alongStrikeKm: 1 }, events: [{ medianCalBp: null, eventHorizon: { id: 'e', name: 'E1' }, hpd95: [], density: [] }] },
    ]);
    expect(anchors.get('e')).toEqual({ eventId: 'e', columnId: 's', medianCalBp: null });
  });
});

describe(conflictingTieIds.name, () => {
  it('collects both ties of every conflict', () => {
    expect([...conflictingTieIds([{ tieA: { id: 'a' }, tieB: { id: 'b' } }, { tieA: { id: 'b' }, tieB: { id: 'c' } }])].sort()).toEqual(['a', 'b', 'c']);
  });

  it('collects every tie of a loop of three', () => {
    const loop = { tieA: { id: 'x' }, tieB: { id: 'y' }, ties: [{ id: 'x' }, { id: 'y' }, { id: 'z' }] };
    expect([...conflictingTieIds([loop])].sort()).toEqual(['x', 'y', 'z']);
  });
});
