import { bigserial, index, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { projects } from './projects';
import { users } from './users';

/** Who changed what and when, with before and after images. Append-only. */
export const auditRecords = pgTable(
  'audit_records',
  {
    // A monotonic sequence gives a stable cursor for pagination.
    seq: bigserial('seq', { mode: 'number' }).primaryKey(),
    // Audit records outlive deleted objects but not their project.
    projectId: uuid('project_id').references(() => projects.id, { onDelete: 'cascade' }),
    actorId: uuid('actor_id').references(() => users.id, { onDelete: 'set null' }),
    at: timestamp('at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
    action: text('action').notNull(),
    objectType: text('object_type').notNull(),
    objectId: text('object_id').notNull(),
    before: jsonb('before'),
    after: jsonb('after'),
  },
  (t) => [
    index('audit_records_project_seq_idx').on(t.projectId, t.seq),
    index('audit_records_object_idx').on(t.objectType, t.objectId),
  ],
);
