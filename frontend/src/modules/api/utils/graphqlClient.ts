import type { TypedDocumentString } from '@/gql/graphql';
import { sessionStore } from '@/modules/auth/utils/sessionStore';
import { ApiError, readGraphqlErrors } from './apiError';

const GRAPHQL_ENDPOINT = '/graphql';

/**
 * Send one typed GraphQL operation (pass `{}` for an operation without variables) with the
 * session's bearer token. Resolves with `data`, or
 * rejects with an ApiError carrying the server's `extensions.code` and `extensions.field`.
 * An UNAUTHENTICATED answer to a request that carried a token ends the session, which sends
 * the app back to the sign-in page.
 */
export async function graphqlRequest<TResult, TVariables>(
  document: TypedDocumentString<TResult, TVariables>,
  variables: TVariables,
): Promise<TResult> {
  const token = sessionStore.get()?.token;
  let response: Response;
  try {
    response = await fetch(GRAPHQL_ENDPOINT, {
      method: 'POST',
      headers: {
        'Content-Type': 'application/json',
        Accept: 'application/graphql-response+json, application/json',
        ...(token ? { Authorization: `Bearer ${token}` } : {}),
      },
      body: JSON.stringify({ query: document.toString(), variables }),
    });
  } catch {
    throw new ApiError([{ message: 'The server cannot be reached. Check your connection and try again.', code: 'NETWORK' }]);
  }

  let body: { data?: TResult | null; errors?: unknown };
  try {
    body = (await response.json()) as typeof body;
  } catch {
    throw new ApiError([{ message: `The server answered ${response.status} without a GraphQL response.`, code: 'NETWORK' }]);
  }

  const problems = readGraphqlErrors(body.errors);
  if (problems.length > 0) {
    if (token && problems.some((problem) => problem.code === 'UNAUTHENTICATED')) sessionStore.clear();
    throw new ApiError(problems);
  }
  if (body.data === undefined || body.data === null) {
    throw new ApiError([{ message: 'The server sent no data.', code: 'INTERNAL_SERVER_ERROR' }]);
  }
  return body.data;
}
