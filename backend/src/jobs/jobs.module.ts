import { Global, Module } from '@nestjs/common';
import { JobQueueService } from './job-queue.service';
import { JobRegistry } from './job-registry';
import { RunExecutor } from './run-executor';
import { RunsRepository } from './runs.repository';

/** The job queue, the registry of job kinds, and the run lifecycle every kind shares. */
@Global()
@Module({
  providers: [JobQueueService, JobRegistry, RunsRepository, RunExecutor],
  exports: [JobQueueService, JobRegistry, RunsRepository, RunExecutor],
})
export class JobsModule {}
