import { describe, expect, it } from 'vitest';
import {
  alongStrikeSpanKm,
  defaultScalingRelation,
  magnitudeFromArea,
  magnitudeFromDisplacement,
  magnitudeFromLength,
  SCALING_RELATIONS,
} from './rupture-scaling';

describe(magnitudeFromLength.name, () => {
  it('uses the Strasser, Arango & Bommer (2010) interface length relation', () => {
    // Mw = 4.868 + 1.392 log10 L, sigma 0.277: SRL 81(6):941-950 [memory]; at L = 100 km,
    // Mw = 4.868 + 2.784 = 7.652 [analytic].
    expect(SCALING_RELATIONS.STRASSER_2010_INTERFACE_LENGTH).toMatchObject({ intercept: 4.868, slope: 1.392, sigma: 0.277 });
    const estimate = magnitudeFromLength(100, 'STRASSER_2010_INTERFACE_LENGTH');
    expect(estimate.mw).toBeCloseTo(7.652, 10);
    expect(estimate.sigma).toBe(0.277);
    expect(estimate.relation).toBe('Strasser et al. (2010) interface, Mw from the minimum rupture length (site span)');
  });

  it('gives Mw above 9 for a 1000 km interface rupture [common practice]', () => {
    const { mw } = magnitudeFromLength(1000, 'STRASSER_2010_INTERFACE_LENGTH');
    expect(mw).toBeGreaterThan(9);
    expect(mw).toBeCloseTo(4.868 + 3 * 1.392, 10);
  });

  it('uses the Wells & Coppersmith (1994) surface rupture length relations', () => {
    // All slip types: Mw = 5.08 + 1.16 log10 SRL, sigma 0.28, BSSA 84(4):974-1002 [memory];
    // reverse: Mw = 5.00 + 1.22 log10 SRL, sigma 0.28 [published, secondary].
    expect(magnitudeFromLength(100, 'WELLS_COPPERSMITH_1994_ALL_SRL')).toMatchObject({ mw: 5.08 + 2 * 1.16, sigma: 0.28 });
    expect(magnitudeFromLength(10, 'WELLS_COPPERSMITH_1994_REVERSE_SRL').mw).toBeCloseTo(6.22, 10);
    expect(magnitudeFromLength(1, 'WELLS_COPPERSMITH_1994_ALL_SRL').mw).toBeCloseTo(5.08, 10);
  });

  it('refuses a length that is not positive', () => {
    expect(() => magnitudeFromLength(0, 'WELLS_COPPERSMITH_1994_ALL_SRL')).toThrow(RangeError);
    expect(() => magnitudeFromLength(Number.NaN, 'WELLS_COPPERSMITH_1994_ALL_SRL')).toThrow(RangeError);
  });
});

describe(defaultScalingRelation.name, () => {
  it('picks the interface relation on a subduction margin and Wells & Coppersmith otherwise', () => {
    expect(defaultScalingRelation('SUBDUCTION_INTERFACE')).toBe('STRASSER_2010_INTERFACE_LENGTH');
    expect(defaultScalingRelation('CRUSTAL')).toBe('WELLS_COPPERSMITH_1994_ALL_SRL');
  });
});

describe(alongStrikeSpanKm.name, () => {
  it('is the distance between the outermost sites', () => {
    expect(alongStrikeSpanKm([120, -30, 45])).toBe(150);
    expect(alongStrikeSpanKm([60])).toBe(0);
  });
});

describe('magnitude from area and from displacement', () => {
  it('gives Mw = 4.441 + 0.846 log10(A) for a 100 km span x 50 km width [published, secondary: CHECKS.md]', () => {
    const estimate = magnitudeFromArea(100, 50);
    expect(estimate.mw).toBeCloseTo(4.441 + 0.846 * Math.log10(5000), 12);
    // 4.441 + 0.846 x 3.69897 = 7.57033 [hand arithmetic].
    expect(estimate.mw).toBeCloseTo(7.5703, 4);
    expect(estimate.sigma).toBe(0.286);
    expect(estimate.relation).toMatch(/secondary transcription/);
    expect(() => magnitudeFromArea(100, 0)).toThrow(RangeError);
  });

  it('gives Mw = 6.93 + 0.82 log10(AD) from average displacement, marked as recalled [memory]', () => {
    // AD = 1 m gives the intercept; 10 m adds the slope.
    expect(magnitudeFromDisplacement(1).mw).toBeCloseTo(6.93, 12);
    expect(magnitudeFromDisplacement(10).mw).toBeCloseTo(7.75, 12);
    expect(magnitudeFromDisplacement(2).relation).toMatch(/recalled/);
    expect(() => magnitudeFromDisplacement(0)).toThrow(RangeError);
  });
});
