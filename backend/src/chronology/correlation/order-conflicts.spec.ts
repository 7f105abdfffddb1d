import { describe, expect, it } from 'vitest';
import { normalDensity } from '../common/density';
import { SeededRandom } from '../common/random';
import { MAX_ORDER_CYCLES, orderConflicts, orderGraphCheck } from './order-conflicts';
import { regionalEvents, type SiteEvent, type Tie } from './regional-events';

// Invented sites along strike: Kestrel Marsh (0 km), Harrow Core (80 km), Tansy Trench (210 km).
const SITES: Record<string, { siteName: string; alongStrikeKm: number }> = {
  K: { siteName: 'Kestrel Marsh', alongStrikeKm: 0 },
  H: { siteName: 'Harrow Core', alongStrikeKm: 80 },
  T: { siteName: 'Tansy Trench', alongStrikeKm: 210 },
  W: { siteName: 'Wren Lake', alongStrikeKm: 300 },
  X: { siteName: 'Ochre Bay', alongStrikeKm: 420 },
};

/** Event `K2` is the second event from the base at Kestrel Marsh, and so on. */
function siteEvent(id: string): SiteEvent {
  const siteId = id[0];
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
    expect(conflict.message).toContain('At Kestrel Marsh "K1" is older than "K2", which is tied to "H1" at Harrow Core;');
    expect(conflict.message).toContain('at Harrow Core "H1" is older than "H2", which is tied to "K1" at Kestrel Marsh:');
    expect(conflict.message).toContain('cross, putting "K1" at Kestrel Marsh before itself');
    expect(conflict.message).toContain('The regional events on this loop: "K1" at Kestrel Marsh + "H2" at Harrow Core; "K2" at Kestrel Marsh + "H1" at Harrow Core.');
    expect(conflict.message).not.toMatch(/\bt[AB]\b/);
    expect(conflict.regionalEventIds).toHaveLength(2);
    expect(conflict.eventIds).toEqual(['K1', 'K2', 'H1', 'H2']);
    expect(conflict.steps.map((step) => `${step.siteId}:${step.olderEventId}<${step.youngerEventId}`)).toEqual(['K:K1<K2', 'H:H1<H2']);
  });

  it('names sites, event labels and regional events in the message, never an id', () => {
    // Ids as the database makes them (UUIDs), unlike the labels a correlator reads.
    const uuid = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;
    const events: SiteEvent[] = [
      { ...siteEvent('K1'), id: uuid(1), name: 'KM-E1', siteId: uuid(101) },
      { ...siteEvent('K2'), id: uuid(2), name: 'KM-E2', siteId: uuid(101) },
      { ...siteEvent('H1'), id: uuid(3), name: 'HC-T4', siteId: uuid(102) },
      { ...siteEvent('H2'), id: uuid(4), name: 'HC-T5', siteId: uuid(102) },
      { ...siteEvent('T1'), id: uuid(5), name: 'TT-1', siteId: uuid(103) },
      { ...siteEvent('T2'), id: uuid(6), name: 'TT-2', siteId: uuid(103) },
    ];
    // X = KM-E1 + HC-T4 + TT-2 (a chain through Harrow Core), Y = KM-E2 + TT-1: they cross at Tansy Trench.
    const ties: Tie[] = [
      { id: uuid(201), eventAId: uuid(1), eventBId: uuid(3) },
      { id: uuid(202), eventAId: uuid(3), eventBId: uuid(6) },
      { id: uuid(203), eventAId: uuid(2), eventBId: uuid(5) },
    ];
    const [conflict, ...others] = orderConflicts(events, regionalEvents(events, ties), ties);
    expect(others).toEqual([]);
    expect(conflict.message).not.toMatch(/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/i);
    expect(conflict.message).toContain('"TT-2", which is tied to "KM-E1" at Kestrel Marsh through "HC-T4" at Harrow Core');
    expect(conflict.message).toContain('"KM-E1" at Kestrel Marsh + "HC-T4" at Harrow Core + "TT-2" at Tansy Trench');
    expect(conflict.message).toContain('"KM-E2" at Kestrel Marsh + "TT-1" at Tansy Trench');
    // The ids are in the structured fields.
    expect([...conflict.tieIds].sort()).toEqual([uuid(201), uuid(202), uuid(203)]);
    expect(conflict.siteIds).toEqual([uuid(101), uuid(103)]);
  });

  it('counts the members of a large regional event past the first four', () => {
    const conflicts = check(['K1', 'K2', 'H1', 'H2', 'T1', 'W1'], [
      ['tA', 'K1', 'H2'],
      ['tB', 'K2', 'H1'],
      ['tC', 'H1', 'T1'],
      ['tD', 'T1', 'W1'],
    ]);
    expect(conflicts).toHaveLength(1);
    expect(conflicts[0].message).toContain('"K2" at Kestrel Marsh + "H1" at Harrow Core + "T1" at Tansy Trench + "W1" at Wren Lake.');
    const five = check(['K1', 'K2', 'H1', 'H2', 'T1', 'W1', 'X1'], [
      ['tA', 'K1', 'H2'],
      ['tB', 'K2', 'H1'],
      ['tC', 'H1', 'T1'],
      ['tD', 'T1', 'W1'],
      ['tE', 'W1', 'X1'],
    ]);
    expect(five[0].message).toContain('"K2" at Kestrel Marsh + "H1" at Harrow Core + "T1" at Tansy Trench + "W1" at Wren Lake + 1 more.');
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
    // The chain through Harrow Core, walked from where the loop enters X to where it leaves.
    const chains = [conflict.tieAPathIds, conflict.tieBPathIds].map((path) => path.join(','));
    expect(chains.sort()).toEqual(['t2,t1', 't3']);
    expect(conflict.message).toContain('"T2", which is tied to "K1" at Kestrel Marsh through "H1" at Harrow Core');
    expect(conflict.message).toContain('"K1" at Kestrel Marsh + "H1" at Harrow Core + "T2" at Tansy Trench');
    expect(conflict.message).not.toMatch(/\bt[123]\b/);
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

  it('finds the three-site loop that every pair of sites accepts', () => {
    // X, Y, Z: at Kestrel Marsh X lies above Z, at Harrow Core Y above X, at Tansy Trench Z
    // above Y. Each pair of regional events meets at one site only, so no pair crosses, but
    // Z < X < Y < Z in age is impossible.
    const conflicts = check(['K1', 'K2', 'H1', 'H2', 'T1', 'T2'], [
      ['x', 'K2', 'H1'], // X = K2 (above) + H1 (below)
      ['y', 'H2', 'T1'], // Y = H2 (above) + T1 (below)
      ['z', 'T2', 'K1'], // Z = T2 (above) + K1 (below)
    ]);
    expect(conflicts).toHaveLength(1);
    const [loop] = conflicts;
    expect(loop.regionalEventIds).toHaveLength(3);
    expect(loop.siteIds).toEqual(['K', 'H', 'T']);
    expect([...loop.tieIds].sort()).toEqual(['x', 'y', 'z']);
    expect([...loop.eventIds].sort()).toEqual(['H1', 'H2', 'K1', 'K2', 'T1', 'T2']);
    expect(loop.message).toContain('3 correlations make a loop');
    // Each step goes older -> younger at one site, and the next step leaves from a tied partner.
    for (const step of loop.steps) {
      expect(step.olderEventId[0]).toBe(step.siteId);
      expect(Number(step.olderEventId.slice(1))).toBeLessThan(Number(step.youngerEventId.slice(1)));
    }
  });

  it('finds a four-site loop, and no loop once one of its ties is gone', () => {
    // A ring of four regional events over four sites, each site holding two of them.
    const events = ['K1', 'K2', 'H1', 'H2', 'T1', 'T2', 'W1', 'W2'];
    const ring: [string, string, string][] = [
      ['a', 'K2', 'H1'],
      ['b', 'H2', 'T1'],
      ['c', 'T2', 'W1'],
      ['d', 'W2', 'K1'],
    ];
    const conflicts = check(events, ring);
    expect(conflicts).toHaveLength(1);
    expect(conflicts[0].regionalEventIds).toHaveLength(4);
    expect(conflicts[0].siteIds).toEqual(['K', 'H', 'T', 'W']);
    expect(check(events, ring.slice(0, 3))).toEqual([]);
  });

  it('reports the minimal loops of a loop with a chord, not the loop itself', () => {
    // The three-site loop again, plus Wren Lake where X (W2) lies above Y (W1): Y -> X is then
    // an edge too, a chord of the loop Z -> X -> Y -> Z that closes the shorter loop X <-> Y.
    const events = ['K1', 'K2', 'H1', 'H2', 'T1', 'T2', 'W1', 'W2'];
    const ties: [string, string, string][] = [
      ['x', 'K2', 'H1'],
      ['y', 'H2', 'T1'],
      ['z', 'T2', 'K1'],
      ['x2', 'H1', 'W2'],
      ['y2', 'T1', 'W1'],
    ];
    const conflicts = check(events, ties);
    expect(conflicts).toHaveLength(1);
    expect(conflicts[0].regionalEventIds).toHaveLength(2);
    expect(conflicts[0].siteIds).toEqual(['H', 'W']);
  });

  it('agrees with a brute-force search of every vertex sequence on random hypotheses', () => {
    // Independent check: build the order graph from the raw columns, try every ordering of every
    // subset of regional events as a cycle, keep those whose vertex set carries no other edge
    // (induced), and compare with the search. Random columns of 3-5 events at 3-4 sites, each
    // regional event a random set of at most one event per site.
    const random = new SeededRandom(20261204);
    let loopsSeen = 0;
    let longLoopsSeen = 0;
    for (let trial = 0; trial < 300; trial++) {
      const siteCodes = ['K', 'H', 'T', 'W'].slice(0, 3 + random.integer(2));
      const labels = ['A', 'B', 'C', 'D', 'E'];
      const events: SiteEvent[] = [];
      const labelOf = new Map<string, string>();
      for (const site of siteCodes) {
        const count = 3 + random.integer(3);
        const chosen = [...labels].sort(() => random.uniform() - 0.5).slice(0, count);
        chosen.forEach((label, index) => {
          const event = siteEvent(`${site}${index + 1}`);
          events.push(event);
          labelOf.set(event.id, label);
        });
      }
      const ties: Tie[] = [];
      for (const label of labels) {
        const members = events.filter((event) => labelOf.get(event.id) === label);
        for (let i = 1; i < members.length; i++) ties.push({ id: `${label}${i}`, eventAId: members[i - 1].id, eventBId: members[i].id });
      }
      const found = orderConflicts(events, regionalEvents(events, ties), ties).map((conflict) =>
        conflict.steps.map((step) => labelOf.get(step.olderEventId)).join(''),
      );

      const present = labels.filter((label) => events.filter((event) => labelOf.get(event.id) === label).length >= 2);
      const edge = (u: string, v: string): boolean =>
        events.some((a) => labelOf.get(a.id) === u && events.some((b) => b.siteId === a.siteId && labelOf.get(b.id) === v && a.orderIndexFromBase < b.orderIndexFromBase)) &&
        present.includes(u) && present.includes(v);
      const expected: string[] = [];
      const permutations = (rest: string[], prefix: string[]): void => {
        if (prefix.length >= 2) {
          const closes = prefix.every((u, i) => edge(u, prefix[(i + 1) % prefix.length]));
          const edgeCount = prefix.reduce((sum, u) => sum + prefix.filter((v) => v !== u && edge(u, v)).length, 0);
          if (closes && edgeCount === prefix.length && prefix[0] === [...prefix].sort()[0]) expected.push(prefix.join(''));
        }
        rest.forEach((label, i) => permutations([...rest.slice(0, i), ...rest.slice(i + 1)], [...prefix, label]));
      };
      permutations(present, []);
      // Cycles written from their smallest label (the search starts from its smallest node).
      const canonical = (cycle: string): string => {
        const start = cycle.indexOf([...cycle].sort()[0]);
        return cycle.slice(start) + cycle.slice(0, start);
      };
      expect(found.map(canonical).sort()).toEqual(expected.sort());
      loopsSeen += expected.length;
      longLoopsSeen += expected.filter((cycle) => cycle.length >= 3).length;
    }
    // The trials must exercise the search, loops of three or more included.
    expect(loopsSeen).toBeGreaterThan(50);
    expect(longLoopsSeen).toBeGreaterThan(5);
  });

  it('stops at a stated number of loops and says so', () => {
    // Forty regional events in opposite order at two sites: every pair crosses (780 pairs).
    const events: SiteEvent[] = [];
    const ties: Tie[] = [];
    for (let i = 1; i <= 40; i++) {
      events.push(siteEvent(`K${i}`), siteEvent(`H${41 - i}`));
      ties.push({ id: `t${i}`, eventAId: `K${i}`, eventBId: `H${41 - i}` });
    }
    const result = orderGraphCheck(events, regionalEvents(events, ties), ties);
    expect(result.conflicts).toHaveLength(MAX_ORDER_CYCLES);
    expect(result.truncated).toBe(true);
    expect(result.conflicts.every((conflict) => conflict.regionalEventIds.length === 2)).toBe(true);
  });
});
