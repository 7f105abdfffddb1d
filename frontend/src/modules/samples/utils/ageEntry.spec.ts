import { describe, expect, it } from 'vitest';
import { calBpFromYear, radiocarbonFromF14C, yearFromCalBp } from './ageEntry';

describe(radiocarbonFromF14C.name, () => {
  it('turns F14C into a conventional age with the Libby mean-life', () => {
    // F = 0.5 is one Libby half-life: 8033 ln 2 = 5568.0 yr [analytic, Stuiver & Polach 1977];
    // sigma 0.005 / 0.5 x 8033 = 80.3 yr.
    expect(radiocarbonFromF14C(0.5, 0.005)).toEqual({ ok: true, c14Age: 5568, c14Error: 80 });
    // F = 0.8607: -8033 ln 0.8607 = 1205.0 yr (python3 -c "import math; print(-8033*math.log(0.8607))").
    expect(radiocarbonFromF14C(0.8607, 0.0029)).toEqual({ ok: true, c14Age: 1205, c14Error: 27 });
  });

  it('refuses post-bomb carbon (F above 1) with its reason, and impossible values', () => {
    const bomb = radiocarbonFromF14C(1.12, 0.004);
    expect(bomb).toMatchObject({ ok: false, field: 'f14c' });
    expect(bomb.ok ? '' : bomb.message).toMatch(/post-bomb/);
    expect(radiocarbonFromF14C(0, 0.01)).toMatchObject({ ok: false, field: 'f14c' });
    expect(radiocarbonFromF14C(0.7, 0)).toMatchObject({ ok: false, field: 'f14cError' });
  });
});

describe(calBpFromYear.name, () => {
  it('counts CE years back from 1950 and BCE years across the missing year 0', () => {
    // [analytic] 1950 CE is 0 cal BP; 1 CE is 1949; 1 BCE (astronomical 0) is 1950; 150 BCE is 2099.
    expect(calBpFromYear(1717, 'CE')).toBe(233);
    expect(calBpFromYear(1, 'CE')).toBe(1949);
    expect(calBpFromYear(1, 'BCE')).toBe(1950);
    expect(calBpFromYear(150, 'BCE')).toBe(2099);
  });

  it('is undone by yearFromCalBp', () => {
    for (const [year, era] of [[1717, 'CE'], [1, 'CE'], [1, 'BCE'], [150, 'BCE']] as const) {
      expect(yearFromCalBp(calBpFromYear(year, era))).toEqual({ year, era });
    }
  });
});
