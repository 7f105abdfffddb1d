import { Parent, Query, ResolveField, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { MembershipsService, MembershipView } from '../memberships/memberships.service';
import { UserRow } from './users.repository';
import { UsersService } from './users.service';

@Resolver('User')
export class UsersResolver {
  constructor(
    private readonly users: UsersService,
    private readonly memberships: MembershipsService,
  ) {}

  @Query('me')
  me(@CurrentUser() user: AuthUser): Promise<UserRow> {
    return this.users.me(user);
  }

  @ResolveField('memberships')
  membershipsOf(@Parent() parent: UserRow, @CurrentUser() user: AuthUser): Promise<MembershipView[]> {
    return this.memberships.visibleMembershipsOf(parent.id, user);
  }
}
