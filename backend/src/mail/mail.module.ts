import { Module } from '@nestjs/common';
import { DevMailController } from './dev-mail.controller';
import { MailService } from './mail.service';

@Module({ providers: [MailService], controllers: [DevMailController], exports: [MailService] })
export class MailModule {}
