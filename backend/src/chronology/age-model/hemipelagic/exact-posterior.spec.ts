/**
 * The hemipelagic sampler against an exact integration of the same posterior on a tiny core.
 *
 * Core (true depth, m): mud M1 0-0.08, turbidite T1 0.08-0.15 whose base eroded an estimated
 * 0.02 m, mud M2 0.15-0.23. On event-free depth that is two sections of 8 cm, x_1 = a_1 and
 * x_2 = w a_1 + (1 - w) a_2 with w = r^(0.08 / 0.1) (their centres 8 cm apart); the event (T1's
 * base) is at top + 0.08 x_1, level 1 (M1, 0.04 m) at top + 0.04 x_1, level 2 (M2, 0.19 m, event-free
 * 0.12 m, below the gap) at top + 0.08 x_1 + (0.04 + E) x_2. Priors as stated by the model: a_i ~
 * Gamma(shape 1, mean 10,000 yr/m), r ~ Beta(2, 2), E ~ Gamma(shape 4, mean 0.02 m), the top flat
 * on [-75, infinity). The levels' likelihoods are normal (given to the model through its
 * `makeLevels` hook), so the top integrates out in closed form for each (a_1, a_2, r, E); those four
 * are integrated by the trapezoid rule on log a_1, log a_2, logit r and log E (the substitution's
 * Jacobians a_1, a_2, r(1 - r), E written out here), with the prior densities from jstat [jStat,
 * a general-purpose library]. The lower bound of the top lies over 25 of its posterior standard
 * deviations below its mean, so its truncation is left out of the closed form.
 *
 * The checks: posterior means and standard deviations of the event, the levels and the top, and
 * the medians of the memory and the eroded thickness, each within four
 * Monte Carlo standard errors of the sampler's (from its effective sample sizes).
 */
import { describe, expect, it } from 'vitest';
import { jStat } from '../../common/jstat';
import { AgeModelInput, ColumnUnit } from '../column';
import { runHemipelagicModel } from './hemipelagic-model';
import { LevelLikelihoods } from './levels';

const MEAN_RATE = 10_000; // years per metre: 10 cm/kyr
const LEVELS = [
  { mu: 1500, sigma: 40 },
  { mu: 2800, sigma: 50 },
];
const EROSION_ESTIMATE = 0.02;

const unit = (id: string, position: number, top: number, base: number, facies: string, basalErosionM: number | null = null): ColumnUnit => ({
  id, name: id, position, topDepthM: top, baseDepthM: base, facies, basalErosionM,
});

const input: AgeModelInput = {
  units: [
    unit('M2', 1, 0.15, 0.23, 'HEMIPELAGIC_MUD'),
    unit('T1', 2, 0.08, 0.15, 'TURBIDITE', EROSION_ESTIMATE),
    unit('M1', 3, 0, 0.08, 'HEMIPELAGIC_MUD'),
  ],
  eventHorizons: [{ id: 'E1', name: 'E1', unitBelowId: 'M2', unitAboveId: 'T1' }],
  samples: [
    { id: 'L1', unitId: 'M1', depthM: 0.04, ageRelation: 'DATES_DEPOSIT', likelihood: { startCalBp: 1500, probabilities: Float64Array.of(1) } },
    { id: 'L2', unitId: 'M2', depthM: 0.19, ageRelation: 'DATES_DEPOSIT', likelihood: { startCalBp: 2800, probabilities: Float64Array.of(1) } },
  ],
};

/** Normal likelihoods of the two levels' deposit ages. */
const normalLevels: LevelLikelihoods = {
  count: 2,
  logLikelihood: (j, t) => -0.5 * ((t - LEVELS[j].mu) / LEVELS[j].sigma) ** 2,
  outlierShare: () => 0,
  centreCalBp: (j) => LEVELS[j].mu,
  spreadYears: (j) => LEVELS[j].sigma,
};

/** Trapezoid nodes and weights on [lo, hi]. */
function trapezoid(lo: number, hi: number, n: number): { x: Float64Array; w: Float64Array } {
  const h = (hi - lo) / (n - 1);
  const x = Float64Array.from({ length: n }, (_, i) => lo + i * h);
  const w = Float64Array.from({ length: n }, (_, i) => (i === 0 || i === n - 1 ? h / 2 : h));
  return { x, w };
}

interface Moments {
  mean: number;
  sd: number;
}

interface Exact {
  event: Moments;
  level1: Moments;
  level2: Moments;
  top: Moments;
  memoryMedian: number;
  erosionMedian: number;
  memorySd: number;
  erosionSd: number;
}

function exactPosterior(): Exact {
  const u = trapezoid(Math.log(MEAN_RATE) - 12, Math.log(MEAN_RATE) + 3, 70);
  const l = trapezoid(-10, 10, 25);
  const v = trapezoid(Math.log(EROSION_ESTIMATE) - 4, Math.log(EROSION_ESTIMATE) + 2, 21);
  // Prior mass of each node, Jacobian of the substitution included: p(a) a du, p(r) r (1 - r) dl, p(E) E dv.
  const rateMass = Float64Array.from(u.x, (x, i) => jStat.gamma.pdf(Math.exp(x), 1, MEAN_RATE) * Math.exp(x) * u.w[i]);
  const rs = Float64Array.from(l.x, (x) => 1 / (1 + Math.exp(-x)));
  const memoryMass = Float64Array.from(rs, (r, i) => jStat.beta.pdf(r, 2, 2) * r * (1 - r) * l.w[i]);
  const es = Float64Array.from(v.x, (x) => Math.exp(x));
  const erosionMass = Float64Array.from(es, (e, i) => jStat.gamma.pdf(e, 4, EROSION_ESTIMATE / 4) * e * v.w[i]);
  const [p1, p2] = LEVELS.map((lv) => 1 / lv.sigma ** 2);
  const precision = p1 + p2;

  // The top given (a1, a2, r, E) is normal (mean mt, variance 1 / precision); each node's weight is
  // its prior mass times the levels' likelihood integrated over the top.
  const memoryMarginal = new Float64Array(rs.length);
  const erosionMarginal = new Float64Array(es.length);
  let total = 0;
  const add = (into: number[], weight: number, centre: number) => {
    into[0] += weight * centre;
    into[1] += weight * (topVariance + centre * centre);
  };
  const centres = { event: [0, 0], level1: [0, 0], level2: [0, 0], top: [0, 0] };
  const topVariance = 1 / precision;
  for (let ia = 0; ia < u.x.length; ia++) {
      const a1 = Math.exp(u.x[ia]);
      for (let ib = 0; ib < u.x.length; ib++) {
        const a2 = Math.exp(u.x[ib]);
        const massAB = rateMass[ia] * rateMass[ib];
        for (let ir = 0; ir < rs.length; ir++) {
          const w = Math.pow(rs[ir], 0.08 / 0.1);
          const x1 = a1;
          const x2 = w * a1 + (1 - w) * a2;
          const massABR = massAB * memoryMass[ir];
          for (let ie = 0; ie < es.length; ie++) {
            const c1 = 0.04 * x1;
            const c2 = 0.08 * x1 + (0.04 + es[ie]) * x2;
            const mt = ((LEVELS[0].mu - c1) * p1 + (LEVELS[1].mu - c2) * p2) / precision;
            const q = (LEVELS[0].mu - c1) ** 2 * p1 + (LEVELS[1].mu - c2) ** 2 * p2 - precision * mt * mt;
            const weight = massABR * erosionMass[ie] * Math.exp(-0.5 * q);
            total += weight;
            memoryMarginal[ir] += weight;
            erosionMarginal[ie] += weight;
            add(centres.event, weight, mt + 0.08 * x1);
            add(centres.level1, weight, mt + c1);
            add(centres.level2, weight, mt + c2);
            add(centres.top, weight, mt);
          }
        }
      }
    }
  const moments = ([m1, m2]: number[]): Moments => ({ mean: m1 / total, sd: Math.sqrt(m2 / total - (m1 / total) ** 2) });
  // Medians of r and E from their marginal densities at the nodes (masses divided by node weights),
  // integrated piecewise linearly on the natural scale between nodes.
  const median = (nodes: Float64Array, marginal: Float64Array, weights: Float64Array, jacobian: (x: number) => number) => {
    const density = Float64Array.from(marginal, (m, i) => m / weights[i] / jacobian(nodes[i]));
    const cdf = new Float64Array(nodes.length);
    for (let i = 1; i < nodes.length; i++) cdf[i] = cdf[i - 1] + ((density[i - 1] + density[i]) / 2) * (nodes[i] - nodes[i - 1]);
    const half = cdf[nodes.length - 1] / 2;
    const i = cdf.findIndex((c) => c >= half);
    return nodes[i - 1] + ((half - cdf[i - 1]) / (cdf[i] - cdf[i - 1])) * (nodes[i] - nodes[i - 1]);
  };
  return {
    event: moments(centres.event),
    level1: moments(centres.level1),
    level2: moments(centres.level2),
    top: moments(centres.top),
    memoryMedian: median(rs, memoryMarginal, l.w, (r) => r * (1 - r)),
    memorySd: marginalSd(rs, memoryMarginal),
    erosionSd: marginalSd(es, erosionMarginal),
    erosionMedian: median(es, erosionMarginal, v.w, (e) => e),
  };
}

/** Standard deviation of a quantity from its nodes' posterior masses. */
function marginalSd(nodes: Float64Array, masses: Float64Array): number {
  let total = 0;
  let m1 = 0;
  let m2 = 0;
  nodes.forEach((x, i) => {
    total += masses[i];
    m1 += masses[i] * x;
    m2 += masses[i] * x * x;
  });
  return Math.sqrt(m2 / total - (m1 / total) ** 2);
}

function drawMoments(draws: ArrayLike<number>): Moments {
  let mean = 0;
  for (let i = 0; i < draws.length; i++) mean += draws[i] / draws.length;
  let variance = 0;
  for (let i = 0; i < draws.length; i++) variance += (draws[i] - mean) ** 2 / (draws.length - 1);
  return { mean, sd: Math.sqrt(variance) };
}

function densityMoments(density: { startCalBp: number; probabilities: Float64Array }): number {
  let mean = 0;
  density.probabilities.forEach((p, i) => (mean += p * (density.startCalBp + i)));
  return mean;
}

describe('hemipelagic sampler on a two-section core', () => {
  it('matches an exact integration of the posterior: moments, memory and erosion medians [quadrature, jStat]', () => {
    const exact = exactPosterior();
    const iterations = 4_000;
    const chains = 4;
    const result = runHemipelagicModel(
      input,
      { seed: 3, iterations, burnIn: 1_000, thin: 1, chains, maxStoredDraws: iterations * chains, hemipelagic: { rateMeanCmPerKyr: 10 } },
      {},
      () => normalLevels,
    );
    expect(result.hemipelagic.sections).toBe(2);
    const event = result.events[0];
    const draws = result.eventDraws.draws;
    expect(result.eventDraws.drawCount).toBe(iterations * chains);

    // Means within 4 Monte Carlo standard errors (sd / sqrt(ESS)); the sd within 4 sd / sqrt(ESS), its
    // standard error for a kurtosis up to 5 (sd sqrt((kurtosis - 1) / (4 ESS))), as the rate's
    // exponential prior gives the event a long old tail.
    const sampled = drawMoments(draws);
    expect(Math.abs(sampled.mean - exact.event.mean)).toBeLessThan((4 * exact.event.sd) / Math.sqrt(event.ess));
    expect(Math.abs(sampled.sd - exact.event.sd)).toBeLessThan((4 * exact.event.sd) / Math.sqrt(event.ess));

    // The levels' and the top's means from their densities (the kernel keeps the mean).
    const [s1, s2] = result.samples;
    expect(Math.abs(densityMoments(s1.density) - exact.level1.mean)).toBeLessThan((4 * exact.level1.sd) / Math.sqrt(s1.ess) + 0.5);
    expect(Math.abs(densityMoments(s2.density) - exact.level2.mean)).toBeLessThan((4 * exact.level2.sd) / Math.sqrt(s2.ess) + 0.5);
    const top = result.boundaries.end;
    expect(Math.abs(densityMoments(top.density) - exact.top.mean)).toBeLessThan((4 * exact.top.sd) / Math.sqrt(top.ess) + 0.5);

    // Memory and erosion: medians within 4 standard errors of a median (1.25 sd / sqrt(ESS)), taking
    // the smallest ESS of the run for them. The memory's posterior differs from its Beta(2, 2) prior
    // (median 0.5) only through the rates, so it checks the memory's move and its Jacobian.
    const ess = Math.min(event.ess, s1.ess, s2.ess, top.ess);
    expect(Math.abs(result.hemipelagic.memoryMedian - exact.memoryMedian)).toBeLessThan((4 * 1.25 * exact.memorySd) / Math.sqrt(ess));
    expect(Math.abs(result.hemipelagic.erosion[0].medianM - exact.erosionMedian)).toBeLessThan((4 * 1.25 * exact.erosionSd) / Math.sqrt(ess));
    // The data move the event away from where the prior alone would put it: the check has teeth.
    expect(exact.event.sd).toBeGreaterThan(20);
  }, 60_000);
});
