// `npm run db:restore FILE`: replace the dev database's contents (or DATABASE_URL's) with a backup.
import { spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { clientTool, ensureDatabaseUrl } from './lib/postgres.mjs';
import { capture, fail, note } from './lib/run.mjs';

if (!process.argv[2]) {
  fail('usage: npm run db:restore -- FILE   (a dump made by npm run db:backup, e.g. .data/backups/*.dump)');
}
// npm runs scripts from the root; INIT_CWD is where the user typed the command.
const source = resolve(process.env.INIT_CWD ?? process.cwd(), process.argv[2]);
if (!existsSync(source)) {
  fail(`no such backup file: ${source}`);
}

const databaseUrl = await ensureDatabaseUrl('dev');
const psqlArgs = ['-X', '-q', '-v', 'ON_ERROR_STOP=1', `--dbname=${databaseUrl}`];

// pg_restore --clean cannot drop the job queue's partitioned tables (their keys are inherited),
// so the restore empties the database by dropping every schema in it, then replays the backup.
const listed = capture(clientTool('psql'), [...psqlArgs, '-tAc', "SELECT quote_ident(nspname) FROM pg_namespace WHERE nspname NOT LIKE 'pg\\_%' AND nspname <> 'information_schema'"]);
if (listed.status !== 0) {
  fail(`cannot read the database's schemas: ${listed.stderr.trim()}`);
}
const schemas = listed.stdout.split('\n').map((line) => line.trim()).filter(Boolean);
const dumpList = capture(clientTool('pg_restore'), ['--list', source]);
if (dumpList.status !== 0) {
  fail(`not a backup pg_restore can read: ${dumpList.stderr.trim()}`);
}
const dumpCreatesPublic = /\bSCHEMA - public\b/.test(dumpList.stdout);
const emptying = [
  ...schemas.map((schema) => `DROP SCHEMA ${schema} CASCADE;`),
  ...(dumpCreatesPublic ? [] : ['CREATE SCHEMA public;']),
].join('\n');

/**
 * One transaction around the emptying and the replay, committed only when pg_restore finished
 * cleanly, so a restore that fails part-way leaves the database as it was.
 */
function restore() {
  return new Promise((done) => {
    const psql = spawn(clientTool('psql'), psqlArgs, { stdio: ['pipe', 'inherit', 'pipe'] });
    let psqlErrors = '';
    psql.stderr.on('data', (chunk) => {
      psqlErrors += chunk;
      process.stderr.write(chunk);
    });
    psql.stdin.on('error', () => undefined); // psql stops reading when a statement fails
    psql.stdin.write(`BEGIN;\n${emptying}\n`);
    const dump = spawn(clientTool('pg_restore'), ['--no-owner', '--file=-', source], { stdio: ['ignore', 'pipe', 'inherit'] });
    dump.stdout.pipe(psql.stdin, { end: false });
    let dumpStatus = null;
    dump.on('close', (code) => {
      dumpStatus = code;
      psql.stdin.end(code === 0 ? 'COMMIT;\n' : 'ROLLBACK;\n');
    });
    psql.on('exit', (code) => done(code === 0 && dumpStatus === 0 && !/ERROR:/.test(psqlErrors)));
  });
}

if (!(await restore())) {
  fail('the restore failed (see the output above); the database is unchanged');
}
note(`restored ${source}`);
