import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, FixtureRole, PASSWORD, ProjectFixture, sql } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

const CREATE_SEGMENT = `mutation($i: CreateSegmentInput!) { createSegment(input: $i) { id version name } }`;
const CREATE_SITE = `mutation($i: CreateSiteInput!) { createSite(input: $i) { id version name kind } }`;
const CREATE_UNIT = `mutation($i: CreateUnitInput!) { createUnit(input: $i) { id version position } }`;
const CREATE_HORIZON = `mutation($i: CreateEventHorizonInput!) { createEventHorizon(input: $i) { id version unitBelow { id } unitAbove { id } } }`;
const CREATE_SAMPLE = `mutation($i: CreateSampleInput!) { createSample(input: $i) { id version labCode method calibration { medianCalBp hpd95 { olderCalBp youngerCalBp probability } warnings } } }`;
const UPDATE_SITE = `mutation($id: ID!, $v: Int!, $i: UpdateSiteInput!) { updateSite(id: $id, version: $v, input: $i) { id version name } }`;
const SITE = `query($id: ID!) { site(id: $id) { id name kind units { id position name } eventHorizons { id name unitBelow { id } unitAbove { id } } samples { id labCode method } } }`;

let server: TestServer;
let fixture: ProjectFixture;
const clients = {} as Record<FixtureRole | 'OUTSIDER', GraphqlClient>;
let siteId: string;
let unitIds: string[] = [];

function siteInput(name: string) {
  return { projectId: fixture.projectId, name, kind: 'TRENCH', latitude: -41.2, longitude: 172.5, alongStrikeKm: 120 };
}

beforeAll(async () => {
  server = await startTestServer();
  fixture = await createProjectFixture('Foundation');
  const anonymous = new GraphqlClient(server.url);
  for (const role of Object.keys(fixture.emails) as FixtureRole[]) clients[role] = await anonymous.signIn(fixture.emails[role], PASSWORD);
  clients.OUTSIDER = await anonymous.signIn(fixture.outsiderEmail, PASSWORD);
  const { createSite } = await clients.RESEARCHER.ok(CREATE_SITE, { i: siteInput('Base trench') });
  siteId = createSite.id;
  for (const [position, top, base] of [[1, 2, 3], [2, 1, 2], [3, 0, 1]]) {
    const { createUnit } = await clients.RESEARCHER.ok(CREATE_UNIT, {
      i: { siteId, position, name: `U${position}`, topDepthM: top, baseDepthM: base, facies: 'PEAT' },
    });
    unitIds.push(createUnit.id);
  }
});

afterAll(async () => {
  await server?.close();
});

describe('sign-in', () => {
  it('answers a token and the user, and me lists memberships with roles', async () => {
    const me = await clients.CORRELATOR.ok(`{ me { id email memberships { role project { id name } } } }`);
    expect(me.me.email).toBe(fixture.emails.CORRELATOR);
    expect(me.me.memberships).toEqual([expect.objectContaining({ role: 'CORRELATOR', project: expect.objectContaining({ id: fixture.projectId }) })]);
  });

  it('answers sign-in with the user and their memberships', async () => {
    const { signIn } = await new GraphqlClient(server.url).ok(
      'mutation($e: String!, $p: String!) { signIn(email: $e, password: $p) { token user { id email memberships { role project { id } } } } }',
      { e: fixture.emails.ANALYST, p: PASSWORD },
    );
    expect(signIn.user.memberships).toEqual([{ role: 'ANALYST', project: { id: fixture.projectId } }]);
  });

  it('refuses a wrong password with UNAUTHENTICATED', async () => {
    const error = await new GraphqlClient(server.url).errorOf(
      'mutation { signIn(email: "viewer@nowhere.test", password: "wrong-password") { token } }',
    );
    expect(error.code).toBe('UNAUTHENTICATED');
  });

  it('refuses requests without a token, and a tampered token', async () => {
    expect((await new GraphqlClient(server.url).errorOf('{ projects { id } }')).code).toBe('UNAUTHENTICATED');
    const tampered = new GraphqlClient(server.url, clients.VIEWER.token!.slice(0, -3) + 'abc');
    expect((await tampered.errorOf('{ projects { id } }')).code).toBe('UNAUTHENTICATED');
  });

  it('serves GET /health', async () => {
    const response = await fetch(`${server.url}/health`);
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual({ status: 'ok' });
  });
});

describe('project isolation', () => {
  it('lists only the caller’s projects', async () => {
    const { projects } = await clients.OUTSIDER.ok(`{ projects { id name } }`);
    expect(projects.map((p: { id: string }) => p.id)).not.toContain(fixture.projectId);
    const mine = await clients.VIEWER.ok(`{ projects { id name } }`);
    expect(mine.projects.map((p: { id: string }) => p.id)).toEqual([fixture.projectId]);
  });

  it('answers NOT_FOUND for another project’s ids and never its data', async () => {
    const project = await clients.OUTSIDER.request(`query($id: ID!) { project(id: $id) { id name } }`, { id: fixture.projectId });
    expect(project.errors?.[0].extensions?.code).toBe('NOT_FOUND');
    expect(project.data).toBeNull();
    expect((await clients.OUTSIDER.errorOf(SITE, { id: siteId })).code).toBe('NOT_FOUND');
    expect((await clients.OUTSIDER.errorOf(CREATE_SITE, { i: siteInput('Intruder') })).code).toBe('NOT_FOUND');
  });
});

describe('permission matrix', () => {
  // The role table in backend/src/access/permissions.ts: ADMIN and RESEARCHER write stratigraphy.
  const writers: FixtureRole[] = ['ADMIN', 'RESEARCHER'];
  const readers: FixtureRole[] = ['CORRELATOR', 'ANALYST', 'VIEWER'];

  for (const role of writers) {
    it(`${role} may create segments, sites, units, horizons and samples`, async () => {
      const client = clients[role];
      await client.ok(CREATE_SEGMENT, { i: { projectId: fixture.projectId, name: `Seg ${role}`, startKm: 0, endKm: 100 } });
      const { createSite } = await client.ok(CREATE_SITE, { i: siteInput(`Site ${role}`) });
      const u1 = (await client.ok(CREATE_UNIT, { i: { siteId: createSite.id, position: 1, name: 'a', topDepthM: 1, baseDepthM: 2, facies: 'SOIL' } })).createUnit;
      const u2 = (await client.ok(CREATE_UNIT, { i: { siteId: createSite.id, position: 2, name: 'b', topDepthM: 0, baseDepthM: 1, facies: 'COLLUVIUM' } })).createUnit;
      await client.ok(CREATE_HORIZON, { i: { siteId: createSite.id, name: 'E1', unitBelowId: u1.id, unitAboveId: u2.id, quality: 2, evidence: ['colluvial wedge'] } });
      const { createSample } = await client.ok(CREATE_SAMPLE, {
        i: { siteId: createSite.id, unitId: u1.id, labCode: `LAB-${role}-1`, method: 'RADIOCARBON', material: 'DETRITAL_CHARCOAL', ageRelation: 'OLDER_THAN_DEPOSIT', c14Age: 2450, c14Error: 30, curve: 'INTCAL20', depthM: 1.5 },
      });
      expect(createSample.calibration.medianCalBp).toBeGreaterThan(2300);
    });
  }

  for (const role of readers) {
    it(`${role} reads the column but gets FORBIDDEN for every stratigraphy write`, async () => {
      const client = clients[role];
      const { site } = await client.ok(SITE, { id: siteId });
      expect(site.units).toHaveLength(3);
      const attempts: [string, Record<string, unknown>][] = [
        [CREATE_SEGMENT, { i: { projectId: fixture.projectId, name: 'x', startKm: 0, endKm: 1 } }],
        [CREATE_SITE, { i: siteInput('Forbidden') }],
        [CREATE_UNIT, { i: { siteId, position: 9, name: 'x', topDepthM: 9, baseDepthM: 10, facies: 'OTHER' } }],
        [CREATE_SAMPLE, { i: { siteId, unitId: unitIds[0], labCode: `NOPE-${role}`, method: 'RADIOCARBON', material: 'SHELL', ageRelation: 'DATES_DEPOSIT', c14Age: 1000, c14Error: 20, curve: 'INTCAL20' } }],
        [UPDATE_SITE, { id: siteId, v: 1, i: { name: 'renamed' } }],
        [`mutation($id: ID!) { deleteSite(id: $id) }`, { id: siteId }],
      ];
      for (const [query, variables] of attempts) expect((await client.errorOf(query, variables)).code).toBe('FORBIDDEN');
    });
  }
});

describe('validation', () => {
  it('refuses c14Error 0 naming the field, and writes nothing', async () => {
    const before = await sql<{ n: string }>('select count(*)::text as n from samples where site_id = $1', [siteId]);
    const error = await clients.RESEARCHER.errorOf(CREATE_SAMPLE, {
      i: { siteId, unitId: unitIds[0], labCode: 'ZERO-ERR', method: 'RADIOCARBON', material: 'IN_SITU_PLANT', ageRelation: 'DATES_DEPOSIT', c14Age: 1200, c14Error: 0, curve: 'INTCAL20' },
    });
    expect(error).toMatchObject({ code: 'BAD_USER_INPUT', field: 'c14Error' });
    const after = await sql<{ n: string }>('select count(*)::text as n from samples where site_id = $1', [siteId]);
    expect(after[0].n).toBe(before[0].n);
  });

  it('refuses a negative 14C age naming the field', async () => {
    const error = await clients.RESEARCHER.errorOf(CREATE_SAMPLE, {
      i: { siteId, unitId: unitIds[0], labCode: 'NEG-AGE', method: 'RADIOCARBON', material: 'IN_SITU_PLANT', ageRelation: 'DATES_DEPOSIT', c14Age: -40, c14Error: 20, curve: 'INTCAL20' },
    });
    expect(error).toMatchObject({ code: 'BAD_USER_INPUT', field: 'c14Age' });
    expect(await sql('select id from samples where lab_code = $1', ['NEG-AGE'])).toHaveLength(0);
  });

  it('requires method-specific fields: a luminescence sample without its measurement year', async () => {
    const error = await clients.RESEARCHER.errorOf(CREATE_SAMPLE, {
      i: { siteId, unitId: unitIds[1], labCode: 'OSL-1', method: 'LUMINESCENCE', material: 'OTHER', ageRelation: 'DATES_DEPOSIT', calendarAgeBp: 1075, calendarErrorYears: 70 },
    });
    expect(error).toMatchObject({ code: 'BAD_USER_INPUT', field: 'measurementYear' });
  });

  it('refuses a duplicate lab code in the project', async () => {
    const input = { siteId, unitId: unitIds[2], labCode: 'DUP-1', method: 'RADIOCARBON', material: 'IN_SITU_PLANT', ageRelation: 'DATES_DEPOSIT', c14Age: 800, c14Error: 25, curve: 'INTCAL20' };
    await clients.RESEARCHER.ok(CREATE_SAMPLE, { i: input });
    expect(await clients.RESEARCHER.errorOf(CREATE_SAMPLE, { i: input })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'labCode' });
  });

  it('refuses a site whose along-strike position lies outside its segment, on create and on update, writing nothing', async () => {
    const { createSegment } = await clients.RESEARCHER.ok(CREATE_SEGMENT, { i: { projectId: fixture.projectId, name: 'Extent check', startKm: 100, endKm: 200 } });
    const outside = { ...siteInput('Beyond the segment'), segmentId: createSegment.id, alongStrikeKm: 250 };
    expect(await clients.RESEARCHER.errorOf(CREATE_SITE, { i: outside })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'alongStrikeKm' });
    expect(await sql('select id from sites where name = $1', ['Beyond the segment'])).toHaveLength(0);
    const { createSite } = await clients.RESEARCHER.ok(CREATE_SITE, { i: { ...outside, name: 'Inside the segment', alongStrikeKm: 200 } });
    const moved = await clients.RESEARCHER.errorOf(UPDATE_SITE, { id: createSite.id, v: createSite.version, i: { alongStrikeKm: 99 } });
    expect(moved).toMatchObject({ code: 'BAD_USER_INPUT', field: 'alongStrikeKm' });
    const [kept] = await sql<{ along_strike_km: number }>('select along_strike_km from sites where id = $1', [createSite.id]);
    expect(kept.along_strike_km).toBe(200);
  });

  it('refuses overlapping units and a horizon between non-adjacent units', async () => {
    const overlap = await clients.RESEARCHER.errorOf(CREATE_UNIT, { i: { siteId, position: 4, name: 'x', topDepthM: 0.5, baseDepthM: 0.8, facies: 'SOIL' } });
    expect(overlap).toMatchObject({ code: 'BAD_USER_INPUT', field: 'topDepthM' });
    const gap = await clients.RESEARCHER.errorOf(CREATE_HORIZON, { i: { siteId, name: 'E?', unitBelowId: unitIds[0], unitAboveId: unitIds[2], quality: 3 } });
    expect(gap).toMatchObject({ code: 'BAD_USER_INPUT', field: 'unitAboveId' });
  });
});

describe('inserting a unit mid-column', () => {
  it('renumbers the unit at the position and every younger one in the same transaction, with audit records', async () => {
    const { createSite } = await clients.RESEARCHER.ok(CREATE_SITE, { i: siteInput('Insert trench') });
    const ids: string[] = [];
    // Three units with a gap between 2.0 and 2.5 m, where a fourth will go.
    for (const [position, top, base] of [[1, 2.5, 3], [2, 1, 2], [3, 0, 1]]) {
      ids.push((await clients.RESEARCHER.ok(CREATE_UNIT, { i: { siteId: createSite.id, position, name: `L${position}`, topDepthM: top, baseDepthM: base, facies: 'PEAT' } })).createUnit.id);
    }
    const middle = { siteId: createSite.id, position: 2, name: 'New', topDepthM: 2, baseDepthM: 2.5, facies: 'SAND_SHEET' };
    // Without makeRoom a taken position is refused, and nothing moves.
    expect(await clients.RESEARCHER.errorOf(CREATE_UNIT, { i: middle })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'position' });
    // With makeRoom but depths that overlap a neighbour: refused, and nothing was renumbered.
    const overlapping = await clients.RESEARCHER.errorOf(CREATE_UNIT, { i: { ...middle, makeRoom: true, topDepthM: 1.5 } });
    expect(overlapping).toMatchObject({ code: 'BAD_USER_INPUT', field: 'topDepthM' });
    const untouched = await sql<{ name: string; position: number }>('select name, position from units where site_id = $1 order by position', [createSite.id]);
    expect(untouched.map((u) => `${u.name}@${u.position}`)).toEqual(['L1@1', 'L2@2', 'L3@3']);

    const { createUnit } = await clients.RESEARCHER.ok(CREATE_UNIT, { i: { ...middle, makeRoom: true } });
    expect(createUnit.position).toBe(2);
    const after = await sql<{ id: string; name: string; position: number; version: number }>(
      'select id, name, position, version from units where site_id = $1 order by position', [createSite.id],
    );
    expect(after.map((u) => `${u.name}@${u.position}`)).toEqual(['L1@1', 'New@2', 'L2@3', 'L3@4']);
    // The moved units changed, so an edit form holding their old version gets CONFLICT.
    expect(after.filter((u) => u.name === 'L2' || u.name === 'L3').map((u) => u.version)).toEqual([2, 2]);
    expect(after.find((u) => u.name === 'L1')!.version).toBe(1);
    const audit = await sql<{ object_id: string; action: string; before: { position: number } | null; after: { position: number } }>(
      `select object_id, action, before, after from audit_records where object_type = 'unit' and object_id = any($1::text[]) order by seq`,
      [[...ids, createUnit.id]],
    );
    const renumbered = audit.filter((r) => r.action === 'update');
    expect(renumbered.map((r) => [r.object_id, r.before?.position, r.after.position])).toEqual(
      expect.arrayContaining([[ids[1], 2, 3], [ids[2], 3, 4]]),
    );
    expect(audit.some((r) => r.action === 'create' && r.object_id === createUnit.id)).toBe(true);
  });
});

describe('optimistic locking and audit', () => {
  it('answers CONFLICT for a stale version and keeps the newer write', async () => {
    const { createSite } = await clients.ADMIN.ok(CREATE_SITE, { i: siteInput('Lock test') });
    const first = await clients.ADMIN.ok(UPDATE_SITE, { id: createSite.id, v: 1, i: { name: 'Lock test A' } });
    expect(first.updateSite.version).toBe(2);
    const stale = await clients.RESEARCHER.errorOf(UPDATE_SITE, { id: createSite.id, v: 1, i: { name: 'Lock test B' } });
    expect(stale.code).toBe('CONFLICT');
    const rows = await sql<{ name: string }>('select name from sites where id = $1', [createSite.id]);
    expect(rows[0].name).toBe('Lock test A');
  });

  it('records who changed what, with before and after', async () => {
    const { createSite } = await clients.RESEARCHER.ok(CREATE_SITE, { i: siteInput('Audit test') });
    await clients.RESEARCHER.ok(UPDATE_SITE, { id: createSite.id, v: 1, i: { name: 'Audit test renamed' } });
    const records = await sql<{ action: string; before: { name: string } | null; after: { name: string } | null; email: string }>(
      `select a.action, a.before, a.after, u.email from audit_records a join users u on u.id = a.actor_id
       where a.object_type = 'site' and a.object_id = $1 order by a.seq`,
      [createSite.id],
    );
    expect(records.map((r) => r.action)).toEqual(['create', 'update']);
    expect(records[1]).toMatchObject({ email: fixture.emails.RESEARCHER, before: { name: 'Audit test' }, after: { name: 'Audit test renamed' } });
  });
});

describe('persistence', () => {
  it('keeps data across a server restart', async () => {
    await server.close();
    server = await startTestServer();
    const client = await new GraphqlClient(server.url).signIn(fixture.emails.VIEWER, PASSWORD);
    const { site } = await client.ok(SITE, { id: siteId });
    expect(site.name).toBe('Base trench');
    expect(site.units.map((u: { position: number }) => u.position)).toEqual([1, 2, 3]);
  });
});
