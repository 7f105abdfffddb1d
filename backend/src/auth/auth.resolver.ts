import { Args, Mutation, Resolver } from '@nestjs/graphql';
import { Public } from '../common/decorators/public.decorator';
import { AuthPayload, AuthService } from './auth.service';

@Resolver('AuthPayload')
export class AuthResolver {
  constructor(private readonly auth: AuthService) {}

  @Public()
  @Mutation('signIn')
  signIn(@Args('email') email: string, @Args('password') password: string): Promise<AuthPayload> {
    return this.auth.signIn(email, password);
  }
}
