import { existsSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { Pool } from 'pg';

/** The repository's `drizzle/` migrations folder, found by walking up from this file. */
export function migrationsFolder(): string {
  let dir = __dirname;
  for (;;) {
    if (existsSync(join(dir, 'drizzle', 'meta', '_journal.json'))) return join(dir, 'drizzle');
    const parent = dirname(dir);
    if (parent === dir) throw new Error(`drizzle/ migrations not found above ${__dirname}`);
    dir = parent;
  }
}

/** Apply every pending migration. Safe to run from several processes: drizzle takes a lock per run. */
export async function runMigrations(databaseUrl: string): Promise<void> {
  const pool = new Pool({ connectionString: databaseUrl, max: 1 });
  try {
    // Serialise concurrent starts (API and workers booting together) on an advisory lock.
    const client = await pool.connect();
    try {
      await client.query('select pg_advisory_lock(727274)');
      await migrate(drizzle(client), { migrationsFolder: migrationsFolder() });
    } finally {
      await client.query('select pg_advisory_unlock(727274)').catch(() => undefined);
      client.release();
    }
  } finally {
    await pool.end();
  }
}
