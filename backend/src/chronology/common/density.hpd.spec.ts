import { describe, expect, it } from 'vitest';
import {
  CalendarDensity,
  HPD95_LEVEL,
  HPD_LEVEL_ROUNDING,
  HpdRange,
  hpdRanges,
  normalDensity,
  normalise,
  readableHpdRanges,
  totalMass,
  uniformDensity,
} from './density';
import { SeededRandom } from './random';

/**
 * The HPD rule written the plain way (Bronk Ramsey 2009, Radiocarbon 51(1): sort the grid years
 * by probability, keep the highest until the level is reached, merge runs), with the same rounding
 * slack, as the reference the faster selection in density.ts must reproduce [brute force].
 */
function hpdRangesBySorting(density: CalendarDensity, level: number): HpdRange[] {
  const p = density.probabilities;
  const mass = totalMass(density);
  const order = Array.from(p.keys()).sort((a, b) => p[b] - p[a] || a - b);
  const kept = new Uint8Array(p.length);
  let cumulative = 0;
  for (const i of order) {
    if (cumulative >= level * mass * (1 - HPD_LEVEL_ROUNDING)) break;
    kept[i] = 1;
    cumulative += p[i];
  }
  const ranges: HpdRange[] = [];
  for (let i = 0; i < p.length; ) {
    if (!kept[i]) {
      i++;
      continue;
    }
    let j = i;
    let rangeMass = 0;
    while (j < p.length && kept[j]) rangeMass += p[j++];
    ranges.push({ youngerCalBp: density.startCalBp + i, olderCalBp: density.startCalBp + j - 1, probability: rangeMass / mass });
    i = j;
  }
  return ranges.reverse();
}

function expectSameRanges(actual: HpdRange[], expected: HpdRange[]): void {
  expect(actual.map((r) => [r.youngerCalBp, r.olderCalBp])).toEqual(expected.map((r) => [r.youngerCalBp, r.olderCalBp]));
  actual.forEach((r, k) => expect(r.probability).toBeCloseTo(expected[k].probability, 12));
}

describe(hpdRanges.name, () => {
  it('keeps the same years as sorting, on random multimodal densities with ties and zeros', () => {
    const random = new SeededRandom(11);
    for (let n = 0; n < 300; n++) {
      const length = 1 + random.integer(900);
      const p = new Float64Array(length);
      const peaks = 1 + random.integer(4);
      for (let k = 0; k < peaks; k++) {
        const centre = random.uniform() * length;
        const width = 1 + random.uniform() * length * 0.1;
        for (let i = 0; i < length; i++) p[i] += Math.exp(-0.5 * ((i - centre) / width) ** 2);
      }
      // Coarse rounding makes many exact ties, and some years exactly zero.
      if (n % 2 === 0) for (let i = 0; i < length; i++) p[i] = Math.round(p[i] * 20) / 20;
      const density = { startCalBp: random.integer(5000), probabilities: p };
      if (!(totalMass(density) > 0)) continue;
      for (const level of [0.5, 0.6826894921370859, 0.9544997361036416, 0.999]) {
        expectSameRanges(hpdRanges(density, level), hpdRangesBySorting(density, level));
      }
    }
  });

  it('gives about +-1 and +-2 sigma on a normal density [analytic]', () => {
    const density = normalDensity(2000, 50);
    const [r68] = hpdRanges(density, 0.6826894921370859);
    const [r95] = hpdRanges(density, 0.9544997361036416);
    expect(Math.abs(r68.youngerCalBp - 1950)).toBeLessThanOrEqual(1);
    expect(Math.abs(r68.olderCalBp - 2050)).toBeLessThanOrEqual(1);
    expect(Math.abs(r95.youngerCalBp - 1900)).toBeLessThanOrEqual(1);
    expect(Math.abs(r95.olderCalBp - 2100)).toBeLessThanOrEqual(1);
  });

  it('keeps younger years first among equal probabilities, and exactly half of a flat 100 years at 50 % [analytic]', () => {
    const ranges = hpdRanges(uniformDensity(100, 199), 0.5);
    expect(ranges).toEqual([{ youngerCalBp: 100, olderCalBp: 149, probability: expect.closeTo(0.5, 12) }]);
    expectSameRanges(ranges, hpdRangesBySorting(uniformDensity(100, 199), 0.5));
    // 95 of 100 equal years at 95 %, not 96 because of rounding in the sum.
    expect(hpdRanges(uniformDensity(0, 99), 0.95)).toEqual([{ youngerCalBp: 0, olderCalBp: 94, probability: expect.closeTo(0.95, 12) }]);
  });

  it('keeps nothing at level 0 and everything at level 1', () => {
    const density = normalDensity(500, 10);
    expect(hpdRanges(density, 0)).toEqual([]);
    const all = hpdRanges(density, 1);
    expect(all).toHaveLength(1);
    expect(all[0].youngerCalBp).toBe(density.startCalBp);
    expect(all[0].olderCalBp).toBe(density.startCalBp + density.probabilities.length - 1);
  });
});

describe(readableHpdRanges.name, () => {
  const mixture = (parts: { mean: number; sd: number; weight: number }[], start: number, end: number): CalendarDensity => {
    const probabilities = new Float64Array(end - start + 1);
    for (let i = 0; i < probabilities.length; i++) {
      for (const { mean, sd, weight } of parts) probabilities[i] += (weight * Math.exp(-0.5 * ((start + i - mean) / sd) ** 2)) / sd;
    }
    return normalise({ startCalBp: start, probabilities });
  };

  it('keeps two well separated modes as two ranges with their probabilities [analytic]', () => {
    // Equal normals 600 years apart: each 95.4 % piece holds about half the 95.4 % mass, and each
    // mode's own mass over its range is about 0.477 (+-2 sd of half the mass) [analytic].
    const d = mixture([{ mean: 1000, sd: 30, weight: 1 }, { mean: 1600, sd: 30, weight: 1 }], 700, 1900);
    const ranges = readableHpdRanges(d, HPD95_LEVEL);
    expect(ranges).toHaveLength(2);
    expect(ranges[0].olderCalBp).toBeGreaterThan(ranges[1].olderCalBp);
    for (const r of ranges) expect(r.probability).toBeCloseTo(0.477, 2);
  });

  it('merges pieces fewer than 10 years apart into one range holding the mass between them', () => {
    // A flat density with a 3-year notch: the exact HPD set is split by the notch; the readable
    // range spans it and reports the full mass inside [analytic].
    const probabilities = new Float64Array(200).fill(1);
    for (let i = 100; i < 103; i++) probabilities[i] = 0.01;
    const d = normalise({ startCalBp: 0, probabilities });
    expect(hpdRanges(d, 0.9).length).toBe(2);
    const ranges = readableHpdRanges(d, 0.9);
    expect(ranges).toHaveLength(1);
    let inside = 0;
    for (let y = ranges[0].youngerCalBp; y <= ranges[0].olderCalBp; y++) inside += d.probabilities[y];
    expect(ranges[0].probability).toBeCloseTo(inside, 12);
  });

  it('quotes at most four ranges, merging the closest first', () => {
    const parts = [0, 1, 2, 3, 4, 5].map((k) => ({ mean: 1000 + k * 200 + (k === 2 ? -60 : 0), sd: 10, weight: 1 }));
    const d = mixture(parts, 800, 2300);
    expect(hpdRanges(d, HPD95_LEVEL)).toHaveLength(6);
    const ranges = readableHpdRanges(d, HPD95_LEVEL);
    expect(ranges).toHaveLength(4);
    // Modes at 1200 and 1340 are the closest pair (140 years apart against 200 or more): merged first.
    expect(ranges.some((r) => r.youngerCalBp < 1200 && r.olderCalBp > 1340)).toBe(true);
  });
});
