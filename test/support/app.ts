import type { NestExpressApplication } from '@nestjs/platform-express';
import type { AddressInfo } from 'node:net';
import { createApp } from '../../backend/src/app.factory';
import { loadConfig } from '../../backend/src/config/config';

/** The signing secret of every test server (tests forge tokens with it). */
export const TEST_JWT_SECRET = 'integration-test-secret-0123456789abcdef';

export interface TestServer {
  app: NestExpressApplication;
  url: string;
  close(): Promise<void>;
}

/** Start the API as `npm start` does (migrations, pipes, guards) on a free loopback port. */
export async function startTestServer(env: Record<string, string> = {}): Promise<TestServer> {
  if (!process.env.DATABASE_URL) throw new Error('DATABASE_URL is not set: run the integration tests through `npm test`');
  const config = loadConfig({
    ...process.env,
    NODE_ENV: 'test',
    JWT_SECRET: TEST_JWT_SECRET,
    SEED_DEMO: 'false',
    PORT: '3000',
    FRONTEND_DIST: '/nonexistent',
    // Every query runs compiled from its first sighting (a server compiles from the second), so
    // the suite checks the compiled answers; answers with errors are interpreted either way.
    GRAPHQL_COMPILE_AFTER: '1',
    ...env,
  });
  const app = await createApp(config);
  await app.listen(0, '127.0.0.1');
  const { port } = app.getHttpServer().address() as AddressInfo;
  return { app, url: `http://127.0.0.1:${port}`, close: () => app.close() };
}
