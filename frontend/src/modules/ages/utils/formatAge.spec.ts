import { describe, expect, it } from 'vitest';
import { ticks } from 'd3';
import {
  ageAxisTicks,
  calBpToAstronomicalYear,
  formatAge,
  formatAgeRange,
  formatAgeRanges,
  formatAgeTick,
  formatCalendarYear,
  horizontalAgeTicks,
  tickLabelWidth,
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

describe(formatAgeRanges.name, () => {
  const ranges = [
    { olderCalBp: 368, youngerCalBp: 330 },
    { olderCalBp: 507, youngerCalBp: 430 },
  ];

  it('lists ranges oldest first with the unit once', () => {
    expect(formatAgeRanges(ranges, 'CAL_BP')).toBe('507–430, 368–330 cal BP');
    expect(formatAgeRanges(ranges, 'CE_BCE')).toBe('1443–1520, 1582–1620 CE');
  });

  it('writes BCE once when every range is BCE, and each era when they are mixed', () => {
    expect(formatAgeRanges([{ olderCalBp: 3000, youngerCalBp: 2900 }, { olderCalBp: 2600, youngerCalBp: 2500 }], 'CE_BCE')).toBe(
      '1051–951, 651–551 BCE',
    );
    expect(formatAgeRanges([{ olderCalBp: 2070, youngerCalBp: 1910 }, { olderCalBp: 1800, youngerCalBp: 1700 }], 'CE_BCE')).toBe(
      '121 BCE–40 CE, 150–250 CE',
    );
  });

  it('writes nothing for no ranges', () => {
    expect(formatAgeRanges([], 'CAL_BP')).toBe('');
  });
});

describe(ageAxisTicks.name, () => {
  it('puts cal BP ticks at round cal BP values', () => {
    expect(ageAxisTicks([3500, 1000], 'CAL_BP', 5, ticks)).toEqual([1000, 1500, 2000, 2500, 3000, 3500]);
  });

  it('puts CE/BCE ticks at round historical years, with the era boundary at 1 CE', () => {
    // 3500 cal BP is 1551 BCE and 1000 cal BP is 950 CE [analytic].
    const positions = ageAxisTicks([3500, 1000], 'CE_BCE', 5, ticks);
    expect(positions.map((calBp) => formatAgeTick(calBp, 'CE_BCE'))).toEqual(['1500 BCE', '1000 BCE', '500 BCE', '1 CE', '500 CE']);
  });
});

describe(horizontalAgeTicks.name, () => {
  // 3000-0 cal BP drawn left (old) to right (young) over 0-300 px.
  const position = (calBp: number) => (3000 - calBp) / 10;

  it('labels round CE/BCE years with their whole era and anchors the end labels inside the axis', () => {
    const found = horizontalAgeTicks([3000, 0], 'CE_BCE', 6, ticks, position, [0, 300]);
    // 3000 cal BP = 1051 BCE, 0 cal BP = 1950 CE [analytic]; round years only, never 1051 BCE or 950 CE.
    expect(found.map((tick) => tick.label)).toEqual(['1000 BCE', '500 BCE', '1 CE', '500 CE', '1000 CE', '1500 CE']);
    for (const tick of found) {
      const x = position(tick.calBp);
      const width = tickLabelWidth(tick.label);
      const [from, to] = tick.anchor === 'start' ? [x, x + width] : tick.anchor === 'end' ? [x - width, x] : [x - width / 2, x + width / 2];
      expect(from).toBeGreaterThanOrEqual(0);
      expect(to).toBeLessThanOrEqual(300);
    }
  });

  it('anchors a label at the very end of the axis to that end', () => {
    const found = horizontalAgeTicks([1000, 0], 'CAL_BP', 2, ticks, (calBp) => (1000 - calBp) / 4, [0, 250]);
    expect(found[0]).toEqual({ calBp: 0, label: '0', anchor: 'end' });
    expect(found.at(-1)).toEqual({ calBp: 1000, label: '1000', anchor: 'start' });
  });
});
