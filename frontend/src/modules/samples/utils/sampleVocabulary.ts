import type { AgeRelation, CurveCode, DatingMethod, SampleMaterial } from '@/gql/graphql';
import { valuesOf } from '@/modules/api/utils/vocabulary';

export const DATING_METHOD_LABELS: Record<DatingMethod, string> = {
  RADIOCARBON: 'Radiocarbon',
  LUMINESCENCE: 'Luminescence',
  HISTORICAL: 'Historical',
  TEPHRA: 'Tephra',
};

export const DATING_METHODS = valuesOf(DATING_METHOD_LABELS);

export const SAMPLE_MATERIAL_LABELS: Record<SampleMaterial, string> = {
  DETRITAL_CHARCOAL: 'Detrital charcoal',
  IN_SITU_PLANT: 'In-situ plant',
  PLANT_MACROFOSSIL: 'Plant macrofossil',
  PLANKTIC_FORAMS: 'Planktic forams',
  BENTHIC_FORAMS: 'Benthic forams',
  SHELL: 'Shell',
  BULK_SEDIMENT: 'Bulk sediment',
  OTHER: 'Other',
};

export const SAMPLE_MATERIALS = valuesOf(SAMPLE_MATERIAL_LABELS);

export const AGE_RELATION_LABELS: Record<AgeRelation, string> = {
  DATES_DEPOSIT: 'Dates the deposit',
  OLDER_THAN_DEPOSIT: 'Older than the deposit (detrital, inherited)',
  YOUNGER_THAN_DEPOSIT: 'Younger than the deposit (roots, burrows)',
};

export const AGE_RELATIONS = valuesOf(AGE_RELATION_LABELS);

export const CURVE_LABELS: Record<CurveCode, string> = {
  INTCAL20: 'IntCal20',
  MARINE20: 'Marine20',
  SHCAL20: 'SHCal20',
};

export const CURVE_CODES = valuesOf(CURVE_LABELS);

/** Curves for marine carbon, which take a local reservoir offset Delta-R. */
export function isMarineCurve(curve: CurveCode | null | undefined): boolean {
  return curve === 'MARINE20';
}

/** Materials whose carbon came from the sea, so they are calibrated on a marine curve. */
export function isMarineMaterial(material: SampleMaterial): boolean {
  return material === 'PLANKTIC_FORAMS' || material === 'BENTHIC_FORAMS' || material === 'SHELL';
}

/** Bounds of a sample's own inheritance (intrusion) scale, years, as the server checks them. */
export const INHERITANCE_SCALE_LIMITS = { min: 1, max: 10_000 } as const;

/**
 * The inheritance (intrusion) scale the age model takes for a sample that gives none, by material;
 * the server's table (backend samples/sample-rules.ts, DEFAULT_INHERITANCE_SCALE_YEARS, where each
 * is justified). A stored sample reports its own as `inheritanceScaleDefaultYears`.
 */
export const DEFAULT_INHERITANCE_SCALE_YEARS: Record<SampleMaterial, number> = {
  DETRITAL_CHARCOAL: 200,
  IN_SITU_PLANT: 10,
  PLANT_MACROFOSSIL: 25,
  PLANKTIC_FORAMS: 100,
  BENTHIC_FORAMS: 100,
  SHELL: 100,
  BULK_SEDIMENT: 300,
  OTHER: 100,
};
