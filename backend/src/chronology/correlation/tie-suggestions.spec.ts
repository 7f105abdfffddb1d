import { describe, expect, it } from 'vitest';
import { SeededRandom } from '../common/random';
import { dtwDistance, suggestTies, type CoreBed, type CoreForMatching } from './tie-suggestions';

/**
 * Generator of simulated core pairs (independent of the matching code): a shared history of
 * regional events, each with its own bed "fingerprint" (one to three pulses at random positions
 * and heights within the bed, as the surges of one turbidity current). Each core records each
 * event with probability 0.85 (erosion or a missed bed otherwise); its beds are 4-40 cm thick
 * with a core-specific thickness factor, pulse positions jitter by 0.04 of the bed and heights by
 * 15 %; hemipelagic mud accumulates at a core-specific 8-35 cm per thousand years over intervals
 * of 150-900 years. The magnetic-susceptibility-like log is sampled every centimetre with a
 * core-specific gain and offset (different instruments) and Gaussian noise of 12 % of the
 * typical pulse height, and a second density-like channel follows the grain size with its own
 * noise.
 */
interface SimulatedCore {
  readonly core: CoreForMatching;
  readonly eventOf: Map<string, number>;
}

interface Fingerprint {
  readonly pulses: { position: number; height: number; width: number }[];
}

function fingerprint(random: SeededRandom): Fingerprint {
  const count = 1 + random.integer(3);
  return {
    pulses: Array.from({ length: count }, () => ({
      position: 0.1 + 0.8 * random.uniform(),
      height: 0.4 + 1.6 * random.uniform(),
      width: 0.05 + 0.12 * random.uniform(),
    })),
  };
}

function simulateCore(random: SeededRandom, prints: readonly Fingerprint[], intervals: readonly number[], name: string): SimulatedCore {
  const thicknessFactor = 0.6 + 0.8 * random.uniform();
  const mudRateMPerYear = (8 + 27 * random.uniform()) / 100 / 1000;
  const gain = 20 + 40 * random.uniform();
  const offset = 5 + 30 * random.uniform();
  const densityNoise = 0.03;
  const segments: { top: number; base: number; print?: Fingerprint; jitter?: number[]; scale?: number[] }[] = [];
  const beds: CoreBed[] = [];
  const eventOf = new Map<string, number>();
  let depth = 0.02;
  // Young (top) to old (base): event 0 is the youngest.
  prints.forEach((print, e) => {
    const mud = Math.max(0.005, intervals[e] * mudRateMPerYear * (0.8 + 0.4 * random.uniform()));
    depth += mud;
    if (random.uniform() < 0.15) return; // not recorded here
    const thickness = Math.min(0.4, Math.max(0.04, (0.06 + 0.2 * random.uniform()) * thicknessFactor));
    const top = depth;
    const base = depth + thickness;
    const jitter = print.pulses.map(() => 0.04 * random.normal());
    const scale = print.pulses.map(() => 1 + 0.15 * random.normal());
    segments.push({ top, base, print, jitter, scale });
    const eventId = `${name}-bed-${e}`;
    beds.push({ eventId, topDepthM: top, baseDepthM: base });
    eventOf.set(eventId, e);
    depth = base;
  });
  depth += 0.1;
  const depthsM: number[] = [];
  const susceptibility: number[] = [];
  const density: number[] = [];
  for (let d = 0; d <= depth; d += 0.01) {
    let signal = 0;
    const bed = segments.find((s) => d >= s.top && d < s.base);
    if (bed?.print) {
      const x = (d - bed.top) / (bed.base - bed.top);
      bed.print.pulses.forEach((pulse, p) => {
        const centre = pulse.position + (bed.jitter as number[])[p];
        signal += pulse.height * (bed.scale as number[])[p] * Math.exp(-0.5 * ((x - centre) / pulse.width) ** 2);
      });
    }
    depthsM.push(d);
    susceptibility.push(offset + gain * (signal + 0.12 * random.normal()));
    density.push(1.5 + 0.25 * signal + densityNoise * random.normal());
  }
  return {
    core: {
      beds,
      channels: [
        { depthsM, values: susceptibility },
        { depthsM, values: density },
      ],
    },
    eventOf,
  };
}

function simulatePair(seed: number): { a: SimulatedCore; b: SimulatedCore; trueTies: number } {
  const random = new SeededRandom(seed);
  const events = 10 + random.integer(6);
  const prints = Array.from({ length: events }, () => fingerprint(random));
  const intervals = Array.from({ length: events }, () => 150 + 750 * random.uniform());
  const a = simulateCore(random, prints, intervals, 'A');
  const b = simulateCore(random, prints, intervals, 'B');
  const inB = new Set(b.eventOf.values());
  const trueTies = [...a.eventOf.values()].filter((e) => inB.has(e)).length;
  return { a, b, trueTies };
}

describe(dtwDistance.name, () => {
  it('is 0 for identical signatures and for a signature shifted within the band', () => {
    const x = Float64Array.from({ length: 24 }, (_, i) => Math.exp(-0.5 * ((i - 10) / 2) ** 2));
    const shifted = Float64Array.from({ length: 24 }, (_, i) => Math.exp(-0.5 * ((i - 12) / 2) ** 2));
    expect(dtwDistance(x, x, 1)).toBe(0);
    // A shift of two points is absorbed by warping (up to the ends, where nothing moves in).
    expect(dtwDistance(x, shifted, 1)).toBeLessThan(0.01);
    // Squared difference of the unwarped curves, for comparison: far larger.
    let plain = 0;
    for (let i = 0; i < 24; i++) plain += (x[i] - shifted[i]) ** 2;
    expect(plain / 24).toBeGreaterThan(10 * dtwDistance(x, shifted, 1));
  });

  it('cannot warp beyond the Sakoe-Chiba band', () => {
    // A pulse at 4 against one at 20: sixteen points apart, beyond the band of six.
    const early = Float64Array.from({ length: 24 }, (_, i) => (i === 4 ? 1 : 0));
    const late = Float64Array.from({ length: 24 }, (_, i) => (i === 20 ? 1 : 0));
    expect(dtwDistance(early, late, 1, 6)).toBeGreaterThan(0);
    expect(dtwDistance(early, late, 1, 24)).toBe(0);
  });
});

describe(suggestTies.name, () => {
  it('recovers at least 80 % of the true ties between simulated cores with noisy logs', () => {
    let trueTies = 0;
    let recovered = 0;
    let suggested = 0;
    let correct = 0;
    for (let seed = 1; seed <= 40; seed++) {
      const pair = simulatePair(seed);
      const suggestions = suggestTies(pair.a.core, pair.b.core);
      trueTies += pair.trueTies;
      suggested += suggestions.length;
      for (const s of suggestions) {
        const right = pair.a.eventOf.get(s.eventAId) === pair.b.eventOf.get(s.eventBId);
        if (right) {
          recovered++;
          correct++;
        }
      }
      // Every suggestion is in order down both cores.
      for (let k = 1; k < suggestions.length; k++) {
        expect(pair.a.eventOf.get(suggestions[k].eventAId) as number).toBeGreaterThan(pair.a.eventOf.get(suggestions[k - 1].eventAId) as number);
        expect(pair.b.eventOf.get(suggestions[k].eventBId) as number).toBeGreaterThan(pair.b.eventOf.get(suggestions[k - 1].eventBId) as number);
      }
    }
    const recall = recovered / trueTies;
    console.log(`tie suggestions: ${trueTies} true ties, recall ${recall.toFixed(3)}, precision ${(correct / suggested).toFixed(3)}`);
    const precision = correct / suggested;
    expect(trueTies).toBeGreaterThan(300);
    expect(recall).toBeGreaterThanOrEqual(0.8);
    // Wrong suggestions must stay rare too, or a correlator learns to ignore them.
    expect(precision).toBeGreaterThanOrEqual(0.8);
  });

  it('gives higher scores to true pairs than to wrong ones', () => {
    // Over twenty simulated pairs (one pair's noise can make a wrong match look good).
    const rightScores: number[] = [];
    const wrongScores: number[] = [];
    const suggestions = Array.from({ length: 20 }, (_, i) => simulatePair(90 + i)).flatMap((pair) => {
      const found = suggestTies(pair.a.core, pair.b.core, { minimumScore: 0 });
      for (const s of found) {
        (pair.a.eventOf.get(s.eventAId) === pair.b.eventOf.get(s.eventBId) ? rightScores : wrongScores).push(s.score);
      }
      return found;
    });
    const mean = (xs: number[]) => xs.reduce((x, y) => x + y, 0) / xs.length;
    expect(wrongScores.length).toBeGreaterThan(0);
    expect(mean(rightScores)).toBeGreaterThan(mean(wrongScores));
    for (const s of suggestions) {
      expect(s.score).toBeGreaterThan(0);
      expect(s.score).toBeLessThanOrEqual(1);
    }
  });

  it('passes through an existing tie and keeps order around it', () => {
    const pair = simulatePair(7);
    const anchorA = pair.a.core.beds[0].eventId;
    const anchorB = pair.b.core.beds[pair.b.core.beds.length - 1].eventId;
    const suggestions = suggestTies(pair.a.core, pair.b.core, { anchors: [[anchorA, anchorB]] });
    // Tying A's top bed to B's lowest leaves no room for any other pair in order.
    expect(suggestions).toEqual([expect.objectContaining({ eventAId: anchorA, eventBId: anchorB, anchored: true })]);
  });

  it('refuses cores without shared channels', () => {
    const pair = simulatePair(3);
    expect(() => suggestTies(pair.a.core, { ...pair.b.core, channels: [] })).toThrow(RangeError);
  });
});
