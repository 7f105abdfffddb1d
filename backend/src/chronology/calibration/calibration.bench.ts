/**
 * Speed of radiocarbon calibration on IntCal20, for the bench script to print. Not a test: timing
 * depends on the machine, so nothing here asserts a figure.
 */
import { SeededRandom } from '../common/random';
import { builtInCurve } from '../../reference-data/reference-data';
import { calibrateRadiocarbon } from './calibrate';

export interface CalibrationBenchFigures {
  readonly calibrations: number;
  /** Wall-clock seconds for all calibrations. */
  readonly seconds: number;
  readonly perSecond: number;
  /** CPU seconds of this process over the same span: the one-core cost when the machine is busy. */
  readonly cpuSeconds: number;
}

/**
 * Calibrate `count` determinations spread uniformly over 500-12,000 14C yr BP with errors of
 * 20-80 14C yr on IntCal20, each with its median, mean and 68.3 % / 95.4 % ranges. The curve is
 * loaded and a few hundred calibrations run before the clock starts, so the figure is the steady
 * cost per calibration rather than file parsing and JIT warm-up.
 */
export function benchCalibration(count = 10_000, seed = 20_200): CalibrationBenchFigures {
  const curve = builtInCurve('INTCAL20');
  const random = new SeededRandom(seed);
  const ages = new Float64Array(count);
  const errors = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    ages[i] = Math.round(500 + 11_500 * random.uniform());
    errors[i] = Math.round(20 + 60 * random.uniform());
  }
  for (let i = 0; i < Math.min(count, 300); i++) {
    calibrateRadiocarbon({ c14Age: ages[i], c14Error: errors[i], curve });
  }
  let rangesSeen = 0;
  const cpuStarted = process.cpuUsage();
  const started = process.hrtime.bigint();
  for (let i = 0; i < count; i++) {
    rangesSeen += calibrateRadiocarbon({ c14Age: ages[i], c14Error: errors[i], curve }).hpd95.length;
  }
  const seconds = Number(process.hrtime.bigint() - started) / 1e9;
  const cpu = process.cpuUsage(cpuStarted);
  const cpuSeconds = (cpu.user + cpu.system) / 1e6;
  if (rangesSeen < count) throw new Error('benchmark calibrations returned no ranges');
  return { calibrations: count, seconds, perSecond: count / seconds, cpuSeconds };
}
