/**
 * Sample vocabularies and the depth rule as plain data and functions, shared by the sample form
 * (through CreateSampleInput and SamplesService) and the lab-sheet import, so both accept the same
 * values and word their refusals the same way.
 */

export const DATING_METHODS = ['RADIOCARBON', 'LUMINESCENCE', 'HISTORICAL', 'TEPHRA'] as const;
export const SAMPLE_MATERIALS = [
  'DETRITAL_CHARCOAL', 'IN_SITU_PLANT', 'PLANT_MACROFOSSIL', 'PLANKTIC_FORAMS', 'BENTHIC_FORAMS', 'SHELL', 'BULK_SEDIMENT', 'OTHER',
] as const;
export const AGE_RELATIONS = ['DATES_DEPOSIT', 'OLDER_THAN_DEPOSIT', 'YOUNGER_THAN_DEPOSIT'] as const;

export type SampleMaterial = (typeof SAMPLE_MATERIALS)[number];
export type AgeRelation = (typeof AGE_RELATIONS)[number];

/** Depths are measured by hand; a sample logged this close outside its unit's contact still belongs to it. */
export const DEPTH_TOLERANCE_M = 0.005;

/** The depth interval of a unit, as the depth rule needs it. */
export interface UnitExtent {
  readonly name: string;
  readonly topDepthM: number;
  readonly baseDepthM: number;
}

/** Why a sample's depth does not fit its unit, or null when it fits (or no depth is given). */
export function depthOutsideUnit(depthM: number | null, unit: UnitExtent): string | null {
  if (depthM === null) return null;
  if (depthM < unit.topDepthM - DEPTH_TOLERANCE_M || depthM > unit.baseDepthM + DEPTH_TOLERANCE_M) {
    return `depth ${depthM} m is outside unit "${unit.name}" (${unit.topDepthM}-${unit.baseDepthM} m)`;
  }
  return null;
}

/** The measured fields of a sample, as plain data from any source (a form, a sheet, the demo, a bundle). */
export interface SampleMeasurements<Method extends string = string, Material extends string = string, Relation extends string = string> {
  readonly labCode: string;
  readonly method: Method;
  readonly material: Material;
  readonly ageRelation: Relation;
  readonly depthM?: number | null;
  readonly c14Age?: number | null;
  readonly c14Error?: number | null;
  readonly delta13C?: number | null;
  readonly curve?: string | null;
  readonly deltaR?: number | null;
  readonly deltaRError?: number | null;
  readonly calendarAgeBp?: number | null;
  readonly calendarErrorYears?: number | null;
  readonly measurementYear?: number | null;
  readonly notes?: string | null;
}

/** The measured fields with absent ones as null: one mapping for every writer and exporter of samples. */
export function sampleMeasurements<M extends string, T extends string, R extends string>(sample: SampleMeasurements<M, T, R>) {
  return {
    labCode: sample.labCode,
    method: sample.method,
    material: sample.material,
    depthM: sample.depthM ?? null,
    ageRelation: sample.ageRelation,
    c14Age: sample.c14Age ?? null,
    c14Error: sample.c14Error ?? null,
    delta13C: sample.delta13C ?? null,
    curve: sample.curve ?? null,
    deltaR: sample.deltaR ?? null,
    deltaRError: sample.deltaRError ?? null,
    calendarAgeBp: sample.calendarAgeBp ?? null,
    calendarErrorYears: sample.calendarErrorYears ?? null,
    measurementYear: sample.measurementYear ?? null,
    notes: sample.notes ?? null,
  };
}
