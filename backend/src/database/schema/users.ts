import { integer, pgTable, text, uniqueIndex } from 'drizzle-orm/pg-core';
import { id, timestamps } from './columns';

export const users = pgTable(
  'users',
  {
    id: id(),
    email: text('email').notNull(),
    displayName: text('display_name').notNull(),
    passwordHash: text('password_hash'),
    /** Bearer tokens carry the epoch they were issued in; a password change moves it, ending older tokens. */
    tokenEpoch: integer('token_epoch').notNull().default(0),
    ...timestamps,
  },
  (t) => [uniqueIndex('users_email_unique').on(t.email)],
);
