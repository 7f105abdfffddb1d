import { describe, expect, it } from 'vitest';
import { builtInCurve } from '../../../reference-data/reference-data';
import { HpdRange } from '../../common/density';
import { SeededRandom } from '../../common/random';
import { ColumnUnit } from '../column';
import { coreDepthScale, hemipelagicProblems } from './core-depth';
import { kernelDensity, runHemipelagicModel } from './hemipelagic-model';
import { DEFAULT_SIMULATED_CORE, simulateCore } from './simulated-core';

const unit = (id: string, position: number, top: number, base: number, facies: string, basalErosionM: number | null = null): ColumnUnit => ({
  id, name: id, position, topDepthM: top, baseDepthM: base, facies, basalErosionM,
});

/** Mud 0-0.1, bed 0.1-0.25 (eroded 0.02), mud 0.25-0.4, bed 0.4-0.48, mud 0.48-0.7. */
const core = [
  unit('M3', 1, 0.48, 0.7, 'HEMIPELAGIC_MUD'),
  unit('T2', 2, 0.4, 0.48, 'TURBIDITE'),
  unit('M2', 3, 0.25, 0.4, 'HEMIPELAGIC_MUD'),
  unit('T1', 4, 0.1, 0.25, 'TURBIDITE', 0.02),
  unit('M1', 5, 0, 0.1, 'HEMIPELAGIC_MUD'),
];

describe(coreDepthScale.name, () => {
  it('removes each bed above a depth and stands still through a bed [analytic]', () => {
    const scale = coreDepthScale(core);
    expect(scale.eventFreeDepth(0.05)).toBeCloseTo(0.05, 12);
    expect(scale.eventFreeDepth(0.2)).toBeCloseTo(0.1, 12);
    expect(scale.eventFreeDepth(0.25)).toBeCloseTo(0.1, 12);
    expect(scale.eventFreeDepth(0.3)).toBeCloseTo(0.15, 12);
    expect(scale.eventFreeDepth(0.7)).toBeCloseTo(0.7 - 0.15 - 0.08, 12);
    expect(scale.eventFreeLengthM).toBeCloseTo(0.47, 12);
    expect(scale.contacts.filter((c) => c.erosionEstimateM > 0).map((c) => [c.depthM, c.erosionEstimateM])).toEqual([[0.25, 0.02]]);
  });
});

describe(hemipelagicProblems.name, () => {
  it('asks for hemipelagic mud and for sample depths', () => {
    const trench = { units: [unit('A', 1, 1, 2, 'SOIL'), unit('B', 2, 0, 1, 'COLLUVIUM')], eventHorizons: [], samples: [] };
    expect(hemipelagicProblems(trench).join(' ')).toMatch(/HEMIPELAGIC_MUD/);
    expect(hemipelagicProblems({ units: core, eventHorizons: [], samples: [] })).toEqual([]);
  });
});

describe(kernelDensity.name, () => {
  it('recovers a normal density from its draws: mean and sd within Monte Carlo error [analytic]', () => {
    const random = new SeededRandom(4);
    const draws = Float64Array.from({ length: 8000 }, () => 2000 + 50 * random.normal());
    const density = kernelDensity(draws);
    let mean = 0;
    density.probabilities.forEach((p, i) => (mean += p * (density.startCalBp + i)));
    let variance = 0;
    density.probabilities.forEach((p, i) => (variance += p * (density.startCalBp + i - mean) ** 2));
    expect(mean).toBeCloseTo(2000, -0.5);
    // Smoothing adds the kernel's variance h^2 (h about 9 years here): sqrt(50^2 + 9^2) = 50.8.
    expect(Math.sqrt(variance)).toBeGreaterThan(49);
    expect(Math.sqrt(variance)).toBeLessThan(53);
  });
});

function covers(ranges: readonly HpdRange[], truth: number): boolean {
  return ranges.some((r) => truth <= r.olderCalBp + 0.5 && truth >= r.youngerCalBp - 0.5);
}

describe(runHemipelagicModel.name, () => {
  /**
   * Simulated cores (`simulated-core.ts`, a generator that is not the model's prior): eight beds
   * over about 4,300 years with three dated foram levels (Marine20, one shared true Delta-R, one
   * level in ten displaced), the case where the ordering model gave 95.4 % ranges about 5,500
   * years wide missing three of eight true ages (issue 12). Four seeded cores here; the larger run
   * and its coverage figures are in `npm run bench`.
   */
  it('dates the beds of simulated cores with ranges a fraction of the ordering model\'s, covering true ages near nominal', () => {
    const marine = builtInCurve('MARINE20');
    let covered95 = 0;
    let covered68 = 0;
    let total = 0;
    let widest = 0;
    let worstRhat = 0;
    let smallestEss = Infinity;
    for (let seed = 11; seed <= 14; seed++) {
      const simulated = simulateCore(marine, { ...DEFAULT_SIMULATED_CORE, seed });
      const result = runHemipelagicModel(simulated.input, { seed, iterations: 2_000, burnIn: 1_000, thin: 2 });
      expect(result.events).toHaveLength(8);
      worstRhat = Math.max(worstRhat, result.diagnostics.maxRhat);
      smallestEss = Math.min(smallestEss, result.diagnostics.minEss);
      for (const event of result.events) {
        total++;
        if (covers(event.summary.hpd95, simulated.trueEventAges.get(event.eventHorizonId)!)) covered95++;
        if (covers(event.summary.hpd68, simulated.trueEventAges.get(event.eventHorizonId)!)) covered68++;
        widest = Math.max(widest, event.summary.hpd95[0].olderCalBp - event.summary.hpd95[event.summary.hpd95.length - 1].youngerCalBp);
      }
      // The curve is monotone in depth: deeper mud is never younger (medians).
      for (let p = 1; p < result.ageDepth.length; p++) {
        expect(result.ageDepth[p].medianCalBp).toBeGreaterThanOrEqual(result.ageDepth[p - 1].medianCalBp - 1e-6);
      }
    }
    expect(widest).toBeLessThan(2500);
    // The chains mix at half the default sweeps (the adaptive Metropolis sampler used before reached
    // split R-hat 1.12 and ESS 23 on such cores at its defaults; these four give 1.02 and 232).
    expect(worstRhat).toBeLessThan(1.05);
    expect(smallestEss).toBeGreaterThan(100);
    // CI-sized (32 events): at nominal 95.4 % fewer than 27 covered has probability 0.3 %, and the
    // 68.3 % count lies in 16-27 with probability about 98 % [binomial, jstat]. The large run (over 200
    // events) is `npm run bench -- core coverage`.
    expect(covered95).toBeGreaterThanOrEqual(27);
    expect(covered68).toBeGreaterThanOrEqual(16);
    expect(covered68).toBeLessThanOrEqual(27);
  }, 60_000);

  it('refuses a core whose rate cannot be measured when none is given', () => {
    const marine = builtInCurve('MARINE20');
    const simulated = simulateCore(marine, { ...DEFAULT_SIMULATED_CORE, seed: 3, levels: 1 });
    expect(() => runHemipelagicModel(simulated.input, { seed: 1, iterations: 800, burnIn: 100, thin: 10 })).toThrow(/rate cannot be measured/);
    const given = runHemipelagicModel(simulated.input, { seed: 1, iterations: 500, burnIn: 200, thin: 5, hemipelagic: { rateMeanCmPerKyr: 15 } });
    expect(given.hemipelagic.rateMeanSource).toBe('GIVEN');
  });
});
