import type { DensityPoint } from '@/modules/calibration/utils/calibrationChart';
import { gridToDensity, type DensityGridLike } from '@/modules/correlation/utils/ladderData';

type GridCalibration = { densityGrid: DensityGridLike };

/** A sample whose calibration came as the API's compact grid, with the grid expanded to points. */
export type WithCalibrationPoints<S extends { calibration?: GridCalibration | null }> = Omit<S, 'calibration'> & {
  calibration: (Omit<NonNullable<S['calibration']>, 'densityGrid'> & { density: DensityPoint[] }) | null;
};

/**
 * Calibrations are fetched as `densityGrid` (a compact list of values: a sample with a 20,000-year
 * error would otherwise send 2.9 MB of 1-year points) and drawn as points.
 */
export function withCalibrationPoints<S extends { calibration?: GridCalibration | null }>(sample: S): WithCalibrationPoints<S> {
  const { calibration, ...rest } = sample;
  if (!calibration) return { ...rest, calibration: null } as WithCalibrationPoints<S>;
  const { densityGrid, ...summary } = calibration;
  return { ...rest, calibration: { ...summary, density: gridToDensity(densityGrid) } } as WithCalibrationPoints<S>;
}
