import { describe, expect, it } from 'vitest';
import { normalDensity } from './density';
import { gridPoints, LADDER_GRID_POINTS, thinDensity, thinToGrid } from './density-views';

describe(thinDensity.name, () => {
  it('keeps every year of a density that already fits', () => {
    const density = { startCalBp: 500, probabilities: Float64Array.of(0.1, 0.2, 0.4, 0.3) };
    expect(thinDensity(density, 4)).toEqual([
      { calBp: 500, probability: 0.1 },
      { calBp: 501, probability: 0.2 },
      { calBp: 502, probability: 0.4 },
      { calBp: 503, probability: 0.3 },
    ]);
  });

  it('pools a long density into bins of mean probability at their middle years', () => {
    const density = normalDensity(3000, 200); // 2401 years
    const points = thinDensity(density, 400);
    const width = Math.ceil(density.probabilities.length / 400); // 7 years per bin
    expect(points.length).toBeLessThanOrEqual(400);
    expect(points.length).toBe(Math.ceil(density.probabilities.length / width));
    // Brute force: the mean of the bin's years, placed at its middle year [analytic].
    const bin = 123;
    const years = Array.from(density.probabilities.slice(bin * width, (bin + 1) * width));
    expect(points[bin].probability).toBeCloseTo(years.reduce((s, p) => s + p, 0) / width, 15);
    expect(points[bin].calBp).toBe(density.startCalBp + bin * width + Math.floor((width - 1) / 2));
    // Mean x bin width summed over the bins is the density's mass, 1 [analytic].
    const lastWidth = density.probabilities.length - (points.length - 1) * width;
    const area = points.reduce((s, p, i) => s + p.probability * (i === points.length - 1 ? lastWidth : width), 0);
    expect(area).toBeCloseTo(1, 12);
  });

  it('refuses a point budget below one', () => {
    expect(() => thinDensity(normalDensity(100, 5), 0)).toThrow(RangeError);
  });
});

describe(thinToGrid.name, () => {
  // A normal density has unit mass [analytic]; pooling into bins must keep it (area = sum of value x step).
  it('keeps the mass, caps the number of values and places values at bin middles', () => {
    const density = normalDensity(1500, 80);
    const grid = thinToGrid(density, 120);
    expect(grid.values.length).toBeLessThanOrEqual(120);
    expect(grid.values.reduce((sum, v) => sum + v * grid.stepYears, 0)).toBeCloseTo(1, 3);
    expect(grid.startCalBp).toBe(density.startCalBp + (grid.stepYears - 1) / 2);
    const peak = grid.values.indexOf(Math.max(...grid.values));
    expect(Math.abs(grid.startCalBp + peak * grid.stepYears - 1500)).toBeLessThanOrEqual(grid.stepYears);
  });

  it('leaves a short density on its 1-year grid and expands to matching points', () => {
    const density = normalDensity(300, 5);
    const grid = thinToGrid(density, LADDER_GRID_POINTS);
    expect(grid.stepYears).toBe(1);
    const points = gridPoints(grid);
    expect(points[0]).toEqual({ calBp: density.startCalBp, probability: grid.values[0] });
    expect(points).toHaveLength(density.probabilities.length);
  });
});
