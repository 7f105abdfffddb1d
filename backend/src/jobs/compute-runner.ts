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

/** A computation stopped because it ran past its `timeLimitMs`. */
export class ComputeTimedOut extends Error {
  constructor(readonly limitMs: number) {
    super(`the computation ran past its ${limitMs} ms`);
    this.name = 'ComputeTimedOut';
  }
}

export interface ComputeHooks {
  onProgress(fraction: number): void;
  /** Polled about once a second; true ends the computation with ComputeCancelled. */
  shouldCancel(): Promise<boolean>;
  /**
   * Wall-clock budget: a thread still computing after it is terminated and the call rejects with
   * ComputeTimedOut. Inline (from TypeScript sources) the computation cannot be stopped midway,
   * so one that took longer is refused the same way when it ends.
   */
  timeLimitMs?: number;
}

/**
 * Runs a long, synchronous computation off the event loop so the worker can keep writing progress
 * and polling for cancellation. From the built JavaScript it uses a worker thread (terminated on
 * cancel); from TypeScript sources (unit tests) it runs inline, reporting progress synchronously.
 */
export async function runInThread<Input, Output>(task: ComputeTask<Input, Output>, input: Input, hooks: ComputeHooks): Promise<Output> {
  const threadFile = join(__dirname, 'compute.thread.js');
  const limit = hooks.timeLimitMs;
  if (!existsSync(threadFile) || !task.file.endsWith('.js')) {
    if (await hooks.shouldCancel()) throw new ComputeCancelled();
    const started = performance.now();
    const output = task.run(input, hooks.onProgress);
    if (limit !== undefined && performance.now() - started > limit) throw new ComputeTimedOut(limit);
    return output;
  }
  const workerData: ComputeThreadData = { file: task.file, exportName: task.exportName, input };
  const worker = new Worker(threadFile, { workerData });
  let cancelled = false;
  let timedOut = false;
  const timer =
    limit === undefined
      ? undefined
      : setTimeout(() => {
          timedOut = true;
          void worker.terminate();
        }, limit);
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
        if (timedOut) reject(new ComputeTimedOut(limit as number));
        else if (cancelled) reject(new ComputeCancelled());
        else if (code !== 0) reject(new Error(`computation thread exited with code ${code}`));
      });
    });
  } finally {
    clearInterval(poll);
    clearTimeout(timer);
    await worker.terminate();
  }
}
