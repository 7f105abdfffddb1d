import { ArgumentsHost, Catch, HttpException, HttpStatus, Logger } from '@nestjs/common';
import { BaseExceptionFilter } from '@nestjs/core';
import { GqlExceptionFilter } from '@nestjs/graphql';
import { GraphQLError } from 'graphql';
import { DomainError, ErrorCode } from './domain-error';
import { codeForStatus } from './format-graphql-error';

const HTTP_STATUS: Record<ErrorCode, HttpStatus> = {
  UNAUTHENTICATED: HttpStatus.UNAUTHORIZED,
  FORBIDDEN: HttpStatus.FORBIDDEN,
  BAD_USER_INPUT: HttpStatus.BAD_REQUEST,
  NOT_FOUND: HttpStatus.NOT_FOUND,
  CONFLICT: HttpStatus.CONFLICT,
  TOO_MANY_REQUESTS: HttpStatus.TOO_MANY_REQUESTS,
  SERVICE_UNAVAILABLE: HttpStatus.SERVICE_UNAVAILABLE,
};

/**
 * Every exception passes here once. In GraphQL, domain errors and framework HTTP errors become
 * GraphQL errors carrying `extensions.code` (and `field`); anything else is logged and left for
 * `formatGraphqlError` to hide. Over plain HTTP (health, downloads, exports) a domain error gets
 * its HTTP status and the rest goes to Nest's own handler.
 */
@Catch()
export class GraphqlExceptionFilter extends BaseExceptionFilter implements GqlExceptionFilter {
  private readonly logger = new Logger('GraphQL');

  override catch(exception: unknown, host: ArgumentsHost): unknown {
    if (host.getType<string>() !== 'graphql') {
      const error =
        exception instanceof DomainError
          ? new HttpException({ code: exception.code, message: exception.message, field: exception.field }, HTTP_STATUS[exception.code])
          : exception;
      return super.catch(error, host);
    }
    if (exception instanceof DomainError) {
      return new GraphQLError(exception.message, {
        extensions: { code: exception.code, ...(exception.field ? { field: exception.field } : {}), ...exception.details },
      });
    }
    if (exception instanceof HttpException) {
      const response = exception.getResponse();
      const message = typeof response === 'object' && response && 'message' in response ? String((response as { message: unknown }).message) : exception.message;
      return new GraphQLError(message, { extensions: { code: codeForStatus(exception.getStatus()) } });
    }
    if (exception instanceof GraphQLError) return exception;
    this.logger.error(exception instanceof Error ? (exception.stack ?? exception.message) : String(exception));
    return exception;
  }
}
