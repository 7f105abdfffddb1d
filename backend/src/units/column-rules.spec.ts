import { describe, expect, it } from 'vitest';
import { checkUnitPlacement, UnitPlacement } from './column-rules';

// Law of superposition [common practice]: in an undisturbed column, deeper units are older.
const column: UnitPlacement[] = [
  { id: 'a', name: 'peat', position: 1, topDepthM: 2, baseDepthM: 3 },
  { id: 'b', name: 'tidal mud', position: 2, topDepthM: 1, baseDepthM: 2 },
];

describe(checkUnitPlacement.name, () => {
  it('accepts a unit stacked on top with the next position', () => {
    expect(checkUnitPlacement(column, { name: 'soil', position: 3, topDepthM: 0, baseDepthM: 1 })).toBeNull();
  });

  it('refuses a base shallower than the top', () => {
    expect(checkUnitPlacement(column, { name: 'x', position: 3, topDepthM: 1, baseDepthM: 0.5 })?.field).toBe('baseDepthM');
  });

  it('refuses a taken position', () => {
    expect(checkUnitPlacement(column, { name: 'x', position: 2, topDepthM: 0, baseDepthM: 1 })?.message).toContain('tidal mud');
  });

  it('refuses overlapping depths', () => {
    expect(checkUnitPlacement(column, { name: 'x', position: 3, topDepthM: 0.5, baseDepthM: 1.5 })?.field).toBe('topDepthM');
  });

  it('refuses a position order that contradicts depth order', () => {
    const result = checkUnitPlacement(column, { name: 'x', position: 3, topDepthM: 3, baseDepthM: 4 });
    expect(result?.field).toBe('position');
  });

  it('ignores the unit itself when editing', () => {
    expect(checkUnitPlacement(column, { id: 'b', name: 'tidal mud', position: 2, topDepthM: 1, baseDepthM: 1.9 })).toBeNull();
  });
});
