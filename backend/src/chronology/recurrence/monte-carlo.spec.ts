import { describe, expect, it } from 'vitest';
import { normalDensity } from '../common/density';
import { RecurrenceCancelledError, RecurrenceInputError } from './errors';
import { credibleRange, intervalStatistics, simulateRecurrence, summariseRecurrence } from './monte-carlo';

/** z of the 97.5 % point of the normal [published: any normal table]. */
const Z975 = 1.959963984540054;

describe(summariseRecurrence.name, () => {
  const draws = [
    [1000, 800, 500],
    [500, 1010, 790], // any order: sorted oldest first before use
    [1020, 790, 520],
  ];
  const options = { forecastStartYearCe: 2000, windowsYears: [30, 100] };

  it('takes intervals between consecutive events, oldest first, in every draw [analytic]', () => {
    const summary = summariseRecurrence(draws, options);
    expect(summary.eventCount).toBe(3);
    expect(summary.drawCount).toBe(3);
    // Draw intervals: (200, 300), (220, 290), (230, 270).
    expect(summary.intervals[0].median).toBe(220);
    expect(summary.intervals[1].median).toBe(290);
    expect(summary.meanRecurrence.median).toBe(250);
    // Forecast start 2000 CE = -50 cal BP; open intervals 550, 550, 570.
    expect(summary.forecastStartCalBp).toBe(-50);
    expect(summary.openInterval.median).toBe(550);
    expect(summary.medianSequence.eventAgesCalBp).toEqual([1010, 790, 500]);
    expect(summary.medianSequence.closedIntervals).toEqual([220, 290]);
    expect(summary.medianSequence.openInterval).toBe(550);
  });

  it('reports every model with window probabilities in [0, 1] that grow with the window', () => {
    const summary = summariseRecurrence(draws, options);
    expect(summary.models.map((model) => model.model)).toEqual(['POISSON', 'BPT', 'LOGNORMAL', 'WEIBULL']);
    const shares = summary.models.reduce((sum, model) => sum + model.preferredShare, 0);
    expect(shares).toBeCloseTo(1, 12);
    for (const model of summary.models) {
      const [short, long] = model.probabilities;
      expect(short.windowYears).toBe(30);
      for (const value of [short.probability.low95, short.probability.median, long.probability.high95]) {
        expect(value).toBeGreaterThanOrEqual(0);
        expect(value).toBeLessThanOrEqual(1);
      }
      expect(long.probability.median).toBeGreaterThan(short.probability.median);
    }
    expect(summary.medianSequence.fits).toHaveLength(4);
    expect(summary.medianSequence.comparison.rows).toHaveLength(4);
  });

  it('sets the plain Poisson figure 1 - exp(-dT / mean recurrence) beside the models [analytic]', () => {
    const summary = summariseRecurrence(draws, options);
    // An odd number of draws: the median of a monotone transform is the transform of the median.
    expect(summary.poissonFromMeanRecurrence[0].probability.median).toBeCloseTo(1 - Math.exp(-30 / 250), 14);
    expect(summary.medianSequence.poissonFromMeanRecurrence[1].probability).toBeCloseTo(1 - Math.exp(-100 / 255), 14);
  });

  it('refuses records it cannot use, naming the field', () => {
    const fieldOf = (run: () => unknown): string | undefined => {
      try {
        run();
      } catch (error) {
        if (error instanceof RecurrenceInputError) return error.field;
        throw error;
      }
      return undefined;
    };
    expect(fieldOf(() => summariseRecurrence([[900, 500]], options))).toBe('eventAgeDraws');
    expect(fieldOf(() => summariseRecurrence([[900, 700, 500], [900, 500]], options))).toBe('eventAgeDraws');
    expect(fieldOf(() => summariseRecurrence([[900, 500, Number.NaN]], options))).toBe('eventAgeDraws');
    expect(fieldOf(() => summariseRecurrence(draws, { ...options, forecastStartYearCe: 1000 }))).toBe('forecastStartYearCe');
    expect(fieldOf(() => summariseRecurrence(draws, { ...options, windowsYears: [0] }))).toBe('windowsYears');
    expect(fieldOf(() => summariseRecurrence([], options))).toBe('eventAgeDraws');
  });

  it('reports progress and stops when asked to', () => {
    const many = Array.from({ length: 50 }, (_, d) => [1000 + d, 800, 500 - d]);
    const reports: number[] = [];
    summariseRecurrence(many, { ...options, progressInterval: 10, onProgress: (done, total) => reports.push(done / total) });
    expect(reports).toEqual([0.2, 0.4, 0.6, 0.8, 1]);

    let polls = 0;
    const cancel = (): boolean => ++polls > 2;
    expect(() => summariseRecurrence(many, { ...options, progressInterval: 10, shouldCancel: cancel })).toThrow(
      RecurrenceCancelledError,
    );
    try {
      polls = 0;
      summariseRecurrence(many, { ...options, progressInterval: 10, shouldCancel: cancel });
    } catch (error) {
      expect((error as RecurrenceCancelledError).completedDraws).toBe(20);
    }
  });
});

describe(simulateRecurrence.name, () => {
  // Events N(1000, 30), N(800, 20), N(500, 40) cal BP, given young to old.
  const densities = [normalDensity(500, 40), normalDensity(800, 20), normalDensity(1000, 30)];
  const options = { forecastStartYearCe: 2025, windowsYears: [30, 50, 100], drawCount: 20_001, seed: 11 };

  it('gives mean recurrence 250 with SD 25.0 and a first interval with SD 36.06 [analytic]', () => {
    // Mean recurrence = (oldest - youngest) / 2: SD sqrt(30^2 + 40^2) / 2 = 25; first interval
    // 1000 -> 800: SD sqrt(30^2 + 20^2) = 36.06; SDs read from the 95 % ranges as width / (2 z).
    const summary = simulateRecurrence(densities, { ...options, models: ['POISSON'] });
    const sdFromRange = (range: { low95: number; high95: number }): number => (range.high95 - range.low95) / (2 * Z975);
    expect(summary.meanRecurrence.median).toBeCloseTo(250, 0);
    expect(sdFromRange(summary.meanRecurrence)).toBeCloseTo(25.0, 0);
    expect(summary.intervals[0].median).toBeCloseTo(200, 0);
    expect(sdFromRange(summary.intervals[0])).toBeCloseTo(36.06, 0);
    expect(sdFromRange(summary.intervals[1])).toBeCloseTo(Math.sqrt(20 ** 2 + 40 ** 2), 0);
    // Open interval from the youngest event to 2025 CE (-75 cal BP): 575 +- 40. The Monte Carlo
    // error of a median of n draws is 1.2533 sd / sqrt(n) = 0.35 years here [analytic]; allow 3.
    expect(Math.abs(summary.openInterval.median - 575)).toBeLessThan(3 * 1.2533 * 40 / Math.sqrt(options.drawCount));
  });

  it('gives the same result from the same seed and a different one from another seed', () => {
    const small = { ...options, drawCount: 300 };
    const first = simulateRecurrence(densities, small);
    expect(simulateRecurrence(densities, small)).toEqual(first);
    expect(simulateRecurrence(densities, { ...small, seed: 12 }).meanRecurrence).not.toEqual(first.meanRecurrence);
  });

  it('refuses a draw count that is not a whole number of at least 1', () => {
    expect(() => simulateRecurrence(densities, { ...options, drawCount: 0 })).toThrow(RecurrenceInputError);
  });
});

describe(credibleRange.name, () => {
  it('takes the median and the 2.5 % and 97.5 % points by linear interpolation (Hyndman & Fan 1996 type 7) [analytic]', () => {
    const values = Array.from({ length: 41 }, (_, i) => 40 - i); // 0..40, reversed
    expect(credibleRange(values)).toEqual({ median: 20, low95: 1, high95: 39 });
  });
});

describe(intervalStatistics.name, () => {
  it('gives mean, median, sample SD and CV [analytic]', () => {
    const stats = intervalStatistics([200, 300, 250, 350]);
    expect(stats.mean).toBe(275);
    expect(stats.median).toBe(275);
    expect(stats.sd).toBeCloseTo(Math.sqrt((75 ** 2 + 25 ** 2 + 25 ** 2 + 75 ** 2) / 3), 12);
    expect(stats.cv).toBeCloseTo(stats.sd / 275, 14);
  });
});
