import { describe, expect, it } from 'vitest';
import { LADDER_GRID_POINTS } from '../chronology/common/density-views';
import { normalDensity, summarise } from '../chronology/common/density';
import { storeDensity } from './age-model-results';
import { displayPosteriors } from './latest-runs.service';

describe(displayPosteriors.name, () => {
  it('decodes each stored event posterior with its thinned points', () => {
    const density = normalDensity(2000, 300);
    const stored = storeDensity(density);
    const posteriors = displayPosteriors('run-1', {
      events: [{ eventHorizonId: 'e1', summary: summarise(density), rhat: 1, ess: 900, density: stored }],
    });
    expect(posteriors.get('e1')).toMatchObject({ rhat: 1, ess: 900 });
    const posterior = posteriors.get('e1');
    expect(posterior?.runId).toBe('run-1');
    expect(posterior?.density.startCalBp).toBe(stored.startCalBp);
    expect(Array.from(posterior?.density.probabilities ?? [])).toEqual(stored.probabilities);
    expect(posterior?.grid.values.length).toBeLessThanOrEqual(LADDER_GRID_POINTS);
    expect(displayPosteriors('run-2', null).size).toBe(0);
  });
});
