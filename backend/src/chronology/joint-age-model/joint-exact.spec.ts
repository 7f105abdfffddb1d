/**
 * The joint age model against an exact computation of the intended joint continuous model, written
 * from the formula and sharing no code with the sampler: two sites of three units and two events
 * each, dated in their oldest and youngest units only, the younger event of site A tied to the
 * older event of site B.
 *
 *   site A: dA3 <= a2 (= R) <= a1 <= dA1,  levels 2000 and 1000 +- 40 cal BP,
 *   site B: dB3 <= b2 <= b1 (= R) <= dB1,  levels 1500 and 500 +- 40 cal BP,
 *
 * each site with its own boundaries and prior s^-4 / (W - s) (Buck, Kenworthy, Litton & Smith 1991;
 * Nicholls & Jones 2001), each level's likelihood the outlier mixture (Christen 1994) on the
 * common window. The boundaries integrate out exactly (`boundaryWeight`, the site model's test
 * fixture, closed form [analytic]); the free events integrate out as lengths: a1 in [R, dA1] gives
 * dA1 - R and b2 in [dB3, R] gives R - dB3. So, with K_A = G_A(dA3, dA1) L(dA3) L(dA1),
 *
 *   p(R = y)  ∝ F_A(y) F_B(y),  F_A(y) = sum K_A (dA1 - y) 1[dA3 < y < dA1],  F_B(y) = sum K_B (y - dB3) 1[dB3 < y < dB1],
 *   p(a1 = x) ∝ sum K_A 1[dA3 < x < dA1] int_dA3^x F_B(R) dR,
 *   p(b2 = x) ∝ sum K_B 1[dB3 < x < dB1] int_x^dB1 F_A(R) dR,
 *
 * summed with the levels on 2-year cells near their means and 20-year cells beyond (as the site
 * model's exact test) and R, a1, b2 on whole years.
 *
 * The tie informs a1 and b2, the events around the tied one: site B alone would put b2 anywhere
 * below b1 between its levels, but sharing R with site A keeps R older than about 1000, and b2
 * moves older with it (site B alone: p(b2 = x) ∝ sum K_B 1[dB3 < x < dB1] (dB1 - x)).
 */
import { describe, expect, it } from 'vitest';
import { boundaryWeight, mixtureOnWindow } from '../age-model/fixtures/exact-continuous-model';
import { normalDensity } from '../common/density';
import { runJointChain, summariseJointChains } from './joint-age-model';
import { buildJointModel } from './joint-model';
import type { JointChainSettings, JointModelInput, JointSiteInput } from './types';

function twoEventSite(id: string, oldCalBp: number, youngCalBp: number): JointSiteInput {
  return {
    siteId: id,
    siteName: `Site ${id}`,
    depthModel: 'ORDER_ONLY',
    column: {
      units: [1, 2, 3].map((p) => ({ id: `${id}u${p}`, position: p, topDepthM: null, baseDepthM: null })),
      eventHorizons: [
        { id: `${id}1`, name: `${id}1`, unitBelowId: `${id}u1`, unitAboveId: `${id}u2` },
        { id: `${id}2`, name: `${id}2`, unitBelowId: `${id}u2`, unitAboveId: `${id}u3` },
      ],
      samples: [
        { id: `${id}-old`, unitId: `${id}u1`, depthM: null, ageRelation: 'DATES_DEPOSIT', likelihood: normalDensity(oldCalBp, 40) },
        { id: `${id}-young`, unitId: `${id}u3`, depthM: null, ageRelation: 'DATES_DEPOSIT', likelihood: normalDensity(youngCalBp, 40) },
      ],
    },
  };
}

const INPUT: JointModelInput = {
  sites: [twoEventSite('A', 2000, 1000), twoEventSite('B', 1500, 500)],
  regionalEvents: [{ regionalEventId: 'R', name: 'R', members: [{ siteId: 'A', eventHorizonId: 'A2' }, { siteId: 'B', eventHorizonId: 'B1' }] }],
};

const SETTINGS: Omit<JointChainSettings, 'chainIndex'> = {
  seed: 2_024,
  iterations: 8_000,
  burnIn: 1_000,
  thin: 4,
  outlierPrior: 0.05,
  outlierShiftScaleYears: 500,
  inheritanceScaleYears: 100,
  windowMarginYears: 1_000,
};

interface Cells {
  readonly at: Float64Array;
  readonly weight: Float64Array;
}

/** A level's mixture likelihood on the window in cells: 2 years within 160 of its mean, 20 beyond. */
function levelCells(calBp: number, young: number, old: number): Cells {
  const start = Math.floor(calBp - 240);
  const probabilities = Float64Array.from({ length: 481 }, (_, i) => Math.exp(-0.5 * ((start + i - calBp) / 40) ** 2));
  const likelihood = mixtureOnWindow({ startCalBp: start, probabilities }, young, old, SETTINGS.outlierPrior, SETTINGS.outlierShiftScaleYears);
  const at: number[] = [];
  const weight: number[] = [];
  for (let i = 0; i < likelihood.length; ) {
    const y = young + i;
    const step = Math.min(Math.abs(y - calBp) <= 160 ? 2 : 20, likelihood.length - i);
    let w = 0;
    for (let k = 0; k < step; k++) w += likelihood[i + k];
    at.push(y + (step - 1) / 2);
    weight.push(w);
    i += step;
  }
  return { at: Float64Array.from(at), weight: Float64Array.from(weight) };
}

/** Per-year densities (index year - young) of R, a1 and b2 under the exact joint model. */
function exactJoint(young: number, old: number): { R: Float64Array; a1: Float64Array; b2: Float64Array; b2Alone: Float64Array } {
  const E0 = young - 0.5;
  const E1 = old + 0.5;
  const width = old - young + 1;
  const index = (x: number, above: boolean): number =>
    // First year strictly above x (above) or last year strictly below x, as an index.
    above ? Math.floor(x) + 1 - young : Math.ceil(x) - 1 - young;
  /** Add value over the years strictly between lo and hi to a difference array. */
  const addBetween = (diff: Float64Array, lo: number, hi: number, value: number): void => {
    const first = Math.max(0, index(lo, true));
    const last = Math.min(width - 1, index(hi, false));
    if (last < first) return;
    diff[first] += value;
    diff[last + 1] -= value;
  };
  const running = (diff: Float64Array): Float64Array => {
    const out = new Float64Array(width);
    let sum = 0;
    for (let i = 0; i < width; i++) out[i] = sum += diff[i];
    return out;
  };
  const pairs = (older: Cells, younger: Cells, visit: (dOld: number, dYoung: number, k: number) => void): void => {
    for (let a = 0; a < younger.at.length; a++) {
      for (let c = 0; c < older.at.length; c++) {
        const dYoung = younger.at[a];
        const dOld = older.at[c];
        if (!(dOld > dYoung)) continue;
        visit(dOld, dYoung, younger.weight[a] * older.weight[c] * boundaryWeight(dYoung, dOld, E0, E1, 4));
      }
    }
  };
  const A1 = levelCells(2000, young, old);
  const A3 = levelCells(1000, young, old);
  const B1 = levelCells(1500, young, old);
  const B3 = levelCells(500, young, old);
  // F_A(y) = C_A(y) - y S_A(y); F_B(y) = y S_B(y) - C_B(y).
  const cA = new Float64Array(width + 1);
  const sA = new Float64Array(width + 1);
  pairs(A1, A3, (dOld, dYoung, k) => {
    addBetween(cA, dYoung, dOld, k * dOld);
    addBetween(sA, dYoung, dOld, k);
  });
  const cB = new Float64Array(width + 1);
  const sB = new Float64Array(width + 1);
  const oB = new Float64Array(width + 1);
  pairs(B1, B3, (dOld, dYoung, k) => {
    addBetween(cB, dYoung, dOld, k * dYoung);
    addBetween(sB, dYoung, dOld, k);
    addBetween(oB, dYoung, dOld, k * dOld);
  });
  const CA = running(cA);
  const SA = running(sA);
  const CB = running(cB);
  const SB = running(sB);
  const FA = Float64Array.from({ length: width }, (_, i) => Math.max(0, CA[i] - (young + i) * SA[i]));
  const FB = Float64Array.from({ length: width }, (_, i) => Math.max(0, (young + i) * SB[i] - CB[i]));
  const R = Float64Array.from({ length: width }, (_, i) => FA[i] * FB[i]);
  // Cumulative integrals of F_B and F_A over whole years up to (and including) each year.
  const cumB = running(Float64Array.from({ length: width + 1 }, (_, i) => (i < width ? FB[i] : 0)));
  const cumA = running(Float64Array.from({ length: width + 1 }, (_, i) => (i < width ? FA[i] : 0)));
  const at = (cum: Float64Array, x: number): number => {
    const i = index(x, false);
    return i < 0 ? 0 : cum[Math.min(i, width - 1)];
  };
  // p(a1 = x) = sum K_A 1[dA3 < x < dA1] (cumB(x) - cumB(dA3)): the first term by S_A, the second by T_A.
  const tA = new Float64Array(width + 1);
  pairs(A1, A3, (dOld, dYoung, k) => addBetween(tA, dYoung, dOld, k * at(cumB, dYoung)));
  const TA = running(tA);
  const a1 = Float64Array.from({ length: width }, (_, i) => Math.max(0, SA[i] * (i > 0 ? cumB[i - 1] : 0) - TA[i]));
  // p(b2 = x) = sum K_B 1[dB3 < x < dB1] (cumA(dB1) - cumA(x)).
  const tB = new Float64Array(width + 1);
  pairs(B1, B3, (dOld, dYoung, k) => addBetween(tB, dYoung, dOld, k * at(cumA, dOld)));
  const TB = running(tB);
  const b2 = Float64Array.from({ length: width }, (_, i) => Math.max(0, TB[i] - SB[i] * cumA[i]));
  // Site B alone: b1 free in [b2, dB1] gives dB1 - x in place of the integral of F_A.
  const OB = running(oB);
  const b2Alone = Float64Array.from({ length: width }, (_, i) => Math.max(0, OB[i] - (young + i) * SB[i]));
  return { R, a1, b2, b2Alone };
}

function mean(density: Float64Array, young: number): number {
  let mass = 0;
  let sum = 0;
  density.forEach((p, i) => {
    mass += p;
    sum += p * (young + i);
  });
  return sum / mass;
}

function shareBelow(density: Float64Array, young: number, t: number): number {
  let mass = 0;
  let below = 0;
  density.forEach((p, i) => {
    mass += p;
    if (young + i < t) below += p;
  });
  return below / mass;
}

function drawsOf(chains: readonly { drawCount: number }[], column: (chain: number, draw: number) => number): number[] {
  const out: number[] = [];
  chains.forEach((chain, c) => {
    for (let d = 0; d < chain.drawCount; d++) out.push(column(c, d));
  });
  return out;
}

describe('joint age model against the exact joint continuous model (two 2-event sites sharing one event)', () => {
  const chains = [0, 1, 2, 3].map((chainIndex) => runJointChain(INPUT, { ...SETTINGS, chainIndex }));
  const result = summariseJointChains(INPUT, chains, { maxStoredDraws: 1_000 });
  const { youngCalBp: young, oldCalBp: old } = buildJointModel(INPUT, SETTINGS).window;
  const exact = exactJoint(young, old);
  const siteEvent = (id: string) => chains[0].siteEvents.findIndex((e) => e.eventHorizonId === id);
  const E = chains[0].siteEvents.length;
  const draws = {
    R: drawsOf(chains, (c, d) => chains[c].regionalEvents[d]),
    a1: drawsOf(chains, (c, d) => chains[c].siteEventDraws[d * E + siteEvent('A1')]),
    b2: drawsOf(chains, (c, d) => chains[c].siteEventDraws[d * E + siteEvent('B2')]),
  };
  const sampleMean = (values: number[]) => values.reduce((a, b) => a + b, 0) / values.length;

  it('converges', () => {
    expect(result.diagnostics.converged).toBe(true);
    expect(result.diagnostics.minEss).toBeGreaterThan(2_000);
  });

  it('matches the exact means of the tied event and of the events on either side of it', () => {
    // Source: the exact sums above [analytic]. Tolerance: the Monte Carlo error of a mean over
    // ESS > 2,000 draws of a posterior with sd 100-250 years is 2-5 years; 8 allows 3 such errors
    // at the widest.
    for (const key of ['R', 'a1', 'b2'] as const) {
      expect(Math.abs(sampleMean(draws[key]) - mean(exact[key], young)), key).toBeLessThan(8);
    }
  });

  it('matches the exact probabilities below three ages', () => {
    // Tolerance 0.02: about three Monte Carlo standard errors of a share near 0.5 over ESS 2,000.
    for (const [key, t] of [['R', 1200], ['a1', 1600], ['b2', 900]] as const) {
      const model = draws[key].filter((x) => x < t).length / draws[key].length;
      expect(Math.abs(model - shareBelow(exact[key], young, t)), `${key} below ${t}`).toBeLessThan(0.02);
    }
  });

  it('lets the tie inform the untied events: b2 moves older than site B alone would put it', () => {
    // Site B alone (same window) puts b1 and b2 anywhere in order between its levels; tied, b1 is
    // also younger than site A's old level and older than its young level (about 1000 cal BP).
    const alone = mean(exact.b2Alone, young);
    expect(alone).toBeLessThan(850);
    expect(mean(exact.b2, young)).toBeGreaterThan(alone + 30);
    expect(sampleMean(draws.b2)).toBeGreaterThan(alone + 30);
});
});

/**
 * Two ties between the same two sites, where the product of marginals and the joint model part:
 *
 *   site A: dA3 <= R2 <= dA2 <= R1 <= dA1,  levels 2000, 1500 and 1000 +- 40 cal BP (m = 5),
 *   site B: dB3 <= R2 <= R1 <= dB1,         levels 2100 and 1200 +- 40 cal BP, middle unit undated (m = 4).
 *
 * Exactly, with the boundaries integrated out as above,
 *
 *   p(R1, R2) ∝ 1[R2 < R1] [sum over dA2 in (R2, R1) of L(dA2)] H_A(R1, R2) H_B(R1, R2),
 *   H_s(R1, R2) = sum K_s over the site's oldest level older than R1 and youngest level younger than R2,
 *
 * summed on a 2-year grid of (R1, R2). The product of marginals multiplies site A's marginal of R1
 * by site B's, which still holds B's own prior belief about where R2 lies between its levels; the
 * joint model replaces that belief by what A says about R2.
 */
describe('joint age model against the exact joint model with two ties between two sites', () => {
  const site = (id: string, levels: readonly (number | null)[]): JointSiteInput => ({
    siteId: id,
    siteName: `Site ${id}`,
    depthModel: 'ORDER_ONLY',
    column: {
      units: [1, 2, 3].map((p) => ({ id: `${id}u${p}`, position: p, topDepthM: null, baseDepthM: null })),
      eventHorizons: [
        { id: `${id}1`, name: `${id}1`, unitBelowId: `${id}u1`, unitAboveId: `${id}u2` },
        { id: `${id}2`, name: `${id}2`, unitBelowId: `${id}u2`, unitAboveId: `${id}u3` },
      ],
      samples: levels.flatMap((calBp, i) =>
        calBp === null
          ? []
          : [{ id: `${id}-${i + 1}`, unitId: `${id}u${i + 1}`, depthM: null, ageRelation: 'DATES_DEPOSIT' as const, likelihood: normalDensity(calBp, 40) }],
      ),
    },
  });
  const input: JointModelInput = {
    sites: [site('A', [2000, 1500, 1000]), site('B', [2100, null, 1200])],
    regionalEvents: [
      { regionalEventId: 'R1', name: 'R1', members: [{ siteId: 'A', eventHorizonId: 'A1' }, { siteId: 'B', eventHorizonId: 'B1' }] },
      { regionalEventId: 'R2', name: 'R2', members: [{ siteId: 'A', eventHorizonId: 'A2' }, { siteId: 'B', eventHorizonId: 'B2' }] },
    ],
  };
  const chains = [0, 1, 2, 3].map((chainIndex) => runJointChain(input, { ...SETTINGS, chainIndex }));
  const result = summariseJointChains(input, chains, { maxStoredDraws: 100 });
  const { youngCalBp: young, oldCalBp: old } = buildJointModel(input, SETTINGS).window;
  const E0 = young - 0.5;
  const E1 = old + 0.5;

  /** C[a][c] = sum of K over young cells <= a and old cells >= c (2-D running sums). */
  const pairTable = (olderLevel: Cells, youngerLevel: Cells, m: number): Float64Array[] => {
    const na = youngerLevel.at.length;
    const nc = olderLevel.at.length;
    const table = Array.from({ length: na }, () => new Float64Array(nc + 1));
    for (let a = 0; a < na; a++) {
      for (let c = nc - 1; c >= 0; c--) {
        const dYoung = youngerLevel.at[a];
        const dOld = olderLevel.at[c];
        const k = dOld > dYoung ? youngerLevel.weight[a] * olderLevel.weight[c] * boundaryWeight(dYoung, dOld, E0, E1, m) : 0;
        table[a][c] = k + table[a][c + 1] + (a > 0 ? table[a - 1][c] - table[a - 1][c + 1] : 0);
      }
    }
    return table;
  };
  /** H(R1, R2): the oldest level above R1 and the youngest below R2. */
  const lookup = (table: Float64Array[], olderLevel: Cells, youngerLevel: Cells) => (r1: number, r2: number): number => {
    let a = -1;
    while (a + 1 < youngerLevel.at.length && youngerLevel.at[a + 1] < r2) a++;
    let c = 0;
    while (c < olderLevel.at.length && olderLevel.at[c] <= r1) c++;
    return a < 0 || c >= olderLevel.at.length ? 0 : table[a][c];
  };
  const A1 = levelCells(2000, young, old);
  const A2 = levelCells(1500, young, old);
  const A3 = levelCells(1000, young, old);
  const B1 = levelCells(2100, young, old);
  const B3 = levelCells(1200, young, old);
  const hA = lookup(pairTable(A1, A3, 5), A1, A3);
  const hB = lookup(pairTable(B1, B3, 4), B1, B3);
  const middleMass = (r1: number, r2: number): number => {
    let sum = 0;
    A2.at.forEach((x, i) => {
      if (x > r2 && x < r1) sum += A2.weight[i];
    });
    return sum;
  };
  // R1 and R2 on a 2-year grid over the years where the levels leave them room.
  const grid = Array.from({ length: Math.floor((2_400 - 800) / 2) + 1 }, (_, i) => 800 + 2 * i);
  const joint = { R1: 0, R2: 0, mass: 0, R1below: 0 };
  const aloneA = new Map<number, number>();
  const aloneB = new Map<number, number>();
  for (const r1 of grid) {
    for (const r2 of grid) {
      if (!(r2 < r1)) continue;
      const a = hA(r1, r2) * middleMass(r1, r2);
      const b = hB(r1, r2);
      const w = a * b;
      joint.mass += w;
      joint.R1 += w * r1;
      joint.R2 += w * r2;
      if (r1 < 1700) joint.R1below += w;
      aloneA.set(r1, (aloneA.get(r1) ?? 0) + a);
      aloneB.set(r1, (aloneB.get(r1) ?? 0) + b);
    }
  }
  const exactR1 = joint.R1 / joint.mass;
  const exactR2 = joint.R2 / joint.mass;
  let productMass = 0;
  let productR1 = 0;
  for (const r1 of grid) {
    const w = (aloneA.get(r1) ?? 0) * (aloneB.get(r1) ?? 0);
    productMass += w;
    productR1 += w * r1;
  }
  productR1 /= productMass;
  const draws = (k: number): number[] => chains.flatMap((c) => Array.from({ length: c.drawCount }, (_, d) => c.regionalEvents[d * 2 + k]));
  const mean = (values: number[]) => values.reduce((x, y) => x + y, 0) / values.length;

  it('matches the exact joint means and a probability of R1, where the product of marginals does not', () => {
    expect(result.diagnostics.converged).toBe(true);
    // Source: the exact grid sum [analytic]; tolerances as in the single-tie case.
    expect(Math.abs(mean(draws(0)) - exactR1)).toBeLessThan(8);
    expect(Math.abs(mean(draws(1)) - exactR2)).toBeLessThan(8);
    const below = draws(0).filter((x) => x < 1700).length / draws(0).length;
    expect(Math.abs(below - joint.R1below / joint.mass)).toBeLessThan(0.02);
    // The product of marginals puts R1 elsewhere: the difference the joint model exists for.
    expect(Math.abs(productR1 - exactR1)).toBeGreaterThan(20);
  });
});
