import { describe, expect, it } from 'vitest';
import { areaMagnitude, bedThicknessM, displacementMagnitude } from './size-evidence';

describe('size evidence', () => {
  it('takes a core bed thickness from the unit above, and none elsewhere [analytic]', () => {
    expect(bedThicknessM('CORE', { topDepthM: 2.1, baseDepthM: 2.45 })).toBeCloseTo(0.35, 12);
    expect(bedThicknessM('MARSH', { topDepthM: 2.1, baseDepthM: 2.45 })).toBeNull();
    expect(bedThicknessM('CORE', { topDepthM: null, baseDepthM: 2.45 })).toBeNull();
  });

  it('uses the narrowest width for the area, and gives none without a width or length [published, secondary: CHECKS.md]', () => {
    expect(areaMagnitude(100, [80, null, 50])?.mw).toBeCloseTo(4.441 + 0.846 * Math.log10(100 * 50), 12);
    expect(areaMagnitude(100, [null])).toBeNull();
    expect(areaMagnitude(null, [50])).toBeNull();
  });

  it('averages the measured displacements above 0 [memory: Wells & Coppersmith 1994 coefficients]', () => {
    expect(displacementMagnitude([{ displacementM: 2 }, { displacementM: null }, { displacementM: 4 }])?.mw).toBeCloseTo(6.93 + 0.82 * Math.log10(3), 12);
    expect(displacementMagnitude([{ displacementM: null }])).toBeNull();
  });
});
