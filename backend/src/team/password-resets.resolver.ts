import { Args, Context, Mutation, Resolver } from '@nestjs/graphql';
import type { Request } from 'express';
import { Public } from '../common/decorators/public.decorator';
import { ResetPasswordInput } from './dto/reset-password.input';
import { PasswordResetsService } from './password-resets.service';

@Resolver()
export class PasswordResetsResolver {
  constructor(private readonly resets: PasswordResetsService) {}

  @Public()
  @Mutation('requestPasswordReset')
  request(@Args('email') email: string, @Context('req') req: Request): Promise<boolean> {
    return this.resets.requestReset(email, req.ip ?? 'unknown');
  }

  @Public()
  @Mutation('resetPassword')
  reset(@Args('input') input: ResetPasswordInput): Promise<boolean> {
    return this.resets.resetPassword(input);
  }
}
