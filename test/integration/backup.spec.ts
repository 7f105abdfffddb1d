import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client } from 'pg';
import { startTestServer } from '../support/app';
import { createProjectFixture } from '../support/fixtures';
import { createPrivateDatabase, dropPrivateDatabase, REPOSITORY_ROOT } from '../support/processes';

/**
 * `npm run db:backup` then `npm run db:restore FILE` on a private database filled by the demo
 * seed: after rows are deleted, changed and added, the restore brings every table back exactly.
 */

interface TableFigures {
  rows: number;
  /** md5 of every row's text, in primary-key order. */
  checksum: string;
}

let databaseUrl: string | undefined;
let folder: string | undefined;

async function withClient<T>(run: (client: Client) => Promise<T>): Promise<T> {
  const client = new Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    return await run(client);
  } finally {
    await client.end();
  }
}

/** Row count and checksum of every table outside PostgreSQL's own schemas. */
function tableFigures(): Promise<Map<string, TableFigures>> {
  return withClient(async (client) => {
    const { rows: tables } = await client.query<{ schema: string; name: string; key: string | null }>(`
      select n.nspname as schema, c.relname as name,
             (select string_agg(quote_ident(a.attname), ', ' order by k.ord)
                from pg_index i
                cross join lateral unnest(i.indkey) with ordinality as k(attnum, ord)
                join pg_attribute a on a.attrelid = i.indrelid and a.attnum = k.attnum
               where i.indrelid = c.oid and i.indisprimary) as key
        from pg_class c join pg_namespace n on n.oid = c.relnamespace
       where c.relkind in ('r', 'p') and n.nspname not in ('pg_catalog', 'information_schema') and n.nspname not like 'pg_toast%'
       order by 1, 2`);
    const figures = new Map<string, TableFigures>();
    for (const table of tables) {
      const qualified = `${client.escapeIdentifier(table.schema)}.${client.escapeIdentifier(table.name)}`;
      // Tables without a primary key are ordered by their whole row text, which is just as stable.
      const order = table.key ?? 't::text';
      const { rows } = await client.query<{ n: string; checksum: string | null }>(
        `select count(*) as n, md5(string_agg(t::text, E'\\n' order by ${order})) as checksum from ${qualified} t`,
      );
      figures.set(`${table.schema}.${table.name}`, { rows: Number(rows[0].n), checksum: rows[0].checksum ?? '' });
    }
    return figures;
  });
}

function runScript(script: string, args: string[]): { status: number | null; output: string } {
  const result = spawnSync(process.execPath, [join(REPOSITORY_ROOT, 'scripts', script), ...args], {
    cwd: REPOSITORY_ROOT,
    env: { ...process.env, DATABASE_URL: databaseUrl },
    encoding: 'utf8',
    timeout: 120_000,
  });
  return { status: result.status, output: `${result.stdout}${result.stderr}` };
}

beforeAll(async () => {
  const sharedUrl = process.env.DATABASE_URL;
  databaseUrl = await createPrivateDatabase('backup');
  folder = mkdtempSync(join(tmpdir(), 'stratochron-backup-'));
  process.env.DATABASE_URL = databaseUrl;
  try {
    // Migrations, the demo projects and a fixture project: every kind of row the seed writes.
    const server = await startTestServer({ DATABASE_URL: databaseUrl, SEED_DEMO: 'true' });
    await server.close();
    await createProjectFixture('Backup');
  } finally {
    process.env.DATABASE_URL = sharedUrl;
  }
}, 240_000);

afterAll(async () => {
  if (folder) rmSync(folder, { recursive: true, force: true });
  await dropPrivateDatabase(databaseUrl);
});

describe('npm run db:backup and db:restore', () => {
  it('bring back every row of every table after rows were deleted, changed and added', async () => {
    const before = await tableFigures();
    const filled = [...before].filter(([, figures]) => figures.rows > 0).map(([name]) => name);
    // The seed must have reached the tables this test leans on, or it proves little.
    for (const table of ['public.projects', 'public.users', 'public.sites', 'public.units', 'public.event_horizons', 'public.samples', 'public.memberships']) {
      expect(filled, `${table} has rows to back up`).toContain(table);
    }

    const file = join(folder!, 'nested', 'stratochron.dump');
    const backup = runScript('db-backup.mjs', [file]);
    expect(backup.status, backup.output).toBe(0);
    expect(statSync(file).size).toBeGreaterThan(0);

    await withClient(async (client) => {
      await client.query('delete from samples');
      await client.query(`update sites set name = name || ' (changed)'`);
      await client.query(`delete from memberships where role = 'VIEWER'`);
      await client.query(`insert into projects (name, tectonic_setting) values ('Made after the backup', 'CRUSTAL')`);
    });
    const damaged = await tableFigures();
    for (const table of ['public.samples', 'public.sites', 'public.memberships', 'public.projects']) {
      expect(damaged.get(table), `${table} differs before the restore`).not.toEqual(before.get(table));
    }

    const restore = runScript('db-restore.mjs', [file]);
    expect(restore.status, restore.output).toBe(0);
    const after = await tableFigures();
    expect(Object.fromEntries(after)).toEqual(Object.fromEntries(before));
  });
});
