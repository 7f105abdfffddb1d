import type { DensityPoint } from '@/modules/calibration/utils/calibrationChart';
import { gridToDensity, type DensityGridLike } from '@/modules/correlation/utils/ladderData';

type GridCalibration = { densityGrid: DensityGridLike };

/** A calibration that came as the API's compact grid, with the grid expanded to points. */
export type WithDensityPoints<C extends GridCalibration> = Omit<C, 'densityGrid'> & { density: DensityPoint[] };

/** The calibration with its `densityGrid` expanded to the points the charts draw. */
export function withDensityPoints<C extends GridCalibration>(calibration: C): WithDensityPoints<C> {
  const { densityGrid, ...summary } = calibration;
  return { ...summary, density: gridToDensity(densityGrid) };
}

/** A sample whose calibration came as the API's compact grid, with the grid expanded to points. */
export type WithCalibrationPoints<S extends { calibration?: GridCalibration | null }> = Omit<S, 'calibration'> & {
  calibration: WithDensityPoints<NonNullable<S['calibration']>> | null;
};

/**
 * Calibrations are fetched as `densityGrid` (a compact list of values: a sample with a 20,000-year
 * error would otherwise send 2.9 MB of 1-year points) and drawn as points.
 */
export function withCalibrationPoints<S extends { calibration?: GridCalibration | null }>(sample: S): WithCalibrationPoints<S> {
  const { calibration, ...rest } = sample;
  return { ...rest, calibration: calibration ? withDensityPoints(calibration) : null } as WithCalibrationPoints<S>;
}
