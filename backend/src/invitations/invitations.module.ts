import { Module } from '@nestjs/common';
import { MailModule } from '../mail/mail.module';
import { MembershipsModule } from '../memberships/memberships.module';
import { ProjectsModule } from '../projects/projects.module';
import { UsersModule } from '../users/users.module';
import { InvitationsRepository } from './invitations.repository';
import { InvitationsResolver, ProjectInvitationsResolver } from './invitations.resolver';
import { InvitationsService } from './invitations.service';

@Module({
  imports: [MailModule, MembershipsModule, ProjectsModule, UsersModule],
  providers: [InvitationsRepository, InvitationsService, InvitationsResolver, ProjectInvitationsResolver],
  exports: [InvitationsService],
})
export class InvitationsModule {}
