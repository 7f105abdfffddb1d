/**
 * The Stratochron project bundle, format `stratochron-bundle` version 2 (version 1 is still read:
 * it lacks the fields marked `since: 2`, which then take null): everything a person
 * entered in a project (segments, sites, units, event horizons, samples, correlation hypotheses
 * and their ties) as plain JSON. Records name each other by `ref`, the exporting database's id;
 * an import gives every record a new id and rewires the refs. Computed results (calibrations,
 * age-model runs, recurrence analyses), members, releases, attachments and the audit trail are
 * not part of version 1. README.md beside this file documents the format; bundle.schema.json is
 * its JSON Schema, generated from the field tables here (a spec checks they agree).
 */
import { MAX_AGE_ERROR_YEARS } from '../chronology/calibration/bounds';

export const BUNDLE_FORMAT = 'stratochron-bundle';
/** The version this server writes. */
export const BUNDLE_VERSION = 2;
/** The versions this server reads: version 1 is version 2 without the fields marked `since: 2`. */
export const READABLE_BUNDLE_VERSIONS = [1, 2] as const;
export type BundleVersion = (typeof READABLE_BUNDLE_VERSIONS)[number];

// The bundle's vocabularies are the database's (one definition in database/schema/enums.ts).
import { AGE_RELATIONS, DATING_METHODS, FACIES, SAMPLE_MATERIALS, SITE_KINDS, TECTONIC_SETTINGS } from '../database/schema/enums';

export { AGE_RELATIONS, DATING_METHODS, FACIES, SAMPLE_MATERIALS, SITE_KINDS, TECTONIC_SETTINGS };

export interface BundleProject {
  name: string;
  description: string | null;
  tectonicSetting: (typeof TECTONIC_SETTINGS)[number];
}

export interface BundleSegment {
  ref: string;
  name: string;
  startKm: number;
  endKm: number;
  notes: string | null;
}

export interface BundleSite {
  ref: string;
  segmentRef: string | null;
  name: string;
  kind: (typeof SITE_KINDS)[number];
  latitude: number;
  longitude: number;
  alongStrikeKm: number;
  elevationM: number | null;
  waterDepthM: number | null;
  notes: string | null;
}

export interface BundleUnit {
  ref: string;
  siteRef: string;
  position: number;
  name: string;
  topDepthM: number;
  baseDepthM: number;
  facies: (typeof FACIES)[number];
  /** Since version 2: thickness of mud (m) the unit's base eroded. */
  basalErosionM: number | null;
  notes: string | null;
}

export interface BundleEventHorizon {
  ref: string;
  siteRef: string;
  name: string;
  unitBelowRef: string;
  unitAboveRef: string;
  quality: number;
  evidence: string[];
  notes: string | null;
}

export interface BundleSample {
  ref: string;
  siteRef: string;
  unitRef: string;
  labCode: string;
  method: (typeof DATING_METHODS)[number];
  material: (typeof SAMPLE_MATERIALS)[number];
  depthM: number | null;
  ageRelation: (typeof AGE_RELATIONS)[number];
  c14Age: number | null;
  c14Error: number | null;
  delta13C: number | null;
  curve: string | null;
  deltaR: number | null;
  deltaRError: number | null;
  /** Since version 2: name of the regional Delta-R entry. */
  deltaRSource: string | null;
  /** Since version 2: the sample's own inheritance (intrusion) scale, years. */
  inheritanceScaleYears: number | null;
  calendarAgeBp: number | null;
  calendarErrorYears: number | null;
  measurementYear: number | null;
  excluded: boolean;
  exclusionReason: string | null;
  notes: string | null;
}

export interface BundleHypothesis {
  ref: string;
  name: string;
  description: string | null;
  preferred: boolean;
  copiedFromRef: string | null;
}

export interface BundleTie {
  ref: string;
  hypothesisRef: string;
  eventARef: string;
  eventBRef: string;
  confidence: number;
  evidence: string[];
  note: string | null;
}

export interface ProjectBundle {
  format: typeof BUNDLE_FORMAT;
  version: typeof BUNDLE_VERSION;
  exportedAt: string;
  project: BundleProject;
  segments: BundleSegment[];
  sites: BundleSite[];
  units: BundleUnit[];
  eventHorizons: BundleEventHorizon[];
  samples: BundleSample[];
  hypotheses: BundleHypothesis[];
  ties: BundleTie[];
}

/** The record tables of a bundle, in the order an import writes them. */
export const BUNDLE_TABLES = ['segments', 'sites', 'units', 'eventHorizons', 'samples', 'hypotheses', 'ties'] as const;
export type BundleTable = (typeof BUNDLE_TABLES)[number];

/**
 * Most records per table one bundle may hold: a bound on the work of one import (every sample is
 * calibrated). Samples match the lab sheet's row cap (MAX_LAB_SHEET_ROWS).
 */
export const BUNDLE_TABLE_MAX_ITEMS: Readonly<Record<BundleTable, number>> = {
  segments: 1_000,
  sites: 5_000,
  units: 50_000,
  eventHorizons: 20_000,
  samples: 50_000,
  hypotheses: 1_000,
  ties: 50_000,
};

/**
 * One field of a bundle record: its JSON type and the bounds the database enforces. `since` is the
 * first format version that has the field (absent: every version).
 */
export type FieldSpec = (
  | { type: 'string'; nullable?: boolean; minLength?: number; maxLength: number }
  | { type: 'number'; nullable?: boolean; minimum?: number; maximum?: number; exclusiveMinimum?: number }
  | { type: 'integer'; nullable?: boolean; minimum?: number; maximum?: number }
  | { type: 'boolean' }
  | { type: 'enum'; values: readonly string[]; nullable?: boolean }
  | { type: 'strings'; maxItems: number; maxLength: number }
  | { type: 'ref'; nullable?: boolean }
) & { since?: BundleVersion };

const text = (maxLength: number, nullable = false): FieldSpec => ({ type: 'string', minLength: nullable ? 0 : 1, maxLength, nullable });
const notes: FieldSpec = { type: 'string', maxLength: 5000, nullable: true };

export const PROJECT_FIELDS: Record<keyof BundleProject, FieldSpec> = {
  name: text(200),
  description: notes,
  tectonicSetting: { type: 'enum', values: TECTONIC_SETTINGS },
};

export const RECORD_FIELDS: { [T in BundleTable]: Record<string, FieldSpec> } = {
  segments: {
    ref: { type: 'ref' },
    name: text(200),
    startKm: { type: 'number', minimum: -20000, maximum: 20000 },
    endKm: { type: 'number', minimum: -20000, maximum: 20000 },
    notes,
  } satisfies Record<keyof BundleSegment, FieldSpec>,
  sites: {
    ref: { type: 'ref' },
    segmentRef: { type: 'ref', nullable: true },
    name: text(200),
    kind: { type: 'enum', values: SITE_KINDS },
    latitude: { type: 'number', minimum: -90, maximum: 90 },
    longitude: { type: 'number', minimum: -180, maximum: 180 },
    alongStrikeKm: { type: 'number', minimum: -20000, maximum: 20000 },
    elevationM: { type: 'number', nullable: true, minimum: -500, maximum: 9000 },
    waterDepthM: { type: 'number', nullable: true, minimum: 0, maximum: 11000 },
    notes,
  } satisfies Record<keyof BundleSite, FieldSpec>,
  units: {
    ref: { type: 'ref' },
    siteRef: { type: 'ref' },
    position: { type: 'integer', minimum: 1, maximum: 10000 },
    name: text(200),
    topDepthM: { type: 'number', minimum: 0, maximum: 100000 },
    baseDepthM: { type: 'number', minimum: 0, maximum: 100000 },
    facies: { type: 'enum', values: FACIES },
    basalErosionM: { type: 'number', nullable: true, minimum: 0, maximum: 100000, since: 2 },
    notes,
  } satisfies Record<keyof BundleUnit, FieldSpec>,
  eventHorizons: {
    ref: { type: 'ref' },
    siteRef: { type: 'ref' },
    name: text(200),
    unitBelowRef: { type: 'ref' },
    unitAboveRef: { type: 'ref' },
    quality: { type: 'integer', minimum: 1, maximum: 4 },
    evidence: { type: 'strings', maxItems: 50, maxLength: 200 },
    notes,
  } satisfies Record<keyof BundleEventHorizon, FieldSpec>,
  samples: {
    ref: { type: 'ref' },
    siteRef: { type: 'ref' },
    unitRef: { type: 'ref' },
    labCode: text(100),
    method: { type: 'enum', values: DATING_METHODS },
    material: { type: 'enum', values: SAMPLE_MATERIALS },
    depthM: { type: 'number', nullable: true, minimum: 0, maximum: 100000 },
    ageRelation: { type: 'enum', values: AGE_RELATIONS },
    c14Age: { type: 'number', nullable: true, minimum: 0, maximum: 100000 },
    c14Error: { type: 'number', nullable: true, exclusiveMinimum: 0, maximum: MAX_AGE_ERROR_YEARS },
    delta13C: { type: 'number', nullable: true, minimum: -100, maximum: 100 },
    curve: { type: 'string', nullable: true, minLength: 1, maxLength: 50 },
    deltaR: { type: 'number', nullable: true, minimum: -10000, maximum: 10000 },
    deltaRError: { type: 'number', nullable: true, minimum: 0, maximum: MAX_AGE_ERROR_YEARS },
    deltaRSource: { type: 'string', nullable: true, maxLength: 100, since: 2 },
    inheritanceScaleYears: { type: 'number', nullable: true, minimum: 1, maximum: 10000, since: 2 },
    calendarAgeBp: { type: 'number', nullable: true, minimum: -100, maximum: 1000000 },
    calendarErrorYears: { type: 'number', nullable: true, exclusiveMinimum: 0, maximum: MAX_AGE_ERROR_YEARS },
    measurementYear: { type: 'integer', nullable: true, minimum: 1900, maximum: 2200 },
    excluded: { type: 'boolean' },
    exclusionReason: { type: 'string', nullable: true, maxLength: 2000 },
    notes,
  } satisfies Record<keyof BundleSample, FieldSpec>,
  hypotheses: {
    ref: { type: 'ref' },
    name: text(200),
    description: notes,
    preferred: { type: 'boolean' },
    copiedFromRef: { type: 'ref', nullable: true },
  } satisfies Record<keyof BundleHypothesis, FieldSpec>,
  ties: {
    ref: { type: 'ref' },
    hypothesisRef: { type: 'ref' },
    eventARef: { type: 'ref' },
    eventBRef: { type: 'ref' },
    confidence: { type: 'integer', minimum: 1, maximum: 4 },
    evidence: { type: 'strings', maxItems: 50, maxLength: 200 },
    note: notes,
  } satisfies Record<keyof BundleTie, FieldSpec>,
};

/** Refs are opaque strings chosen by the exporter (Stratochron writes its ids). */
export const REF_PATTERN = '^[A-Za-z0-9._:-]{1,100}$';
