import { Module } from '@nestjs/common';
import { AccessModule } from './access/access.module';
import { AgeModelsModule } from './age-models/age-models.module';
import { AttachmentsModule } from './attachments/attachments.module';
import { AuditModule } from './audit/audit.module';
import { ConfigModule } from './config/config.module';
import { JointRunsModule } from './correlation/joint-runs/joint-runs.module';
import { DatabaseModule } from './database/database.module';
import { JobReaper } from './jobs/job-reaper';
import { JobsModule } from './jobs/jobs.module';
import { RecurrenceModule } from './recurrence/recurrence.module';
import { PasswordResetMailModule } from './team/password-reset-mail.module';

/** The worker process: the job handlers and what they need, no HTTP. */
@Module({
  imports: [ConfigModule, DatabaseModule, AccessModule, AuditModule, JobsModule, AgeModelsModule, JointRunsModule, RecurrenceModule, AttachmentsModule, PasswordResetMailModule],
  providers: [JobReaper],
})
export class WorkerModule {}
