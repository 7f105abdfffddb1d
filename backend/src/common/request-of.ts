import { ExecutionContext } from '@nestjs/common';
import { GqlExecutionContext } from '@nestjs/graphql';
import type { Request } from 'express';

/** The Express request behind an HTTP or GraphQL execution context. */
export function requestOf(context: ExecutionContext): Request & { user?: unknown } {
  if (context.getType<string>() === 'graphql') return GqlExecutionContext.create(context).getContext().req;
  return context.switchToHttp().getRequest();
}
