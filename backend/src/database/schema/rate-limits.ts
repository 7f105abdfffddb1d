import { bigint, integer, pgTable, varchar } from 'drizzle-orm/pg-core';

/**
 * Attempt counters shared by every API replica (sign-in failures, password-reset requests),
 * written by rate-limiter-flexible's PostgreSQL store: its own three columns, in its own layout.
 * `key` is a limiter's prefix and a hashed e-mail and/or client address; `expire` is epoch
 * milliseconds. Rows expired for an hour are pruned by the store every five minutes.
 */
export const rateLimits = pgTable('rate_limits', {
  key: varchar('key', { length: 255 }).primaryKey(),
  points: integer('points').notNull().default(0),
  expire: bigint('expire', { mode: 'number' }),
});
