import { Global, Module } from '@nestjs/common';
import { JobQueueService } from './job-queue.service';

@Global()
@Module({ providers: [JobQueueService], exports: [JobQueueService] })
export class JobsModule {}
