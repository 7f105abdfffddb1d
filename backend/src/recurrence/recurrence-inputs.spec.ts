import { describe, expect, it } from 'vitest';
import { normalDensity } from '../chronology/common/density';
import { RecurrenceInputError } from '../chronology/recurrence';
import type { SiteEvent } from '../chronology/correlation';
import { checkForecastStart, segmentRegionalEvents, youngestDrawnAge } from './recurrence-inputs';

function event(id: string, siteId: string, orderIndexFromBase: number, age: number, sd = 25): SiteEvent {
  return { id, name: id, siteId, siteName: siteId, alongStrikeKm: siteId === 'north' ? 0 : siteId === 'mid' ? 50 : 120, orderIndexFromBase, posterior: normalDensity(age, sd) };
}

// Three sites: mid and south lie in the segment; north does not.
const EVENTS = [
  event('m1', 'mid', 1, 1500), event('m2', 'mid', 2, 1000), event('m3', 'mid', 3, 500),
  event('s1', 'south', 1, 1510), event('s2', 'south', 2, 990),
  event('n1', 'north', 1, 700),
];
const SEGMENT = new Set(['mid', 'south']);

describe(segmentRegionalEvents.name, () => {
  it('keeps the regional events recorded in the segment, young to old, each with its combined density', () => {
    const result = segmentRegionalEvents({
      events: EVENTS,
      ties: [{ id: 't1', eventAId: 'm1', eventBId: 's1' }, { id: 't2', eventAId: 'm2', eventBId: 's2' }],
      tectonicSetting: 'SUBDUCTION_INTERFACE',
      segmentSiteIds: SEGMENT,
    });
    expect(result.regionalEvents.map((e) => [...e.memberIds].sort())).toEqual([['m3'], ['m2', 's2'], ['m1', 's1']]);
    // Product of N(1000,25) and N(990,25) is centred on 995 [analytic].
    expect(result.regionalEvents[1].medianCalBp).toBeCloseTo(995, 0);
    expect(result.orderConflictCount).toBe(0);
  });

  it('keeps an event that also ruptured beyond the segment, with all its members', () => {
    const result = segmentRegionalEvents({
      events: [...EVENTS, event('n2', 'north', 2, 505)],
      ties: [{ id: 't3', eventAId: 'm3', eventBId: 'n2' }],
      tectonicSetting: 'SUBDUCTION_INTERFACE',
      segmentSiteIds: SEGMENT,
    });
    const ids = result.regionalEvents.map((e) => [...e.memberIds].sort().join('+'));
    expect(ids).toContain('m3+n2');
    expect(ids).not.toContain('n1');
  });

  it('skips ties to events that have no posterior yet', () => {
    const result = segmentRegionalEvents({
      events: EVENTS,
      ties: [{ id: 't9', eventAId: 'm1', eventBId: 'undated' }],
      tectonicSetting: 'SUBDUCTION_INTERFACE',
      segmentSiteIds: SEGMENT,
    });
    expect(result.skippedTieIds).toEqual(['t9']);
  });

  it('refuses fewer than three events and a regional event whose members share no year', () => {
    expect(() =>
      segmentRegionalEvents({ events: EVENTS.slice(0, 2), ties: [], tectonicSetting: 'CRUSTAL', segmentSiteIds: SEGMENT }),
    ).toThrow(RecurrenceInputError);
    expect(() =>
      segmentRegionalEvents({
        events: EVENTS,
        ties: [{ id: 't1', eventAId: 'm1', eventBId: 's2' }],
        tectonicSetting: 'CRUSTAL',
        segmentSiteIds: SEGMENT,
      }),
    ).toThrow(/share no calendar year/);
  });
});

describe(checkForecastStart.name, () => {
  it('accepts a start after the youngest possible event and refuses one before it', () => {
    // 1950 - 2025 = -75 cal BP [analytic].
    expect(() => checkForecastStart(-70, 2025)).not.toThrow();
    expect(() => checkForecastStart(-80, 2025)).toThrow(RecurrenceInputError);
  });
});

describe(youngestDrawnAge.name, () => {
  it('finds the smallest age', () => {
    expect(youngestDrawnAge([900, 400.5, 1200, 401])).toBe(400.5);
  });
});
