import { Inject, Injectable, Logger, Optional } from '@nestjs/common';
import { AgeModelRunsRepository } from '../age-models/age-model-runs.repository';
import { MAX_ATTEMPTS } from '../age-models/age-model.job';
import { APP_CONFIG, AppConfig } from '../config/config';
import { RECURRENCE_MAX_ATTEMPTS } from '../recurrence/recurrence.job';
import { RecurrenceRepository } from '../recurrence/recurrence.repository';
import { JobQueueService, QueueName, QUEUES } from './job-queue.service';

/**
 * A running job writes progress at least every second; silence this long means its worker is gone.
 * The default of `JOB_HEARTBEAT_TIMEOUT_MS`.
 */
export const HEARTBEAT_TIMEOUT_MS = 20_000;

/** What the reaper needs of a kind of job row (age model runs, recurrence analyses). */
interface ReapableJobs {
  readonly label: string;
  readonly queue: QueueName;
  readonly maxAttempts: number;
  listAbandoned(heartbeatBefore: Date): Promise<{ id: string; attempts: number }[]>;
  requeue(id: string): Promise<boolean>;
  fail(id: string, message: string): Promise<void>;
}

/**
 * Finds runs whose worker died (no heartbeat) and queues them again, or marks them failed after
 * their kind's attempt limit, so no run stays RUNNING forever. Every worker runs it; the row
 * updates are conditional, so two workers reaping at once do no harm.
 */
@Injectable()
export class JobReaper {
  private readonly logger = new Logger(JobReaper.name);
  private readonly kinds: readonly ReapableJobs[];
  private readonly heartbeatTimeoutMs: number;

  constructor(
    runs: AgeModelRunsRepository,
    analyses: RecurrenceRepository,
    private readonly jobs: JobQueueService,
    @Optional() @Inject(APP_CONFIG) config?: AppConfig,
  ) {
    this.heartbeatTimeoutMs = config?.jobHeartbeatTimeoutMs ?? HEARTBEAT_TIMEOUT_MS;
    const kind = (label: string, queue: QueueName, maxAttempts: number, rows: Omit<ReapableJobs, 'label' | 'queue' | 'maxAttempts'>): ReapableJobs => ({
      label,
      queue,
      maxAttempts,
      listAbandoned: (before) => rows.listAbandoned(before),
      requeue: (id) => rows.requeue(id),
      fail: (id, message) => rows.fail(id, message),
    });
    this.kinds = [
      kind('age model run', QUEUES.ageModel, MAX_ATTEMPTS, runs),
      kind('recurrence analysis', QUEUES.recurrence, RECURRENCE_MAX_ATTEMPTS, analyses),
    ];
  }

  async reapOnce(now = new Date()): Promise<number> {
    const heartbeatBefore = new Date(now.getTime() - this.heartbeatTimeoutMs);
    let reaped = 0;
    for (const kind of this.kinds) {
      const abandoned = await kind.listAbandoned(heartbeatBefore);
      for (const run of abandoned) {
        if (run.attempts >= kind.maxAttempts) {
          await kind.fail(run.id, `the worker stopped during the run ${run.attempts} times; the run was given up`);
          this.logger.warn(`${kind.label} ${run.id} failed after ${run.attempts} lost attempts`);
        } else if (await kind.requeue(run.id)) {
          await this.jobs.send(kind.queue, { runId: run.id });
          this.logger.warn(`${kind.label} ${run.id} lost its worker; queued again`);
        }
      }
      reaped += abandoned.length;
    }
    return reaped;
  }
}
