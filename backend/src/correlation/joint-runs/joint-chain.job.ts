import { Injectable, OnModuleInit } from '@nestjs/common';
import type { JointChainDraws } from '../../chronology/joint-age-model/types';
import { jointAgeModelChains } from '../../database/schema';
import { JobRegistry } from '../../jobs/job-registry';
import { RUN_SEND_OPTIONS, RunKind } from '../../jobs/run-kind';
import { RunRow, RunValues } from '../../jobs/runs.repository';
import { jointChainCompute, JointChainComputeInput } from './joint-age-model.compute';
import { chainSettings, type JointRunSettings } from './joint-run-settings';
import { JointRunSettler } from './joint-run-settler';
import { loadJointInput, storeChainDraws, type StoredJointModelInput } from './joint-run-storage';
import { JointRunsRepository } from './joint-runs.repository';

/** Most attempts a chain gets when its worker dies under it. */
export const JOINT_CHAIN_MAX_ATTEMPTS = 2;

type ChainTable = typeof jointAgeModelChains;

/**
 * One chain of a joint age model run as a kind of run: each chain is a job of its own, so worker
 * replicas run a run's chains at once. A chain reads its run's input snapshot and settings; when
 * it ends, `JointRunSettler` moves the run on (fails it, or summarises every chain once all have
 * succeeded).
 */
@Injectable()
export class JointChainJob implements RunKind<ChainTable, JointChainComputeInput, JointChainDraws>, OnModuleInit {
  readonly type = 'run';
  readonly label = 'joint age model chain';
  readonly queue = 'joint-age-model-chain';
  readonly sendOptions = RUN_SEND_OPTIONS;
  readonly table = jointAgeModelChains;
  readonly maxAttempts = JOINT_CHAIN_MAX_ATTEMPTS;
  readonly requeueMessage = 'the worker stopped during the chain; queued again';
  readonly compute = jointChainCompute;

  constructor(
    private readonly registry: JobRegistry,
    private readonly repository: JointRunsRepository,
    private readonly settler: JointRunSettler,
  ) {}

  onModuleInit(): void {
    this.registry.register(this);
  }

  async input(chain: RunRow<ChainTable>): Promise<JointChainComputeInput> {
    const run = await this.repository.findRun(chain.runId);
    if (!run) throw new Error('its joint run no longer exists');
    await this.repository.markRunning(run.id);
    return {
      input: loadJointInput(run.inputSnapshot as StoredJointModelInput),
      settings: chainSettings(run.settings as JointRunSettings, run.seed, chain.chainIndex),
    };
  }

  succeeded(draws: JointChainDraws): RunValues<ChainTable> {
    return { message: `${draws.drawCount} draws kept`, draws: storeChainDraws(draws) };
  }

  failureMessage(error: unknown): string {
    return `the computation failed: ${error instanceof Error ? error.message : String(error)}`;
  }

  async afterFinish(chainId: string): Promise<void> {
    const runId = await this.repository.runIdOfChain(chainId);
    if (runId) await this.settler.settle(runId);
  }
}
