import { describe, expect, it } from 'vitest';
import { CurveFormatError } from './curve';
import { calibrateRadiocarbon } from './calibrate';
import { validateCurveText } from './custom-curve';

// An invented curve in the published five-column layout (cal BP, 14C age, sigma, Delta14C, sigma),
// rows from oldest to youngest as the published files run.
const invented = [
  'cal_bp,c14_age,c14_sigma,delta14c,delta14c_sigma',
  '3000,2900,20,0,1',
  '2000,1950,18,0,1',
  '1000,1050,15,0,1',
  '0,150,12,0,1',
].join('\n');

const meta = { code: 'TESTCAL', name: 'Invented test curve', marine: false };

describe(validateCurveText.name, () => {
  it('states what the curve covers', () => {
    const { curve, coverage } = validateCurveText(invented, meta);
    expect(coverage).toEqual({ youngestCalBp: 0, oldestCalBp: 3000, minC14: 150, maxC14: 2900, rows: 4 });
    expect(curve.mu).toHaveLength(3001);
    // Linear between the tabulated rows [analytic]: halfway from 1000 to 2000 cal BP.
    expect(curve.mu[1500]).toBeCloseTo(1500, 9);
    expect(curve.sigma[1500]).toBeCloseTo(16.5, 9);
  });

  it('gives a curve calibration can use like a built-in one', () => {
    const { curve } = validateCurveText(invented, meta);
    const result = calibrateRadiocarbon({ c14Age: 1500, c14Error: 20, curve });
    expect(result.medianCalBp).toBeCloseTo(1500, 0);
  });

  it('refuses files that are not curves, with the line at fault', () => {
    expect(() => validateCurveText('cal_bp,c14_age,c14_sigma\n100,200,5\n90,190,-1', meta)).toThrow(/line 3: sigma must be positive/);
    expect(() => validateCurveText('100,200,5\n100,190,5', meta)).toThrow(CurveFormatError);
    expect(() => validateCurveText('just some words', meta)).toThrow(CurveFormatError);
  });

  it('refuses a curve shorter than two whole calendar years', () => {
    expect(() => validateCurveText('10.2,300,5\n10.9,301,5', meta)).toThrow(/less than two whole calendar years/);
    expect(() => validateCurveText('10,300,5\n11,301,5', meta)).not.toThrow();
  });
});
