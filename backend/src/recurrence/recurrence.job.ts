import { Injectable, Logger } from '@nestjs/common';
import { AgeModelRunsRepository } from '../age-models/age-model-runs.repository';
import { loadDensity, StoredAgeModelResults } from '../age-models/age-model-results';
import { RecurrenceInputError } from '../chronology/recurrence';
import { ComputeCancelled, runInThread } from '../jobs/compute-runner';
import { RecurrenceSource } from './recurrence-results';
import { RecurrenceAnalysisRow, RecurrenceRepository } from './recurrence.repository';
import type { RecurrenceInputSnapshot } from './recurrence.service';

/** Most attempts an analysis gets when its worker dies under it. */
export const RECURRENCE_MAX_ATTEMPTS = 2;

/** Executes one queued recurrence analysis in a worker process. */
@Injectable()
export class RecurrenceJob {
  private readonly logger = new Logger(RecurrenceJob.name);

  constructor(
    private readonly analyses: RecurrenceRepository,
    private readonly ageModelRuns: AgeModelRunsRepository,
  ) {}

  async execute(analysisId: string): Promise<void> {
    const analysis = await this.analyses.claim(analysisId);
    if (!analysis) return; // cancelled, or already taken by another worker
    let lastWrite = 0;
    try {
      const source = await this.sourceOf(analysis);
      const results = await runInThread(
        {
          kind: 'recurrence',
          source,
          settings: {
            forecastStartYearCe: analysis.forecastStartYear,
            windowsYears: analysis.windowsYears,
            drawCount: analysis.draws,
            seed: analysis.seed,
          },
        },
        {
          onProgress: (fraction) => {
            const now = Date.now();
            if (now - lastWrite < 1000 && fraction < 1) return;
            lastWrite = now;
            void this.analyses.setProgress(analysisId, Math.min(0.99, fraction)).catch(() => undefined);
          },
          shouldCancel: async () => (await this.analyses.statusOf(analysisId)) === 'CANCELLED',
        },
      );
      await this.analyses.finish(analysisId, {
        status: 'SUCCEEDED',
        progress: 1,
        message: `${results.drawCount} draws of ${results.eventCount} events`,
        results,
      });
    } catch (error) {
      if (error instanceof ComputeCancelled) return;
      const message = error instanceof Error ? error.message : String(error);
      this.logger.warn(`recurrence analysis ${analysisId} failed: ${message}`);
      await this.analyses.finish(analysisId, {
        status: 'FAILED',
        message: error instanceof RecurrenceInputError ? message : `the computation failed: ${message}`,
      });
    }
  }

  /** The event ages the analysis was queued with: stored regional densities, or the cited age model run's draws. */
  private async sourceOf(analysis: RecurrenceAnalysisRow): Promise<RecurrenceSource> {
    const snapshot = analysis.inputSnapshot as RecurrenceInputSnapshot;
    if (snapshot.kind === 'segment') {
      return { kind: 'ordered-densities', densities: snapshot.regionalEvents.map((event) => loadDensity(event.density)) };
    }
    const run = await this.ageModelRuns.findById(snapshot.ageModelRunId);
    const eventDraws = (run?.results as StoredAgeModelResults | null | undefined)?.eventDraws;
    if (!eventDraws) throw new RecurrenceInputError('siteId', 'the age model run this analysis used no longer exists');
    return {
      kind: 'joint-draws',
      eventCount: eventDraws.eventHorizonIds.length,
      drawCount: eventDraws.drawCount,
      draws: Float64Array.from(eventDraws.draws),
    };
  }
}
