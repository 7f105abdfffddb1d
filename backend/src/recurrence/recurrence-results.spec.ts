import { describe, expect, it } from 'vitest';
import { normalDensity } from '../chronology/common/density';
import { SeededRandom } from '../chronology/common/random';
import { computeRecurrence, selectJointDraws } from './recurrence-results';

/** Joint draws of three well-separated events, N(1000,30), N(800,20), N(500,40) cal BP, oldest first. */
function jointDraws(drawCount: number, seed = 7) {
  const rng = new SeededRandom(seed);
  const draws: number[] = [];
  for (let d = 0; d < drawCount; d++) draws.push(1000 + 30 * rng.normal(), 800 + 20 * rng.normal(), 500 + 40 * rng.normal());
  return { kind: 'joint-draws' as const, eventCount: 3, drawCount, draws };
}

const SETTINGS = { forecastStartYearCe: 2025, windowsYears: [30, 50, 100], drawCount: 2000, seed: 11 };

describe(selectJointDraws.name, () => {
  const source = { kind: 'joint-draws' as const, eventCount: 2, drawCount: 5, draws: [10, 1, 20, 2, 30, 3, 40, 4, 50, 5] };

  it('uses every row in order when asked for as many or more', () => {
    expect(selectJointDraws(source, 9, 1).map((row) => Array.from(row))).toEqual([[10, 1], [20, 2], [30, 3], [40, 4], [50, 5]]);
  });

  it('takes distinct whole rows, the same ones for the same seed', () => {
    const rows = selectJointDraws(source, 3, 42).map((row) => Array.from(row));
    expect(rows).toHaveLength(3);
    expect(new Set(rows.map((row) => row[0])).size).toBe(3);
    for (const [older, younger] of rows) expect(older).toBe(younger * 10);
    expect(selectJointDraws(source, 3, 42).map((row) => Array.from(row))).toEqual(rows);
  });

  it('refuses a matrix that does not match its shape', () => {
    expect(() => selectJointDraws({ ...source, drawCount: 4 }, 2, 1)).toThrow(RangeError);
  });
});

describe(computeRecurrence.name, () => {
  const results = computeRecurrence(jointDraws(20_000), { ...SETTINGS, drawCount: 20_000 });

  it('counts intervals from the youngest, as the API does', () => {
    expect(results.intervals.map((i) => i.index)).toEqual([0, 1]);
    // Medians of differences of independent normals: 800 - 500 and 1000 - 800 [analytic], within Monte Carlo error.
    expect(results.intervals[0].medianYears).toBeCloseTo(300, -1);
    expect(results.intervals[1].medianYears).toBeCloseTo(200, -1);
    // 95 % half-width of the oldest interval: 1.96 x sqrt(30^2 + 20^2) = 70.7 [analytic].
    expect((results.intervals[1].high95 - results.intervals[1].low95) / 2).toBeCloseTo(70.7, -1);
  });

  it('gives the mean recurrence of the sequence, (1000 - 500) / 2 = 250 [analytic, CHECKS.md]', () => {
    expect(results.meanRecurrence.median).toBeCloseTo(250, -1);
    expect(results.eventCount).toBe(3);
    expect(results.lastEventMedianCalBp).toBeCloseTo(500, -1);
    expect(results.openInterval.median).toBeCloseTo(500 - (1950 - 2025), -1);
  });

  it('gives every model and the Poisson figure probabilities in [0, 1] rising with the window, with ordered ranges', () => {
    for (const rows of [results.poisson, ...results.models.map((m) => m.probabilities)]) {
      expect(rows.map((r) => r.windowYears)).toEqual([30, 50, 100]);
      for (const r of rows) {
        expect(r.low95).toBeGreaterThanOrEqual(0);
        expect(r.high95).toBeLessThanOrEqual(1);
        expect(r.low95).toBeLessThanOrEqual(r.median);
        expect(r.median).toBeLessThanOrEqual(r.high95);
      }
      expect(rows[0].median).toBeLessThan(rows[1].median);
      expect(rows[1].median).toBeLessThan(rows[2].median);
    }
  });

  it('fills the model table with Akaike weights summing to 1 and a note', () => {
    expect(results.models.map((m) => m.model)).toEqual(['POISSON', 'BPT', 'LOGNORMAL', 'WEIBULL']);
    expect(results.models.reduce((sum, m) => sum + m.akaikeWeight, 0)).toBeCloseTo(1, 12);
    expect(Math.min(...results.models.map((m) => m.deltaAic))).toBe(0);
    expect(results.modelComparisonNote).toMatch(/AIC/);
  });

  it('draws each model curve with survival falling from near 1 and a density over the histogram', () => {
    expect(results.curves).toHaveLength(4);
    for (const curve of results.curves) {
      expect(curve.survival.length).toBeGreaterThan(100);
      for (let i = 1; i < curve.survival.length; i++) expect(curve.survival[i].value).toBeLessThanOrEqual(curve.survival[i - 1].value);
      expect(curve.density.every((p) => p.value >= 0)).toBe(true);
    }
    const total = results.histogram.reduce((sum, bin) => sum + bin.count, 0);
    expect(total).toBe(2 * 20_000);
  });

  it('is reproducible from the seed for ordered densities', () => {
    const source = { kind: 'ordered-densities' as const, densities: [normalDensity(500, 40), normalDensity(800, 20), normalDensity(1000, 30)] };
    const a = computeRecurrence(source, SETTINGS);
    const b = computeRecurrence(source, SETTINGS);
    const c = computeRecurrence(source, { ...SETTINGS, seed: 12 });
    expect(b).toEqual(a);
    expect(c.meanRecurrence).not.toEqual(a.meanRecurrence);
  });
});
