import { describe, expect, it } from 'vitest';
import { formatAge } from '@/modules/ages/utils/formatAge';
import { luminescenceCalBp, measuredAgeText, sampleSummary } from './sampleSummary';

describe(luminescenceCalBp.name, () => {
  it('counts a luminescence age back from its measurement year, not from 1950', () => {
    // CHECKS.md: 1075 +- 70 a measured in 2019 -> 945 +- 70 CE [published, PLOS ONE table];
    // the arithmetic 2019 - 1075 gives 944 CE = 1006 cal BP [analytic], one year from the
    // table's rounding, as the server's own test notes.
    expect(luminescenceCalBp(1075, 2019)).toBe(1006);
    expect(formatAge(luminescenceCalBp(1075, 2019), 'CE_BCE')).toBe('944 CE');
  });

  it('equals the age itself when measured in 1950 [analytic]', () => {
    expect(luminescenceCalBp(500, 1950)).toBe(500);
  });
});

describe(measuredAgeText.name, () => {
  it('writes each method in its own units', () => {
    expect(measuredAgeText({ labCode: 'x', method: 'RADIOCARBON', c14Age: 1835, c14Error: 25, excluded: false })).toBe('1835 ± 25 14C yr BP');
    expect(
      measuredAgeText({ labCode: 'x', method: 'LUMINESCENCE', calendarAgeBp: 1075, calendarErrorYears: 70, measurementYear: 2019, excluded: false }),
    ).toBe('1075 ± 70 years before 2019');
    expect(measuredAgeText({ labCode: 'x', method: 'TEPHRA', calendarAgeBp: 3450, calendarErrorYears: 20, excluded: false })).toBe('3450 ± 20 cal BP');
    expect(measuredAgeText({ labCode: 'x', method: 'RADIOCARBON', excluded: false })).toBe('no 14C age');
  });
});

describe(sampleSummary.name, () => {
  it('joins lab code, method, age, curve, median and exclusion', () => {
    const summary = sampleSummary(
      { labCode: 'VKR-1021', method: 'RADIOCARBON', c14Age: 1835, c14Error: 25, curve: 'INTCAL20', excluded: true, calibration: { medianCalBp: 1762.4 } },
      (calBp) => formatAge(calBp, 'CAL_BP'),
    );
    expect(summary).toBe('VKR-1021 · Radiocarbon · 1835 ± 25 14C yr BP · IntCal20 · median 1762 cal BP · excluded');
  });
});
