import { describe, expect, it } from 'vitest';
import { ageWindow, bedsOnAxis, curveOnAxis, depthWindow, levelsOnAxis, type AgeDepthPoint, type DatedLevel } from './ageDepth';
import { coreScale, type CoreUnit } from './coreDepth';

// mud 0-1 m, bed 1-1.4 m, mud 1.4-2 m: event-free length 1.6 m (worked by hand).
const units: CoreUnit[] = [
  { id: 'a', position: 3, name: 'upper mud', topDepthM: 0, baseDepthM: 1, facies: 'HEMIPELAGIC_MUD' },
  { id: 'b', position: 2, name: 'T1', topDepthM: 1, baseDepthM: 1.4, facies: 'TURBIDITE' },
  { id: 'c', position: 1, name: 'lower mud', topDepthM: 1.4, baseDepthM: 2, facies: 'HEMIPELAGIC_MUD' },
];
const scale = coreScale(units)!;

const point = (depthM: number, eventFreeDepthM: number, median: number): AgeDepthPoint => ({
  depthM,
  eventFreeDepthM,
  medianCalBp: median,
  low95CalBp: median - 50,
  high95CalBp: median + 50,
});

describe('curveOnAxis', () => {
  // The API lists the curve top down with a point at each contact: the bed's top and base share
  // one event-free depth and one age.
  const points = [point(2, 1.6, 1600), point(1.4, 1, 1000), point(1.2, 1, 1000), point(1, 1, 1000), point(0, 0, 0)];

  it('keeps every true depth, sorted top down', () => {
    expect(curveOnAxis(points, 'TRUE').map((p) => p.depth)).toEqual([0, 1, 1.2, 1.4, 2]);
  });

  it('keeps the first and last point of a bed on event-free depth', () => {
    const curve = curveOnAxis(points, 'EVENT_FREE');
    expect(curve.map((p) => p.depth)).toEqual([0, 1, 1, 1.6]);
    expect(curve[1]).toEqual({ depth: 1, median: 1000, young: 950, old: 1050 });
  });

  it('shows a gap in time at a scoured bed base as a step at one event-free depth', () => {
    // The mud under the bed starts 80 years older than the bed: eroded mud.
    const scoured = [point(0, 0, 0), point(1, 1, 1000), point(1.2, 1, 1000), point(1.4, 1, 1080), point(2, 1.6, 1680)];
    const curve = curveOnAxis(scoured, 'EVENT_FREE');
    expect(curve.map((p) => [p.depth, p.median])).toEqual([
      [0, 0],
      [1, 1000],
      [1, 1080],
      [1.6, 1680],
    ]);
  });

  it('orders the band ends whatever order they come in', () => {
    expect(curveOnAxis([{ depthM: 0, eventFreeDepthM: 0, medianCalBp: 10, low95CalBp: 30, high95CalBp: 5 }], 'TRUE')[0]).toMatchObject({ young: 5, old: 30 });
  });
});

describe('levelsOnAxis', () => {
  const levels: DatedLevel[] = [
    { id: 's1', label: 'X-1', depthM: 0.5, excluded: false, medianCalBp: 500, ranges: [{ olderCalBp: 560, youngerCalBp: 440 }] },
    { id: 's2', label: 'X-2', depthM: 1.7, excluded: false, medianCalBp: 1300, ranges: [] },
    { id: 's3', label: 'X-3', depthM: 2.5, excluded: false, medianCalBp: 2000, ranges: [] },
  ];

  it('places levels on event-free depth and drops those below the core', () => {
    const placed = levelsOnAxis(levels, scale, 'EVENT_FREE');
    expect(placed.map((level) => level.id)).toEqual(['s1', 's2']);
    expect(placed[1]!.depth).toBeCloseTo(1.3, 12);
    expect(levelsOnAxis(levels, scale, 'TRUE')[1]!.depth).toBe(1.7);
  });

  it('widens the age window to the levels and pads it by 5 % (at least 20 yr)', () => {
    const curve = curveOnAxis([point(0, 0, 100), point(2, 1.6, 300)], 'TRUE');
    // band 50-350, level range 440-560: span 50-560 = 510, pad 25.5
    expect(ageWindow(curve, levelsOnAxis(levels, scale, 'TRUE'))).toEqual([24.5, 585.5]);
    expect(ageWindow([], [])).toEqual([0, 1000]);
    // never younger than -75 cal BP
    expect(ageWindow(curveOnAxis([point(0, 0, -60)], 'TRUE'), [])[0]).toBe(-75);
  });
});

describe('depthWindow and bedsOnAxis', () => {
  it('spans the whole core on either axis', () => {
    expect(depthWindow(scale, 'TRUE')).toEqual([0, 2]);
    expect(depthWindow(scale, 'EVENT_FREE')[1]).toBeCloseTo(1.6, 12);
  });

  it('draws a bed as a band on true depth and as one depth on event-free depth', () => {
    expect(bedsOnAxis(scale, 'TRUE')).toEqual([{ id: 'b', name: 'T1', top: 1, base: 1.4 }]);
    const [bed] = bedsOnAxis(scale, 'EVENT_FREE');
    expect(bed!.top).toBeCloseTo(1, 12);
    expect(bed!.base).toBeCloseTo(1, 12);
  });
});
