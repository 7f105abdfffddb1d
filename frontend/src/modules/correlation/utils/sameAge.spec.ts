import { describe, expect, it } from 'vitest';
import { sameAgeVerdict } from './sameAge';

describe(sameAgeVerdict.name, () => {
  // chi-square 5 % point for 11 degrees of freedom: 19.675
  // (python3 -c "from scipy.stats import chi2; print(chi2.ppf(0.95, 11))") [reference library].
  it('says that 12 ages spreading less than the 5 % limit could share one date', () => {
    const verdict = sameAgeVerdict({ t: 4.21, df: 11, critical5: 19.675, passes: true });
    expect(verdict.heading).toBe('could share one date');
    expect(verdict.sentence).toBe('The 12 ages spread by 4.21, under 19.68, the spread that 12 ages of one date would pass only 1 time in 20: one earthquake can explain them.');
  });

  it('says a failing tie probably joins events of different ages', () => {
    const verdict = sameAgeVerdict({ t: 31.2, df: 11, critical5: 19.675, passes: false });
    expect(verdict.passes).toBe(false);
    expect(verdict.sentence).toMatch(/over 19\.68.*different ages/);
  });
});
