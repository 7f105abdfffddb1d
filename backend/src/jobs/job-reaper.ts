import { Inject, Injectable, Logger, Optional } from '@nestjs/common';
import { APP_CONFIG, AppConfig } from '../config/config';
import { JobQueueService } from './job-queue.service';
import { JobRegistry } from './job-registry';
import { RunsRepository } from './runs.repository';

/**
 * A running job writes progress at least every second; silence this long means its worker is gone.
 * The default of `JOB_HEARTBEAT_TIMEOUT_MS`.
 */
export const HEARTBEAT_TIMEOUT_MS = 20_000;

/**
 * Finds runs whose worker died (no heartbeat) and queues them again, or marks them failed after
 * their kind's attempt limit, so no run stays RUNNING forever. Every worker runs it over every
 * registered run kind; the row updates are conditional, so two workers reaping at once do no harm.
 */
@Injectable()
export class JobReaper {
  private readonly logger = new Logger(JobReaper.name);
  private readonly heartbeatTimeoutMs: number;

  constructor(
    private readonly registry: JobRegistry,
    private readonly runs: RunsRepository,
    private readonly jobs: JobQueueService,
    @Optional() @Inject(APP_CONFIG) config?: AppConfig,
  ) {
    this.heartbeatTimeoutMs = config?.jobHeartbeatTimeoutMs ?? HEARTBEAT_TIMEOUT_MS;
  }

  async reapOnce(now = new Date()): Promise<number> {
    const heartbeatBefore = new Date(now.getTime() - this.heartbeatTimeoutMs);
    let reaped = 0;
    for (const kind of this.registry.runKinds()) {
      const abandoned = await this.runs.listAbandoned(kind.table, heartbeatBefore);
      for (const run of abandoned) {
        if (run.attempts >= kind.maxAttempts) {
          await this.runs.fail(kind.table, run.id, `the worker stopped during the run ${run.attempts} times; the run was given up`);
          await kind.afterFinish?.(run.id, 'FAILED').catch(() => undefined);
          this.logger.warn(`${kind.label} ${run.id} failed after ${run.attempts} lost attempts`);
        } else if (await this.runs.requeue(kind.table, run.id, kind.requeueMessage)) {
          await this.jobs.send(kind, { runId: run.id });
          this.logger.warn(`${kind.label} ${run.id} lost its worker; queued again`);
        }
      }
      reaped += abandoned.length;
    }
    return reaped;
  }
}
