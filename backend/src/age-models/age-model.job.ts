import { Injectable, OnModuleInit } from '@nestjs/common';
import { AgeModelResult, AgeModelSettings } from '../chronology/age-model/age-model';
import { ageModelRuns } from '../database/schema';
import { JobRegistry } from '../jobs/job-registry';
import { RUN_SEND_OPTIONS, RunKind } from '../jobs/run-kind';
import { RunRow, RunValues } from '../jobs/runs.repository';
import { ageModelCompute, AgeModelComputeInput } from './age-model.compute';
import { loadInput, storeResults, StoredAgeModelInput } from './age-model-results';

/** Most attempts a run gets when its worker dies under it. */
export const MAX_ATTEMPTS = 2;

type AgeModelRunTable = typeof ageModelRuns;

/** Age model runs as a kind of run: the snapshotted column in, posteriors and diagnostics out. */
@Injectable()
export class AgeModelJob implements RunKind<AgeModelRunTable, AgeModelComputeInput, AgeModelResult>, OnModuleInit {
  readonly type = 'run';
  readonly label = 'age model run';
  readonly queue = 'age-model-run';
  readonly sendOptions = RUN_SEND_OPTIONS;
  readonly table = ageModelRuns;
  readonly maxAttempts = MAX_ATTEMPTS;
  readonly requeueMessage = 'the worker stopped during the run; queued again';
  readonly compute = ageModelCompute;

  constructor(private readonly registry: JobRegistry) {}

  onModuleInit(): void {
    this.registry.register(this);
  }

  async input(run: RunRow<AgeModelRunTable>): Promise<AgeModelComputeInput> {
    return { input: loadInput(run.inputSnapshot as StoredAgeModelInput), settings: run.settings as AgeModelSettings };
  }

  succeeded(result: AgeModelResult): RunValues<AgeModelRunTable> {
    return { message: result.diagnostics.message, diagnostics: result.diagnostics, results: storeResults(result) };
  }

  failureMessage(error: unknown): string {
    return `the computation failed: ${error instanceof Error ? error.message : String(error)}`;
  }
}
