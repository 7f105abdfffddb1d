import { benchAgeModel } from '../chronology/age-model/age-model.bench';
import { benchCalibration } from '../chronology/calibration/calibration.bench';
import { benchmarkCorrelationChecks } from '../chronology/correlation/correlation.bench';
import { benchRecurrence } from '../chronology/recurrence/recurrence.bench';

/** One line of the benchmark table. */
export interface BenchRow {
  figure: string;
  value: string | number;
  target: string;
  met: boolean;
  note?: string;
}

export interface Benchmark {
  name: string;
  run(): BenchRow[] | Promise<BenchRow[]>;
}

const round = (value: number, digits = 2) => Number(value.toFixed(digits));

/** Every benchmark the issues name; targets from the issue texts. */
export const BENCHMARKS: Benchmark[] = [
  {
    name: 'calibration',
    run: () => {
      const r = benchCalibration();
      return [
        { figure: 'calibrate 10,000 determinations with ranges, IntCal20 (s)', value: round(r.seconds), target: '< 1 s', met: r.seconds < 1 },
        { figure: '  same, CPU seconds', value: round(r.cpuSeconds), target: '< 1 s', met: r.cpuSeconds < 1 },
      ];
    },
  },
  {
    name: 'age model',
    run: () => {
      const r = benchAgeModel();
      return [
        { figure: `age model, ${r.samples} samples, ${r.events} events, ${r.chains} chains (s)`, value: round(r.seconds), target: '< 10 s', met: r.seconds < 10 },
        { figure: '  smallest event ESS', value: Math.round(r.minEss), target: '> 400', met: r.minEss > 400 },
        { figure: '  worst split R-hat', value: round(r.maxRhat, 3), target: '<= 1.05', met: r.maxRhat <= 1.05 },
      ];
    },
  },
  {
    name: 'correlation',
    run: () => {
      const r = benchmarkCorrelationChecks();
      return [
        {
          figure: `hypothesis checks, ${r.events} events, ${r.ties} ties (ms)`,
          value: round(r.checkHypothesisMs, 1),
          target: '(no target)',
          met: true,
        },
      ];
    },
  },
  {
    name: 'recurrence',
    run: () => {
      const r = benchRecurrence();
      return [
        { figure: `recurrence, ${r.draws} draws x 12 events, 4 fits, 3 windows (s)`, value: round(r.seconds), target: '< 10 s', met: r.seconds < 10 },
        { figure: '  same, CPU seconds', value: round(r.cpuSeconds), target: '< 10 s', met: r.cpuSeconds < 10 },
      ];
    },
  },
];
