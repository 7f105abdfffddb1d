import { sql } from 'drizzle-orm';
import { boolean, check, doublePrecision, index, integer, jsonb, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { id, timestamps, version } from './columns';
import { ageRelationEnum, datingMethodEnum, sampleMaterialEnum } from './enums';
import { projects } from './projects';
import { sites } from './sites';
import { units } from './units';

/**
 * Stored calibration summaries, computed on write (so a value that cannot be calibrated is
 * refused then) and read by tables and exports. The density itself is not stored: it is
 * recomputed when needed (about 0.1 ms a sample), which keeps each row a few hundred bytes.
 */
export interface StoredCalibration {
  curve: string | null;
  medianCalBp: number;
  meanCalBp: number;
  sdYears: number;
  hpd68: { olderCalBp: number; youngerCalBp: number; probability: number }[];
  hpd95: { olderCalBp: number; youngerCalBp: number; probability: number }[];
  warnings: string[];
}

export const samples = pgTable(
  'samples',
  {
    id: id(),
    // Denormalised project id so "one lab code once per project" is a plain unique index.
    projectId: uuid('project_id').notNull().references(() => projects.id, { onDelete: 'cascade' }),
    siteId: uuid('site_id').notNull().references(() => sites.id, { onDelete: 'cascade' }),
    // A unit with samples in it cannot be deleted: move or delete the samples first.
    unitId: uuid('unit_id').notNull().references(() => units.id, { onDelete: 'restrict' }),
    labCode: text('lab_code').notNull(),
    method: datingMethodEnum('method').notNull(),
    material: sampleMaterialEnum('material').notNull(),
    depthM: doublePrecision('depth_m'),
    ageRelation: ageRelationEnum('age_relation').notNull(),
    c14Age: doublePrecision('c14_age'),
    c14Error: doublePrecision('c14_error'),
    delta13C: doublePrecision('delta13c'),
    curve: text('curve'),
    deltaR: doublePrecision('delta_r'),
    deltaRError: doublePrecision('delta_r_error'),
    // Name of the regional Delta-R entry the sample's Delta-R comes from; samples of a site with one
    // source share one reservoir offset in the age model.
    deltaRSource: text('delta_r_source'),
    // Scale (years) of the exponential prior on an inherited or intruded sample's age offset; null
    // takes the default for its material.
    inheritanceScaleYears: doublePrecision('inheritance_scale_years'),
    calendarAgeBp: doublePrecision('calendar_age_bp'),
    calendarErrorYears: doublePrecision('calendar_error_years'),
    measurementYear: integer('measurement_year'),
    excluded: boolean('excluded').notNull().default(false),
    exclusionReason: text('exclusion_reason'),
    notes: text('notes'),
    calibration: jsonb('calibration').$type<StoredCalibration>(),
    calibrationError: text('calibration_error'),
    version: version(),
    ...timestamps,
  },
  (t) => [
    uniqueIndex('samples_project_lab_code_unique').on(t.projectId, t.labCode),
    index('samples_site_idx').on(t.siteId),
    index('samples_unit_idx').on(t.unitId),
    check('samples_c14_error_positive', sql`${t.c14Error} is null or ${t.c14Error} > 0`),
    check('samples_c14_age_not_negative', sql`${t.c14Age} is null or ${t.c14Age} >= 0`),
    check('samples_delta_r_error_not_negative', sql`${t.deltaRError} is null or ${t.deltaRError} >= 0`),
    check(
      'samples_inheritance_scale_range',
      sql`${t.inheritanceScaleYears} is null or (${t.inheritanceScaleYears} >= 1 and ${t.inheritanceScaleYears} <= 10000)`,
    ),
    check('samples_calendar_error_positive', sql`${t.calendarErrorYears} is null or ${t.calendarErrorYears} > 0`),
    check('samples_depth_not_negative', sql`${t.depthM} is null or ${t.depthM} >= 0`),
    check(
      'samples_radiocarbon_fields',
      sql`${t.method} <> 'RADIOCARBON' or (${t.c14Age} is not null and ${t.c14Error} is not null and ${t.curve} is not null)`,
    ),
    check(
      'samples_calendar_fields',
      sql`${t.method} = 'RADIOCARBON' or (${t.calendarAgeBp} is not null and ${t.calendarErrorYears} is not null)`,
    ),
    check('samples_luminescence_year', sql`${t.method} <> 'LUMINESCENCE' or ${t.measurementYear} is not null`),
  ],
);
