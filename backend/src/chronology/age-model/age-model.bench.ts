/**
 * Speed and mixing of the age model on a realistic site: 40 radiocarbon samples in 13 units with
 * 12 event horizons on IntCal20, 4 chains at the default settings. Called by the bench script.
 */
import { builtInCurve } from '../../reference-data/reference-data';
import { runAgeModel } from './age-model';
import { simulateColumn } from './simulated-column';

export interface AgeModelBench {
  /** Wall-clock seconds of the run. */
  readonly seconds: number;
  /** CPU seconds used by the process meanwhile (one core's work when the machine is busy). */
  readonly cpuSeconds: number;
  readonly minEss: number;
  readonly maxRhat: number;
  readonly samples: number;
  readonly events: number;
  readonly chains: number;
}

/** Time one run at the default settings of a 40-sample, 12-event column (calibration excluded). */
export function benchAgeModel(): AgeModelBench {
  const { input } = simulateColumn(builtInCurve('INTCAL20'), {
    seed: 20_240_611,
    eventCount: 12,
    samplesPerUnit: [4, 3, 3, 3, 3, 3, 3, 3, 3, 3, 3, 3, 3],
    oldestEventCalBp: 7_400,
    meanIntervalYears: 480,
    labErrorC14: 30,
  });
  const started = process.hrtime.bigint();
  const cpuStarted = process.cpuUsage();
  const result = runAgeModel(input, { seed: 7 });
  const cpu = process.cpuUsage(cpuStarted);
  const seconds = Number(process.hrtime.bigint() - started) / 1e9;
  return {
    seconds,
    cpuSeconds: (cpu.user + cpu.system) / 1e6,
    minEss: result.diagnostics.minEss,
    maxRhat: result.diagnostics.maxRhat,
    samples: input.samples.length,
    events: input.eventHorizons.length,
    chains: result.settings.chains,
  };
}
