import { ApiError, type ApiErrorCode, type ApiProblem } from '@/modules/api/utils/apiError';

/** The API code an HTTP status stands for when the body names none the client knows. */
export function codeForHttpStatus(status: number): ApiErrorCode {
  switch (status) {
    case 400:
    case 413:
    case 415:
      return 'BAD_USER_INPUT';
    case 401:
      return 'UNAUTHENTICATED';
    case 403:
      return 'FORBIDDEN';
    case 404:
      return 'NOT_FOUND';
    case 409:
      return 'CONFLICT';
    case 429:
      return 'TOO_MANY_REQUESTS';
    default:
      return 'INTERNAL_SERVER_ERROR';
  }
}

const CODES_FROM_BODY = new Set<string>(['UNAUTHENTICATED', 'FORBIDDEN', 'BAD_USER_INPUT', 'NOT_FOUND', 'CONFLICT', 'TOO_MANY_REQUESTS']);

/**
 * The problem a failed plain-HTTP answer describes. The API's own refusals arrive as
 * `{ code, message, field }` (backend GraphqlExceptionFilter); Nest's validation and body-size
 * errors as `{ statusCode, message: string | string[] }`; anything else is named by its status.
 */
export function readHttpProblem(status: number, body: unknown): ApiProblem {
  const record = typeof body === 'object' && body !== null ? (body as { code?: unknown; message?: unknown; field?: unknown }) : {};
  const code =
    typeof record.code === 'string' && CODES_FROM_BODY.has(record.code) ? (record.code as ApiErrorCode) : codeForHttpStatus(status);
  const message = Array.isArray(record.message)
    ? record.message.filter((part): part is string => typeof part === 'string').join('; ')
    : typeof record.message === 'string'
      ? record.message
      : '';
  const problem: ApiProblem = {
    code,
    message: message !== '' ? message : status === 413 ? 'the file is too large for the server' : `the server answered ${status}`,
  };
  if (typeof record.field === 'string' && record.field !== '') problem.field = record.field;
  return problem;
}

/**
 * The file name a `Content-Disposition` header offers (RFC 6266: `filename*=UTF-8''…` wins over
 * `filename="…"`), or the fallback when there is none.
 */
export function fileNameFromDisposition(header: string | null, fallback: string): string {
  if (!header) return fallback;
  const extended = /filename\*\s*=\s*UTF-8''([^;]+)/i.exec(header);
  if (extended?.[1]) {
    try {
      return decodeURIComponent(extended[1].trim());
    } catch {
      // A malformed escape: fall through to the plain parameter.
    }
  }
  const plain = /filename\s*=\s*"([^"]*)"|filename\s*=\s*([^;]+)/i.exec(header);
  const name = (plain?.[1] ?? plain?.[2] ?? '').trim();
  return name !== '' ? name : fallback;
}

/** An ApiError from a failed answer, reading its JSON body when it has one. */
export async function httpError(response: Response): Promise<ApiError> {
  let body: unknown = null;
  try {
    body = await response.json();
  } catch {
    // Not JSON (a proxy page, an empty body): the status alone describes it.
  }
  return new ApiError([readHttpProblem(response.status, body)]);
}
