import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, FixtureRole, PASSWORD, ProjectFixture, sql } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

const CREATE_SITE = `mutation($i: CreateSiteInput!) { createSite(input: $i) { id } }`;
const CREATE_UNIT = `mutation($i: CreateUnitInput!) { createUnit(input: $i) { id } }`;
const UPLOAD = `mutation($i: UploadCoreLogInput!) { uploadCoreLog(input: $i) { id channels units rowCount topDepthM baseDepthM site { id } } }`;
const DELETE = `mutation($id: ID!) { deleteCoreLog(id: $id) }`;
const SITE_LOGS = `query($id: ID!) { site(id: $id) { coreLogs { id name channels traces(maxPoints: 5) { channel unit depthsM values } } } }`;

let server: TestServer;
let fixture: ProjectFixture;
const clients = {} as Record<FixtureRole | 'OUTSIDER', GraphqlClient>;
let coreId: string;
let trenchId: string;

/** An invented core log: 41 rows every 5 cm, susceptibility rising with depth, density constant. */
const SHEET = ['depth (m),magnetic susceptibility (SI 1e-5),density (g/cm3)', ...Array.from({ length: 41 }, (_, i) => `${(i * 0.05).toFixed(2)},${10 + i},1.6`)].join('\n');

beforeAll(async () => {
  server = await startTestServer();
  fixture = await createProjectFixture('Core logs');
  const anonymous = new GraphqlClient(server.url);
  for (const role of Object.keys(fixture.emails) as FixtureRole[]) clients[role] = await anonymous.signIn(fixture.emails[role], PASSWORD);
  clients.OUTSIDER = await anonymous.signIn(fixture.outsiderEmail, PASSWORD);
  const site = (name: string, kind: string) =>
    clients.RESEARCHER.ok(CREATE_SITE, { i: { projectId: fixture.projectId, name, kind, latitude: -41, longitude: 176, alongStrikeKm: 50 } });
  coreId = (await site('Pelling Core', 'CORE')).createSite.id;
  trenchId = (await site('Ardle Trench', 'TRENCH')).createSite.id;
  await clients.RESEARCHER.ok(CREATE_UNIT, { i: { siteId: coreId, position: 1, name: 'Mud', topDepthM: 0, baseDepthM: 2.5, facies: 'HEMIPELAGIC_MUD' } });
});

afterAll(async () => {
  await server?.close();
});

describe('core logs', () => {
  it('stores a clean sheet for a researcher and lists it on the core for every member', async () => {
    const { uploadCoreLog } = await clients.RESEARCHER.ok(UPLOAD, { i: { siteId: coreId, name: 'MSCL', csv: SHEET } });
    expect(uploadCoreLog).toMatchObject({
      channels: ['magnetic susceptibility', 'density'], units: ['SI 1e-5', 'g/cm3'], rowCount: 41, topDepthM: 0, baseDepthM: 2, site: { id: coreId },
    });
    const { site } = await clients.VIEWER.ok(SITE_LOGS, { id: coreId });
    expect(site.coreLogs).toHaveLength(1);
    const [ms] = site.coreLogs[0].traces;
    expect(ms.unit).toBe('SI 1e-5');
    expect(ms.values.length).toBeLessThanOrEqual(5);
    // Block means of 10..50 over five equal depth bins: the overall mean is kept [analytic].
    expect(ms.values[0]).toBeGreaterThan(10);
    const [{ count }] = await sql<{ count: string }>(`select count(*) from audit_records where object_type = 'core_log' and object_id = $1`, [uploadCoreLog.id]);
    expect(Number(count)).toBe(1);
  });

  it('refuses a sheet with bad rows, listing them by row, and writes nothing', async () => {
    const bad = 'depth (m),ms (SI)\n0.1,5\n0.05,6\n0.2,abc\n3.0,7';
    const result = await clients.RESEARCHER.request(UPLOAD, { i: { siteId: coreId, name: 'Bad', csv: bad } });
    const error = result.errors?.[0] as { message: string; extensions: { code: string; field: string; problemCount: number; problems: { row: number }[] } };
    expect(error.extensions).toMatchObject({ code: 'BAD_USER_INPUT', field: 'csv', problemCount: 3 });
    expect(error.extensions.problems.map((p) => p.row)).toEqual([2, 3, 4]);
    expect(error.message).toContain('Row 2');
    expect(error.message).toContain("below the base of the core's column (2.5 m)");
    const [{ count }] = await sql<{ count: string }>(`select count(*) from core_logs where name = 'Bad'`);
    expect(Number(count)).toBe(0);
  });

  it('refuses a second log of one name, a log on a trench, and oversized drawing requests', async () => {
    expect(await clients.RESEARCHER.errorOf(UPLOAD, { i: { siteId: coreId, name: 'mscl', csv: SHEET } })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'name' });
    expect(await clients.RESEARCHER.errorOf(UPLOAD, { i: { siteId: trenchId, name: 'X', csv: SHEET } })).toMatchObject({ code: 'BAD_USER_INPUT', field: 'siteId' });
    const error = await clients.VIEWER.errorOf(`query($id: ID!) { site(id: $id) { coreLogs { traces(maxPoints: 100000) { values } } } }`, { id: coreId });
    expect(error).toMatchObject({ code: 'BAD_USER_INPUT', field: 'maxPoints' });
  });

  it('lets only researchers and admins write, and hides logs from outsiders', async () => {
    for (const role of ['CORRELATOR', 'ANALYST', 'VIEWER'] as const) {
      expect((await clients[role].errorOf(UPLOAD, { i: { siteId: coreId, name: `By ${role}`, csv: SHEET } })).code).toBe('FORBIDDEN');
    }
    expect((await clients.OUTSIDER.errorOf(UPLOAD, { i: { siteId: coreId, name: 'Outside', csv: SHEET } })).code).toBe('NOT_FOUND');
    expect((await clients.OUTSIDER.errorOf(SITE_LOGS, { id: coreId })).code).toBe('NOT_FOUND');
    const { uploadCoreLog } = await clients.ADMIN.ok(UPLOAD, { i: { siteId: coreId, name: 'CT', csv: SHEET } });
    expect((await clients.VIEWER.errorOf(DELETE, { id: uploadCoreLog.id })).code).toBe('FORBIDDEN');
    expect(await clients.RESEARCHER.ok(DELETE, { id: uploadCoreLog.id })).toEqual({ deleteCoreLog: true });
  });
});
