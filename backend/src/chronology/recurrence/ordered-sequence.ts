/**
 * Joint draws of a sequence of event ages whose stratigraphic (or correlation) order is known:
 * the events' own calendar densities p_i, with the constraint that each event is older than the
 * one before it. The joint target is
 *   pi(t_0, ..., t_{n-1}) ∝ prod_i p_i(t_i) x 1[t_0 < t_1 < ... < t_{n-1}]   (cal BP, young to old),
 * the product of independent likelihoods restricted to the known order, as in the ordering models
 * of Buck, Kenworthy, Litton & Smith 1991 (Antiquity 65) without their uniform-phase prior.
 *
 * Sampling is exact sequential conditional sampling on the 1-year grid, not rejection: a backward
 * pass computes for each event the mass of the whole older chain that can follow it,
 *   m_{n-1}(t) = p_{n-1}(t),   m_i(t) = p_i(t) x sum_{s > t} m_{i+1}(s),
 * and a forward pass then draws t_0 from m_0 and each t_i from m_i restricted to t_i > t_{i-1}.
 * That is the exact joint distribution (the forward-filtering / backward-sampling idea for a
 * chain, e.g. Carter & Kohn 1994, Biometrika 81(3)), however much the densities overlap, so there
 * is no rejection rate to fall back from. Rejection of independent draws would be exact too but
 * slows without bound as overlap grows, and sampling each event from its own density truncated
 * at the previous age is not exact: it ignores the pull of the older events.
 *
 * Each grid year stands for the year centred on it (as `quantile` in density.ts reads it); a
 * uniform jitter of +-0.5 year inside the year keeps ages continuous and, because consecutive
 * years differ by at least 1, keeps every draw strictly ordered.
 */
import type { CalendarDensity } from '../common/density';
import type { SeededRandom } from '../common/random';
import { RecurrenceInputError } from './errors';

interface ChainLink {
  readonly startCalBp: number;
  /** Cumulative chain mass m_i, young to old, normalised to end at 1. */
  readonly cumulative: Float64Array;
}

/** Draws one ordered sequence of ages (cal BP, young to old, strictly increasing). */
export type OrderedSequenceSampler = (rng: SeededRandom) => Float64Array;

/**
 * Prepares exact ordered sampling for events whose densities are given young to old
 * (`densities[0]` is the youngest event). The backward pass costs O(total grid length) once;
 * each draw then costs O(n log grid length). Throws `RecurrenceInputError` when the densities
 * leave no room for the order (an event that cannot be older than the one before it).
 */
export function orderedSequenceSampler(densities: readonly CalendarDensity[]): OrderedSequenceSampler {
  if (densities.length === 0) {
    throw new RecurrenceInputError('densities', 'There are no event densities to sample.');
  }
  densities.forEach(checkDensity);
  const n = densities.length;
  const links: ChainLink[] = new Array(n);
  for (let i = n - 1; i >= 0; i--) {
    const density = densities[i];
    const older = i + 1 < n ? links[i + 1] : undefined;
    const p = density.probabilities;
    const cumulative = new Float64Array(p.length);
    let total = 0;
    for (let k = 0; k < p.length; k++) {
      const chainMass = older ? massOlderThan(older, density.startCalBp + k) : 1;
      total += p[k] * chainMass;
      cumulative[k] = total;
    }
    if (!(total > 0)) {
      throw new RecurrenceInputError(
        'densities',
        i + 1 < n
          ? `Event ${i + 2} (counting from the youngest) cannot be older than event ${i + 1}: their age densities leave no room for that order.`
          : `Event ${i + 1} has an empty age density.`,
      );
    }
    for (let k = 0; k < cumulative.length; k++) cumulative[k] /= total;
    links[i] = { startCalBp: density.startCalBp, cumulative };
  }

  return (rng) => {
    const ages = new Float64Array(n);
    let previousYear = -Infinity;
    for (let i = 0; i < n; i++) {
      const link = links[i];
      const floor = massUpTo(link, previousYear);
      const target = floor + rng.uniform() * (1 - floor);
      const index = firstAbove(link.cumulative, target);
      const year = link.startCalBp + index;
      ages[i] = year + (rng.uniform() - 0.5);
      previousYear = year;
    }
    return ages;
  };
}

/** One ordered draw; for many draws build the sampler once with `orderedSequenceSampler`. */
export function drawOrderedSequence(densities: readonly CalendarDensity[], rng: SeededRandom): Float64Array {
  return orderedSequenceSampler(densities)(rng);
}

function checkDensity(density: CalendarDensity, index: number): void {
  const p = density.probabilities;
  if (p.length === 0) {
    throw new RecurrenceInputError('densities', `Event ${index + 1} has an empty age density.`);
  }
  for (let k = 0; k < p.length; k++) {
    if (!(p[k] >= 0) || !Number.isFinite(p[k])) {
      throw new RecurrenceInputError('densities', `Event ${index + 1} has a density value that is not a probability.`);
    }
  }
}

/** Chain mass at grid years up to and including `year`. */
function massUpTo(link: ChainLink, year: number): number {
  const index = Math.floor(year - link.startCalBp);
  if (index < 0) return 0;
  if (index >= link.cumulative.length) return 1;
  return link.cumulative[index];
}

/** Chain mass strictly older than `year`. */
function massOlderThan(link: ChainLink, year: number): number {
  return 1 - massUpTo(link, year);
}

/** First index whose cumulative mass exceeds `target` (so zero-mass years are never drawn). */
function firstAbove(cumulative: Float64Array, target: number): number {
  let low = 0;
  let high = cumulative.length - 1;
  while (low < high) {
    const middle = (low + high) >> 1;
    if (cumulative[middle] > target) high = middle;
    else low = middle + 1;
  }
  return low;
}
