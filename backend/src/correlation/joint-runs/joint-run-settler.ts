import { Injectable, Logger } from '@nestjs/common';
import { runInThread } from '../../jobs/compute-runner';
import { DatabaseService } from '../../database/database.service';
import { jointSummaryCompute } from './joint-age-model.compute';
import { loadChainDraws, loadJointInput, storeJointResults, type StoredJointChainDraws, type StoredJointModelInput } from './joint-run-storage';
import type { JointRunSettings } from './joint-run-settings';
import { JointRunsRepository, type JointChainState } from './joint-runs.repository';

const OPEN = new Set(['QUEUED', 'RUNNING']);

/** The run's progress from its chains': their mean (each chain is an equal share of the work). */
export function progressOf(chains: readonly Pick<JointChainState, 'status' | 'progress'>[]): number {
  if (chains.length === 0) return 0;
  return chains.reduce((sum, c) => sum + (c.status === 'SUCCEEDED' ? 1 : c.progress), 0) / chains.length;
}

/**
 * Moves a joint run on from its chains, one transaction at a time with the run row locked, so
 * that chains ending at once on several workers settle it exactly once: the first failed chain
 * fails the run with its message (the others are stopped); when every chain has succeeded, the
 * chains are summarised and the run SUCCEEDED; otherwise the run's progress is the chains' mean.
 * Safe to call any number of times (a chain's end, the reaper, a read of a run whose worker died
 * between the two).
 */
@Injectable()
export class JointRunSettler {
  private readonly logger = new Logger(JointRunSettler.name);

  constructor(
    private readonly database: DatabaseService,
    private readonly repository: JointRunsRepository,
  ) {}

  async settle(runId: string): Promise<void> {
    await this.database.transaction(async (tx) => {
      const run = await this.repository.lockRun(runId, tx);
      if (!run || !OPEN.has(run.status)) return;
      const chains = await this.repository.chainStates(runId, tx);
      const failed = chains.find((c) => c.status === 'FAILED' || c.status === 'CANCELLED');
      if (failed) {
        const why = failed.status === 'FAILED' ? `failed: ${failed.message ?? 'no message'}` : 'was stopped';
        await this.repository.endRun(runId, 'FAILED', { message: `chain ${failed.chainIndex + 1} of ${chains.length} ${why}` }, tx);
        await this.repository.stopChains(runId, `chain ${failed.chainIndex + 1} of the run ${failed.status === 'FAILED' ? 'failed' : 'was stopped'}`, tx);
        return;
      }
      if (chains.length === 0 || !chains.every((c) => c.status === 'SUCCEEDED')) {
        await this.repository.setRunProgress(runId, Math.min(0.99, progressOf(chains)), tx);
        return;
      }
      const withDraws = await this.repository.chainsWithDraws(runId, tx);
      const input = loadJointInput(run.inputSnapshot as StoredJointModelInput);
      try {
        const result = await runInThread(
          jointSummaryCompute,
          {
            input,
            chains: withDraws.map((c) => loadChainDraws(c.draws as StoredJointChainDraws)),
            maxStoredDraws: (run.settings as JointRunSettings).maxStoredDraws,
          },
          { onProgress: () => undefined, shouldCancel: async () => false },
        );
        await this.repository.endRun(
          runId,
          'SUCCEEDED',
          { progress: 1, message: result.diagnostics.message, diagnostics: result.diagnostics, results: storeJointResults(result, input) },
          tx,
        );
      } catch (error) {
        const message = error instanceof Error ? error.message : String(error);
        this.logger.warn(`joint age model run ${runId}: summarising its chains failed: ${message}`);
        await this.repository.endRun(runId, 'FAILED', { message: `summarising the chains failed: ${message}` }, tx);
      }
    });
  }
}
