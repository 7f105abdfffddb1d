// `npm run stop`: end what `npm start` launched (from .data/run/*.pid), then the dev cluster.
import { setTimeout as sleep } from 'node:timers/promises';
import { isLiveNodeProcess, readPidFiles, removePidFile } from './lib/pids.mjs';
import { stopCluster } from './lib/postgres.mjs';
import { note, warn } from './lib/run.mjs';

const GRACE_MS = 15_000;

const records = readPidFiles();
const live = records.filter(({ pid }) => isLiveNodeProcess(pid));
// The supervisor goes first: it passes SIGTERM on to its children and expects them to exit.
live.sort((a, b) => Number(b.role === 'start') - Number(a.role === 'start'));
for (const { role, pid } of live) {
  note(`stopping ${role} (pid ${pid})`);
  try {
    process.kill(pid, 'SIGTERM');
  } catch {
    // Already gone between the check and the signal.
  }
}

const deadline = Date.now() + GRACE_MS;
while (live.some(({ pid }) => isLiveNodeProcess(pid)) && Date.now() < deadline) {
  await sleep(200);
}
for (const { role, pid } of live.filter(({ pid: alive }) => isLiveNodeProcess(alive))) {
  warn(`${role} (pid ${pid}) did not stop within ${GRACE_MS / 1000} s; killing it`);
  process.kill(pid, 'SIGKILL');
}
for (const { role } of records) {
  removePidFile(role);
}

if (!stopCluster('dev') && live.length === 0) {
  note('nothing was running');
}
