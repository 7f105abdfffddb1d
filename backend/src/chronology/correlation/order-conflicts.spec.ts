import { describe, expect, it } from 'vitest';
import { normalDensity } from '../common/density';
import { orderConflicts } from './order-conflicts';
import { regionalEvents, type SiteEvent, type Tie } from './regional-events';

// Invented sites along strike: Kestrel Marsh (0 km), Harrow Core (80 km), Tansy Trench (210 km).
const SITES = {
  K: { siteName: 'Kestrel Marsh', alongStrikeKm: 0 },
  H: { siteName: 'Harrow Core', alongStrikeKm: 80 },
  T: { siteName: 'Tansy Trench', alongStrikeKm: 210 },
};

/** Event `K2` is the second event from the base at Kestrel Marsh, and so on. */
function siteEvent(id: string): SiteEvent {
  const siteId = id[0] as keyof typeof SITES;
  return {
    id,
    name: id,
    siteId,
    ...SITES[siteId],
    orderIndexFromBase: Number(id.slice(1)),
    posterior: normalDensity(1000, 50),
  };
}

function check(eventIds: string[], ties: [string, string, string][]): ReturnType<typeof orderConflicts> {
  const events = eventIds.map(siteEvent);
  const tieList: Tie[] = ties.map(([id, eventAId, eventBId]) => ({ id, eventAId, eventBId }));
  return orderConflicts(events, regionalEvents(events, tieList), tieList);
}

describe(orderConflicts.name, () => {
  it('finds two ties that cross between two sites and names both', () => {
    // K1 is below K2, but their partners H2 and H1 are the other way up.
    const conflicts = check(['K1', 'K2', 'H1', 'H2'], [
      ['tA', 'K1', 'H2'],
      ['tB', 'K2', 'H1'],
    ]);
    expect(conflicts).toHaveLength(1);
    const [conflict] = conflicts;
    expect([conflict.tieAId, conflict.tieBId].sort()).toEqual(['tA', 'tB']);
    expect(conflict.siteIds).toEqual(['K', 'H']);
    expect(conflict.message).toContain('Kestrel Marsh');
    expect(conflict.message).toContain('Harrow Core');
    expect(conflict.message).toMatch(/"K1" is older than "K2"/);
    expect(conflict.message).toMatch(/"H2" \(tied to "K1" by tie tA\) is younger than "H1"/);
  });

  it('accepts ties that keep the order at both sites', () => {
    expect(
      check(['K1', 'K2', 'H1', 'H2'], [
        ['tA', 'K1', 'H1'],
        ['tB', 'K2', 'H2'],
      ]),
    ).toEqual([]);
  });

  it('accepts ties that skip events (an event missing at one site keeps the order)', () => {
    expect(
      check(['K1', 'K2', 'K3', 'H1', 'H2'], [
        ['tA', 'K1', 'H1'],
        ['tB', 'K3', 'H2'],
      ]),
    ).toEqual([]);
  });

  it('finds a crossing between the two outer sites of three, through a chain of ties', () => {
    // X = K1-H1-T2 (tied through Harrow Core), Y = K2-T1: at Kestrel Marsh X is older, at
    // Tansy Trench X is younger.
    const conflicts = check(['K1', 'K2', 'H1', 'T1', 'T2'], [
      ['t1', 'K1', 'H1'],
      ['t2', 'H1', 'T2'],
      ['t3', 'K2', 'T1'],
    ]);
    expect(conflicts).toHaveLength(1);
    const [conflict] = conflicts;
    expect(conflict.siteIds).toEqual(['K', 'T']);
    const chains = [conflict.tieAPathIds, conflict.tieBPathIds].map((path) => path.join(','));
    expect(chains.sort()).toEqual(['t1,t2', 't3']);
    expect(conflict.message).toContain('ties t1, t2');
  });

  it('accepts three sites in consistent order', () => {
    expect(
      check(['K1', 'K2', 'H1', 'H2', 'T1', 'T2'], [
        ['t1', 'K1', 'H1'],
        ['t2', 'H1', 'T1'],
        ['t3', 'K2', 'H2'],
        ['t4', 'H2', 'T2'],
      ]),
    ).toEqual([]);
  });

  it('finds a crossing that appears only at the third site', () => {
    const conflicts = check(['K1', 'K2', 'H1', 'H2', 'T1', 'T2'], [
      ['t1', 'K1', 'H1'],
      ['t2', 'H1', 'T2'],
      ['t3', 'K2', 'H2'],
      ['t4', 'H2', 'T1'],
    ]);
    expect(conflicts).toHaveLength(1);
    expect(conflicts[0].siteIds).toEqual(['K', 'T']);
  });

  it('reports each crossing pair of regional events once', () => {
    // Three regional events in reverse order at Harrow Core: every pair crosses.
    const conflicts = check(['K1', 'K2', 'K3', 'H1', 'H2', 'H3'], [
      ['t1', 'K1', 'H3'],
      ['t2', 'K2', 'H2'],
      ['t3', 'K3', 'H1'],
    ]);
    expect(conflicts.map((c) => [c.tieAId, c.tieBId].sort().join('+')).sort()).toEqual(['t1+t2', 't1+t3', 't2+t3']);
  });

  it('ignores events seen at one site only', () => {
    expect(check(['K1', 'K2', 'H1'], [['t1', 'K2', 'H1']])).toEqual([]);
  });
});
