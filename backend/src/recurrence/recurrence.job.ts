import { Injectable, OnModuleInit } from '@nestjs/common';
import { AgeModelRunsRepository } from '../age-models/age-model-runs.repository';
import { loadDensity, StoredAgeModelResults } from '../age-models/age-model-results';
import { RecurrenceInputError } from '../chronology/recurrence';
import { recurrenceAnalyses } from '../database/schema';
import { JobRegistry } from '../jobs/job-registry';
import { RUN_SEND_OPTIONS, RunKind } from '../jobs/run-kind';
import { RunRow, RunValues } from '../jobs/runs.repository';
import { recurrenceCompute, RecurrenceComputeInput } from './recurrence.compute';
import { RecurrenceSource, StoredRecurrenceResults } from './recurrence-results';
import { RecurrenceAnalysisRow } from './recurrence.repository';
import type { RecurrenceInputSnapshot } from './recurrence.service';
import { JointRunsRepository } from '../correlation/joint-runs/joint-runs.repository';
import type { StoredJointResults } from '../correlation/joint-runs/joint-run-storage';
import { jointSegmentDraws } from './joint-run-source';

/** Most attempts an analysis gets when its worker dies under it. */
export const RECURRENCE_MAX_ATTEMPTS = 2;

type RecurrenceTable = typeof recurrenceAnalyses;

/** Recurrence analyses as a kind of run: the queued event ages in, stored summaries out. */
@Injectable()
export class RecurrenceJob implements RunKind<RecurrenceTable, RecurrenceComputeInput, StoredRecurrenceResults>, OnModuleInit {
  readonly type = 'run';
  readonly label = 'recurrence analysis';
  readonly queue = 'recurrence-analysis';
  readonly sendOptions = RUN_SEND_OPTIONS;
  readonly table = recurrenceAnalyses;
  readonly maxAttempts = RECURRENCE_MAX_ATTEMPTS;
  readonly requeueMessage = 'the worker stopped during the analysis; queued again';
  readonly compute = recurrenceCompute;

  constructor(
    private readonly registry: JobRegistry,
    private readonly ageModelRuns: AgeModelRunsRepository,
    private readonly jointRuns: JointRunsRepository,
  ) {}

  onModuleInit(): void {
    this.registry.register(this);
  }

  async input(analysis: RunRow<RecurrenceTable>): Promise<RecurrenceComputeInput> {
    return {
      source: await this.sourceOf(analysis),
      settings: {
        forecastStartYearCe: analysis.forecastStartYear,
        windowsYears: analysis.windowsYears,
        drawCount: analysis.draws,
        seed: analysis.seed,
      },
    };
  }

  succeeded(results: StoredRecurrenceResults): RunValues<RecurrenceTable> {
    return { message: `${results.drawCount} draws of ${results.eventCount} events`, results };
  }

  failureMessage(error: unknown): string {
    const message = error instanceof Error ? error.message : String(error);
    return error instanceof RecurrenceInputError ? message : `the computation failed: ${message}`;
  }

  /** The segment's regional events drawn jointly from the joint run it was queued on. */
  private async jointSourceOf(jointRunId: string, regionalEvents: { id: string; inclusionProbability?: number }[]): Promise<RecurrenceSource> {
    const stored = (await this.jointRuns.regionalDraws(jointRunId)) as StoredJointResults['regionalEventDraws'] | null;
    const draws = stored ? jointSegmentDraws({ regionalEventDraws: stored }, regionalEvents.map((event) => event.id)) : null;
    if (!draws) throw new RecurrenceInputError('hypothesisId', 'the joint age model run this analysis used no longer exists');
    // The events run young to old; inclusion is read oldest first (each draw's k-th oldest age).
    const inclusion = regionalEvents.map((event) => event.inclusionProbability ?? 1);
    return { kind: 'joint-draws', ...draws, ...(inclusion.some((p) => p < 1) ? { inclusionProbabilities: [...inclusion].reverse() } : {}) };
  }

  /** The event ages the analysis was queued with: stored regional densities, or the cited age model run's draws. */
  private async sourceOf(analysis: RecurrenceAnalysisRow): Promise<RecurrenceSource> {
    const snapshot = analysis.inputSnapshot as RecurrenceInputSnapshot;
    if (snapshot.kind === 'segment' && snapshot.jointRunId) return this.jointSourceOf(snapshot.jointRunId, snapshot.regionalEvents);
    if (snapshot.kind === 'segment') {
      return {
        kind: 'ordered-densities',
        densities: snapshot.regionalEvents.map((event) => loadDensity(event.density)),
        inclusionProbabilities: snapshot.regionalEvents.map((event) => event.inclusionProbability ?? 1),
      };
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
