import { sql } from 'drizzle-orm';
import { bigint, check, doublePrecision, index, pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { id, timestamps, version } from './columns';
import { siteKindEnum } from './enums';
import { projects } from './projects';
import { segments } from './segments';

export const sites = pgTable(
  'sites',
  {
    id: id(),
    projectId: uuid('project_id').notNull().references(() => projects.id, { onDelete: 'cascade' }),
    // A segment can be deleted while its sites stay: they become unassigned.
    segmentId: uuid('segment_id').references(() => segments.id, { onDelete: 'set null' }),
    name: text('name').notNull(),
    kind: siteKindEnum('kind').notNull(),
    latitude: doublePrecision('latitude').notNull(),
    longitude: doublePrecision('longitude').notNull(),
    alongStrikeKm: doublePrecision('along_strike_km').notNull(),
    elevationM: doublePrecision('elevation_m'),
    waterDepthM: doublePrecision('water_depth_m'),
    notes: text('notes'),
    /**
     * Bumped by database triggers whenever a unit, event horizon or sample of the site is written,
     * so "has the column changed since this run?" is one comparison (drizzle/0002_column_revision_triggers.sql).
     */
    columnRevision: bigint('column_revision', { mode: 'number' }).notNull().default(0),
    version: version(),
    ...timestamps,
  },
  (t) => [
    index('sites_project_idx').on(t.projectId),
    check('sites_latitude_range', sql`${t.latitude} between -90 and 90`),
    check('sites_longitude_range', sql`${t.longitude} between -180 and 180`),
    check('sites_water_depth_positive', sql`${t.waterDepthM} is null or ${t.waterDepthM} >= 0`),
  ],
);
