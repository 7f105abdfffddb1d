import { Module } from '@nestjs/common';
import { MailModule } from '../mail/mail.module';
import { ProjectsModule } from '../projects/projects.module';
import { UsersModule } from '../users/users.module';
import { InvitationsRepository } from './invitations.repository';
import { InvitationsResolver, ProjectInvitationsResolver } from './invitations.resolver';
import { InvitationsService } from './invitations.service';
import { MembersRepository } from './members.repository';
import { MembersResolver } from './members.resolver';
import { MembersService } from './members.service';
import { MembershipsRepository } from './memberships.repository';
import { ProjectMembersResolver, UserMembershipsResolver } from './memberships.resolver';
import { MembershipsService } from './memberships.service';
import { PasswordResetMailModule } from './password-reset-mail.module';
import { PasswordResetsResolver } from './password-resets.resolver';
import { PasswordResetsService } from './password-resets.service';

/**
 * The people of a project: memberships and who may see them, member roles and removal,
 * invitations by e-mail, and password resets.
 */
@Module({
  imports: [MailModule, ProjectsModule, UsersModule, PasswordResetMailModule],
  providers: [
    MembershipsRepository,
    MembershipsService,
    ProjectMembersResolver,
    UserMembershipsResolver,
    MembersRepository,
    MembersService,
    MembersResolver,
    InvitationsRepository,
    InvitationsService,
    InvitationsResolver,
    ProjectInvitationsResolver,
    PasswordResetsService,
    PasswordResetsResolver,
  ],
  exports: [InvitationsService, MembershipsService],
})
export class TeamModule {}
