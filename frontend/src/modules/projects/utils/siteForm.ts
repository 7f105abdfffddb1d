import type { CreateSiteInput, SiteKind } from '@/gql/graphql';
import { valuesOf } from '@/modules/api/utils/vocabulary';
import { FieldReader, numberText, optionalText, type FormResult } from '@/modules/ui/utils/formFields';

export type SiteFormValues = {
  name: string;
  kind: SiteKind;
  segmentId: string;
  latitude: string;
  longitude: string;
  alongStrikeKm: string;
  elevationM: string;
  waterDepthM: string;
  notes: string;
};

export type SiteFormField = keyof SiteFormValues;

export const SITE_FORM_FIELDS: readonly SiteFormField[] = [
  'name',
  'kind',
  'segmentId',
  'latitude',
  'longitude',
  'alongStrikeKm',
  'elevationM',
  'waterDepthM',
  'notes',
];

export const SITE_KIND_LABELS: Record<SiteKind, string> = {
  TRENCH: 'Trench',
  CORE: 'Core',
  OUTCROP: 'Outcrop',
  MARSH: 'Marsh',
  LAKE: 'Lake',
};

export const SITE_KINDS = valuesOf(SITE_KIND_LABELS);

export const EMPTY_SITE_FORM: SiteFormValues = {
  name: '',
  kind: 'MARSH',
  segmentId: '',
  latitude: '',
  longitude: '',
  alongStrikeKm: '',
  elevationM: '',
  waterDepthM: '',
  notes: '',
};

type StoredSite = {
  name: string;
  kind: SiteKind;
  segment?: { id: string } | null;
  latitude: number;
  longitude: number;
  alongStrikeKm: number;
  elevationM?: number | null;
  waterDepthM?: number | null;
  notes?: string | null;
};

export function siteFormFrom(site: StoredSite): SiteFormValues {
  return {
    name: site.name,
    kind: site.kind,
    segmentId: site.segment?.id ?? '',
    latitude: numberText(site.latitude),
    longitude: numberText(site.longitude),
    alongStrikeKm: numberText(site.alongStrikeKm),
    elevationM: numberText(site.elevationM),
    waterDepthM: numberText(site.waterDepthM),
    notes: site.notes ?? '',
  };
}

/** Check a site form: WGS84 coordinates in range, an along-strike position, a non-negative water depth. */
export function readSiteForm(values: SiteFormValues): FormResult<Omit<CreateSiteInput, 'projectId'>, SiteFormField> {
  const reader = new FieldReader<SiteFormField>();
  const name = reader.text('name', values.name, { required: true });
  const latitude = reader.number('latitude', values.latitude, { required: true, min: -90, max: 90 });
  const longitude = reader.number('longitude', values.longitude, { required: true, min: -180, max: 180 });
  const alongStrikeKm = reader.number('alongStrikeKm', values.alongStrikeKm, { required: true });
  const elevationM = reader.number('elevationM', values.elevationM);
  const waterDepthM = reader.number('waterDepthM', values.waterDepthM, { min: 0 });
  return reader.result({
    name,
    kind: values.kind,
    segmentId: values.segmentId === '' ? null : values.segmentId,
    latitude: latitude ?? 0,
    longitude: longitude ?? 0,
    alongStrikeKm: alongStrikeKm ?? 0,
    elevationM,
    waterDepthM,
    notes: optionalText(values.notes),
  });
}
