import { HttpException, HttpStatus } from '@nestjs/common';
import { GraphQLError, GraphQLFormattedError } from 'graphql';
import { DomainError, ErrorCode } from './domain-error';

/** GraphQL's own codes for errors that never reached a resolver. */
type ProtocolCode = 'GRAPHQL_PARSE_FAILED' | 'GRAPHQL_VALIDATION_FAILED' | 'INTERNAL_SERVER_ERROR';

function codeForStatus(status: number): ErrorCode | 'INTERNAL_SERVER_ERROR' {
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

/**
 * Map any error to what the client sees. Domain errors keep their message and field; unknown
 * errors become INTERNAL_SERVER_ERROR with a generic message in production (never a stack trace).
 */
export function formatGraphqlError(
  formatted: GraphQLFormattedError,
  error: unknown,
  production: boolean,
): GraphQLFormattedError {
  const original = error instanceof GraphQLError ? error.originalError : error;
  const base = { message: formatted.message, locations: formatted.locations, path: formatted.path };
  if (original instanceof DomainError) {
    return {
      ...base,
      message: original.message,
      extensions: { code: original.code, ...(original.field ? { field: original.field } : {}), ...original.details },
    };
  }
  if (original instanceof HttpException) {
    return { ...base, extensions: { code: codeForStatus(original.getStatus()) } };
  }
  const existing = formatted.extensions?.code as ProtocolCode | string | undefined;
  if (existing && existing !== 'INTERNAL_SERVER_ERROR') {
    // Parse and validation errors and the like: keep GraphQL's own code, drop internals.
    return { ...base, extensions: { code: existing } };
  }
  return {
    ...base,
    message: production ? 'Internal server error' : formatted.message,
    extensions: { code: 'INTERNAL_SERVER_ERROR' },
  };
}
