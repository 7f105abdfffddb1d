import { HttpStatus } from '@nestjs/common';
import { GraphQLFormattedError } from 'graphql';
import { ErrorCode } from './domain-error';

/** The codes clients may see; GraphQL's own for requests that never reached a resolver. */
const CLIENT_CODES = new Set<string>([
  'UNAUTHENTICATED', 'FORBIDDEN', 'BAD_USER_INPUT', 'NOT_FOUND', 'CONFLICT', 'TOO_MANY_REQUESTS', 'SERVICE_UNAVAILABLE',
  'GRAPHQL_PARSE_FAILED', 'GRAPHQL_VALIDATION_FAILED', 'BAD_REQUEST', 'PERSISTED_QUERY_NOT_FOUND',
]);

export function codeForStatus(status: number): ErrorCode | 'INTERNAL_SERVER_ERROR' {
  switch (status) {
    case HttpStatus.UNAUTHORIZED:
      return 'UNAUTHENTICATED';
    case HttpStatus.FORBIDDEN:
      return 'FORBIDDEN';
    case HttpStatus.NOT_FOUND:
      return 'NOT_FOUND';
    case HttpStatus.CONFLICT:
      return 'CONFLICT';
    case HttpStatus.BAD_REQUEST:
    case HttpStatus.PAYLOAD_TOO_LARGE:
      return 'BAD_USER_INPUT';
    case HttpStatus.TOO_MANY_REQUESTS:
      return 'TOO_MANY_REQUESTS';
    default:
      return 'INTERNAL_SERVER_ERROR';
  }
}

/** What a client reads for an unexpected error; the server log (GraphqlExceptionFilter) has the details. */
export const INTERNAL_ERROR_MESSAGE = 'Internal server error';

/**
 * The last word on what a client sees. Errors coded by GraphqlExceptionFilter (and GraphQL's
 * own parse and validation errors) pass with their code; anything else is INTERNAL_SERVER_ERROR
 * with a generic message, in development too (a database error's message carries its statement
 * and parameters), and never a stack trace. `production` is kept for callers; the answer no
 * longer depends on it.
 */
export function formatGraphqlError(formatted: GraphQLFormattedError, _production = true): GraphQLFormattedError {
  const code = formatted.extensions?.code;
  const base = { message: formatted.message, locations: formatted.locations, path: formatted.path };
  if (typeof code === 'string' && CLIENT_CODES.has(code)) {
    const { stacktrace: _stacktrace, ...extensions } = formatted.extensions ?? {};
    return { ...base, extensions };
  }
  return { ...base, message: INTERNAL_ERROR_MESSAGE, extensions: { code: 'INTERNAL_SERVER_ERROR' } };
}
