import { Module } from '@nestjs/common';
import { MailModule } from '../mail/mail.module';
import { UsersModule } from '../users/users.module';
import { PasswordResetMailJob } from './password-reset-mail.job';
import { PasswordResetsRepository } from './password-resets.repository';

/** The password-reset mail job, in the API (which sends it) and the worker (which runs it). */
@Module({
  imports: [MailModule, UsersModule],
  providers: [PasswordResetsRepository, PasswordResetMailJob],
  exports: [PasswordResetsRepository, PasswordResetMailJob],
})
export class PasswordResetMailModule {}
