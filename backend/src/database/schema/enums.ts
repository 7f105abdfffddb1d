import { pgEnum } from 'drizzle-orm/pg-core';

export const roleEnum = pgEnum('role', ['ADMIN', 'RESEARCHER', 'CORRELATOR', 'ANALYST', 'VIEWER']);
export const siteKindEnum = pgEnum('site_kind', ['TRENCH', 'CORE', 'OUTCROP', 'MARSH', 'LAKE']);
export const faciesEnum = pgEnum('facies', [
  'SOIL', 'COLLUVIUM', 'PEAT', 'TIDAL_MUD', 'SAND_SHEET', 'TURBIDITE', 'HEMIPELAGIC_MUD', 'TEPHRA', 'OTHER',
]);
export const datingMethodEnum = pgEnum('dating_method', ['RADIOCARBON', 'LUMINESCENCE', 'HISTORICAL', 'TEPHRA']);
export const sampleMaterialEnum = pgEnum('sample_material', [
  'DETRITAL_CHARCOAL', 'IN_SITU_PLANT', 'PLANT_MACROFOSSIL', 'PLANKTIC_FORAMS', 'BENTHIC_FORAMS', 'SHELL',
  'BULK_SEDIMENT', 'OTHER',
]);
export const ageRelationEnum = pgEnum('age_relation', ['DATES_DEPOSIT', 'OLDER_THAN_DEPOSIT', 'YOUNGER_THAN_DEPOSIT']);
export const tectonicSettingEnum = pgEnum('tectonic_setting', ['SUBDUCTION_INTERFACE', 'CRUSTAL']);
export const jobStatusEnum = pgEnum('job_status', ['QUEUED', 'RUNNING', 'SUCCEEDED', 'FAILED', 'CANCELLED']);
