// `npm run db:backup [FILE]`: pg_dump (custom format) of the dev database, or of DATABASE_URL.
import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { clientTool, ensureDatabaseUrl } from './lib/postgres.mjs';
import { dataPath, fail, note, runInherit } from './lib/run.mjs';

const stamp = new Date().toISOString().slice(0, 19).replace(/[-:]/g, '').replace('T', '-');
// npm runs scripts from the root; INIT_CWD is where the user typed the command.
const target = process.argv[2]
  ? resolve(process.env.INIT_CWD ?? process.cwd(), process.argv[2])
  : dataPath('backups', `stratochron-${stamp}.dump`);
mkdirSync(dirname(target), { recursive: true });

// Trust authentication over TCP as user postgres: client tools need no switch of system user.
const databaseUrl = await ensureDatabaseUrl('dev');
if (runInherit(clientTool('pg_dump'), ['--format=custom', `--file=${target}`, `--dbname=${databaseUrl}`]) !== 0) {
  fail('pg_dump failed (see the output above)');
}
note(`backup written to ${target}`);
