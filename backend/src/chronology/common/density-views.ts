/**
 * Densities as the API sends them for drawing: every year, or thinned to a few hundred points or
 * to a short regular grid. Pure functions; no I/O.
 */
import type { CalendarDensity } from './density';

/** One year of a density, as the API sends it. */
export interface DensityPoint {
  readonly calBp: number;
  readonly probability: number;
}

/** Points per event density the API sends for drawing (the ladder and combined ages). */
export const MAX_DENSITY_POINTS = 400;

/**
 * A density as at most `maxPoints` points for drawing: years are pooled into bins of
 * ceil(length / maxPoints) consecutive years, each bin given the mean probability of its years at
 * its middle year. Means (not sums) keep the per-year scale of the 1-year grid, so thinned and
 * unthinned densities draw at the same height, and the area (mean x bin width) is preserved.
 */
export function thinDensity(density: CalendarDensity, maxPoints = MAX_DENSITY_POINTS): DensityPoint[] {
  if (!(maxPoints >= 1)) throw new RangeError(`maxPoints must be at least 1, got ${maxPoints}`);
  const p = density.probabilities;
  const width = Math.max(1, Math.ceil(p.length / Math.floor(maxPoints)));
  const points: DensityPoint[] = [];
  for (let from = 0; from < p.length; from += width) {
    const to = Math.min(p.length, from + width);
    let sum = 0;
    for (let i = from; i < to; i++) sum += p[i];
    points.push({ calBp: density.startCalBp + from + Math.floor((to - from - 1) / 2), probability: sum / (to - from) });
  }
  return points;
}

/** A density on a regular calendar grid: `values[i]` is the mean probability per year around `startCalBp + i * stepYears`. */
export interface DensityGrid {
  readonly startCalBp: number;
  readonly stepYears: number;
  readonly values: readonly number[];
}

/** Values per event the ladder sends: enough for a smooth shape a column wide; fewer keep the ladder answer small. */
export const LADDER_GRID_POINTS = 64;

/**
 * A density pooled into bins of ceil(length / maxPoints) years, as a regular grid for drawing.
 * Each value is the bin's mean probability per year (years past the end count as 0, so the area,
 * value x step summed, equals the density's mass) at the bin's middle year. Values are rounded to
 * 4 significant digits: plenty for a drawing, and a quarter of the bytes.
 */
export function thinToGrid(density: CalendarDensity, maxPoints = LADDER_GRID_POINTS): DensityGrid {
  const p = density.probabilities;
  const step = Math.max(1, Math.ceil(p.length / Math.floor(maxPoints)));
  const values: number[] = [];
  for (let from = 0; from < p.length; from += step) {
    let sum = 0;
    for (let i = from; i < Math.min(p.length, from + step); i++) sum += p[i];
    values.push(Number((sum / step).toPrecision(4)));
  }
  return { startCalBp: density.startCalBp + (step - 1) / 2, stepYears: step, values };
}

/** The grid as (calBp, probability) points, for clients that want points. */
export function gridPoints(grid: DensityGrid): DensityPoint[] {
  return grid.values.map((probability, i) => ({ calBp: Math.round(grid.startCalBp + i * grid.stepYears), probability }));
}
