/**
 * Seeded random numbers for every Monte Carlo computation, so a run is reproducible from its
 * seed. Built on pure-rand's xoroshiro128+ generator; the seed is a 32-bit integer.
 *
 * The generator's 128-bit state is filled from the seed by SplitMix32 (a 32-bit variant of
 * Steele, Lea & Flood 2014, "Fast splittable pseudorandom number generators", OOPSLA), not from
 * the seed's bits directly: pure-rand's own `xoroshiro128plus(seed)` leaves most of the state
 * zero, so small neighbouring seeds (1, 2, 3, ... as chains and runs use) gave a first uniform of
 * about 1.0 every time and correlated draws after it.
 */
import { xoroshiro128plus } from 'pure-rand';

export type RandomGenerator = ReturnType<typeof xoroshiro128plus>;

/** The n-th output (n = 1, 2, ...) of SplitMix32 started at `seed`: a well-mixed 32-bit word. */
function splitMix32(seed: number, n: number): number {
  let z = (seed + Math.imul(n, 0x9e3779b9)) | 0;
  z = Math.imul(z ^ (z >>> 16), 0x21f0aaad);
  z = Math.imul(z ^ (z >>> 15), 0x735a2d97);
  return (z ^ (z >>> 15)) | 0;
}

/** A xoroshiro128+ generator whose whole state is mixed from the seed (never all zero). */
export function seededGenerator(seed: number): RandomGenerator {
  const state = [1, 2, 3, 4].map((n) => splitMix32(seed | 0, n));
  if (!state.some((word) => word !== 0)) state[0] = 1;
  return xoroshiro128plus.fromState(state);
}

export class SeededRandom {
  private readonly generator: RandomGenerator;
  private spareNormal: number | undefined;

  constructor(seed: number) {
    this.generator = seededGenerator(seed);
  }

  /** A uniform number in [0, 1) with 53 random bits. */
  uniform(): number {
    const high = this.generator.unsafeNext() >>> 5; // 27 bits
    const low = this.generator.unsafeNext() >>> 6; // 26 bits
    return (high * 67108864 + low) / 9007199254740992;
  }

  /** An integer in [0, n). */
  integer(n: number): number {
    return Math.floor(this.uniform() * n);
  }

  /** A standard normal variate by the Marsaglia polar method. */
  normal(): number {
    if (this.spareNormal !== undefined) {
      const spare = this.spareNormal;
      this.spareNormal = undefined;
      return spare;
    }
    let u: number;
    let v: number;
    let s: number;
    do {
      u = 2 * this.uniform() - 1;
      v = 2 * this.uniform() - 1;
      s = u * u + v * v;
    } while (s >= 1 || s === 0);
    const factor = Math.sqrt((-2 * Math.log(s)) / s);
    this.spareNormal = v * factor;
    return u * factor;
  }

  /** An exponential variate with the given mean. */
  exponential(mean: number): number {
    return -mean * Math.log(1 - this.uniform());
  }

  /** A draw from a discrete density on a calendar grid, by inversion of its cumulative mass. */
  fromCumulative(cumulative: Float64Array): number {
    const u = this.uniform() * cumulative[cumulative.length - 1];
    let lo = 0;
    let hi = cumulative.length - 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (cumulative[mid] < u) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  }
}
