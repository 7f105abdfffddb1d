import { Injectable, Logger } from '@nestjs/common';
import { ComputeCancelled, runInThread } from './compute-runner';
import { RunKind } from './run-kind';
import { RunsRepository, RunTable, RunValues } from './runs.repository';

/** Progress writes (the heartbeat) at most this often. */
const PROGRESS_INTERVAL_MS = 1000;

/**
 * Executes one queued run of any kind in a worker process: claim it (a cancelled run, or one
 * another worker took, is skipped), build its input, compute in a worker thread while writing
 * progress at most once a second and stopping when a user cancels, then store the result as
 * SUCCEEDED or the error as FAILED.
 */
@Injectable()
export class RunExecutor {
  private readonly logger = new Logger(RunExecutor.name);

  constructor(private readonly runs: RunsRepository) {}

  async execute<T extends RunTable, Input, Output>(kind: RunKind<T, Input, Output>, runId: string): Promise<void> {
    const run = await this.runs.claim(kind.table, runId);
    if (!run) return; // cancelled, or already taken by another worker
    let lastWrite = 0;
    let ended: 'SUCCEEDED' | 'FAILED';
    try {
      const input = await kind.input(run);
      const output = await runInThread(kind.compute, input, {
        onProgress: (fraction) => {
          const now = Date.now();
          if (now - lastWrite < PROGRESS_INTERVAL_MS && fraction < 1) return;
          lastWrite = now;
          // Never 1 before the results are stored: 1 means finished.
          void this.runs.setProgress(kind.table, runId, Math.min(0.99, fraction)).catch(() => undefined);
        },
        shouldCancel: async () => (await this.runs.statusOf(kind.table, runId)) === 'CANCELLED',
      });
      await this.runs.finish(kind.table, runId, 'SUCCEEDED', { progress: 1, ...kind.succeeded(output, run) } as RunValues<T>);
      ended = 'SUCCEEDED';
    } catch (error) {
      if (error instanceof ComputeCancelled) return;
      this.logger.warn(`${kind.label} ${runId} failed: ${error instanceof Error ? error.message : String(error)}`);
      await this.runs.finish(kind.table, runId, 'FAILED', { message: kind.failureMessage(error) } as RunValues<T>);
      ended = 'FAILED';
    }
    await kind.afterFinish?.(runId, ended).catch((error: unknown) =>
      this.logger.warn(`${kind.label} ${runId}: after it ended: ${error instanceof Error ? error.message : String(error)}`),
    );
  }
}
