import { describe, expect, it } from 'vitest';
import { normalDensity, type CalendarDensity } from '../common/density';
import { checkHypothesis, compareHypotheses } from './hypothesis';
import { CorrelationInputError, type SiteEvent, type Tie } from './regional-events';

// An invented margin: Kestrel Marsh at 0 km, Harrow Core at 80 km, Tansy Trench at 210 km and
// Wren Lake beside Tansy Trench (also at 210 km).
const SITES: Record<string, { siteName: string; alongStrikeKm: number }> = {
  K: { siteName: 'Kestrel Marsh', alongStrikeKm: 0 },
  H: { siteName: 'Harrow Core', alongStrikeKm: 80 },
  T: { siteName: 'Tansy Trench', alongStrikeKm: 210 },
  W: { siteName: 'Wren Lake', alongStrikeKm: 210 },
};

function siteEvent(id: string, posterior: CalendarDensity): SiteEvent {
  return { id, name: id, siteId: id[0], ...SITES[id[0]], orderIndexFromBase: Number(id.slice(1)), posterior };
}

function tie(id: string, eventAId: string, eventBId: string): Tie {
  return { id, eventAId, eventBId };
}

// Two earthquakes about 1000 and 1600 cal BP, and a young event seen only at Tansy Trench.
const events = [
  siteEvent('K1', normalDensity(1600, 40)),
  siteEvent('K2', normalDensity(1000, 30)),
  siteEvent('H1', normalDensity(1620, 50)),
  siteEvent('H2', normalDensity(1010, 25)),
  siteEvent('T1', normalDensity(1590, 60)),
  siteEvent('T2', normalDensity(990, 40)),
  siteEvent('T3', normalDensity(400, 30)),
];
const ties = [tie('a', 'K1', 'H1'), tie('b', 'H1', 'T1'), tie('c', 'K2', 'H2'), tie('d', 'H2', 'T2')];

describe(checkHypothesis.name, () => {
  const result = checkHypothesis({ events, ties, tectonicSetting: 'SUBDUCTION_INTERFACE' });

  it('lists regional events young to old with stable ids', () => {
    expect(result.regionalEvents.map((event) => event.memberIds)).toEqual([['T3'], ['K2', 'H2', 'T2'], ['K1', 'H1', 'T1']]);
    expect(result.regionalEvents[1].id).toBe('H2|K2|T2');
    expect(result.orderConflicts).toEqual([]);
  });

  it('combines the ages of the members and tests them', () => {
    const young = result.regionalEvents[1];
    expect(young.agesOverlap).toBe(true);
    // Precision-weighted mean of 1000 +- 30, 1010 +- 25 and 990 +- 40 [analytic]:
    // weights 1/900, 1/625, 1/1600.
    const w = [1 / 900, 1 / 625, 1 / 1600];
    const mean = (1000 * w[0] + 1010 * w[1] + 990 * w[2]) / (w[0] + w[1] + w[2]);
    expect(young.combined?.meanCalBp).toBeCloseTo(mean, 2);
    expect(young.combined?.sdYears).toBeCloseTo(1 / Math.sqrt(w[0] + w[1] + w[2]), 2);
    expect(young.combined?.hpd95.length).toBe(1);
    expect(young.combinedDensity).not.toBeNull();
    expect(young.concordance).toBeGreaterThan(0.05);
    expect(young.concordanceWarning).toBe(false);
    expect(young.chiSquare).toMatchObject({ df: 2, passes: true });
    expect(young.chiSquare?.critical5).toBeCloseTo(5.991, 3);
  });

  it('gives a rupture length and an interface magnitude from the span of the sites', () => {
    const young = result.regionalEvents[1];
    expect(young.ruptureLengthKm).toBe(210);
    expect(young.magnitude?.relation).toBe('Strasser et al. (2010) interface, Mw from the minimum rupture length (site span)');
    expect(young.magnitude?.mw).toBeCloseTo(4.868 + 1.392 * Math.log10(210), 10);
    expect(young.magnitude?.sigma).toBe(0.277);
  });

  it('says so for an event at one site: no length, no test, no concordance', () => {
    const single = result.regionalEvents[0];
    expect(single).toMatchObject({ concordance: null, chiSquare: null, ruptureLengthKm: null, magnitude: null });
    expect(single.combined?.medianCalBp).toBeCloseTo(400, 0);
    expect(single.notes).toContain('Recorded at one site only: no rupture length or magnitude.');
  });

  it('uses Wells & Coppersmith for crustal faults, or the relation asked for', () => {
    const crustal = checkHypothesis({ events, ties, tectonicSetting: 'CRUSTAL' });
    expect(crustal.regionalEvents[1].magnitude?.mw).toBeCloseTo(5.08 + 1.16 * Math.log10(210), 10);
    const reverse = checkHypothesis({
      events,
      ties,
      tectonicSetting: 'CRUSTAL',
      scalingRelation: 'WELLS_COPPERSMITH_1994_REVERSE_SRL',
    });
    expect(reverse.regionalEvents[1].magnitude?.mw).toBeCloseTo(5.0 + 1.22 * Math.log10(210), 10);
  });

  it('flags members whose ages do not overlap, giving no combined age', () => {
    const apart = [siteEvent('K1', normalDensity(1000, 20)), siteEvent('H1', normalDensity(1400, 20))];
    const [event] = checkHypothesis({ events: apart, ties: [tie('x', 'K1', 'H1')], tectonicSetting: 'CRUSTAL' })
      .regionalEvents;
    expect(event).toMatchObject({ agesOverlap: false, combined: null, combinedDensity: null, concordance: 0 });
    expect(event.concordanceWarning).toBe(true);
    expect(event.chiSquare?.passes).toBe(false);
    expect(event.notes.some((note) => note.includes('share no year'))).toBe(true);
  });

  it('gives no rupture length when the sites are at one along-strike position', () => {
    const sideBySide = [siteEvent('T1', normalDensity(1000, 30)), siteEvent('W1', normalDensity(1010, 30))];
    const [event] = checkHypothesis({
      events: sideBySide,
      ties: [tie('x', 'T1', 'W1')],
      tectonicSetting: 'SUBDUCTION_INTERFACE',
    }).regionalEvents;
    expect(event.ruptureLengthKm).toBeNull();
    expect(event.magnitude).toBeNull();
    expect(event.notes).toContain('All member sites are at one along-strike position: no rupture length or magnitude.');
  });

  it('reports crossing ties', () => {
    const crossed = [tie('a', 'K1', 'H2'), tie('c', 'K2', 'H1')];
    const check = checkHypothesis({ events, ties: crossed, tectonicSetting: 'SUBDUCTION_INTERFACE' });
    expect(check.orderConflicts).toHaveLength(1);
    expect([check.orderConflicts[0].tieAId, check.orderConflicts[0].tieBId].sort()).toEqual(['a', 'c']);
  });

  it('refuses a hypothesis that joins two events of one site, and an empty density', () => {
    expect(() =>
      checkHypothesis({ events, ties: [...ties, tie('e', 'T1', 'K2')], tectonicSetting: 'CRUSTAL' }),
    ).toThrow(CorrelationInputError);
    const empty = siteEvent('K1', { startCalBp: 0, probabilities: new Float64Array(4) });
    expect(() => checkHypothesis({ events: [empty], ties: [], tectonicSetting: 'CRUSTAL' })).toThrow(
      /"K1" at Kestrel Marsh has no mass/,
    );
  });
});

describe(compareHypotheses.name, () => {
  it('pairs regional events with the same members and lists the rest on each side', () => {
    const a = checkHypothesis({ events, ties, tectonicSetting: 'SUBDUCTION_INTERFACE' });
    // Hypothesis B: Tansy Trench's T2 is a separate, local event.
    const b = checkHypothesis({
      events,
      ties: [tie('a2', 'H1', 'K1'), tie('b2', 'T1', 'H1'), tie('c2', 'H2', 'K2')],
      tectonicSetting: 'SUBDUCTION_INTERFACE',
    });
    const comparison = compareHypotheses(a, b);
    expect(comparison.inBoth.map(({ a: left }) => left.id).sort()).toEqual(['H1|K1|T1', 'T3']);
    expect(comparison.onlyInA.map((event) => event.id)).toEqual(['H2|K2|T2']);
    expect(comparison.onlyInB.map((event) => event.id).sort()).toEqual(['H2|K2', 'T2']);
  });

  it('matches by member set whatever the order of the member ids', () => {
    const comparison = compareHypotheses(
      { regionalEvents: [{ memberIds: ['x', 'y'] }] },
      { regionalEvents: [{ memberIds: ['y', 'x'] }] },
    );
    expect(comparison.inBoth).toHaveLength(1);
    expect(comparison.onlyInA).toEqual([]);
    expect(comparison.onlyInB).toEqual([]);
  });
});
