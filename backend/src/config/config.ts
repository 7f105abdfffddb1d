/**
 * The one typed configuration object, read once at boot. This is the only module that reads
 * `process.env`; a bad or missing variable fails the start with every problem listed at once.
 */
import { isIP } from 'node:net';

export interface AppConfig {
  readonly nodeEnv: 'development' | 'test' | 'production';
  readonly host: string;
  readonly port: number;
  readonly databaseUrl: string;
  readonly jwtSecret: string;
  readonly jwtExpiresInSeconds: number;
  /** Seed the invented demo project on first start (never in production). */
  readonly seedDemo: boolean;
  /** Public base URL used in e-mailed links. */
  readonly publicUrl: string;
  readonly smtp: { host: string; port: number; secure: boolean; user?: string; password?: string; from: string };
  /** HTTP listing of the local SMTP fake, read by the development mail page; never set in production. */
  readonly mailFakeUrl?: string;
  readonly s3: {
    endpoint?: string;
    region: string;
    bucket: string;
    accessKeyId?: string;
    secretAccessKey?: string;
    forcePathStyle: boolean;
  };
  /** Folder holding the built frontend, served at `/` when present. */
  readonly frontendDist?: string;
  /** Concurrent jobs one worker process runs. */
  readonly workerConcurrency: number;
  /** Where the demo seed lists the demo accounts for `npm start` to print (development only). */
  readonly demoAccountsFile?: string;
  /** Silence after which a RUNNING job counts as abandoned by its worker (tests shorten it). */
  readonly jobHeartbeatTimeoutMs: number;
  /**
   * E-mail addresses of the server's operators, lower case. Installed calibration curves are
   * shared by every project on the server, so only an operator may install one.
   */
  readonly operatorEmails: readonly string[];
  /**
   * Wall-clock budget of a lab sheet's calibrations (run in a thread off the API's event loop);
   * a sheet that needs longer is refused whole.
   */
  readonly importCalibrationBudgetMs: number;
  /** Memory for serialised event-ladder answers per API process, MiB; 0 turns the cache off. */
  readonly ladderCacheMiB: number;
  /**
   * Sightings of one query text after which it runs compiled (graphql-jit) instead of
   * interpreted (GRAPHQL_COMPILE_AFTER; 0 turns compiling off). See `compiledExecutionPlugin`.
   */
  readonly graphqlCompileAfter: number;
  /**
   * Reverse proxies whose `X-Forwarded-For` is believed (TRUST_PROXY: comma-separated addresses,
   * CIDR ranges or Express's names loopback, linklocal, uniquelocal); empty believes none, so the
   * client address (which sign-in throttling keys on) is the connection's own.
   */
  readonly trustProxy: readonly string[];
  /** Serve `/dev/mail` (captured mail) to loopback clients: DEV_MAIL_PAGE=true, never in production. */
  readonly devMailPage: boolean;
}

export class ConfigError extends Error {
  constructor(readonly problems: string[]) {
    super(`Invalid configuration:\n  - ${problems.join('\n  - ')}`);
    this.name = 'ConfigError';
  }
}

type Env = Record<string, string | undefined>;

/** Build and validate the configuration from an environment (defaults to `process.env`). */
export function loadConfig(env: Env = process.env): AppConfig {
  const problems: string[] = [];
  const nodeEnv = (env.NODE_ENV ?? 'development') as AppConfig['nodeEnv'];
  if (!['development', 'test', 'production'].includes(nodeEnv)) {
    problems.push(`NODE_ENV must be development, test or production, got "${env.NODE_ENV}"`);
  }
  const integer = (name: string, fallback: number, min = 0, max = 65535): number => {
    const raw = env[name];
    if (raw === undefined || raw === '') return fallback;
    const value = Number(raw);
    if (!Number.isInteger(value) || value < min || value > max) {
      problems.push(`${name} must be an integer in ${min}..${max}, got "${raw}"`);
      return fallback;
    }
    return value;
  };
  const databaseUrl = env.DATABASE_URL ?? '';
  if (!databaseUrl) problems.push('DATABASE_URL is required (npm start and npm test set it for you)');
  else if (!/^postgres(ql)?:\/\//.test(databaseUrl)) problems.push('DATABASE_URL must be a postgres:// URL');
  const jwtSecret = env.JWT_SECRET ?? (nodeEnv === 'production' ? '' : 'stratochron-development-secret-not-for-production');
  if (jwtSecret.length < 32) problems.push('JWT_SECRET must be at least 32 characters');
  const port = integer('PORT', 3000, 1);
  const seedDemo = (env.SEED_DEMO ?? 'false') === 'true';
  const operatorEmails = (env.OPERATOR_EMAILS ?? '').split(',').map((e) => e.trim().toLowerCase()).filter((e) => e !== '');
  for (const email of operatorEmails) {
    if (!/^[^\s@]+@[^\s@]+$/.test(email)) problems.push(`OPERATOR_EMAILS must be comma-separated e-mail addresses, got "${email}"`);
  }
  if (seedDemo && nodeEnv === 'production') problems.push('SEED_DEMO must not be true in production');
  const trustProxy = (env.TRUST_PROXY ?? '').split(',').map((entry) => entry.trim()).filter((entry) => entry !== '');
  for (const entry of trustProxy) {
    const [address, bits, extra] = entry.split('/');
    const namedRange = ['loopback', 'linklocal', 'uniquelocal'].includes(entry);
    const validBits = bits === undefined || (/^\d{1,3}$/.test(bits) && Number(bits) <= (isIP(address) === 6 ? 128 : 32));
    if (!namedRange && (extra !== undefined || isIP(address) === 0 || !validBits)) {
      problems.push(`TRUST_PROXY must list addresses, CIDR ranges or loopback/linklocal/uniquelocal, got "${entry}"`);
    }
  }
  const devMailPage = env.DEV_MAIL_PAGE === 'true';
  if (devMailPage && nodeEnv === 'production') problems.push('DEV_MAIL_PAGE must not be true in production');
  const config: AppConfig = {
    nodeEnv,
    host: env.HOST ?? '127.0.0.1',
    port,
    databaseUrl,
    jwtSecret,
    jwtExpiresInSeconds: integer('JWT_EXPIRES_IN_SECONDS', 12 * 3600, 60, 30 * 86400),
    seedDemo,
    publicUrl: env.PUBLIC_URL ?? `http://127.0.0.1:${port}`,
    smtp: {
      host: env.SMTP_HOST ?? '127.0.0.1',
      port: integer('SMTP_PORT', 2525, 1),
      secure: env.SMTP_SECURE === 'true',
      user: env.SMTP_USER,
      password: env.SMTP_PASSWORD,
      from: env.MAIL_FROM ?? 'Stratochron <no-reply@stratochron.test>',
    },
    mailFakeUrl: nodeEnv === 'production' ? undefined : (env.MAIL_FAKE_URL || 'http://127.0.0.1:2526'),
    s3: {
      endpoint: env.S3_ENDPOINT || undefined,
      region: env.S3_REGION ?? 'us-east-1',
      bucket: env.S3_BUCKET ?? 'stratochron-attachments',
      accessKeyId: env.S3_ACCESS_KEY_ID,
      secretAccessKey: env.S3_SECRET_ACCESS_KEY,
      forcePathStyle: (env.S3_FORCE_PATH_STYLE ?? (env.S3_ENDPOINT ? 'true' : 'false')) === 'true',
    },
    frontendDist: env.FRONTEND_DIST || undefined,
    workerConcurrency: integer('WORKER_CONCURRENCY', 1, 1, 64),
    demoAccountsFile: env.DEMO_ACCOUNTS_FILE || undefined,
    jobHeartbeatTimeoutMs: integer('JOB_HEARTBEAT_TIMEOUT_MS', 20_000, 3_000, 3_600_000),
    operatorEmails,
    ladderCacheMiB: integer('LADDER_CACHE_MIB', 64, 0, 16_384),
    graphqlCompileAfter: integer('GRAPHQL_COMPILE_AFTER', 2, 0, 1000),
    importCalibrationBudgetMs: integer('IMPORT_CALIBRATION_BUDGET_MS', 20_000, 1, 600_000),
    trustProxy,
    devMailPage,
  };
  if (problems.length > 0) throw new ConfigError(problems);
  return config;
}

/** Injection token for the configuration object. */
export const APP_CONFIG = Symbol('APP_CONFIG');
