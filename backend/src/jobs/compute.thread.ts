import { parentPort, workerData } from 'node:worker_threads';
import { ComputeRequest, runCompute } from './compute-tasks';

/** Entry point of a computation thread: run the request, stream progress, post the result. */
const request = workerData as ComputeRequest;
let lastPosted = 0;
const result = runCompute(request, (fraction: number) => {
  const now = Date.now();
  if (now - lastPosted < 250 && fraction < 1) return;
  lastPosted = now;
  parentPort?.postMessage({ type: 'progress', fraction });
});
parentPort?.postMessage({ type: 'result', result });
