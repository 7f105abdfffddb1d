import { sql } from 'drizzle-orm';
import { check, doublePrecision, index, integer, pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { id, timestamps, version } from './columns';
import { sites } from './sites';
import { units } from './units';

export const eventHorizons = pgTable(
  'event_horizons',
  {
    id: id(),
    siteId: uuid('site_id').notNull().references(() => sites.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    // A unit that bounds an event cannot be deleted until the event is removed or moved.
    unitBelowId: uuid('unit_below_id').notNull().references(() => units.id, { onDelete: 'restrict' }),
    unitAboveId: uuid('unit_above_id').notNull().references(() => units.id, { onDelete: 'restrict' }),
    quality: integer('quality').notNull(),
    evidence: text('evidence').array().notNull().default(sql`'{}'::text[]`),
    notes: text('notes'),
    /** Measured coseismic subsidence (m) and its 1-sigma error (m), e.g. from a marsh's microfossils. */
    subsidenceM: doublePrecision('subsidence_m'),
    subsidenceErrorM: doublePrecision('subsidence_error_m'),
    /** Measured coseismic displacement (m) and its 1-sigma error (m), e.g. slip in a trench. */
    displacementM: doublePrecision('displacement_m'),
    displacementErrorM: doublePrecision('displacement_error_m'),
    version: version(),
    ...timestamps,
  },
  (t) => [
    index('event_horizons_site_idx').on(t.siteId),
    check('event_horizons_quality_range', sql`${t.quality} between 1 and 4`),
    check('event_horizons_distinct_units', sql`${t.unitBelowId} <> ${t.unitAboveId}`),
    check('event_horizons_subsidence_error_positive', sql`${t.subsidenceErrorM} is null or ${t.subsidenceErrorM} > 0`),
    check('event_horizons_displacement_error_positive', sql`${t.displacementErrorM} is null or ${t.displacementErrorM} > 0`),
  ],
);
