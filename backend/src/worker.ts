import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { AgeModelJob } from './age-models/age-model.job';
import { ThumbnailJob } from './attachments/thumbnail.job';
import { loadConfig } from './config/config';
import { runMigrations } from './database/migrate';
import { JobQueueService, QUEUES } from './jobs/job-queue.service';
import { JobReaper } from './jobs/job-reaper';
import { RecurrenceJob } from './recurrence/recurrence.job';
import { WorkerModule } from './worker.module';

/** How often each worker looks for runs whose worker died. */
const REAP_INTERVAL_MS = 5_000;

async function bootstrap(): Promise<void> {
  const config = loadConfig();
  await runMigrations(config.databaseUrl);
  const app = await NestFactory.createApplicationContext(WorkerModule, { logger: ['log', 'error', 'warn'] });
  app.enableShutdownHooks();
  const jobs = app.get(JobQueueService);
  const ageModel = app.get(AgeModelJob);
  await jobs.work(QUEUES.ageModel, config.workerConcurrency, ({ runId }) => ageModel.execute(runId));
  const recurrence = app.get(RecurrenceJob);
  await jobs.work(QUEUES.recurrence, config.workerConcurrency, ({ runId }) => recurrence.execute(runId));
  const thumbnails = app.get(ThumbnailJob);
  await jobs.work(QUEUES.thumbnail, config.workerConcurrency, ({ attachmentId }) => thumbnails.execute(attachmentId));
  const reaper = app.get(JobReaper);
  setInterval(() => void reaper.reapOnce().catch(() => undefined), REAP_INTERVAL_MS).unref();
  console.log(`Stratochron worker ${process.pid} ready (concurrency ${config.workerConcurrency})`);
}

bootstrap().catch((error: unknown) => {
  console.error(error instanceof Error ? (error.stack ?? error.message) : error);
  process.exit(1);
});
