/**
 * Load benchmarks through the real API: the built server runs as a child process against a
 * throw-away database beside the configured one, seeded with a 40-site project; autocannon
 * drives the event-ladder query and a 10,000-row lab sheet is imported. Called by `npm run bench`.
 */
import bcrypt from 'bcryptjs';
import { ChildProcess, spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync, readFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { loadavg } from 'node:os';
import { join } from 'node:path';
import { Client, Pool } from 'pg';
import { storeDensity, StoredAgeModelResults } from '../age-models/age-model-results';
import { normalDensity, summarise } from '../chronology/common/density';
import { SeededRandom } from '../chronology/common/random';
import { loadConfig } from '../config/config';

export interface LadderLoadBench {
  sites: number;
  events: number;
  samples: number;
  connections: number;
  seconds: number;
  requests: number;
  /** Requests that failed, answered non-2xx, or carried GraphQL errors in the checked sample. */
  failures: number;
  coldMs: number;
  p50Ms: number;
  p95Ms: number;
  p99Ms: number;
  requestsPerSecond: number;
  responseBytes: number;
  /** Peak resident memory of the API process (VmHWM) after the load, MiB; null off Linux. */
  peakRssMiB: number | null;
  /**
   * CPU time (user + system) the API process spent per request during the load, ms; null off
   * Linux. Less moved than the latencies by other work on a shared machine.
   */
  cpuMsPerRequest: number | null;
  /** The machine's 1-minute load average as the load started (other work on a shared machine). */
  loadAverage: number;
}

export interface ImportBench {
  rows: number;
  validateSeconds: number;
  commitSeconds: number;
  committed: boolean;
  errors: number;
  peakRssMiB: number | null;
}

/** One of issue 17's probes, replayed: how long the API took and how much it answered. */
export interface ProbeBench {
  probe: string;
  ms: number;
  bytes: number;
  /** The first error code, or 'OK'. */
  outcome: string;
}

/** Issue 17's reset timing: answer times of `requestPasswordReset` for addresses with and without an account. */
export interface ResetTimingBench {
  requests: number;
  knownMedianMs: number;
  unknownMedianMs: number;
  knownMs: number[];
  unknownMs: number[];
}

export interface ApiBench {
  /** The ladder query with its densities as points (the page itself now asks for densityGrid). */
  ladder: LadderLoadBench;
  /** The same with the thinned `densityGrid` the schema recommends instead of points. */
  ladderGrid: LadderLoadBench;
  /** The page query with the answer cache off (`LADDER_CACHE_MIB=0`): every request executed. */
  ladderUncached: LadderLoadBench;
  import: ImportBench;
}

export interface ApiProbesBench {
  /** Issue 17's probes with their time and answer size (refused or bounded). */
  probes: ProbeBench[];
  resetTiming: ResetTimingBench;
}

/** What this file uses of autocannon (which ships no types). */
interface AutocannonResult {
  requests: { total: number; average: number };
  errors: number;
  timeouts: number;
  non2xx: number;
  duration: number;
}
interface AutocannonInstance extends PromiseLike<AutocannonResult> {
  on(event: 'response', listener: (client: unknown, statusCode: number, bytes: number, responseTimeMs: number) => void): void;
}
type Autocannon = (options: {
  url: string;
  connections: number;
  duration: number;
  method: 'POST';
  headers: Record<string, string>;
  body: string;
}) => AutocannonInstance;

const SITES = 40;
const EVENTS_PER_SITE = 15;
const SAMPLES_PER_SITE = 50;
const UNITS_PER_SITE = EVENTS_PER_SITE + 1;
const DRAWS = 4000;
const CONNECTIONS = 20;
const LOAD_SECONDS = 10;
const IMPORT_ROWS = 10_000;
const PASSWORD = 'bench-password-1';

/** The ladder query of frontend/src/modules/correlation/graphql/ladder.ts as it was, with densities as points. */
const LADDER_QUERY = `query EventLadder($projectId: ID!) {
  eventLadder(projectId: $projectId) {
    columns {
      site { id name kind alongStrikeKm segment { id name } }
      latestAgeModelRun { id stale }
      events {
        medianCalBp
        eventHorizon { id name quality }
        hpd95 { olderCalBp youngerCalBp probability }
        density { calBp probability }
      }
    }
  }
  project(id: $projectId) { id name myRole myPermissions tectonicSetting hypotheses { id name preferred version } }
}`;

/** The query the ladder page sends now: `densityGrid` in place of `density` points. */
const LADDER_GRID_QUERY = LADDER_QUERY.replace('density { calBp probability }', 'densityGrid { startCalBp stepYears values }');

const IMPORT_MUTATION = `mutation($i: ImportSamplesInput!) { importSamples(input: $i) { rowCount committed errors { row field message } } }`;

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.on('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

function withDatabase(base: string, database: string): string {
  const url = new URL(base);
  url.pathname = `/${database}`;
  return url.toString();
}

function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return Number.NaN;
  return sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))];
}

/** Peak resident set of a process from /proc (Linux), MiB. */
function peakRssMiB(pid: number | undefined): number | null {
  const status = `/proc/${pid}/status`;
  if (pid === undefined || !existsSync(status)) return null;
  const match = /VmHWM:\s+(\d+) kB/.exec(readFileSync(status, 'utf8'));
  return match ? Number(match[1]) / 1024 : null;
}

/** CPU time (user + system) a process has used so far, ms, from /proc (Linux); null elsewhere. */
function cpuMs(pid: number | undefined): number | null {
  const stat = `/proc/${pid}/stat`;
  if (pid === undefined || !existsSync(stat)) return null;
  // Fields after the command name (which may hold spaces): utime and stime are the 12th and 13th, in clock ticks.
  const text = readFileSync(stat, 'utf8');
  const fields = text.slice(text.lastIndexOf(')') + 2).split(' ');
  return ((Number(fields[11]) + Number(fields[12])) * 1000) / CLOCK_TICKS_PER_SECOND;
}

/** Linux's USER_HZ, the unit of /proc's CPU times (100 on every common architecture) [common practice]. */
const CLOCK_TICKS_PER_SECOND = 100;

/**
 * The invented bench project: 40 cores along a 600 km margin, 16 units and 15 event horizons
 * each, 50 radiocarbon samples each, and a SUCCEEDED age model run per site whose results are
 * stored as the worker stores them (normal posteriors, 4,000 joint draws).
 */
export async function seedProject(pool: Pool): Promise<{ projectId: string; email: string }> {
  const random = new SeededRandom(40_600);
  const email = 'bench-viewer@stratochron.test';
  const hash = await bcrypt.hash(PASSWORD, 4);
  const project = await pool.query<{ id: string }>(`insert into projects (name, tectonic_setting) values ('Bench margin', 'SUBDUCTION_INTERFACE') returning id`);
  const projectId = project.rows[0].id;
  const user = await pool.query<{ id: string }>(`insert into users (email, display_name, password_hash) values ($1, 'Bench researcher', $2) returning id`, [email, hash]);
  await pool.query(`insert into memberships (project_id, user_id, role) values ($1, $2, 'RESEARCHER')`, [projectId, user.rows[0].id]);
  let labCode = 0;
  for (let s = 0; s < SITES; s++) {
    const site = await pool.query<{ id: string }>(
      `insert into sites (project_id, name, kind, latitude, longitude, along_strike_km) values ($1, $2, 'CORE', $3, $4, $5) returning id`,
      [projectId, `Bench core ${s + 1}`, -38 - s * 0.12, 176 + s * 0.05, s * 15],
    );
    const siteId = site.rows[0].id;
    const units = await pool.query<{ id: string }>(
      `insert into units (site_id, position, name, top_depth_m, base_depth_m, facies)
       select $1, p, 'U' || p, ${UNITS_PER_SITE} - p, ${UNITS_PER_SITE + 1} - p, 'TURBIDITE' from generate_series(1, ${UNITS_PER_SITE}) p
       returning id`,
      [siteId],
    );
    const unitIds = units.rows.map((row) => row.id);
    const horizons = await pool.query<{ id: string }>(
      `insert into event_horizons (site_id, name, unit_below_id, unit_above_id, quality)
       select $1, 'E' || (e + 1), ($2::uuid[])[e + 1], ($2::uuid[])[e + 2], 1 + e % 4 from generate_series(0, ${EVENTS_PER_SITE - 1}) e
       returning id`,
      [siteId, unitIds],
    );
    const sampleRows = Array.from({ length: SAMPLES_PER_SITE }, (_, i) => {
      const unit = i % UNITS_PER_SITE;
      labCode += 1;
      return { unitId: unitIds[unit], labCode: `BN-${labCode}`, depth: UNITS_PER_SITE + 0.9 - unit - 0.01 * (i % 50), c14: 6400 - 380 * unit + random.integer(60) };
    });
    await pool.query(
      `insert into samples (project_id, site_id, unit_id, lab_code, method, material, depth_m, age_relation, c14_age, c14_error, curve)
       select $1, $2, r.unit_id, r.lab_code, 'RADIOCARBON', 'DETRITAL_CHARCOAL', r.depth_m, 'OLDER_THAN_DEPOSIT', r.c14_age, 30, 'INTCAL20'
         from jsonb_to_recordset($3::jsonb) as r(unit_id uuid, lab_code text, depth_m float8, c14_age float8)`,
      [projectId, siteId, JSON.stringify(sampleRows.map((r) => ({ unit_id: r.unitId, lab_code: r.labCode, depth_m: r.depth, c14_age: r.c14 })))],
    );
    const events = horizons.rows.map((horizon, e) => {
      const density = normalDensity(6000 - 380 * e, 30 + ((s * 7 + e * 13) % 50));
      return { eventHorizonId: horizon.id, summary: summarise(density), rhat: 1.01, ess: 1200, density: storeDensity(density) };
    });
    // Oldest first, as the worker stores them; each draw row keeps the events in order.
    const draws: number[] = [];
    for (let d = 0; d < DRAWS; d++) {
      for (let e = 0; e < EVENTS_PER_SITE; e++) draws.push(Math.round((6000 - 380 * e + 40 * random.normal()) * 10) / 10);
    }
    const results: StoredAgeModelResults = {
      events,
      samples: [],
      eventDraws: { eventHorizonIds: events.map((event) => event.eventHorizonId), drawCount: DRAWS, draws },
    };
    await pool.query(
      `insert into age_model_runs (site_id, status, progress, seed, settings, input_snapshot, input_fingerprint, results, started_at, finished_at)
       values ($1, 'SUCCEEDED', 1, 1, '{}', '{}', 'bench', $2::jsonb, now(), now())`,
      [siteId, JSON.stringify(results)],
    );
  }
  return { projectId, email };
}

async function graphql<T>(url: string, token: string | undefined, query: string, variables: Record<string, unknown>): Promise<{ data?: T; errors?: unknown[]; bytes: number }> {
  const response = await fetch(`${url}/graphql`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) },
    body: JSON.stringify({ query, variables }),
  });
  const text = await response.text();
  return { ...(JSON.parse(text) as { data?: T; errors?: unknown[] }), bytes: text.length };
}

async function startApi(databaseUrl: string, jwtSecret: string, extraEnv: Record<string, string> = {}): Promise<{ child: ChildProcess; url: string; log: () => string }> {
  const port = await freePort();
  const output: string[] = [];
  const child = spawn(process.execPath, [join(__dirname, '..', 'main.js')], {
    env: { NODE_ENV: 'test', DATABASE_URL: databaseUrl, PORT: String(port), HOST: '127.0.0.1', JWT_SECRET: jwtSecret, SEED_DEMO: 'false', FRONTEND_DIST: '/nonexistent', ...extraEnv },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout?.on('data', (chunk: Buffer) => output.push(chunk.toString()));
  child.stderr?.on('data', (chunk: Buffer) => output.push(chunk.toString()));
  const url = `http://127.0.0.1:${port}`;
  const log = () => output.join('').slice(-2000);
  const deadline = Date.now() + 60_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the API exited during start:\n${log()}`);
    try {
      if ((await fetch(`${url}/health`)).status === 200) return { child, url, log };
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) {
      child.kill('SIGKILL');
      throw new Error(`the API did not start within 60 s:\n${log()}`);
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

async function benchLadder(url: string, token: string, projectId: string, pid: number | undefined, query: string): Promise<LadderLoadBench> {
  const started = performance.now();
  const first = await graphql<{ eventLadder: { columns: { events: unknown[] }[] } }>(url, token, query, { projectId });
  const coldMs = performance.now() - started;
  if (first.errors?.length || !first.data) throw new Error(`the ladder query failed: ${JSON.stringify(first.errors).slice(0, 500)}`);
  const columns = first.data.eventLadder.columns;
  const events = columns.reduce((sum, column) => sum + column.events.length, 0);
  if (columns.length !== SITES || events !== SITES * EVENTS_PER_SITE) throw new Error(`the ladder has ${columns.length} columns and ${events} events`);

  // Loaded lazily: autocannon is a root development dependency, needed by the bench alone.
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const autocannon = require('autocannon') as Autocannon;
  const times: number[] = [];
  const cpuBefore = cpuMs(pid);
  const loadAverage = loadavg()[0];
  const instance = autocannon({
    url: `${url}/graphql`,
    connections: CONNECTIONS,
    duration: LOAD_SECONDS,
    method: 'POST',
    headers: { 'content-type': 'application/json', authorization: `Bearer ${token}` },
    body: JSON.stringify({ query, variables: { projectId } }),
  });
  // autocannon's own summary stops at p90/p97.5; the target is a p95, so keep every time.
  instance.on('response', (_client, _status, _bytes, responseTimeMs) => times.push(responseTimeMs));
  const result = await instance;
  const cpuAfter = cpuMs(pid);
  times.sort((a, b) => a - b);
  const check = await graphql(url, token, query, { projectId });
  return {
    sites: SITES,
    events,
    samples: SITES * SAMPLES_PER_SITE,
    connections: CONNECTIONS,
    seconds: result.duration,
    requests: result.requests.total,
    failures: result.errors + result.timeouts + result.non2xx + (check.errors?.length ? 1 : 0),
    coldMs,
    p50Ms: percentile(times, 0.5),
    p95Ms: percentile(times, 0.95),
    p99Ms: percentile(times, 0.99),
    requestsPerSecond: result.requests.total / result.duration,
    responseBytes: first.bytes,
    peakRssMiB: peakRssMiB(pid),
    loadAverage,
    cpuMsPerRequest: cpuBefore !== null && cpuAfter !== null && result.requests.total > 0 ? (cpuAfter - cpuBefore) / result.requests.total : null,
  };
}

/** Wait until the API has finished the requests still in flight when the load stopped. */
async function waitUntilQuiet(pool: Pool): Promise<void> {
  const deadline = Date.now() + 60_000;
  let quietSince = Date.now();
  while (Date.now() < deadline) {
    const { rows } = await pool.query<{ n: string }>(
      `select count(*) as n from pg_stat_activity where datname = current_database() and state = 'active' and pid <> pg_backend_pid()`,
    );
    if (Number(rows[0].n) > 0) quietSince = Date.now();
    else if (Date.now() - quietSince > 1000) return;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

/** The trench the lab-sheet import and the duplicate-lab-code probe write to. */
async function createImportTrench(pool: Pool, projectId: string): Promise<string> {
  const site = await pool.query<{ id: string }>(
    `insert into sites (project_id, name, kind, latitude, longitude, along_strike_km) values ($1, 'Bench import trench', 'TRENCH', -41, 174, 700) returning id`,
    [projectId],
  );
  const siteId = site.rows[0].id;
  await pool.query(
    `insert into units (site_id, position, name, top_depth_m, base_depth_m, facies) values
       ($1, 1, 'Lower peat', 2, 3, 'PEAT'), ($1, 2, 'Sand sheet', 1, 2, 'SAND_SHEET'), ($1, 3, 'Upper peat', 0, 1, 'PEAT')`,
    [siteId],
  );
  return siteId;
}

async function benchImport(url: string, token: string, pool: Pool, projectId: string, pid: number | undefined): Promise<ImportBench> {
  const siteId = await createImportTrench(pool, projectId);
  const lines = ['labCode,unit,depthM,method,material,ageRelation,c14Age,c14Error,curve'];
  for (let i = 1; i <= IMPORT_ROWS; i++) {
    const unit = 1 + (i % 3);
    lines.push(`IMP-${i},${unit},${(3.95 - unit - 0.00009 * i).toFixed(5)},RADIOCARBON,DETRITAL_CHARCOAL,OLDER_THAN_DEPOSIT,${3400 - 1000 * unit + (i % 80)},${20 + (i % 40)},INTCAL20`);
  }
  const csv = lines.join('\n');
  type Imported = { importSamples: { rowCount: number; committed: boolean; errors: unknown[] } };
  let started = performance.now();
  const validated = await graphql<Imported>(url, token, IMPORT_MUTATION, { i: { siteId, csv, commit: false } });
  const validateSeconds = (performance.now() - started) / 1000;
  started = performance.now();
  const committed = await graphql<Imported>(url, token, IMPORT_MUTATION, { i: { siteId, csv, commit: true } });
  const commitSeconds = (performance.now() - started) / 1000;
  const outcome = committed.data?.importSamples;
  if (!outcome || validated.errors?.length) throw new Error(`the import failed: ${JSON.stringify(committed.errors ?? validated.errors).slice(0, 500)}`);
  return { rows: outcome.rowCount, validateSeconds, commitSeconds, committed: outcome.committed, errors: outcome.errors.length, peakRssMiB: peakRssMiB(pid) };
}

/** The probe whose answer is as large as the contract's 1-year listing makes it (no size target: no page asks for it). */
export const POINTS_PROBE = 'the same, density as 1-year points, which no page asks for';

/** Replay issue 17's probes once each (bounded: a handful of requests to the local API). */
async function benchProbes(url: string, token: string, pool: Pool, projectId: string, email: string): Promise<ProbeBench[]> {
  const site = await pool.query<{ id: string }>(`select id from sites where project_id = $1 and name = 'Bench import trench'`, [projectId]);
  const aliases = (n: number, field: (i: number) => string) => Array.from({ length: n }, (_, i) => field(i)).join(' ');
  const duplicates = ['labCode,unit,depthM,method,material,c14Age,c14Error,curve', ...Array.from({ length: 2000 }, () => 'DUP-1,1,2.5,RADIOCARBON,DETRITAL_CHARCOAL,2450,30,INTCAL20')].join('\n');
  const probes: [string, string | undefined, string, Record<string, unknown>][] = [
    ['20 aliased calibrate, c14Error 1,000,000', token, `{ ${aliases(20, (i) => `c${i}: calibrate(input: { c14Age: 3000, c14Error: 1000000, curve: INTCAL20 }) { density { calBp probability } }`)} }`, {}],
    // What the calculator page asks (its density as the compact grid), then the 1-year points.
    ['one calibrate at the widest allowed error (20,000)', token, '{ calibrate(input: { c14Age: 3000, c14Error: 20000, curve: INTCAL20 }) { densityGrid { startCalBp stepYears values } } }', {}],
    [POINTS_PROBE, token, '{ calibrate(input: { c14Age: 3000, c14Error: 20000, curve: INTCAL20 }) { density { calBp probability } } }', {}],
    ['calibrateLuminescence, errorYears 1,000,000', token, '{ calibrateLuminescence(input: { ageYears: 5000, errorYears: 1000000, measurementYear: 2020 }) { medianCalBp } }', {}],
    ['100 aliased hypothesis { regionalEvents }', token, `{ ${aliases(100, (i) => `h${i}: hypothesis(id: "00000000-0000-4000-8000-000000000000") { regionalEvents { id } }`)} }`, {}],
    ['20 aliased signIn with the right password', undefined, `mutation { ${aliases(20, (i) => `s${i}: signIn(email: "${email}", password: "${PASSWORD}") { token }`)} }`, {}],
    ['2,000-row lab sheet of one duplicated lab code', token, IMPORT_MUTATION, { i: { siteId: site.rows[0]?.id, csv: duplicates, commit: false } }],
    ['site(id: "42")', token, '{ site(id: "42") { id } }', {}],
  ];
  const results: ProbeBench[] = [];
  for (const [probe, bearer, query, variables] of probes) {
    const started = performance.now();
    const answer = await graphql<unknown>(url, bearer, query, variables);
    const code = (answer.errors?.[0] as { extensions?: { code?: string } } | undefined)?.extensions?.code;
    results.push({ probe, ms: performance.now() - started, bytes: answer.bytes, outcome: answer.errors?.length ? (code ?? 'ERROR') : 'OK' });
  }
  return results;
}

/** Reset requests per kind of address: under the throttle's per-client hour (30), one per address. */
const RESET_REQUESTS = 6;

/**
 * Answer times of `requestPasswordReset` for addresses with an account and without, interleaved,
 * one request per address (the throttle allows five per address an hour). The first request, which
 * creates the job queue, is a warm-up and not counted.
 */
async function benchResetTiming(url: string, pool: Pool): Promise<ResetTimingBench> {
  const hash = await bcrypt.hash(PASSWORD, 4);
  const known: string[] = [];
  for (let i = 0; i < RESET_REQUESTS; i++) {
    const email = `bench-reset-${i}@stratochron.test`;
    await pool.query(`insert into users (email, display_name, password_hash) values ($1, $2, $3)`, [email, `Bench reset ${i}`, hash]);
    known.push(email);
  }
  const mutation = 'mutation($e: String!) { requestPasswordReset(email: $e) }';
  const timed = async (email: string) => {
    const started = performance.now();
    const answer = await graphql<{ requestPasswordReset: boolean }>(url, undefined, mutation, { e: email });
    const ms = performance.now() - started;
    if (answer.errors?.length || answer.data?.requestPasswordReset !== true) throw new Error(`reset request failed: ${JSON.stringify(answer.errors).slice(0, 300)}`);
    return ms;
  };
  await timed('bench-reset-warmup@nowhere.test');
  const knownMs: number[] = [];
  const unknownMs: number[] = [];
  for (let i = 0; i < RESET_REQUESTS; i++) {
    knownMs.push(await timed(known[i]));
    unknownMs.push(await timed(`bench-reset-nobody-${i}@nowhere.test`));
  }
  const median = (values: number[]) => percentile([...values].sort((a, b) => a - b), 0.5);
  return { requests: RESET_REQUESTS, knownMedianMs: median(knownMs), unknownMedianMs: median(unknownMs), knownMs, unknownMs };
}

/** A throw-away database beside the configured one, with the bench project and a started API. */
async function withBenchApi<T>(body: (api: { url: string; pid: number | undefined; pool: Pool; token: string; projectId: string; email: string; restart(env: Record<string, string>): Promise<void> }) => Promise<T>): Promise<T> {
  const config = loadConfig();
  const benchDatabase = `stratochron_bench_${randomBytes(4).toString('hex')}`;
  const admin = new Client({ connectionString: config.databaseUrl });
  await admin.connect();
  await admin.query(`create database "${benchDatabase}"`);
  const databaseUrl = withDatabase(config.databaseUrl, benchDatabase);
  const jwtSecret = randomBytes(24).toString('hex');
  let api: Awaited<ReturnType<typeof startApi>> | undefined;
  const pool = new Pool({ connectionString: databaseUrl, max: 4 });
  // An idle connection ended by the database's drop below is no failure of the bench.
  pool.on('error', () => undefined);
  try {
    api = await startApi(databaseUrl, jwtSecret); // runs the migrations
    const { projectId, email } = await seedProject(pool);
    const signIn = await graphql<{ signIn: { token: string } }>(api.url, undefined, 'mutation($e: String!, $p: String!) { signIn(email: $e, password: $p) { token } }', { e: email, p: PASSWORD });
    const token = signIn.data?.signIn.token;
    if (!token) throw new Error(`sign-in failed: ${JSON.stringify(signIn.errors)}`);
    const handle = {
      url: api.url,
      pid: api.child.pid,
      pool,
      token,
      projectId,
      email,
      restart: async (env: Record<string, string>) => {
        api?.child.kill('SIGKILL');
        api = await startApi(databaseUrl, jwtSecret, env);
        handle.url = api.url;
        handle.pid = api.child.pid;
      },
    };
    return await body(handle);
  } finally {
    api?.child.kill('SIGKILL');
    await pool.end();
    await admin.query(`drop database if exists "${benchDatabase}" with (force)`).catch(() => undefined);
    await admin.end();
  }
}

/** Seed, start the API, load the ladder, import a sheet; the bench database is dropped afterwards. */
export function benchApi(): Promise<ApiBench> {
  return withBenchApi(async (api) => {
    const ladderGrid = await benchLadder(api.url, api.token, api.projectId, api.pid, LADDER_GRID_QUERY);
    await waitUntilQuiet(api.pool);
    const ladder = await benchLadder(api.url, api.token, api.projectId, api.pid, LADDER_QUERY);
    await waitUntilQuiet(api.pool);
    // A second API with the answer cache off, for what every request costs when executed.
    await api.restart({ LADDER_CACHE_MIB: '0' });
    const ladderUncached = await benchLadder(api.url, api.token, api.projectId, api.pid, LADDER_GRID_QUERY);
    await waitUntilQuiet(api.pool);
    const imported = await benchImport(api.url, api.token, api.pool, api.projectId, api.pid);
    return { ladder, ladderGrid, ladderUncached, import: imported };
  });
}

/** Issue 17's probes and the reset timing, on the bench project with no load before them. */
export function benchApiProbes(): Promise<ApiProbesBench> {
  return withBenchApi(async (api) => {
    await createImportTrench(api.pool, api.projectId);
    const probes = await benchProbes(api.url, api.token, api.pool, api.projectId, api.email);
    const resetTiming = await benchResetTiming(api.url, api.pool);
    return { probes, resetTiming };
  });
}
