import { describe, expect, it } from 'vitest';
import { checkHypothesis } from '../chronology/correlation';
import { normalDensity, type CalendarDensity } from '../chronology/common/density';
import { checkProjectHypothesis, forGrouping, type ProjectEvent } from './correlation-adapter';

// An invented margin: Alder Marsh at 0 km, Brisk Core at 100 km, Corrie Trench at 250 km.
const SITES: Record<string, { siteName: string; alongStrikeKm: number }> = {
  A: { siteName: 'Alder Marsh', alongStrikeKm: 0 },
  B: { siteName: 'Brisk Core', alongStrikeKm: 100 },
  C: { siteName: 'Corrie Trench', alongStrikeKm: 250 },
};

function event(id: string, posterior: CalendarDensity | null): ProjectEvent {
  return { id, name: id, siteId: id[0], ...SITES[id[0]], orderIndexFromBase: Number(id.slice(1)), posterior };
}

describe(checkProjectHypothesis.name, () => {
  const aged = [
    event('A1', normalDensity(1500, 40)),
    event('A2', normalDensity(900, 30)),
    event('B1', normalDensity(1520, 50)),
    event('B2', normalDensity(910, 25)),
  ];
  const ties = [
    { id: 't1', eventAId: 'A1', eventBId: 'B1' },
    { id: 't2', eventAId: 'A2', eventBId: 'B2' },
  ];

  it('gives what checkHypothesis gives when every event has a posterior', () => {
    const adapted = checkProjectHypothesis(aged, ties, 'SUBDUCTION_INTERFACE');
    const direct = checkHypothesis({ events: forGrouping(aged), ties, tectonicSetting: 'SUBDUCTION_INTERFACE' });
    expect(adapted).toEqual(direct);
  });

  it('drops age figures of a group with an unaged member, with a warning naming it, but keeps length and magnitude', () => {
    const events = [...aged, event('C1', null)];
    const result = checkProjectHypothesis(events, [...ties, { id: 't3', eventAId: 'B1', eventBId: 'C1' }], 'SUBDUCTION_INTERFACE');
    const group = result.regionalEvents.find((r) => r.memberIds.includes('C1'));
    expect(group).toBeDefined();
    expect(group?.memberIds).toEqual(['A1', 'B1', 'C1']);
    expect(group?.combined).toBeNull();
    expect(group?.combinedDensity).toBeNull();
    expect(group?.concordance).toBeNull();
    expect(group?.chiSquare).toBeNull();
    expect(group?.notes).toHaveLength(1);
    expect(group?.notes[0]).toContain('"C1" at Corrie Trench');
    // Span 0-250 km; Mw = 4.868 + 1.392 log10(250), Strasser et al. 2010 interface length
    // relation (coefficients [memory], CHECKS.md).
    expect(group?.ruptureLengthKm).toBe(250);
    expect(group?.magnitude?.mw).toBeCloseTo(4.868 + 1.392 * Math.log10(250), 12);
    // The group without an age goes after the aged ones (young to old: A2|B2 first).
    expect(result.regionalEvents.map((r) => r.id)).toEqual(['A2|B2', 'A1|B1|C1']);
  });

  it('keeps the one-site note for an unaged event of one site and puts it last', () => {
    const result = checkProjectHypothesis([...aged, event('C1', null)], ties, 'CRUSTAL');
    const last = result.regionalEvents[result.regionalEvents.length - 1];
    expect(last.memberIds).toEqual(['C1']);
    expect(last.notes).toEqual([expect.stringContaining('no age model posterior'), 'Recorded at one site only: no rupture length or magnitude.']);
  });

  it('still finds crossing ties when an event has no age', () => {
    const events = [event('A1', normalDensity(1500, 40)), event('A2', null), event('B1', normalDensity(900, 30)), event('B2', normalDensity(1500, 40))];
    // A1 (lower) with B2 (upper) and A2 (upper) with B1 (lower): the ties cross.
    const crossing = [
      { id: 'x', eventAId: 'A1', eventBId: 'B2' },
      { id: 'y', eventAId: 'A2', eventBId: 'B1' },
    ];
    const result = checkProjectHypothesis(events, crossing, 'CRUSTAL');
    expect(result.orderConflicts).toHaveLength(1);
    expect([result.orderConflicts[0].tieAId, result.orderConflicts[0].tieBId].sort()).toEqual(['x', 'y']);
  });
});

