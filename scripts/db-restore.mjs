// `npm run db:restore FILE`: replace the dev database's contents (or DATABASE_URL's) with a backup.
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { clientTool, ensureDatabaseUrl } from './lib/postgres.mjs';
import { fail, note, runInherit } from './lib/run.mjs';

if (!process.argv[2]) {
  fail('usage: npm run db:restore -- FILE   (a dump made by npm run db:backup, e.g. .data/backups/*.dump)');
}
// npm runs scripts from the root; INIT_CWD is where the user typed the command.
const source = resolve(process.env.INIT_CWD ?? process.cwd(), process.argv[2]);
if (!existsSync(source)) {
  fail(`no such backup file: ${source}`);
}

const databaseUrl = await ensureDatabaseUrl('dev');
// One transaction, so a restore that fails part-way leaves the database as it was.
const args = ['--clean', '--if-exists', '--no-owner', '--single-transaction', `--dbname=${databaseUrl}`, source];
if (runInherit(clientTool('pg_restore'), args) !== 0) {
  fail('pg_restore failed (see the output above); the database is unchanged');
}
note(`restored ${source}`);
