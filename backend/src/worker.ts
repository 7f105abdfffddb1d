import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { loadConfig } from './config/config';
import { runMigrations } from './database/migrate';
import { JobQueueService } from './jobs/job-queue.service';
import { JobReaper } from './jobs/job-reaper';
import { JobRegistry } from './jobs/job-registry';
import { RunExecutor } from './jobs/run-executor';
import { WorkerModule } from './worker.module';

/** How often each worker looks for runs whose worker died. */
const REAP_INTERVAL_MS = 5_000;

async function bootstrap(): Promise<void> {
  const config = loadConfig();
  await runMigrations(config.databaseUrl);
  const app = await NestFactory.createApplicationContext(WorkerModule, { logger: ['log', 'error', 'warn'] });
  app.enableShutdownHooks();
  const jobs = app.get(JobQueueService);
  const runs = app.get(RunExecutor);
  // Every kind the worker module's features registered: runs through the shared executor, tasks by themselves.
  for (const kind of app.get(JobRegistry).all()) {
    if (kind.type === 'run') await jobs.work(kind, config.workerConcurrency, ({ runId }) => runs.execute(kind, runId));
    else await jobs.work(kind, config.workerConcurrency, (payload) => kind.handle(payload));
  }
  const reaper = app.get(JobReaper);
  setInterval(() => void reaper.reapOnce().catch(() => undefined), REAP_INTERVAL_MS).unref();
  console.log(`Stratochron worker ${process.pid} ready (concurrency ${config.workerConcurrency})`);
}

bootstrap().catch((error: unknown) => {
  console.error(error instanceof Error ? (error.stack ?? error.message) : error);
  process.exit(1);
});
