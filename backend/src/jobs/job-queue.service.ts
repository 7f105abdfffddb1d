import { Inject, Injectable, Logger, OnModuleDestroy } from '@nestjs/common';
import PgBoss from 'pg-boss';
import { APP_CONFIG, AppConfig } from '../config/config';
import { RunJob, RunKind, TaskKind } from './run-kind';

/** What a kind's jobs carry: a run id for runs, the task's own payload otherwise. */
export type JobPayload<K> = K extends RunKind ? RunJob : K extends TaskKind<infer P> ? P : never;

/**
 * The PostgreSQL-backed job queue (pg-boss). API replicas only send; worker processes also work.
 * Each kind brings its queue name and send options (`RunKind`, `TaskKind`). Delivery is pg-boss's;
 * retries after a lost worker are ours for runs (see JobReaper), because a run's own row is the
 * truth users see.
 */
@Injectable()
export class JobQueueService implements OnModuleDestroy {
  private readonly logger = new Logger(JobQueueService.name);
  private boss: PgBoss | undefined;
  private starting: Promise<PgBoss> | undefined;
  private readonly queues = new Map<string, Promise<void>>();

  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {}

  private start(): Promise<PgBoss> {
    if (this.boss) return Promise.resolve(this.boss);
    this.starting ??= (async () => {
      const boss = new PgBoss({ connectionString: this.config.databaseUrl, max: 4 });
      boss.on('error', (error: Error) => this.logger.warn(`job queue: ${error.message}`));
      await boss.start();
      this.boss = boss;
      return boss;
    })();
    return this.starting;
  }

  /** The started queue, created once per process (createQueue leaves an existing queue as it is). */
  private async queue(name: string): Promise<PgBoss> {
    const boss = await this.start();
    let created = this.queues.get(name);
    if (!created) {
      created = boss.createQueue(name);
      this.queues.set(name, created);
      created.catch(() => this.queues.delete(name));
    }
    await created;
    return boss;
  }

  async send<K extends RunKind | TaskKind<object>>(kind: K, job: JobPayload<K>): Promise<void> {
    const boss = await this.queue(kind.queue);
    await boss.send(kind.queue, job as object, kind.sendOptions);
  }

  async work<K extends RunKind | TaskKind<object>>(kind: K, concurrency: number, handler: (job: JobPayload<K>) => Promise<void>): Promise<void> {
    const boss = await this.queue(kind.queue);
    for (let i = 0; i < concurrency; i++) {
      await boss.work<JobPayload<K>>(kind.queue, { batchSize: 1, pollingIntervalSeconds: 1 }, async (jobs) => {
        for (const job of jobs) await handler(job.data);
      });
    }
  }

  async onModuleDestroy(): Promise<void> {
    await this.boss?.stop({ graceful: true, timeout: 5000 }).catch(() => undefined);
  }
}
