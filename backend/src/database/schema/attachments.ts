import { sql } from 'drizzle-orm';
import { check, index, integer, pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { id, timestamps } from './columns';
import { projects } from './projects';
import { samples } from './samples';
import { sites } from './sites';
import { units } from './units';
import { users } from './users';

/** A file on a site, unit or sample; the bytes live in object storage under `storageKey`. */
export const attachments = pgTable(
  'attachments',
  {
    id: id(),
    projectId: uuid('project_id').notNull().references(() => projects.id, { onDelete: 'cascade' }),
    siteId: uuid('site_id').references(() => sites.id, { onDelete: 'cascade' }),
    unitId: uuid('unit_id').references(() => units.id, { onDelete: 'cascade' }),
    sampleId: uuid('sample_id').references(() => samples.id, { onDelete: 'cascade' }),
    fileName: text('file_name').notNull(),
    contentType: text('content_type').notNull(),
    sizeBytes: integer('size_bytes').notNull(),
    storageKey: text('storage_key').notNull(),
    thumbnailKey: text('thumbnail_key'),
    uploadedById: uuid('uploaded_by_id').references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [
    index('attachments_project_idx').on(t.projectId),
    check('attachments_one_owner', sql`num_nonnulls(${t.siteId}, ${t.unitId}, ${t.sampleId}) = 1`),
    check('attachments_size_positive', sql`${t.sizeBytes} > 0`),
  ],
);
