import { describe, expect, it } from 'vitest';
import { bracketingSamples, DEFAULT_RUN_SETTINGS, eventChartWindow, isFlaggedOutlier, progressPercent, readRunSettings } from './ageModelView';

const sample = (id: string, position: number, options: { excluded?: boolean; calibrated?: boolean } = {}) => ({
  id,
  labCode: id.toUpperCase(),
  excluded: options.excluded ?? false,
  unit: { position },
  calibration: options.calibrated === false ? null : { density: [{ calBp: 1000, probability: 1 }] },
});

describe(bracketingSamples.name, () => {
  it('takes the samples of the units just below and above the horizon, young side first', () => {
    const event = { id: 'e', unitBelow: { position: 3 }, unitAbove: { position: 4 } };
    const result = bracketingSamples(event, [sample('b', 3), sample('a', 4), sample('far', 1), sample('x', 3, { excluded: true }), sample('n', 4, { calibrated: false })]);
    expect(result.map(({ sample: entry, side }) => [entry.id, side])).toEqual([
      ['a', 'above'],
      ['b', 'below'],
    ]);
  });
});

describe(readRunSettings.name, () => {
  it('reads the defaults, blank seed meaning the server chooses', () => {
    expect(readRunSettings(DEFAULT_RUN_SETTINGS)).toEqual({
      ok: true,
      input: { seed: null, iterations: 20000, chains: 4, outlierPrior: 0.05, inheritanceScaleYears: 100 },
    });
  });

  it('reports every bad field at once', () => {
    const result = readRunSettings({ seed: '1.5', iterations: '10', chains: '1', outlierPrior: '0', inheritanceScaleYears: '-3' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(Object.keys(result.errors).sort()).toEqual(['chains', 'inheritanceScaleYears', 'iterations', 'outlierPrior', 'seed']);
  });
});

describe(isFlaggedOutlier.name, () => {
  it('flags above 0.3 only', () => {
    expect(isFlaggedOutlier(0.31)).toBe(true);
    expect(isFlaggedOutlier(0.3)).toBe(false);
  });
});

describe(progressPercent.name, () => {
  it('clamps to 0-100', () => {
    expect(progressPercent(0.456)).toBe(46);
    expect(progressPercent(1.2)).toBe(100);
  });
});

describe(eventChartWindow.name, () => {
  /** A normal-shaped density on a 1-year grid over 0-7000 cal BP, with its far tails as tiny values. */
  const bump = (mean: number, sd: number) =>
    Array.from({ length: 7001 }, (_, calBp) => ({ calBp, probability: Math.exp(-0.5 * ((calBp - mean) / sd) ** 2) + 1e-9 }));

  it('fits each event to its own posterior and bracketing samples, not the whole site span', () => {
    const young = eventChartWindow(bump(800, 30), [bump(760, 40), bump(850, 40)]);
    const old = eventChartWindow(bump(5200, 40), [bump(5300, 50)]);
    expect(young[1] - young[0]).toBeLessThan(600);
    expect(young[0]).toBeLessThanOrEqual(760 - 2 * 40);
    expect(young[1]).toBeGreaterThanOrEqual(850 + 2 * 40);
    expect(old[0]).toBeGreaterThan(young[1]);
    expect(old[0]).toBeLessThanOrEqual(5200 - 2 * 40);
  });
});
