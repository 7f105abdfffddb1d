import { describe, expect, it } from 'vitest';
import { elapsedSinceLastEvent, formatProbability, histogramAsDensity, recurrenceExportUrl, sharedRecurrenceAxes, valuePeak, yearsExtent } from './recurrenceCharts';

describe(histogramAsDensity.name, () => {
  it('gives bars of total area 1, comparable with a fitted density', () => {
    const bins = [
      { fromYears: 0, toYears: 200, count: 10 },
      { fromYears: 200, toYears: 400, count: 30 },
      { fromYears: 400, toYears: 600, count: 60 },
    ];
    const densities = histogramAsDensity(bins);
    // Hand computation: 60 / (100 draws x 200 yr) = 0.003 per year.
    expect(densities[2]!.density).toBeCloseTo(0.003, 12);
    const area = densities.reduce((sum, bin) => sum + bin.density * (bin.toYears - bin.fromYears), 0);
    expect(area).toBeCloseTo(1, 12);
  });

  it('matches an exponential density integrated over the bins (analytic check)', () => {
    // Counts proportional to the exact bin probabilities of Exp(mean 500): exp(-a/500) - exp(-b/500).
    const edges = Array.from({ length: 41 }, (_, index) => index * 50);
    const bins = edges.slice(0, -1).map((from, index) => ({
      fromYears: from,
      toYears: edges[index + 1]!,
      count: 1e6 * (Math.exp(-from / 500) - Math.exp(-edges[index + 1]! / 500)),
    }));
    const total = bins.reduce((sum, bin) => sum + bin.count, 0);
    const densities = histogramAsDensity(bins);
    // The bar height is the mean over the bin of the pdf truncated at 2000 yr (the bins end
    // there), which the midpoint rule puts within (h/mean)^2/24 = 0.04 % of the pdf at the centre.
    const centre = 25;
    const truncation = 1 - Math.exp(-2000 / 500);
    const exactMean = (Math.exp(0) - Math.exp(-50 / 500)) / 50 * (1e6 / total);
    expect(densities[0]!.density).toBeCloseTo(exactMean, 12);
    expect(densities[0]!.density).toBeCloseTo(Math.exp(-centre / 500) / 500 / truncation, 5);
  });

  it('gives zeros for an empty histogram', () => {
    expect(histogramAsDensity([{ fromYears: 0, toYears: 10, count: 0 }])[0]!.density).toBe(0);
  });
});

describe(valuePeak.name, () => {
  it('takes the highest curve value or bar, ignoring non-finite values', () => {
    expect(valuePeak([[{ years: 1, value: 0.002 }, { years: 2, value: Infinity }]], [{ fromYears: 0, toYears: 1, density: 0.004 }])).toBe(0.004);
    expect(valuePeak([])).toBe(1);
  });
});

describe(yearsExtent.name, () => {
  it('reaches the furthest bin, curve point or marker', () => {
    expect(yearsExtent([[{ years: 1500, value: 0 }]], [{ fromYears: 0, toYears: 1800, count: 1 }], [2100, null])).toEqual([0, 2100]);
    expect(yearsExtent([])).toEqual([0, 1]);
  });
});

describe(elapsedSinceLastEvent.name, () => {
  it('counts from the last event calendar year (1950 - cal BP) to the forecast start', () => {
    // 326 cal BP is 1624 CE; from 1624 to 2026 is 402 years.
    expect(elapsedSinceLastEvent(2026, 326)).toBe(402);
  });

  it('prefers the analysis open-interval median and gives null without a last event', () => {
    expect(elapsedSinceLastEvent(2026, 326, 398.5)).toBe(398.5);
    expect(elapsedSinceLastEvent(2026, null)).toBeNull();
  });
});

describe(formatProbability.name, () => {
  it('shows one decimal of a percent and marks tiny values', () => {
    expect(formatProbability(0.1234)).toBe('12.3 %');
    expect(formatProbability(0.0004)).toBe('< 0.1 %');
    expect(formatProbability(0)).toBe('0.0 %');
  });
});

describe(recurrenceExportUrl.name, () => {
  it('addresses the analysis export endpoint', () => {
    expect(recurrenceExportUrl('a/1', 'csv')).toBe('/api/recurrence-analyses/a%2F1/export.csv');
  });
});

describe(sharedRecurrenceAxes.name, () => {
  const curve = (far: number, peak: number) => [
    { years: 0, value: 0 },
    { years: far / 2, value: peak },
    { years: far, value: 0 },
  ];
  const analysis = (far: number, peak: number, hazard: number) => ({
    histogram: [
      { fromYears: 0, toYears: far / 4, count: 3 },
      { fromYears: far / 4, toYears: far / 2, count: 1 },
    ],
    curves: [{ density: curve(far, peak), hazard: curve(far, hazard), survival: curve(far, 1) }],
  });

  it('gives both sides of a comparison the furthest years and the highest peaks of either', () => {
    const axes = sharedRecurrenceAxes([analysis(2000, 0.001, 0.002), analysis(5000, 0.0004, 0.004)]);
    expect(axes.yearsMax).toBe(5000);
    expect(axes.hazardMax).toBe(0.004);
    // The first analysis' tallest bar: 3 of its 4 draws in 500 yr, 3 / (4 x 500) = 0.0015 per year,
    // above both density curves; pooling both histograms would halve it [analytic].
    expect(axes.densityMax).toBeCloseTo(0.0015, 9);
  });
});
