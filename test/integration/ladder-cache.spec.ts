import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, FixtureRole, PASSWORD, ProjectFixture, sql } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

/**
 * The event-ladder answer cache against the project revision PostgreSQL keeps
 * (`project_revisions`, bumped by triggers; migration 0010_project_revisions.sql): a change
 * to any table the ladder reads, made straight in the database as any writer would, stops the
 * stored answer being served; a change in another project does not.
 */

/** The ladder page's query (frontend/src/modules/correlation/graphql/ladder.ts) with the members' names. */
const PAGE_QUERY = `query($p: ID!) {
  eventLadder(projectId: $p) {
    columns {
      site { id name kind alongStrikeKm segment { id name } }
      latestAgeModelRun { id stale }
      events { medianCalBp eventHorizon { id name quality } hpd95 { olderCalBp youngerCalBp probability } densityGrid { startCalBp stepYears values } }
    }
  }
  project(id: $p) { id name myRole myPermissions tectonicSetting hypotheses { id name preferred version } members { role user { displayName } } }
}`;

let server: TestServer;
let fixture: ProjectFixture;
let other: ProjectFixture;
const clients = {} as Record<FixtureRole, GraphqlClient>;
let otherResearcher: GraphqlClient;

async function ladderRead(client: GraphqlClient, projectId = fixture.projectId): Promise<{ hit: boolean; body: Record<string, any> }> {
  const response = await fetch(`${server.url}/graphql`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', authorization: `Bearer ${client.token}` },
    body: JSON.stringify({ query: PAGE_QUERY, variables: { p: projectId } }),
  });
  const body = (await response.json()) as { data: Record<string, any>; errors?: unknown[] };
  if (body.errors) throw new Error(JSON.stringify(body.errors));
  return { hit: response.headers.get('x-cache') === 'hit', body: body.data };
}

async function seedColumn(client: GraphqlClient, projectId: string, name: string, segmentId: string | null): Promise<{ siteId: string; horizonId: string; unitIds: string[] }> {
  const { createSite } = await client.ok(`mutation($i: CreateSiteInput!) { createSite(input: $i) { id } }`, {
    i: { projectId, name, kind: 'MARSH', latitude: -40, longitude: 175, alongStrikeKm: 20, segmentId },
  });
  const unitIds: string[] = [];
  for (const [position, top, base] of [[1, 1, 2], [2, 0, 1]]) {
    const { createUnit } = await client.ok(`mutation($i: CreateUnitInput!) { createUnit(input: $i) { id } }`, {
      i: { siteId: createSite.id, position, name: `U${position}`, topDepthM: top, baseDepthM: base, facies: 'PEAT' },
    });
    unitIds.push(createUnit.id);
  }
  const { createEventHorizon } = await client.ok(`mutation($i: CreateEventHorizonInput!) { createEventHorizon(input: $i) { id } }`, {
    i: { siteId: createSite.id, name: 'E1', unitBelowId: unitIds[0], unitAboveId: unitIds[1], quality: 1 },
  });
  return { siteId: createSite.id, horizonId: createEventHorizon.id, unitIds };
}

beforeAll(async () => {
  server = await startTestServer();
  fixture = await createProjectFixture('Ladder cache');
  other = await createProjectFixture('Ladder cache, other project');
  const anonymous = new GraphqlClient(server.url);
  for (const role of Object.keys(fixture.emails) as FixtureRole[]) clients[role] = await anonymous.signIn(fixture.emails[role], PASSWORD);
  otherResearcher = await anonymous.signIn(other.emails.RESEARCHER, PASSWORD);

  const { createSegment } = await clients.RESEARCHER.ok(`mutation($i: CreateSegmentInput!) { createSegment(input: $i) { id } }`, {
    i: { projectId: fixture.projectId, name: 'North', startKm: 0, endKm: 50 },
  });
  const a = await seedColumn(clients.RESEARCHER, fixture.projectId, 'Alder Marsh', createSegment.id);
  const b = await seedColumn(clients.RESEARCHER, fixture.projectId, 'Birch Marsh', createSegment.id);
  await clients.RESEARCHER.ok(`mutation($i: CreateSampleInput!) { createSample(input: $i) { id } }`, {
    i: {
      siteId: a.siteId, unitId: a.unitIds[0], labCode: `LC-${randomUUID().slice(0, 6)}`, method: 'RADIOCARBON', material: 'IN_SITU_PLANT',
      depthM: 1.5, ageRelation: 'DATES_DEPOSIT', c14Age: 1200, c14Error: 30, curve: 'INTCAL20',
    },
  });
  await sql(
    `insert into age_model_runs (site_id, status, progress, seed, settings, input_snapshot, input_fingerprint, finished_at)
     values ($1, 'SUCCEEDED', 1, 7, '{}'::jsonb, '{}'::jsonb, 'fixture', now())`,
    [a.siteId],
  );
  const { createHypothesis } = await clients.CORRELATOR.ok(`mutation($i: CreateHypothesisInput!) { createHypothesis(input: $i) { id } }`, {
    i: { projectId: fixture.projectId, name: 'Cache hypothesis' },
  });
  await clients.CORRELATOR.ok(`mutation($i: AddTieInput!) { addTie(input: $i) { id } }`, {
    i: { hypothesisId: createHypothesis.id, eventAId: a.horizonId, eventBId: b.horizonId, confidence: 2 },
  });
  await seedColumn(otherResearcher, other.projectId, 'Other Marsh', null);
});

afterAll(async () => {
  await server?.close();
});

const inProject = `project_id = $1`;
const ofItsSites = `site_id in (select id from sites where project_id = $1)`;

/**
 * One row-level change per table the ladder's answer is read from (a rewrite of a row to its own
 * values: the triggers do not look at what changed, and the test must not depend on a column
 * the answer happens to show).
 */
const CHANGES: Record<string, string> = {
  projects: `update projects set name = name where id = $1`,
  memberships: `update memberships set role = role where ${inProject}`,
  users: `update users set display_name = display_name where id in (select user_id from memberships where ${inProject})`,
  segments: `update segments set version = version where ${inProject}`,
  sites: `update sites set version = version where ${inProject}`,
  units: `update units set version = version where ${ofItsSites}`,
  event_horizons: `update event_horizons set version = version where ${ofItsSites}`,
  samples: `update samples set version = version where ${inProject}`,
  age_model_runs: `update age_model_runs set progress = progress where ${ofItsSites}`,
  hypotheses: `update hypotheses set version = version where ${inProject}`,
  ties: `update ties set confidence = confidence where hypothesis_id in (select id from hypotheses where ${inProject})`,
};

describe('the ladder answer cache and the project revision', () => {
  it.each(Object.keys(CHANGES))('a change to %s is not served from the cache', async (table) => {
    await ladderRead(clients.VIEWER);
    expect((await ladderRead(clients.VIEWER)).hit).toBe(true);
    const [{ count }] = await sql<{ count: string }>(`with changed as (${CHANGES[table]} returning 1) select count(*) from changed`, [fixture.projectId]);
    expect(Number(count), `no ${table} row of the project to change`).toBeGreaterThan(0);
    expect((await ladderRead(clients.VIEWER)).hit).toBe(false);
  });

  it('choosing the run a site uses downstream, and clearing the choice, is not served from the cache', async () => {
    const [run] = await sql<{ id: string; site_id: string }>(
      `select r.id, r.site_id from age_model_runs r join sites s on s.id = r.site_id where s.project_id = $1 and r.status = 'SUCCEEDED' limit 1`,
      [fixture.projectId],
    );
    const choose = `mutation($i: ChooseDownstreamRunInput!) { chooseDownstreamRun(input: $i) { id } }`;
    for (const runId of [run.id, null]) {
      await ladderRead(clients.VIEWER);
      expect((await ladderRead(clients.VIEWER)).hit).toBe(true);
      await clients.RESEARCHER.ok(choose, { i: { siteId: run.site_id, runId } });
      expect((await ladderRead(clients.VIEWER)).hit, `after choosing ${runId}`).toBe(false);
    }
  });

  it('a deleted row is not served from the cache, and the answer shows the deletion', async () => {
    await ladderRead(clients.VIEWER);
    expect((await ladderRead(clients.VIEWER)).hit).toBe(true);
    const [{ id }] = await sql<{ id: string }>(
      `insert into hypotheses (project_id, name) values ($1, 'Deleted soon') returning id`,
      [fixture.projectId],
    );
    expect((await ladderRead(clients.VIEWER)).body.project.hypotheses.map((h: { id: string }) => h.id)).toContain(id);
    expect((await ladderRead(clients.VIEWER)).hit).toBe(true);
    await sql(`delete from hypotheses where id = $1`, [id]);
    const after = await ladderRead(clients.VIEWER);
    expect(after.hit).toBe(false);
    expect(after.body.project.hypotheses.map((h: { id: string }) => h.id)).not.toContain(id);
  });

  it('an installed calibration curve is not served from the cache (samples calibrate against it)', async () => {
    await ladderRead(clients.VIEWER);
    expect((await ladderRead(clients.VIEWER)).hit).toBe(true);
    await sql(`insert into calibration_curves (code, name, marine, source_text, youngest_cal_bp, oldest_cal_bp)
      values ('CACHE${randomUUID().slice(0, 6)}', 'Cache check', false, '', 0, 1)`);
    await sql(`delete from calibration_curves where name = 'Cache check'`);
    expect((await ladderRead(clients.VIEWER)).hit).toBe(false);
  });

  it('a change in another project is served from the cache', async () => {
    await ladderRead(clients.VIEWER);
    expect((await ladderRead(clients.VIEWER)).hit).toBe(true);
    await otherResearcher.ok(`mutation($i: CreateSegmentInput!) { createSegment(input: $i) { id } }`, {
      i: { projectId: other.projectId, name: 'Elsewhere', startKm: 0, endKm: 10 },
    });
    for (const table of Object.keys(CHANGES)) {
      if (table === 'users') continue; // a user may be a member of both; none of these is
      await sql(CHANGES[table], [other.projectId]);
    }
    expect((await ladderRead(clients.VIEWER)).hit).toBe(true);
  });

  it('every table that holds project rows bumps the revision on insert, update and delete', async () => {
    // Tables with no rows a project shows: throttles, users' own reset tokens, the revision itself.
    const NOT_PROJECT_ROWS = ['rate_limits', 'password_resets', 'project_revisions'];
    const tables = await sql<{ table_name: string }>(
      `select table_name from information_schema.tables where table_schema = 'public' and table_type = 'BASE TABLE' order by table_name`,
    );
    const triggers = await sql<{ table_name: string; trigger_name: string }>(
      `select c.relname as table_name, t.tgname as trigger_name from pg_trigger t join pg_class c on c.oid = t.tgrelid
       join pg_namespace n on n.oid = c.relnamespace where n.nspname = 'public' and not t.tgisinternal and t.tgname like 'project_revision_%'`,
    );
    const missing: string[] = [];
    for (const { table_name: table } of tables) {
      if (NOT_PROJECT_ROWS.includes(table)) continue;
      const names = triggers.filter((t) => t.table_name === table).map((t) => t.trigger_name);
      // A project's own row: made with its revision (insert), bumped on update, gone with it on delete.
      const expected = table === 'projects' ? ['project_revision_create', 'project_revision_update'] : ['project_revision_delete', 'project_revision_insert', 'project_revision_update'];
      if (expected.some((name) => !names.includes(name))) missing.push(table);
    }
    expect(missing, 'tables without revision triggers: call project_revision_track in their migration').toEqual([]);
  });

  it('gives a new project a revision row', async () => {
    const { createProject } = await clients.VIEWER.ok(`mutation { createProject(input: { name: "Revision check ${randomUUID().slice(0, 6)}" }) { id } }`);
    const rows = await sql<{ revision: string }>(`select revision from project_revisions where project_id = $1`, [createProject.id]);
    expect(rows).toHaveLength(1);
  });
});
