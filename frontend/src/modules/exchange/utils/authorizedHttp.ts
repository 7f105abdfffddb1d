import { ApiError } from '@/modules/api/utils/apiError';
import { sessionStore } from '@/modules/auth/utils/sessionStore';
import { downloadText } from '@/modules/ui/utils/download';
import { fileNameFromDisposition, httpError } from './httpProblem';

/**
 * Fetch one of the API's plain-HTTP routes (attachments, exports, import) with the session's
 * bearer token. Rejects with an ApiError carrying the server's message; a 401 to a request
 * that carried a token ends the session, as the GraphQL client does.
 */
export async function authorizedFetch(url: string, init: RequestInit = {}): Promise<Response> {
  const token = sessionStore.get()?.token;
  const headers = new Headers(init.headers);
  if (token) headers.set('Authorization', `Bearer ${token}`);
  let response: Response;
  try {
    response = await fetch(url, { ...init, headers });
  } catch {
    throw new ApiError([{ message: 'The server cannot be reached. Check your connection and try again.', code: 'NETWORK' }]);
  }
  if (!response.ok) {
    const error = await httpError(response);
    if (token && response.status === 401) sessionStore.clear();
    throw error;
  }
  return response;
}

/** Fetch a text export with the token and offer it as a file under the name the server gives. */
export async function downloadExport(url: string, fallbackFileName: string): Promise<void> {
  const response = await authorizedFetch(url);
  const fileName = fileNameFromDisposition(response.headers.get('Content-Disposition'), fallbackFileName);
  const contentType = response.headers.get('Content-Type') ?? 'application/octet-stream';
  downloadText(fileName, await response.text(), contentType);
}

/** A file fetched with the token as an object URL (revoke it when done with it). */
export async function fetchObjectUrl(url: string): Promise<string> {
  const response = await authorizedFetch(url);
  return URL.createObjectURL(await response.blob());
}
