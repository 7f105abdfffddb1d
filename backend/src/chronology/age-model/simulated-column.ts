/**
 * Synthetic columns with a known history, for testing and benchmarking the age model: true event
 * ages, deposit ages spread uniformly between them, and radiocarbon ages simulated through a
 * calibration curve (true calendar age t -> 14C age mu(t) + curve error + laboratory error), then
 * calibrated like real samples. Names and ids are invented.
 */
import { calibrateRadiocarbon } from '../calibration/calibrate';
import { CalibrationCurve } from '../calibration/curve';
import { SeededRandom } from '../common/random';
import { AgeModelInput, ColumnEventHorizon, ColumnSample, ColumnUnit } from './column';

export interface SimulatedColumnOptions {
  readonly seed: number;
  readonly eventCount: number;
  /** Samples in each unit, base first (eventCount + 1 units); a single number for all units. */
  readonly samplesPerUnit: number | readonly number[];
  /** Age of the oldest event, cal BP. */
  readonly oldestEventCalBp: number;
  /** Mean interval between events; intervals are uniform on 0.5-1.5 times this. */
  readonly meanIntervalYears: number;
  /** Laboratory 1-sigma of each 14C age. */
  readonly labErrorC14: number;
}

export interface SimulatedColumn {
  readonly input: AgeModelInput;
  /** True age of each event horizon, by id. */
  readonly trueEventAges: ReadonlyMap<string, number>;
  /** True deposit age of each sample, by id. */
  readonly trueDepositAges: ReadonlyMap<string, number>;
}

/** Calendar age (whole years) to a measured 14C age through the curve, with both errors. */
export function simulatedC14Age(curve: CalibrationCurve, calBp: number, labErrorC14: number, random: SeededRandom): number {
  const i = Math.round(calBp) - curve.startCalBp;
  return Math.round(curve.mu[i] + curve.sigma[i] * random.normal() + labErrorC14 * random.normal());
}

/**
 * A column of eventCount + 1 units with an event horizon at every contact. Deposit ages in a
 * unit are uniform between the true ages of the events bounding it (the base and top units
 * reach one mean interval beyond the outer events), each sample is a 14C age of the deposit,
 * and depths follow age at 1 mm per year.
 */
export function simulateColumn(curve: CalibrationCurve, options: SimulatedColumnOptions): SimulatedColumn {
  const random = new SeededRandom(options.seed);
  const { eventCount, meanIntervalYears } = options;
  const eventAges: number[] = [options.oldestEventCalBp];
  for (let k = 1; k < eventCount; k++) {
    eventAges.push(Math.round(eventAges[k - 1] - meanIntervalYears * (0.5 + random.uniform())));
  }
  if (eventAges[eventCount - 1] < meanIntervalYears) {
    throw new RangeError('the simulated events run into the future: start the oldest event earlier');
  }
  const units: ColumnUnit[] = [];
  const eventHorizons: ColumnEventHorizon[] = [];
  const samples: ColumnSample[] = [];
  const trueEventAges = new Map<string, number>();
  const trueDepositAges = new Map<string, number>();
  for (let u = 0; u <= eventCount; u++) {
    const older = u === 0 ? eventAges[0] + meanIntervalYears : eventAges[u - 1];
    const younger = u === eventCount ? Math.max(0, eventAges[eventCount - 1] - meanIntervalYears) : eventAges[u];
    const unit: ColumnUnit = {
      id: `unit-${u + 1}`,
      name: `Unit ${u + 1}`,
      position: u + 1,
      topDepthM: younger / 1000,
      baseDepthM: older / 1000,
    };
    units.push(unit);
    const count = typeof options.samplesPerUnit === 'number' ? options.samplesPerUnit : options.samplesPerUnit[u];
    for (let s = 0; s < count; s++) {
      const age = Math.round(younger + random.uniform() * (older - younger));
      const c14Age = simulatedC14Age(curve, age, options.labErrorC14, random);
      const id = `sample-${u + 1}-${s + 1}`;
      samples.push({
        id,
        name: `SIM-${u + 1}${String.fromCharCode(97 + s)}`,
        unitId: unit.id,
        depthM: age / 1000,
        ageRelation: 'DATES_DEPOSIT',
        likelihood: calibrateRadiocarbon({ c14Age, c14Error: options.labErrorC14, curve }).density,
      });
      trueDepositAges.set(id, age);
    }
    if (u < eventCount) {
      const horizon: ColumnEventHorizon = {
        id: `event-${u + 1}`,
        name: `E${u + 1}`,
        unitBelowId: unit.id,
        unitAboveId: `unit-${u + 2}`,
      };
      eventHorizons.push(horizon);
      trueEventAges.set(horizon.id, eventAges[u]);
    }
  }
  return { input: { units, eventHorizons, samples }, trueEventAges, trueDepositAges };
}
