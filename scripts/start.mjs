// `npm start`: dependencies, the dev database, a build if sources changed, then the server,
// its workers and the local mail/file-storage fakes, in the foreground until Ctrl-C.
import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { connect } from 'node:net';
import { join } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { ensureBuilt } from './lib/build.mjs';
import { ensureDependencies } from './lib/deps.mjs';
import { isLiveNodeProcess, pidFile, removePidFile, writePidFile } from './lib/pids.mjs';
import { ensureDatabaseUrl } from './lib/postgres.mjs';
import { DATA_DIR, ROOT, dataPath, fail, note, warn } from './lib/run.mjs';

const SERVER_ENTRY = join(ROOT, 'backend', 'dist', 'main.js');
const WORKER_ENTRY = join(ROOT, 'backend', 'dist', 'worker.js');
const FAKES_ENTRY = join(ROOT, 'backend', 'dist', 'fakes', 'main.js');
const HEALTH_TIMEOUT_MS = 180_000;
const FAKES_TIMEOUT_MS = 15_000;

/** process.env[name] when set, else the fallback. */
function setting(name, fallback) {
  return process.env[name] || fallback;
}

/** A JWT secret kept in .data so sessions survive restarts; JWT_SECRET overrides it. */
function jwtSecret() {
  if (process.env.JWT_SECRET) {
    return process.env.JWT_SECRET;
  }
  const file = dataPath('jwt-secret');
  if (!existsSync(file)) {
    writeFileSync(file, `${randomBytes(48).toString('base64url')}\n`, { mode: 0o600 });
  }
  return readFileSync(file, 'utf8').trim();
}

/** Mail and object-storage settings, pointing at the local fakes for whatever is not configured. */
function fakeSettings() {
  const needSmtp = !process.env.SMTP_HOST;
  const needS3 = !process.env.S3_ENDPOINT;
  if (!needSmtp && !needS3) {
    return null;
  }
  if (!existsSync(FAKES_ENTRY)) {
    note('backend/dist/fakes/main.js is not there yet: starting without the local SMTP and S3 fakes');
    return null;
  }
  const fakesDataDir = join(DATA_DIR, 'fakes');
  mkdirSync(fakesDataDir, { recursive: true });
  const smtpPort = Number(setting('FAKE_SMTP_PORT', '2525'));
  const s3Port = Number(setting('FAKE_S3_PORT', '4569'));
  const storage = {
    S3_BUCKET: setting('S3_BUCKET', 'stratochron-attachments'),
    S3_ACCESS_KEY_ID: setting('S3_ACCESS_KEY_ID', 'stratochron-local'),
    S3_SECRET_ACCESS_KEY: setting('S3_SECRET_ACCESS_KEY', 'stratochron-local-secret'),
    S3_REGION: setting('S3_REGION', 'us-east-1'),
  };
  return {
    ports: [...(needSmtp ? [smtpPort] : []), ...(needS3 ? [s3Port] : [])],
    fakesEnv: {
      FAKE_SMTP_PORT: String(smtpPort),
      FAKE_S3_PORT: String(s3Port),
      FAKE_DATA_DIR: fakesDataDir,
      ...storage,
    },
    serverEnv: {
      ...(needSmtp ? { SMTP_HOST: '127.0.0.1', SMTP_PORT: String(smtpPort) } : {}),
      ...(needS3 ? { S3_ENDPOINT: `http://127.0.0.1:${s3Port}`, ...storage } : {}),
    },
  };
}

function portAnswers(port) {
  return new Promise((resolve) => {
    const socket = connect({ host: '127.0.0.1', port });
    socket.once('connect', () => {
      socket.destroy();
      resolve(true);
    });
    socket.once('error', () => resolve(false));
  });
}

async function healthAnswers(url) {
  try {
    const response = await fetch(url, { signal: AbortSignal.timeout(2000) });
    return response.status === 200;
  } catch {
    return false;
  }
}

/** Waits for check() to hold while the supervisor is still up; false on timeout or shutdown. */
async function waitFor(check, timeoutMs) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline && !supervisor.stopping) {
    if (await check()) {
      return true;
    }
    await sleep(500);
  }
  return false;
}

/** Children by role; ending the server or the fakes ends everything, a worker only warns. */
const supervisor = {
  children: new Map(),
  stopping: false,
  exitCode: 0,

  launch(role, entry, env) {
    const child = spawn(process.execPath, [entry], { cwd: ROOT, env: { ...process.env, ...env }, stdio: 'inherit' });
    writePidFile(role, child.pid);
    this.children.set(role, child);
    child.on('exit', (code, signal) => {
      this.children.delete(role);
      removePidFile(role);
      if (!this.stopping) {
        const how = signal ? `signal ${signal}` : `code ${code}`;
        if (role.startsWith('worker')) {
          warn(`${role} exited (${how}); the server keeps running`);
        } else {
          warn(`${role} exited (${how}); stopping everything`);
          this.shutdown(code || 1);
        }
      }
      this.finishWhenEmpty();
    });
  },

  shutdown(exitCode) {
    if (this.stopping) {
      return;
    }
    this.stopping = true;
    this.exitCode = exitCode;
    for (const child of this.children.values()) {
      child.kill('SIGTERM');
    }
    setTimeout(() => {
      for (const child of this.children.values()) {
        child.kill('SIGKILL');
      }
    }, 10_000).unref();
    this.finishWhenEmpty();
  },

  finishWhenEmpty() {
    if (this.stopping && this.children.size === 0) {
      note('server, workers and fakes stopped; the database cluster runs until `npm run stop`');
      process.exit(this.exitCode);
    }
  },
};

function printDemoAccounts(file) {
  if (!existsSync(file)) {
    note(`demo accounts: none listed (the seed writes them to DEMO_ACCOUNTS_FILE=${file})`);
    return;
  }
  let accounts;
  try {
    accounts = JSON.parse(readFileSync(file, 'utf8'));
  } catch (error) {
    warn(`cannot read the demo accounts in ${file}: ${error.message}`);
    return;
  }
  note('demo accounts:');
  for (const account of accounts) {
    console.log(`    ${account.email}  password: ${account.password}${account.role ? `  (${account.role})` : ''}`);
  }
}

async function main() {
  const previous = existsSync(pidFile('start')) ? Number(readFileSync(pidFile('start'), 'utf8')) : 0;
  if (previous && isLiveNodeProcess(previous)) {
    fail(`Stratochron is already running (pid ${previous}); \`npm run stop\` ends it`);
  }
  writePidFile('start', process.pid);
  process.on('exit', () => removePidFile('start'));

  ensureDependencies();
  const databaseUrl = await ensureDatabaseUrl('dev');
  ensureBuilt('backend');
  if (!existsSync(SERVER_ENTRY)) {
    fail('backend/dist/main.js is missing after the backend build: the server entry point (backend/src/main.ts) is not written yet');
  }
  ensureBuilt('frontend');

  const port = setting('PORT', '3000');
  const host = setting('HOST', '127.0.0.1');
  const publicUrl = setting('PUBLIC_URL', `http://127.0.0.1:${port}`);
  const demoAccountsFile = dataPath('run', 'demo-accounts.json');
  rmSync(demoAccountsFile, { force: true });
  const serverEnv = {
    DATABASE_URL: databaseUrl,
    PORT: port,
    HOST: host,
    NODE_ENV: setting('NODE_ENV', 'development'),
    SEED_DEMO: setting('SEED_DEMO', 'true'),
    JWT_SECRET: jwtSecret(),
    PUBLIC_URL: publicUrl,
    FRONTEND_DIST: setting('FRONTEND_DIST', join(ROOT, 'frontend', 'dist')),
    DEMO_ACCOUNTS_FILE: demoAccountsFile,
    // The captured-mail page (/dev/mail, loopback only) is for this local development instance.
    DEV_MAIL_PAGE: setting('DEV_MAIL_PAGE', setting('NODE_ENV', 'development') === 'production' ? 'false' : 'true'),
  };

  process.on('SIGINT', () => supervisor.shutdown(0));
  process.on('SIGTERM', () => supervisor.shutdown(0));

  const fakes = fakeSettings();
  if (fakes) {
    supervisor.launch('fakes', FAKES_ENTRY, fakes.fakesEnv);
    const ready = await waitFor(async () => (await Promise.all(fakes.ports.map(portAnswers))).every(Boolean), FAKES_TIMEOUT_MS);
    if (!ready && !supervisor.stopping) {
      warn(`the fakes do not answer on ${fakes.ports.join(', ')} yet; starting the server anyway`);
    }
    Object.assign(serverEnv, fakes.serverEnv);
  }

  supervisor.launch('server', SERVER_ENTRY, serverEnv);
  const probeHost = host === '0.0.0.0' || host === '::' ? '127.0.0.1' : host;
  const healthy = await waitFor(() => healthAnswers(`http://${probeHost}:${port}/health`), HEALTH_TIMEOUT_MS);
  if (supervisor.stopping) {
    return;
  }
  if (!healthy) {
    warn(`/health did not answer 200 within ${HEALTH_TIMEOUT_MS / 1000} s; stopping`);
    supervisor.shutdown(1);
    return;
  }

  const workers = Number(setting('WORKERS', '1'));
  if (!existsSync(WORKER_ENTRY)) {
    note('backend/dist/worker.js is not there yet: no worker processes started');
  } else {
    for (let index = 1; index <= workers; index += 1) {
      supervisor.launch(`worker-${index}`, WORKER_ENTRY, serverEnv);
    }
  }

  note(`Stratochron is running at ${publicUrl}`);
  printDemoAccounts(demoAccountsFile);
  note('press Ctrl-C to stop the server (or run `npm run stop` elsewhere)');
}

await main();
