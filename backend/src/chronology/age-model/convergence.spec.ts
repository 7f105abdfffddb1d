import { describe, expect, it } from 'vitest';
import { SeededRandom } from '../common/random';
import { chainDiagnostics } from './convergence';

function chains(count: number, length: number, draw: (chain: number, t: number, previous: number) => number): Float64Array[] {
  return Array.from({ length: count }, (_, c) => {
    const out = new Float64Array(length);
    let previous = 0;
    for (let t = 0; t < length; t++) {
      previous = draw(c, t, previous);
      out[t] = previous;
    }
    return out;
  });
}

describe(chainDiagnostics.name, () => {
  it('gives R-hat near 1 and ESS near the draw count for independent draws', () => {
    // Source: for iid draws the integrated autocorrelation time is 1, so ESS = S, and
    // var+ / W -> 1 (BDA3 section 11.4-11.5) [analytic]. Sampling sd of ESS is a few percent.
    const random = new SeededRandom(1);
    const d = chainDiagnostics(chains(4, 2000, () => random.normal()));
    expect(d.rhat).toBeLessThan(1.01);
    expect(d.ess / 8000).toBeGreaterThan(0.9);
    expect(d.ess / 8000).toBeLessThan(1.1);
  });

  it('gives ESS = S (1 - phi) / (1 + phi) for an AR(1) chain', () => {
    // Source: an AR(1) process x_t = phi x_{t-1} + e_t has autocorrelation phi^k, so
    // tau = 1 + 2 sum phi^k = (1 + phi) / (1 - phi) [analytic]; phi = 0.8 gives S / 9.
    const random = new SeededRandom(2);
    const phi = 0.8;
    const d = chainDiagnostics(chains(4, 5000, (_, t, prev) => (t === 0 ? random.normal() / 0.6 : phi * prev + random.normal())));
    const expected = (20000 * (1 - phi)) / (1 + phi);
    expect(d.ess / expected).toBeGreaterThan(0.85);
    expect(d.ess / expected).toBeLessThan(1.15);
    expect(d.rhat).toBeLessThan(1.02);
  });

  it('flags chains that sit in different places', () => {
    // Source: one chain offset by 1 sd inflates the between-chain variance B, so R-hat is
    // clearly above 1.05 (BDA3 eq. 11.4) [analytic].
    const random = new SeededRandom(3);
    const d = chainDiagnostics(chains(4, 1000, (c) => random.normal() + (c === 0 ? 1 : 0)));
    expect(d.rhat).toBeGreaterThan(1.05);
  });

  it('flags chains with equal means but different spread through the folded R-hat', () => {
    // Source: Vehtari et al. 2021, section 4.2: bulk R-hat misses a difference in scale that the
    // folded draws |x - median| expose [published].
    const random = new SeededRandom(4);
    const d = chainDiagnostics(chains(4, 1000, (c) => random.normal() * (c === 0 ? 3 : 1)));
    expect(d.rhat).toBeGreaterThan(1.05);
  });

  it('flags a chain that trends within itself through the split', () => {
    // Source: splitting each chain in half turns a drift into a between-half difference (BDA3
    // section 11.4) [analytic].
    const random = new SeededRandom(5);
    const d = chainDiagnostics(chains(4, 1000, (_, t) => random.normal() + t / 250));
    expect(d.rhat).toBeGreaterThan(1.05);
  });

  it('treats a quantity that never varies as converged', () => {
    const d = chainDiagnostics(chains(4, 100, () => 1200));
    expect(d.rhat).toBe(1);
    expect(d.ess).toBe(400);
  });
});
