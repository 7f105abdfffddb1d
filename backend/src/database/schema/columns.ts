import { doublePrecision, integer, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { jobStatusEnum } from './enums';

/** Primary key shared by every table: a random UUID made by PostgreSQL. */
export const id = () => uuid('id').primaryKey().defaultRandom();

/** Creation and update times shared by every editable table. */
export const timestamps = {
  createdAt: timestamp('created_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  updatedAt: timestamp('updated_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
};

/** Optimistic-lock counter: an update names the version it read and bumps it. */
export const version = () => integer('version').notNull().default(1);

/**
 * The state every kind of run (a row a worker computes) shares, written only through
 * `RunsRepository`: status, progress (whose write is also the worker's heartbeat on
 * `updated_at`), a message for people, attempts made, and when it started and ended.
 */
export const runState = () => ({
  status: jobStatusEnum('status').notNull().default('QUEUED'),
  progress: doublePrecision('progress').notNull().default(0),
  message: text('message'),
  attempts: integer('attempts').notNull().default(0),
  startedAt: timestamp('started_at', { withTimezone: true, mode: 'date' }),
  finishedAt: timestamp('finished_at', { withTimezone: true, mode: 'date' }),
});
