import { describe, expect, it } from 'vitest';
import { eventFreeDepth } from './eventFreeDepth';

const UNITS = [
  { topDepthM: 0, baseDepthM: 0.3, facies: 'HEMIPELAGIC_MUD' },
  { topDepthM: 0.3, baseDepthM: 0.5, facies: 'TURBIDITE' },
  { topDepthM: 0.5, baseDepthM: 1.0, facies: 'HEMIPELAGIC_MUD' },
  { topDepthM: 1.0, baseDepthM: 1.1, facies: 'TURBIDITE' },
];

describe(eventFreeDepth.name, () => {
  it('removes the thickness of every turbidite above a depth [analytic]', () => {
    expect(eventFreeDepth(UNITS, 0.2)).toBeCloseTo(0.2, 12);
    expect(eventFreeDepth(UNITS, 0.4)).toBeCloseTo(0.3, 12); // inside the first bed: its top
    expect(eventFreeDepth(UNITS, 0.8)).toBeCloseTo(0.6, 12);
    expect(eventFreeDepth(UNITS, 1.2)).toBeCloseTo(0.9, 12);
  });
});
