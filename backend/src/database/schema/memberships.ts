import { pgTable, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { id, timestamps } from './columns';
import { roleEnum } from './enums';
import { projects } from './projects';
import { users } from './users';

export const memberships = pgTable(
  'memberships',
  {
    id: id(),
    // Deleting a project or a user removes their memberships; nothing else hangs on a membership.
    projectId: uuid('project_id').notNull().references(() => projects.id, { onDelete: 'cascade' }),
    userId: uuid('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    role: roleEnum('role').notNull(),
    ...timestamps,
  },
  (t) => [uniqueIndex('memberships_project_user_unique').on(t.projectId, t.userId)],
);
