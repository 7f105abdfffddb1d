import { toStored } from '../calibration/stored-calibration';
import type { CalibrationCurve } from '../chronology/calibration/curve';
import { CalibrationInputError } from '../chronology/calibration/errors';
import { calibrationForSample, SampleDating } from '../chronology/calibration/sample-calibration';
import { computeTask } from '../jobs/compute-task';
import type { StoredCalibration } from '../database/schema/samples';
import type { FieldProblem } from './lab-sheet';

export interface LabSheetCalibrationInput {
  /** The datings of a sheet's rows that name a method, with their sheet row. */
  readonly datings: readonly { row: number; dating: SampleDating }[];
  /** The installed curves those datings name, under the code a dating names them by. */
  readonly curves: readonly { code: string; curve: CalibrationCurve }[];
}

/** Per row of the input, in its order: the stored calibration or the field problem. */
export type LabSheetCalibrationOutput = { row: number; result: StoredCalibration | FieldProblem }[];

/**
 * A lab sheet's calibrations, run in a thread so a large sheet does not hold the API's event
 * loop; the caller gives it a time budget (SampleImportService). Same calibration as a sample
 * saved from the form (calibrationForSample), refusals as field problems.
 */
export const labSheetCalibrationCompute = computeTask<LabSheetCalibrationInput, LabSheetCalibrationOutput>(
  __filename,
  'labSheetCalibrationCompute',
  ({ datings, curves }, onProgress) => {
    const byCode = new Map(curves.map(({ code, curve }) => [code, curve]));
    const lookup = (code: string) => byCode.get(code);
    return datings.map(({ row, dating }, i) => {
      if (i % 500 === 0) onProgress(i / datings.length);
      try {
        return { row, result: toStored(calibrationForSample(dating, lookup), dating.method === 'RADIOCARBON' ? dating.curve ?? null : null) };
      } catch (error) {
        if (error instanceof CalibrationInputError) return { row, result: { field: error.field, message: error.message } };
        throw error;
      }
    });
  },
);
