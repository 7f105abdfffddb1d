import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, FixtureRole, PASSWORD, ProjectFixture, sql } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

const CREATE_SITE = `mutation($i: CreateSiteInput!) { createSite(input: $i) { id } }`;
const CREATE_UNIT = `mutation($i: CreateUnitInput!) { createUnit(input: $i) { id } }`;
const CREATE_SAMPLE = `mutation($i: CreateSampleInput!) { createSample(input: $i) { id calibration { medianCalBp hpd95 { olderCalBp youngerCalBp probability } } } }`;
const IMPORT = `mutation($i: ImportSamplesInput!) {
  importSamples(input: $i) {
    rowCount committed errors { row field message }
    preview { row labCode unitName medianCalBp hpd95 { olderCalBp youngerCalBp probability } warnings }
  }
}`;
const SITE_SAMPLES = `query($id: ID!) { site(id: $id) { samples { labCode unit { name } calibration { medianCalBp hpd95 { olderCalBp youngerCalBp probability } } } } }`;

interface ImportResult {
  rowCount: number;
  committed: boolean;
  errors: { row: number; field: string; message: string }[];
  preview: { row: number; labCode: string; unitName: string; medianCalBp: number | null; hpd95: unknown[]; warnings: string[] }[];
}

let server: TestServer;
let fixture: ProjectFixture;
const clients = {} as Record<FixtureRole | 'OUTSIDER', GraphqlClient>;
let siteCount = 0;

/** A site with three units: U1 (2-3 m, oldest), "Sand sheet" (1-2 m), U3 (0-1 m). */
async function newSite(): Promise<string> {
  siteCount += 1;
  const { createSite } = await clients.RESEARCHER.ok(CREATE_SITE, {
    i: { projectId: fixture.projectId, name: `Import trench ${siteCount}`, kind: 'TRENCH', latitude: -41.2, longitude: 172.5, alongStrikeKm: 40 },
  });
  for (const [position, name, top, base] of [[1, 'U1', 2, 3], [2, 'Sand sheet', 1, 2], [3, 'U3', 0, 1]] as const) {
    await clients.RESEARCHER.ok(CREATE_UNIT, { i: { siteId: createSite.id, position, name, topDepthM: top, baseDepthM: base, facies: 'PEAT' } });
  }
  return createSite.id;
}

async function importSheet(client: GraphqlClient, siteId: string, csv: string, commit: boolean): Promise<ImportResult> {
  return (await client.ok<{ importSamples: ImportResult }>(IMPORT, { i: { siteId, csv, commit } })).importSamples;
}

async function samplesOf(siteId: string): Promise<number> {
  const [row] = await sql<{ n: string }>('select count(*) as n from samples where site_id = $1', [siteId]);
  return Number(row.n);
}

/** 2,000 radiocarbon rows over the three units of `newSite`. */
function bulkSheet(prefix: string): string {
  const lines = ['labCode,unit,depthM,method,material,c14Age,c14Error,curve'];
  for (let i = 1; i <= 2000; i++) {
    lines.push(`${prefix}-${i},${1 + (i % 3)},${(2.9 - (i % 3) - 0.0004 * (i % 1000)).toFixed(4)},RADIOCARBON,DETRITAL_CHARCOAL,${600 + 4 * i},${20 + (i % 40)},INTCAL20`);
  }
  return lines.join('\n');
}

/** Lab codes are unique per project, so every sheet gets its own prefix. */
function goodSheet(prefix: string, c14ErrorOfRow3 = '35'): string {
  return [
    'labCode,unit,depthM,method,material,ageRelation,c14Age,c14Error,curve,deltaR,deltaRError,calendarAgeBp,calendarErrorYears,measurementYear,notes',
    `${prefix}-1,U1,2.5,RADIOCARBON,DETRITAL_CHARCOAL,OLDER_THAN_DEPOSIT,2450,30,INTCAL20,,,,,,"charcoal, rounded"`,
    `${prefix}-2,sand sheet,1.5,radiocarbon,shell,,1900,25,marine20,-40,55,,,,`,
    `${prefix}-3,3,0.4,RADIOCARBON,PLANT_MACROFOSSIL,DATES_DEPOSIT,1200,${c14ErrorOfRow3},INTCAL20,,,,,,`,
    `${prefix}-4,2,1.2,LUMINESCENCE,OTHER,,,,,,,1075,70,2019,`,
  ].join('\r\n');
}

beforeAll(async () => {
  server = await startTestServer();
  fixture = await createProjectFixture('Import');
  const anonymous = new GraphqlClient(server.url);
  for (const role of Object.keys(fixture.emails) as FixtureRole[]) clients[role] = await anonymous.signIn(fixture.emails[role], PASSWORD);
  clients.OUTSIDER = await anonymous.signIn(fixture.outsiderEmail, PASSWORD);
});

afterAll(async () => {
  await server?.close();
});

describe('importSamples', () => {
  it('writes nothing when one row is bad, even with commit true, and names the row and field', async () => {
    const siteId = await newSite();
    const result = await importSheet(clients.RESEARCHER, siteId, goodSheet('BAD', '0'), true);
    expect(result.committed).toBe(false);
    expect(result.rowCount).toBe(4);
    expect(result.errors).toEqual([
      { row: 3, field: 'c14Error', message: 'c14Error must be greater than 0 (the 1-sigma error in 14C years)' },
    ]);
    expect(result.preview.map((p) => p.row)).toEqual([1, 2, 4]);
    expect(await samplesOf(siteId)).toBe(0);
  });

  it('validates without writing when commit is false, and the fixed sheet commits every row with its calibration', async () => {
    const siteId = await newSite();
    const preview = await importSheet(clients.RESEARCHER, siteId, goodSheet('OK'), false);
    expect(preview).toMatchObject({ rowCount: 4, committed: false, errors: [] });
    expect(preview.preview.map((p) => [p.labCode, p.unitName])).toEqual([
      ['OK-1', 'U1'], ['OK-2', 'Sand sheet'], ['OK-3', 'U3'], ['OK-4', 'Sand sheet'],
    ]);
    expect(await samplesOf(siteId)).toBe(0);

    const committed = await importSheet(clients.RESEARCHER, siteId, goodSheet('OK'), true);
    expect(committed).toMatchObject({ rowCount: 4, committed: true, errors: [] });
    const { site } = await clients.VIEWER.ok(SITE_SAMPLES, { id: siteId });
    const byCode = new Map(site.samples.map((s: { labCode: string }) => [s.labCode, s]));
    expect([...byCode.keys()].sort()).toEqual(['OK-1', 'OK-2', 'OK-3', 'OK-4']);
    for (const row of committed.preview) {
      const stored = byCode.get(row.labCode) as { calibration: { medianCalBp: number; hpd95: unknown[] } };
      expect(stored.calibration.medianCalBp).toBe(row.medianCalBp);
      expect(stored.calibration.hpd95).toEqual(row.hpd95);
    }

    // The same determination entered through the single-sample form calibrates identically.
    const unitId = (await sql<{ id: string }>(`select id from units where site_id = $1 and position = 1`, [siteId]))[0].id;
    const { createSample } = await clients.RESEARCHER.ok(CREATE_SAMPLE, {
      i: { siteId, unitId, labCode: 'FORM-1', method: 'RADIOCARBON', material: 'DETRITAL_CHARCOAL', ageRelation: 'OLDER_THAN_DEPOSIT', c14Age: 2450, c14Error: 30, curve: 'INTCAL20', depthM: 2.5 },
    });
    expect(createSample.calibration.medianCalBp).toBe(committed.preview[0].medianCalBp);

    const audit = await sql<{ n: string }>(
      `select count(*) as n from audit_records where project_id = $1 and action = 'import' and object_type = 'sample'
         and object_id in (select id::text from samples where site_id = $2)`,
      [fixture.projectId, siteId],
    );
    expect(Number(audit[0].n)).toBe(4);
  });

  it('names both rows of a lab code repeated in the sheet, and a lab code already in the project', async () => {
    const siteId = await newSite();
    await importSheet(clients.RESEARCHER, siteId, goodSheet('TAKEN'), true);
    const csv = [
      'labCode,unit,method,material,c14Age,c14Error,curve',
      'DUP-1,1,RADIOCARBON,SHELL,1500,30,INTCAL20',
      'TAKEN-2,1,RADIOCARBON,SHELL,1500,30,INTCAL20',
      'DUP-1,2,RADIOCARBON,SHELL,1600,30,INTCAL20',
    ].join('\n');
    const result = await importSheet(clients.RESEARCHER, siteId, csv, true);
    expect(result.committed).toBe(false);
    expect(result.errors).toEqual([
      { row: 1, field: 'labCode', message: 'lab code DUP-1 appears more than once in the sheet: also on row 3' },
      { row: 2, field: 'labCode', message: 'lab code TAKEN-2 is already used by another sample in this project' },
      { row: 3, field: 'labCode', message: 'lab code DUP-1 appears more than once in the sheet: also on row 1' },
    ]);
    expect(await samplesOf(siteId)).toBe(4);
  });

  it('refuses a unit the site does not have and an unknown column', async () => {
    const siteId = await newSite();
    const unknownUnit = await importSheet(
      clients.RESEARCHER, siteId, 'labCode,unit,method,material,c14Age,c14Error,curve\nUN-1,Gravel,RADIOCARBON,SHELL,1500,30,INTCAL20\n', false,
    );
    expect(unknownUnit.errors).toEqual([{ row: 1, field: 'unit', message: 'this site has no unit named "Gravel"' }]);
    const unknownColumn = await importSheet(clients.RESEARCHER, siteId, 'labCode,unit,method,material,lab\nUN-2,1,TEPHRA,OTHER,x\n', true);
    expect(unknownColumn.committed).toBe(false);
    expect(unknownColumn.errors).toEqual([expect.objectContaining({ row: 0, field: 'header', message: expect.stringContaining('"lab"') })]);
    expect(await samplesOf(siteId)).toBe(0);
  });

  it("reads a laboratory's own headers once the user maps them, and remembers the mapping for the project", async () => {
    const siteId = await newSite();
    // An invented laboratory's sheet: its own header names, and a column we do not keep.
    const sheet = (code: string) => `Lab ID,Layer,Method,Material,Conventional age,±,Curve,Lab remarks\n${code},U3,RADIOCARBON,detrital charcoal,1500,30,INTCAL20,fine\n`;
    const query = `mutation($i: ImportSamplesInput!) { importSamples(input: $i) { committed errors { row scope field message } columns { header field source } } }`;
    const first = (await clients.RESEARCHER.ok(query, { i: { siteId, csv: sheet('MAP-1'), commit: false } })).importSamples;
    // One problem lists every unrecognised header, in the header's scope, not one per column and not "row 0" of the data.
    expect(first.errors).toEqual([
      { row: 0, scope: 'HEADER', field: 'header', message: expect.stringContaining('These 5 columns are not recognised: "Lab ID", "Layer", "Conventional age", "±" and "Lab remarks"') },
      { row: 0, scope: 'HEADER', field: 'labCode', message: 'The sheet needs a labCode column.' },
      { row: 0, scope: 'HEADER', field: 'unit', message: 'The sheet needs a unit column.' },
    ]);
    expect(first.columns.filter((c: { source: string }) => c.source === 'UNKNOWN').map((c: { header: string }) => c.header)).toEqual(['Lab ID', 'Layer', 'Conventional age', '±', 'Lab remarks']);

    const columnChoices = [
      { header: 'Lab ID', field: 'labCode' }, { header: 'Layer', field: 'unit' }, { header: 'conventional  AGE', field: 'c14Age' }, { header: '±', field: 'c14Error' }, { header: 'Lab remarks', field: null },
    ];
    // A field name of our own is checked before anything is read.
    expect(await clients.RESEARCHER.errorOf(query, { i: { siteId, csv: sheet('MAP-1'), commit: false, columnChoices: [{ header: 'Lab ID', field: 'labId' }] } }))
      .toMatchObject({ code: 'BAD_USER_INPUT', field: expect.stringContaining('columnChoices') });
    const mapped = (await clients.RESEARCHER.ok(query, { i: { siteId, csv: sheet('MAP-1'), commit: true, columnChoices } })).importSamples;
    expect(mapped).toMatchObject({ committed: true, errors: [] });
    expect(await samplesOf(siteId)).toBe(1);

    // The next sheet of the project, at another site, is read with the remembered choices.
    const otherSite = await newSite();
    const again = (await clients.RESEARCHER.ok(query, { i: { siteId: otherSite, csv: sheet('MAP-2'), commit: false } })).importSamples;
    expect(again.errors).toEqual([]);
    expect(again.columns).toContainEqual({ header: 'Lab ID', field: 'labCode', source: 'REMEMBERED' });
    expect(again.columns).toContainEqual({ header: 'Lab remarks', field: null, source: 'REMEMBERED' });
    expect(again.columns).toContainEqual({ header: 'Method', field: 'method', source: 'NAME' });
    const audit = await sql<{ after: Record<string, string | null> }>(
      `select after from audit_records where object_type = 'labSheetColumnChoices' and project_id = $1`, [fixture.projectId],
    );
    expect(audit).toEqual([{ after: { 'Lab ID': 'labCode', Layer: 'unit', 'Conventional age': 'c14Age', '±': 'c14Error', 'Lab remarks': null } }]);
  });

  it('gives a VIEWER FORBIDDEN and an outsider NOT_FOUND, writing nothing', async () => {
    const siteId = await newSite();
    const input = { i: { siteId, csv: goodSheet('PERM'), commit: true } };
    expect((await clients.VIEWER.errorOf(IMPORT, input)).code).toBe('FORBIDDEN');
    expect((await clients.OUTSIDER.errorOf(IMPORT, input)).code).toBe('NOT_FOUND');
    expect(await samplesOf(siteId)).toBe(0);
  });

  it('commits a 2,000-row sheet in one go', async () => {
    const siteId = await newSite();
    const result = await importSheet(clients.ADMIN, siteId, bulkSheet('BULK'), true);
    expect(result.errors).toEqual([]);
    expect(result).toMatchObject({ rowCount: 2000, committed: true });
    expect(result.preview).toHaveLength(2000);
    const [stored] = await sql<{ n: string; calibrated: string }>(
      'select count(*) as n, count(calibration) as calibrated from samples where site_id = $1',
      [siteId],
    );
    expect(stored).toEqual({ n: '2000', calibrated: '2000' });
  });
});

describe('a sheet whose calibrations run past the budget', () => {
  let strict: TestServer;

  beforeAll(async () => {
    // A 1 ms budget: 2,000 calibrations take longer on any machine (tens of milliseconds at least).
    strict = await startTestServer({ IMPORT_CALIBRATION_BUDGET_MS: '1' });
  });

  afterAll(async () => {
    await strict?.close();
  });

  it('is refused whole with a message naming the budget, and nothing is stored', async () => {
    const siteId = await newSite();
    const researcher = await new GraphqlClient(strict.url).signIn(fixture.emails.RESEARCHER, PASSWORD);
    const error = await researcher.errorOf(IMPORT, { i: { siteId, csv: bulkSheet('SLOW'), commit: true } });
    expect(error).toMatchObject({ code: 'BAD_USER_INPUT', field: 'csv' });
    expect(error.message).toMatch(/2,000 datings took longer than the import allows \(0\.001 s\); nothing was imported/);
    expect(await samplesOf(siteId)).toBe(0);
    // A sheet with nothing to calibrate (no method column) has nothing to time: its problems come back as usual.
    const methodless = await researcher.ok<{ importSamples: ImportResult }>(IMPORT, { i: { siteId, csv: 'labCode,unit,depthM\nX-1,U9,1', commit: true } });
    expect(methodless.importSamples.committed).toBe(false);
    expect(methodless.importSamples.errors.map((e) => e.field)).toEqual(expect.arrayContaining(['method', 'material']));
  });
});
