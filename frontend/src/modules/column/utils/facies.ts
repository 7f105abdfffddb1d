import type { Facies } from '@/gql/graphql';
import { valuesOf } from '@/modules/api/utils/vocabulary';

/**
 * How each facies is drawn in a column: a ground tone from the sediment itself and a texture
 * mark, both Stratochron's own (no lithology standard is followed). `labelInk` is the text
 * colour that reads on the ground tone.
 */
export type FaciesStyle = {
  label: string;
  ground: string;
  ink: string;
  labelInk: string;
  /** Graded beds fade from coarse at the base to fine at the top. */
  gradedTo?: string;
};

export const FACIES_STYLES: Record<Facies, FaciesStyle> = {
  SOIL: { label: 'Soil', ground: '#8a6a48', ink: '#5c4329', labelInk: '#fbf6ee' },
  COLLUVIUM: { label: 'Colluvium', ground: '#c29a68', ink: '#7d5c38', labelInk: '#2b2118' },
  PEAT: { label: 'Peat', ground: '#5e4633', ink: '#3a2a1d', labelInk: '#f3eadc' },
  TIDAL_MUD: { label: 'Tidal mud', ground: '#a7a296', ink: '#7f796c', labelInk: '#25231f' },
  SAND_SHEET: { label: 'Sand sheet', ground: '#e0cc98', ink: '#a98e52', labelInk: '#2b2418' },
  TURBIDITE: { label: 'Turbidite', ground: '#cdb57c', ink: '#8d7746', labelInk: '#241f16', gradedTo: '#9aa2a3' },
  HEMIPELAGIC_MUD: { label: 'Hemipelagic mud', ground: '#93a1a6', ink: '#6b7a80', labelInk: '#1f2527' },
  TEPHRA: { label: 'Tephra', ground: '#e9e4d8', ink: '#958c7b', labelInk: '#2a2620' },
  OTHER: { label: 'Other', ground: '#c7c3bb', ink: '#9a958c', labelInk: '#26241f' },
};

/** Every facies, in the order the styles are written (the server's order). */
export const FACIES_ORDER = valuesOf(FACIES_STYLES);

export const FACIES_OPTIONS = FACIES_ORDER.map((facies) => ({ value: facies, label: FACIES_STYLES[facies].label }));

/** The id of a facies texture inside one chart (ids must be unique in the page). */
export function faciesPatternId(prefix: string, facies: Facies): string {
  return `${prefix}-facies-${facies.toLowerCase()}`;
}

/** The id of a facies ground fill (a gradient for graded beds) inside one chart. */
export function faciesGroundId(prefix: string, facies: Facies): string {
  return `${prefix}-ground-${facies.toLowerCase()}`;
}

/** The fill of a facies ground: its tone, or its gradient for graded beds. */
export function faciesGroundFill(idPrefix: string, facies: Facies): string {
  const style = FACIES_STYLES[facies];
  return style.gradedTo ? `url(#${faciesGroundId(idPrefix, facies)})` : style.ground;
}
