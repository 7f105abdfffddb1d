/**
 * Sample vocabularies and the depth rule as plain data and functions, shared by the sample form
 * (through CreateSampleInput and SamplesService) and the lab-sheet import, so both accept the same
 * values and word their refusals the same way.
 */

import { AGE_RELATIONS, DATING_METHODS, SAMPLE_MATERIALS, type AgeRelation, type SampleMaterial } from '../database/schema/enums';

export { AGE_RELATIONS, DATING_METHODS, SAMPLE_MATERIALS, type AgeRelation, type SampleMaterial };

/**
 * Bounds of a sample's own inheritance (or intrusion) scale, years: below a year the offset is no
 * offset; beyond 10,000 years the prior says nothing.
 */
export const INHERITANCE_SCALE_LIMITS = { min: 1, max: 10_000 } as const;

/**
 * The scale (mean, years) of the exponential prior on an OLDER_THAN_DEPOSIT sample's inheritance,
 * or a YOUNGER_THAN_DEPOSIT sample's intrusion, when the sample gives none: by material, our own
 * round figures for what the trade reports.
 * - DETRITAL_CHARCOAL 200: charcoal carries the inbuilt age of the wood (heartwood of long-lived
 *   trees) plus its storage in soils before burial, the "old wood" problem (Schiffer 1986,
 *   J. Archaeol. Sci. 13:13-30 [memory]); inbuilt ages of decades to several centuries are
 *   reported for detrital charcoal in fault-zone colluvium [memory, common practice].
 * - IN_SITU_PLANT 10, PLANT_MACROFOSSIL 25: short-lived plant remains (seeds, leaves, twigs,
 *   rooted stems) are preferred because they live only years to a few decades before burial, and a
 *   macrofossil may be stored and reworked briefly [common practice].
 * - PLANKTIC_FORAMS, BENTHIC_FORAMS 100: reworking and bioturbation mix tests across a few
 *   centimetres, a century or so at hemipelagic rates [common practice].
 * - SHELL 100: shells are reworked from older beds or live for decades [common practice].
 * - BULK_SEDIMENT 300: bulk organic carbon mixes older soil carbon and dates centuries too old
 *   [common practice].
 * - OTHER 100: the model's former single default.
 */
export const DEFAULT_INHERITANCE_SCALE_YEARS: Readonly<Record<SampleMaterial, number>> = {
  DETRITAL_CHARCOAL: 200,
  IN_SITU_PLANT: 10,
  PLANT_MACROFOSSIL: 25,
  PLANKTIC_FORAMS: 100,
  BENTHIC_FORAMS: 100,
  SHELL: 100,
  BULK_SEDIMENT: 300,
  OTHER: 100,
};

/** Why a sample's own inheritance scale cannot be used, or null when it is fine (or absent). */
export function inheritanceScaleProblem(value: number | null | undefined): string | null {
  if (value === null || value === undefined) return null;
  if (!Number.isFinite(value) || value < INHERITANCE_SCALE_LIMITS.min || value > INHERITANCE_SCALE_LIMITS.max) {
    return `inheritanceScaleYears must be from ${INHERITANCE_SCALE_LIMITS.min} to ${INHERITANCE_SCALE_LIMITS.max.toLocaleString('en-GB')} years; got ${String(value)}`;
  }
  return null;
}

/** A Delta-R source name: trimmed, at most 100 characters; empty means none. */
export function normaliseDeltaRSource(value: string | null | undefined): string | null {
  if (value === null || value === undefined) return null;
  const trimmed = value.trim();
  return trimmed === '' ? null : trimmed;
}

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
  readonly deltaRSource?: string | null;
  readonly inheritanceScaleYears?: number | null;
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
    deltaRSource: sample.deltaRSource ?? null,
    inheritanceScaleYears: sample.inheritanceScaleYears ?? null,
    calendarAgeBp: sample.calendarAgeBp ?? null,
    calendarErrorYears: sample.calendarErrorYears ?? null,
    measurementYear: sample.measurementYear ?? null,
    notes: sample.notes ?? null,
  };
}
