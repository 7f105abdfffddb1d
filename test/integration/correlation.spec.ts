import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { storeDensity, type StoredAgeModelResults } from '../../backend/src/age-models/age-model-results';
import { normalDensity, summarise } from '../../backend/src/chronology/common/density';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, createUser, FixtureRole, PASSWORD, ProjectFixture, sql } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

/** An id as the database makes them: never part of a message meant for people. */
const UUID = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/i;
const CREATE_SITE = `mutation($i: CreateSiteInput!) { createSite(input: $i) { id } }`;
const CREATE_UNIT = `mutation($i: CreateUnitInput!) { createUnit(input: $i) { id } }`;
const CREATE_HORIZON = `mutation($i: CreateEventHorizonInput!) { createEventHorizon(input: $i) { id } }`;
const CREATE_HYPOTHESIS = `mutation($i: CreateHypothesisInput!) { createHypothesis(input: $i) { id name version author { email } copiedFrom { id } } }`;
const ADD_TIE = `mutation($i: AddTieInput!) { addTie(input: $i) { id confidence evidence eventA { id } eventB { id site { id } } } }`;
const REMOVE_TIE = `mutation($id: ID!) { removeTie(id: $id) }`;
const SET_PREFERRED = `mutation($id: ID!) { setPreferredHypothesis(id: $id) { id preferred } }`;
const HYPOTHESIS = `query($id: ID!) { hypothesis(id: $id) { id name preferred version
  ties { id eventA { id } eventB { id } }
  regionalEvents { id members { id site { id } } combinedMedianCalBp
    combinedHpd95 { olderCalBp youngerCalBp probability } combinedDensity { calBp probability } concordance warnings
    chiSquare { t df critical5 passes } ruptureLengthKm magnitude { mw sigma relation } }
  orderConflicts { tieA { id } tieB { id } message } } }`;
const LADDER = `query($p: ID!) { eventLadder(projectId: $p) { project { id } columns { site { id name alongStrikeKm }
  latestAgeModelRun { id status } events { eventHorizon { id name } medianCalBp hpd95 { olderCalBp youngerCalBp } densityGrid { startCalBp stepYears values } density { calBp probability } } } } }`;

let server: TestServer;
let fixture: ProjectFixture;
const clients = {} as Record<FixtureRole | 'OUTSIDER', GraphqlClient>;

/** Invented sites along an invented margin; each has two events, E1 (older, lower) and E2. */
const SITES = [
  { key: 'A', name: 'Gorse Marsh', alongStrikeKm: 20, ages: [1600, 1000] },
  { key: 'B', name: 'Heron Core', alongStrikeKm: 140, ages: [1620, 1010] },
  { key: 'C', name: 'Ivel Trench', alongStrikeKm: 320, ages: [1590, 990] },
] as const;
const siteIds: Record<string, string> = {};
/** `A1` is E1 at site A, and so on. */
const events: Record<string, string> = {};
const runIds: Record<string, string> = {};

/** A SUCCEEDED run written in the stored results format, as a finished age model job leaves it. */
async function writeSucceededRun(siteId: string, posteriors: { eventHorizonId: string; mean: number; sd: number }[]): Promise<string> {
  const results: StoredAgeModelResults = {
    events: posteriors.map(({ eventHorizonId, mean, sd }) => {
      const density = normalDensity(mean, sd);
      return { eventHorizonId, summary: summarise(density), rhat: 1.001, ess: 2000, density: storeDensity(density) };
    }),
    samples: [],
    eventDraws: { eventHorizonIds: posteriors.map((p) => p.eventHorizonId).reverse(), drawCount: 0, draws: [] },
  };
  const [row] = await sql<{ id: string }>(
    `insert into age_model_runs (site_id, status, progress, seed, settings, input_snapshot, input_fingerprint, results, finished_at)
     values ($1, 'SUCCEEDED', 1, 7, '{}'::jsonb, '{}'::jsonb, 'fixture', $2::jsonb, now()) returning id`,
    [siteId, JSON.stringify(results)],
  );
  return row.id;
}

beforeAll(async () => {
  server = await startTestServer();
  fixture = await createProjectFixture('Correlation');
  const anonymous = new GraphqlClient(server.url);
  for (const role of Object.keys(fixture.emails) as FixtureRole[]) clients[role] = await anonymous.signIn(fixture.emails[role], PASSWORD);
  clients.OUTSIDER = await anonymous.signIn(fixture.outsiderEmail, PASSWORD);

  for (const site of SITES) {
    const { createSite } = await clients.RESEARCHER.ok(CREATE_SITE, {
      i: { projectId: fixture.projectId, name: site.name, kind: 'MARSH', latitude: -40, longitude: 175, alongStrikeKm: site.alongStrikeKm },
    });
    siteIds[site.key] = createSite.id;
    const units: string[] = [];
    for (const [position, top, base] of [[1, 2, 3], [2, 1, 2], [3, 0, 1]]) {
      const { createUnit } = await clients.RESEARCHER.ok(CREATE_UNIT, {
        i: { siteId: createSite.id, position, name: `U${position}`, topDepthM: top, baseDepthM: base, facies: 'PEAT' },
      });
      units.push(createUnit.id);
    }
    for (const index of [1, 2]) {
      const { createEventHorizon } = await clients.RESEARCHER.ok(CREATE_HORIZON, {
        i: { siteId: createSite.id, name: `E${index}`, unitBelowId: units[index - 1], unitAboveId: units[index], quality: 1 },
      });
      events[`${site.key}${index}`] = createEventHorizon.id;
    }
    runIds[site.key] = await writeSucceededRun(createSite.id, [
      { eventHorizonId: events[`${site.key}1`], mean: site.ages[0], sd: 40 },
      { eventHorizonId: events[`${site.key}2`], mean: site.ages[1], sd: 30 },
    ]);
  }
});

afterAll(async () => {
  await server?.close();
});

async function createHypothesis(client: GraphqlClient, name: string, copyFromId?: string) {
  const { createHypothesis: created } = await client.ok(CREATE_HYPOTHESIS, { i: { projectId: fixture.projectId, name, copyFromId } });
  return created as { id: string; version: number; author: { email: string } | null; copiedFrom: { id: string } | null };
}

function tieInput(hypothesisId: string, a: string, b: string) {
  return { i: { hypothesisId, eventAId: events[a], eventBId: events[b], confidence: 2, evidence: ['age overlap'] } };
}

describe('hypotheses and regional events', () => {
  let hypothesisId: string;

  it('ties events into regional events with combined age, concordance, chi-square, length and magnitude', async () => {
    const created = await createHypothesis(clients.CORRELATOR, 'Three-site E2');
    hypothesisId = created.id;
    expect(created.author?.email).toBe(fixture.emails.CORRELATOR);
    expect(created.version).toBe(1);
    const { addTie } = await clients.CORRELATOR.ok(ADD_TIE, tieInput(hypothesisId, 'A2', 'B2'));
    expect(addTie).toMatchObject({ confidence: 2, evidence: ['age overlap'], eventA: { id: events.A2 }, eventB: { id: events.B2, site: { id: siteIds.B } } });
    const { addTie: second } = await clients.CORRELATOR.ok(ADD_TIE, tieInput(hypothesisId, 'B2', 'C2'));

    const { hypothesis } = await clients.VIEWER.ok(HYPOTHESIS, { id: hypothesisId });
    expect(hypothesis.version).toBe(3);
    // Read back: both ties are stored with the events they join, as another member sees them.
    const stored = hypothesis.ties.map((t: { id: string; eventA: { id: string }; eventB: { id: string } }) => [t.id, t.eventA.id, t.eventB.id]);
    expect(stored.sort()).toEqual([[addTie.id, events.A2, events.B2], [second.id, events.B2, events.C2]].sort());
    const rows = await sql<{ confidence: number; evidence: string[] }>(`select confidence, evidence from ties where id = $1`, [addTie.id]);
    expect(rows).toEqual([{ confidence: 2, evidence: ['age overlap'] }]);
    expect(hypothesis.regionalEvents).toHaveLength(4);
    const joined = hypothesis.regionalEvents.find((r: { members: unknown[] }) => r.members.length === 3);
    expect(joined.members.map((m: { id: string }) => m.id)).toEqual([events.A2, events.B2, events.C2]);
    // The product of N(1000,30), N(1010,30), N(990,30) is centred on their mean, 1000 [analytic].
    expect(joined.combinedMedianCalBp).toBeGreaterThan(995);
    expect(joined.combinedMedianCalBp).toBeLessThan(1005);
    expect(joined.combinedHpd95.length).toBeGreaterThan(0);
    expect(joined.combinedDensity.length).toBeGreaterThan(0);
    expect(joined.combinedDensity.length).toBeLessThanOrEqual(400);
    // Equal Gaussian spreads: concordance = exp(-T/2) with T = sum (m_i - m)^2 / s^2 = 200/900
    // (combined-age.ts, [analytic]); the stored densities are rounded, hence 2 decimals.
    expect(joined.concordance).toBeCloseTo(Math.exp(-(200 / 900) / 2), 2);
    expect(joined.chiSquare).toMatchObject({ df: 2, passes: true });
    expect(joined.chiSquare.t).toBeCloseTo(200 / 900, 2);
    // 5 % point of chi-square with 2 df: 5.991 (statistics handbook table, CHECKS.md).
    expect(joined.chiSquare.critical5).toBeCloseTo(5.991, 3);
    expect(joined.ruptureLengthKm).toBe(300);
    // Strasser, Arango & Bommer 2010 interface length relation, Mw = 4.868 + 1.392 log10 L,
    // sigma 0.277 (CHECKS.md, coefficients [memory]); the fixture project is SUBDUCTION_INTERFACE.
    expect(joined.magnitude.mw).toBeCloseTo(4.868 + 1.392 * Math.log10(300), 10);
    expect(joined.magnitude.sigma).toBe(0.277);
    expect(joined.magnitude.relation).toContain('Strasser');
    const single = hypothesis.regionalEvents.find((r: { members: { id: string }[] }) => r.members[0].id === events.A1);
    expect(single).toMatchObject({ concordance: null, chiSquare: null, ruptureLengthKm: null, magnitude: null });
    expect(single.warnings).toEqual([expect.stringContaining('one site')]);
    // Young to old by combined median.
    expect(hypothesis.regionalEvents[0].id).toBe(joined.id);
    expect(hypothesis.orderConflicts).toEqual([]);
  });

  it('copies every tie with copyFromId and records where the copy came from', async () => {
    const copy = await createHypothesis(clients.ADMIN, 'Copy of three-site E2', hypothesisId);
    expect(copy.copiedFrom).toEqual({ id: hypothesisId });
    const { hypothesis } = await clients.VIEWER.ok(HYPOTHESIS, { id: copy.id });
    const pairs = hypothesis.ties.map((t: { eventA: { id: string }; eventB: { id: string } }) => `${t.eventA.id}>${t.eventB.id}`);
    expect(pairs.sort()).toEqual([`${events.A2}>${events.B2}`, `${events.B2}>${events.C2}`].sort());
    const original = await clients.VIEWER.ok(HYPOTHESIS, { id: hypothesisId });
    expect(hypothesis.ties.map((t: { id: string }) => t.id)).not.toEqual(original.hypothesis.ties.map((t: { id: string }) => t.id));
  });

  it('refuses a tie between two events of one site, naming them', async () => {
    const error = await clients.CORRELATOR.errorOf(ADD_TIE, tieInput(hypothesisId, 'A1', 'A2'));
    expect(error.code).toBe('BAD_USER_INPUT');
    expect(error.message).toContain('"E1"');
    expect(error.message).toContain('"E2"');
    expect(error.message).toContain('Gorse Marsh');
  });

  it('refuses a tie that joins two events of one site through a chain, saying which', async () => {
    // B2 is already joined to A2 (and C2); tying A1 to C2 would put A1 and A2 together.
    const error = await clients.CORRELATOR.errorOf(ADD_TIE, tieInput(hypothesisId, 'A1', 'C2'));
    expect(error.code).toBe('BAD_USER_INPUT');
    expect(error.message).toContain('"E1" and "E2", both at Gorse Marsh');
    expect(error.message).toContain('through their other ties');
    const [{ count }] = await sql<{ count: string }>(`select count(*) from ties where hypothesis_id = $1`, [hypothesisId]);
    expect(Number(count)).toBe(2);
  });

  it('refuses a pair tied twice and an event of no project of the hypothesis', async () => {
    expect((await clients.CORRELATOR.errorOf(ADD_TIE, tieInput(hypothesisId, 'B2', 'A2'))).code).toBe('BAD_USER_INPUT');
    const foreign = { i: { hypothesisId, eventAId: events.A1, eventBId: '00000000-0000-4000-8000-000000000000', confidence: 1 } };
    expect(await clients.CORRELATOR.errorOf(ADD_TIE, foreign)).toMatchObject({ code: 'BAD_USER_INPUT', field: 'eventBId' });
  });

  it('reports crossing ties as an order conflict', async () => {
    const crossed = await createHypothesis(clients.CORRELATOR, 'Crossed');
    const { addTie: first } = await clients.CORRELATOR.ok(ADD_TIE, tieInput(crossed.id, 'A1', 'B2'));
    const { addTie: second } = await clients.CORRELATOR.ok(ADD_TIE, tieInput(crossed.id, 'A2', 'B1'));
    const { hypothesis } = await clients.VIEWER.ok(HYPOTHESIS, { id: crossed.id });
    expect(hypothesis.orderConflicts).toHaveLength(1);
    const conflict = hypothesis.orderConflicts[0];
    expect([conflict.tieA.id, conflict.tieB.id].sort()).toEqual([first.id, second.id].sort());
    expect(conflict.message).toContain('cross');
    expect(conflict.message).not.toMatch(UUID);
  });

  it('reports a loop through three sites that no pair of sites shows, with its sites, events and ties', async () => {
    // X = A2 + B1, Y = B2 + C1, Z = C2 + A1: at Gorse Marsh Z is below X, at Heron Core X below
    // Y, at Ivel Trench Y below Z. Each pair meets at one site only, yet Z < X < Y < Z in age.
    const loop = await createHypothesis(clients.CORRELATOR, 'Three-site loop');
    const tieIds: string[] = [];
    for (const [a, b] of [['A2', 'B1'], ['B2', 'C1'], ['C2', 'A1']]) {
      const { addTie } = await clients.CORRELATOR.ok(ADD_TIE, tieInput(loop.id, a, b));
      tieIds.push(addTie.id);
    }
    const { hypothesis } = await clients.VIEWER.ok(
      `query($id: ID!) { hypothesis(id: $id) { orderConflicts { message ties { id } events { id } sites { id name }
        steps { site { id } older { id } younger { id } } regionalEventIds } } }`,
      { id: loop.id },
    );
    expect(hypothesis.orderConflicts).toHaveLength(1);
    const [conflict] = hypothesis.orderConflicts;
    expect(conflict.ties.map((t: { id: string }) => t.id).sort()).toEqual([...tieIds].sort());
    expect(conflict.sites.map((site: { id: string }) => site.id)).toEqual([siteIds.A, siteIds.B, siteIds.C]);
    expect(conflict.events.map((e: { id: string }) => e.id).sort()).toEqual(Object.values(events).sort());
    expect(conflict.regionalEventIds).toHaveLength(3);
    expect(conflict.steps).toHaveLength(3);
    for (const step of conflict.steps) {
      const site = Object.keys(siteIds).find((key) => siteIds[key] === step.site.id) as string;
      expect(step.older.id).toBe(events[`${site}1`]);
      expect(step.younger.id).toBe(events[`${site}2`]);
    }
    for (const name of ['Gorse Marsh', 'Heron Core', 'Ivel Trench']) expect(conflict.message).toContain(name);
    expect(conflict.message).not.toMatch(UUID);
  });

  it('removes a tie, bumps the version and audits every tie change', async () => {
    const scratch = await createHypothesis(clients.CORRELATOR, 'Scratch');
    const { addTie } = await clients.CORRELATOR.ok(ADD_TIE, tieInput(scratch.id, 'A1', 'C1'));
    expect(await clients.CORRELATOR.ok(REMOVE_TIE, { id: addTie.id })).toEqual({ removeTie: true });
    const { hypothesis } = await clients.VIEWER.ok(HYPOTHESIS, { id: scratch.id });
    expect(hypothesis.version).toBe(3);
    expect(hypothesis.ties).toEqual([]);
    const audit = await sql<{ action: string }>(`select action from audit_records where object_type = 'tie' and object_id = $1 order by seq`, [addTie.id]);
    expect(audit.map((a) => a.action)).toEqual(['create', 'delete']);
  });
});

describe('permissions', () => {
  let hypothesisId: string;

  beforeAll(async () => {
    hypothesisId = (await createHypothesis(clients.CORRELATOR, 'Permissions')).id;
  });

  it.each(['VIEWER', 'RESEARCHER', 'ANALYST'] as const)('refuses %s createHypothesis and addTie with FORBIDDEN', async (role) => {
    const create = await clients[role].errorOf(CREATE_HYPOTHESIS, { i: { projectId: fixture.projectId, name: 'Not allowed' } });
    expect(create.code).toBe('FORBIDDEN');
    expect((await clients[role].errorOf(ADD_TIE, tieInput(hypothesisId, 'A1', 'B1'))).code).toBe('FORBIDDEN');
    expect((await clients[role].errorOf(SET_PREFERRED, { id: hypothesisId })).code).toBe('FORBIDDEN');
  });

  it.each(['CORRELATOR', 'ADMIN'] as const)('lets %s create hypotheses and tie events', async (role) => {
    const created = await createHypothesis(clients[role], `By ${role}`);
    const { addTie } = await clients[role].ok(ADD_TIE, tieInput(created.id, 'A1', 'B1'));
    expect(addTie.id).toBeTruthy();
  });

  it('answers NOT_FOUND to an outsider', async () => {
    const outsider = clients.OUTSIDER;
    expect((await outsider.errorOf(HYPOTHESIS, { id: hypothesisId })).code).toBe('NOT_FOUND');
    expect((await outsider.errorOf(ADD_TIE, tieInput(hypothesisId, 'A1', 'B1'))).code).toBe('NOT_FOUND');
    expect((await outsider.errorOf(CREATE_HYPOTHESIS, { i: { projectId: fixture.projectId, name: 'x' } })).code).toBe('NOT_FOUND');
    expect((await outsider.errorOf(LADDER, { p: fixture.projectId })).code).toBe('NOT_FOUND');
  });
});

describe('setPreferredHypothesis', () => {
  it('leaves exactly one preferred hypothesis in the project', async () => {
    const first = await createHypothesis(clients.CORRELATOR, 'Preferred first');
    const second = await createHypothesis(clients.CORRELATOR, 'Preferred second');
    await clients.CORRELATOR.ok(SET_PREFERRED, { id: first.id });
    const { setPreferredHypothesis } = await clients.ADMIN.ok(SET_PREFERRED, { id: second.id });
    expect(setPreferredHypothesis).toEqual({ id: second.id, preferred: true });
    const preferred = await sql<{ id: string }>(`select id from hypotheses where project_id = $1 and preferred`, [fixture.projectId]);
    expect(preferred).toEqual([{ id: second.id }]);
    const { project } = await clients.VIEWER.ok(`query($id: ID!) { project(id: $id) { preferredHypothesis { id } hypotheses { id preferred } } }`, { id: fixture.projectId });
    expect(project.preferredHypothesis).toEqual({ id: second.id });
    expect(project.hypotheses.filter((h: { preferred: boolean }) => h.preferred)).toEqual([{ id: second.id, preferred: true }]);
  });
});

describe('eventLadder', () => {
  const PAGE_QUERY = `query($p: ID!) { eventLadder(projectId: $p) { columns { site { id name } latestAgeModelRun { id stale } events { eventHorizon { id name } medianCalBp } } }
    project(id: $p) { id name myRole hypotheses { id name preferred version } } }`;

  /** The page query over plain HTTP, with whether the cache answered it. */
  async function ladderRead(client: GraphqlClient, encoding = 'gzip'): Promise<{ hit: boolean; contentEncoding: string | null; body: Record<string, any> }> {
    const response = await fetch(`${server.url}/graphql`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'accept-encoding': encoding, authorization: `Bearer ${client.token}` },
      body: JSON.stringify({ query: PAGE_QUERY, variables: { p: fixture.projectId } }),
    });
    const body = (await response.json()) as { data: Record<string, any>; errors?: unknown[] };
    if (body.errors) throw new Error(JSON.stringify(body.errors));
    return { hit: response.headers.get('x-cache') === 'hit', contentEncoding: response.headers.get('content-encoding'), body: body.data };
  }

  it('answers repeated ladder reads from its cache only while nothing it shows has changed', async () => {
    const first = await ladderRead(clients.VIEWER);
    const again = await ladderRead(clients.VIEWER);
    expect(again.hit).toBe(true);
    expect(again.contentEncoding).toBe('gzip');
    expect(again.body).toEqual(first.body);
    // Uncompressed for a client that does not accept gzip, with the same content.
    const plain = await ladderRead(clients.VIEWER, 'identity');
    expect(plain).toMatchObject({ hit: true, contentEncoding: null });
    expect(plain.body).toEqual(first.body);
    // A renamed site shows at once.
    const site = first.body.eventLadder.columns[0].site;
    const [{ version }] = await sql<{ version: number }>('select version from sites where id = $1', [site.id]);
    await clients.RESEARCHER.ok(`mutation($id: ID!, $v: Int!, $n: String!) { updateSite(id: $id, version: $v, input: { name: $n }) { id } }`, {
      id: site.id, v: version, n: `${site.name} (renamed)`,
    });
    const renamed = await ladderRead(clients.VIEWER);
    expect(renamed.hit).toBe(false);
    expect(renamed.body.eventLadder.columns[0].site.name).toBe(`${site.name} (renamed)`);
    // A new hypothesis shows at once.
    await createHypothesis(clients.CORRELATOR, 'Cache check');
    const withHypothesis = await ladderRead(clients.VIEWER);
    expect(withHypothesis.hit).toBe(false);
    expect(withHypothesis.body.project.hypotheses.map((h: { name: string }) => h.name)).toContain('Cache check');
    expect((await ladderRead(clients.VIEWER)).hit).toBe(true);
    // An answer belongs to a role: the viewer's is not served to the admin, but another viewer shares it.
    const admin = await ladderRead(clients.ADMIN);
    expect(admin.hit).toBe(false);
    expect(admin.body.project.myRole).toBe('ADMIN');
    expect(withHypothesis.body.project.myRole).toBe('VIEWER');
    const secondEmail = `second-viewer-${randomUUID().slice(0, 8)}@fixture.test`;
    await createUser(secondEmail, 'Second viewer');
    await sql(`insert into memberships (project_id, user_id, role) select $1, id, 'VIEWER' from users where email = $2`, [fixture.projectId, secondEmail]);
    const secondViewer = await new GraphqlClient(server.url).signIn(secondEmail, PASSWORD);
    // The new membership moved the project revision (Project.members shows it): one fresh answer, then shared.
    expect((await ladderRead(clients.VIEWER)).hit).toBe(false);
    const shared = await ladderRead(secondViewer);
    expect(shared.hit).toBe(true);
    expect(shared.body).toEqual((await ladderRead(clients.VIEWER)).body);
    await sql(`delete from memberships where project_id = $1 and user_id = (select id from users where email = $2)`, [fixture.projectId, secondEmail]);
    expect((await secondViewer.errorOf(PAGE_QUERY, { p: fixture.projectId })).code).toBe('NOT_FOUND');
    // A changed role is seen at once, and a removed member is refused even with a cached answer.
    const viewerEmail = fixture.emails.VIEWER;
    const member = `project_id = $1 and user_id = (select id from users where email = $2)`;
    await sql(`update memberships set role = 'ANALYST' where ${member}`, [fixture.projectId, viewerEmail]);
    const promoted = await ladderRead(clients.VIEWER);
    expect(promoted).toMatchObject({ hit: false, body: { project: { myRole: 'ANALYST' } } });
    await sql(`update memberships set role = 'VIEWER' where ${member}`, [fixture.projectId, viewerEmail]);
    // Back to VIEWER: the membership changed again, so a fresh answer, which says VIEWER.
    expect(await ladderRead(clients.VIEWER)).toMatchObject({ hit: false, body: { project: { myRole: 'VIEWER' } } });
    const [removed] = await sql<{ role: string; user_id: string }>(`delete from memberships where ${member} returning role, user_id`, [fixture.projectId, viewerEmail]);
    try {
      expect((await clients.VIEWER.errorOf(PAGE_QUERY, { p: fixture.projectId })).code).toBe('NOT_FOUND');
    } finally {
      await sql(`insert into memberships (project_id, user_id, role) values ($1, $2, $3)`, [fixture.projectId, removed.user_id, removed.role]);
    }
    // A token issued before a password change is refused even where an answer is cached.
    await ladderRead(clients.VIEWER);
    expect((await ladderRead(clients.VIEWER)).hit).toBe(true);
    const byEmail = `email = $1`;
    await sql(`update users set token_epoch = token_epoch + 1 where ${byEmail}`, [viewerEmail]);
    try {
      expect((await clients.VIEWER.errorOf(PAGE_QUERY, { p: fixture.projectId })).code).toBe('UNAUTHENTICATED');
    } finally {
      await sql(`update users set token_epoch = token_epoch - 1 where ${byEmail}`, [viewerEmail]);
    }
    // An outsider never gets a cached answer.
    expect((await clients.OUTSIDER.errorOf(PAGE_QUERY, { p: fixture.projectId })).code).toBe('NOT_FOUND');
    await sql(`update sites set name = $2, version = version + 1 where id = $1`, [site.id, site.name]);
  });

  it('serves a project query about releases from the cache until a release is made', async () => {
    const RELEASES = `query($p: ID!) { project(id: $p) { id releases { number } } }`;
    const read = async () => {
      const response = await fetch(`${server.url}/graphql`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', authorization: `Bearer ${clients.VIEWER.token}` },
        body: JSON.stringify({ query: RELEASES, variables: { p: fixture.projectId } }),
      });
      const body = (await response.json()) as { data: { project: { releases: { number: number }[] } } };
      return { hit: response.headers.get('x-cache') === 'hit', numbers: body.data.project.releases.map((r) => r.number) };
    };
    const before = await read();
    expect((await read()).hit).toBe(true);
    await clients.ADMIN.ok(`mutation($i: CreateReleaseInput!) { createRelease(input: $i) { id } }`, { i: { projectId: fixture.projectId, note: 'cache scope check' } });
    const after = await read();
    expect(after.hit).toBe(false);
    expect(after.numbers).toHaveLength(before.numbers.length + 1);
  });

  it('lists every site along strike with its latest run and each event posterior', async () => {
    const { eventLadder } = await clients.VIEWER.ok(LADDER, { p: fixture.projectId });
    expect(eventLadder.project.id).toBe(fixture.projectId);
    expect(eventLadder.columns.map((c: { site: { id: string } }) => c.site.id)).toEqual([siteIds.A, siteIds.B, siteIds.C]);
    for (const [i, column] of eventLadder.columns.entries()) {
      const site = SITES[i];
      expect(column.latestAgeModelRun).toEqual({ id: runIds[site.key], status: 'SUCCEEDED' });
      expect(column.events.map((e: { eventHorizon: { name: string } }) => e.eventHorizon.name)).toEqual(['E1', 'E2']);
      for (const [k, event] of column.events.entries()) {
        // The posterior is N(age, sd): its median is the age [analytic], within a year's rounding.
        expect(Math.abs(event.medianCalBp - site.ages[k])).toBeLessThanOrEqual(1);
        expect(event.hpd95).toHaveLength(1);
        // The drawing grid holds the whole mass (area = sum of value x step) in at most 64 values.
        const grid = event.densityGrid;
        expect(grid.values.length).toBeLessThanOrEqual(64);
        expect(grid.values.reduce((sum: number, v: number) => sum + v * grid.stepYears, 0)).toBeCloseTo(1, 2);
        expect(event.density).toHaveLength(grid.values.length);
      }
    }
  });

  it('shows an event without an age model as having no age, and its regional event without age figures', async () => {
    const { createSite } = await clients.RESEARCHER.ok(CREATE_SITE, {
      i: { projectId: fixture.projectId, name: 'Juniper Lake', kind: 'LAKE', latitude: -41, longitude: 175, alongStrikeKm: 400 },
    });
    const units: string[] = [];
    for (const [position, top, base] of [[1, 1, 2], [2, 0, 1]]) {
      const { createUnit } = await clients.RESEARCHER.ok(CREATE_UNIT, {
        i: { siteId: createSite.id, position, name: `L${position}`, topDepthM: top, baseDepthM: base, facies: 'OTHER' },
      });
      units.push(createUnit.id);
    }
    const { createEventHorizon } = await clients.RESEARCHER.ok(CREATE_HORIZON, {
      i: { siteId: createSite.id, name: 'L-E1', unitBelowId: units[0], unitAboveId: units[1], quality: 2 },
    });
    const { eventLadder } = await clients.VIEWER.ok(LADDER, { p: fixture.projectId });
    const column = eventLadder.columns[eventLadder.columns.length - 1];
    expect(column).toMatchObject({ site: { id: createSite.id }, latestAgeModelRun: null });
    expect(column.events).toEqual([{ eventHorizon: { id: createEventHorizon.id, name: 'L-E1' }, medianCalBp: null, hpd95: [], densityGrid: null, density: [] }]);

    const hypothesis = await createHypothesis(clients.CORRELATOR, 'With the lake');
    await clients.CORRELATOR.ok(ADD_TIE, { i: { hypothesisId: hypothesis.id, eventAId: events.C2, eventBId: createEventHorizon.id, confidence: 3 } });
    const { hypothesis: checked } = await clients.VIEWER.ok(HYPOTHESIS, { id: hypothesis.id });
    const group = checked.regionalEvents.find((r: { members: { id: string }[] }) => r.members.some((m) => m.id === createEventHorizon.id));
    expect(group).toMatchObject({ combinedMedianCalBp: null, combinedHpd95: [], concordance: null, chiSquare: null, ruptureLengthKm: 80 });
    expect(group.warnings[0]).toContain('"L-E1" at Juniper Lake');
  });
});
