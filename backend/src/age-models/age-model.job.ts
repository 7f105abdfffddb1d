import { Injectable, Logger } from '@nestjs/common';
import { AgeModelSettings } from '../chronology/age-model/age-model';
import { ComputeCancelled, runInThread } from '../jobs/compute-runner';
import { AgeModelRunsRepository } from './age-model-runs.repository';
import { loadInput, storeResults, StoredAgeModelInput } from './age-model-results';

/** Most attempts a run gets when its worker dies under it. */
export const MAX_ATTEMPTS = 2;

/** Executes one queued age model run in a worker process. */
@Injectable()
export class AgeModelJob {
  private readonly logger = new Logger(AgeModelJob.name);

  constructor(private readonly runs: AgeModelRunsRepository) {}

  async execute(runId: string): Promise<void> {
    const run = await this.runs.claim(runId);
    if (!run) return; // cancelled, or already taken by another worker
    let lastWrite = 0;
    try {
      const result = await runInThread(
        { kind: 'age-model', input: loadInput(run.inputSnapshot as StoredAgeModelInput), settings: run.settings as AgeModelSettings },
        {
          onProgress: (fraction) => {
            const now = Date.now();
            if (now - lastWrite < 1000 && fraction < 1) return;
            lastWrite = now;
            void this.runs.setProgress(runId, Math.min(0.99, fraction)).catch(() => undefined);
          },
          shouldCancel: async () => (await this.runs.statusOf(runId)) === 'CANCELLED',
        },
      );
      await this.runs.finish(runId, {
        status: 'SUCCEEDED',
        progress: 1,
        message: result.diagnostics.message,
        diagnostics: result.diagnostics,
        results: storeResults(result),
      });
    } catch (error) {
      if (error instanceof ComputeCancelled) return;
      const message = error instanceof Error ? error.message : String(error);
      this.logger.warn(`age model run ${runId} failed: ${message}`);
      await this.runs.finish(runId, { status: 'FAILED', message: `the computation failed: ${message}` });
    }
  }
}
