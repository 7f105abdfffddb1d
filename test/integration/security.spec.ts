import jwt from 'jsonwebtoken';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestServer, TestServer, TEST_JWT_SECRET } from '../support/app';
import { createProjectFixture, PASSWORD, ProjectFixture } from '../support/fixtures';
import { GraphqlClient } from '../support/graphql';

let server: TestServer;
let fixture: ProjectFixture;
let userId: string;

beforeAll(async () => {
  server = await startTestServer();
  fixture = await createProjectFixture('Security');
  const viewer = await new GraphqlClient(server.url).signIn(fixture.emails.VIEWER, PASSWORD);
  userId = (await viewer.ok<{ me: { id: string } }>('{ me { id } }')).me.id;
});

afterAll(async () => {
  await server?.close();
});

describe('bearer tokens', () => {
  const claims = () => ({ sub: userId, email: fixture.emails.VIEWER });

  it('accepts a token signed with the server secret (control for the refusals below)', async () => {
    const token = jwt.sign(claims(), TEST_JWT_SECRET, { algorithm: 'HS256', expiresIn: 60 });
    expect((await new GraphqlClient(server.url, token).ok('{ me { id } }')).me.id).toBe(userId);
  });

  it('refuses an expired token', async () => {
    const token = jwt.sign({ ...claims(), exp: Math.floor(Date.now() / 1000) - 60 }, TEST_JWT_SECRET, { algorithm: 'HS256' });
    expect((await new GraphqlClient(server.url, token).errorOf('{ me { id } }')).code).toBe('UNAUTHENTICATED');
  });

  it('refuses a token signed with another algorithm or with none', async () => {
    const hs512 = jwt.sign(claims(), TEST_JWT_SECRET, { algorithm: 'HS512', expiresIn: 60 });
    expect((await new GraphqlClient(server.url, hs512).errorOf('{ me { id } }')).code).toBe('UNAUTHENTICATED');
    const unsigned = jwt.sign(claims(), '', { algorithm: 'none' });
    expect((await new GraphqlClient(server.url, unsigned).errorOf('{ me { id } }')).code).toBe('UNAUTHENTICATED');
  });

  it('refuses a token signed with another secret', async () => {
    const token = jwt.sign(claims(), 'some-other-secret-of-at-least-32-characters', { algorithm: 'HS256', expiresIn: 60 });
    expect((await new GraphqlClient(server.url, token).errorOf('{ me { id } }')).code).toBe('UNAUTHENTICATED');
  });
});

describe('query limits', () => {
  it('refuses a query nested deeper than the limit', async () => {
    const client = await new GraphqlClient(server.url).signIn(fixture.emails.VIEWER, PASSWORD);
    let selection = 'id';
    for (let i = 0; i < 4; i++) selection = `memberships { project { members { user { ${selection} } } } }`;
    const error = await client.errorOf(`{ me { ${selection} } }`);
    // Apollo reports every validation rule's refusal under its own code.
    expect(error.code).toBe('GRAPHQL_VALIDATION_FAILED');
    expect(error.message).toMatch(/levels deep/);
  });

  it('refuses a query costing more than the cap (lists multiply their selections)', async () => {
    const client = await new GraphqlClient(server.url).signIn(fixture.emails.VIEWER, PASSWORD);
    const aliases = Array.from({ length: 300 }, (_, i) => `a${i}: memberships { project { sites { id } } }`).join(' ');
    const error = await client.errorOf(`{ me { ${aliases} } }`);
    expect(error.code).toBe('BAD_USER_INPUT');
    expect(error.message).toMatch(/would cost \d+ units; the limit is/);
  });

  it('refuses a request body above the size limit', async () => {
    const response = await fetch(`${server.url}/graphql`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ query: '{ me { id } }', padding: 'x'.repeat(26 * 1024 * 1024) }),
    });
    expect(response.status).toBe(413);
  });
});

describe('sign-in throttling', () => {
  it('delays a pair after five failures, even with the right password, and tells how long', async () => {
    const anonymous = new GraphqlClient(server.url);
    const attempt = (password: string) =>
      anonymous.request('mutation($e: String!, $p: String!) { signIn(email: $e, password: $p) { token } }', { e: fixture.emails.ANALYST, p: password });
    for (let i = 0; i < 5; i++) expect(await attempt('wrong-password-1')).toHaveProperty('errors.0.extensions.code', 'UNAUTHENTICATED');
    const refused = await attempt(PASSWORD);
    expect(refused).toHaveProperty('errors.0.extensions.code', 'TOO_MANY_REQUESTS');
    expect(refused).toHaveProperty('errors.0.extensions.retryAfterSeconds', 1);
  });
});

describe('HTTP hardening', () => {
  it('sends security headers', async () => {
    const response = await fetch(`${server.url}/health`);
    expect(response.headers.get('x-content-type-options')).toBe('nosniff');
    expect(response.headers.get('content-security-policy')).toContain("default-src 'self'");
    expect(response.headers.get('x-powered-by')).toBeNull();
  });

  it('hides internal error details in production', async () => {
    const { formatGraphqlError } = await import('../../backend/src/common/errors/format-graphql-error');
    const hidden = formatGraphqlError({ message: 'relation "x" does not exist', extensions: { code: 'INTERNAL_SERVER_ERROR', stacktrace: ['at x'] } }, true);
    expect(hidden).toEqual({ message: 'Internal server error', extensions: { code: 'INTERNAL_SERVER_ERROR' }, locations: undefined, path: undefined });
    const kept = formatGraphqlError({ message: 'no such site', extensions: { code: 'NOT_FOUND', stacktrace: ['at y'] } }, true);
    expect(kept).toMatchObject({ message: 'no such site', extensions: { code: 'NOT_FOUND' } });
    expect(kept.extensions).not.toHaveProperty('stacktrace');
  });
});
