import { describe, expect, it } from 'vitest';
import {
  calBpToAstronomicalYear,
  formatAge,
  formatAgeRange,
  formatAgeTick,
  formatCalendarYear,
} from './formatAge';

// The conversion follows from the definition of BP (years before AD 1950; Stuiver & Polach 1977)
// and from astronomical year numbering, where year 0 is 1 BCE [analytic]. The luminescence row
// of CHECKS.md: 945 CE is 1005 cal BP [published, PLOS ONE table, converted here analytically].

describe(calBpToAstronomicalYear.name, () => {
  it('counts back from AD 1950', () => {
    expect(calBpToAstronomicalYear(0)).toBe(1950);
    expect(calBpToAstronomicalYear(1005)).toBe(945);
    expect(calBpToAstronomicalYear(1950)).toBe(0);
    expect(calBpToAstronomicalYear(1951)).toBe(-1);
  });

  it('rounds fractional ages (medians) to whole years', () => {
    expect(calBpToAstronomicalYear(1004.6)).toBe(945);
  });

  it('gives years after 1950 for negative (post-bomb era) ages', () => {
    expect(calBpToAstronomicalYear(-50)).toBe(2000);
  });
});

describe(formatCalendarYear.name, () => {
  it('names astronomical year 0 as 1 BCE and -1 as 2 BCE', () => {
    expect(formatCalendarYear(0)).toBe('1 BCE');
    expect(formatCalendarYear(-1)).toBe('2 BCE');
    expect(formatCalendarYear(1)).toBe('1 CE');
  });
});

describe(formatAge.name, () => {
  it('writes cal BP with its unit', () => {
    expect(formatAge(1250.4, 'CAL_BP')).toBe('1250 cal BP');
  });

  it('writes calendar years with their era', () => {
    expect(formatAge(1005, 'CE_BCE')).toBe('945 CE');
    expect(formatAge(1949, 'CE_BCE')).toBe('1 CE');
    expect(formatAge(1950, 'CE_BCE')).toBe('1 BCE');
    expect(formatAge(3450, 'CE_BCE')).toBe('1501 BCE');
  });
});

describe(formatAgeRange.name, () => {
  it('writes the older end first in cal BP, whichever order it is given in', () => {
    expect(formatAgeRange(1290, 1180, 'CAL_BP')).toBe('1290–1180 cal BP');
    expect(formatAgeRange(1180, 1290, 'CAL_BP')).toBe('1290–1180 cal BP');
  });

  it('writes the era once when both ends share it', () => {
    expect(formatAgeRange(1290, 1180, 'CE_BCE')).toBe('660–770 CE');
    expect(formatAgeRange(3000, 2500, 'CE_BCE')).toBe('1051–551 BCE');
  });

  it('writes both eras for a range across the start of the era', () => {
    expect(formatAgeRange(2070, 1910, 'CE_BCE')).toBe('121 BCE–40 CE');
  });
});

describe(formatAgeTick.name, () => {
  it('leaves the unit to the axis title in cal BP but keeps the era in CE/BCE', () => {
    expect(formatAgeTick(2000, 'CAL_BP')).toBe('2000');
    expect(formatAgeTick(2000, 'CE_BCE')).toBe('51 BCE');
  });
});
