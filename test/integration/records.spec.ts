import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { PNG as PngImage } from 'pngjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ObjectStorageService } from '../../backend/src/attachments/object-storage.service';
import { ThumbnailJob } from '../../backend/src/attachments/thumbnail.job';
import { bundleContent, validateBundle } from '../../backend/src/exchange/bundle';
import { ProjectBundle } from '../../backend/src/exchange/bundle-format';
import { S3Fake, startS3Fake } from '../../backend/src/fakes/s3-fake';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, FixtureRole, PASSWORD, ProjectFixture, sql } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

/** A PNG of one colour, written by pngjs (signature, IHDR, IDAT, IEND; RFC 2083 section 3). */
function pngOf(width: number, height: number, rgba: [number, number, number, number]): Buffer {
  const image = new PngImage({ width, height });
  for (let i = 0; i < image.data.length; i += 4) image.data.set(rgba, i);
  return PngImage.sync.write(image);
}
const PNG = pngOf(1, 1, [200, 40, 40, 255]);
// The start of an ELF executable: magic 7f 'E' 'L' 'F' and NUL padding (System V ABI).
const ELF = Buffer.from('7f454c4602010100000000000000000002003e000100000000000000', 'hex');

let s3: S3Fake;
let s3Dir: string;
let server: TestServer;
let fixture: ProjectFixture;
const clients = {} as Record<FixtureRole | 'OUTSIDER', GraphqlClient>;
let siteId: string;
let otherSiteId: string;
let sampleId: string;

interface HttpAnswer {
  status: number;
  headers: Headers;
  bytes: Buffer;
  json<T = Record<string, unknown>>(): T;
  text(): string;
}

async function http(client: GraphqlClient | null, method: string, path: string, body?: Buffer | string, type?: string): Promise<HttpAnswer> {
  const headers: Record<string, string> = {};
  if (client?.token) headers.authorization = `Bearer ${client.token}`;
  if (type) headers['content-type'] = type;
  const response = await fetch(`${server.url}${path}`, { method, headers, body });
  const bytes = Buffer.from(await response.arrayBuffer());
  return {
    status: response.status,
    headers: response.headers,
    bytes,
    json: <T>() => JSON.parse(bytes.toString('utf8')) as T,
    text: () => bytes.toString('utf8'),
  };
}

const upload = (client: GraphqlClient, query: string, bytes: Buffer) =>
  http(client, 'POST', `/api/attachments?${query}`, bytes, 'application/octet-stream');

beforeAll(async () => {
  s3Dir = await mkdtemp(join(tmpdir(), 'stratochron-s3-test-'));
  s3 = await startS3Fake({ port: 0, dataDir: s3Dir });
  server = await startTestServer({
    S3_ENDPOINT: s3.endpoint,
    S3_REGION: 'us-east-1',
    S3_BUCKET: 'records-test',
    S3_ACCESS_KEY_ID: 'fake-access-key',
    S3_SECRET_ACCESS_KEY: 'fake-secret-key',
    S3_FORCE_PATH_STYLE: 'true',
  });
  fixture = await createProjectFixture('Records');
  const anonymous = new GraphqlClient(server.url);
  for (const role of Object.keys(fixture.emails) as FixtureRole[]) clients[role] = await anonymous.signIn(fixture.emails[role], PASSWORD);
  clients.OUTSIDER = await anonymous.signIn(fixture.outsiderEmail, PASSWORD);

  const r = clients.RESEARCHER;
  const { createSegment } = await r.ok(`mutation($i: CreateSegmentInput!) { createSegment(input: $i) { id } }`, {
    i: { projectId: fixture.projectId, name: 'Quarry segment', startKm: 0, endKm: 200 },
  });
  const createSite = `mutation($i: CreateSiteInput!) { createSite(input: $i) { id } }`;
  siteId = (await r.ok(createSite, {
    i: { projectId: fixture.projectId, segmentId: createSegment.id, name: 'Fenwick marsh', kind: 'MARSH', latitude: -43.5, longitude: 172.25, alongStrikeKm: 40, elevationM: 1.5 },
  })).createSite.id;
  otherSiteId = (await r.ok(createSite, {
    i: { projectId: fixture.projectId, name: '=cmd|calc', kind: 'CORE', latitude: -44, longitude: 173.5, alongStrikeKm: 120, waterDepthM: 900 },
  })).createSite.id;
  const unitIds: string[] = [];
  for (const [site, position, top, base, facies] of [
    [siteId, 1, 1, 2, 'TIDAL_MUD'], [siteId, 2, 0, 1, 'PEAT'], [otherSiteId, 1, 0.3, 0.5, 'TURBIDITE'], [otherSiteId, 2, 0, 0.3, 'HEMIPELAGIC_MUD'],
  ] as const) {
    const { createUnit } = await r.ok(`mutation($i: CreateUnitInput!) { createUnit(input: $i) { id } }`, {
      i: { siteId: site, position, name: `${facies} ${position}`, topDepthM: top, baseDepthM: base, facies },
    });
    unitIds.push(createUnit.id);
  }
  const horizon = `mutation($i: CreateEventHorizonInput!) { createEventHorizon(input: $i) { id } }`;
  const e1 = (await r.ok(horizon, { i: { siteId, name: 'Subsidence A', unitBelowId: unitIds[0], unitAboveId: unitIds[1], quality: 1, evidence: ['subsidence'] } }))
    .createEventHorizon.id;
  const e2 = (await r.ok(horizon, { i: { siteId: otherSiteId, name: 'Turbidite 1', unitBelowId: unitIds[2], unitAboveId: unitIds[3], quality: 2 } }))
    .createEventHorizon.id;
  sampleId = (await r.ok(`mutation($i: CreateSampleInput!) { createSample(input: $i) { id } }`, {
    i: {
      siteId, unitId: unitIds[0], labCode: 'FW-1001', method: 'RADIOCARBON', material: 'IN_SITU_PLANT', depthM: 1.2,
      ageRelation: 'DATES_DEPOSIT', c14Age: 1150, c14Error: 30, curve: 'INTCAL20',
    },
  })).createSample.id;
  // A hypothesis with one tie, written directly so this file does not depend on the correlation API.
  const [hypothesis] = await sql<{ id: string }>(
    `insert into hypotheses (project_id, name, preferred) values ($1, 'Margin-wide ruptures', true) returning id`,
    [fixture.projectId],
  );
  await sql(`insert into ties (hypothesis_id, event_a_id, event_b_id, confidence, evidence) values ($1, $2, $3, 2, '{age overlap}')`, [
    hypothesis.id, e1, e2,
  ]);
});

afterAll(async () => {
  await server?.close();
  await s3?.close();
  if (s3Dir) await rm(s3Dir, { recursive: true, force: true });
});

describe('attachments through the S3 fake', () => {
  let attachmentId: string;

  it('stores an uploaded PNG and gives the same bytes back to a member', async () => {
    const stored = await upload(clients.RESEARCHER, `siteId=${siteId}&fileName=${encodeURIComponent('trench log.png')}`, PNG);
    expect(stored.status).toBe(201);
    const record = stored.json<{ id: string; contentType: string; sizeBytes: number; url: string; thumbnailUrl: string }>();
    expect(record).toMatchObject({ contentType: 'image/png', sizeBytes: PNG.length, url: `/api/attachments/${record.id}` });
    attachmentId = record.id;

    const download = await http(clients.VIEWER, 'GET', record.url);
    expect(download.status).toBe(200);
    expect(download.headers.get('content-type')).toBe('image/png');
    expect(download.bytes.equals(PNG)).toBe(true);

    const { site } = await clients.VIEWER.ok(`query($id: ID!) { site(id: $id) { attachments { id fileName contentType sizeBytes url thumbnailUrl } } }`, { id: siteId });
    expect(site.attachments).toEqual([
      { id: attachmentId, fileName: 'trench log.png', contentType: 'image/png', sizeBytes: PNG.length, url: record.url, thumbnailUrl: null },
    ]);
    const audit = await sql(`select action from audit_records where object_type = 'attachment' and object_id = $1`, [attachmentId]);
    expect(audit).toEqual([{ action: 'create' }]);
    // The upload queued its thumbnail; a worker makes it (run here in-process). A 1x1 image is not enlarged.
    const [job] = await sql<{ data: { attachmentId: string } }>(`select data from pgboss.job where name = 'attachment-thumbnail' and data->>'attachmentId' = $1`, [attachmentId]);
    expect(job).toBeDefined();
    await server.app.get(ThumbnailJob).execute(attachmentId);
    const thumbnail = await http(clients.VIEWER, 'GET', `${record.url}/thumbnail`);
    expect(thumbnail.status).toBe(200);
    expect(thumbnail.headers.get('content-type')).toBe('image/png');
    expect([PngImage.sync.read(thumbnail.bytes).width, PngImage.sync.read(thumbnail.bytes).height]).toEqual([1, 1]);
    expect((await http(clients.OUTSIDER, 'GET', `${record.url}/thumbnail`)).status).toBe(404);
  });

  it('shrinks a large photo to a thumbnail of 320 pixels at most, and deletes it with the photo', async () => {
    const bytes = pngOf(1200, 900, [90, 120, 60, 255]);
    const stored = await upload(clients.RESEARCHER, `siteId=${siteId}&fileName=core-photo.png`, bytes);
    expect(stored.status).toBe(201);
    const { id } = stored.json<{ id: string }>();
    await server.app.get(ThumbnailJob).execute(id);
    const { site } = await clients.VIEWER.ok(`query($id: ID!) { site(id: $id) { attachments { id thumbnailUrl } } }`, { id: siteId });
    expect(site.attachments.find((a: { id: string }) => a.id === id).thumbnailUrl).toBe(`/api/attachments/${id}/thumbnail`);
    const thumbnail = PngImage.sync.read((await http(clients.VIEWER, 'GET', `/api/attachments/${id}/thumbnail`)).bytes);
    expect([thumbnail.width, thumbnail.height]).toEqual([320, 240]);
    // A uniform photo stays that colour: area averaging of a constant is the constant [analytic].
    expect(Array.from(thumbnail.data.subarray(0, 4))).toEqual([90, 120, 60, 255]);

    const [{ thumbnail_key: key }] = await sql<{ thumbnail_key: string }>('select thumbnail_key from attachments where id = $1', [id]);
    const storage = server.app.get(ObjectStorageService);
    expect(await storage.get(key)).toBeDefined();
    expect(await clients.RESEARCHER.ok(`mutation($id: ID!) { deleteAttachment(id: $id) }`, { id })).toEqual({ deleteAttachment: true });
    expect(await storage.get(key)).toBeUndefined();
  });

  it('refuses a file named .png whose content is an executable or garbage, writing nothing', async () => {
    const before = await sql<{ n: string }>(`select count(*) as n from attachments where project_id = $1`, [fixture.projectId]);
    for (const bytes of [ELF, Buffer.concat([PNG.subarray(0, 8), Buffer.from([0, 1, 2, 3, 0xff, 0xfe])])]) {
      const refused = await upload(clients.RESEARCHER, `siteId=${siteId}&fileName=photo.png`, bytes);
      expect(refused.status).toBe(400);
      expect(refused.json()).toMatchObject({ code: 'BAD_USER_INPUT', field: 'file' });
    }
    const after = await sql<{ n: string }>(`select count(*) as n from attachments where project_id = $1`, [fixture.projectId]);
    expect(after).toEqual(before);
  });

  it('answers 404 to a non-member and 401 without a token', async () => {
    expect((await http(clients.OUTSIDER, 'GET', `/api/attachments/${attachmentId}`)).status).toBe(404);
    expect((await http(null, 'GET', `/api/attachments/${attachmentId}`)).status).toBe(401);
    expect((await upload(clients.OUTSIDER, `siteId=${siteId}&fileName=a.png`, PNG)).status).toBe(404);
  });

  it('refuses an upload by a VIEWER with 403', async () => {
    const refused = await upload(clients.VIEWER, `siteId=${siteId}&fileName=a.png`, PNG);
    expect(refused.status).toBe(403);
    expect(refused.json()).toMatchObject({ code: 'FORBIDDEN' });
  });

  it('takes a CSV on a sample, lists it on the sample, and deletes it through the API', async () => {
    const csv = Buffer.from('lab_code,age\nFW-1001,1150\n', 'utf8');
    const stored = await upload(clients.RESEARCHER, `sampleId=${sampleId}&fileName=lab-report.csv`, csv);
    expect(stored.status).toBe(201);
    const { id } = stored.json<{ id: string }>();
    const { sample } = await clients.VIEWER.ok(`query($id: ID!) { sample(id: $id) { attachments { id contentType thumbnailUrl } } }`, { id: sampleId });
    expect(sample.attachments).toEqual([{ id, contentType: 'text/csv', thumbnailUrl: null }]);
    expect((await clients.VIEWER.errorOf(`mutation($id: ID!) { deleteAttachment(id: $id) }`, { id })).code).toBe('FORBIDDEN');
    expect(await clients.RESEARCHER.ok(`mutation($id: ID!) { deleteAttachment(id: $id) }`, { id })).toEqual({ deleteAttachment: true });
    expect((await http(clients.VIEWER, 'GET', `/api/attachments/${id}`)).status).toBe(404);
  });

  it('names exactly one owner', async () => {
    const refused = await upload(clients.RESEARCHER, `siteId=${siteId}&sampleId=${sampleId}&fileName=a.png`, PNG);
    expect(refused.status).toBe(400);
  });
});

const RELEASE = `query($id: ID!) { release(id: $id) { id number note createdAt createdBy { email } sites { id name } segments { id name } } }`;
const CREATE_RELEASE = `mutation($i: CreateReleaseInput!) { createRelease(input: $i) { id number } }`;

describe('releases', () => {
  let first: { id: string; number: number };

  it('lets only an ADMIN freeze a release, numbered from 1', async () => {
    expect((await clients.RESEARCHER.errorOf(CREATE_RELEASE, { i: { projectId: fixture.projectId, note: 'v1' } })).code).toBe('FORBIDDEN');
    expect((await clients.OUTSIDER.errorOf(CREATE_RELEASE, { i: { projectId: fixture.projectId, note: 'v1' } })).code).toBe('NOT_FOUND');
    first = (await clients.ADMIN.ok(CREATE_RELEASE, { i: { projectId: fixture.projectId, note: 'v1, submitted with the paper' } })).createRelease;
    expect(first.number).toBe(1);
    const { release } = await clients.VIEWER.ok(RELEASE, { id: first.id });
    expect(release).toMatchObject({ number: 1, note: 'v1, submitted with the paper', createdBy: { email: fixture.emails.ADMIN } });
    expect(release.sites.map((s: { name: string }) => s.name).sort()).toEqual(['=cmd|calc', 'Fenwick marsh']);
    expect(release.segments).toEqual([{ id: expect.any(String), name: 'Quarry segment' }]);
    expect((await clients.OUTSIDER.errorOf(RELEASE, { id: first.id })).code).toBe('NOT_FOUND');
  });

  it('has no mutation that changes a release', async () => {
    const { __type } = await clients.ADMIN.ok(`{ __type(name: "Mutation") { fields { name } } }`);
    const releaseMutations = __type.fields.map((f: { name: string }) => f.name).filter((name: string) => /release/i.test(name));
    expect(releaseMutations).toEqual(['createRelease']);
    const refused = await clients.ADMIN.errorOf(`mutation($id: ID!) { updateRelease(id: $id, note: "changed") { id } }`, { id: first.id });
    expect(refused.code).toBe('GRAPHQL_VALIDATION_FAILED');
  });

  it('keeps its content when the live site is renamed, and the diff shows the rename', async () => {
    const { site } = await clients.RESEARCHER.ok(`query($id: ID!) { site(id: $id) { version } }`, { id: siteId });
    await clients.RESEARCHER.ok(`mutation($id: ID!, $v: Int!, $i: UpdateSiteInput!) { updateSite(id: $id, version: $v, input: $i) { id } }`, {
      id: siteId, v: site.version, i: { name: 'Fenwick marsh east' },
    });
    const { release } = await clients.VIEWER.ok(RELEASE, { id: first.id });
    expect(release.sites.find((s: { id: string }) => s.id === siteId).name).toBe('Fenwick marsh');

    const second = (await clients.ADMIN.ok(CREATE_RELEASE, { i: { projectId: fixture.projectId, note: 'v2' } })).createRelease;
    expect(second.number).toBe(2);
    const { releaseDiff } = await clients.VIEWER.ok(
      `query($a: ID!, $b: ID!) { releaseDiff(fromId: $a, toId: $b) { from { number } to { number } changes { objectType objectId label change } } }`,
      { a: first.id, b: second.id },
    );
    expect(releaseDiff).toEqual({
      from: { number: 1 },
      to: { number: 2 },
      changes: [{ objectType: 'site', objectId: siteId, label: 'Fenwick marsh east', change: 'changed' }],
    });
    const { project } = await clients.VIEWER.ok(`query($id: ID!) { project(id: $id) { releases { number note } } }`, { id: fixture.projectId });
    expect(project.releases).toEqual([{ number: 2, note: 'v2' }, { number: 1, note: 'v1, submitted with the paper' }]);
  });

  it('shows columns, samples and segments below its sites as they stood, not as they are now', async () => {
    const NESTED = `query($id: ID!) { release(id: $id) { sites { id segment { id name } units { id position name basalErosionM }
      eventHorizons { id name unitBelowId unitAboveId } samples { id unitId labCode notes c14Age deltaRSource inheritanceScaleYears } } segments { id name } } }`;
    const frozen = (await clients.VIEWER.ok(NESTED, { id: first.id })).release;
    const site = frozen.sites.find((s: { id: string }) => s.id === siteId);
    const sample = site.samples.find((s: { id: string }) => s.id === sampleId);
    expect(sample).toBeDefined();
    // The bundle-format-2 fields read back as the rows held them when the release was frozen.
    const [stored] = await sql<{ delta_r_source: string | null; inheritance_scale_years: number | null }>(
      'select delta_r_source, inheritance_scale_years from samples where id = $1',
      [sampleId],
    );
    expect({ deltaRSource: sample.deltaRSource, inheritanceScaleYears: sample.inheritanceScaleYears }).toEqual({
      deltaRSource: stored.delta_r_source,
      inheritanceScaleYears: stored.inheritance_scale_years,
    });
    const units = await sql<{ id: string; basal_erosion_m: number | null }>('select id, basal_erosion_m from units where site_id = $1', [siteId]);
    expect(Object.fromEntries(site.units.map((u: { id: string; basalErosionM: number | null }) => [u.id, u.basalErosionM]))).toEqual(
      Object.fromEntries(units.map((u) => [u.id, u.basal_erosion_m])),
    );
    expect(site.units.map((u: { position: number }) => u.position)).toEqual([...site.units.map((u: { position: number }) => u.position)].sort((a, b) => a - b));
    expect(site.units.map((u: { id: string }) => u.id)).toContain(sample.unitId);

    const [{ version }] = await sql<{ version: number }>('select version from samples where id = $1', [sampleId]);
    await clients.RESEARCHER.ok(`mutation($id: ID!, $v: Int!, $i: UpdateSampleInput!) { updateSample(id: $id, version: $v, input: $i) { id } }`, {
      id: sampleId, v: version, i: { notes: 'changed after the release' },
    });
    const segmentIds = frozen.segments.map((s: { id: string }) => s.id);
    await sql(`update segments set name = 'Renamed segment', version = version + 1 where id = any($1::uuid[])`, [segmentIds]);
    try {
      const later = (await clients.VIEWER.ok(NESTED, { id: first.id })).release;
      expect(later).toEqual(frozen);
      const live = (await clients.VIEWER.ok(`query($id: ID!) { sample(id: $id) { notes } }`, { id: sampleId })).sample;
      expect(live.notes).toBe('changed after the release');
    } finally {
      await sql(`update segments set name = 'Quarry segment', version = version + 1 where id = any($1::uuid[])`, [segmentIds]);
    }
  });
});

describe('project bundle', () => {
  it('exports, imports as a new project for any signed-in user, and exports identical content', async () => {
    const exported = await http(clients.VIEWER, 'GET', `/api/projects/${fixture.projectId}/bundle.json`);
    expect(exported.status).toBe(200);
    const original = exported.json<ProjectBundle>();
    expect(validateBundle(original)).toMatchObject({ ok: true });
    expect(original).toMatchObject({ format: 'stratochron-bundle', version: 2 });
    expect([original.sites.length, original.units.length, original.eventHorizons.length, original.samples.length, original.ties.length]).toEqual([2, 4, 2, 1, 1]);

    const imported = await http(clients.OUTSIDER, 'POST', '/api/projects/import', JSON.stringify(original), 'application/json');
    expect(imported.status).toBe(201);
    const { id: newProjectId } = imported.json<{ id: string }>();
    expect(newProjectId).not.toBe(fixture.projectId);
    const { project } = await clients.OUTSIDER.ok(`query($id: ID!) { project(id: $id) { myRole sites { name samples { labCode calibration { medianCalBp } } } } }`, { id: newProjectId });
    expect(project.myRole).toBe('ADMIN');
    const marsh = project.sites.find((s: { name: string }) => s.name === 'Fenwick marsh east');
    expect(marsh.samples[0].calibration.medianCalBp).toBeGreaterThan(900);

    const again = (await http(clients.OUTSIDER, 'GET', `/api/projects/${newProjectId}/bundle.json`)).json<ProjectBundle>();
    // Identical content: every field equal, refs compared by the position of what they point at.
    expect(bundleContent(again)).toEqual(bundleContent(original));
    expect(again.sites.map((s) => s.ref)).not.toEqual(original.sites.map((s) => s.ref));
  });

  it('validates the whole bundle first and writes nothing when any part is wrong', async () => {
    const bundle = (await http(clients.VIEWER, 'GET', `/api/projects/${fixture.projectId}/bundle.json`)).json<ProjectBundle>();
    bundle.project.name = `Broken import ${Date.now()}`;
    bundle.samples[0].unitRef = bundle.units[3].ref; // a unit of the other site
    const refused = await http(clients.OUTSIDER, 'POST', '/api/projects/import', JSON.stringify(bundle), 'application/json');
    expect(refused.status).toBe(400);
    expect(refused.json()).toMatchObject({ code: 'BAD_USER_INPUT', field: 'samples[0].unitRef' });
    expect(await sql(`select id from projects where name = $1`, [bundle.project.name])).toEqual([]);
  });

  it('answers 404 to a non-member and 401 without a token', async () => {
    expect((await http(clients.OUTSIDER, 'GET', `/api/projects/${fixture.projectId}/bundle.json`)).status).toBe(404);
    expect((await http(null, 'GET', `/api/projects/${fixture.projectId}/bundle.json`)).status).toBe(401);
    expect((await http(null, 'POST', '/api/projects/import', '{}', 'application/json')).status).toBe(401);
  });
});

describe('CSV export', () => {
  it('exports every table with formula injection neutralised', async () => {
    for (const table of ['sites', 'units', 'event-horizons', 'samples', 'hypotheses', 'ties']) {
      const answer = await http(clients.VIEWER, 'GET', `/api/projects/${fixture.projectId}/export/${table}.csv`);
      expect(answer.status, table).toBe(200);
      expect(answer.headers.get('content-type')).toMatch(/^text\/csv/);
      expect(answer.text().split('\r\n').length, table).toBeGreaterThan(2);
    }
    const sites = (await http(clients.VIEWER, 'GET', `/api/projects/${fixture.projectId}/export/sites.csv`)).text();
    expect(sites).toContain(",'=cmd|calc,");
    expect(sites).not.toMatch(/(^|,)=cmd/m);
  });

  it('answers 404 for an unknown table and for a non-member', async () => {
    expect((await http(clients.VIEWER, 'GET', `/api/projects/${fixture.projectId}/export/users.csv`)).status).toBe(404);
    expect((await http(clients.OUTSIDER, 'GET', `/api/projects/${fixture.projectId}/export/sites.csv`)).status).toBe(404);
  });
});

/** The RFC 7946 rules a FeatureCollection of points must keep; returns the breaches found. */
function rfc7946Problems(document: Record<string, unknown>): string[] {
  const problems: string[] = [];
  if (document.type !== 'FeatureCollection') problems.push('type must be FeatureCollection (section 3.3)');
  if ('crs' in document) problems.push('no crs member (section 4)');
  if (!Array.isArray(document.features)) return [...problems, 'features must be an array (section 3.3)'];
  document.features.forEach((feature: Record<string, unknown>, i: number) => {
    if (feature.type !== 'Feature') problems.push(`features[${i}].type must be Feature (section 3.2)`);
    if (!('properties' in feature)) problems.push(`features[${i}] needs a properties member (section 3.2)`);
    if (feature.id !== undefined && typeof feature.id !== 'string' && typeof feature.id !== 'number') problems.push(`features[${i}].id must be a string or number`);
    const geometry = feature.geometry as { type?: string; coordinates?: unknown } | null;
    if (!geometry || geometry.type !== 'Point') return void problems.push(`features[${i}].geometry must be a Point (section 3.1.2)`);
    const position = geometry.coordinates;
    if (!Array.isArray(position) || position.length < 2 || position.length > 3 || !position.every((n) => typeof n === 'number')) {
      return void problems.push(`features[${i}] position must be 2 or 3 numbers (section 3.1.1)`);
    }
    const [longitude, latitude] = position as number[];
    if (longitude < -180 || longitude > 180) problems.push(`features[${i}] longitude out of range (section 3.1.1)`);
    if (latitude < -90 || latitude > 90) problems.push(`features[${i}] latitude out of range (section 3.1.1)`);
  });
  return problems;
}

describe('GeoJSON of sites', () => {
  it('is a valid RFC 7946 FeatureCollection with [longitude, latitude] positions', async () => {
    const answer = await http(clients.VIEWER, 'GET', `/api/projects/${fixture.projectId}/sites.geojson`);
    expect(answer.status).toBe(200);
    expect(answer.headers.get('content-type')).toMatch(/^application\/geo\+json/);
    const document = answer.json<{ features: { id: string; geometry: { coordinates: number[] }; properties: Record<string, unknown> }[] }>();
    expect(rfc7946Problems(document)).toEqual([]);
    const marsh = document.features.find((f) => f.id === siteId)!;
    expect(marsh.geometry.coordinates).toEqual([172.25, -43.5]);
    expect(marsh.properties).toEqual({ name: 'Fenwick marsh east', kind: 'MARSH', alongStrikeKm: 40, segment: 'Quarry segment' });
    expect(document.features.find((f) => f.id === otherSiteId)!.properties.segment).toBeNull();
  });

  it('the validator above catches breaches (so it can fail)', () => {
    expect(rfc7946Problems({ type: 'FeatureCollection', crs: {}, features: [{ type: 'Feature', properties: {}, geometry: { type: 'Point', coordinates: [-43.5, 172.25] } }] }))
      .toEqual(['no crs member (section 4)', 'features[0] latitude out of range (section 3.1.1)']);
  });

  it('needs a bearer token and membership', async () => {
    expect((await http(null, 'GET', `/api/projects/${fixture.projectId}/sites.geojson`)).status).toBe(401);
    expect((await http(clients.OUTSIDER, 'GET', `/api/projects/${fixture.projectId}/sites.geojson`)).status).toBe(404);
  });
});
