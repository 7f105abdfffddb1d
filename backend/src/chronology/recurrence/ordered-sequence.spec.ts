import { describe, expect, it } from 'vitest';
import { type CalendarDensity, normalDensity, uniformDensity } from '../common/density';
import { SeededRandom } from '../common/random';
import { RecurrenceInputError } from './errors';
import { drawOrderedSequence, orderedSequenceSampler } from './ordered-sequence';

function meansOf(draws: readonly Float64Array[]): number[] {
  const sums = new Array<number>(draws[0].length).fill(0);
  for (const draw of draws) draw.forEach((age, k) => (sums[k] += age));
  return sums.map((sum) => sum / draws.length);
}

function sdOf(values: readonly number[]): number {
  const mean = values.reduce((s, x) => s + x, 0) / values.length;
  return Math.sqrt(values.reduce((s, x) => s + (x - mean) ** 2, 0) / (values.length - 1));
}

describe(orderedSequenceSampler.name, () => {
  it('keeps every draw strictly ordered, young to old, even where the densities overlap', () => {
    const densities = [normalDensity(300, 60), normalDensity(320, 60), normalDensity(340, 60), normalDensity(360, 60)];
    const sample = orderedSequenceSampler(densities);
    const rng = new SeededRandom(3);
    for (let d = 0; d < 5000; d++) {
      const ages = sample(rng);
      for (let k = 0; k + 1 < ages.length; k++) expect(ages[k + 1]).toBeGreaterThan(ages[k]);
    }
  });

  it('draws the exact ordered joint distribution: two events on the same 101 years [analytic]', () => {
    // Two distinct years drawn uniformly from 101: the younger averages 100 + 102/3 - 1 = 133,
    // the older 200 - 33 = 167 (for m equally likely values, E min of a distinct pair = (m + 1)/3).
    const densities = [uniformDensity(100, 200), uniformDensity(100, 200)];
    const sample = orderedSequenceSampler(densities);
    const rng = new SeededRandom(4);
    const draws = Array.from({ length: 40_000 }, () => sample(rng));
    const [younger, older] = meansOf(draws);
    expect(younger).toBeCloseTo(133, 0);
    expect(older).toBeCloseTo(167, 0);
  });

  it('agrees with rejection sampling of independent draws kept only when ordered [brute force]', () => {
    // Sampling each event from its density cut at the previous age would leave the youngest event
    // at its unconstrained mean of 300; the ordered joint pulls it younger.
    const densities = [normalDensity(300, 50), normalDensity(350, 50), normalDensity(380, 60)];
    const sample = orderedSequenceSampler(densities);
    const rng = new SeededRandom(5);
    const exact = meansOf(Array.from({ length: 40_000 }, () => sample(rng)));

    const cumulative = densities.map((density) => {
      const c = new Float64Array(density.probabilities.length);
      density.probabilities.reduce((sum, p, i) => (c[i] = sum + p), 0);
      return c;
    });
    const accepted: Float64Array[] = [];
    while (accepted.length < 40_000) {
      const ages = Float64Array.from(densities, (density, k) => density.startCalBp + rng.fromCumulative(cumulative[k]) + rng.uniform() - 0.5);
      if (ages[0] < ages[1] && ages[1] < ages[2]) accepted.push(ages);
    }
    const rejection = meansOf(accepted);
    expect(exact[0]).toBeLessThan(290);
    for (let k = 0; k < 3; k++) expect(Math.abs(exact[k] - rejection[k])).toBeLessThan(1.2);
  });

  it('leaves well-separated events with their own means and spreads [analytic]', () => {
    const densities = [normalDensity(500, 40), normalDensity(800, 20), normalDensity(1000, 30)];
    const sample = orderedSequenceSampler(densities);
    const rng = new SeededRandom(6);
    const draws = Array.from({ length: 20_000 }, () => sample(rng));
    const [young, middle, old] = meansOf(draws);
    expect(young).toBeCloseTo(500, 0);
    expect(middle).toBeCloseTo(800, 0);
    expect(old).toBeCloseTo(1000, 0);
    // Interval 1000 -> 800: SD sqrt(30^2 + 20^2) = 36.06 [analytic]; the 1-year grid and jitter
    // add about 1/6 year^2 of variance.
    expect(sdOf(draws.map((ages) => ages[2] - ages[1]))).toBeCloseTo(36.06, 0);
  });

  it('refuses densities that leave no room for the order', () => {
    const impossible: CalendarDensity[] = [uniformDensity(500, 600), uniformDensity(100, 200)];
    expect(() => orderedSequenceSampler(impossible)).toThrow(RecurrenceInputError);
    expect(() => orderedSequenceSampler(impossible)).toThrow(/cannot be older than event 1/);
    expect(() => orderedSequenceSampler([])).toThrow(RecurrenceInputError);
  });
});

describe(drawOrderedSequence.name, () => {
  it('draws each sequence ordered young to old, with the ordered joint distribution [analytic]', () => {
    // Three events on the same 301 years (uniform): ordered, they are the order statistics of three
    // distinct years, whose means are 100 + (k/4)(301 + 1) - 1 for k = 1, 2, 3 [analytic], i.e.
    // 174.5, 250, 325.5 (the same argument as the two-event case above, with m = 301 values).
    const densities = [uniformDensity(100, 400), uniformDensity(100, 400), uniformDensity(100, 400)];
    const rng = new SeededRandom(9);
    const draws = Array.from({ length: 3_000 }, () => drawOrderedSequence(densities, rng));
    for (const ages of draws) {
      expect(ages).toHaveLength(3);
      expect(ages[0]).toBeLessThan(ages[1]);
      expect(ages[1]).toBeLessThan(ages[2]);
    }
    const means = meansOf(draws);
    // Standard error of each mean at most 67/sqrt(3000) = 1.2 years; allow 5.
    expect(Math.abs(means[0] - 174.5)).toBeLessThan(5);
    expect(Math.abs(means[1] - 250)).toBeLessThan(5);
    expect(Math.abs(means[2] - 325.5)).toBeLessThan(5);
    // The middle of three uniform order statistics has sd range/sqrt(20) = 300/4.47 = 67 [analytic].
    expect(sdOf(draws.map((ages) => ages[1]))).toBeGreaterThan(61);
    expect(sdOf(draws.map((ages) => ages[1]))).toBeLessThan(73);
  });
});
