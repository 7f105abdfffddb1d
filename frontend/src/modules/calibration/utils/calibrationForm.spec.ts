import { describe, expect, it } from 'vitest';
import { calibrateInputFromSearch, calibrationFormFromSearch, calibrationSearchFrom, readCalibrationForm } from './calibrationForm';

const marine = new Set(['MARINE20' as const]);

describe(readCalibrationForm.name, () => {
  it('builds a terrestrial input without marine fields', () => {
    expect(readCalibrationForm({ c14Age: '1000', c14Error: '30', curve: 'INTCAL20', deltaR: '-40', deltaRError: '', latitude: '' }, false)).toEqual({
      ok: true,
      input: { c14Age: 1000, c14Error: 30, curve: 'INTCAL20' },
    });
  });

  it('keeps Delta-R and latitude for a marine curve', () => {
    expect(readCalibrationForm({ c14Age: '2410', c14Error: '30', curve: 'MARINE20', deltaR: '-40', deltaRError: '55', latitude: '-41.2' }, true)).toEqual({
      ok: true,
      input: { c14Age: 2410, c14Error: 30, curve: 'MARINE20', deltaR: -40, deltaRError: 55, latitude: -41.2 },
    });
  });

  it('asks for an age, a positive error and Delta-R with its error', () => {
    expect(readCalibrationForm({ c14Age: '', c14Error: '0', curve: 'MARINE20', deltaR: '', deltaRError: '50', latitude: '' }, true)).toEqual({
      ok: false,
      errors: { c14Age: 'required', c14Error: 'must be greater than 0', deltaR: 'give Delta-R with its error' },
    });
  });
});

describe('error bounds', () => {
  it('refuses errors above the 20,000 years the server accepts', () => {
    expect(readCalibrationForm({ c14Age: '3000', c14Error: '1000000', curve: 'MARINE20', deltaR: '0', deltaRError: '20001', latitude: '' }, true)).toEqual({
      ok: false,
      errors: { c14Error: 'must be at most 20000', deltaRError: 'must be at most 20000' },
    });
  });
});

describe(calibrationSearchFrom.name, () => {
  it('round-trips through the URL', () => {
    const input = { c14Age: 2410, c14Error: 30, curve: 'MARINE20' as const, deltaR: -40, deltaRError: 55 };
    const search = calibrationSearchFrom(input);
    expect(search.toString()).toBe('age=2410&error=30&curve=MARINE20&dr=-40&drError=55');
    expect(calibrateInputFromSearch(search, marine)).toEqual(input);
  });
});

describe(calibrateInputFromSearch.name, () => {
  it('asks for nothing without an age, and for nothing invalid', () => {
    expect(calibrateInputFromSearch(new URLSearchParams(''), marine)).toBeNull();
    expect(calibrateInputFromSearch(new URLSearchParams('age=abc&error=30'), marine)).toBeNull();
  });

  it('falls back to IntCal20 for an unknown curve', () => {
    expect(calibrationFormFromSearch(new URLSearchParams('curve=NOPE')).curve).toBe('INTCAL20');
  });
});
