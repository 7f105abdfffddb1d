/**
 * Every error a user may see carries one of these codes in GraphQL `extensions.code`.
 * Services throw `DomainError`s; `formatGraphqlError` maps them (and framework errors) in one place.
 */
export type ErrorCode =
  | 'UNAUTHENTICATED'
  | 'FORBIDDEN'
  | 'BAD_USER_INPUT'
  | 'NOT_FOUND'
  | 'CONFLICT'
  | 'TOO_MANY_REQUESTS'
  /** A service the API depends on (mail server, object storage) failed; nothing was saved. */
  | 'SERVICE_UNAVAILABLE';

export class DomainError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    /** The input field at fault, for BAD_USER_INPUT. */
    readonly field?: string,
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
    this.name = 'DomainError';
  }
}

export const badInput = (field: string, message: string, details?: Record<string, unknown>) =>
  new DomainError('BAD_USER_INPUT', message, field, details);
export const notFound = (what: string) => new DomainError('NOT_FOUND', `${what} not found`);
export const forbidden = (message = 'your role in this project does not allow this') => new DomainError('FORBIDDEN', message);
export const conflict = (message: string) => new DomainError('CONFLICT', message);
export const unauthenticated = (message = 'sign in first') => new DomainError('UNAUTHENTICATED', message);
export const unavailable = (message: string) => new DomainError('SERVICE_UNAVAILABLE', message);

/**
 * Run a lookup through a parent object (a run's site, a tie's hypothesis) and report its NOT_FOUND
 * as the object's own, so another project's object answers exactly as a missing one does.
 */
export async function asNotFoundOf<T>(what: string, lookup: () => Promise<T>): Promise<T> {
  try {
    return await lookup();
  } catch (error) {
    if (error instanceof DomainError && error.code === 'NOT_FOUND') throw notFound(what);
    throw error;
  }
}
