// Pid files in .data/run/<role>.pid, so `npm run stop` can end what `npm start` launched.
import { existsSync, mkdirSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { DATA_DIR } from './run.mjs';

export const RUN_DIR = join(DATA_DIR, 'run');

export function pidFile(role) {
  return join(RUN_DIR, `${role}.pid`);
}

export function writePidFile(role, pid) {
  mkdirSync(RUN_DIR, { recursive: true });
  writeFileSync(pidFile(role), `${pid}\n`);
}

export function removePidFile(role) {
  rmSync(pidFile(role), { force: true });
}

/**
 * Whether pid is a live Node.js process. The name check keeps a pid file left over from before
 * a reboot from pointing a signal at an unrelated program that got the same pid.
 */
export function isLiveNodeProcess(pid) {
  try {
    process.kill(pid, 0);
  } catch {
    return false;
  }
  const cmdline = `/proc/${pid}/cmdline`;
  return !existsSync('/proc/self') || (existsSync(cmdline) && readFileSync(cmdline, 'utf8').includes('node'));
}

/** Every recorded process as { role, pid }, live or not. */
export function readPidFiles() {
  if (!existsSync(RUN_DIR)) {
    return [];
  }
  return readdirSync(RUN_DIR)
    .filter((name) => name.endsWith('.pid'))
    .map((name) => ({
      role: name.slice(0, -'.pid'.length),
      pid: Number(readFileSync(join(RUN_DIR, name), 'utf8').trim()),
    }));
}
