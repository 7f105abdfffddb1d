import { describe, expect, it } from 'vitest';
import { AgeModelCancelled } from '../age-model/age-model';
import { JointSiteInput } from './types';
import { normalDensity } from '../common/density';
import { JointModelInputError, runJointChain, summariseJointChains } from './index';
import type { JointChainSettings, JointModelInput } from './types';

/** A site column of units dated one sample each (ages base first), an event at every contact. */
function site(id: string, ages: readonly number[], sd = 40): JointSiteInput {
  const units = ages.map((_, i) => ({ id: `${id}u${i + 1}`, position: i + 1, topDepthM: null, baseDepthM: null }));
  const eventHorizons = ages.slice(1).map((_, i) => ({
    id: `${id}e${i + 1}`,
    name: `${id}-E${ages.length - 1 - i}`,
    unitBelowId: `${id}u${i + 1}`,
    unitAboveId: `${id}u${i + 2}`,
  }));
  const samples = ages.map((age, i) => ({
    id: `${id}s${i + 1}`,
    unitId: `${id}u${i + 1}`,
    depthM: null,
    ageRelation: 'DATES_DEPOSIT' as const,
    likelihood: normalDensity(age, sd),
  }));
  return { siteId: id, siteName: `Site ${id}`, column: { units, eventHorizons, samples }, depthModel: 'ORDER_ONLY' };
}

const SETTINGS: Omit<JointChainSettings, 'chainIndex'> = {
  seed: 11,
  iterations: 3_000,
  burnIn: 500,
  thin: 3,
  outlierPrior: 0.05,
  outlierShiftScaleYears: 500,
  inheritanceScaleYears: 100,
  windowMarginYears: 1_000,
};

function runAll(input: JointModelInput, settings = SETTINGS, chains = 4) {
  return Array.from({ length: chains }, (_, chainIndex) => runJointChain(input, { ...settings, chainIndex }));
}

describe('joint age model input checks', () => {
  const sites = [site('A', [2000, 1500, 1000]), site('B', [1800, 1300, 800]), site('C', [1900, 1400, 900])];

  it('refuses a member that is not in its site column, naming it', () => {
    const input: JointModelInput = {
      sites,
      regionalEvents: [{ regionalEventId: 'R1', name: 'R1', members: [{ siteId: 'A', eventHorizonId: 'Ae1' }, { siteId: 'B', eventHorizonId: 'nope' }] }],
    };
    expect(() => runJointChain(input, { ...SETTINGS, chainIndex: 0 })).toThrow(JointModelInputError);
    expect(() => runJointChain(input, { ...SETTINGS, chainIndex: 0 })).toThrow(/"nope" at site "Site B"/);
  });

  it('refuses two members at one site', () => {
    const input: JointModelInput = {
      sites,
      regionalEvents: [{ regionalEventId: 'R1', name: 'R1', members: [{ siteId: 'A', eventHorizonId: 'Ae1' }, { siteId: 'A', eventHorizonId: 'Ae2' }] }],
    };
    expect(() => runJointChain(input, { ...SETTINGS, chainIndex: 0 })).toThrow(/two members at site "Site A": "A-E2" and "A-E1"/);
  });

  it('refuses an order cycle through three sites that no pair shows, naming its sites and events', () => {
    // X older than Z at A, Y older than X at B, Z older than Y at C: consistent pairwise, impossible jointly.
    const regionalEvents = [
      { regionalEventId: 'X', name: 'X', members: [{ siteId: 'A', eventHorizonId: 'Ae1' }, { siteId: 'B', eventHorizonId: 'Be2' }] },
      { regionalEventId: 'Y', name: 'Y', members: [{ siteId: 'B', eventHorizonId: 'Be1' }, { siteId: 'C', eventHorizonId: 'Ce2' }] },
      { regionalEventId: 'Z', name: 'Z', members: [{ siteId: 'C', eventHorizonId: 'Ce1' }, { siteId: 'A', eventHorizonId: 'Ae2' }] },
    ];
    let error: unknown;
    try {
      runJointChain({ sites, regionalEvents }, { ...SETTINGS, chainIndex: 0 });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(JointModelInputError);
    const message = (error as Error).message;
    expect(message).toMatch(/order cycle/);
    for (const name of ['"Site A"', '"Site B"', '"Site C"', '"X"', '"Y"', '"Z"']) expect(message).toContain(name);
    expect((error as JointModelInputError).subjectIds).toEqual(expect.arrayContaining(['X', 'Y', 'Z', 'A', 'B', 'C']));
  });

  it('refuses a site whose column cannot be modelled, naming the site', () => {
    const bad: JointSiteInput = { ...site('D', [1000, 500]), siteName: 'Dry Creek' };
    const column = { ...bad.column, samples: [] };
    expect(() => runJointChain({ sites: [{ ...bad, column }], regionalEvents: [] }, { ...SETTINGS, chainIndex: 0 })).toThrow(/Dry Creek/);
  });

  it('stops with AgeModelCancelled when asked', () => {
    expect(() => runJointChain({ sites, regionalEvents: [] }, { ...SETTINGS, chainIndex: 0 }, { shouldCancel: () => true })).toThrow(
      AgeModelCancelled,
    );
  });
});

describe('joint age model runs', () => {
  // Site A dates its event between 2000 and 1000, site B between 1500 and 500 (each +-40): one
  // shared event must lie in both intervals, so roughly between 1000 and 1500.
  const input: JointModelInput = {
    sites: [site('A', [2000, 1000]), site('B', [1500, 500])],
    regionalEvents: [{ regionalEventId: 'R', name: 'R', members: [{ siteId: 'A', eventHorizonId: 'Ae1' }, { siteId: 'B', eventHorizonId: 'Be1' }] }],
  };

  it('puts a shared event where both columns allow it, with converged chains and consistent outputs', () => {
    const chains = runAll(input);
    const result = summariseJointChains(input, chains, { maxStoredDraws: 500 });
    const [regional] = result.regionalEvents;
    // Both intervals hold it: nothing much outside 1000-1500 (the deposits' 2 sd tails aside).
    expect(regional.summary.hpd95[0].youngerCalBp).toBeGreaterThan(900);
    expect(regional.summary.hpd95[regional.summary.hpd95.length - 1].olderCalBp).toBeLessThan(1600);
    expect(result.diagnostics.converged).toBe(true);
    // Every draw keeps the order at both sites: A's younger deposit < R < A's older, same at B.
    const { draws, drawCount } = result.regionalEventDraws;
    expect(drawCount).toBe(500);
    const sampleIndex = (id: string) => chains[0].samples.findIndex((s) => s.sampleId === id);
    for (const chain of chains) {
      for (let d = 0; d < chain.drawCount; d++) {
        const r = chain.regionalEvents[d];
        const row = (id: string) => chain.sampleDraws[d * chain.samples.length + sampleIndex(id)];
        expect(r).toBeGreaterThanOrEqual(row('As2'));
        expect(r).toBeLessThanOrEqual(row('As1'));
        expect(r).toBeGreaterThanOrEqual(row('Bs2'));
        expect(r).toBeLessThanOrEqual(row('Bs1'));
      }
    }
    for (let i = 0; i < drawCount; i++) expect(Number.isFinite(draws[i])).toBe(true);
    // Members report their regional event's posterior.
    expect(result.siteEvents.map((e) => e.summary.medianCalBp)).toEqual([regional.summary.medianCalBp, regional.summary.medianCalBp]);
    expect(result.samples.every((s) => s.outlierProbability > 0 && s.outlierProbability < 0.2)).toBe(true);
  }, 60_000);

  it('gives the same draws for the same seed and chain, other draws for another chain', () => {
    const settings = { ...SETTINGS, iterations: 240, burnIn: 0, thin: 3 };
    const a = runJointChain(input, { ...settings, chainIndex: 1 });
    const b = runJointChain(input, { ...settings, chainIndex: 1 });
    const c = runJointChain(input, { ...settings, chainIndex: 2 });
    expect(Array.from(a.regionalEvents)).toEqual(Array.from(b.regionalEvents));
    expect(Array.from(a.regionalEvents)).not.toEqual(Array.from(c.regionalEvents));
  });

  it('reports rising progress ending at 1', () => {
    const seen: number[] = [];
    runJointChain(input, { ...SETTINGS, iterations: 1_200, burnIn: 0, chainIndex: 0 }, { onProgress: (f) => seen.push(f) });
    expect(seen.length).toBeGreaterThan(2);
    expect(seen[seen.length - 1]).toBe(1);
    for (let i = 1; i < seen.length; i++) expect(seen[i]).toBeGreaterThan(seen[i - 1]);
  });
});
