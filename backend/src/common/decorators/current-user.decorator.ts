import { createParamDecorator, ExecutionContext } from '@nestjs/common';
import { AuthUser } from '../../auth/auth-user';
import { requestOf } from '../request-of';

/** The authenticated user of this request (set by the JWT guard). */
export const CurrentUser = createParamDecorator((_data: unknown, context: ExecutionContext): AuthUser => {
  return requestOf(context).user as AuthUser;
});
