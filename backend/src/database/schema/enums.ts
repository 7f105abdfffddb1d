import { pgEnum } from 'drizzle-orm/pg-core';

/**
 * The product's vocabularies, defined once. Every other list of these values (DTO validation,
 * sample rules, the bundle format, the demo) imports them from here; `schema.graphql` repeats them
 * as GraphQL enums (`vocabulary.spec.ts` fails when one differs) and the frontend gets them through
 * the generated types. Order is the order forms offer them in.
 */
export const ROLES = ['ADMIN', 'RESEARCHER', 'CORRELATOR', 'ANALYST', 'VIEWER'] as const;
export const SITE_KINDS = ['TRENCH', 'CORE', 'OUTCROP', 'MARSH', 'LAKE'] as const;
export const FACIES = ['SOIL', 'COLLUVIUM', 'PEAT', 'TIDAL_MUD', 'SAND_SHEET', 'TURBIDITE', 'HEMIPELAGIC_MUD', 'TEPHRA', 'OTHER'] as const;
export const DATING_METHODS = ['RADIOCARBON', 'LUMINESCENCE', 'HISTORICAL', 'TEPHRA'] as const;
export const SAMPLE_MATERIALS = [
  'DETRITAL_CHARCOAL', 'IN_SITU_PLANT', 'PLANT_MACROFOSSIL', 'PLANKTIC_FORAMS', 'BENTHIC_FORAMS', 'SHELL', 'BULK_SEDIMENT', 'OTHER',
] as const;
export const AGE_RELATIONS = ['DATES_DEPOSIT', 'OLDER_THAN_DEPOSIT', 'YOUNGER_THAN_DEPOSIT'] as const;
export const TECTONIC_SETTINGS = ['SUBDUCTION_INTERFACE', 'CRUSTAL'] as const;
export const JOB_STATUSES = ['QUEUED', 'RUNNING', 'SUCCEEDED', 'FAILED', 'CANCELLED'] as const;

export type Role = (typeof ROLES)[number];
export type SiteKind = (typeof SITE_KINDS)[number];
export type Facies = (typeof FACIES)[number];
export type DatingMethod = (typeof DATING_METHODS)[number];
export type SampleMaterial = (typeof SAMPLE_MATERIALS)[number];
export type AgeRelation = (typeof AGE_RELATIONS)[number];
export type TectonicSetting = (typeof TECTONIC_SETTINGS)[number];
export type JobStatus = (typeof JOB_STATUSES)[number];

export const roleEnum = pgEnum('role', ROLES);
export const siteKindEnum = pgEnum('site_kind', SITE_KINDS);
export const faciesEnum = pgEnum('facies', FACIES);
export const datingMethodEnum = pgEnum('dating_method', DATING_METHODS);
export const sampleMaterialEnum = pgEnum('sample_material', SAMPLE_MATERIALS);
export const ageRelationEnum = pgEnum('age_relation', AGE_RELATIONS);
export const tectonicSettingEnum = pgEnum('tectonic_setting', TECTONIC_SETTINGS);
export const jobStatusEnum = pgEnum('job_status', JOB_STATUSES);
