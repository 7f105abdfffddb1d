// `npm test`: every suite against a fresh `stratochron_test` database, closing with one line
// `N passed, N failed` summed over all suites (the line CI reads) and a non-zero exit on failure.
import { existsSync, mkdirSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { ensureDependencies } from './lib/deps.mjs';
import { databaseUrlFor, ensureCluster, resetDatabase, stopCluster } from './lib/postgres.mjs';
import { DATA_DIR, NPX, ROOT, note, runAsync, warn } from './lib/run.mjs';

const RESULTS_DIR = join(DATA_DIR, 'test-results');
const SPEC_FILE = /\.(spec|test)\.(ts|tsx|mts|js|mjs)$/;

function hasSpecFiles(folder) {
  if (!existsSync(folder)) {
    return false;
  }
  return readdirSync(folder, { withFileTypes: true }).some((entry) =>
    entry.isDirectory()
      ? entry.name !== 'node_modules' && hasSpecFiles(join(folder, entry.name))
      : SPEC_FILE.test(entry.name),
  );
}

function vitestArgs(resultsFile, extra = []) {
  return [
    'vitest',
    'run',
    ...extra,
    '--passWithNoTests',
    '--reporter=default',
    '--reporter=json',
    `--outputFile.json=${resultsFile}`,
  ];
}

/**
 * The suites in the order they run. `skip` is a reason to skip (printed unless `quiet`).
 * A suite writes Vitest's JSON report to `resultsFile`; test/e2e/run.mjs gets that path in
 * STRATOCHRON_TEST_RESULTS_FILE and is expected to write the same shape
 * ({ numPassedTests, numFailedTests, ... }).
 */
function suites() {
  const e2eRunner = join(ROOT, 'test', 'e2e', 'run.mjs');
  const rootConfig = join(ROOT, 'test', 'vitest.config.ts');
  // The browser journeys run with every `npm test` (they start a whole app and Chromium, a few
  // minutes); E2E=0 skips them for a quick local run.
  const wantE2e = process.env.E2E !== '0';
  return [
    {
      name: 'backend',
      command: (file) => [NPX, vitestArgs(file), join(ROOT, 'backend')],
    },
    {
      name: 'frontend',
      skip: hasSpecFiles(join(ROOT, 'frontend', 'src')) ? null : 'no spec files in frontend/src',
      command: (file) => [NPX, vitestArgs(file), join(ROOT, 'frontend')],
    },
    {
      name: 'integration',
      skip: existsSync(rootConfig) ? null : 'test/vitest.config.ts is not written yet',
      command: (file) => [NPX, vitestArgs(file, ['--config', 'test/vitest.config.ts']), ROOT],
    },
    {
      name: 'e2e',
      skip: wantE2e ? null : 'skipped (E2E=0)',
      missing: existsSync(e2eRunner) ? null : 'test/e2e/run.mjs does not exist',
      command: () => [process.execPath, [e2eRunner], ROOT],
    },
  ];
}

/**
 * Passed and failed tests from a Vitest JSON report. A spec file that fails to load has no
 * failed test of its own, and a run can fail outside any test (an unhandled error): each such
 * failure counts as one, as does a suite that left no report at all.
 */
function countResults(resultsFile, exitCode) {
  let report;
  try {
    report = JSON.parse(readFileSync(resultsFile, 'utf8'));
  } catch {
    return { passed: 0, failed: 1, crashed: true };
  }
  const passed = report.numPassedTests ?? 0;
  const brokenFiles = (report.testResults ?? []).filter(
    (file) => file.status === 'failed' && !(file.assertionResults ?? []).some((test) => test.status === 'failed'),
  ).length;
  let failed = (report.numFailedTests ?? 0) + brokenFiles;
  if (exitCode !== 0 && failed === 0) {
    failed = 1;
  }
  return { passed, failed, crashed: false };
}

async function main() {
  const totals = { passed: 0, failed: 0 };
  let summarised = false;
  // A setup step that gives up (fail() exits) still leaves the closing line CI reads.
  process.on('exit', () => {
    if (!summarised) {
      console.log(`${totals.passed} passed, ${totals.failed + 1} failed`);
    }
  });
  let interrupted = false;
  // Ctrl-C reaches the running suite directly; the runner only has to stop starting new ones.
  process.on('SIGINT', () => {
    interrupted = true;
  });

  ensureDependencies();
  const env = { ...process.env, NODE_ENV: 'test' };
  const ownCluster = !process.env.DATABASE_URL;
  if (ownCluster) {
    const cluster = await ensureCluster('test');
    resetDatabase(cluster);
    env.DATABASE_URL = databaseUrlFor(cluster);
    note(`test database reset: ${env.DATABASE_URL}`);
  } else {
    const shown = process.env.DATABASE_URL.replace(/:[^:@/]*@/, ':***@');
    warn(`using DATABASE_URL as given (${shown}); the suites will wipe that database`);
  }

  mkdirSync(RESULTS_DIR, { recursive: true });
  const lines = [];
  for (const suite of suites()) {
    if (interrupted) {
      break;
    }
    if (suite.skip) {
      if (!suite.quiet) {
        note(`skipping the ${suite.name} suite: ${suite.skip}`);
      }
      continue;
    }
    if (suite.missing) {
      warn(`the ${suite.name} suite cannot run: ${suite.missing}`);
      totals.failed += 1;
      lines.push(`  ${suite.name}: passed 0, failed 1 (${suite.missing})`);
      continue;
    }
    const resultsFile = join(RESULTS_DIR, `${suite.name}.json`);
    rmSync(resultsFile, { force: true });
    note(`running the ${suite.name} suite`);
    const [command, args, cwd] = suite.command(resultsFile);
    const exitCode = await runAsync(command, args, { cwd, env: { ...env, STRATOCHRON_TEST_RESULTS_FILE: resultsFile } });
    const { passed, failed, crashed } = countResults(resultsFile, exitCode);
    totals.passed += passed;
    totals.failed += failed;
    lines.push(`  ${suite.name}: passed ${passed}, failed ${failed}${crashed ? ` (exited ${exitCode} without a report)` : ''}`);
  }

  if (ownCluster && process.env.KEEP_DB !== '1') {
    stopCluster('test');
  }
  if (interrupted) {
    totals.failed += 1;
    lines.push('  interrupted: remaining suites not run');
  }
  console.log(['', 'Suites:', ...lines].join('\n'));
  console.log(`${totals.passed} passed, ${totals.failed} failed`);
  summarised = true;
  if (totals.failed > 0) {
    process.exitCode = 1;
  }
}

await main();
