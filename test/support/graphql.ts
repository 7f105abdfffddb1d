/** A GraphQL error as the API sends it. */
export interface ApiError {
  message: string;
  extensions?: { code?: string; field?: string };
}

export interface GraphqlResponse<T> {
  data?: T;
  errors?: ApiError[];
}

/** A tiny GraphQL client for tests: POST /graphql with an optional bearer token. */
export class GraphqlClient {
  constructor(
    readonly baseUrl: string,
    public token?: string,
  ) {}

  async request<T = Record<string, unknown>>(query: string, variables: Record<string, unknown> = {}): Promise<GraphqlResponse<T>> {
    const response = await fetch(`${this.baseUrl}/graphql`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', ...(this.token ? { authorization: `Bearer ${this.token}` } : {}) },
      body: JSON.stringify({ query, variables }),
    });
    return (await response.json()) as GraphqlResponse<T>;
  }

  /** Request and fail the test on any GraphQL error. */
  async ok<T = Record<string, any>>(query: string, variables: Record<string, unknown> = {}): Promise<T> {
    const result = await this.request<T>(query, variables);
    if (result.errors?.length) throw new Error(`GraphQL error: ${JSON.stringify(result.errors)}`);
    return result.data as T;
  }

  /** The first error's code (and field), for expecting failures. */
  async errorOf(query: string, variables: Record<string, unknown> = {}): Promise<{ code?: string; field?: string; message: string }> {
    const result = await this.request(query, variables);
    const error = result.errors?.[0];
    if (!error) throw new Error(`expected an error, got ${JSON.stringify(result.data)}`);
    return { code: error.extensions?.code, field: error.extensions?.field, message: error.message };
  }

  async signIn(email: string, password: string): Promise<GraphqlClient> {
    const data = await this.ok<{ signIn: { token: string } }>(
      'mutation($e: String!, $p: String!) { signIn(email: $e, password: $p) { token user { id email } } }',
      { e: email, p: password },
    );
    return new GraphqlClient(this.baseUrl, data.signIn.token);
  }
}
