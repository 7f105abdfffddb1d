import type { AgeRelation, CurveCode, DatingMethod, SampleMaterial } from '@/gql/graphql';

export const DATING_METHODS: readonly DatingMethod[] = ['RADIOCARBON', 'LUMINESCENCE', 'HISTORICAL', 'TEPHRA'];

export const DATING_METHOD_LABELS: Record<DatingMethod, string> = {
  RADIOCARBON: 'Radiocarbon',
  LUMINESCENCE: 'Luminescence',
  HISTORICAL: 'Historical',
  TEPHRA: 'Tephra',
};

export const SAMPLE_MATERIALS: readonly SampleMaterial[] = [
  'DETRITAL_CHARCOAL',
  'IN_SITU_PLANT',
  'PLANT_MACROFOSSIL',
  'PLANKTIC_FORAMS',
  'BENTHIC_FORAMS',
  'SHELL',
  'BULK_SEDIMENT',
  'OTHER',
];

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

export const AGE_RELATIONS: readonly AgeRelation[] = ['DATES_DEPOSIT', 'OLDER_THAN_DEPOSIT', 'YOUNGER_THAN_DEPOSIT'];

export const AGE_RELATION_LABELS: Record<AgeRelation, string> = {
  DATES_DEPOSIT: 'Dates the deposit',
  OLDER_THAN_DEPOSIT: 'Older than the deposit (detrital, inherited)',
  YOUNGER_THAN_DEPOSIT: 'Younger than the deposit (roots, burrows)',
};

export const CURVE_CODES: readonly CurveCode[] = ['INTCAL20', 'MARINE20', 'SHCAL20'];

export const CURVE_LABELS: Record<CurveCode, string> = {
  INTCAL20: 'IntCal20',
  MARINE20: 'Marine20',
  SHCAL20: 'SHCal20',
};

/** Curves for marine carbon, which take a local reservoir offset Delta-R. */
export function isMarineCurve(curve: CurveCode | null | undefined): boolean {
  return curve === 'MARINE20';
}

/** Materials whose carbon came from the sea, so they are calibrated on a marine curve. */
export function isMarineMaterial(material: SampleMaterial): boolean {
  return material === 'PLANKTIC_FORAMS' || material === 'BENTHIC_FORAMS' || material === 'SHELL';
}
