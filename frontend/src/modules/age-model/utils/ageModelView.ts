/**
 * Pure pieces of the age model view: which samples bracket an event, the run settings form,
 * outlier flags and whether a run is still working.
 */
import { calendarWindow, densityPeak, type DensityPoint } from '@/modules/calibration/utils/calibrationChart';
import { FieldReader, type FormResult } from '@/modules/ui/utils/formFields';

/**
 * A sample whose outlier probability is above this is flagged for a second look.
 * [common practice]: a posterior outlier probability well above the prior is the usual cue.
 */
export const OUTLIER_FLAG_PROBABILITY = 0.3;

/** Whether a sample's posterior outlier probability is high enough to flag. */
export function isFlaggedOutlier(outlierProbability: number): boolean {
  return outlierProbability > OUTLIER_FLAG_PROBABILITY;
}

export type EventBracketLike = { id: string; unitBelow: { position: number }; unitAbove: { position: number } };
export type SampleLike = {
  id: string;
  labCode: string;
  excluded: boolean;
  unit: { position: number };
  calibration?: { density: readonly DensityPoint[] } | null;
};

/** A sample drawn beside an event: below the horizon (pre-event, older) or above it. */
export type BracketingSample<TSample> = { sample: TSample; side: 'below' | 'above' };

/**
 * The samples around an event horizon: those in the unit below it (they date the pre-event
 * deposit and so bound the event from the old side) and in the unit above (the young side).
 * Excluded samples and samples without a calibration are left out: the model did not use them.
 */
export function bracketingSamples<TSample extends SampleLike>(
  event: EventBracketLike,
  samples: readonly TSample[],
): BracketingSample<TSample>[] {
  const result: BracketingSample<TSample>[] = [];
  for (const sample of samples) {
    if (sample.excluded || !sample.calibration || sample.calibration.density.length === 0) continue;
    if (sample.unit.position === event.unitBelow.position) result.push({ sample, side: 'below' });
    else if (sample.unit.position === event.unitAbove.position) result.push({ sample, side: 'above' });
  }
  return result.sort((a, b) => (a.side === b.side ? a.sample.labCode.localeCompare(b.sample.labCode) : a.side === 'above' ? -1 : 1));
}

/** The run settings as typed in the form. */
export type RunSettingsForm = {
  seed: string;
  iterations: string;
  chains: string;
  outlierPrior: string;
  inheritanceScaleYears: string;
};

export type RunSettingsField = keyof RunSettingsForm;

/** The settings input of startAgeModelRun (without the site). */
export type RunSettingsInput = {
  seed: number | null;
  iterations: number | null;
  chains: number | null;
  outlierPrior: number | null;
  inheritanceScaleYears: number | null;
};

/**
 * The form's starting values: the server's documented defaults, and a blank seed (random). The
 * chance a sample is misplaced starts at 0.05: one sample in twenty reworked, intruded or
 * mislabelled, the prior most often used for outlier models of radiocarbon sequences
 * (Bronk Ramsey 2009, Radiocarbon 51(3):1023-1045) [common practice].
 */
export const DEFAULT_RUN_SETTINGS: RunSettingsForm = {
  seed: '',
  iterations: '20000',
  chains: '4',
  outlierPrior: '0.05',
  inheritanceScaleYears: '100',
};

/**
 * Check the settings: a whole-number seed (blank lets the server choose), iterations and chains
 * as positive whole numbers (at least two chains, since split R-hat compares chains), the
 * outlier prior strictly between 0 and 1, and a positive inheritance scale. Blank means the
 * server's default.
 */
export function readRunSettings(form: RunSettingsForm): FormResult<RunSettingsInput, RunSettingsField> {
  const reader = new FieldReader<RunSettingsField>();
  const input: RunSettingsInput = {
    seed: reader.number('seed', form.seed, { integer: true, min: 0, max: 2_147_483_647 }),
    iterations: reader.number('iterations', form.iterations, { integer: true, min: 100, max: 1_000_000 }),
    chains: reader.number('chains', form.chains, { integer: true, min: 2, max: 16 }),
    outlierPrior: reader.number('outlierPrior', form.outlierPrior, { above: 0, max: 0.99 }),
    inheritanceScaleYears: reader.number('inheritanceScaleYears', form.inheritanceScaleYears, { above: 0, max: 10_000 }),
  };
  return reader.result(input);
}

/** Whether a job is still queued or running (and so is polled). */
export function isRunActive(status: string): boolean {
  return status === 'QUEUED' || status === 'RUNNING';
}

/** A run's progress (0-1) as a whole percentage for the progress bar label. */
export function progressPercent(progress: number): number {
  return Math.round(Math.min(Math.max(progress, 0), 1) * 100);
}

/** The points of a density above `share` of its own peak: what a drawing of it shows. */
export function visibleBody(density: readonly DensityPoint[], share = 0.01): DensityPoint[] {
  const floor = densityPeak(density) * share;
  return density.filter((point) => point.probability > floor);
}

/**
 * One event's own chart window, [younger, older] cal BP: its posterior and the likelihoods of the
 * samples around it where they are visible (far tails left out), padded and rounded. Each event
 * gets its own, so a young event is not drawn as a sliver on the whole site's time span.
 */
export function eventChartWindow(posterior: readonly DensityPoint[], likelihoods: readonly (readonly DensityPoint[])[]): readonly [number, number] {
  const found = calendarWindow([visibleBody(posterior), ...likelihoods.map((density) => visibleBody(density))], { padding: 0.1, minSpanYears: 200 });
  return found ? [found.youngerCalBp, found.olderCalBp] : [0, 1000];
}
