/**
 * Rupture length of a regional event and the moment magnitude it implies by an empirical
 * rupture-scaling relation Mw = a + b log10(L), with the relation's standard deviation.
 *
 * The length is only the along-strike span of the sites that record the event, so it is a
 * minimum: the rupture may extend past the outermost sites, and the magnitude is a lower bound.
 *
 * The coefficients below are recalled values ([memory] in CHECKS.md, the reverse-fault row
 * [published, secondary]); confirm them against the papers' tables before relying on them:
 * - Strasser, Arango & Bommer 2010, Seismological Research Letters 81(6):941-950, subduction
 *   interface events, Mw from rupture length;
 * - Wells & Coppersmith 1994, Bulletin of the Seismological Society of America 84(4):974-1002,
 *   Mw from surface rupture length (SRL), all slip types and reverse faults.
 */

export type ScalingRelationCode =
  | 'STRASSER_2010_INTERFACE_LENGTH'
  | 'WELLS_COPPERSMITH_1994_ALL_SRL'
  | 'WELLS_COPPERSMITH_1994_REVERSE_SRL';

export type TectonicSetting = 'SUBDUCTION_INTERFACE' | 'CRUSTAL';

/** A relation Mw = intercept + slope log10(length km), with its sigma in magnitude units. */
export interface ScalingRelation {
  readonly code: ScalingRelationCode;
  /** Short label shown beside a magnitude. */
  readonly relation: string;
  readonly intercept: number;
  readonly slope: number;
  readonly sigma: number;
}

export const SCALING_RELATIONS: Readonly<Record<ScalingRelationCode, ScalingRelation>> = {
  STRASSER_2010_INTERFACE_LENGTH: {
    code: 'STRASSER_2010_INTERFACE_LENGTH',
    relation: 'Strasser et al. (2010) interface, Mw from the minimum rupture length (site span)',
    intercept: 4.868,
    slope: 1.392,
    sigma: 0.277,
  },
  WELLS_COPPERSMITH_1994_ALL_SRL: {
    code: 'WELLS_COPPERSMITH_1994_ALL_SRL',
    relation: 'Wells & Coppersmith (1994) all slip types, Mw from the minimum rupture length (site span)',
    intercept: 5.08,
    slope: 1.16,
    sigma: 0.28,
  },
  WELLS_COPPERSMITH_1994_REVERSE_SRL: {
    code: 'WELLS_COPPERSMITH_1994_REVERSE_SRL',
    relation: 'Wells & Coppersmith (1994) reverse, Mw from the minimum rupture length (site span)',
    intercept: 5.0,
    slope: 1.22,
    sigma: 0.28,
  },
};

/** The relation used for a tectonic setting unless the caller names another. */
export function defaultScalingRelation(setting: TectonicSetting): ScalingRelationCode {
  return setting === 'SUBDUCTION_INTERFACE' ? 'STRASSER_2010_INTERFACE_LENGTH' : 'WELLS_COPPERSMITH_1994_ALL_SRL';
}

export interface MagnitudeEstimate {
  readonly mw: number;
  readonly sigma: number;
  readonly relation: string;
  readonly code: ScalingRelationCode;
}

/** Mw = a + b log10(L) for a rupture length L > 0 km. Throws RangeError otherwise. */
export function magnitudeFromLength(lengthKm: number, code: ScalingRelationCode): MagnitudeEstimate {
  if (!(lengthKm > 0) || !Number.isFinite(lengthKm)) {
    throw new RangeError(`rupture length must be positive and finite, got ${lengthKm} km`);
  }
  const { intercept, slope, sigma, relation } = SCALING_RELATIONS[code];
  return { mw: intercept + slope * Math.log10(lengthKm), sigma, relation, code };
}

/** Along-strike span (km) of a set of site positions: max - min; 0 for one position. */
export function alongStrikeSpanKm(positionsKm: readonly number[]): number {
  if (positionsKm.length === 0) throw new RangeError('a span needs at least one site position');
  let min = Infinity;
  let max = -Infinity;
  for (const x of positionsKm) {
    min = Math.min(min, x);
    max = Math.max(max, x);
  }
  return max - min;
}

/**
 * Mw from rupture area A (km^2) for subduction interface events, Mw = 4.441 + 0.846 log10 A,
 * sigma 0.286 (Strasser, Arango & Bommer 2010, SRL 81(6):941-950). The coefficients are CHECKS.md's
 * secondary transcription [published, secondary]; the paper's table was not at hand to confirm
 * them. The area here is the member sites' span times the segment's down-dip width, so like the
 * length it is a minimum and the magnitude a lower bound.
 */
export const STRASSER_2010_INTERFACE_AREA = {
  relation: 'Strasser et al. (2010) interface, Mw from area (site span x down-dip width; secondary transcription)',
  intercept: 4.441,
  slope: 0.846,
  sigma: 0.286,
} as const;

/**
 * Mw from average displacement AD (m), all slip types: Mw = 6.93 + 0.82 log10 AD, sigma 0.39
 * (Wells & Coppersmith 1994, BSSA 84(4):974-1002, table 2B [memory: coefficients recalled, not
 * checked against the table]). A mean of point measurements at a few sites is not the rupture's
 * average displacement; it is shown as evidence beside the length and area figures.
 */
export const WELLS_COPPERSMITH_1994_ALL_AD = {
  relation: 'Wells & Coppersmith (1994) all slip types, Mw from average displacement [recalled coefficients]',
  intercept: 6.93,
  slope: 0.82,
  sigma: 0.39,
} as const;

/** A magnitude without a length-relation code (area and displacement relations). */
export interface SizeMagnitude {
  readonly mw: number;
  readonly sigma: number;
  readonly relation: string;
}

/** Mw from rupture area (km^2) = length (km) x down-dip width (km). Throws RangeError unless both are positive. */
export function magnitudeFromArea(lengthKm: number, widthKm: number): SizeMagnitude {
  if (!(lengthKm > 0) || !Number.isFinite(lengthKm)) throw new RangeError(`rupture length must be positive and finite, got ${lengthKm} km`);
  if (!(widthKm > 0) || !Number.isFinite(widthKm)) throw new RangeError(`down-dip width must be positive and finite, got ${widthKm} km`);
  const { intercept, slope, sigma, relation } = STRASSER_2010_INTERFACE_AREA;
  return { mw: intercept + slope * Math.log10(lengthKm * widthKm), sigma, relation };
}

/** Mw from an average displacement (m). Throws RangeError unless it is positive. */
export function magnitudeFromDisplacement(averageDisplacementM: number): SizeMagnitude {
  if (!(averageDisplacementM > 0) || !Number.isFinite(averageDisplacementM)) {
    throw new RangeError(`average displacement must be positive and finite, got ${averageDisplacementM} m`);
  }
  const { intercept, slope, sigma, relation } = WELLS_COPPERSMITH_1994_ALL_AD;
  return { mw: intercept + slope * Math.log10(averageDisplacementM), sigma, relation };
}
