import 'reflect-metadata';
import { join } from 'node:path';
import { tmpdir } from 'node:os';
import { startS3Fake } from './s3-fake';
import { startSmtpFake } from './smtp-fake';

/**
 * `node backend/dist/fakes/main.js`: the local stand-ins for mail and object storage that
 * `npm start` runs beside the server in development. Each fake is started by its own function;
 * this file only wires ports and folders. It is a development tool with its own few variables,
 * so it reads them here rather than through the application's config.
 */
function port(value: string | undefined, fallback: number): number {
  const parsed = Number(value);
  return value && Number.isInteger(parsed) && parsed > 0 && parsed < 65536 ? parsed : fallback;
}

async function main(): Promise<void> {
  const env = process.env;
  const dataDir = env.FAKE_DATA_DIR || join(tmpdir(), 'stratochron-fakes');
  const closers: Array<() => Promise<void>> = [];

  const smtp = await startSmtpFake({
    smtpPort: port(env.FAKE_SMTP_PORT, 2525),
    httpPort: port(env.FAKE_MAIL_HTTP_PORT, 2526),
    mailDir: join(dataDir, 'mail'),
  });
  closers.push(smtp.close);
  console.log(`SMTP fake on 127.0.0.1:${smtp.smtpPort}, captured mail at ${smtp.listingUrl}/messages`);

  const s3 = await startS3Fake({ port: port(env.FAKE_S3_PORT, 4569), dataDir: join(dataDir, 's3') });
  closers.push(s3.close);
  console.log(`S3 fake (path-style) at ${s3.endpoint}`);

  const stop = () => void Promise.all(closers.map((close) => close())).finally(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? (error.stack ?? error.message) : error);
  process.exit(1);
});
