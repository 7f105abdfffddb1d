import { NestFactory } from '@nestjs/core';
import { NestExpressApplication } from '@nestjs/platform-express';
import helmet from 'helmet';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { AppModule } from './app.module';
import { createValidationPipe } from './common/errors/validation';
import { repositoryRoot } from './common/repo-paths';
import { AppConfig } from './config/config';
import { provideBootConfig } from './config/config.module';
import { runMigrations } from './database/migrate';
import { seedDemoIfEmpty } from './demo/seed';

/** Paths the single-page-app fallback leaves to the API. */
const API_PREFIXES = ['/graphql', '/health', '/api', '/dev'];

/**
 * Build the HTTP application: migrations, pipes, the built frontend with its SPA fallback, and
 * the demo seed when configured. `main.ts` listens on it; integration tests do the same on a
 * free port.
 */
export async function createApp(config: AppConfig): Promise<NestExpressApplication> {
  await runMigrations(config.databaseUrl);
  provideBootConfig(config);
  const app = await NestFactory.create<NestExpressApplication>(AppModule, {
    logger: config.nodeEnv === 'test' ? ['error'] : ['log', 'error', 'warn'],
  });
  app.useGlobalPipes(createValidationPipe());
  app.enableShutdownHooks();
  // Only the proxies the operator names (TRUST_PROXY) may say who the client is.
  app.set('trust proxy', config.trustProxy.length > 0 ? [...config.trustProxy] : false);
  app.useBodyParser('json', { limit: '25mb' });
  // Security headers; the UI is served from this origin only and loads nothing from elsewhere.
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: { defaultSrc: ["'self'"], styleSrc: ["'self'", "'unsafe-inline'"], imgSrc: ["'self'", 'data:', 'blob:'], fontSrc: ["'self'", 'data:'] },
      },
    }),
  );

  // The built UI is looked up per request, so a rebuild of frontend/dist needs no server restart.
  const frontendDist = config.frontendDist ?? join(repositoryRoot(), 'frontend', 'dist');
  const indexHtml = join(frontendDist, 'index.html');
  app.useStaticAssets(frontendDist, { index: false, maxAge: '1h' });
  app.use((req: { method: string; path: string }, res: { sendFile: (p: string) => void }, next: () => void) => {
    if (req.method !== 'GET' || API_PREFIXES.some((p) => req.path.startsWith(p)) || !existsSync(indexHtml)) return next();
    res.sendFile(indexHtml);
  });

  if (config.seedDemo) await seedDemoIfEmpty(app);
  return app;
}
