import { describe, expect, it } from 'vitest';
import { bptDistribution, poissonDistribution, weibullDistribution } from './distributions';
import { intervalHistogram, renewalCurves } from './curves';

describe(renewalCurves.name, () => {
  it('samples pdf, survival and hazard = pdf / survival on a grid that leaves out t = 0 [analytic]', () => {
    const bpt = bptDistribution(500, 0.4);
    const curves = renewalCurves([bpt, poissonDistribution(500), weibullDistribution(500, 1.5)], 2000, 100);
    expect(curves.timesYears).toHaveLength(100);
    expect(curves.timesYears[0]).toBe(20);
    expect(curves.timesYears[99]).toBe(2000);
    const [bptCurve, poissonCurve, weibullCurve] = curves.curves;
    expect(bptCurve.model).toBe('BPT');
    for (let i = 0; i < 100; i += 7) {
      const t = curves.timesYears[i];
      expect(bptCurve.survival[i]).toBe(bpt.survival(t));
      expect(bptCurve.hazard[i]).toBeCloseTo(bptCurve.pdf[i] / bptCurve.survival[i], 12);
      expect(poissonCurve.hazard[i]).toBeCloseTo(1 / 500, 15);
      expect(Number.isFinite(weibullCurve.hazard[i])).toBe(true);
    }
  });

  it('survives a JSON round trip unchanged (plain arrays, not typed arrays)', () => {
    const curves = renewalCurves([bptDistribution(300, 0.5)], 900, 10);
    expect(JSON.parse(JSON.stringify(curves))).toEqual(curves);
  });
});

describe(intervalHistogram.name, () => {
  it('counts values in [from, to) bins starting at a multiple of the width', () => {
    const bins = intervalHistogram([100, 120, 149.9, 150, 260], { binWidthYears: 50 });
    expect(bins.map((bin) => [bin.fromYears, bin.count])).toEqual([
      [100, 3],
      [150, 1],
      [200, 0],
      [250, 1],
    ]);
  });

  it('scales densities to integrate to 1 [analytic]', () => {
    const values = Array.from({ length: 500 }, (_, i) => 200 + ((i * 37) % 400));
    const bins = intervalHistogram(values);
    const area = bins.reduce((sum, bin) => sum + bin.density * (bin.toYears - bin.fromYears), 0);
    expect(area).toBeCloseTo(1, 12);
    expect(bins.reduce((sum, bin) => sum + bin.count, 0)).toBe(500);
  });

  it('picks the Freedman-Diaconis width 2 IQR n^(-1/3) rounded up to a 1-2-5 step (Freedman & Diaconis 1981)', () => {
    // 1..100: IQR 49.5 (type 7 quartiles), 2 x 49.5 / 100^(1/3) = 21.3, rounded up to 50 [analytic].
    const bins = intervalHistogram(Array.from({ length: 100 }, (_, i) => i + 1));
    expect(bins[0].toYears - bins[0].fromYears).toBe(50);
  });

  it('gives no bins for no values', () => {
    expect(intervalHistogram([])).toEqual([]);
  });
});
