/**
 * Event size evidence as the API shows it: a core event's bed thickness from its unit, each
 * member's measured size along strike, and the magnitudes from area and from displacement beside
 * the length-based one. Pure functions of rows; the resolver loads them.
 */
import { magnitudeFromArea, magnitudeFromDisplacement, type SizeMagnitude } from '../chronology/correlation';

export interface SizeMember {
  readonly displacementM: number | null;
}

/**
 * Thickness of a core event's bed: the unit above the horizon, base depth minus top depth (m).
 * Null away from cores or without both depths.
 */
export function bedThicknessM(siteKind: string, unitAbove: { topDepthM: number | null; baseDepthM: number | null } | undefined): number | null {
  if (siteKind !== 'CORE' || !unitAbove || unitAbove.topDepthM === null || unitAbove.baseDepthM === null) return null;
  const thickness = unitAbove.baseDepthM - unitAbove.topDepthM;
  return thickness > 0 ? thickness : null;
}

/**
 * Mw from area with the narrowest down-dip width among the member sites' segments (the smallest
 * area, as the length is already a minimum); null without a length or any width.
 */
export function areaMagnitude(ruptureLengthKm: number | null, widthsKm: readonly (number | null)[]): SizeMagnitude | null {
  const widths = widthsKm.filter((w): w is number => w !== null && w > 0);
  if (ruptureLengthKm === null || !(ruptureLengthKm > 0) || widths.length === 0) return null;
  return magnitudeFromArea(ruptureLengthKm, Math.min(...widths));
}

/** Mw from the mean of the members' measured displacements; null when none has one above 0. */
export function displacementMagnitude(members: readonly SizeMember[]): SizeMagnitude | null {
  const values = members.map((m) => m.displacementM).filter((d): d is number => d !== null && d > 0);
  if (values.length === 0) return null;
  return magnitudeFromDisplacement(values.reduce((sum, d) => sum + d, 0) / values.length);
}
