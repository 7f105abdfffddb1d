import { Parent, Query, ResolveField, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { UserRow } from './users.repository';
import { UsersService } from './users.service';

@Resolver('User')
export class UsersResolver {
  constructor(private readonly users: UsersService) {}

  @Query('me')
  me(@CurrentUser() user: AuthUser): Promise<UserRow> {
    return this.users.me(user);
  }

  @ResolveField('operator')
  operator(@Parent() parent: UserRow): boolean {
    return this.users.isOperator(parent);
  }
}
