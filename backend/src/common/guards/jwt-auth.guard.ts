import { CanActivate, ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import { unauthenticated } from '../errors/domain-error';
import { IS_PUBLIC } from '../decorators/public.decorator';
import { requestOf } from '../request-of';

/** The token check under way for a request, shared by its parallel root fields. */
const CHECKING = Symbol('jwt check');

/** The global guard: every operation needs a valid bearer token unless marked `@Public()`. */
@Injectable()
export class JwtAuthGuard extends AuthGuard('jwt') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  override getRequest(context: ExecutionContext) {
    return requestOf(context);
  }

  override canActivate(context: ExecutionContext) {
    const isPublic = this.reflector.getAllAndOverride<boolean>(IS_PUBLIC, [context.getHandler(), context.getClass()]);
    if (isPublic) return true;
    // One GraphQL request runs the guard once per root field, the fields of a query at once; the
    // token (and its epoch, a database read) is checked once and the user kept on the request.
    const request: ReturnType<typeof requestOf> & { [CHECKING]?: ReturnType<CanActivate['canActivate']> } = requestOf(context);
    if (request.user) return true;
    request[CHECKING] ??= super.canActivate(context);
    return request[CHECKING];
  }

  override handleRequest<TUser>(error: unknown, user: TUser | false): TUser {
    if (error || !user) throw unauthenticated('a valid bearer token is required: sign in first');
    return user;
  }
}
