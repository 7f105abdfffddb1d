import { describe, expect, it } from 'vitest';
import { CalendarDensity, normalDensity, quantile } from '../common/density';
import { runAgeModel } from './age-model';
import { AgeModelInput, ColumnSample } from './column';
import { boundaryWeight } from './fixtures/exact-continuous-model';
import { gridQuantile, logGridPrior, ReservoirSource, reservoirGrid } from './reservoir-offsets';

/**
 * A small column whose marine samples share one Delta-R: two units, each dated by one marine
 * sample, and event E between them (nodes: start >= M1 >= E >= M2 >= end). Both samples measure
 * about the same age; on a linear "curve" a Delta-R of r moves a marine sample's calendar age by r,
 * so each sample's likelihood given r is N(2000 + r, 15). The source's prior is N(0, 80) on its
 * grid. With independent offsets the order lets the two samples average their offsets (the pair's
 * location is known to about 80 / sqrt 2 years); with one shared offset it cannot.
 */
const MARINE_MEAN = 2000;
const MARINE_SD = 15;
const PRIOR_SD = 80;
const source: ReservoirSource = { key: 's', label: 'Invented shelf', named: true, priorMeanYears: 0, priorSdYears: PRIOR_SD, grid: reservoirGrid(0, PRIOR_SD) };
const prior = Array.from(logGridPrior(source), Math.exp);
const gridLikelihoods = source.grid.map((r) => normalDensity(MARINE_MEAN + r, MARINE_SD));

/** The sample's likelihood with the offset summed out over its prior: what an independent offset per sample gives. */
function integrated(): CalendarDensity {
  const start = Math.min(...gridLikelihoods.map((d) => d.startCalBp));
  const end = Math.max(...gridLikelihoods.map((d) => d.startCalBp + d.probabilities.length - 1));
  const probabilities = new Float64Array(end - start + 1);
  gridLikelihoods.forEach((d, k) => d.probabilities.forEach((p, i) => (probabilities[d.startCalBp - start + i] += prior[k] * p)));
  return { startCalBp: start, probabilities };
}

function column(shared: boolean): AgeModelInput {
  const marine = (id: string, unitId: string): ColumnSample => ({
    id,
    unitId,
    depthM: null,
    ageRelation: 'DATES_DEPOSIT',
    likelihood: integrated(),
    ...(shared ? { reservoir: { sourceKey: 's', gridLikelihoods } } : {}),
  });
  return {
    units: [
      { id: 'u1', position: 1, topDepthM: null, baseDepthM: null },
      { id: 'u2', position: 2, topDepthM: null, baseDepthM: null },
    ],
    eventHorizons: [{ id: 'E', unitBelowId: 'u1', unitAboveId: 'u2' }],
    samples: [marine('M1', 'u1'), marine('M2', 'u2')],
    ...(shared ? { reservoirSources: [source] } : {}),
  };
}

/**
 * The exact posterior of the continuous model (no outliers) on whole years, written from its
 * formula and sharing no code with the sampler: with the boundaries integrated out by
 * `boundaryWeight` (G(lo, hi) for the youngest and oldest age, m = 3 ages between them), the event
 * at year y between the deposits d2 < y < d1,
 *
 *   p(y, k) ∝ pi_k sum_{d2 < y < d1} L^k(d1) L^k(d2) G(d2, d1),
 *
 * L^k a marine sample's likelihood at offset k. Independent offsets replace L^k(d1) L^k(d2) by the
 * product of the two integrated likelihoods.
 */
function exact(shared: boolean, window: { youngCalBp: number; oldCalBp: number }) {
  const E0 = window.youngCalBp - 0.5;
  const E1 = window.oldCalBp + 0.5;
  const young = MARINE_MEAN - 5 * PRIOR_SD;
  const old = MARINE_MEAN + 5 * PRIOR_SD;
  const years = old - young + 1;
  const onYears = (d: CalendarDensity): Float64Array =>
    Float64Array.from({ length: years }, (_, i) => {
      const j = young + i - d.startCalBp;
      return j >= 0 && j < d.probabilities.length ? d.probabilities[j] : 0;
    });
  const G = Array.from({ length: years }, (_, a) => Float64Array.from({ length: years }, (_, b) => (b > a ? boundaryWeight(young + a, young + b, E0, E1, 3) : 0)));
  const likelihoods = shared ? gridLikelihoods.map(onYears) : [onYears(integrated())];
  const weights = shared ? prior : [1];
  const event = new Float64Array(years);
  const offsetPosterior = new Float64Array(likelihoods.length);
  likelihoods.forEach((L, k) => {
    // S[a][y] = sum_{b > y} L(b) G(a, b): suffix sums over the older deposit.
    for (let a = 0; a < years; a++) {
      if (!(L[a] > 1e-14)) continue;
      let suffix = 0;
      const contribution = new Float64Array(years);
      for (let y = years - 1; y > a; y--) {
        contribution[y] = suffix;
        suffix += L[y] * G[a][y];
      }
      for (let y = a + 1; y < years; y++) {
        const w = weights[k] * L[a] * contribution[y];
        event[y] += w;
        offsetPosterior[k] += w;
      }
    }
  });
  const density: CalendarDensity = { startCalBp: young, probabilities: event };
  return { density, offsetPosterior };
}

const SETTINGS = { outlierPrior: 0, iterations: 30_000, burnIn: 2_000, thin: 5, seed: 7 };

/**
 * Monte Carlo tolerances: with an effective sample size of about 400 the 2.5 % and 97.5 % quantiles
 * of a spread of about 80 years carry a standard error near 10 years (sqrt(p (1 - p) / ESS) / f(q));
 * the tails are allowed 2.5 of those, the median 10 years.
 */
const TAIL_TOLERANCE = 25;
const MEDIAN_TOLERANCE = 10;

describe('shared reservoir offsets', () => {
  const sharedRun = runAgeModel(column(true), SETTINGS);
  const independentRun = runAgeModel(column(false), SETTINGS);
  const sharedExact = exact(true, sharedRun.window);
  const independentExact = exact(false, independentRun.window);
  const range = (d: CalendarDensity) => [quantile(d, 0.025), quantile(d, 0.975)];

  it('gives the event the exact continuous model\'s 95 % range with one offset for both samples', () => {
    const [lo, hi] = range(sharedRun.events[0].density);
    const [exactLo, exactHi] = range(sharedExact.density);
    expect(sharedRun.diagnostics.converged).toBe(true);
    expect(Math.abs(lo - exactLo)).toBeLessThan(TAIL_TOLERANCE);
    expect(Math.abs(hi - exactHi)).toBeLessThan(TAIL_TOLERANCE);
    expect(Math.abs(quantile(sharedRun.events[0].density, 0.5) - quantile(sharedExact.density, 0.5))).toBeLessThan(MEDIAN_TOLERANCE);
  });

  it('does not narrow the event\'s range as independent offsets would', () => {
    const width = (d: CalendarDensity) => range(d)[1] - range(d)[0];
    // The independent computation (exact, each sample's offset its own) is clearly narrower ...
    expect(width(sharedExact.density)).toBeGreaterThan(1.2 * width(independentExact.density));
    // ... and the model without sources reproduces it, while the model with one source does not.
    expect(Math.abs(width(independentRun.events[0].density) - width(independentExact.density))).toBeLessThan(2 * TAIL_TOLERANCE);
    expect(width(sharedRun.events[0].density)).toBeGreaterThan(1.15 * width(independentRun.events[0].density));
  });

  it('reports the offset\'s posterior as the exact computation gives it', () => {
    const [posterior] = sharedRun.reservoirOffsets!;
    expect(posterior).toMatchObject({ key: 's', label: 'Invented shelf', priorMeanYears: 0, priorSdYears: PRIOR_SD, sampleIds: ['M1', 'M2'] });
    const exactMedian = gridQuantile(source.grid, sharedExact.offsetPosterior, 0.5);
    expect(Math.abs(posterior.medianYears - exactMedian)).toBeLessThan(MEDIAN_TOLERANCE);
    expect(Math.abs(posterior.low95Years - gridQuantile(source.grid, sharedExact.offsetPosterior, 0.025))).toBeLessThan(TAIL_TOLERANCE);
    expect(Math.abs(posterior.high95Years - gridQuantile(source.grid, sharedExact.offsetPosterior, 0.975))).toBeLessThan(TAIL_TOLERANCE);
    expect(independentRun.reservoirOffsets).toBeUndefined();
  });
});
