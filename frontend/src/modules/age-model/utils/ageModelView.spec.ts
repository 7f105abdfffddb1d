import { describe, expect, it } from 'vitest';
import { bracketingSamples, DEFAULT_RUN_SETTINGS, isFlaggedOutlier, progressPercent, readRunSettings } from './ageModelView';

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
