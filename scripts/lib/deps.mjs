// Install npm dependencies when node_modules does not match package-lock.json.
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { NPM, ROOT, fail, note, runInherit } from './run.mjs';

const LOCK_FILE = join(ROOT, 'package-lock.json');
const NODE_MODULES = join(ROOT, 'node_modules');
const STAMP_FILE = join(NODE_MODULES, '.stratochron-installed');
// npm writes this after every successful install; it being newer than the lock means npm itself
// considers node_modules current (someone ran `npm install` by hand).
const NPM_HIDDEN_LOCK = join(NODE_MODULES, '.package-lock.json');

function lockHash() {
  return createHash('sha256').update(readFileSync(LOCK_FILE)).digest('hex');
}

function installedHash() {
  return existsSync(STAMP_FILE) ? readFileSync(STAMP_FILE, 'utf8').trim() : null;
}

function npmConsidersCurrent() {
  return existsSync(NPM_HIDDEN_LOCK) && statSync(NPM_HIDDEN_LOCK).mtimeMs >= statSync(LOCK_FILE).mtimeMs;
}

/**
 * Make node_modules match package-lock.json: `npm ci` when the stamp's lock hash differs,
 * `npm install` when there is no lock yet. A tree npm already installed from this lock is
 * adopted without reinstalling, because `npm ci` would delete node_modules under anyone else
 * running from it.
 */
export function ensureDependencies() {
  if (!existsSync(LOCK_FILE)) {
    note('no package-lock.json: running npm install');
    if (runInherit(NPM, ['install']) !== 0) {
      fail('npm install failed (see the output above)');
    }
    writeFileSync(STAMP_FILE, `${lockHash()}\n`);
    return;
  }
  const wanted = lockHash();
  if (installedHash() === wanted) {
    return;
  }
  if (!existsSync(NODE_MODULES) || !npmConsidersCurrent()) {
    note('node_modules is missing or older than package-lock.json: running npm ci');
    if (runInherit(NPM, ['ci']) !== 0) {
      fail('npm ci failed (see the output above); if package.json changed, run npm install to update the lock');
    }
  }
  writeFileSync(STAMP_FILE, `${wanted}\n`);
}
