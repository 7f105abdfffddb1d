import { sql } from 'drizzle-orm';
import { check, doublePrecision, index, integer, jsonb, pgTable, text, unique, uuid } from 'drizzle-orm/pg-core';
import { id, timestamps } from './columns';
import { sites } from './sites';
import { users } from './users';

/**
 * A physical-property log of a core (magnetic susceptibility, density, ...): depths in metres
 * below the core top and one reading array per channel, checked row by row before it is stored
 * (core-logs/core-log-sheet.ts). Small enough to keep in the row: at most 20,000 depths.
 */
export const coreLogs = pgTable(
  'core_logs',
  {
    id: id(),
    siteId: uuid('site_id').notNull().references(() => sites.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    /** [{ name, unit }] in sheet order. */
    channels: jsonb('channels').$type<{ name: string; unit: string }[]>().notNull(),
    depthsM: jsonb('depths_m').$type<number[]>().notNull(),
    /** One array per channel, aligned with `depthsM`; null where the channel has no reading. */
    readings: jsonb('readings').$type<(number | null)[][]>().notNull(),
    rowCount: integer('row_count').notNull(),
    topDepthM: doublePrecision('top_depth_m').notNull(),
    baseDepthM: doublePrecision('base_depth_m').notNull(),
    uploadedById: uuid('uploaded_by_id').references(() => users.id, { onDelete: 'set null' }),
    ...timestamps,
  },
  (t) => [
    index('core_logs_site_idx').on(t.siteId),
    unique('core_logs_site_name_unique').on(t.siteId, t.name),
    check('core_logs_depths_ordered', sql`${t.baseDepthM} > ${t.topDepthM} and ${t.topDepthM} >= 0`),
    check('core_logs_rows_positive', sql`${t.rowCount} >= 2`),
  ],
);
