import { Injectable, Logger } from '@nestjs/common';
import { AgeModelRunsRepository } from '../age-models/age-model-runs.repository';
import { MAX_ATTEMPTS } from '../age-models/age-model.job';
import { JobQueueService, QUEUES } from './job-queue.service';

/** A running job writes progress at least every second; silence this long means its worker is gone. */
export const HEARTBEAT_TIMEOUT_MS = 20_000;

/**
 * Finds runs whose worker died (no heartbeat) and queues them again, or marks them failed after
 * MAX_ATTEMPTS, so no run stays RUNNING forever. Every worker runs it; the row updates are
 * conditional, so two workers reaping at once do no harm.
 */
@Injectable()
export class JobReaper {
  private readonly logger = new Logger(JobReaper.name);

  constructor(
    private readonly runs: AgeModelRunsRepository,
    private readonly jobs: JobQueueService,
  ) {}

  async reapOnce(now = new Date()): Promise<number> {
    const abandoned = await this.runs.listAbandoned(new Date(now.getTime() - HEARTBEAT_TIMEOUT_MS));
    for (const run of abandoned) {
      if (run.attempts >= MAX_ATTEMPTS) {
        await this.runs.fail(run.id, `the worker stopped during the run ${run.attempts} times; the run was given up`);
        this.logger.warn(`age model run ${run.id} failed after ${run.attempts} lost attempts`);
      } else if (await this.runs.requeue(run.id)) {
        await this.jobs.send(QUEUES.ageModel, { runId: run.id });
        this.logger.warn(`age model run ${run.id} lost its worker; queued again`);
      }
    }
    return abandoned.length;
  }
}
