import { describe, expect, it } from 'vitest';
import { normalDensity } from '../common/density';
import { SeededRandom } from '../common/random';
import {
  CorrelationInputError,
  regionalEventId,
  regionalEvents,
  validateTie,
  type SiteEvent,
  type Tie,
} from './regional-events';

// Invented sites and events; only ids, sites and order matter to grouping.
function siteEvent(id: string, siteId: string, orderIndexFromBase = 1, alongStrikeKm = 0): SiteEvent {
  return {
    id,
    name: id.toUpperCase(),
    siteId,
    siteName: `Site ${siteId}`,
    alongStrikeKm,
    orderIndexFromBase,
    posterior: normalDensity(1000, 30),
  };
}

function tie(id: string, eventAId: string, eventBId: string): Tie {
  return { id, eventAId, eventBId };
}

function memberSets(groups: { memberIds: readonly string[] }[]): string[][] {
  return groups.map((group) => [...group.memberIds].sort()).sort((p, q) => (p[0] < q[0] ? -1 : 1));
}

describe(regionalEvents.name, () => {
  const events = [
    siteEvent('a1', 'A', 1, 0),
    siteEvent('b1', 'B', 1, 50),
    siteEvent('c1', 'C', 1, 120),
    siteEvent('a2', 'A', 2, 0),
    siteEvent('b2', 'B', 2, 50),
  ];

  it('groups events joined by a chain of ties and keeps untied events on their own', () => {
    const groups = regionalEvents(events, [tie('t1', 'a1', 'b1'), tie('t2', 'c1', 'b1')]);
    expect(memberSets(groups)).toEqual([['a1', 'b1', 'c1'], ['a2'], ['b2']]);
    const regional = groups.find((group) => group.memberIds.includes('a1'));
    expect(regional?.memberIds).toEqual(['a1', 'b1', 'c1']); // along strike
    expect([...(regional?.tieIds ?? [])].sort()).toEqual(['t1', 't2']);
  });

  it('gives the same id for the same members whatever the order of the ties', () => {
    const one = regionalEvents(events, [tie('t1', 'a1', 'b1'), tie('t2', 'b1', 'c1')]);
    const two = regionalEvents([...events].reverse(), [tie('t9', 'c1', 'a1'), tie('t8', 'b1', 'a1')]);
    const idOf = (groups: typeof one): string | undefined => groups.find((g) => g.memberIds.includes('c1'))?.id;
    expect(idOf(one)).toBe(regionalEventId(['c1', 'b1', 'a1']));
    expect(idOf(two)).toBe(idOf(one));
  });

  it('matches a breadth-first search of the tie graph on random ties [brute force]', () => {
    const random = new SeededRandom(20240611);
    for (let trial = 0; trial < 20; trial++) {
      // One site per event, so no tie is refused and the components are the plain graph's.
      const many = Array.from({ length: 40 }, (_, i) => siteEvent(`e${i}`, `s${i}`));
      const ties = Array.from({ length: 25 }, (_, k) => {
        const a = random.integer(40);
        let b = random.integer(40);
        if (b === a) b = (a + 1) % 40;
        return tie(`t${k}`, `e${a}`, `e${b}`);
      });
      const adjacency = new Map<string, string[]>(many.map((event) => [event.id, []]));
      for (const t of ties) {
        adjacency.get(t.eventAId)?.push(t.eventBId);
        adjacency.get(t.eventBId)?.push(t.eventAId);
      }
      const seen = new Set<string>();
      const expected: string[][] = [];
      for (const event of many) {
        if (seen.has(event.id)) continue;
        const component = [event.id];
        seen.add(event.id);
        for (let head = 0; head < component.length; head++) {
          for (const next of adjacency.get(component[head]) ?? []) {
            if (!seen.has(next)) {
              seen.add(next);
              component.push(next);
            }
          }
        }
        expected.push(component.sort());
      }
      expect(memberSets(regionalEvents(many, ties))).toEqual(expected.sort((p, q) => (p[0] < q[0] ? -1 : 1)));
    }
  });

  it('refuses ties that put two events of one site in one group', () => {
    expect(() => regionalEvents(events, [tie('t1', 'a1', 'b1'), tie('t2', 'b1', 'a2')])).toThrow(
      CorrelationInputError,
    );
  });

  it('refuses ties naming unknown events, self-ties and repeated event ids', () => {
    expect(() => regionalEvents(events, [tie('t1', 'a1', 'zz')])).toThrow(/t1 refers to event zz/);
    expect(() => regionalEvents(events, [tie('t1', 'a1', 'a1')])).toThrow(/to itself/);
    expect(() => regionalEvents([...events, siteEvent('a1', 'D')], [])).toThrow(/listed twice/);
  });
});

describe(validateTie.name, () => {
  const events = [
    siteEvent('a1', 'A', 1),
    siteEvent('a2', 'A', 2),
    siteEvent('b1', 'B', 1),
    siteEvent('c1', 'C', 1),
    siteEvent('d1', 'D', 1),
  ];

  it('accepts a tie between events of different sites', () => {
    expect(() => validateTie(events, [tie('t1', 'a1', 'b1')], tie('t2', 'b1', 'c1'))).not.toThrow();
  });

  it('refuses a direct tie between two events of one site, naming both', () => {
    expect(() => validateTie(events, [], tie('t9', 'a1', 'a2'))).toThrow(
      new CorrelationInputError(
        'Tie t9 would tie "A1" and "A2", both at Site A, together: two events of one site cannot be the same earthquake.',
      ),
    );
  });

  it('refuses a tie that joins two events of one site through a chain of ties', () => {
    const existing = [tie('t1', 'a1', 'b1'), tie('t2', 'b1', 'c1'), tie('t3', 'a2', 'd1')];
    let error: unknown;
    try {
      validateTie(events, existing, tie('t4', 'c1', 'd1'));
    } catch (caught) {
      error = caught;
    }
    expect(error).toBeInstanceOf(CorrelationInputError);
    const message = (error as Error).message;
    expect(message).toContain('Tie t4');
    expect(message).toContain('"C1" at Site C');
    expect(message).toContain('"D1" at Site D');
    expect(message).toMatch(/"A1" and "A2", both at Site A/);
  });
});
