import { Args, Mutation, Resolver } from '@nestjs/graphql';
import { Public } from '../common/decorators/public.decorator';
import { ResetPasswordInput } from './dto/reset-password.input';
import { PasswordResetsService } from './password-resets.service';

@Resolver()
export class PasswordResetsResolver {
  constructor(private readonly resets: PasswordResetsService) {}

  @Public()
  @Mutation('requestPasswordReset')
  request(@Args('email') email: string): Promise<boolean> {
    return this.resets.requestReset(email);
  }

  @Public()
  @Mutation('resetPassword')
  reset(@Args('input') input: ResetPasswordInput): Promise<boolean> {
    return this.resets.resetPassword(input);
  }
}
