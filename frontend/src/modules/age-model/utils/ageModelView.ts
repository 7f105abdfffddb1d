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

/** How a run relates ages to depth (the API's `DepthModel`). */
export type DepthModelChoice = 'ORDER_ONLY' | 'HEMIPELAGIC_RATE';

/** The run settings as typed in the form. */
export type RunSettingsForm = {
  depthModel: DepthModelChoice;
  seed: string;
  iterations: string;
  chains: string;
  outlierPrior: string;
  outlierShiftScaleYears: string;
  inheritanceScaleYears: string;
  hemipelagicRateCmPerKyr: string;
};

export type RunSettingsField = keyof RunSettingsForm;

/** Every field of the form, for telling its own server problems from the rest. */
export const RUN_SETTINGS_FIELDS: readonly RunSettingsField[] = [
  'depthModel',
  'seed',
  'iterations',
  'chains',
  'outlierPrior',
  'outlierShiftScaleYears',
  'inheritanceScaleYears',
  'hemipelagicRateCmPerKyr',
];

/** The settings input of startAgeModelRun (without the site). */
export type RunSettingsInput = {
  depthModel: DepthModelChoice;
  seed: number | null;
  iterations: number | null;
  chains: number | null;
  outlierPrior: number | null;
  outlierShiftScaleYears: number | null;
  inheritanceScaleYears: number | null;
  /** Sent for HEMIPELAGIC_RATE only; null lets the server measure it from the dated levels. */
  hemipelagicRateCmPerKyr?: number | null;
};

/**
 * Iterations per chain the form starts with for each depth model: the server's defaults (an
 * iteration of the hemipelagic model is a sweep of moves along every rate and several joint
 * directions, so fewer are needed).
 */
export const DEFAULT_ITERATIONS: Record<DepthModelChoice, string> = {
  ORDER_ONLY: '20000',
  HEMIPELAGIC_RATE: '4000',
};

/**
 * The form's starting values: the server's documented defaults, and a blank seed (random). The
 * chance a sample is misplaced starts at 0.05: one sample in twenty reworked, intruded or
 * mislabelled, the prior most often used for outlier models of radiocarbon sequences
 * (Bronk Ramsey 2009, Radiocarbon 51(3):1023-1045) [common practice]. The outlier shift scale
 * starts at the server's 500 years.
 */
export const DEFAULT_RUN_SETTINGS: RunSettingsForm = {
  depthModel: 'ORDER_ONLY',
  seed: '',
  iterations: DEFAULT_ITERATIONS.ORDER_ONLY,
  chains: '4',
  outlierPrior: '0.05',
  outlierShiftScaleYears: '500',
  inheritanceScaleYears: '100',
  hemipelagicRateCmPerKyr: '',
};

/** What the form needs of a site to choose its depth model. */
export type DepthModelSite = {
  kind: string;
  units: readonly { facies: string; topDepthM: number; baseDepthM: number }[];
};

/**
 * The depth model a new run starts with: HEMIPELAGIC_RATE for a core with hemipelagic mud
 * units that have depths (what that model needs first), ORDER_ONLY for everything else.
 */
export function defaultDepthModel(site: DepthModelSite): DepthModelChoice {
  const mud = site.units.some((unit) => unit.facies === 'HEMIPELAGIC_MUD' && Number.isFinite(unit.topDepthM) && unit.baseDepthM > unit.topDepthM);
  return site.kind === 'CORE' && mud ? 'HEMIPELAGIC_RATE' : 'ORDER_ONLY';
}

/** The form's starting values for a site. */
export function initialRunSettings(site: DepthModelSite): RunSettingsForm {
  const depthModel = defaultDepthModel(site);
  return { ...DEFAULT_RUN_SETTINGS, depthModel, iterations: DEFAULT_ITERATIONS[depthModel] };
}

/**
 * Switch the depth model; the iterations follow the model's default unless the researcher
 * typed a number of their own.
 */
export function withDepthModel(form: RunSettingsForm, depthModel: DepthModelChoice): RunSettingsForm {
  const untouched = form.iterations.trim() === DEFAULT_ITERATIONS[form.depthModel];
  return { ...form, depthModel, iterations: untouched ? DEFAULT_ITERATIONS[depthModel] : form.iterations };
}

/**
 * Check the settings against the server's bounds: a whole-number seed (blank lets the server
 * choose), iterations from 500 to 500,000, chains from 4 to 16 (split R-hat compares chains),
 * the outlier prior from 0.001 to 0.5, the outlier shift scale from 10 to 10,000 years, the
 * inheritance scale from 1 to 5000 years, and for HEMIPELAGIC_RATE an optional prior mean rate
 * from 0.1 to 1000 cm/kyr. Blank means the server's default.
 */
export function readRunSettings(form: RunSettingsForm): FormResult<RunSettingsInput, RunSettingsField> {
  const reader = new FieldReader<RunSettingsField>();
  const input: RunSettingsInput = {
    depthModel: form.depthModel,
    seed: reader.number('seed', form.seed, { integer: true, min: 0, max: 2_147_483_647 }),
    iterations: reader.number('iterations', form.iterations, { integer: true, min: 500, max: 500_000 }),
    chains: reader.number('chains', form.chains, { integer: true, min: 4, max: 16 }),
    outlierPrior: reader.number('outlierPrior', form.outlierPrior, { min: 0.001, max: 0.5 }),
    outlierShiftScaleYears: reader.number('outlierShiftScaleYears', form.outlierShiftScaleYears, { min: 10, max: 10_000 }),
    inheritanceScaleYears: reader.number('inheritanceScaleYears', form.inheritanceScaleYears, { min: 1, max: 5000 }),
  };
  if (form.depthModel === 'HEMIPELAGIC_RATE') {
    input.hemipelagicRateCmPerKyr = reader.number('hemipelagicRateCmPerKyr', form.hemipelagicRateCmPerKyr, { min: 0.1, max: 1000 });
  }
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

/**
 * A sample's posterior offset from its deposit (sample age minus deposit age) as the samples table
 * shows it: signed median and central 95 % range in whole years, e.g. "+210 yr (+40 to +520)".
 */
export function formatOffset(offset: { medianYears: number; low95Years: number; high95Years: number } | null | undefined): string {
  if (!offset) return '–';
  const signed = (v: number) => {
    const r = Math.round(v);
    return r > 0 ? `+${r}` : r < 0 ? `−${-r}` : '0';
  };
  return `${signed(offset.medianYears)} yr (${signed(offset.low95Years)} to ${signed(offset.high95Years)})`;
}
