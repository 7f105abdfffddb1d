/**
 * The site age model against an exact computation of the published continuous model, written here
 * from the formula and sharing no code with the sampler: the sparsely dated column of issue 12
 * (seven units, an event horizon on each of the six contacts, luminescence levels of 2000, 1500
 * and 1000 +- 40 years before 1950 in the oldest, middle and youngest unit).
 *
 * Model (Buck, Kenworthy, Litton & Smith 1991, Antiquity 65:808-821, with the span correction of
 * Nicholls & Jones 2001, J. R. Stat. Soc. C 50(4):503-521 [memory for pages]): continuous ages
 * beta <= d7 <= e6 <= e5 <= e4 <= d4 <= e3 <= e2 <= e1 <= d1 <= alpha in a window [E0, E1] of
 * length W, prior ∝ s^-9 / (W - s) with s = alpha - beta, each dated level's likelihood the
 * outlier mixture (1 - q) N + q (N convolved with the binned Laplace shift) [Christen 1994].
 * The events integrate out in closed form: three ordered uniforms between two dated levels have
 * volume (b - a)^3 / 3!, and the oldest of them lies below t with probability ((t - a)/(b - a))^3.
 * The boundaries integrate out exactly through the partial fractions
 * 1 / (s^n (W - s)) = sum_{k=1..n} W^-(n-k+1) s^-k + W^-n / (W - s) [analytic]; the three dated
 * levels are summed on their year grid (each likelihood is constant within its year).
 */
import { describe, expect, it } from 'vitest';
import { normalDensity } from '../common/density';
import { AgeModelResult, runAgeModel } from './age-model';
import { AgeModelInput } from './column';
import { boundaryWeight, mixtureOnWindow } from './fixtures/exact-continuous-model';

const LEVELS = [
  { id: 'lum-oldest', unit: 1, calBp: 2000 },
  { id: 'lum-middle', unit: 4, calBp: 1500 },
  { id: 'lum-youngest', unit: 7, calBp: 1000 },
];

function sparseColumn(): AgeModelInput {
  return {
    units: Array.from({ length: 7 }, (_, i) => ({ id: `u${i + 1}`, name: `Unit ${i + 1}`, position: i + 1, topDepthM: null, baseDepthM: null })),
    eventHorizons: Array.from({ length: 6 }, (_, i) => ({ id: `e${i + 1}`, name: `E${i + 1}`, unitBelowId: `u${i + 1}`, unitAboveId: `u${i + 2}` })),
    samples: LEVELS.map((level) => ({
      id: level.id,
      unitId: `u${level.unit}`,
      depthM: null,
      ageRelation: 'DATES_DEPOSIT' as const,
      likelihood: normalDensity(level.calBp, 40),
    })),
  };
}

/** A level's likelihood per whole year of the window, with the outlier mixture. */
function levelLikelihood(calBp: number, young: number, old: number, q: number, scale: number): Float64Array {
  // The likelihood the model is given: N(calBp, 40) on whole years within +-6 sd.
  const start = Math.floor(calBp - 240);
  const probabilities = Float64Array.from({ length: Math.ceil(calBp + 240) - start + 1 }, (_, i) =>
    Math.exp(-0.5 * ((start + i - calBp) / 40) ** 2),
  );
  return mixtureOnWindow({ startCalBp: start, probabilities }, young, old, q, scale);
}

/**
 * Cells for summing a level: 2-year cells within 4 sd of its mean, 20-year cells beyond, each at
 * its middle with the likelihood summed over its years (a midpoint sum: the other factors change
 * by well under 1 % across a cell where the mass is).
 */
function cells(likelihood: Float64Array, young: number, centre: number): { at: Float64Array; weight: Float64Array } {
  const at: number[] = [];
  const weight: number[] = [];
  for (let i = 0; i < likelihood.length; ) {
    const y = young + i;
    const step = Math.min(Math.abs(y - centre) <= 160 ? 2 : 20, likelihood.length - i);
    let w = 0;
    for (let k = 0; k < step; k++) w += likelihood[i + k];
    at.push(y + (step - 1) / 2);
    weight.push(w);
    i += step;
  }
  return { at: Float64Array.from(at), weight: Float64Array.from(weight) };
}

interface Exact {
  /** P(e1 < t) for the oldest event. */
  oldestYoungerThan: number;
  meanE1: number;
  meanE3: number;
  meanE4: number;
  meanE6: number;
}

function exactPosterior(window: AgeModelResult['window'], q: number, scale: number, t: number): Exact {
  const { youngCalBp: young, oldCalBp: old } = window;
  const E0 = young - 0.5;
  const E1 = old + 0.5;
  const [c1, c4, c7] = LEVELS.map((level) => cells(levelLikelihood(level.calBp, young, old, q, scale), young, level.calBp));
  let total = 0;
  let below = 0;
  let e1 = 0;
  let e3 = 0;
  let e4 = 0;
  let e6 = 0;
  for (let a = 0; a < c7.at.length; a++) {
    const d7 = c7.at[a];
    for (let c = 0; c < c1.at.length; c++) {
      const d1 = c1.at[c];
      if (!(d1 > d7)) continue;
      const outer = c7.weight[a] * c1.weight[c] * boundaryWeight(d7, d1, E0, E1, 9);
      if (!(outer > 0)) continue;
      for (let b = 0; b < c4.at.length; b++) {
        const d4 = c4.at[b];
        if (d4 < d7 || d4 > d1) continue;
        const lower = d4 - d7;
        const upper = d1 - d4;
        const w = (outer * c4.weight[b] * lower * lower * lower * upper * upper * upper) / 36;
        total += w;
        const f = Math.min(1, Math.max(0, (t - d4) / upper));
        below += w * f * f * f;
        e1 += w * (d4 + 0.75 * (d1 - d4));
        e3 += w * (d4 + 0.25 * (d1 - d4));
        e4 += w * (d7 + 0.75 * (d4 - d7));
        e6 += w * (d7 + 0.25 * (d4 - d7));
      }
    }
  }
  return { oldestYoungerThan: below / total, meanE1: e1 / total, meanE3: e3 / total, meanE4: e4 / total, meanE6: e6 / total };
}

/** The model's probability that an event is younger than t (cal BP below t). */
function massYoungerThan(density: { startCalBp: number; probabilities: Float64Array }, t: number): number {
  let sum = 0;
  density.probabilities.forEach((p, i) => {
    const year = density.startCalBp + i;
    if (year + 0.5 <= t) sum += p;
    else if (year - 0.5 < t) sum += p * (t - (year - 0.5));
  });
  return sum;
}

describe('the age model on the sparsely dated column of issue 12', () => {
  const input = sparseColumn();
  // Fewer sweeps than the defaults keep the file quick; the run still converges with ESS in the thousands.
  const result = runAgeModel(input, { seed: 3, iterations: 8_000, burnIn: 2_000, thin: 4 });
  const event = (id: string): AgeModelResult['events'][number] => result.events.find((e) => e.eventHorizonId === id)!;
  const exact = exactPosterior(result.window, result.settings.outlierPrior, result.settings.outlierShiftScaleYears, 1600);

  it('matches the exact continuous model: the oldest event younger than 1600 cal BP, and event means', () => {
    // Source: the exact sum above [analytic]. Tolerances: Monte Carlo error of a converged run
    // (ESS in the thousands) is a few tenths of a per cent and a year or two on means.
    const model = massYoungerThan(event('e1').density, 1600);
    expect(Math.abs(model - exact.oldestYoungerThan)).toBeLessThan(0.005);
    expect(Math.abs(event('e1').summary.meanCalBp - exact.meanE1)).toBeLessThan(3);
    expect(Math.abs(event('e3').summary.meanCalBp - exact.meanE3)).toBeLessThan(3);
    expect(Math.abs(event('e4').summary.meanCalBp - exact.meanE4)).toBeLessThan(3);
    expect(Math.abs(event('e6').summary.meanCalBp - exact.meanE6)).toBeLessThan(3);
    expect(result.diagnostics.converged).toBe(true);
  });

  it('meets the contract: at most 3 % of the oldest event younger than 1600 cal BP, at most four 95.4 % ranges per event', () => {
    expect(massYoungerThan(event('e1').density, 1600)).toBeLessThanOrEqual(0.03);
    for (const e of result.events) expect(e.summary.hpd95.length).toBeLessThanOrEqual(4);
  });
});
