import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { Worker } from 'node:worker_threads';
import { ComputeRequest, ComputeResult, runCompute } from './compute-tasks';

export class ComputeCancelled extends Error {
  constructor() {
    super('cancelled');
    this.name = 'ComputeCancelled';
  }
}

export interface ComputeHooks {
  onProgress(fraction: number): void;
  /** Polled about once a second; true ends the computation with ComputeCancelled. */
  shouldCancel(): Promise<boolean>;
}

/**
 * Runs a long, synchronous computation off the event loop so the worker can keep writing progress
 * and polling for cancellation. From the built JavaScript it uses a worker thread (terminated on
 * cancel); from TypeScript sources (unit tests) it runs inline, reporting progress synchronously.
 */
export async function runInThread<K extends ComputeRequest['kind']>(
  request: Extract<ComputeRequest, { kind: K }>,
  hooks: ComputeHooks,
): Promise<ComputeResult<K>> {
  const threadFile = join(__dirname, 'compute.thread.js');
  if (!existsSync(threadFile)) {
    if (await hooks.shouldCancel()) throw new ComputeCancelled();
    return runCompute(request, hooks.onProgress) as ComputeResult<K>;
  }
  const worker = new Worker(threadFile, { workerData: request });
  let cancelled = false;
  const poll = setInterval(() => {
    hooks.shouldCancel().then(
      (cancel) => {
        if (cancel && !cancelled) {
          cancelled = true;
          void worker.terminate();
        }
      },
      () => undefined,
    );
  }, 1000);
  try {
    return await new Promise<ComputeResult<K>>((resolve, reject) => {
      worker.on('message', (message: { type: 'progress'; fraction: number } | { type: 'result'; result: ComputeResult<K> }) => {
        if (message.type === 'progress') hooks.onProgress(message.fraction);
        else resolve(message.result);
      });
      worker.on('error', reject);
      worker.on('exit', (code) => {
        if (cancelled) reject(new ComputeCancelled());
        else if (code !== 0) reject(new Error(`computation thread exited with code ${code}`));
      });
    });
  } finally {
    clearInterval(poll);
    await worker.terminate();
  }
}
