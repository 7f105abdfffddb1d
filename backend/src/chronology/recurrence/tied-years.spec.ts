/**
 * Recurrence from a site age model's own joint draws when the model puts two events in one grid
 * year (issue 12, item 6): the real ordering model runs on a small column whose undated units
 * squeeze four events between two close dated levels, and its draws go straight to the
 * recurrence summary, which must spread tied years within the year instead of refusing them.
 */
import { describe, expect, it } from 'vitest';
import { normalDensity } from '../common/density';
import { SeededRandom } from '../common/random';
import { runAgeModel } from '../age-model/age-model';
import type { AgeModelInput } from '../age-model/column';
import { spreadWithinYears, summariseRecurrence } from './monte-carlo';

function squeezedColumn(): AgeModelInput {
  const units = [1, 2, 3, 4, 5, 6].map((position) => ({
    id: `u${position}`,
    name: `Unit ${position}`,
    position,
    topDepthM: null,
    baseDepthM: null,
  }));
  // Dated levels 1,500 +- 15 (unit 1) and 1,490 +- 15 (unit 6); units 2-5 undated, so the five
  // events between them share a few decades and often a year.
  const samples = [
    { id: 's1', unitId: 'u1', depthM: null, ageRelation: 'DATES_DEPOSIT' as const, likelihood: normalDensity(1500, 15) },
    { id: 's6', unitId: 'u6', depthM: null, ageRelation: 'DATES_DEPOSIT' as const, likelihood: normalDensity(1490, 15) },
  ];
  const eventHorizons = [1, 2, 3, 4, 5].map((k) => ({ id: `e${k}`, name: `E${k}`, unitBelowId: `u${k}`, unitAboveId: `u${k + 1}` }));
  return { units, eventHorizons, samples };
}

describe('recurrence on a site model’s draws with tied years', () => {
  it('accepts draws that put events in one year and keeps every interval positive', () => {
    const result = runAgeModel(squeezedColumn(), { iterations: 3_000, burnIn: 500, thin: 3, seed: 7, maxStoredDraws: 1_000 });
    const { draws, drawCount, eventHorizonIds } = result.eventDraws;
    const eventCount = eventHorizonIds.length;
    // The model's ages are continuous; read at year resolution (as a whole-year export or an
    // older stored run gives them), events of this squeezed column share a year in some draws.
    const rows = Array.from({ length: drawCount }, (_, d) =>
      Float64Array.from(draws.subarray(d * eventCount, (d + 1) * eventCount), (age) => Math.round(age)),
    );
    // The premise: at year resolution some draws put two events in one year.
    const tied = rows.filter((row) => new Set(Array.from(row)).size < eventCount).length;
    expect(tied).toBeGreaterThan(0);

    const summary = summariseRecurrence(rows, { forecastStartYearCe: 2020, windowsYears: [50], models: ['POISSON', 'BPT'] });
    expect(summary.drawCount).toBe(drawCount);
    for (const interval of summary.intervals) expect(interval.low95).toBeGreaterThan(0);
  });

  it('spreads a run of equal ages as ordered points inside their year and leaves continuous ages alone', () => {
    const ages = Float64Array.from([1_200.25, 1_100, 1_100, 1_100, 1_000.5]);
    spreadWithinYears(ages, new SeededRandom(3));
    expect(ages[0]).toBe(1_200.25);
    expect(ages[4]).toBe(1_000.5);
    for (const k of [1, 2, 3]) {
      expect(ages[k]).toBeGreaterThanOrEqual(1_099.5);
      expect(ages[k]).toBeLessThan(1_100.5);
    }
    expect(ages[1]).toBeGreaterThan(ages[2]);
    expect(ages[2]).toBeGreaterThan(ages[3]);
  });

  it('spreads tied years uniformly: the gap between two events in one year averages 1/3 year [analytic]', () => {
    // For two uniform points on a unit interval E|U1 - U2| = 1/3 [analytic].
    const random = new SeededRandom(11);
    let total = 0;
    const n = 20_000;
    for (let i = 0; i < n; i++) {
      const ages = Float64Array.from([500, 500]);
      spreadWithinYears(ages, random);
      total += ages[0] - ages[1];
    }
    expect(total / n).toBeCloseTo(1 / 3, 2);
  });
});
