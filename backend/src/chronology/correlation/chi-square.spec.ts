import { describe, expect, it } from 'vitest';
import { chiSquareCritical5, wardWilsonTest } from './chi-square';

describe(wardWilsonTest.name, () => {
  // Damon et al. 1989, Nature 337:611-615: three laboratories' ages 646 +- 31, 750 +- 30 and
  // 676 +- 24 14C yr BP. Pooled 689 +- 16 [memory]; chi-square about 6.4, above the 5 % value
  // 5.99 for 2 degrees of freedom [published, secondary]. Confirm against the paper.
  const damon = [
    { mean: 646, sd: 31 },
    { mean: 750, sd: 30 },
    { mean: 676, sd: 24 },
  ];

  it('reproduces the pooled age of the Damon et al. (1989) worked example', () => {
    const test = wardWilsonTest(damon);
    expect(Math.round(test.pooledMean)).toBe(689);
    expect(Math.round(test.pooledSd)).toBe(16);
  });

  it('finds T about 6.4 on 2 degrees of freedom, failing at the 5 % level', () => {
    const test = wardWilsonTest(damon);
    expect(test.t).toBeCloseTo(6.4, 0);
    expect(test.t).toBeGreaterThan(6.3);
    expect(test.t).toBeLessThan(6.45);
    expect(test.df).toBe(2);
    expect(test.critical5).toBeCloseTo(5.991, 3);
    expect(test.passes).toBe(false);
  });

  it('passes ages that agree, and T is 0 for equal ages [analytic]', () => {
    const same = wardWilsonTest([
      { mean: 1000, sd: 30 },
      { mean: 1000, sd: 50 },
    ]);
    expect(same.t).toBe(0);
    expect(same.passes).toBe(true);
    // Two ages 1000 +- 30 and 1060 +- 40: T = d^2 / (s1^2 + s2^2) = 3600 / 2500 = 1.44 [analytic].
    const close = wardWilsonTest([
      { mean: 1000, sd: 30 },
      { mean: 1060, sd: 40 },
    ]);
    expect(close.t).toBeCloseTo(1.44, 12);
    expect(close.pooledSd).toBeCloseTo(24, 12);
    expect(close.passes).toBe(true);
  });

  it('refuses fewer than two ages and errors that are not positive', () => {
    expect(() => wardWilsonTest([{ mean: 1000, sd: 30 }])).toThrow(RangeError);
    expect(() =>
      wardWilsonTest([
        { mean: 1000, sd: 30 },
        { mean: 1000, sd: 0 },
      ]),
    ).toThrow(RangeError);
  });
});

describe(chiSquareCritical5.name, () => {
  it('matches the handbook 5 % critical values [published: statistics tables]', () => {
    expect(chiSquareCritical5(1)).toBeCloseTo(3.841, 3);
    expect(chiSquareCritical5(2)).toBeCloseTo(5.991, 3);
    // chi-square(2) is exponential with mean 2, so its 95 % point is -2 ln 0.05 [analytic].
    expect(chiSquareCritical5(2)).toBeCloseTo(-2 * Math.log(0.05), 9);
    expect(chiSquareCritical5(10)).toBeCloseTo(18.307, 3); // handbook table, df 10 [published]
  });
});
