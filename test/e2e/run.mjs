// Browser journeys: the app started as `npm start` starts it (fakes, server, one worker) against
// a throwaway `stratochron_e2e` database, driven by playwright-core through Debian's Chromium.
//
// They run with `npm test` (E2E=0 skips them), or alone. DATABASE_URL names a database on the
// server to use: the journeys recreate `<that name>_e2e` beside it (`stratochron_e2e` when it
// names `postgres`), so people sharing one server do not wipe each other's. The report goes to
// STRATOCHRON_TEST_RESULTS_FILE, default .data/e2e/results.json:
//   DATABASE_URL=postgres://postgres@127.0.0.1:54349/stratochron_me node test/e2e/run.mjs
// Every journey runs at each width of E2E_WIDTHS (default 1440,1024 px); E2E_ONLY=<regexp> runs
// only the journeys whose title matches.
// Screenshots land in .data/e2e/screenshots/, process logs in .data/e2e/logs/. Exits non-zero
// when a journey fails; a journey fails on any browser console error or page error.
import { execFileSync, spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { createWriteStream, existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { dirname, join } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { fileURLToPath } from 'node:url';
import pg from 'pg';
import { chromium } from 'playwright-core';
import { PNG } from 'pngjs';

const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const E2E_DIR = join(ROOT, '.data', 'e2e');
const SHOTS_DIR = join(E2E_DIR, 'screenshots');
const LOGS_DIR = join(E2E_DIR, 'logs');
const RESULTS_FILE = process.env.STRATOCHRON_TEST_RESULTS_FILE || join(E2E_DIR, 'results.json');
const CHROMIUM = '/usr/bin/chromium';
/** The throwaway database: named after DATABASE_URL's, so engineers sharing a server keep apart. */
function e2eDatabaseName() {
  const named = process.env.DATABASE_URL ? decodeURIComponent(new URL(process.env.DATABASE_URL).pathname.slice(1)) : '';
  const base = !named || named === 'postgres' ? 'stratochron' : named.replace(/[^a-z0-9_]/gi, '_').slice(0, 50);
  return `${base}_e2e`;
}
const DATABASE = e2eDatabaseName();
const WIDTHS = (process.env.E2E_WIDTHS || '1440,1024').split(',').map(Number).filter((width) => width >= 320);
const PASSWORD = 'stratochron-demo';
const HEALTH_TIMEOUT_MS = 120_000;
// The demo's age model runs share the machine's cores with whatever else runs there; E2E_DEMO_TIMEOUT_S raises the wait.
const DEMO_JOBS_TIMEOUT_MS = Number(process.env.E2E_DEMO_TIMEOUT_S || 900) * 1000;
const JOURNEY_TIMEOUT_MS = 120_000;
const STEP_TIMEOUT_MS = 20_000;

function log(message) {
  console.log(`[e2e] ${message}`);
}

function ensureChromium() {
  if (existsSync(CHROMIUM)) return;
  if (process.getuid?.() !== 0) throw new Error(`${CHROMIUM} is missing and only root can apt-get install chromium`);
  log('installing chromium');
  execFileSync('apt-get', ['install', '-y', 'chromium'], { stdio: 'inherit' });
}

/**
 * `npm run build -w <workspace>` when its sources changed (scripts/lib/build.mjs, as `npm start`
 * does), in a child because that helper exits on failure. A failed build stops the journeys: run
 * against an earlier dist they would pass or fail on code that is not the code under test.
 */
function ensureBuilt(workspace) {
  const script = `import('./scripts/lib/build.mjs').then((build) => build.ensureBuilt(${JSON.stringify(workspace)}))`;
  try {
    execFileSync(process.execPath, ['--input-type=module', '-e', script], { cwd: ROOT, stdio: 'inherit' });
  } catch (error) {
    throw new Error(`the ${workspace} build failed, so the journeys do not run (an earlier build would test other code): ${error.message}`);
  }
}

function freePort() {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });
}

/** The URL of `database` on the server DATABASE_URL points at. */
function databaseUrl(name) {
  const url = new URL(process.env.DATABASE_URL);
  url.pathname = `/${name}`;
  return url.toString();
}

async function recreateDatabase() {
  const admin = new pg.Client({ connectionString: process.env.DATABASE_URL });
  await admin.connect();
  try {
    await admin.query(`drop database if exists ${DATABASE} with (force)`);
    await admin.query(`create database ${DATABASE}`);
  } finally {
    await admin.end();
  }
}

/** Started children, killed in reverse order at the end whatever happened. */
const children = [];

function launch(role, entry, env) {
  const logFile = createWriteStream(join(LOGS_DIR, `${role}.log`));
  const child = spawn(process.execPath, [entry], { cwd: ROOT, env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
  child.stdout.pipe(logFile);
  child.stderr.pipe(logFile);
  child.exited = new Promise((resolve) => child.once('exit', resolve));
  children.push({ role, child });
  return child;
}

async function stopAll() {
  for (const { child } of [...children].reverse()) {
    if (child.exitCode === null && child.signalCode === null) child.kill('SIGTERM');
  }
  await Promise.race([Promise.all(children.map(({ child }) => child.exited)), sleep(10_000)]);
  for (const { child } of children) {
    if (child.exitCode === null && child.signalCode === null) child.kill('SIGKILL');
  }
}

async function waitFor(what, check, timeoutMs) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    for (const { role, child } of children) {
      if (child.exitCode !== null) throw new Error(`${role} exited with code ${child.exitCode} while waiting for ${what} (see .data/e2e/logs/${role}.log)`);
    }
    if (await check().catch(() => false)) return;
    await sleep(1000);
  }
  throw new Error(`timed out after ${timeoutMs / 1000} s waiting for ${what}`);
}

async function startApp() {
  const [appPort, smtpPort, mailHttpPort, s3Port] = [await freePort(), await freePort(), await freePort(), await freePort()];
  const storage = {
    S3_BUCKET: 'stratochron-attachments',
    S3_ACCESS_KEY_ID: 'stratochron-local',
    S3_SECRET_ACCESS_KEY: 'stratochron-local-secret',
    S3_REGION: 'us-east-1',
  };
  const fakesDir = join(E2E_DIR, 'fakes');
  rmSync(fakesDir, { recursive: true, force: true });
  mkdirSync(fakesDir, { recursive: true });
  launch('fakes', join(ROOT, 'backend', 'dist', 'fakes', 'main.js'), {
    FAKE_SMTP_PORT: String(smtpPort),
    FAKE_MAIL_HTTP_PORT: String(mailHttpPort),
    FAKE_S3_PORT: String(s3Port),
    FAKE_DATA_DIR: fakesDir,
    ...storage,
  });
  const baseUrl = `http://127.0.0.1:${appPort}`;
  const serverEnv = {
    DATABASE_URL: databaseUrl(DATABASE),
    PORT: String(appPort),
    HOST: '127.0.0.1',
    NODE_ENV: 'development',
    SEED_DEMO: 'true',
    JWT_SECRET: randomBytes(30).toString('base64url'),
    PUBLIC_URL: baseUrl,
    FRONTEND_DIST: join(ROOT, 'frontend', 'dist'),
    DEMO_ACCOUNTS_FILE: join(E2E_DIR, 'demo-accounts.json'),
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(smtpPort),
    S3_ENDPOINT: `http://127.0.0.1:${s3Port}`,
    ...storage,
  };
  launch('server', join(ROOT, 'backend', 'dist', 'main.js'), serverEnv);
  await waitFor('/health', async () => (await fetch(`${baseUrl}/health`, { signal: AbortSignal.timeout(2000) })).status === 200, HEALTH_TIMEOUT_MS);
  launch('worker', join(ROOT, 'backend', 'dist', 'worker.js'), serverEnv);
  return baseUrl;
}

async function waitForDemoRuns() {
  const client = new pg.Client({ connectionString: databaseUrl(DATABASE) });
  await client.connect();
  try {
    await waitFor(
      'the demo age model runs',
      async () => {
        const { rows } = await client.query(
          `select (select count(*) from age_model_runs) as total,
                  (select count(*) from age_model_runs where status in ('QUEUED','RUNNING')) as pending`,
        );
        return Number(rows[0].total) > 0 && Number(rows[0].pending) === 0;
      },
      DEMO_JOBS_TIMEOUT_MS,
    );
  } finally {
    await client.end();
  }
}

async function graphql(baseUrl, query, variables, token) {
  const response = await fetch(`${baseUrl}/graphql`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) },
    body: JSON.stringify({ query, variables }),
    signal: AbortSignal.timeout(10_000),
  });
  return response.json();
}

function check(condition, message) {
  if (!condition) throw new Error(message);
}

/**
 * Wait until `locator` matches a number of elements `accept` takes (rows appear one render at a
 * time, so counting right after the first appears reads a partial table), then return the count.
 */
async function waitForCount(locator, accept, what, timeoutMs = STEP_TIMEOUT_MS) {
  const deadline = Date.now() + timeoutMs;
  let count = await locator.count();
  while (!accept(count)) {
    if (Date.now() > deadline) throw new Error(`${what}: found ${count} after ${timeoutMs / 1000} s`);
    await sleep(200);
    count = await locator.count();
  }
  return count;
}

/**
 * Editing controls a viewer must not see. The researcher journey asserts each is present by the
 * same name, so renaming a control fails that journey instead of making the viewer's absence
 * check pass vacuously.
 */
const EDIT_CONTROLS = {
  project: ['Add site', 'Add segment'],
  site: ['Add unit', 'Add event horizon', 'Edit site'],
  ageModel: ['Start run'],
};

async function checkControls(page, names, present, who) {
  for (const name of names) {
    const count = await page.getByRole('button', { name, exact: true }).count();
    check(present ? count > 0 : count === 0, `${who} ${present ? 'does not see' : 'sees'} "${name}"`);
  }
}

// ---------------------------------------------------------------- journeys

async function signIn(page, baseUrl, email) {
  await page.goto(`${baseUrl}/projects`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('link', { name: 'Velmora Margin' }).first().waitFor();
}

async function openProject(page) {
  await page.getByRole('link', { name: 'Velmora Margin' }).first().click();
  await page.getByRole('button', { name: 'Add site' }).or(page.getByText('Sites').first()).first().waitFor();
}

/** The first demo site's link in the project's sites table. */
function firstSiteLink(page) {
  return page.locator('table a[href*="/sites/"]').first();
}

const LAB_SHEET_HEADER = 'labCode,unit,depthM,method,material,c14Age,c14Error,curve';

async function researcherBuildsSite(page, { baseUrl, shot, width, round }) {
  const siteName = `E2E Marsh ${width}`;
  await signIn(page, baseUrl, 'researcher@demo.test');
  await openProject(page);
  await firstSiteLink(page).waitFor();
  await checkControls(page, EDIT_CONTROLS.project, true, 'the researcher');
  await shot('project');

  await page.getByRole('button', { name: 'Add site' }).click();
  const siteDialog = page.getByRole('dialog');
  await siteDialog.locator('#name').fill(siteName);
  await siteDialog.locator('#latitude').fill('-38.5');
  await siteDialog.locator('#longitude').fill('176.2');
  await siteDialog.locator('#alongStrikeKm').fill('312');
  await siteDialog.locator('#elevationM').fill('2');
  await shot('site-dialog');
  await siteDialog.getByRole('button', { name: 'Add site' }).click();
  await siteDialog.waitFor({ state: 'detached' });
  await page.getByRole('link', { name: siteName, exact: true }).click();
  await page.getByRole('button', { name: 'Add unit' }).waitFor();

  for (const [name, top, base] of [
    ['tidal mud', '1.3', '2.0'],
    ['peat', '0.5', '1.2'],
  ]) {
    await page.getByRole('button', { name: 'Add unit' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.locator('#name').fill(name);
    await dialog.locator('#topDepthM').fill(top);
    await dialog.locator('#baseDepthM').fill(base);
    await dialog.getByRole('button', { name: 'Add unit' }).click();
    await dialog.waitFor({ state: 'detached' });
    await page.getByRole('cell', { name, exact: true }).waitFor();
  }
  // A unit inserted mid-column, below the peat, into the 1.2-1.3 m gap: the dialog fills the gap's
  // depths and position 2, says the peat moves up, and the server renumbers it in the same write.
  await page.getByRole('button', { name: 'Insert a unit below peat' }).click();
  const insertDialog = page.getByRole('dialog');
  await insertDialog.locator('#name').fill('sand lens');
  check((await insertDialog.locator('#topDepthM').inputValue()) === '1.2' && (await insertDialog.locator('#baseDepthM').inputValue()) === '1.3', 'the insert dialog does not fill the gap below the peat');
  await insertDialog.getByTestId('unit-insert-note').waitFor();
  await shot('unit-insert');
  await insertDialog.getByRole('button', { name: 'Insert unit' }).click();
  await insertDialog.waitFor({ state: 'detached' });
  await page.getByRole('cell', { name: 'sand lens', exact: true }).waitFor();
  const positions = async (name) => (await page.locator('tr', { has: page.getByRole('cell', { name, exact: true }) }).first().locator('td').first().innerText()).trim();
  check((await positions('sand lens')) === '2' && (await positions('peat')) === '3' && (await positions('tidal mud')) === '1', 'inserting below the peat did not renumber the column 1, 2, 3');
  // Every site control is offered once the column has two units (a horizon lies between two).
  await checkControls(page, EDIT_CONTROLS.site, true, 'the researcher');
  await page.getByRole('button', { name: 'Add event horizon' }).click();
  const horizonDialog = page.getByRole('dialog');
  await horizonDialog.locator('#name').fill('E1');
  // Typed evidence tags: Enter adds each one and leaves the dialog open for the next.
  for (const tag of ['sand sheet', 'buried soil']) {
    await horizonDialog.locator('#evidence').fill(tag);
    await horizonDialog.locator('#evidence').press('Enter');
  }
  const typedTags = horizonDialog.locator('.bp6-tag-input .bp6-tag');
  check((await horizonDialog.count()) === 1 && (await waitForCount(typedTags, (count) => count >= 2, 'typed evidence tags')) === 2, 'Enter in the evidence field did not keep the dialog open for a second tag');
  await shot('horizon-dialog');
  await horizonDialog.getByRole('button', { name: 'Add event horizon' }).click();
  await horizonDialog.waitFor({ state: 'detached' });
  await page.getByRole('cell', { name: 'E1' }).first().waitFor();
  await shot('column');

  await page.getByRole('tab', { name: /Samples/ }).click();
  await page.getByRole('button', { name: 'Import CSV' }).click();
  const importDialog = page.getByRole('dialog');
  // Lab codes are unique in a project: each width's round imports its own.
  const [firstCode, secondCode] = [`E2E-${width}-101`, `E2E-${width}-102`];
  // The laboratory calls the lab code "Lab ID": the first round maps it once (one problem names
  // the header, in the Header row, not "row 0"); the project remembers it for the next round.
  const labHeader = LAB_SHEET_HEADER.replace('labCode', 'Lab ID');
  const sheet = (secondError) =>
    [labHeader, `${firstCode},tidal mud,1.5,RADIOCARBON,PLANT_MACROFOSSIL,1480,30,INTCAL20`, `${secondCode},peat,0.8,RADIOCARBON,PLANT_MACROFOSSIL,1210,${secondError},INTCAL20`].join('\n');
  await importDialog.locator('#import-csv').fill(sheet(0));
  await importDialog.getByRole('button', { name: 'Check sheet' }).click();
  const choices = importDialog.getByTestId('import-column-choices');
  await choices.waitFor();
  const labIdRow = choices.locator('tr', { hasText: 'Lab ID' });
  if ((await labIdRow.innerText()).includes('not recognised')) {
    const headerProblems = importDialog.getByTestId('import-problems').locator('tr', { hasText: 'not recognised:' });
    await headerProblems.first().waitFor();
    check((await headerProblems.count()) === 1, `the unrecognised header is reported ${await headerProblems.count()} times, not once`);
    check((await headerProblems.first().locator('td').first().innerText()).trim() === 'Header', 'a header problem is not reported on the Header row');
    await shot('import-header-mapping');
    await importDialog.getByLabel('Field held by column Lab ID').selectOption('labCode');
  } else {
    check(round > 0 && (await labIdRow.innerText()).includes('remembered for this project'), 'the Lab ID mapping is neither asked for nor remembered');
  }
  const problemRow = importDialog.getByTestId('import-problems').locator('tr', { hasText: 'c14Error' });
  await problemRow.waitFor();
  check((await problemRow.locator('td').first().innerText()).trim() === 'Row 2', 'the c14Error problem is not reported on row 2');
  await shot('import-row-error');
  await importDialog.locator('#import-csv').fill(sheet(25));
  await importDialog.getByRole('button', { name: 'Check sheet' }).click();
  const commit = importDialog.getByRole('button', { name: 'Import 2 samples' });
  await commit.waitFor();
  await shot('import-checked');
  await commit.click();
  await importDialog.getByText('Imported').first().waitFor();
  await importDialog.getByRole('button', { name: 'Done' }).click();
  await importDialog.waitFor({ state: 'detached' });

  // The calibrated 95.4 % ranges sit in the samples grid beside each lab code.
  for (const labCode of [firstCode, secondCode]) {
    await page.getByText(labCode, { exact: true }).first().waitFor();
  }
  const rangeCells = page.locator('.bp6-table-cell, .bp5-table-cell').filter({ hasText: /\d+\s*[–-]\s*\d+/ });
  await waitForCount(rangeCells, (count) => count >= 2, 'calibrated range cells for both samples');
  await shot('samples');

  // A core photo: stored, then shown by the thumbnail a worker makes.
  const photo = new PNG({ width: 900, height: 600 });
  for (let i = 0; i < photo.data.length; i += 4) photo.data.set([120 + ((i / 4) % 900 > 450 ? 60 : 0), 100, 70, 255], i);
  await page.getByRole('tab', { name: 'Files' }).click();
  await page.locator('input[type=file]').first().setInputFiles({ name: 'core-photo.png', mimeType: 'image/png', buffer: PNG.sync.write(photo) });
  await page.getByRole('button', { name: 'Upload' }).click();
  await page.getByText('core-photo.png').first().waitFor();
  await page.locator('img.sc-file-thumb').first().waitFor({ timeout: 30_000 });
  await shot('files');
}

async function researcherRunsAgeModel(page, { baseUrl, shot, round }) {
  // A seed of its own per width: the page must show this run, not the one of an earlier round.
  const seed = String(7 + round);
  await signIn(page, baseUrl, 'researcher@demo.test');
  await openProject(page);
  const siteId = (await firstSiteLink(page).getAttribute('href'))?.match(/\/sites\/([0-9a-f-]{36})/)?.[1];
  check(siteId, 'the first site link names no site id');
  await firstSiteLink(page).click();
  // The run lists one row per event horizon of the column: how many there are comes from the API
  // (counting rows right after the first appears would read a partially drawn table), and the
  // site page must show them all.
  const signedIn = await graphql(baseUrl, 'mutation ($email: String!, $password: String!) { signIn(email: $email, password: $password) { token } }', {
    email: 'researcher@demo.test',
    password: PASSWORD,
  });
  const token = signedIn.data?.signIn?.token;
  check(token, `the researcher cannot sign in over GraphQL: ${JSON.stringify(signedIn.errors)}`);
  const column = await graphql(baseUrl, 'query ($id: ID!) { site(id: $id) { eventHorizons { id } } }', { id: siteId }, token);
  const expected = column.data?.site?.eventHorizons?.length;
  check(expected > 0, `the first site has no event horizons over GraphQL: ${JSON.stringify(column.errors ?? column.data)}`);
  const horizonRows = page.locator('.sc-section', { hasText: 'Event horizons' }).locator('tbody tr');
  await waitForCount(horizonRows, (count) => count === expected, `${expected} event horizon rows on the site page`);
  await page.getByRole('link', { name: /age model/i }).first().click();
  await page.getByRole('button', { name: 'Start run' }).waitFor();
  await checkControls(page, EDIT_CONTROLS.ageModel, true, 'the researcher');
  // The run form offers both depth models and the outlier shift scale.
  await page.getByRole('radio', { name: 'Order only' }).waitFor();
  await page.getByRole('radio', { name: 'Hemipelagic rate' }).waitFor();
  await page.locator('#outlierShiftScaleYears').waitFor();
  await page.locator('#iterations').fill('2000');
  await page.locator('#seed').fill(seed);
  await shot('settings');
  const before = await page.locator('tr').count();
  const shownEvents = page.locator('table', { has: page.locator('th', { hasText: '95.4 % range' }) }).first().locator('tbody tr');
  const eventsBefore = await shownEvents.count();
  await page.getByRole('button', { name: 'Start run' }).click();
  // The demo's own run (another seed) already shows as succeeded: wait for this run, by its seed.
  // Until it has finished, the demo run's event table stays on the page (results no longer vanish while a run works).
  const finishedLine = page.locator('.sc-run-status-line').filter({ hasText: new RegExp(`succeeded\\s*seed\\s*${seed}\\b`) });
  for (const deadline = Date.now() + 90_000; (await finishedLine.count()) === 0; await sleep(200)) {
    check(Date.now() < deadline, `the run with seed ${seed} did not finish in 90 s`);
    if (eventsBefore > 0 && (await finishedLine.count()) === 0) check((await shownEvents.count()) > 0, 'the earlier results vanished while the new run works');
  }
  const eventTable = page.locator('table', { has: page.locator('th', { hasText: '95.4 % range' }) }).first();
  await eventTable.waitFor();
  const rows = eventTable.locator('tbody tr');
  await waitForCount(rows, (count) => count === expected, `${expected} event rows of the finished run`);
  const firstRange = await rows.first().locator('td').nth(3).innerText();
  check(/\d/.test(firstRange), `the first event has no 95.4 % range: "${firstRange}"`);
  // A single-year sliver of probability is not listed as a range ("490–490 cal BP").
  check(!/\b(\d+)–\1 cal BP/.test(firstRange), `the first event lists a zero-width range: "${firstRange}"`);
  log(`age model: ${await rows.count()} events (table rows before ${before}), first range ${firstRange.replace(/\s+/g, ' ')}`);
  // The run history lists this run with its seed as the one the ladder uses (the newest, no run chosen), beside the demo's run.
  const historyRows = page.getByRole('table', { name: 'Run history' }).locator('tbody tr');
  await waitForCount(historyRows, (count) => count >= 2, 'two or more runs in the run history');
  await historyRows.filter({ hasText: new RegExp(`seed ${seed}\\b`) }).filter({ hasText: 'used downstream · newest' }).waitFor();
  await shot('run-finished');
  // An earlier run can be chosen to feed the ladder in place of the newest, and the newest followed again.
  const useButton = page.getByRole('button', { name: 'Use this run downstream' });
  const offered = historyRows.filter({ has: useButton }).first();
  const offeredQueued = (await offered.locator('td').first().innerText()).trim();
  await offered.getByRole('button', { name: 'Use this run downstream' }).click();
  await historyRows.filter({ hasText: offeredQueued }).filter({ hasText: 'used downstream · chosen' }).waitFor();
  await shot('run-chosen');
  await historyRows.filter({ hasText: 'used downstream · chosen' }).getByRole('button', { name: 'Follow the newest run' }).click();
  await historyRows.filter({ hasText: new RegExp(`seed ${seed}\\b`) }).filter({ hasText: 'used downstream · newest' }).waitFor();
  // A demo core's Logs tab draws the core on true and event-free depth.
  await page.goto(`${baseUrl}/projects`);
  await openProject(page);
  await page.locator('table a[href*="/sites/"]', { hasText: /\bcore\b/i }).first().click();
  await page.getByRole('tab', { name: 'Logs' }).click();
  await page.getByRole('img', { name: /the core on true and event-free depth/ }).waitFor();
  await shot('core-drawing');
}

async function correlatorTiesEvents(page, { baseUrl, shot }) {
  await signIn(page, baseUrl, 'correlator@demo.test');
  await openProject(page);
  await page.getByRole('link', { name: 'Ladder' }).click();
  const ladder = page.getByRole('img', { name: 'Event ladder' });
  await ladder.waitFor();
  await shot('ladder');
  // Site names over the columns never overlap (1440 and 1024 px alike).
  const headerOverlaps = () =>
    page.evaluate((selector) => {
      const boxes = [...document.querySelectorAll(selector)].map((element) => element.getBoundingClientRect()).filter((box) => box.width > 0);
      const hits = [];
      for (let i = 0; i < boxes.length; i += 1)
        for (let j = i + 1; j < boxes.length; j += 1) {
          const [a, b] = [boxes[i], boxes[j]];
          if (a.left < b.right - 0.5 && b.left < a.right - 0.5 && a.top < b.bottom - 0.5 && b.top < a.bottom - 0.5) hits.push(`${i}/${j}`);
        }
      return hits;
    }, 'svg[aria-label="Event ladder"] g.sc-ladder-header > text, svg[aria-label="Regional events in space and time"] text.sc-site-label');
  const ladderOverlaps = await headerOverlaps();
  check(ladderOverlaps.length === 0, `ladder column labels overlap: ${ladderOverlaps.join(', ')}`);
  // Regional events are numbered on the chart, and a failing one is marked by a sign, not colour alone.
  await ladder.locator('text', { hasText: /^R1( ✕)?$/ }).first().waitFor();
  const failingBands = await ladder.locator('[data-fails="true"]').count();
  const crossed = await ladder.locator('text', { hasText: /^R\d+ ✕$/ }).count();
  check(crossed === failingBands, `${failingBands} failing regional events but ${crossed} marked ✕`);
  // Keyboard: Tab reaches an event, arrows move between events, Enter selects one.
  await page.locator('.sc-ladder-event').first().focus();
  const focusedLabel = () => page.evaluate(() => (document.activeElement?.classList.contains('sc-ladder-event') ? document.activeElement.getAttribute('aria-label') : null));
  const startLabel = await focusedLabel();
  await page.keyboard.press('ArrowDown');
  await page.keyboard.press('ArrowRight');
  const movedLabel = await focusedLabel();
  check(startLabel !== null && movedLabel !== null && movedLabel !== startLabel, `arrow keys did not move the focus between ladder events (${startLabel} -> ${movedLabel})`);
  await page.keyboard.press('Enter');
  await page.getByText(/^Selected: /).first().waitFor();
  await shot('ladder-keyboard');
  await page.getByRole('button', { name: 'Clear selection' }).click();
  // The Ties tab names each event with its site.
  await page.getByRole('tab', { name: /Ties/ }).click();
  const firstTie = (await page.locator('.bp6-tab-panel tbody tr').first().locator('td').first().innerText()).trim();
  check(/ at .+ – .+ at /.test(firstTie), `a tie is listed without site names: "${firstTie}"`);
  await page.getByRole('tab', { name: /Regional events/ }).click();
  // A figure-ready export: title, caption with units, the legend and the numbered events in the file.
  const [ladderSvg] = await Promise.all([page.waitForEvent('download', { timeout: STEP_TIMEOUT_MS }), page.getByRole('button', { name: 'SVG', exact: true }).first().click()]);
  const ladderFile = join(E2E_DIR, 'ladder.svg');
  await ladderSvg.saveAs(ladderFile);
  const ladderText = readFileSync(ladderFile, 'utf8');
  check(/font-weight="600" fill="#1c2127">Event ladder · Velmora Margin/.test(ladderText) && /cal BP|CE\/BCE/.test(ladderText) && ladderText.includes('regional event (R#)'), 'the exported ladder lacks its title, units or legend');
  // Space-time: segment boundaries, numbered events, labels apart.
  await page.locator('.bp6-segmented-control').getByText('Space–time', { exact: true }).click();
  const spaceTime = page.getByRole('img', { name: 'Regional events in space and time' });
  await spaceTime.waitFor();
  check((await spaceTime.locator('[data-segment-boundary]').count()) > 0, 'space-time shows no segment boundaries');
  await spaceTime.locator('text', { hasText: /^R1( ✕)?$/ }).first().waitFor();
  const spaceTimeOverlaps = await headerOverlaps();
  check(spaceTimeOverlaps.length === 0, `space-time site labels overlap: ${spaceTimeOverlaps.join(', ')}`);
  await shot('space-time');
  await page.locator('.bp6-segmented-control').getByText('Ladder', { exact: true }).click();
  await ladder.waitFor();
  // Tie in a new, empty hypothesis of the correlator's own: no earlier tie can then chain the
  // pair into a same-site join, so the first pair in different columns is accepted.
  await page.getByRole('button', { name: 'New hypothesis' }).click();
  const hypothesisDialog = page.getByRole('dialog');
  await hypothesisDialog.getByLabel('Name').fill(`E2E hypothesis ${Date.now()}`);
  const copyTies = hypothesisDialog.getByRole('checkbox');
  if ((await copyTies.count()) > 0) await copyTies.uncheck({ force: true });
  await hypothesisDialog.getByRole('button', { name: 'Create' }).click();
  await hypothesisDialog.waitFor({ state: 'detached' });
  await page.waitForFunction(() => [...document.querySelectorAll('[role="tab"]')].some((tab) => tab.textContent?.includes('Ties (0)')), null, {
    timeout: STEP_TIMEOUT_MS,
  });
  await shot('new-hypothesis');
  const regionalTab = page.getByRole('tab', { name: /Regional events/ });
  const countOf = async () => Number((await regionalTab.innerText()).match(/\((\d+)\)/)?.[1] ?? NaN);
  const regionalBefore = await countOf();
  const tiesTab = page.getByRole('tab', { name: /Ties/ });
  const tiesOf = async () => Number((await tiesTab.innerText()).match(/\((\d+)\)/)?.[1] ?? NaN);
  const tiesBefore = await tiesOf();

  // Events are the clickable groups of the chart, column by column; pair events of columns far apart.
  const events = ladder.locator('g[style*="cursor"]');
  const boxes = [];
  for (let index = 0; index < (await events.count()); index += 1) boxes.push({ index, box: await events.nth(index).boundingBox() });
  const located = boxes.filter(({ box }) => box && box.width > 0);
  check(located.length >= 2, `the ladder shows ${located.length} clickable events`);
  const tie = page.getByRole('button', { name: 'Tie', exact: true });
  const dialog = page.getByRole('dialog');
  // Most demo events are tied already; the server refuses a tie that would put two events of
  // one site into one regional event (the dialog shows why), so such a pair is cancelled and the
  // next one tried, nearest in age first. The tie must add one to the Ties tab.
  const leftmost = Math.min(...located.map(({ box }) => box.x));
  const firsts = located.filter(({ box }) => box.x - leftmost < 5);
  const others = located.filter(({ box }) => box.x - leftmost > 40);
  const pairs = firsts.flatMap((a) => others.map((b) => [a, b])).sort(([a1, b1], [a2, b2]) => Math.abs(a1.box.y - b1.box.y) - Math.abs(a2.box.y - b2.box.y));
  let tieable = false;
  let tried = 0;
  let pairLine = '';
  for (const [a, b] of pairs.slice(0, 25)) {
    tried += 1;
    await page.getByRole('button', { name: 'Clear selection' }).click({ timeout: 1000 }).catch(() => {});
    await events.nth(a.index).click({ force: true });
    await events.nth(b.index).click({ force: true });
    if (!(await tie.isEnabled())) continue;
    await tie.click();
    await dialog.waitFor();
    pairLine = (await dialog.getByText(/ at .+ – .+ at /).first().innerText()).trim();
    await shot('tie-dialog');
    await dialog.getByRole('button', { name: 'Tie', exact: true }).click();
    const refused = dialog.locator('.bp6-callout.bp6-intent-danger');
    await Promise.race([dialog.waitFor({ state: 'detached' }), refused.waitFor()]);
    if ((await dialog.count()) === 0) {
      tieable = true;
      break;
    }
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    await dialog.waitFor({ state: 'detached' });
  }
  check(tieable, `none of ${tried} pairs of events in different columns could be tied`);
  const [labelA, labelB] = pairLine.split(' – ');
  await page.waitForFunction(
    (before) => [...document.querySelectorAll('[role="tab"]')].some((tab) => tab.textContent?.includes(`Ties (${before + 1})`)),
    tiesBefore,
    { timeout: STEP_TIMEOUT_MS },
  );
  await regionalTab.click();
  // The regional event now holds both events, with its concordance, chi-square, minimum rupture length and Mw checks.
  const card = page.locator('.sc-regional-card').filter({ hasText: labelA }).filter({ hasText: labelB }).first();
  await card.waitFor();
  for (const label of ['Concordance', 'Same age?', 'Minimum rupture length', 'Mw from minimum length', 'Mw from area']) await card.getByText(label, { exact: true }).waitFor();
  // The same-age test in words: the spread, the 5 % limit and what it means.
  const chiSquare = (await card.locator('dt:has-text("Same age?") + dd').innerText()).trim();
  check(/spread by [\d.]+, (under|over) [\d.]+.*1 time in 20/.test(chiSquare), `the regional event's same-age test does not say spread, limit and meaning: "${chiSquare}"`);
  await card.scrollIntoViewIfNeeded();
  log(`ladder: tied ${pairLine}; ties ${tiesBefore} -> ${await tiesOf()}; regional events ${regionalBefore} -> ${await countOf()}; chi-square ${chiSquare}`);
  await shot('regional-event');
  // Side by side with another hypothesis says what differs and marks the differing ties.
  await page.getByText('Side by side', { exact: true }).click();
  const differences = page.getByTestId('ladder-differences');
  await differences.waitFor();
  check(/What differs: \d+ ties? only in .+, \d+ only in /.test(await differences.innerText()), 'side by side does not say what differs');
  await waitForCount(page.locator('[data-tie-differs="true"]'), (count) => count > 0, 'ties marked as only in one hypothesis');
  await shot('side-by-side');
  await page.getByText('Side by side', { exact: true }).click();
  await differences.waitFor({ state: 'detached' });
  await correlatorSeesOrderLoop(page, baseUrl, shot);
  await correlatorAcceptsProposedTie(page, baseUrl, shot);
}

/** The correlator's API token and the demo project's id, for setting up what a screen then shows. */
async function correlatorApi(baseUrl) {
  const signedIn = await graphql(baseUrl, 'mutation ($email: String!, $password: String!) { signIn(email: $email, password: $password) { token } }', {
    email: 'correlator@demo.test',
    password: PASSWORD,
  });
  const token = signedIn.data?.signIn?.token;
  check(token, `the correlator cannot sign in over GraphQL: ${JSON.stringify(signedIn.errors)}`);
  const projects = await graphql(baseUrl, '{ projects { id name } }', {}, token);
  const projectId = projects.data?.projects?.find((project) => project.name === 'Velmora Margin')?.id;
  check(projectId, 'the correlator does not see the demo project over GraphQL');
  return { token, projectId, call: (query, variables) => graphql(baseUrl, query, variables, token) };
}

/**
 * A hypothesis with two crossing ties (the younger event of one site tied to the older of another
 * and the other way round) has one order loop; picking it in the callout draws its loop on the
 * ladder in the loop pattern.
 */
async function correlatorSeesOrderLoop(page, baseUrl, shot) {
  const api = await correlatorApi(baseUrl);
  const ladder = await api.call('query ($id: ID!) { eventLadder(projectId: $id) { columns { site { id } events { medianCalBp eventHorizon { id } } } } }', { id: api.projectId });
  const [siteA, siteB] = (ladder.data?.eventLadder?.columns ?? [])
    .map((column) => column.events.filter((event) => event.medianCalBp !== null).sort((a, b) => a.medianCalBp - b.medianCalBp))
    .filter((events) => events.length >= 2);
  check(siteA && siteB, 'the demo ladder has no two columns with two dated events each');
  const name = `E2E crossing ${Date.now()}`;
  const created = await api.call('mutation ($input: CreateHypothesisInput!) { createHypothesis(input: $input) { id } }', { input: { projectId: api.projectId, name } });
  const hypothesisId = created.data?.createHypothesis?.id;
  check(hypothesisId, `the crossing hypothesis was not created: ${JSON.stringify(created.errors)}`);
  for (const [a, b] of [
    [siteA[0], siteB[1]],
    [siteA[1], siteB[0]],
  ]) {
    const tie = await api.call('mutation ($input: AddTieInput!) { addTie(input: $input) { id } }', {
      input: { hypothesisId, eventAId: a.eventHorizon.id, eventBId: b.eventHorizon.id, confidence: 3, evidence: ['age overlap'] },
    });
    check(tie.data?.addTie?.id, `a crossing tie was refused: ${JSON.stringify(tie.errors)}`);
  }
  await page.reload();
  await page.getByLabel('Hypothesis', { exact: true }).selectOption({ label: name });
  await page.getByRole('button', { name: 'loop 1' }).click();
  const drawn = await waitForCount(page.locator('[data-overlay="order-loops"] [data-selected] line'), (count) => count >= 4, 'lines of the chosen order loop');
  log(`ladder: a crossing pair of ties is drawn as loop 1 (${drawn} lines with its halo)`);
  await shot('order-loop');
}

async function analystRunsRecurrence(page, { baseUrl, shot, round }) {
  const seed = String(11 + round);
  await signIn(page, baseUrl, 'analyst@demo.test');
  await openProject(page);
  await page.getByRole('link', { name: 'Recurrence' }).click();
  await page.getByRole('button', { name: 'Start analysis' }).waitFor();
  const segment = page.locator('#segmentId');
  const centralValue = await segment.locator('option', { hasText: /Central/ }).first().getAttribute('value');
  await segment.selectOption(centralValue);
  await page.locator('#draws').fill('500');
  await page.locator('#seed').fill(seed);
  await shot('setup');
  await page.getByRole('button', { name: 'Start analysis' }).click();
  // The page may still show an earlier analysis; wait until the new one (by its seed) is the one shown.
  await page.getByText(new RegExp(`seed\\s*${seed}\\s*·\\s*500\\s*draws`)).first().waitFor();
  const heading = page.getByRole('heading', { name: 'Conditional probability of the next event' });
  await heading.waitFor({ timeout: 90_000 });
  const table = page.locator('table', { has: page.locator('th', { hasText: 'Model' }) }).first();
  const firstRow = table.locator('tbody tr').first();
  await firstRow.waitFor();
  const cells = (await firstRow.locator('td').allInnerTexts()).map((text) => text.trim());
  check(cells.length >= 2 && cells.slice(1).some((text) => /\d/.test(text)), `the probability table's first row has no figures: ${cells.join(' | ')}`);
  log(`recurrence: ${cells.join(' | ')}`);
  await shot('results');
  // Interval rows name their events ("... (2) → ... (1)"), not bare numbers.
  const intervalTable = page.locator('table', { has: page.locator('th', { hasText: 'Between events' }) }).first();
  const firstInterval = (await intervalTable.locator('tbody tr').first().locator('td').first().innerText()).trim();
  check(/[A-Za-z].* \(2\) → .*[A-Za-z].* \(1\)/.test(firstInterval) && !/^event \d/.test(firstInterval), `an interval row does not name its events: "${firstInterval}"`);

  const [download] = await Promise.all([page.waitForEvent('download', { timeout: STEP_TIMEOUT_MS }), page.getByRole('button', { name: 'CSV', exact: true }).click()]);
  const file = join(E2E_DIR, 'recurrence.csv');
  await download.saveAs(file);
  const firstLine = readFileSync(file, 'utf8').split(/\r?\n/)[0];
  const caution = (await page.locator('.sc-caution').first().innerText()).trim();
  check(/hazard|caution|research/i.test(firstLine), `the CSV does not open with the caution: "${firstLine}"`);
  log(`recurrence CSV first line: ${firstLine.slice(0, 120)}; caution shown: ${caution.slice(0, 80)}`);
}

async function viewerCannotChange(page, { baseUrl, shot }) {
  await signIn(page, baseUrl, 'viewer@demo.test');
  await openProject(page);
  await firstSiteLink(page).waitFor();
  await checkControls(page, EDIT_CONTROLS.project, false, 'the viewer');
  await shot('project');
  await firstSiteLink(page).click();
  await page.getByRole('tab', { name: /Column/ }).waitFor();
  await page.getByText('Units').first().waitFor();
  await checkControls(page, EDIT_CONTROLS.site, false, 'the viewer');
  await shot('site');
  await page.getByRole('link', { name: /age model/i }).first().click();
  await page.getByRole('heading', { name: /Age model/ }).waitFor();
  await checkControls(page, EDIT_CONTROLS.ageModel, false, 'the viewer');
  await shot('age-model');

  // An address naming no project: not found at once, in words, never a server statement.
  const askedAt = Date.now();
  await page.goto(`${baseUrl}/projects/does-not-exist`);
  await page.getByText('Not found', { exact: true }).waitFor({ timeout: 3000 });
  const notFoundText = await page.locator('body').innerText();
  check(!/\bselect\b|\$\d|\bfrom\b.*\bwhere\b/i.test(notFoundText), `the not-found page quotes a statement: ${notFoundText.slice(0, 200)}`);
  log(`/projects/does-not-exist: not found after ${Date.now() - askedAt} ms`);
  await shot('not-found');

  const signedIn = await graphql(baseUrl, 'mutation ($email: String!, $password: String!) { signIn(email: $email, password: $password) { token } }', {
    email: 'viewer@demo.test',
    password: PASSWORD,
  });
  const token = signedIn.data?.signIn?.token;
  check(token, `the viewer cannot sign in over GraphQL: ${JSON.stringify(signedIn.errors)}`);
  const projects = await graphql(baseUrl, '{ projects { id name } }', {}, token);
  const projectId = projects.data?.projects?.find((project) => project.name === 'Velmora Margin')?.id;
  check(projectId, `the viewer's project list lacks Velmora Margin: ${JSON.stringify(projects.errors ?? projects.data)}`);
  const created = await graphql(
    baseUrl,
    'mutation ($input: CreateSiteInput!) { createSite(input: $input) { id } }',
    { input: { projectId, name: 'Viewer site', kind: 'TRENCH', latitude: -38, longitude: 176, alongStrikeKm: 10 } },
    token,
  );
  const codes = (created.errors ?? []).map((error) => error.extensions?.code);
  check(!created.data?.createSite && codes.includes('FORBIDDEN'), `createSite as the viewer was not refused FORBIDDEN: ${JSON.stringify(created)}`);
}

async function adminFreezesRelease(page, { baseUrl, shot }) {
  await signIn(page, baseUrl, 'admin@demo.test');
  await openProject(page);
  await page.getByRole('link', { name: 'Team and records' }).click();
  await page.getByRole('tab', { name: 'Releases' }).click();
  const note = `E2E release ${Date.now()}`;
  await page.getByPlaceholder('Note, e.g. submitted with the paper').fill(note);
  await page.getByRole('button', { name: 'Freeze' }).click();
  // Listed at once (a cached project answer once hid it), and read only with the frozen columns.
  const row = page.locator('tr', { hasText: note });
  await row.waitFor();
  await shot('listed');
  await row.getByRole('button', { name: 'Open' }).click();
  const dialog = page.getByRole('dialog');
  await dialog.getByText('read only').waitFor();
  const firstSite = dialog.locator('tbody tr').filter({ hasText: 'Skarrow Marsh' }).first();
  await firstSite.waitFor();
  const cells = (await firstSite.locator('td').allInnerTexts()).map((text) => text.trim());
  check(cells.slice(-3).every((text) => /^\d+$/.test(text) && Number(text) > 0), `the release lacks Skarrow Marsh's unit, event and sample counts: ${cells.join(' | ')}`);
  log(`release: "${note}" listed; Skarrow Marsh frozen with units, events, samples ${cells.slice(-3).join(', ')}`);
  await shot('release');
}

const JOURNEYS = [
  ['researcher creates a site, enters its column and imports a lab sheet', researcherBuildsSite],
  ['researcher runs an age model and sees event ranges', researcherRunsAgeModel],
  ['correlator ties two events and sees the regional event with its checks', correlatorTiesEvents],
  ['analyst runs a recurrence analysis, reads the probabilities and exports CSV', analystRunsRecurrence],
  ['viewer sees the project and a site but can change nothing', viewerCannotChange],
  ['admin freezes a release, sees it listed at once and opens it read only', adminFreezesRelease],
];

async function runJourney(browser, baseUrl, index, title, journey, width) {
  const slug = `${width}-${index + 1}-${title.split(' ')[0]}`;
  const context = await browser.newContext({ viewport: { width, height: 960 }, acceptDownloads: true });
  context.setDefaultTimeout(STEP_TIMEOUT_MS);
  const page = await context.newPage();
  const browserErrors = [];
  page.on('console', (message) => {
    if (message.type() === 'error') browserErrors.push(`console error: ${message.text()}`);
  });
  page.on('pageerror', (error) => browserErrors.push(`page error: ${error.message}`));
  let shots = 0;
  const shot = async (name) => {
    shots += 1;
    await page.screenshot({ path: join(SHOTS_DIR, `${slug}-${String(shots).padStart(2, '0')}-${name}.png`), fullPage: true });
  };
  const started = Date.now();
  const failureMessages = [];
  try {
    await Promise.race([
      journey(page, { baseUrl, shot, width, round: WIDTHS.indexOf(width) }),
      sleep(JOURNEY_TIMEOUT_MS).then(() => {
        throw new Error(`the journey took over ${JOURNEY_TIMEOUT_MS / 1000} s`);
      }),
    ]);
  } catch (error) {
    failureMessages.push(error.stack ?? String(error));
    await shot('failure').catch(() => {});
  }
  if (browserErrors.length > 0) failureMessages.push(...browserErrors);
  await context.close();
  const status = failureMessages.length === 0 ? 'passed' : 'failed';
  const fullTitle = `${title} (${width} px)`;
  log(`${status}: ${fullTitle} (${((Date.now() - started) / 1000).toFixed(1)} s)${status === 'failed' ? `\n  ${failureMessages.join('\n  ')}` : ''}`);
  return { title: fullTitle, status, failureMessages };
}

function writeReport(assertionResults, setupError) {
  const results = setupError ? [{ title: 'start the app for the journeys', status: 'failed', failureMessages: [setupError.stack ?? String(setupError)] }, ...assertionResults] : assertionResults;
  const passed = results.filter((result) => result.status === 'passed').length;
  const failed = results.length - passed;
  const report = {
    numPassedTests: passed,
    numFailedTests: failed,
    numTotalTests: results.length,
    success: failed === 0,
    testResults: [{ name: fileURLToPath(import.meta.url), status: failed === 0 ? 'passed' : 'failed', assertionResults: results }],
  };
  mkdirSync(dirname(RESULTS_FILE), { recursive: true });
  writeFileSync(RESULTS_FILE, `${JSON.stringify(report, null, 2)}\n`);
  log(`${passed} passed, ${failed} failed; report in ${RESULTS_FILE}`);
  return failed;
}

async function main() {
  if (!process.env.DATABASE_URL) throw new Error('DATABASE_URL must name a PostgreSQL server (npm test exports it)');
  rmSync(SHOTS_DIR, { recursive: true, force: true });
  mkdirSync(SHOTS_DIR, { recursive: true });
  mkdirSync(LOGS_DIR, { recursive: true });
  const assertionResults = [];
  let browser;
  let setupError = null;
  try {
    ensureChromium();
    ensureBuilt('backend');
    ensureBuilt('frontend');
    await recreateDatabase();
    const baseUrl = await startApp();
    log(`app at ${baseUrl}; waiting for the demo age model runs`);
    await waitForDemoRuns();
    browser = await chromium.launch({
      executablePath: CHROMIUM,
      headless: true,
      args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
    });
    const only = process.env.E2E_ONLY ? new RegExp(process.env.E2E_ONLY, 'i') : null;
    for (const width of WIDTHS) {
      for (const [index, [title, journey]] of JOURNEYS.entries()) {
        if (only && !only.test(title)) continue;
        assertionResults.push(await runJourney(browser, baseUrl, index, title, journey, width));
      }
    }
  } catch (error) {
    setupError = error;
    log(`setup failed: ${error.message}`);
  } finally {
    await browser?.close().catch(() => {});
    await stopAll();
  }
  return writeReport(assertionResults, setupError);
}

// Ctrl-C or a runner's SIGTERM still ends the app processes started here.
for (const signal of ['SIGINT', 'SIGTERM']) {
  process.once(signal, () => {
    for (const { child } of children) child.kill('SIGKILL');
    process.exit(1);
  });
}

const failed = await main().catch((error) => {
  console.error(error);
  return 1;
});
process.exit(failed > 0 ? 1 : 0);

/**
 * A susceptibility log for a demo core, every 2 cm: 20 in mud and, in the n-th bed from the top,
 * a pulse whose place in the bed depends on n, so the same bed order gives matching signatures.
 */
function demoCoreLogCsv(units) {
  const beds = units.filter((unit) => unit.facies === 'TURBIDITE').sort((a, b) => a.topDepthM - b.topDepthM);
  const base = Math.max(...units.map((unit) => unit.baseDepthM));
  const rows = ['depth (m),magnetic susceptibility (SI 1e-5)'];
  for (let depth = 0; depth <= base; depth += 0.02) {
    const index = beds.findIndex((bed) => depth >= bed.topDepthM && depth < bed.baseDepthM);
    let value = 20;
    if (index >= 0) {
      const bed = beds[index];
      const x = (depth - bed.topDepthM) / (bed.baseDepthM - bed.topDepthM);
      value += 60 * Math.exp(-0.5 * ((x - (0.2 + 0.6 * ((index * 0.37) % 1))) / 0.15) ** 2);
    }
    rows.push(`${depth.toFixed(2)},${value.toFixed(2)}`);
  }
  return rows.join('\n');
}

/** Two demo cores get a log (as the researcher); the correlator sees proposed ties and accepts one. */
async function correlatorAcceptsProposedTie(page, baseUrl, shot) {
  const api = await correlatorApi(baseUrl);
  const researcher = await graphql(baseUrl, 'mutation ($email: String!, $password: String!) { signIn(email: $email, password: $password) { token } }', {
    email: 'researcher@demo.test',
    password: PASSWORD,
  });
  const researcherToken = researcher.data?.signIn?.token;
  const ladder = await api.call('query ($id: ID!) { eventLadder(projectId: $id) { columns { site { id name kind } events { eventHorizon { id } } } } }', { id: api.projectId });
  const withEvents = (ladder.data?.eventLadder?.columns ?? []).filter((column) => column.site.kind === 'CORE' && column.events.length >= 2);
  check(withEvents.length >= 2, 'the demo ladder has no two cores with events');
  for (const core of withEvents) {
    const site = await graphql(baseUrl, 'query ($id: ID!) { site(id: $id) { units { topDepthM baseDepthM facies } } }', { id: core.site.id }, researcherToken);
    const uploaded = await graphql(
      baseUrl,
      'mutation ($input: UploadCoreLogInput!) { uploadCoreLog(input: $input) { id } }',
      { input: { siteId: core.site.id, name: `E2E MS ${Date.now()}`, csv: demoCoreLogCsv(site.data?.site?.units ?? []) } },
      researcherToken,
    );
    check(uploaded.data?.uploadCoreLog?.id, `the researcher could not upload a log to ${core.site.name}: ${JSON.stringify(uploaded.errors)}`);
  }
  const name = `E2E proposals ${Date.now()}`;
  const created = await api.call('mutation ($input: CreateHypothesisInput!) { createHypothesis(input: $input) { id } }', { input: { projectId: api.projectId, name } });
  const hypothesisId = created.data?.createHypothesis?.id;
  check(hypothesisId, `the proposals hypothesis was not created: ${JSON.stringify(created.errors)}`);
  // Beds differ in number between cores, so not every pair matches: take the first pair that does.
  let cores = null;
  for (let i = 0; i < withEvents.length && !cores; i += 1) {
    for (let j = i + 1; j < withEvents.length && !cores; j += 1) {
      const proposals = await api.call('query ($input: TieSuggestionsInput!) { tieSuggestions(input: $input) { score } }', {
        input: { hypothesisId, siteAId: withEvents[i].site.id, siteBId: withEvents[j].site.id },
      });
      if ((proposals.data?.tieSuggestions?.length ?? 0) > 0) cores = [withEvents[i], withEvents[j]];
    }
  }
  check(cores, `no pair of ${withEvents.length} demo cores with the same log pattern has a proposed tie`);
  await page.reload();
  await page.getByLabel('Hypothesis', { exact: true }).selectOption({ label: name });
  await page.getByRole('tab', { name: 'Proposals' }).click();
  await page.getByLabel('First core').selectOption({ label: cores[0].site.name });
  await page.getByLabel('Second core').selectOption({ label: cores[1].site.name });
  const accept = page.getByRole('button', { name: /^Accept the tie / });
  const proposed = await waitForCount(accept, (count) => count >= 1, 'proposed ties between the two cores');
  const drawn = await page.locator('[data-overlay="tie-suggestions"] line').count();
  check(drawn >= 1 && drawn <= proposed, `${proposed} proposals listed but ${drawn} drawn on the ladder`);
  await shot('tie-proposals');
  await accept.first().click();
  await page.waitForFunction(() => [...document.querySelectorAll('[role="tab"]')].some((tab) => tab.textContent?.includes('Ties (1)')), null, { timeout: STEP_TIMEOUT_MS });
  await page.getByRole('tab', { name: /Ties/ }).click();
  await page.getByRole('cell', { name: 'log match' }).first().waitFor();
  log(`ladder: ${proposed} proposed ties between ${cores[0].site.name} and ${cores[1].site.name}; one accepted as a "log match" tie`);
  // The cores' logs beside their columns, each bed placed at its event's median age, said in a caption.
  await page.getByRole('checkbox', { name: 'Core logs' }).check({ force: true });
  const beds = await waitForCount(page.locator('[data-overlay="core-logs"] polyline'), (count) => count >= 2, 'beds drawn with their log on the ladder');
  await page.getByText(/bed's base at its event's median age/).waitFor();
  log(`ladder: core logs on, ${beds} beds drawn with their readings`);
  await shot('ladder-core-logs');
}
