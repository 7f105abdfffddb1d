import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { NestExpressApplication } from '@nestjs/platform-express';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { AppModule } from './app.module';
import { createValidationPipe } from './common/errors/validation';
import { repositoryRoot } from './common/repo-paths';
import { loadConfig } from './config/config';
import { runMigrations } from './database/migrate';
import { seedDemoIfEmpty } from './demo/seed';

/** Paths the SPA fallback must leave to the API. */
const API_PREFIXES = ['/graphql', '/health', '/api', '/dev'];

async function bootstrap(): Promise<void> {
  const config = loadConfig();
  await runMigrations(config.databaseUrl);
  const app = await NestFactory.create<NestExpressApplication>(AppModule, {
    logger: config.nodeEnv === 'test' ? ['error', 'warn'] : ['log', 'error', 'warn'],
  });
  app.useGlobalPipes(createValidationPipe());
  app.enableShutdownHooks();
  app.set('trust proxy', 'loopback');
  app.useBodyParser('json', { limit: '25mb' });

  const frontendDist = config.frontendDist ?? join(repositoryRoot(), 'frontend', 'dist');
  if (existsSync(join(frontendDist, 'index.html'))) {
    app.useStaticAssets(frontendDist, { index: false, maxAge: '1h' });
    const indexHtml = join(frontendDist, 'index.html');
    app.use((req: { method: string; path: string }, res: { sendFile: (p: string) => void }, next: () => void) => {
      if (req.method !== 'GET' || API_PREFIXES.some((p) => req.path.startsWith(p))) return next();
      res.sendFile(indexHtml);
    });
  }

  if (config.seedDemo) await seedDemoIfEmpty(app);
  await app.listen(config.port, config.host);
  console.log(`Stratochron API listening on http://${config.host}:${config.port}`);
}

bootstrap().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
