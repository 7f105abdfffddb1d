import { describe, expect, it } from 'vitest';
import { densityAt, normalDensity, summarise, uniformDensity, type CalendarDensity } from '../common/density';
import { SeededRandom } from '../common/random';
import { wardWilsonTest } from './chi-square';
import { combineAges, concordanceWarningThreshold } from './combined-age';

function scaled(density: CalendarDensity, factor: number): CalendarDensity {
  return { startCalBp: density.startCalBp, probabilities: density.probabilities.map((p) => p * factor) };
}

/** A lumpy, non-Gaussian density: a mixture of two normals on a shared grid. */
function mixture(random: SeededRandom): CalendarDensity {
  const centre = 800 + 400 * random.uniform();
  const a = normalDensity(centre, 15 + 40 * random.uniform());
  const b = normalDensity(centre + 150 * (random.uniform() - 0.5), 10 + 30 * random.uniform());
  const start = Math.min(a.startCalBp, b.startCalBp);
  const end = Math.max(a.startCalBp + a.probabilities.length, b.startCalBp + b.probabilities.length);
  const weight = random.uniform();
  const probabilities = new Float64Array(end - start);
  for (let i = 0; i < probabilities.length; i++) {
    probabilities[i] = weight * densityAt(a, start + i) + (1 - weight) * densityAt(b, start + i);
  }
  return { startCalBp: start, probabilities };
}

/** exp(-z^2 / 2) on every year of youngestCalBp..oldestCalBp, with no truncation at 6 sigma. */
function gaussianOnGrid(mean: number, sd: number, youngestCalBp: number, oldestCalBp: number): CalendarDensity {
  const probabilities = new Float64Array(oldestCalBp - youngestCalBp + 1);
  for (let i = 0; i < probabilities.length; i++) probabilities[i] = Math.exp(-0.5 * ((youngestCalBp + i - mean) / sd) ** 2);
  return { startCalBp: youngestCalBp, probabilities };
}

describe(combineAges.name, () => {
  describe('combined density', () => {
    it('is the normal of precision-weighted mean for two normal members [analytic]', () => {
      // N(1000, 30) x N(1060, 40) is proportional to N(m, s) with 1/s^2 = 1/30^2 + 1/40^2, so
      // s = 24, and m = s^2 (1000/30^2 + 1060/40^2) = 1021.6 [analytic].
      const { density } = combineAges([normalDensity(1000, 30), normalDensity(1060, 40)]);
      expect(density).not.toBeNull();
      const summary = summarise(density as CalendarDensity);
      expect(summary.meanCalBp).toBeCloseTo(1021.6, 2);
      expect(summary.sdYears).toBeCloseTo(24, 2);
      expect(summary.medianCalBp).toBeCloseTo(1021.6, 0);
    });

    it('equals the normalised pointwise product of the members [brute force]', () => {
      const members = [normalDensity(1000, 40), uniformDensity(950, 1100), mixture(new SeededRandom(7))];
      const { density } = combineAges(members);
      const d = density as CalendarDensity;
      // Brute force over the whole union of the grids, with no restriction to the overlap.
      const start = Math.min(...members.map((m) => m.startCalBp));
      const end = Math.max(...members.map((m) => m.startCalBp + m.probabilities.length));
      const product = new Float64Array(end - start);
      let mass = 0;
      for (let i = 0; i < product.length; i++) {
        product[i] = members.reduce((value, m) => value * densityAt(m, start + i), 1);
        mass += product[i];
      }
      for (let i = 0; i < product.length; i++) {
        expect(densityAt(d, start + i)).toBeCloseTo(product[i] / mass, 9);
      }
      expect(d.probabilities.reduce((sum, p) => sum + p, 0)).toBeCloseTo(1, 12);
    });

    it('is null, with concordance 0, when the members share no year', () => {
      // N(1000, 20) and N(1400, 20) are held on 880-1120 and 1280-1520 cal BP.
      expect(combineAges([normalDensity(1000, 20), normalDensity(1400, 20)])).toEqual({
        density: null,
        concordance: 0,
      });
    });

    it('is null when the supports touch but the product is zero throughout', () => {
      const a: CalendarDensity = { startCalBp: 100, probabilities: new Float64Array([1, 0, 1]) };
      const b: CalendarDensity = { startCalBp: 101, probabilities: new Float64Array([1, 0, 0]) };
      expect(combineAges([a, b]).density).toBeNull();
    });

    it('refuses a member with no mass', () => {
      expect(() => combineAges([normalDensity(1000, 20), { startCalBp: 0, probabilities: new Float64Array(3) }])).toThrow(
        RangeError,
      );
    });

    it('keeps a combined age when the members meet only in their far tails', () => {
      // N(1000, 10) and N(1600, 10) on a shared wide grid: at 1300 cal BP each is exp(-450)
      // of its peak, so a plain product (1e-391) is 0 in double precision. The product is
      // still proportional to N(1300, 10 / sqrt(2)) [analytic].
      const { density } = combineAges([gaussianOnGrid(1000, 10, 700, 1900), gaussianOnGrid(1600, 10, 700, 1900)]);
      expect(density).not.toBeNull();
      const summary = summarise(density as CalendarDensity);
      expect(summary.meanCalBp).toBeCloseTo(1300, 6);
      expect(summary.sdYears).toBeCloseTo(10 / Math.SQRT2, 6);
    });

    it('works in logarithms where the product is tiny but representable [analytic]', () => {
      // d = 500, s = 10: C = exp(-d^2 / (4 s^2)) = exp(-625), about 3.6e-272.
      const { concordance } = combineAges([gaussianOnGrid(1000, 10, 700, 1900), gaussianOnGrid(1500, 10, 700, 1900)]);
      expect(Math.log(concordance)).toBeCloseTo(-625, 6);
    });
  });

  describe('concordance', () => {
    it('is exactly 1 for identical members, Gaussian or not [analytic: Hölder equality]', () => {
      const lumpy = mixture(new SeededRandom(11));
      expect(combineAges([lumpy, lumpy]).concordance).toBeCloseTo(1, 12);
      expect(combineAges([lumpy, lumpy, lumpy, lumpy]).concordance).toBeCloseTo(1, 12);
      const flat = uniformDensity(900, 1000);
      expect(combineAges([flat, flat, flat]).concordance).toBeCloseTo(1, 12);
    });

    it('is exp(-d^2 / (4 s^2)) for two normals of equal s a distance d apart [analytic]', () => {
      expect(combineAges([normalDensity(1000, 30), normalDensity(1030, 30)]).concordance).toBeCloseTo(
        Math.exp(-0.25),
        8,
      );
      expect(combineAges([normalDensity(1000, 30), normalDensity(1060, 30)]).concordance).toBeCloseTo(Math.exp(-1), 8);
    });

    it('is exp(-T/2) with T the Ward & Wilson statistic for three normals of equal s [analytic]', () => {
      const means = [1000, 1040, 1075];
      const expected = Math.exp(-wardWilsonTest(means.map((mean) => ({ mean, sd: 25 }))).t / 2);
      const { concordance } = combineAges(means.map((mean) => normalDensity(mean, 25)));
      expect(concordance).toBeCloseTo(expected, 8);
    });

    it('is small for members far apart and falls as they separate', () => {
      const near = combineAges([normalDensity(1000, 20), normalDensity(1040, 20)]).concordance;
      const far = combineAges([normalDensity(1000, 20), normalDensity(1100, 20)]).concordance;
      expect(far).toBeLessThan(near);
      // exp(-d^2 / (4 s^2)) = exp(-6.25) = 1.93e-3 [analytic]; the members' 6-sigma truncation
      // moves the grid value by a few parts in 10^7.
      expect(far / Math.exp(-(100 ** 2) / (4 * 20 ** 2))).toBeCloseTo(1, 5);
      expect(far).toBeLessThan(concordanceWarningThreshold(2) as number);
    });

    it('stays in (0, 1] for random overlapping members and ignores their scale', () => {
      const random = new SeededRandom(42);
      for (let trial = 0; trial < 100; trial++) {
        const members = Array.from({ length: 2 + random.integer(4) }, () => mixture(random));
        const { density, concordance } = combineAges(members);
        if (density === null) continue;
        expect(concordance).toBeGreaterThan(0);
        expect(concordance).toBeLessThanOrEqual(1);
        const rescaled = combineAges(members.map((m, i) => scaled(m, 10 ** (i - 2))));
        expect(rescaled.concordance).toBeCloseTo(concordance, 10);
      }
    });

    it('does not underflow with many members', () => {
      // 300 copies of N(1000, 30): a plain product of the normalised probabilities (about 0.013
      // at the peak) would be 0 in double precision, yet the members are identical.
      const member = normalDensity(1000, 30);
      const { density, concordance } = combineAges(Array.from({ length: 300 }, () => member));
      expect(concordance).toBeCloseTo(1, 9);
      // The product of 300 copies of N(1000, 30) is N(1000, 30 / sqrt(300)) [analytic].
      expect(summarise(density as CalendarDensity).meanCalBp).toBeCloseTo(1000, 6);
    });
  });
});

describe(concordanceWarningThreshold.name, () => {
  it('is exp(-chi2_0.95(n - 1) / 2) [analytic; CHECKS.md]', () => {
    // CHECKS.md: n = 3 -> 0.050, n = 8 -> 0.0009. Full values from SciPy 1.17:
    //   python3 -c "from scipy.stats import chi2; import math
    //   for n in (2,3,5,8,12): print(n, math.exp(-chi2.ppf(0.95,n-1)/2))"
    // 2 0.14650006448608432, 3 0.05000000000000007, 5 0.00870494069627011,
    // 8 0.0008817780085088078, 12 5.340699722847558e-05  [reference library]
    expect(concordanceWarningThreshold(1)).toBeNull();
    expect(concordanceWarningThreshold(2)).toBeCloseTo(0.14650006448608432, 6);
    expect(concordanceWarningThreshold(3)).toBeCloseTo(0.05, 6);
    expect(concordanceWarningThreshold(5)).toBeCloseTo(0.00870494069627011, 7);
    expect(concordanceWarningThreshold(8)).toBeCloseTo(0.0008817780085088078, 8);
    expect((concordanceWarningThreshold(12) as number) / 5.340699722847558e-5).toBeCloseTo(1, 5);
    expect(() => concordanceWarningThreshold(0)).toThrow(RangeError);
    expect(() => concordanceWarningThreshold(2.5)).toThrow(RangeError);
  });

  it('flags simulated true same-event groups about 5 % of the time for 2, 5 and 8 members', () => {
    // Generator (not the correlation code): one true age per group; each member's posterior is
    // N(true + e, 30) with e ~ N(0, 30), i.e. an unbiased site estimate with the spread it
    // reports, as in the measurement (members sd 30 years). 1,500 groups per size: the
    // binomial SD of a 5 % rate is 0.56 %, so 3.3-6.7 % is a +-3 SD band. The fixed 0.05 that
    // this replaces flagged 1.8 %, 17.5 % and 56 % of such groups (issue 13).
    const random = new SeededRandom(13);
    const groups = 1500;
    const rates: Record<number, number> = {};
    for (const size of [2, 5, 8]) {
      const threshold = concordanceWarningThreshold(size) as number;
      let flagged = 0;
      for (let g = 0; g < groups; g++) {
        const truth = 2000 + 3000 * random.uniform();
        const members = Array.from({ length: size }, () => normalDensity(truth + 30 * random.normal(), 30));
        if (combineAges(members).concordance < threshold) flagged++;
      }
      rates[size] = flagged / groups;
    }
    for (const size of [2, 5, 8]) {
      expect(rates[size]).toBeGreaterThan(0.033);
      expect(rates[size]).toBeLessThan(0.067);
    }
  });
});
