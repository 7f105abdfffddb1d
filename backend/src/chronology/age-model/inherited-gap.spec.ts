import { readFileSync } from 'fs';
import { join } from 'path';
import { describe, expect, it } from 'vitest';
import { runAgeModel } from './age-model';
import { AgeModelInput } from './column';

/**
 * An invented trench column (fixtures/inherited-gap-column.json): one sample per unit, three
 * events, detrital charcoal above E2 older than the soil below E2. With outliers allowed its
 * posterior can have a small second mode where the three older samples are outliers and the
 * column shrinks to a short span; before the path update (`OrderChain.pathUpdate`) the chains did
 * not cross between the modes (split R-hat 1.16 at the default settings with this seed). The
 * model's accuracy against exact sums is checked in exact-prior.spec.ts and age-model.spec.ts.
 */
function loadColumn(): AgeModelInput {
  type Stored = Omit<AgeModelInput, 'samples'> & {
    samples: (Omit<AgeModelInput['samples'][number], 'likelihood'> & {
      likelihood: { startCalBp: number; probabilities: number[] };
    })[];
  };
  const stored = JSON.parse(readFileSync(join(__dirname, 'fixtures', 'inherited-gap-column.json'), 'utf8')) as Stored;
  return {
    ...stored,
    samples: stored.samples.map((s) => ({
      ...s,
      likelihood: { startCalBp: s.likelihood.startCalBp, probabilities: Float64Array.from(s.likelihood.probabilities) },
    })),
  };
}

describe(runAgeModel.name, () => {
  describe('a column whose older samples can all be outliers together', () => {
    const result = runAgeModel(loadColumn(), { seed: 20_260_101 });

    it('converges at the default settings (split R-hat <= 1.05, ESS >= 200 for every event)', () => {
      expect(result.diagnostics.converged).toBe(true);
      expect(result.diagnostics.maxRhat).toBeLessThanOrEqual(1.05);
      expect(result.diagnostics.minEss).toBeGreaterThanOrEqual(200);
    });
  });
});
