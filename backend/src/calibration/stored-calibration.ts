import type { CalibrationResult } from '../chronology/calibration/calibrate';
import type { StoredCalibration } from '../database/schema/samples';

/**
 * The summaries of a calibration as a sample row keeps them (densities are recomputed on read).
 * No framework imports: the lab-sheet calibration thread uses it too.
 */
export function toStored(result: CalibrationResult, curve: string | null): StoredCalibration {
  return {
    curve,
    medianCalBp: result.medianCalBp,
    meanCalBp: result.meanCalBp,
    sdYears: result.sdYears,
    hpd68: result.hpd68,
    hpd95: result.hpd95,
    warnings: result.warnings,
  };
}
