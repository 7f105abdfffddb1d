import { Inject, Injectable, OnModuleDestroy } from '@nestjs/common';
import { drizzle, NodePgDatabase } from 'drizzle-orm/node-postgres';
import { Pool } from 'pg';
import { APP_CONFIG, AppConfig } from '../config/config';
import * as schema from './schema';

export type Database = NodePgDatabase<typeof schema>;
/** A database handle or an open transaction: repositories accept either. */
export type Executor = Database | Parameters<Parameters<Database['transaction']>[0]>[0];

/** Owns the connection pool. Only repositories use `db`; services open transactions through it. */
@Injectable()
export class DatabaseService implements OnModuleDestroy {
  readonly pool: Pool;
  readonly db: Database;

  constructor(@Inject(APP_CONFIG) config: AppConfig) {
    this.pool = new Pool({ connectionString: config.databaseUrl, max: 10, connectionTimeoutMillis: 5000 });
    // A dropped connection (e.g. PostgreSQL restarting) must not crash the process; the pool reconnects.
    this.pool.on('error', () => undefined);
    this.db = drizzle(this.pool, { schema, casing: 'snake_case' });
  }

  /** Run `work` in one transaction: everything it writes lands together or not at all. */
  transaction<T>(work: (tx: Executor) => Promise<T>): Promise<T> {
    return this.db.transaction(work);
  }

  /** True when a trivial query answers. */
  async isHealthy(): Promise<boolean> {
    try {
      await this.pool.query('select 1');
      return true;
    } catch {
      return false;
    }
  }

  async onModuleDestroy(): Promise<void> {
    await this.pool.end();
  }
}
