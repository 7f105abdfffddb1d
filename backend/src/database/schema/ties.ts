import { sql } from 'drizzle-orm';
import { check, index, integer, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { id, timestamps } from './columns';
import { eventHorizons } from './event-horizons';
import { hypotheses } from './hypotheses';

/** A link between two site events in one hypothesis. */
export const ties = pgTable(
  'ties',
  {
    id: id(),
    hypothesisId: uuid('hypothesis_id').notNull().references(() => hypotheses.id, { onDelete: 'cascade' }),
    // Deleting an event horizon removes the ties that name it.
    eventAId: uuid('event_a_id').notNull().references(() => eventHorizons.id, { onDelete: 'cascade' }),
    eventBId: uuid('event_b_id').notNull().references(() => eventHorizons.id, { onDelete: 'cascade' }),
    confidence: integer('confidence').notNull(),
    evidence: text('evidence').array().notNull().default(sql`'{}'::text[]`),
    note: text('note'),
    ...timestamps,
  },
  (t) => [
    index('ties_hypothesis_idx').on(t.hypothesisId),
    uniqueIndex('ties_pair_unique').on(t.hypothesisId, t.eventAId, t.eventBId),
    check('ties_confidence_range', sql`${t.confidence} between 1 and 4`),
    check('ties_distinct_events', sql`${t.eventAId} <> ${t.eventBId}`),
  ],
);
