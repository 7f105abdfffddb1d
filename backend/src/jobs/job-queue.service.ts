import { Inject, Injectable, Logger, OnModuleDestroy } from '@nestjs/common';
import PgBoss from 'pg-boss';
import { APP_CONFIG, AppConfig } from '../config/config';

export const QUEUES = { ageModel: 'age-model-run', recurrence: 'recurrence-analysis', thumbnail: 'attachment-thumbnail' } as const;
export type QueueName = (typeof QUEUES)[keyof typeof QUEUES];

export interface RunJob {
  runId: string;
}

/** What each queue's jobs carry. */
export interface QueueJobs {
  'age-model-run': RunJob;
  'recurrence-analysis': RunJob;
  'attachment-thumbnail': { attachmentId: string };
}

/**
 * How pg-boss delivers each queue's jobs. Runs get no pg-boss retries: the reaper re-queues runs
 * whose worker vanished, with the run's own attempt count. A thumbnail has no row of its own to
 * watch, so pg-boss retries it.
 */
const SEND_OPTIONS: Record<QueueName, PgBoss.SendOptions> = {
  [QUEUES.ageModel]: { retryLimit: 0, expireInSeconds: 3600 },
  [QUEUES.recurrence]: { retryLimit: 0, expireInSeconds: 3600 },
  [QUEUES.thumbnail]: { retryLimit: 2, retryDelay: 5, expireInSeconds: 300 },
};

/**
 * The PostgreSQL-backed job queue (pg-boss). API replicas only send; worker processes also work.
 * Delivery is pg-boss's; retries after a lost worker are ours (see JobReaper), because a run's
 * own row is the truth users see.
 */
@Injectable()
export class JobQueueService implements OnModuleDestroy {
  private readonly logger = new Logger(JobQueueService.name);
  private boss: PgBoss | undefined;
  private starting: Promise<PgBoss> | undefined;

  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {}

  private start(): Promise<PgBoss> {
    if (this.boss) return Promise.resolve(this.boss);
    this.starting ??= (async () => {
      const boss = new PgBoss({ connectionString: this.config.databaseUrl, max: 4 });
      boss.on('error', (error: Error) => this.logger.warn(`job queue: ${error.message}`));
      await boss.start();
      for (const name of Object.values(QUEUES)) await boss.createQueue(name);
      this.boss = boss;
      return boss;
    })();
    return this.starting;
  }

  async send<Q extends QueueName>(queue: Q, job: QueueJobs[Q]): Promise<void> {
    const boss = await this.start();
    await boss.send(queue, job, SEND_OPTIONS[queue]);
  }

  async work<Q extends QueueName>(queue: Q, concurrency: number, handler: (job: QueueJobs[Q]) => Promise<void>): Promise<void> {
    const boss = await this.start();
    for (let i = 0; i < concurrency; i++) {
      await boss.work<QueueJobs[Q]>(queue, { batchSize: 1, pollingIntervalSeconds: 1 }, async (jobs) => {
        for (const job of jobs) await handler(job.data);
      });
    }
  }

  async onModuleDestroy(): Promise<void> {
    await this.boss?.stop({ graceful: true, timeout: 5000 }).catch(() => undefined);
  }
}
