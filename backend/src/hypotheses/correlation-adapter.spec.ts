import { describe, expect, it } from 'vitest';
import { storeDensity } from '../age-models/age-model-results';
import { checkHypothesis } from '../chronology/correlation';
import { normalDensity, summarise, type CalendarDensity } from '../chronology/common/density';
import { checkProjectHypothesis, displayPosteriors, forGrouping, gridPoints, LADDER_GRID_POINTS, thinDensity, thinToGrid, type ProjectEvent } from './correlation-adapter';

// An invented margin: Alder Marsh at 0 km, Brisk Core at 100 km, Corrie Trench at 250 km.
const SITES: Record<string, { siteName: string; alongStrikeKm: number }> = {
  A: { siteName: 'Alder Marsh', alongStrikeKm: 0 },
  B: { siteName: 'Brisk Core', alongStrikeKm: 100 },
  C: { siteName: 'Corrie Trench', alongStrikeKm: 250 },
};

function event(id: string, posterior: CalendarDensity | null): ProjectEvent {
  return { id, name: id, siteId: id[0], ...SITES[id[0]], orderIndexFromBase: Number(id.slice(1)), posterior };
}

describe(thinDensity.name, () => {
  it('keeps every year of a density that already fits', () => {
    const density = { startCalBp: 500, probabilities: Float64Array.of(0.1, 0.2, 0.4, 0.3) };
    expect(thinDensity(density, 4)).toEqual([
      { calBp: 500, probability: 0.1 },
      { calBp: 501, probability: 0.2 },
      { calBp: 502, probability: 0.4 },
      { calBp: 503, probability: 0.3 },
    ]);
  });

  it('pools a long density into bins of mean probability at their middle years', () => {
    const density = normalDensity(3000, 200); // 2401 years
    const points = thinDensity(density, 400);
    const width = Math.ceil(density.probabilities.length / 400); // 7 years per bin
    expect(points.length).toBeLessThanOrEqual(400);
    expect(points.length).toBe(Math.ceil(density.probabilities.length / width));
    // Brute force: the mean of the bin's years, placed at its middle year [analytic].
    const bin = 123;
    const years = Array.from(density.probabilities.slice(bin * width, (bin + 1) * width));
    expect(points[bin].probability).toBeCloseTo(years.reduce((s, p) => s + p, 0) / width, 15);
    expect(points[bin].calBp).toBe(density.startCalBp + bin * width + Math.floor((width - 1) / 2));
    // Mean x bin width summed over the bins is the density's mass, 1 [analytic].
    const lastWidth = density.probabilities.length - (points.length - 1) * width;
    const area = points.reduce((s, p, i) => s + p.probability * (i === points.length - 1 ? lastWidth : width), 0);
    expect(area).toBeCloseTo(1, 12);
  });

  it('refuses a point budget below one', () => {
    expect(() => thinDensity(normalDensity(100, 5), 0)).toThrow(RangeError);
  });
});

describe(checkProjectHypothesis.name, () => {
  const aged = [
    event('A1', normalDensity(1500, 40)),
    event('A2', normalDensity(900, 30)),
    event('B1', normalDensity(1520, 50)),
    event('B2', normalDensity(910, 25)),
  ];
  const ties = [
    { id: 't1', eventAId: 'A1', eventBId: 'B1' },
    { id: 't2', eventAId: 'A2', eventBId: 'B2' },
  ];

  it('gives what checkHypothesis gives when every event has a posterior', () => {
    const adapted = checkProjectHypothesis(aged, ties, 'SUBDUCTION_INTERFACE');
    const direct = checkHypothesis({ events: forGrouping(aged), ties, tectonicSetting: 'SUBDUCTION_INTERFACE' });
    expect(adapted).toEqual(direct);
  });

  it('drops age figures of a group with an unaged member, with a warning naming it, but keeps length and magnitude', () => {
    const events = [...aged, event('C1', null)];
    const result = checkProjectHypothesis(events, [...ties, { id: 't3', eventAId: 'B1', eventBId: 'C1' }], 'SUBDUCTION_INTERFACE');
    const group = result.regionalEvents.find((r) => r.memberIds.includes('C1'));
    expect(group).toBeDefined();
    expect(group?.memberIds).toEqual(['A1', 'B1', 'C1']);
    expect(group?.combined).toBeNull();
    expect(group?.combinedDensity).toBeNull();
    expect(group?.concordance).toBeNull();
    expect(group?.chiSquare).toBeNull();
    expect(group?.notes).toHaveLength(1);
    expect(group?.notes[0]).toContain('"C1" at Corrie Trench');
    // Span 0-250 km; Mw = 4.868 + 1.392 log10(250), Strasser et al. 2010 interface length
    // relation (coefficients [memory], CHECKS.md).
    expect(group?.ruptureLengthKm).toBe(250);
    expect(group?.magnitude?.mw).toBeCloseTo(4.868 + 1.392 * Math.log10(250), 12);
    // The group without an age goes after the aged ones (young to old: A2|B2 first).
    expect(result.regionalEvents.map((r) => r.id)).toEqual(['A2|B2', 'A1|B1|C1']);
  });

  it('keeps the one-site note for an unaged event of one site and puts it last', () => {
    const result = checkProjectHypothesis([...aged, event('C1', null)], ties, 'CRUSTAL');
    const last = result.regionalEvents[result.regionalEvents.length - 1];
    expect(last.memberIds).toEqual(['C1']);
    expect(last.notes).toEqual([expect.stringContaining('no age model posterior'), 'Recorded at one site only: no rupture length or magnitude.']);
  });

  it('still finds crossing ties when an event has no age', () => {
    const events = [event('A1', normalDensity(1500, 40)), event('A2', null), event('B1', normalDensity(900, 30)), event('B2', normalDensity(1500, 40))];
    // A1 (lower) with B2 (upper) and A2 (upper) with B1 (lower): the ties cross.
    const crossing = [
      { id: 'x', eventAId: 'A1', eventBId: 'B2' },
      { id: 'y', eventAId: 'A2', eventBId: 'B1' },
    ];
    const result = checkProjectHypothesis(events, crossing, 'CRUSTAL');
    expect(result.orderConflicts).toHaveLength(1);
    expect([result.orderConflicts[0].tieAId, result.orderConflicts[0].tieBId].sort()).toEqual(['x', 'y']);
  });
});

describe(displayPosteriors.name, () => {
  it('decodes each stored event posterior with its thinned points', () => {
    const density = normalDensity(2000, 300);
    const stored = storeDensity(density);
    const posteriors = displayPosteriors('run-1', {
      events: [{ eventHorizonId: 'e1', summary: summarise(density), rhat: 1, ess: 900, density: stored }],
    });
    const posterior = posteriors.get('e1');
    expect(posterior?.runId).toBe('run-1');
    expect(posterior?.density.startCalBp).toBe(stored.startCalBp);
    expect(Array.from(posterior?.density.probabilities ?? [])).toEqual(stored.probabilities);
    expect(posterior?.grid.values.length).toBeLessThanOrEqual(LADDER_GRID_POINTS);
    expect(displayPosteriors('run-2', null).size).toBe(0);
  });
});

describe(thinToGrid.name, () => {
  // A normal density has unit mass [analytic]; pooling into bins must keep it (area = sum of value x step).
  it('keeps the mass, caps the number of values and places values at bin middles', () => {
    const density = normalDensity(1500, 80);
    const grid = thinToGrid(density, 120);
    expect(grid.values.length).toBeLessThanOrEqual(120);
    expect(grid.values.reduce((sum, v) => sum + v * grid.stepYears, 0)).toBeCloseTo(1, 3);
    expect(grid.startCalBp).toBe(density.startCalBp + (grid.stepYears - 1) / 2);
    const peak = grid.values.indexOf(Math.max(...grid.values));
    expect(Math.abs(grid.startCalBp + peak * grid.stepYears - 1500)).toBeLessThanOrEqual(grid.stepYears);
  });

  it('leaves a short density on its 1-year grid and expands to matching points', () => {
    const density = normalDensity(300, 5);
    const grid = thinToGrid(density, LADDER_GRID_POINTS);
    expect(grid.stepYears).toBe(1);
    const points = gridPoints(grid);
    expect(points[0]).toEqual({ calBp: density.startCalBp, probability: grid.values[0] });
    expect(points).toHaveLength(density.probabilities.length);
  });
});
