/**
 * Speed of a full recurrence analysis, for the bench script to print. Not a test: timing depends
 * on the machine, so nothing here asserts a figure.
 */
import { normalDensity } from '../common/density';
import { simulateRecurrence } from './monte-carlo';

export interface RecurrenceBenchFigures {
  readonly draws: number;
  /** Wall-clock seconds for the ordered draws, statistics, four fits per draw and three windows. */
  readonly seconds: number;
  /** CPU seconds of this process over the same span: the one-core cost when the machine is busy. */
  readonly cpuSeconds: number;
}

/**
 * `draws` ordered draws of an invented 12-event sequence (events about 500 years apart, each age
 * known to +-25-60 years), then per draw the interval statistics, Poisson, BPT, lognormal and
 * Weibull fits with the open interval, one posterior draw of each model's parameters (parameter
 * uncertainty), and 30/50/100-year window probabilities from both. A short run first warms the
 * JIT so the figure is the steady cost. Progress goes to stderr every tenth of the draws.
 */
export function benchRecurrence(draws = 10_000, seed = 1_950, progress: (line: string) => void = (line) => process.stderr.write(line)): RecurrenceBenchFigures {
  const ages = [130, 610, 1_090, 1_560, 2_110, 2_540, 3_070, 3_480, 4_030, 4_470, 5_010, 5_530];
  const densities = ages.map((age, i) => normalDensity(age, 25 + ((i * 7) % 36)));
  const options = { forecastStartYearCe: 2025, windowsYears: [30, 50, 100], seed };
  simulateRecurrence(densities, { ...options, drawCount: 200 });
  const cpuStarted = process.cpuUsage();
  const started = process.hrtime.bigint();
  const summary = simulateRecurrence(densities, {
    ...options,
    drawCount: draws,
    progressInterval: Math.max(1, Math.floor(draws / 10)),
    onProgress: (done, total) => progress(`  recurrence: ${done} of ${total} draws, ${(Number(process.hrtime.bigint() - started) / 1e9).toFixed(1)} s\n`),
  });
  const seconds = Number(process.hrtime.bigint() - started) / 1e9;
  const cpu = process.cpuUsage(cpuStarted);
  if (summary.models.length !== 4) throw new Error('benchmark run did not fit four models');
  return { draws, seconds, cpuSeconds: (cpu.user + cpu.system) / 1e6 };
}
