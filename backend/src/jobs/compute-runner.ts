import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { Worker } from 'node:worker_threads';
import { ComputeTask, ComputeThreadData } from './compute-task';

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
export async function runInThread<Input, Output>(task: ComputeTask<Input, Output>, input: Input, hooks: ComputeHooks): Promise<Output> {
  const threadFile = join(__dirname, 'compute.thread.js');
  if (!existsSync(threadFile) || !task.file.endsWith('.js')) {
    if (await hooks.shouldCancel()) throw new ComputeCancelled();
    return task.run(input, hooks.onProgress);
  }
  const workerData: ComputeThreadData = { file: task.file, exportName: task.exportName, input };
  const worker = new Worker(threadFile, { workerData });
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
    return await new Promise<Output>((resolve, reject) => {
      worker.on('message', (message: { type: 'progress'; fraction: number } | { type: 'result'; result: Output }) => {
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
