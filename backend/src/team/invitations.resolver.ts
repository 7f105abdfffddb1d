import { Args, Mutation, Parent, Query, ResolveField, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { AuthPayload } from '../auth/auth.service';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import { ProjectRow } from '../projects/projects.repository';
import { AcceptInvitationInput, InviteMemberInput } from './dto/invitation.inputs';
import { InvitationRow } from './invitations.repository';
import { InvitationsService } from './invitations.service';

@Resolver('Invitation')
export class InvitationsResolver {
  constructor(private readonly invitations: InvitationsService) {}

  @Mutation('inviteMember')
  invite(@CurrentUser() user: AuthUser, @Args('input') input: InviteMemberInput): Promise<InvitationRow> {
    return this.invitations.invite(user, input);
  }

  @Public()
  @Query('invitationLink')
  linkState(@Args('token') token: string): ReturnType<InvitationsService['linkState']> {
    return this.invitations.linkState(token);
  }

  @Public()
  @Mutation('acceptInvitation')
  accept(@Args('input') input: AcceptInvitationInput): Promise<AuthPayload> {
    return this.invitations.acceptInvitation(input);
  }
}

/** `Project.invitations`, kept here so the projects module does not depend on invitations. */
@Resolver('Project')
export class ProjectInvitationsResolver {
  constructor(private readonly invitations: InvitationsService) {}

  @ResolveField('invitations')
  invitationsOf(@Parent() project: ProjectRow, @CurrentUser() user: AuthUser): Promise<InvitationRow[]> {
    return this.invitations.listForProject(user, project.id);
  }
}
