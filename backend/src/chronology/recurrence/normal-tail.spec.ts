import { describe, expect, it } from 'vitest';
import { logUpperTailNormal, millsRatio, millsRatioDifference, upperTailNormal } from './normal-tail';

/** Relative difference, for values spanning many orders of magnitude. */
function relativeError(actual: number, expected: number): number {
  return Math.abs(actual - expected) / Math.abs(expected);
}

describe(logUpperTailNormal.name, () => {
  // ln(1 - Phi(z)) = ln(erfc(z / sqrt 2) / 2) from mpmath 1.3 at 50 digits [reference library];
  // SciPy 1.17.1 special.log_ndtr(-z) agrees to 15 digits [reference library].
  const cases: Array<[number, number]> = [
    [-5, -2.8665161296376359338e-7],
    [-1, -0.17275377902344988953],
    [0, -0.69314718055994530942],
    [0.5, -1.1759117615936186089],
    [1, -1.8410216450092635058],
    [2, -3.7831843336820319488],
    [2.9, -6.2840582349474184201],
    [3, -6.6077262215103495433],
    [3.1, -6.9406884584212281182],
    [5, -15.064998393988725736],
    [10, -53.231285150512470578],
    [30, -454.32124395634319711],
    [100, -5005.5242086942050886],
  ];
  it.each(cases)('matches mpmath at z = %d', (z, expected) => {
    expect(relativeError(logUpperTailNormal(z), expected)).toBeLessThan(2e-13);
  });

  it('is continuous where the continued fraction takes over at z = 3', () => {
    const below = logUpperTailNormal(3 - 1e-12);
    const above = logUpperTailNormal(3);
    expect(Math.abs(below - above)).toBeLessThan(1e-11);
  });

  it('stays finite where 1 - Phi(z) underflows to zero', () => {
    // 1 - Phi(40) is about 3.7e-350, below the smallest double; its log is not [analytic].
    expect(upperTailNormal(40)).toBe(0);
    expect(Number.isFinite(logUpperTailNormal(40))).toBe(true);
    expect(logUpperTailNormal(40)).toBeLessThan(-800);
  });
});

describe(millsRatio.name, () => {
  it('approaches 1/z - 1/z^3 for large z (Abramowitz & Stegun 26.2.12 [memory for the number])', () => {
    const z = 1e4;
    expect(relativeError(millsRatio(z), 1 / z - 1 / z ** 3)).toBeLessThan(1e-15);
  });
});

describe(millsRatioDifference.name, () => {
  // R(a) - R(a + gap) with R = Q / phi from mpmath 1.3 at 50 digits [reference library].
  const cases: Array<[number, number, number]> = [
    [30, 1e-3, 1.1073910341445718778e-6],
    [40, 1e-6, 6.2383175561047514723e-10],
    [100, 0.5, 0.00004973639992406187766],
  ];
  it.each(cases)('matches mpmath at a = %d, gap %d', (a, gap, expected) => {
    expect(relativeError(millsRatioDifference(a, a + gap, gap), expected)).toBeLessThan(1e-13);
  });

  it('keeps its digits when the gap is far below the precision of R itself', () => {
    // Subtracting two continued-fraction values would leave nothing at a gap of 1e-12; the
    // series difference is gap x (-R'(a)) to first order, R'(a) = aR(a) - 1 [analytic].
    const a = 50;
    const gap = 1e-12;
    const firstOrder = gap * (1 - a * millsRatio(a));
    expect(relativeError(millsRatioDifference(a, a + gap, gap), firstOrder)).toBeLessThan(1e-9);
  });
});
