/**
 * Codes the API puts in GraphQL `extensions.code` (see the backend's DomainError), the protocol
 * codes of requests that never reached a resolver, and NETWORK for a request that got no
 * GraphQL answer at all.
 */
export type ApiErrorCode =
  | 'UNAUTHENTICATED'
  | 'FORBIDDEN'
  | 'BAD_USER_INPUT'
  | 'NOT_FOUND'
  | 'CONFLICT'
  | 'TOO_MANY_REQUESTS'
  | 'GRAPHQL_PARSE_FAILED'
  | 'GRAPHQL_VALIDATION_FAILED'
  | 'INTERNAL_SERVER_ERROR'
  | 'NETWORK';

const KNOWN_CODES = new Set<string>([
  'UNAUTHENTICATED',
  'FORBIDDEN',
  'BAD_USER_INPUT',
  'NOT_FOUND',
  'CONFLICT',
  'TOO_MANY_REQUESTS',
  'GRAPHQL_PARSE_FAILED',
  'GRAPHQL_VALIDATION_FAILED',
  'INTERNAL_SERVER_ERROR',
  'NETWORK',
]);

/** One GraphQL error as the client keeps it. */
export type ApiProblem = {
  message: string;
  code: ApiErrorCode;
  /** The input field at fault (BAD_USER_INPUT), without any `input.` prefix. */
  field?: string;
};

/** A failed API request; `code` and `field` are those of its first error. */
export class ApiError extends Error {
  readonly code: ApiErrorCode;
  readonly field: string | undefined;
  readonly problems: readonly ApiProblem[];

  constructor(problems: readonly ApiProblem[]) {
    const first = problems[0] ?? { message: 'the request failed', code: 'INTERNAL_SERVER_ERROR' as const };
    super(first.message);
    this.name = 'ApiError';
    this.code = first.code;
    this.field = first.field;
    this.problems = problems.length > 0 ? problems : [first];
  }
}

/** Whether an error is an ApiError, and of one of the given codes when any are given. */
export function isApiError(error: unknown, ...codes: ApiErrorCode[]): error is ApiError {
  return error instanceof ApiError && (codes.length === 0 || codes.includes(error.code));
}

/** Read the `errors` member of a GraphQL response into problems; unknown codes count as internal. */
export function readGraphqlErrors(errors: unknown): ApiProblem[] {
  if (!Array.isArray(errors)) return [];
  return errors.map((error: unknown): ApiProblem => {
    const record = (typeof error === 'object' && error !== null ? error : {}) as {
      message?: unknown;
      extensions?: { code?: unknown; field?: unknown };
    };
    const rawCode = record.extensions?.code;
    const code = typeof rawCode === 'string' && KNOWN_CODES.has(rawCode) ? (rawCode as ApiErrorCode) : 'INTERNAL_SERVER_ERROR';
    const rawField = record.extensions?.field;
    const problem: ApiProblem = {
      message: typeof record.message === 'string' ? record.message : 'the request failed',
      code,
    };
    if (typeof rawField === 'string' && rawField !== '') problem.field = rawField.replace(/^input\./, '');
    return problem;
  });
}

/**
 * Server problems that name an input field, by field, for showing beside the form control;
 * the first message wins when a field has several.
 */
export function fieldErrorsOf(error: unknown): Record<string, string> {
  if (!isApiError(error)) return {};
  const byField: Record<string, string> = {};
  for (const problem of error.problems) {
    if (problem.field && !(problem.field in byField)) byField[problem.field] = problem.message;
  }
  return byField;
}

/** A message as a sentence: capital first letter, full stop at the end. */
function sentence(message: string): string {
  const trimmed = message.trim();
  const capitalised = trimmed.charAt(0).toUpperCase() + trimmed.slice(1);
  return /[.!?]$/.test(capitalised) ? capitalised : `${capitalised}.`;
}

/**
 * The message to show above a form: every problem not tied to one of the form's own fields
 * (those are shown beside the field), as sentences; null when there is none.
 */
export function formErrorOf(error: unknown, formFields: readonly string[]): string | null {
  if (!error) return null;
  if (!isApiError(error)) return error instanceof Error ? sentence(error.message) : 'Something went wrong.';
  const loose = error.problems.filter((problem) => !problem.field || !formFields.includes(problem.field));
  return loose.length > 0 ? loose.map((problem) => sentence(problem.message)).join(' ') : null;
}

/** An update refused because the record changed since the form read it (optimistic locking). */
export function isEditConflict(error: unknown): boolean {
  return isApiError(error, 'CONFLICT');
}
