import { ChildProcess, spawn } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { mkdirSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { Client } from 'pg';
import { TEST_JWT_SECRET } from './app';

/**
 * Helpers for tests that need the API or a worker as a real operating-system process (to kill
 * it): a private build of the backend, free ports, private databases, and spawned processes.
 */

export const REPOSITORY_ROOT = join(__dirname, '..', '..');

/**
 * Compile the backend with tsc into a private folder under `.data/` (inside the repository, so
 * module resolution and the schema/migrations lookups find the root's files), leaving the
 * shared `backend/dist` alone. Returns the folder; remove it with `removeBuild`.
 */
export async function buildBackend(): Promise<string> {
  const outDir = join(REPOSITORY_ROOT, '.data', 'test-build', randomUUID().slice(0, 8));
  mkdirSync(outDir, { recursive: true });
  const tsc = join(REPOSITORY_ROOT, 'node_modules', 'typescript', 'bin', 'tsc');
  const output: string[] = [];
  const code = await new Promise<number | null>((resolve, reject) => {
    const child = spawn(process.execPath, [tsc, '-p', join(REPOSITORY_ROOT, 'backend', 'tsconfig.build.json'), '--outDir', outDir, '--sourceMap', 'false'], {
      cwd: REPOSITORY_ROOT,
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    child.stdout.on('data', (chunk: Buffer) => output.push(chunk.toString()));
    child.stderr.on('data', (chunk: Buffer) => output.push(chunk.toString()));
    child.on('error', reject);
    child.on('exit', resolve);
  });
  if (code !== 0) throw new Error(`backend build failed (tsc exit ${code}):\n${output.join('').slice(-4000)}`);
  return outDir;
}

export function removeBuild(outDir: string | undefined): void {
  if (outDir) rmSync(outDir, { recursive: true, force: true });
}

/** A TCP port nobody listens on right now (the OS picks it). */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.unref();
    server.on('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

/** `base` with another database name. */
export function withDatabase(base: string, database: string): string {
  const url = new URL(base);
  url.pathname = `/${database}`;
  return url.toString();
}

/** Create an empty database beside DATABASE_URL's, for a test file that must not disturb others. */
export async function createPrivateDatabase(prefix: string): Promise<string> {
  const base = process.env.DATABASE_URL;
  if (!base) throw new Error('DATABASE_URL is not set: run the integration tests through `npm test`');
  const name = `${prefix}_${randomUUID().replace(/-/g, '').slice(0, 10)}`;
  const client = new Client({ connectionString: base });
  await client.connect();
  try {
    await client.query(`create database "${name}"`);
  } finally {
    await client.end();
  }
  return withDatabase(base, name);
}

export async function dropPrivateDatabase(url: string | undefined): Promise<void> {
  const base = process.env.DATABASE_URL;
  if (!url || !base || url === base) return;
  const name = new URL(url).pathname.slice(1);
  const client = new Client({ connectionString: base });
  await client.connect();
  try {
    await client.query(`drop database if exists "${name}" with (force)`);
  } finally {
    await client.end();
  }
}

const wait = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** Thrown by a `waitFor` probe to stop waiting at once (e.g. the process died). */
export class GiveUp extends Error {}

/** Poll `probe` until it returns a value other than undefined, or fail after `timeoutMs`. */
export async function waitFor<T>(what: string, probe: () => Promise<T | undefined>, timeoutMs: number, everyMs = 100): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  let lastError: unknown;
  for (;;) {
    try {
      const value = await probe();
      if (value !== undefined) return value;
    } catch (error) {
      if (error instanceof GiveUp) throw error;
      lastError = error;
    }
    if (Date.now() > deadline) {
      throw new Error(`timed out after ${timeoutMs} ms waiting for ${what}${lastError ? ` (last error: ${String(lastError)})` : ''}`);
    }
    await wait(everyMs);
  }
}

/** A spawned backend process with its recent output kept for failure messages. */
export class BackendProcess {
  private readonly output: string[] = [];
  readonly exited: Promise<{ code: number | null; signal: NodeJS.Signals | null }>;

  constructor(
    readonly label: string,
    readonly child: ChildProcess,
  ) {
    const keep = (chunk: Buffer) => {
      this.output.push(chunk.toString());
      if (this.output.length > 200) this.output.splice(0, this.output.length - 200);
    };
    child.stdout?.on('data', keep);
    child.stderr?.on('data', keep);
    this.exited = new Promise((resolve) => child.on('exit', (code, signal) => resolve({ code, signal })));
  }

  get running(): boolean {
    return this.child.exitCode === null && this.child.signalCode === null;
  }

  log(): string {
    return this.output.join('').slice(-4000);
  }

  /** Send the signal and wait until the process is gone (a graceful stop gets 10 s, then SIGKILL). */
  async kill(signal: NodeJS.Signals = 'SIGKILL'): Promise<void> {
    if (!this.running) return;
    this.child.kill(signal);
    if (signal === 'SIGKILL') {
      await this.exited;
      return;
    }
    const timer = setTimeout(() => this.child.kill('SIGKILL'), 10_000);
    await this.exited;
    clearTimeout(timer);
  }
}

export interface SpawnOptions {
  buildDir: string;
  databaseUrl: string;
  env?: Record<string, string>;
}

function backendEnv(options: SpawnOptions, extra: Record<string, string>): NodeJS.ProcessEnv {
  return {
    PATH: process.env.PATH,
    HOME: process.env.HOME,
    NODE_ENV: 'test',
    DATABASE_URL: options.databaseUrl,
    JWT_SECRET: TEST_JWT_SECRET,
    SEED_DEMO: 'false',
    FRONTEND_DIST: '/nonexistent',
    ...extra,
    ...options.env,
  };
}

export interface ApiProcess extends BackendProcess {
  url: string;
  port: number;
}

/** Start `main.js` of the build on `port` (a free one by default) and wait until /health answers 200. */
export async function spawnApi(options: SpawnOptions & { port?: number }): Promise<ApiProcess> {
  const port = options.port ?? (await freePort());
  const child = spawn(process.execPath, [join(options.buildDir, 'main.js')], {
    cwd: REPOSITORY_ROOT,
    env: backendEnv(options, { PORT: String(port), HOST: '127.0.0.1' }),
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const api = Object.assign(new BackendProcess('api', child), { url: `http://127.0.0.1:${port}`, port });
  try {
    await waitFor(
      'the API to answer /health',
      async () => {
        if (!api.running) throw new GiveUp('the API exited');
        const response = await fetch(`${api.url}/health`);
        return response.status === 200 ? true : undefined;
      },
      60_000,
      200,
    );
  } catch (error) {
    await api.kill();
    throw new Error(`${error instanceof Error ? error.message : String(error)}\n${api.log()}`);
  }
  return api;
}

/** Start `worker.js` of the build and wait for its ready line. */
export async function spawnWorker(options: SpawnOptions): Promise<BackendProcess> {
  const child = spawn(process.execPath, [join(options.buildDir, 'worker.js')], {
    cwd: REPOSITORY_ROOT,
    env: backendEnv(options, {}),
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const worker = new BackendProcess('worker', child);
  try {
    await waitFor(
      'the worker to be ready',
      async () => {
        if (!worker.running) throw new GiveUp('the worker exited');
        return worker.log().includes('ready') ? true : undefined;
      },
      60_000,
      200,
    );
  } catch (error) {
    await worker.kill();
    throw new Error(`${error instanceof Error ? error.message : String(error)}\n${worker.log()}`);
  }
  return worker;
}
