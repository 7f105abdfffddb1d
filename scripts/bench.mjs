// `npm run bench`: build the backend and run its benchmark entry point, which prints the figures.
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { ensureBuilt } from './lib/build.mjs';
import { ensureDependencies } from './lib/deps.mjs';
import { ensureDatabaseUrl } from './lib/postgres.mjs';
import { ROOT, note, runInherit } from './lib/run.mjs';

const BENCH_ENTRY = join(ROOT, 'backend', 'dist', 'bench', 'main.js');

ensureDependencies();
ensureBuilt('backend');
if (existsSync(BENCH_ENTRY)) {
  // The API benchmarks make (and drop) their own database beside this one.
  const env = { ...process.env, DATABASE_URL: await ensureDatabaseUrl('dev') };
  process.exitCode = runInherit(process.execPath, [BENCH_ENTRY, ...process.argv.slice(2)], { env });
} else {
  note('no benchmarks yet (backend/dist/bench/main.js is not built)');
}
