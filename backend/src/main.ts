import 'reflect-metadata';
import { createApp } from './app.factory';
import { loadConfig } from './config/config';

async function bootstrap(): Promise<void> {
  const config = loadConfig();
  const app = await createApp(config);
  await app.listen(config.port, config.host);
  console.log(`Stratochron API listening on http://${config.host}:${config.port}`);
}

bootstrap().catch((error: unknown) => {
  console.error(error instanceof Error ? (error.stack ?? error.message) : error);
  process.exit(1);
});
