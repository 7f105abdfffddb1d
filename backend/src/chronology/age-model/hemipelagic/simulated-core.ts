/**
 * Simulated turbidite cores with a known history, for validating the hemipelagic depth model from
 * outside: the generator is deliberately not the model's prior. Intervals between events are
 * uniform, mud accumulates at a rate per interval drawn lognormally about a core's own base rate
 * (no gamma innovations, no autoregressive memory) that changes again halfway through each
 * interval (so no section of the model is exactly right), beds erode a uniform thickness of
 * the mud below them, which the researcher logs with lognormal error (or misses when under 5 mm),
 * all foram levels of a core share one true Delta-R (the model is told only its mean and sd), and
 * some levels are reworked (older by hundreds of years) or burrowed in (younger) without the
 * researcher knowing. Names and ids are invented.
 */
import { calibrateRadiocarbon, CalibrationResult } from '../../calibration/calibrate';
import { CalibrationInputError } from '../../calibration/errors';
import { CalibrationCurve } from '../../calibration/curve';
import { SeededRandom } from '../../common/random';
import { AgeModelInput, ColumnEventHorizon, ColumnSample, ColumnUnit } from '../column';
import { calibratedGrid, reservoirSources } from '../reservoir-offsets';

export interface SimulatedCoreOptions {
  readonly seed: number;
  /** Number of turbidites (events). */
  readonly beds: number;
  /** Age of the oldest event, cal BP. */
  readonly oldestEventCalBp: number;
  /** Mean interval between events (years); intervals are uniform on 0.4-1.6 times this. */
  readonly meanIntervalYears: number;
  /** Number of dated foram levels, placed at random in the mud. */
  readonly levels: number;
  /** Share of levels that are reworked or burrowed without the researcher knowing. */
  readonly displacedShare: number;
  /** Laboratory 1-sigma of each 14C age. */
  readonly labErrorC14: number;
  /** Delta-R the researcher enters (mean, sd); the core's true Delta-R is one draw from it. */
  readonly deltaR: number;
  readonly deltaRError: number;
  /**
   * Tell the model the levels share one Delta-R source (`reservoir-offsets.ts`), as they do in the
   * generator; false calibrates each level with its own Delta-R error, as if independent.
   */
  readonly sharedDeltaR?: boolean;
}

export const DEFAULT_SIMULATED_CORE: Omit<SimulatedCoreOptions, 'seed'> = {
  beds: 8,
  oldestEventCalBp: 4700,
  meanIntervalYears: 540,
  levels: 3,
  displacedShare: 0.1,
  labErrorC14: 30,
  deltaR: 50,
  deltaRError: 60,
};

export interface SimulatedCore {
  readonly input: AgeModelInput;
  /** True age of each event, by horizon id. */
  readonly trueEventAges: ReadonlyMap<string, number>;
  /** True thickness of mud eroded under each bed, by the bed's unit id. */
  readonly trueErosionM: ReadonlyMap<string, number>;
  /** True rate of each mud interval (cm/kyr), base first. */
  readonly trueRatesCmPerKyr: readonly number[];
  /** True age at the depth of each level, by sample id. */
  readonly trueLevelAges: ReadonlyMap<string, number>;
}

function between(random: SeededRandom, lo: number, hi: number): number {
  return lo + (hi - lo) * random.uniform();
}

/** A marine 14C age for calendar age t: curve mean and error, the core's true Delta-R, laboratory error. */
function marineC14(curve: CalibrationCurve, calBp: number, deltaR: number, labError: number, random: SeededRandom): number {
  const i = Math.round(calBp) - curve.startCalBp;
  return Math.round(curve.mu[i] + curve.sigma[i] * random.normal() + deltaR + labError * random.normal());
}

/** A core of `beds` turbidites in hemipelagic mud, top down in depth, positions from the base. */
export function simulateCore(marineCurve: CalibrationCurve, options: SimulatedCoreOptions): SimulatedCore {
  const random = new SeededRandom(options.seed);
  const n = options.beds;
  const events: number[] = [options.oldestEventCalBp];
  for (let k = 1; k < n; k++) events.push(events[k - 1] - options.meanIntervalYears * between(random, 0.4, 1.6));
  const baseCalBp = events[0] + options.meanIntervalYears * between(random, 0.3, 0.8);
  const topCalBp = Math.max(0, events[n - 1] - options.meanIntervalYears * between(random, 0.3, 1));
  if (events[n - 1] <= topCalBp + 50) throw new RangeError('the simulated events run into the present: start older');
  const baseRate = between(random, 8, 30); // cm/kyr
  // Interval u (0 = below the oldest bed, n = above the youngest) runs from older[u] to younger[u].
  const older = [baseCalBp, ...events];
  const younger = [...events, topCalBp];
  const rates = older.map(() => baseRate * Math.exp(0.4 * random.normal()));
  // The older half of each interval's years at rates[u] x lower[u], the younger half at rates[u] x upper[u].
  const lower = older.map(() => Math.exp(0.2 * random.normal()));
  const upper = older.map(() => Math.exp(0.2 * random.normal()));
  const halfM = (u: number, factor: number) => ((older[u] - younger[u]) / 2) * rates[u] * factor / 100_000;
  const erosion = events.map(() => 0);
  const mudM = older.map((_, u) => halfM(u, lower[u]) + halfM(u, upper[u]));
  /** True age of the mud `below` m under the top of interval u as deposited (before erosion). */
  const ageBelowTop = (u: number, below: number): number => {
    const upperM = halfM(u, upper[u]);
    return below <= upperM
      ? younger[u] + (below * 100_000) / (rates[u] * upper[u])
      : younger[u] + (older[u] - younger[u]) / 2 + ((below - upperM) * 100_000) / (rates[u] * lower[u]);
  };
  for (let k = 0; k < n; k++) {
    // Bed k erodes the top of interval k; at most 60 % of that mud.
    if (random.uniform() < 0.6) erosion[k] = Math.min(between(random, 0.002, 0.04), 0.6 * mudM[k]);
  }
  const deltaRTrue = options.deltaR + options.deltaRError * random.normal();

  // Build top down.
  const unitsTopDown: { id: string; name: string; facies: string; thickness: number; basalErosionM: number | null }[] = [];
  const mudIds: string[] = [];
  for (let u = n; u >= 0; u--) {
    const preserved = mudM[u] - (u < n ? erosion[u] : 0);
    const id = `mud-${u}`;
    mudIds[u] = id;
    unitsTopDown.push({ id, name: `Mud ${u}`, facies: 'HEMIPELAGIC_MUD', thickness: preserved, basalErosionM: null });
    if (u > 0) {
      const k = u - 1;
      const logged = erosion[k] >= 0.005 ? Math.round(erosion[k] * Math.exp(0.35 * random.normal()) * 1000) / 1000 : null;
      unitsTopDown.push({ id: `bed-${k}`, name: `T${n - k}`, facies: 'TURBIDITE', thickness: between(random, 0.02, 0.3), basalErosionM: logged });
    }
  }
  const units: ColumnUnit[] = [];
  const tops = new Map<string, number>();
  let depth = 0;
  unitsTopDown.forEach((u, i) => {
    tops.set(u.id, depth);
    units.push({
      id: u.id,
      name: u.name,
      position: unitsTopDown.length - i,
      topDepthM: depth,
      baseDepthM: depth + u.thickness,
      facies: u.facies,
      basalErosionM: u.basalErosionM,
    });
    depth += u.thickness;
  });
  const eventHorizons: ColumnEventHorizon[] = [];
  const trueEventAges = new Map<string, number>();
  const trueErosionM = new Map<string, number>();
  for (let k = 0; k < n; k++) {
    const id = `event-${k}`;
    eventHorizons.push({ id, name: `T${n - k}`, unitBelowId: mudIds[k], unitAboveId: `bed-${k}` });
    trueEventAges.set(id, events[k]);
    trueErosionM.set(`bed-${k}`, erosion[k]);
  }

  const samples: ColumnSample[] = [];
  const shared = options.sharedDeltaR !== false && options.deltaRError > 0;
  const { sources: [source] } = reservoirSources(shared ? [{ id: 'all', name: 'all', deltaR: options.deltaR, deltaRError: options.deltaRError, source: 'Simulated shelf' }] : []);
  const grids: (CalibrationResult | null)[][] = [];
  const trueLevelAges = new Map<string, number>();
  for (let s = 0; s < options.levels; s++) {
    // Levels spread over the core: the s-th level in the s-th share of the mud intervals.
    const u = Math.min(n, Math.floor(((s + random.uniform()) / options.levels) * (n + 1)));
    const preserved = mudM[u] - (u < n ? erosion[u] : 0);
    const fromTop = between(random, 0.1, 0.9) * preserved;
    // Age at that depth: the top of the preserved mud is (eroded thickness) below the interval's young end.
    const removed = u < n ? erosion[u] : 0;
    const age = ageBelowTop(u, removed + fromTop);
    let measuredAge = age;
    if (random.uniform() < options.displacedShare) {
      measuredAge = random.uniform() < 0.7 ? age + between(random, 200, 1500) : Math.max(topCalBp, age - between(random, 100, 600));
    }
    const c14Age = marineC14(marineCurve, measuredAge, deltaRTrue, options.labErrorC14, random);
    const id = `level-${s}`;
    samples.push({
      id,
      name: `F${s + 1}`,
      unitId: mudIds[u],
      depthM: tops.get(mudIds[u])! + fromTop,
      ageRelation: 'DATES_DEPOSIT',
      likelihood: calibrateRadiocarbon({
        c14Age,
        c14Error: options.labErrorC14,
        curve: marineCurve,
        deltaR: options.deltaR,
        deltaRError: options.deltaRError,
      }).density,
    });
    if (shared) {
      grids.push(
        source.grid.map((deltaR) => {
          try {
            return calibrateRadiocarbon({ c14Age, c14Error: options.labErrorC14, curve: marineCurve, deltaR, deltaRError: 0 });
          } catch (error) {
            if (error instanceof CalibrationInputError) return null;
            throw error;
          }
        }),
      );
    }
    trueLevelAges.set(id, age);
  }
  let reservoir: AgeModelInput['reservoirSources'];
  if (shared) {
    const kept = calibratedGrid(source, grids);
    reservoir = [kept.source];
    samples.forEach((sample, i) => {
      const grid = kept.perSample[i];
      samples[i] = {
        ...sample,
        reservoir: { sourceKey: source.key, gridLikelihoods: grid.map((g) => g.density), gridLogMass: grid.map((g) => Math.log(g.likelihoodMass!)) },
      };
    });
  }
  return {
    input: { units, eventHorizons, samples, orderSamplesByDepth: true, ...(reservoir ? { reservoirSources: reservoir } : {}) },
    trueEventAges,
    trueErosionM,
    trueRatesCmPerKyr: rates,
    trueLevelAges,
  };
}
