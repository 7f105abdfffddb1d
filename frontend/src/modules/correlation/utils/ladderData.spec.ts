import { describe, expect, it } from 'vitest';
import { conflictingTieIds, eventAnchors, gridToDensity, loopRegionalEventIds, regionalEventFailures, regionalEventNumbers, tieDifferences } from './ladderData';

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

describe(regionalEventNumbers.name, () => {
  it('numbers youngest first, events without a median last', () => {
    const numbers = regionalEventNumbers([{ id: 'old', combinedMedianCalBp: 2000 }, { id: 'none', combinedMedianCalBp: null }, { id: 'young', combinedMedianCalBp: 300 }]);
    expect([...numbers]).toEqual([['young', 1], ['old', 2], ['none', 3]]);
  });
});

describe(regionalEventFailures.name, () => {
  it('names every failed check and none for a passing event', () => {
    const loops = loopRegionalEventIds([{ regionalEventIds: ['r2', 'r3'] }]);
    expect(regionalEventFailures({ id: 'r1', concordanceLow: false, chiSquare: { passes: true } }, loops)).toEqual([]);
    expect(regionalEventFailures({ id: 'r2', concordanceLow: true, chiSquare: { passes: false } }, loops)).toEqual(['low concordance', 'not one age', 'in an order loop']);
  });
});

describe(tieDifferences.name, () => {
  it('matches ties by their two events in either order', () => {
    const tie = (id: string, a: string, b: string) => ({ id, eventA: { id: a }, eventB: { id: b } });
    const { onlyFirst, onlySecond } = tieDifferences([tie('1', 'x', 'y'), tie('2', 'x', 'z')], [tie('3', 'y', 'x'), tie('4', 'z', 'w')]);
    expect(onlyFirst.map((t) => t.id)).toEqual(['2']);
    expect(onlySecond.map((t) => t.id)).toEqual(['4']);
  });
});
