import { parentPort, workerData } from 'node:worker_threads';
import type { ComputeTask, ComputeThreadData } from './compute-task';

/** Entry point of a computation thread: load the task, run it, stream progress, post the result. */
const { file, exportName, input } = workerData as ComputeThreadData;
// eslint-disable-next-line @typescript-eslint/no-require-imports -- the task's module is known only at run time
const task = (require(file) as Record<string, ComputeTask<unknown, unknown>>)[exportName];
if (!task || typeof task.run !== 'function') throw new Error(`no compute task ${exportName} in ${file}`);
let lastPosted = 0;
const result = task.run(input, (fraction: number) => {
  const now = Date.now();
  if (now - lastPosted < 250 && fraction < 1) return;
  lastPosted = now;
  parentPort?.postMessage({ type: 'progress', fraction });
});
parentPort?.postMessage({ type: 'result', result });
