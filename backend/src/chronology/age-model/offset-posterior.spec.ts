import { describe, expect, it } from 'vitest';
import { CalendarDensity, normalDensity } from '../common/density';
import { runAgeModel } from './age-model';
import { AgeModelInput } from './column';
import { depositLikelihood } from './likelihood';
import { offsetPosterior } from './offset-posterior';

/**
 * Brute force on the joint (deposit year y, offset k) grid of the generative model with no
 * outliers: p(y, k | t) ∝ p0(y) P(k) L_s(y + sign k), P(k) = (1 - r) r^k. Summed directly over both
 * axes, without the deposit likelihood or the deposit's posterior that `offsetPosterior` uses.
 */
function bruteForceOffset(own: CalendarDensity, sign: 1 | -1, scale: number, prior: (y: number) => number, years: [number, number]) {
  const r = Math.exp(-1 / scale);
  const ownAt = (t: number) => {
    const i = t - own.startCalBp;
    return i >= 0 && i < own.probabilities.length ? own.probabilities[i] : 0;
  };
  const counts = new Float64Array(40 * scale);
  for (let y = years[0]; y <= years[1]; y++) {
    for (let k = 0; k < counts.length; k++) counts[k] += prior(y) * (1 - r) * r ** k * ownAt(y + sign * k);
  }
  let total = 0;
  for (const c of counts) total += c;
  const quantile = (q: number) => {
    let running = 0;
    for (let k = 0; k < counts.length; k++) {
      if (running + counts[k] >= q * total) return k + (q * total - running) / counts[k];
      running += counts[k];
    }
    return counts.length;
  };
  return { median: quantile(0.5), low: quantile(0.025), high: quantile(0.975) };
}

/** The deposit's posterior under the flat-then-cut prior p0, from the deposit likelihood. */
function depositPosterior(own: CalendarDensity, relation: 'OLDER_THAN_DEPOSIT' | 'YOUNGER_THAN_DEPOSIT', scale: number, prior: (y: number) => number) {
  const L = depositLikelihood(own, relation, scale);
  const probabilities = Float64Array.from(L.values, (v, i) => v * prior(L.startCalBp + i));
  const weight = (y: number) => {
    const i = y - L.startCalBp;
    return i >= 0 && i < L.values.length && L.values[i] > 0 ? 1 / L.values[i] : 0;
  };
  return { density: { startCalBp: L.startCalBp, probabilities }, weight };
}

describe('offsetPosterior', () => {
  it('matches a brute-force sum over deposit year and offset for inherited material under a bounding prior', () => {
    const own = normalDensity(1300, 30);
    // The deposit is known to lie between 1000 and 1100 cal BP (flat there), so the offset is about 200-300 years.
    const prior = (y: number) => (y >= 1000 && y <= 1100 ? 1 : 0);
    const { density, weight } = depositPosterior(own, 'OLDER_THAN_DEPOSIT', 150, prior);
    const got = offsetPosterior(own, 'OLDER_THAN_DEPOSIT', 150, density, weight)!;
    const truth = bruteForceOffset(own, 1, 150, prior, [900, 1500]);
    expect(got.scaleYears).toBe(150);
    expect(got.medianYears).toBeCloseTo(truth.median, 1);
    expect(got.low95Years).toBeCloseTo(truth.low, 1);
    expect(got.high95Years).toBeCloseTo(truth.high, 1);
    expect(got.medianYears).toBeGreaterThan(180);
    expect(got.medianYears).toBeLessThan(300);
  });

  it('reports intrusive offsets as negative (sample younger than its deposit)', () => {
    const own = normalDensity(800, 25);
    const prior = (y: number) => (y >= 900 && y <= 950 ? 1 : 0);
    const { density, weight } = depositPosterior(own, 'YOUNGER_THAN_DEPOSIT', 60, prior);
    const got = offsetPosterior(own, 'YOUNGER_THAN_DEPOSIT', 60, density, weight)!;
    const truth = bruteForceOffset(own, -1, 60, prior, [600, 1200]);
    expect(got.medianYears).toBeCloseTo(-truth.median, 1);
    expect(got.low95Years).toBeCloseTo(-truth.high, 1);
    expect(got.high95Years).toBeCloseTo(-truth.low, 1);
    expect(got.high95Years).toBeLessThan(0);
  });

  it('is absent for samples that date their deposit', () => {
    const own = normalDensity(1000, 20);
    expect(offsetPosterior(own, 'DATES_DEPOSIT', 100, own, () => 1)).toBeUndefined();
  });

  it('comes back per sample from the ordering model, each with its own scale', () => {
    // A luminescence date pins each unit; detrital charcoal in the upper unit dates about 250 years too old.
    const input: AgeModelInput = {
      units: [
        { id: 'u1', position: 1, topDepthM: null, baseDepthM: null },
        { id: 'u2', position: 2, topDepthM: null, baseDepthM: null },
      ],
      eventHorizons: [{ id: 'e1', unitBelowId: 'u1', unitAboveId: 'u2' }],
      samples: [
        { id: 'a', unitId: 'u1', depthM: null, ageRelation: 'DATES_DEPOSIT', likelihood: normalDensity(1100, 15) },
        { id: 'b', unitId: 'u2', depthM: null, ageRelation: 'DATES_DEPOSIT', likelihood: normalDensity(1000, 15) },
        { id: 'c', unitId: 'u2', depthM: null, ageRelation: 'OLDER_THAN_DEPOSIT', likelihood: normalDensity(1300, 20), offsetScaleYears: 300 },
        { id: 'd', unitId: 'u2', depthM: null, ageRelation: 'OLDER_THAN_DEPOSIT', likelihood: normalDensity(1300, 20) },
      ],
    };
    const result = runAgeModel(input, { iterations: 4_000, burnIn: 500, thin: 2, inheritanceScaleYears: 20 });
    const [, , c, d] = result.samples;
    expect(result.samples[0].offset).toBeUndefined();
    expect(c.offset?.scaleYears).toBe(300);
    expect(d.offset?.scaleYears).toBe(20);
    // The charcoal's deposit lies younger than unit 1 (about 1100), so its offset is mostly 200 years or more
    // (unit 1's single date may itself be an outlier, which lets some draws come closer).
    expect(c.offset!.medianYears).toBeGreaterThan(150);
    expect(c.offset!.low95Years).toBeGreaterThanOrEqual(0);
    expect(c.offset!.high95Years).toBeGreaterThan(c.offset!.medianYears);
    // With a 20-year scale an offset of 200+ years is implausible: the sample is read as an outlier instead.
    expect(d.outlierProbability).toBeGreaterThan(c.outlierProbability);
  });
});
