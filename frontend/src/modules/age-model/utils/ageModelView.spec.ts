import { describe, expect, it } from 'vitest';
import {
  bracketingSamples,
  DEFAULT_RUN_SETTINGS,
  defaultDepthModel,
  eventChartWindow,
  formatOffset,
  initialRunSettings,
  isFlaggedOutlier,
  progressPercent,
  readRunSettings,
  withDepthModel,
} from './ageModelView';

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
      input: { depthModel: 'ORDER_ONLY', seed: null, iterations: 20000, chains: 4, outlierPrior: 0.05, outlierShiftScaleYears: 500, inheritanceScaleYears: 100 },
    });
  });

  it('reports every bad field at once, on the server bounds', () => {
    const result = readRunSettings({
      ...DEFAULT_RUN_SETTINGS,
      seed: '1.5',
      iterations: '400',
      chains: '3',
      outlierPrior: '0.6',
      outlierShiftScaleYears: '5',
      inheritanceScaleYears: '-3',
    });
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(Object.keys(result.errors).sort()).toEqual(['chains', 'inheritanceScaleYears', 'iterations', 'outlierPrior', 'outlierShiftScaleYears', 'seed']);
    }
  });

  it('sends the rate prior for the hemipelagic model only, blank meaning measured', () => {
    const hemipelagic = { ...DEFAULT_RUN_SETTINGS, depthModel: 'HEMIPELAGIC_RATE' as const };
    expect(readRunSettings(hemipelagic)).toMatchObject({ ok: true, input: { depthModel: 'HEMIPELAGIC_RATE', hemipelagicRateCmPerKyr: null } });
    expect(readRunSettings({ ...hemipelagic, hemipelagicRateCmPerKyr: '12,5' })).toMatchObject({ ok: true, input: { hemipelagicRateCmPerKyr: 12.5 } });
    expect(readRunSettings({ ...hemipelagic, hemipelagicRateCmPerKyr: '0.05' })).toEqual({ ok: false, errors: { hemipelagicRateCmPerKyr: 'must be at least 0.1' } });
    const orderOnly = readRunSettings({ ...DEFAULT_RUN_SETTINGS, hemipelagicRateCmPerKyr: '0.05' });
    expect(orderOnly.ok && 'hemipelagicRateCmPerKyr' in orderOnly.input).toBe(false);
  });
});

describe(defaultDepthModel.name, () => {
  const mud = { facies: 'HEMIPELAGIC_MUD', topDepthM: 0, baseDepthM: 0.4 };
  const bed = { facies: 'TURBIDITE', topDepthM: 0.4, baseDepthM: 0.5 };

  it('picks the hemipelagic model for a core with mud units that have depths', () => {
    expect(defaultDepthModel({ kind: 'CORE', units: [mud, bed] })).toBe('HEMIPELAGIC_RATE');
    expect(initialRunSettings({ kind: 'CORE', units: [mud, bed] })).toMatchObject({ depthModel: 'HEMIPELAGIC_RATE', iterations: '4000' });
  });

  it('keeps order only for other sites, cores without mud, or mud without a thickness', () => {
    expect(defaultDepthModel({ kind: 'TRENCH', units: [mud] })).toBe('ORDER_ONLY');
    expect(defaultDepthModel({ kind: 'CORE', units: [bed] })).toBe('ORDER_ONLY');
    expect(defaultDepthModel({ kind: 'CORE', units: [{ ...mud, baseDepthM: 0 }] })).toBe('ORDER_ONLY');
  });
});

describe(withDepthModel.name, () => {
  it('moves untouched iterations to the new model default and keeps typed ones', () => {
    expect(withDepthModel(DEFAULT_RUN_SETTINGS, 'HEMIPELAGIC_RATE').iterations).toBe('4000');
    expect(withDepthModel({ ...DEFAULT_RUN_SETTINGS, iterations: '5000' }, 'HEMIPELAGIC_RATE').iterations).toBe('5000');
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

describe(formatOffset.name, () => {
  it('signs inherited offsets + and intruded ones −, with the 95 % range', () => {
    expect(formatOffset({ medianYears: 210.4, low95Years: 39.6, high95Years: 520 })).toBe('+210 yr (+40 to +520)');
    expect(formatOffset({ medianYears: -35, low95Years: -120.2, high95Years: -1 })).toBe('−35 yr (−120 to −1)');
    expect(formatOffset(null)).toBe('–');
  });
});
