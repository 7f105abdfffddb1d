import { Module } from '@nestjs/common';
import { MailModule } from '../mail/mail.module';
import { UsersModule } from '../users/users.module';
import { PasswordResetsRepository } from './password-resets.repository';
import { PasswordResetsResolver } from './password-resets.resolver';
import { PasswordResetsService } from './password-resets.service';

@Module({
  imports: [MailModule, UsersModule],
  providers: [PasswordResetsRepository, PasswordResetsService, PasswordResetsResolver],
})
export class PasswordResetsModule {}
