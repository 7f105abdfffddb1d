import { integer, timestamp, uuid } from 'drizzle-orm/pg-core';

/** Primary key shared by every table: a random UUID made by PostgreSQL. */
export const id = () => uuid('id').primaryKey().defaultRandom();

/** Creation and update times shared by every editable table. */
export const timestamps = {
  createdAt: timestamp('created_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  updatedAt: timestamp('updated_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
};

/** Optimistic-lock counter: an update names the version it read and bumps it. */
export const version = () => integer('version').notNull().default(1);
