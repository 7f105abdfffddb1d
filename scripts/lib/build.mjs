// Rebuild a workspace (backend, frontend) only when its sources changed since the last build.
import { existsSync, readdirSync, statSync, utimesSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { NPM, ROOT, dataPath, fail, note, runInherit } from './run.mjs';

const SKIPPED_FOLDERS = new Set(['node_modules', 'dist', 'coverage', '.vite']);

function newestSourceTime(folder) {
  let newest = 0;
  for (const entry of readdirSync(folder, { withFileTypes: true })) {
    if (entry.isDirectory() && SKIPPED_FOLDERS.has(entry.name)) {
      continue;
    }
    const path = join(folder, entry.name);
    const time = entry.isDirectory() ? newestSourceTime(path) : statSync(path).mtimeMs;
    newest = Math.max(newest, time);
  }
  return newest;
}

/**
 * Run `npm run build -w <workspace>` when its dist folder is missing or older than anything in
 * the workspace (or the lock file). A stamp in .data/build records the last good build, since
 * build tools may leave unchanged outputs with old times.
 */
export function ensureBuilt(workspace) {
  const folder = join(ROOT, workspace);
  const stamp = dataPath('build', `${workspace}.built`);
  const sourcesTime = Math.max(newestSourceTime(folder), statSync(join(ROOT, 'package-lock.json')).mtimeMs);
  const upToDate = existsSync(join(folder, 'dist')) && existsSync(stamp) && statSync(stamp).mtimeMs >= sourcesTime;
  if (upToDate) {
    return;
  }
  note(`building ${workspace}`);
  // Stamped with the start time so a source saved during the build still counts as newer.
  const startedAt = new Date();
  if (runInherit(NPM, ['run', 'build', '-w', workspace]) !== 0) {
    fail(`the ${workspace} build failed (npm run build -w ${workspace}; see the output above)`);
  }
  writeFileSync(stamp, `${startedAt.toISOString()}\n`);
  utimesSync(stamp, startedAt, startedAt);
}
