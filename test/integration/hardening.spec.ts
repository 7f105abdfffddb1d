import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestServer, TestServer } from '../support/app';
import { createProjectFixture, PASSWORD, ProjectFixture, sql } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

let server: TestServer;
let fixture: ProjectFixture;
let viewer: GraphqlClient;

beforeAll(async () => {
  server = await startTestServer();
  fixture = await createProjectFixture('Hardening');
  viewer = await new GraphqlClient(server.url).signIn(fixture.emails.VIEWER, PASSWORD);
});

afterAll(async () => {
  await server?.close();
});

async function post(body: unknown, token?: string): Promise<{ status: number; text: string }> {
  const response = await fetch(`${server.url}/graphql`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) },
    body: typeof body === 'string' ? body : JSON.stringify(body),
  });
  return { status: response.status, text: await response.text() };
}

/** No answer may carry a statement or its parameters. */
function expectNoSql(text: string): void {
  expect(text).not.toMatch(/\bselect\b|\binsert\b|\bupdate\b.*\bset\b|\bfrom "|params:|Failed query/i);
}

function firstError(text: string): { message: string; extensions: { code?: string; field?: string } } {
  return (JSON.parse(text) as { errors: { message: string; extensions: { code?: string; field?: string } }[] }).errors[0];
}

const runTag = Date.now().toString(36);
const NO_SUCH_SITE = '00000000-0000-4000-8000-000000000000';

describe('ids, NUL bytes and coercion (issue 17, item 4)', () => {
  it('refuses a malformed id with 400 BAD_USER_INPUT, literal or variable, and never shows SQL', async () => {
    for (const body of [
      { query: '{ site(id: "42") { id } }' },
      { query: '{ site(id: 42) { id } }' },
      { query: 'query($id: ID!) { site(id: $id) { id } }', variables: { id: '42' } },
      { query: 'mutation($i: CreateUnitInput!) { u: createUnit(input: $i) { id } }', variables: { i: { siteId: 'does-not-exist', name: 'U', position: 1, facies: 'PEAT' } } },
    ]) {
      const { status, text } = await post(body, viewer.token);
      expect(status, text).toBe(400);
      expect(firstError(text).extensions.code).toBe('BAD_USER_INPUT');
      expect(firstError(text).message).toMatch(/not a valid id/);
      expectNoSql(text);
    }
  });

  it('names the variable path at fault', async () => {
    const { text } = await post({ query: 'mutation($i: CreateUnitInput!) { u: createUnit(input: $i) { id } }', variables: { i: { siteId: '42' } } }, viewer.token);
    expect(firstError(text).extensions.field).toBe('i.siteId');
  });

  it('answers a well-formed unknown id NOT_FOUND (control for the refusals above)', async () => {
    const { status, text } = await post({ query: 'query($id: ID!) { site(id: $id) { id } }', variables: { id: NO_SUCH_SITE } }, viewer.token);
    expect(status).toBe(200);
    expect(firstError(text)).toMatchObject({ message: 'site not found', extensions: { code: 'NOT_FOUND' } });
  });

  it('refuses a NUL byte in any string, in variables, literals and JSON values', async () => {
    for (const body of [
      { query: 'mutation($i: CreateProjectInput!) { createProject(input: $i) { id } }', variables: { i: { name: 'a\u0000b' } } },
      { query: 'mutation { createProject(input: { name: "a\\u0000b" }) { id } }' },
      { query: 'query($id: ID!) { site(id: $id) { id } }', variables: { id: `${NO_SUCH_SITE}\u0000` } },
    ]) {
      const { status, text } = await post(body, viewer.token);
      expect(status, text).toBe(400);
      expect(firstError(text).extensions.code).toBe('BAD_USER_INPUT');
      expectNoSql(text);
    }
  });

  it('answers an unknown enum value in variables 400 BAD_USER_INPUT', async () => {
    const { status, text } = await post(
      { query: 'mutation($i: CreateProjectInput!) { createProject(input: $i) { id } }', variables: { i: { name: 'x', tectonicSetting: 'NOPE' } } },
      viewer.token,
    );
    expect(status).toBe(400);
    expect(firstError(text).extensions.code).toBe('BAD_USER_INPUT');
    expect(firstError(text).message).toMatch(/NOPE/);
  });

  it('answers a JSON number beyond double range (1e309) 400 BAD_USER_INPUT', async () => {
    const body = '{"query":"query($i: CalibrateInput!) { calibrate(input: $i) { medianCalBp } }","variables":{"i":{"c14Age":1e309,"c14Error":30,"curve":"INTCAL20"}}}';
    const { status, text } = await post(body, viewer.token);
    expect(status).toBe(400);
    expect(firstError(text).extensions.code).toBe('BAD_USER_INPUT');
  });
});

describe('the cost model (issue 17, item 1)', () => {
  const calibrations = (n: number, error: number) =>
    `{ ${Array.from({ length: n }, (_, i) => `c${i}: calibrate(input: { c14Age: 3000, c14Error: ${error}, curve: INTCAL20 }) { medianCalBp density { calBp probability } }`).join(' ')} }`;

  it('refuses twenty aliased calibrations with a huge error before computing any (probe: 59 MB in 3.7 s before)', async () => {
    const { status, text } = await post({ query: calibrations(20, 1_000_000) }, viewer.token);
    expect(status).toBe(400);
    expect(firstError(text)).toMatchObject({ extensions: { code: 'BAD_USER_INPUT', field: 'query' } });
    expect(firstError(text).message).toMatch(/calibrate 20 times/);
    expect(text.length).toBeLessThan(1000);
  });

  it('still answers a few calibrations in one request (control)', async () => {
    const { status, text } = await post({ query: calibrations(2, 30) }, viewer.token);
    expect(status, text).toBe(200);
    expect(JSON.parse(text).data.c1.medianCalBp).toBeGreaterThan(3000);
  });

  it('refuses a hundred aliased regional-event checks (probe: 2.3 s before)', async () => {
    const query = `{ ${Array.from({ length: 100 }, (_, i) => `h${i}: hypothesis(id: "${NO_SUCH_SITE}") { regionalEvents { id } }`).join(' ')} }`;
    const { status, text } = await post({ query }, viewer.token);
    expect(status).toBe(400);
    expect(firstError(text).message).toMatch(/would cost \d+ units/);
  });

  it('allows one signIn per request (probe: twenty aliased took 1.4 s of hashing)', async () => {
    const query = `mutation { ${Array.from({ length: 20 }, (_, i) => `s${i}: signIn(email: "${fixture.emails.VIEWER}", password: "${PASSWORD}") { token }`).join(' ')} }`;
    const { status, text } = await post({ query });
    expect(status).toBe(400);
    expect(firstError(text).message).toMatch(/signIn 20 times; one request may ask for it at most 1 time/);
  });
});

describe('bounds on uncertainties, sheets and bundles (issue 17, item 2)', () => {
  let researcher: GraphqlClient;
  let siteId: string;

  beforeAll(async () => {
    researcher = await new GraphqlClient(server.url).signIn(fixture.emails.RESEARCHER, PASSWORD);
    const { createSite } = await researcher.ok('mutation($i: CreateSiteInput!) { createSite(input: $i) { id } }', {
      i: { projectId: fixture.projectId, name: 'Bounds trench', kind: 'TRENCH', latitude: -41.2, longitude: 172.5, alongStrikeKm: 40 },
    });
    siteId = createSite.id;
    await researcher.ok('mutation($i: CreateUnitInput!) { createUnit(input: $i) { id } }', {
      i: { siteId, position: 1, name: 'U1', topDepthM: 0, baseDepthM: 3, facies: 'PEAT' },
    });
  });

  it('answers calibrateLuminescence with a 1,000,000-year error BAD_USER_INPUT naming errorYears (probe: memory grew, then INTERNAL_SERVER_ERROR)', async () => {
    const error = await viewer.errorOf('query($i: CalibrateLuminescenceInput!) { calibrateLuminescence(input: $i) { medianCalBp } }', {
      i: { ageYears: 5000, errorYears: 1_000_000, measurementYear: 2020 },
    });
    expect(error).toMatchObject({ code: 'BAD_USER_INPUT', field: 'errorYears' });
  });

  it('refuses a luminescence error whose grid would be wider than IntCal20 (below the 20,000-year cap)', async () => {
    const error = await viewer.errorOf('query($i: CalibrateLuminescenceInput!) { calibrateLuminescence(input: $i) { medianCalBp } }', {
      i: { ageYears: 50_000, errorYears: 10_000, measurementYear: 2020 },
    });
    expect(error).toMatchObject({ code: 'BAD_USER_INPUT', field: 'errorYears' });
    expect(error.message).toMatch(/span of IntCal20/);
  });

  it('refuses storing a sample with a 100,000-year calendar error (probe: 11 MB and 0.8 s on every read)', async () => {
    const unitId = (await researcher.ok<{ site: { units: { id: string }[] } }>('query($id: ID!) { site(id: $id) { units { id } } }', { id: siteId })).site.units[0].id;
    const error = await researcher.errorOf('mutation($i: CreateSampleInput!) { createSample(input: $i) { id } }', {
      i: { siteId, unitId, labCode: 'BIG-1', method: 'LUMINESCENCE', material: 'OTHER', ageRelation: 'DATES_DEPOSIT', calendarAgeBp: 5000, calendarErrorYears: 100_000, measurementYear: 2020 },
    });
    expect(error).toMatchObject({ code: 'BAD_USER_INPUT', field: 'calendarErrorYears' });
  });

  it('answers a 2,000-row lab sheet of one duplicated lab code in under 1 MB (probe: 22 MB)', async () => {
    const rows = Array.from({ length: 2000 }, () => 'DUP-1,U1,1,RADIOCARBON,DETRITAL_CHARCOAL,2450,30,INTCAL20');
    const csv = ['labCode,unit,depthM,method,material,c14Age,c14Error,curve', ...rows].join('\n');
    const { status, text } = await post(
      { query: 'mutation($i: ImportSamplesInput!) { importSamples(input: $i) { rowCount committed errors { row field message } } }', variables: { i: { siteId, csv, commit: false } } },
      researcher.token,
    );
    expect(status).toBe(200);
    expect(text.length).toBeLessThan(1_000_000);
    const result = JSON.parse(text).data.importSamples;
    expect(result.rowCount).toBe(2000);
    expect(result.errors.at(-1)).toMatchObject({ row: 0, field: 'csv', message: expect.stringMatching(/^and 1,800 more problems not listed/) });
    process.stderr.write(`[probe] 2,000 duplicate lab codes: ${text.length} bytes\n`);
  });

  it('refuses a bundle with __proto__ or constructor keys and one with an age error above 20,000 years', async () => {
    const exported = await fetch(`${server.url}/api/projects/${fixture.projectId}/bundle.json`, { headers: { authorization: `Bearer ${researcher.token}` } });
    expect(exported.status).toBe(200);
    const text = await exported.text();
    const send = (body: string) =>
      fetch(`${server.url}/api/projects/import`, { method: 'POST', headers: { 'content-type': 'application/json', authorization: `Bearer ${researcher.token}` }, body });
    const withProto = text.replace('"project":{', '"project":{"__proto__":{"polluted":true},');
    const refused = await send(withProto);
    expect(refused.status).toBe(400);
    expect(await refused.text()).toMatch(/__proto__ is not a field/);
    const bundle = JSON.parse(text);
    bundle.samples.push({
      ref: 'x-1', siteRef: bundle.sites[0].ref, unitRef: bundle.units[0].ref, labCode: 'X-1', method: 'LUMINESCENCE', material: 'OTHER', depthM: null,
      ageRelation: 'DATES_DEPOSIT', c14Age: null, c14Error: null, delta13C: null, curve: null, deltaR: null, deltaRError: null,
      calendarAgeBp: 5000, calendarErrorYears: 100_000, measurementYear: 2020, excluded: false, exclusionReason: null, notes: null,
    });
    const wide = await send(JSON.stringify(bundle));
    expect(wide.status).toBe(400);
    expect(await wide.text()).toMatch(/calendarErrorYears must be at most 20000/);
  });
});

// Runs before the describes below that start more API instances in this process: passport's
// strategy is process-wide, so a closed instance's would answer for this one's tokens.
describe('the low items (issue 17, item 5)', () => {
  const TRAIL = `query($i: AuditTrailInput!) { auditTrail(input: $i) { edges { node { objectType action before after } } } }`;

  it("hides a pending invitation's address and role from a viewer's audit trail, not from an admin's", async () => {
    await sql(`insert into audit_records (project_id, action, object_type, object_id, after) values ($1, 'invite', 'invitation', $2, $3)`, [
      fixture.projectId, NO_SUCH_SITE, JSON.stringify({ email: 'pending@invited.test', role: 'ANALYST' }),
    ]);
    const admin = await new GraphqlClient(server.url).signIn(fixture.emails.ADMIN, PASSWORD);
    const viewer = await new GraphqlClient(server.url).signIn(fixture.emails.VIEWER, PASSWORD);
    const invitationOf = async (client: GraphqlClient) =>
      (await client.ok(TRAIL, { i: { projectId: fixture.projectId, objectType: 'invitation' } })).auditTrail.edges[0].node;
    expect(await invitationOf(viewer)).toEqual({ objectType: 'invitation', action: 'invite', before: null, after: null });
    expect((await invitationOf(admin)).after).toEqual({ email: 'pending@invited.test', role: 'ANALYST' });
  });
});

describe('sign-in throttling instead of lockout (issue 17, item 3)', () => {
  const SIGN_IN = 'mutation($e: String!, $p: String!) { signIn(email: $e, password: $p) { token } }';
  let proxied: TestServer;

  beforeAll(async () => {
    // Behind a proxy on loopback whose X-Forwarded-For is believed: each test client names its address.
    proxied = await startTestServer({ TRUST_PROXY: 'loopback' });
  });

  afterAll(async () => {
    await proxied?.close();
  });

  async function signInFrom(base: string, client: string | undefined, email: string, password: string) {
    const response = await fetch(`${base}/graphql`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', ...(client ? { 'x-forwarded-for': client } : {}) },
      body: JSON.stringify({ query: SIGN_IN, variables: { e: email, p: password } }),
    });
    const body = (await response.json()) as { data?: { signIn: { token: string } }; errors?: { extensions: { code: string } }[] };
    return body.errors?.[0]?.extensions.code ?? 'OK';
  }

  it('after twelve wrong passwords for unknown addresses from one client, a real account signs in from it', async () => {
    const codes: string[] = [];
    for (let i = 0; i < 12; i++) codes.push(await signInFrom(proxied.url, '203.0.113.7', `nobody-${i % 3}-${runTag}@unknown.test`, 'wrong-password'));
    expect(codes.filter((code) => code === 'UNAUTHENTICATED').length).toBeGreaterThanOrEqual(12 - 3 * 2);
    expect(await signInFrom(proxied.url, '203.0.113.7', fixture.emails.CORRELATOR, PASSWORD)).toBe('OK');
  });

  it("never refuses the right password for someone else's failures (another client)", async () => {
    const email = fixture.emails.ADMIN;
    for (let i = 0; i < 8; i++) await signInFrom(proxied.url, '198.51.100.9', email, 'stranger-guess');
    expect(await signInFrom(proxied.url, '198.51.100.9', email, PASSWORD)).toBe('TOO_MANY_REQUESTS');
    expect(await signInFrom(proxied.url, '192.0.2.44', email, PASSWORD)).toBe('OK');
  });

  it('keeps counts in PostgreSQL (shared by replicas) with hashed addresses, and a second server sees them', async () => {
    const email = fixture.emails.RESEARCHER;
    for (let i = 0; i < 5; i++) expect(await signInFrom(proxied.url, '198.51.100.20', email, 'guess')).toBe('UNAUTHENTICATED');
    const replica = await startTestServer({ TRUST_PROXY: 'loopback' });
    try {
      expect(await signInFrom(replica.url, '198.51.100.20', email, PASSWORD)).toBe('TOO_MANY_REQUESTS');
    } finally {
      await replica.close();
    }
    const rows = await sql<{ key: string }>("select key from rate_limits where key like 'signin-%'");
    expect(rows.length).toBeGreaterThan(0);
    expect(rows.some((row) => row.key.includes('@'))).toBe(false);
  });

  it('grows the delay: one second after the fifth failure, two after the sixth', async () => {
    const email = `grow-${Date.now()}@unknown.test`;
    for (let i = 0; i < 5; i++) expect(await signInFrom(proxied.url, '198.51.100.30', email, 'x')).toBe('UNAUTHENTICATED');
    expect(await signInFrom(proxied.url, '198.51.100.30', email, 'x')).toBe('TOO_MANY_REQUESTS');
    await new Promise((resolve) => setTimeout(resolve, 1100));
    expect(await signInFrom(proxied.url, '198.51.100.30', email, 'x')).toBe('UNAUTHENTICATED');
    await new Promise((resolve) => setTimeout(resolve, 1100));
    expect(await signInFrom(proxied.url, '198.51.100.30', email, 'x')).toBe('TOO_MANY_REQUESTS');
  });

  it('ignores X-Forwarded-For unless TRUST_PROXY names the proxy', async () => {
    const email = `spoof-${Date.now()}@unknown.test`;
    for (let i = 0; i < 5; i++) await signInFrom(server.url, `10.0.0.${i}`, email, 'x');
    // Every attempt counted against the one real client address, whatever the header said.
    expect(await signInFrom(server.url, '10.0.0.99', email, 'x')).toBe('TOO_MANY_REQUESTS');
  });

  it('refuses an over-long password or e-mail before hashing (probe: a 10 MB password cost 0.7 s)', async () => {
    const response = await post({ query: SIGN_IN, variables: { e: 'a@b.test', p: 'x'.repeat(10_000) } });
    expect(response.status).toBe(200);
    expect(firstError(response.text).extensions).toMatchObject({ code: 'BAD_USER_INPUT', field: 'password' });
    const reset = await post({ query: 'mutation($e: String!) { requestPasswordReset(email: $e) }', variables: { e: `${'x'.repeat(400)}@b.test` } });
    expect(firstError(reset.text).extensions).toMatchObject({ code: 'BAD_USER_INPUT', field: 'email' });
  });
});

describe('/dev/mail (issue 17, item 5)', () => {
  it('is not served without DEV_MAIL_PAGE=true', async () => {
    expect((await fetch(`${server.url}/dev/mail`)).status).toBe(404);
  });

  it('with the flag, is served to loopback only, never through a proxy', async () => {
    const dev = await startTestServer({ DEV_MAIL_PAGE: 'true', MAIL_FAKE_URL: 'http://127.0.0.1:9' });
    try {
      expect((await fetch(`${dev.url}/dev/mail`)).status).toBe(200);
      expect((await fetch(`${dev.url}/dev/mail`, { headers: { 'x-forwarded-for': '203.0.113.5' } })).status).toBe(404);
    } finally {
      await dev.close();
    }
    const { isLocalRequest } = await import('../../backend/src/mail/dev-mail.controller');
    expect(isLocalRequest({ headers: {}, socket: { remoteAddress: '192.168.1.20' } })).toBe(false);
    expect(isLocalRequest({ headers: {}, socket: { remoteAddress: '::ffff:127.0.0.1' } })).toBe(true);
  });

  it('refuses DEV_MAIL_PAGE and lists bad TRUST_PROXY entries at boot', async () => {
    const { loadConfig } = await import('../../backend/src/config/config');
    const base = { DATABASE_URL: 'postgres://x', JWT_SECRET: 'x'.repeat(40) };
    expect(() => loadConfig({ ...base, NODE_ENV: 'production', DEV_MAIL_PAGE: 'true' })).toThrow(/DEV_MAIL_PAGE must not be true in production/);
    expect(() => loadConfig({ ...base, TRUST_PROXY: '10.0.0.1,not-an-address' })).toThrow(/TRUST_PROXY .* got "not-an-address"/);
    expect(loadConfig({ ...base, TRUST_PROXY: '10.0.0.0/8, loopback' }).trustProxy).toEqual(['10.0.0.0/8', 'loopback']);
  });
});
