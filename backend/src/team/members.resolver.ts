import { ParseUUIDPipe } from '@nestjs/common';
import { Args, Mutation, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { MembershipRow } from './memberships.repository';
import { SetMemberRoleInput } from './dto/set-member-role.input';
import { MembersService } from './members.service';

@Resolver('Membership')
export class MembersResolver {
  constructor(private readonly members: MembersService) {}

  @Mutation('setMemberRole')
  setRole(@CurrentUser() user: AuthUser, @Args('input') input: SetMemberRoleInput): Promise<MembershipRow> {
    return this.members.setRole(user, input);
  }

  @Mutation('removeMember')
  remove(@CurrentUser() user: AuthUser, @Args('projectId', ParseUUIDPipe) projectId: string,
    @Args('userId', ParseUUIDPipe) userId: string,
  ): Promise<boolean> {
    return this.members.remove(user, projectId, userId);
  }
}
