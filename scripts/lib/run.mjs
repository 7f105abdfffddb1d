// Process helpers shared by the environment scripts. Node built-ins only: these scripts run
// before `npm ci` has put anything in node_modules.
import { spawn, spawnSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** Repository root (the folder holding the root package.json). */
export const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..', '..');

/** Project-local, git-ignored state: database clusters, pid files, secrets, test results. */
export const DATA_DIR = join(ROOT, '.data');

/** Path inside `.data/`, creating its parent folder. */
export function dataPath(...parts) {
  const path = join(DATA_DIR, ...parts);
  mkdirSync(dirname(path), { recursive: true });
  return path;
}

export function note(message) {
  console.log(`[stratochron] ${message}`);
}

export function warn(message) {
  console.warn(`[stratochron] warning: ${message}`);
}

/** Print why the script cannot go on and exit non-zero. */
export function fail(message) {
  console.error(`[stratochron] error: ${message}`);
  process.exit(1);
}

export const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

/** Run a command to completion with the terminal attached; returns the exit code. */
export function runInherit(command, args, options = {}) {
  const result = spawnSync(command, args, { stdio: 'inherit', cwd: ROOT, ...options });
  if (result.error) {
    throw result.error;
  }
  return result.status ?? 1;
}

/** Run a command and capture its output; never throws on a non-zero exit. */
export function capture(command, args, options = {}) {
  const result = spawnSync(command, args, { encoding: 'utf8', cwd: ROOT, ...options });
  return {
    status: result.error ? 127 : (result.status ?? 1),
    stdout: result.stdout ?? '',
    stderr: result.error ? String(result.error.message) : (result.stderr ?? ''),
  };
}

/**
 * Run a command with the terminal attached without blocking the event loop, so the parent can
 * still react to signals. Resolves with the exit code (signals count as failure).
 */
export function runAsync(command, args, options = {}) {
  return new Promise((resolve) => {
    const child = spawn(command, args, { stdio: 'inherit', cwd: ROOT, ...options });
    child.on('error', (error) => {
      warn(`could not run ${command}: ${error.message}`);
      resolve(127);
    });
    child.on('exit', (code) => resolve(code ?? 1));
  });
}

/** Name of the npm executable for spawning (npm is a .cmd shim on Windows). */
export const NPM = process.platform === 'win32' ? 'npm.cmd' : 'npm';
export const NPX = process.platform === 'win32' ? 'npx.cmd' : 'npx';
