import { sql } from 'drizzle-orm';
import { check, doublePrecision, index, pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { id, timestamps, version } from './columns';
import { projects } from './projects';

export const segments = pgTable(
  'segments',
  {
    id: id(),
    projectId: uuid('project_id').notNull().references(() => projects.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    startKm: doublePrecision('start_km').notNull(),
    endKm: doublePrecision('end_km').notNull(),
    notes: text('notes'),
    /** Down-dip width of the rupture plane (km), for magnitude from rupture area; null when unknown. */
    downDipWidthKm: doublePrecision('down_dip_width_km'),
    version: version(),
    ...timestamps,
  },
  (t) => [
    index('segments_project_idx').on(t.projectId),
    check('segments_extent_ordered', sql`${t.endKm} > ${t.startKm}`),
    check('segments_width_positive', sql`${t.downDipWidthKm} is null or ${t.downDipWidthKm} > 0`),
  ],
);
