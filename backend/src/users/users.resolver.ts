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

  @ResolveField('operator')
  operator(@Parent() parent: UserRow): boolean {
    return this.users.isOperator(parent);
  }

  @ResolveField('memberships')
  membershipsOf(@Parent() parent: UserRow, @CurrentUser() user: AuthUser | undefined): Promise<MembershipView[]> {
    // signIn and acceptInvitation are public: their answer's user is the one who just proved who they are.
    return this.memberships.visibleMembershipsOf(parent.id, user ?? { id: parent.id, email: parent.email });
  }
}
