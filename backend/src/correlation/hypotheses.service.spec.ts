import { beforeEach, describe, expect, it } from 'vitest';
import { FakeAudit, fakeDatabase, FakeMemberships, FakeTable, refusalOf, userNamed } from '../common/testing/service-fakes';
import type { ProjectsRepository } from '../projects/projects.repository';
import type { CorrelationDataService } from './correlation-data.service';
import type { HypothesesRepository, HypothesisRow, ProjectEventRow, TieRow } from './hypotheses.repository';
import { HypothesesService } from './hypotheses.service';

const P = 'project-p';
const Q = 'project-q';

/** Events by id: site, project and position of the unit below (1 = base). */
const EVENTS: Record<string, { site: string; project: string; position: number }> = {
  a1: { site: 'Alder', project: P, position: 1 },
  a2: { site: 'Alder', project: P, position: 2 },
  b1: { site: 'Birch', project: P, position: 1 },
  b2: { site: 'Birch', project: P, position: 2 },
  c1: { site: 'Cedar', project: P, position: 1 },
  q1: { site: 'Quince', project: Q, position: 1 },
};

function projectEvents(projectId: string): ProjectEventRow[] {
  return Object.entries(EVENTS)
    .filter(([, event]) => event.project === projectId)
    .map(([id, event], i) => ({
      eventHorizon: { id, name: id.toUpperCase(), siteId: event.site } as ProjectEventRow['eventHorizon'],
      unitBelowPosition: event.position,
      site: { id: event.site, name: `${event.site} Marsh`, alongStrikeKm: 10 * i },
    }));
}

let hypotheses: FakeTable<HypothesisRow>;
let ties: FakeTable<TieRow>;
let audit: FakeAudit;
let service: HypothesesService;
const correlator = userNamed('cora');
const viewer = userNamed('vic');
const outsider = userNamed('otto');
let nextId = 0;

function repository(): HypothesesRepository {
  const tiesOf = (hypothesisId: string) => ties.all().filter((tie) => tie.hypothesisId === hypothesisId);
  return {
    findById: async (id: string) => hypotheses.rows.get(id),
    lock: async (id: string) => hypotheses.rows.get(id),
    listProjectEvents: async (projectId: string) => projectEvents(projectId),
    findTieBetween: async (hypothesisId: string, a: string, b: string) =>
      tiesOf(hypothesisId).find((tie) => (tie.eventAId === a && tie.eventBId === b) || (tie.eventAId === b && tie.eventBId === a)),
    listTies: async (hypothesisId: string) => tiesOf(hypothesisId),
    insertTie: async (values: Omit<TieRow, 'id'>) => {
      const row = { ...values, id: `tie-${++nextId}` } as TieRow;
      ties.rows.set(row.id, row);
      return row;
    },
    bumpVersion: async (id: string) => {
      const row = hypotheses.rows.get(id)!;
      hypotheses.rows.set(id, { ...row, version: row.version + 1 });
      return hypotheses.rows.get(id)!;
    },
    insert: async (values: Partial<HypothesisRow>) => {
      const row = { version: 1, preferred: false, ...values, id: `hyp-${++nextId}` } as HypothesisRow;
      hypotheses.rows.set(row.id, row);
      return row;
    },
    copyTies: async (fromId: string, toId: string) =>
      tiesOf(fromId).map((tie) => {
        const row = { ...tie, id: `tie-${++nextId}`, hypothesisId: toId };
        ties.rows.set(row.id, row);
        return row;
      }),
  } as unknown as HypothesesRepository;
}

beforeEach(() => {
  hypotheses = new FakeTable([
    { id: 'h-p', projectId: P, name: 'North', version: 1, preferred: false } as HypothesisRow,
    { id: 'h-q', projectId: Q, name: 'Elsewhere', version: 1, preferred: false } as HypothesisRow,
  ]);
  ties = new FakeTable<TieRow>();
  audit = new FakeAudit();
  const access = new FakeMemberships();
  access.set(correlator.id, P, 'CORRELATOR');
  access.set(viewer.id, P, 'VIEWER');
  access.set(outsider.id, Q, 'ADMIN');
  service = new HypothesesService(
    fakeDatabase([hypotheses, ties]),
    repository(),
    {} as ProjectsRepository,
    {} as CorrelationDataService,
    access.accessService(),
    audit.service(),
  );
});

const tie = (eventAId: string, eventBId: string) => ({ hypothesisId: 'h-p', eventAId, eventBId, confidence: 2 });

describe(`${HypothesesService.name}.addTie`, () => {
  it('stores the tie, moves the hypothesis to a new version and audits it', async () => {
    const added = await service.addTie(correlator, tie('a1', 'b1'));
    expect(ties.all()).toEqual([expect.objectContaining({ id: added.id, hypothesisId: 'h-p', eventAId: 'a1', eventBId: 'b1', confidence: 2, evidence: [] })]);
    expect(added.eventA.id).toBe('a1');
    expect(added.eventB.id).toBe('b1');
    expect(hypotheses.rows.get('h-p')!.version).toBe(2);
    expect(audit.entries).toEqual([expect.objectContaining({ actor: correlator, projectId: P, action: 'create', objectType: 'tie', objectId: added.id })]);
  });

  it.each([
    ['an event tied to itself', 'a1', 'a1', /itself/],
    ['an event of another project', 'a1', 'q1', /no such event horizon/],
    ['two events of one site', 'a1', 'a2', /both at Alder Marsh/],
  ])('refuses %s on eventBId and writes nothing', async (_what, a, b, message) => {
    const refused = await refusalOf(() => service.addTie(correlator, tie(a, b)));
    expect(refused).toMatchObject({ code: 'BAD_USER_INPUT', field: 'eventBId' });
    expect(refused.message).toMatch(message);
    expect(ties.all()).toEqual([]);
    expect(hypotheses.rows.get('h-p')!.version).toBe(1);
    expect(audit.entries).toEqual([]);
  });

  it('refuses a pair already tied, either way round', async () => {
    await service.addTie(correlator, tie('a1', 'b1'));
    expect(await refusalOf(() => service.addTie(correlator, tie('b1', 'a1')))).toMatchObject({ code: 'BAD_USER_INPUT', field: 'eventBId' });
    expect(ties.all()).toHaveLength(1);
  });

  it('refuses a tie that would join two events of one site through other ties', async () => {
    await service.addTie(correlator, tie('a1', 'b1'));
    // b1 = a1 already; b1 = a2 would make a1 and a2 (both at Alder) one earthquake.
    expect(await refusalOf(() => service.addTie(correlator, tie('b1', 'a2')))).toMatchObject({ code: 'BAD_USER_INPUT', field: 'eventBId' });
    expect(ties.all()).toHaveLength(1);
    expect(hypotheses.rows.get('h-p')!.version).toBe(2);
  });

  it('refuses a viewer (FORBIDDEN) and a member of another project (NOT_FOUND)', async () => {
    expect((await refusalOf(() => service.addTie(viewer, tie('a1', 'b1')))).code).toBe('FORBIDDEN');
    expect((await refusalOf(() => service.addTie(outsider, tie('a1', 'b1')))).code).toBe('NOT_FOUND');
    expect(ties.all()).toEqual([]);
  });
});

describe(`${HypothesesService.name}.create`, () => {
  it('copies the ties of a hypothesis of the same project and audits each', async () => {
    await service.addTie(correlator, tie('a1', 'b1'));
    const copy = await service.create(correlator, { projectId: P, name: 'Copy', copyFromId: 'h-p' });
    expect(ties.all().filter((row) => row.hypothesisId === copy.id).map((row) => [row.eventAId, row.eventBId])).toEqual([['a1', 'b1']]);
    expect(audit.entries.filter((entry) => entry.objectType === 'tie').map((entry) => entry.action)).toEqual(['create', 'create']);
    expect(copy.authorId).toBe(correlator.id);
  });

  it("refuses to copy another project's hypothesis, naming copyFromId", async () => {
    expect(await refusalOf(() => service.create(correlator, { projectId: P, name: 'Copy', copyFromId: 'h-q' }))).toMatchObject({ code: 'BAD_USER_INPUT', field: 'copyFromId' });
    expect(hypotheses.all()).toHaveLength(2);
  });
});
