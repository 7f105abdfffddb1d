import { describe, expect, it } from 'vitest';
import { withCalibrationPoints } from './calibrationPoints';

describe('withCalibrationPoints', () => {
  it('expands the grid to points at start + i x step and keeps the rest of the sample', () => {
    const sample = { id: 's1', labCode: 'LC-1', calibration: { medianCalBp: 1004, densityGrid: { startCalBp: 1000, stepYears: 4, values: [0.1, 0.15, 0.0] } } };
    expect(withCalibrationPoints(sample)).toEqual({
      id: 's1',
      labCode: 'LC-1',
      calibration: {
        medianCalBp: 1004,
        density: [
          { calBp: 1000, probability: 0.1 },
          { calBp: 1004, probability: 0.15 },
          { calBp: 1008, probability: 0 },
        ],
      },
    });
  });

  it('leaves a sample without a calibration without one', () => {
    expect(withCalibrationPoints({ id: 's2', calibration: null })).toEqual({ id: 's2', calibration: null });
  });
});
