import { describe, expect, it } from 'vitest';
import { normalDensity } from '../../chronology/common/density';
import type { JointChainDraws } from '../../chronology/joint-age-model/types';
import { chainSettings, jointRunSettings } from './joint-run-settings';
import { progressOf } from './joint-run-settler';
import { loadChainDraws, loadJointInput, regionalDrawsOf, storeChainDraws, storeJointInput } from './joint-run-storage';

describe('regionalDrawsOf', () => {
  // Three joint draws of regional events x, y, z (row-major), written out by hand.
  const stored = { regionalEventIds: ['x', 'y', 'z'], drawCount: 3, draws: [10, 20, 30, 11, 21, 31, 12, 22, 32] };

  it('keeps each row together when picking and reordering columns', () => {
    const picked = regionalDrawsOf(stored, ['z', 'x']);
    expect(picked?.eventCount).toBe(2);
    expect(picked?.drawCount).toBe(3);
    expect(Array.from(picked!.draws)).toEqual([30, 10, 31, 11, 32, 12]);
  });

  it('is null when the run did not model one of the events (the analysis then falls back)', () => {
    expect(regionalDrawsOf(stored, ['x', 'w'])).toBeNull();
  });
});

describe('stored chains and inputs', () => {
  it('round-trip a chain, ages to a tenth of a year', () => {
    const draws: JointChainDraws = {
      chainIndex: 1,
      drawCount: 2,
      regionalEventIds: ['r'],
      regionalEvents: Float64Array.of(1000.04, 999.96),
      siteEvents: [{ siteId: 's', eventHorizonId: 'e' }],
      siteEventDraws: Float64Array.of(1000.04, 999.96),
      samples: [],
      sampleDraws: new Float64Array(0),
      outlierShare: new Float64Array(0),
      acceptance: { shift: 0.25 },
      siteEventDensities: [{ startCalBp: 999, probabilities: Float64Array.of(0.25, 0.5, 0.25) }],
    };
    const back = loadChainDraws(JSON.parse(JSON.stringify(storeChainDraws(draws))));
    expect(back.siteEventDensities?.[0].startCalBp).toBe(999);
    expect(Array.from(back.siteEventDensities![0].probabilities)).toEqual([0.25, 0.5, 0.25]);
    expect(Array.from(back.regionalEvents)).toEqual([1000, 1000]);
    expect(back.siteEvents).toEqual(draws.siteEvents);
    expect(back.acceptance).toEqual({ shift: 0.25 });
  });

  it('round-trip an input with its sample likelihoods', () => {
    const likelihood = normalDensity(1500, 30);
    const input = {
      sites: [{ siteId: 's', siteName: 'S', depthModel: 'ORDER_ONLY' as const, column: {
        units: [{ id: 'u1', position: 1, topDepthM: 1, baseDepthM: 2 }, { id: 'u2', position: 2, topDepthM: 0, baseDepthM: 1 }],
        eventHorizons: [{ id: 'e', unitBelowId: 'u1', unitAboveId: 'u2' }],
        samples: [{ id: 'x', unitId: 'u1', depthM: 1.5, ageRelation: 'DATES_DEPOSIT' as const, likelihood }],
      } }],
      regionalEvents: [{ regionalEventId: 'e', name: 'E', members: [{ siteId: 's', eventHorizonId: 'e' }] }],
    };
    const back = loadJointInput(JSON.parse(JSON.stringify(storeJointInput(input))));
    expect(back.sites[0].column.samples[0].likelihood.startCalBp).toBe(likelihood.startCalBp);
    expect(Array.from(back.sites[0].column.samples[0].likelihood.probabilities)).toEqual(Array.from(likelihood.probabilities));
    expect(back.regionalEvents).toEqual(input.regionalEvents);
  });
});

describe('settings and progress', () => {
  it('burn-in is a third of the kept sweeps within 500-4000, and about 1000 draws are kept per chain', () => {
    expect(jointRunSettings(4, 500)).toMatchObject({ burnIn: 500, thin: 1 });
    // The computation's own defaults: 1,000 + 3,000 sweeps kept every 3rd.
    expect(jointRunSettings(4, 3_000)).toMatchObject({ burnIn: 1000, thin: 3 });
    expect(jointRunSettings(4, 10_000)).toMatchObject({ burnIn: 3333, thin: 10 });
    expect(jointRunSettings(4, 200_000)).toMatchObject({ burnIn: 4000, thin: 200 });
    expect(chainSettings(jointRunSettings(4, 10_000), 9, 3)).toMatchObject({ seed: 9, chainIndex: 3, iterations: 10_000 });
  });

  it('a run’s progress is the mean of its chains’, a succeeded chain counting whole', () => {
    expect(progressOf([])).toBe(0);
    expect(progressOf([{ status: 'SUCCEEDED', progress: 0.5 }, { status: 'RUNNING', progress: 0.5 }, { status: 'QUEUED', progress: 0 }, { status: 'RUNNING', progress: 0.1 }])).toBeCloseTo(0.4, 12);
  });
});
