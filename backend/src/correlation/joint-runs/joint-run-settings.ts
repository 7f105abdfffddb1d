/**
 * A joint run's settings: the site model's chain settings (chronology/age-model defaults), the
 * number of chains and how many joint draws of the regional events are kept. Pure.
 */
import { DEFAULT_JOINT_CHAIN_SETTINGS } from '../../chronology/joint-age-model/joint-age-model';
import type { JointChainSettings } from '../../chronology/joint-age-model/types';

/** Bounds of the start mutation's numbers (BAD_USER_INPUT outside them, naming the field). */
export const JOINT_RUN_LIMITS = {
  chains: { min: 2, max: 16, default: 4 },
  iterations: { min: 500, max: 200_000, default: DEFAULT_JOINT_CHAIN_SETTINGS.iterations },
} as const;

/** Regional-event joint draws kept for recurrence analyses (evenly thinned over the chains). */
export const JOINT_MAX_STORED_DRAWS = 4_000;

export interface JointRunSettings {
  chains: number;
  iterations: number;
  burnIn: number;
  thin: number;
  outlierPrior: number;
  outlierShiftScaleYears: number;
  inheritanceScaleYears: number;
  windowMarginYears: number;
  maxStoredDraws: number;
}

/**
 * Settings for `iterations` sweeps per chain after burn-in, scaled from the computation's defaults
 * (1,000 + 3,000 sweeps kept every 3rd, `DEFAULT_JOINT_CHAIN_SETTINGS`): burn-in a third of the
 * kept sweeps, from 500 to 4,000 [common practice: a burn-in of 10-50 % of the kept length];
 * thinning keeps about 1,000 draws per chain (each chain stores them until the run is summarised).
 */
export function jointRunSettings(chains: number, iterations: number): JointRunSettings {
  const d = DEFAULT_JOINT_CHAIN_SETTINGS;
  return {
    chains,
    iterations,
    burnIn: Math.min(4_000, Math.max(500, Math.round(iterations / 3))),
    thin: Math.max(1, Math.floor(iterations / 1_000)),
    outlierPrior: d.outlierPrior,
    outlierShiftScaleYears: d.outlierShiftScaleYears,
    inheritanceScaleYears: d.inheritanceScaleYears,
    windowMarginYears: d.windowMarginYears,
    maxStoredDraws: JOINT_MAX_STORED_DRAWS,
  };
}

/** One chain's settings from the run's. */
export function chainSettings(settings: JointRunSettings, seed: number, chainIndex: number): JointChainSettings {
  return {
    iterations: settings.iterations,
    burnIn: settings.burnIn,
    thin: settings.thin,
    outlierPrior: settings.outlierPrior,
    outlierShiftScaleYears: settings.outlierShiftScaleYears,
    inheritanceScaleYears: settings.inheritanceScaleYears,
    windowMarginYears: settings.windowMarginYears,
    seed,
    chainIndex,
  };
}
