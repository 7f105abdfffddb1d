import { describe, expect, it } from 'vitest';
import { CalendarDensity, HPD_LEVEL_ROUNDING, HpdRange, hpdRanges, normalDensity, totalMass, uniformDensity } from './density';
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
