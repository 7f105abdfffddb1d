import { Parent, ResolveField, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { ProjectRow } from '../projects/projects.repository';
import { UserRow } from '../users/users.repository';
import { MembershipsService, MembershipView } from './memberships.service';

/** `Project.members`; the project was already authorised. */
@Resolver('Project')
export class ProjectMembersResolver {
  constructor(private readonly memberships: MembershipsService) {}

  @ResolveField('members')
  members(@Parent() project: ProjectRow): Promise<MembershipView[]> {
    return this.memberships.listForProject(project.id);
  }
}

/** `User.memberships`: those the caller may see. */
@Resolver('User')
export class UserMembershipsResolver {
  constructor(private readonly memberships: MembershipsService) {}

  @ResolveField('memberships')
  membershipsOf(@Parent() parent: UserRow, @CurrentUser() user: AuthUser | undefined): Promise<MembershipView[]> {
    // signIn and acceptInvitation are public: their answer's user is the one who just proved who they are.
    return this.memberships.visibleMembershipsOf(parent.id, user ?? { id: parent.id, email: parent.email });
  }
}
