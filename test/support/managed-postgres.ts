import { existsSync, readFileSync, realpathSync } from 'node:fs';
import { join } from 'node:path';
import { Client } from 'pg';
import { REPOSITORY_ROOT } from './processes';

/** What the tests use of scripts/lib/postgres.mjs (plain ESM, no types of its own). */
interface PostgresScripts {
  ensureCluster(name: string): Promise<{ port: number; dataDir: string }>;
  stopCluster(name: string): boolean;
}

const loadScripts = () => import(join(REPOSITORY_ROOT, 'scripts', 'lib', 'postgres.mjs')) as Promise<PostgresScripts>;

/** The port the managed test cluster listens on (scripts/lib/postgres.mjs: 54339 unless STRATOCHRON_PG_PORT). */
function managedTestPort(): number {
  return Number(process.env.STRATOCHRON_PG_PORT ?? 54339);
}

function managedTestDataDir(): string | null {
  const local = join(REPOSITORY_ROOT, '.data', 'postgres', 'test');
  return existsSync(join(local, 'PG_VERSION')) ? realpathSync(local) : null;
}

/**
 * Why this run cannot stop and start its PostgreSQL server, or null when it can: only the
 * project's own test cluster (the one `npm test` starts) is ever restarted, and only when
 * DATABASE_URL really points at it (the server reports that cluster's data folder).
 */
export async function managedClusterProblem(): Promise<string | null> {
  const url = process.env.DATABASE_URL;
  if (!url) return 'DATABASE_URL is not set';
  const parsed = new URL(url);
  if (!['127.0.0.1', 'localhost'].includes(parsed.hostname) || Number(parsed.port || 5432) !== managedTestPort()) {
    return `DATABASE_URL does not point at the project's test cluster on 127.0.0.1:${managedTestPort()} (npm test without DATABASE_URL uses it)`;
  }
  const dataDir = managedTestDataDir();
  if (!dataDir) return 'the test cluster .data/postgres/test does not exist';
  const pidFile = join(dataDir, 'postmaster.pid');
  if (!existsSync(pidFile) || Number(readFileSync(pidFile, 'utf8').split('\n')[3]) !== managedTestPort()) {
    return 'the test cluster is not the server running on that port';
  }
  const client = new Client({ connectionString: url });
  try {
    await client.connect();
    const { rows } = await client.query<{ data_directory: string }>('show data_directory');
    if (realpathSync(rows[0].data_directory) !== dataDir) return 'the server on that port is not the test cluster';
  } catch (error) {
    return `cannot ask the server for its data folder: ${error instanceof Error ? error.message : String(error)}`;
  } finally {
    await client.end().catch(() => undefined);
  }
  return null;
}

/** Stop the test cluster (fast mode: sessions are ended). */
export async function stopTestCluster(): Promise<void> {
  const { stopCluster } = await loadScripts();
  if (!stopCluster('test')) throw new Error('the test cluster was not running');
}

/** Start the test cluster again with the options scripts/lib/postgres.mjs always uses. */
export async function startTestCluster(): Promise<void> {
  const { ensureCluster } = await loadScripts();
  await ensureCluster('test');
}
