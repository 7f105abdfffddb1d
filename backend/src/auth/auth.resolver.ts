import { Args, Context, Mutation, Resolver } from '@nestjs/graphql';
import type { Request } from 'express';
import { Public } from '../common/decorators/public.decorator';
import { AuthPayload, AuthService } from './auth.service';

@Resolver('AuthPayload')
export class AuthResolver {
  constructor(private readonly auth: AuthService) {}

  @Public()
  @Mutation('signIn')
  signIn(
    @Args('email') email: string,
    @Args('password') password: string,
    @Context('req') req: Request,
  ): Promise<AuthPayload> {
    return this.auth.signIn(email, password, req.ip ?? 'unknown');
  }
}
