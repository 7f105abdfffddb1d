import { sql } from 'drizzle-orm';
import { check, doublePrecision, integer, pgTable, text, unique, uuid } from 'drizzle-orm/pg-core';
import { id, timestamps, version } from './columns';
import { faciesEnum } from './enums';
import { sites } from './sites';

export const units = pgTable(
  'units',
  {
    id: id(),
    siteId: uuid('site_id').notNull().references(() => sites.id, { onDelete: 'cascade' }),
    /** 1 is the oldest unit at the base of the column. */
    position: integer('position').notNull(),
    name: text('name').notNull(),
    topDepthM: doublePrecision('top_depth_m').notNull(),
    baseDepthM: doublePrecision('base_depth_m').notNull(),
    facies: faciesEnum('facies').notNull(),
    /**
     * Estimated thickness of mud (m) the unit's base eroded from the unit below (a turbidite's
     * scour); null when not estimated.
     */
    basalErosionM: doublePrecision('basal_erosion_m'),
    notes: text('notes'),
    version: version(),
    ...timestamps,
  },
  (t) => [
    unique('units_site_position_unique').on(t.siteId, t.position),
    check('units_depths_ordered', sql`${t.baseDepthM} > ${t.topDepthM}`),
    check('units_top_not_negative', sql`${t.topDepthM} >= 0`),
    check('units_position_positive', sql`${t.position} >= 1`),
    check('units_basal_erosion_not_negative', sql`${t.basalErosionM} >= 0`),
  ],
);
