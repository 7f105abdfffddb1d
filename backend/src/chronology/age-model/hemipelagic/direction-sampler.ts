/**
 * The hemipelagic core's sampler: Metropolis-within-Gibbs along fixed directions, visited in turn.
 *
 * One sweep proposes, one after another, a Gaussian random-walk step along each direction v of a
 * fixed list: y' = y + s_v z v with z ~ N(0, 1). Each such move is a symmetric translation of the
 * sampler's coordinates (its Jacobian is 1), so accepting with probability min(1, pi(y') / pi(y))
 * keeps the target pi exactly (Metropolis et al. 1953; a cycle of kernels that each keep pi keeps
 * pi, Tierney 1994, Ann. Statist. 22(4):1701-1762). The core model supplies the directions:
 * each coordinate alone (one section's rate, the anchor age, the memory, one eroded thickness) and
 * joint ones such as every log rate at once, which multiplies every rate by one factor c. On the
 * rates themselves that scaling move has Jacobian c^K, which the model's density on log rates
 * already carries (it is the density of the rates times their product), so the move needs no
 * further correction; the exact-posterior spec checks this against quadrature.
 *
 * Each direction's step size adapts during burn-in only, towards an acceptance rate of 0.44 for a
 * one-dimensional move (Roberts & Rosenthal 2009, "Examples of adaptive MCMC", J. Comput. Graph.
 * Stat. 18(2):349-367, section 3), by a Robbins-Monro step on its logarithm. At the end of burn-in
 * the sampler may add the principal axes of the burn-in's draws as further directions (their
 * covariance then is fixed), which lets it move along the few combinations of rates that the
 * dated levels pin down, and the three widest of them once more with a step four times as long
 * (choices made before the kept draws, so each is a fixed symmetric move); after burn-in nothing adapts, so the kept draws come from one fixed
 * Metropolis-within-Gibbs kernel.
 */
import { SeededRandom } from '../../common/random';

/** Acceptance rate a one-dimensional random-walk step adapts towards (Roberts & Rosenthal 2009). */
const TARGET_ACCEPTANCE = 0.44;

/** The number of widest principal axes also proposed with a long step, and its factor. */
const LONG_AXES = 3;
const LONG_STEP = 4;

/** One direction of the sweep: a sparse vector of sampler coordinates and their weights. */
export interface Direction {
  readonly name: string;
  readonly indices: Int32Array;
  readonly weights: Float64Array;
  /** Initial step size along the direction. */
  readonly scale: number;
}

/** A direction along one coordinate. */
export function coordinateDirection(name: string, index: number, scale: number): Direction {
  return { name, indices: Int32Array.of(index), weights: Float64Array.of(1), scale };
}

export interface DirectionSamplerOptions {
  /** Add the principal axes of the burn-in's second half as directions once burn-in ends. */
  readonly principalAxes: boolean;
  /** Sweeps of burn-in (the axes are learnt from the second half of them). */
  readonly burnIn: number;
}

export class DirectionSampler {
  readonly dimension: number;
  readonly state: Float64Array;
  logDensity: number;
  /** Moves accepted and proposed, by the group name before the first ':' of a direction's name. */
  readonly tally = new Map<string, { accepted: number; proposed: number }>();
  private directions: Direction[];
  private logScales: Float64Array;
  private adaptations: Float64Array;
  private readonly proposal: Float64Array;
  // Running mean and scatter of the burn-in's states (Welford), for the principal axes.
  private readonly mean: Float64Array;
  private readonly scatter: Float64Array;
  private seen = 0;
  private sweeps = 0;
  private frozen = false;

  constructor(
    private readonly target: (y: Float64Array) => number,
    start: Float64Array,
    directions: readonly Direction[],
    private readonly random: SeededRandom,
    private readonly options: DirectionSamplerOptions,
  ) {
    this.dimension = start.length;
    this.state = Float64Array.from(start);
    this.logDensity = target(this.state);
    if (!Number.isFinite(this.logDensity)) throw new RangeError('the starting state has no posterior density');
    this.directions = [...directions];
    this.logScales = Float64Array.from(directions, (d) => Math.log(d.scale));
    this.adaptations = new Float64Array(directions.length);
    this.proposal = Float64Array.from(start);
    this.mean = new Float64Array(this.dimension);
    this.scatter = new Float64Array(this.dimension * this.dimension);
  }

  /** The step size of each direction, by name (for tests and reports). */
  scales(): Map<string, number> {
    return new Map(this.directions.map((d, k) => [d.name, Math.exp(this.logScales[k])]));
  }

  /** One sweep: a move along each direction in turn. `adapt` tunes the step sizes (burn-in only). */
  sweep(adapt: boolean): void {
    if (!adapt && !this.frozen) this.freeze();
    for (let k = 0; k < this.directions.length; k++) this.move(k, adapt);
    if (adapt && this.options.principalAxes && ++this.sweeps > this.options.burnIn / 2) this.learn();
  }

  private move(k: number, adapt: boolean): void {
    const { indices, weights, name } = this.directions[k];
    const step = Math.exp(this.logScales[k]) * this.random.normal();
    const y = this.proposal;
    for (let i = 0; i < indices.length; i++) y[indices[i]] = this.state[indices[i]] + step * weights[i];
    const proposed = this.target(y);
    const logRatio = proposed - this.logDensity;
    const acceptance = logRatio >= 0 ? 1 : Number.isFinite(logRatio) ? Math.exp(logRatio) : 0;
    const group = name.split(':')[0];
    let count = this.tally.get(group);
    if (!count) this.tally.set(group, (count = { accepted: 0, proposed: 0 }));
    count.proposed++;
    if (this.random.uniform() < acceptance) {
      for (let i = 0; i < indices.length; i++) this.state[indices[i]] = y[indices[i]];
      this.logDensity = proposed;
      count.accepted++;
    } else {
      for (let i = 0; i < indices.length; i++) y[indices[i]] = this.state[indices[i]];
    }
    if (adapt) {
      const n = ++this.adaptations[k];
      this.logScales[k] = Math.max(-12, Math.min(8, this.logScales[k] + (acceptance - TARGET_ACCEPTANCE) / Math.sqrt(n)));
    }
  }

  private learn(): void {
    const d = this.dimension;
    const n = ++this.seen;
    const delta = new Float64Array(d);
    for (let i = 0; i < d; i++) {
      delta[i] = this.state[i] - this.mean[i];
      this.mean[i] += delta[i] / n;
    }
    for (let i = 0; i < d; i++) {
      const after = this.state[i] - this.mean[i];
      for (let j = 0; j <= i; j++) this.scatter[i * d + j] += after * delta[j];
    }
  }

  /**
   * End of burn-in: add the principal axes of the burn-in's second half as directions, then stop
   * adapting. (jstat's `jacobi` stops at an absolute off-diagonal of 0.001, too coarse for
   * covariances of log rates, so the decomposition is our own.)
   */
  private freeze(): void {
    this.frozen = true;
    if (!this.options.principalAxes || this.seen < 2 * this.dimension) return;
    const d = this.dimension;
    const covariance = new Float64Array(d * d);
    for (let i = 0; i < d; i++) {
      for (let j = 0; j <= i; j++) {
        covariance[i * d + j] = covariance[j * d + i] = this.scatter[i * d + j] / (this.seen - 1);
      }
    }
    const { values, vectors } = symmetricEigen(covariance, d);
    const added: Direction[] = [];
    for (let k = 0; k < d; k++) {
      if (!(values[k] > 0)) continue;
      const indices = new Int32Array(d);
      const weights = new Float64Array(d);
      for (let i = 0; i < d; i++) {
        indices[i] = i;
        weights[i] = vectors[i * d + k];
      }
      // Along a unit axis the spread is sqrt(value); 2.4 standard deviations suit a one-dimensional normal.
      added.push({ name: `axis:${k}`, indices, weights, scale: 2.4 * Math.sqrt(values[k]) });
    }
    // The widest axes once more with four times the step: where dated levels disagree the posterior
    // has modes (which level is the outlier) that short steps seldom cross.
    const widest = [...added].sort((a, b) => b.scale - a.scale).slice(0, LONG_AXES);
    for (const axis of widest) added.push({ ...axis, name: `axis:long:${axis.name}`, scale: LONG_STEP * axis.scale });
    this.directions = [...this.directions, ...added];
    this.logScales = Float64Array.from([...this.logScales, ...added.map((a) => Math.log(a.scale))]);
    this.adaptations = new Float64Array(this.directions.length);
  }
}

/**
 * Eigenvalues and unit eigenvectors (columns of `vectors`, row-major d x d) of a symmetric matrix
 * by cyclic Jacobi rotations (Golub & Van Loan, Matrix Computations, 4th ed., section 8.5).
 */
export function symmetricEigen(matrix: Float64Array, d: number): { values: Float64Array; vectors: Float64Array } {
  const a = Float64Array.from(matrix);
  const v = new Float64Array(d * d);
  for (let i = 0; i < d; i++) v[i * d + i] = 1;
  for (let sweep = 0; sweep < 100; sweep++) {
    let off = 0;
    let diag = 0;
    for (let i = 0; i < d; i++) {
      diag += a[i * d + i] ** 2;
      for (let j = i + 1; j < d; j++) off += a[i * d + j] ** 2;
    }
    if (off <= 1e-30 * diag || off === 0) break;
    for (let p = 0; p < d; p++) {
      for (let q = p + 1; q < d; q++) {
        const apq = a[p * d + q];
        if (apq === 0) continue;
        const theta = (a[q * d + q] - a[p * d + p]) / (2 * apq);
        const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
        const c = 1 / Math.sqrt(t * t + 1);
        const s = t * c;
        for (let k = 0; k < d; k++) {
          const akp = a[k * d + p];
          const akq = a[k * d + q];
          a[k * d + p] = c * akp - s * akq;
          a[k * d + q] = s * akp + c * akq;
        }
        for (let k = 0; k < d; k++) {
          const apk = a[p * d + k];
          const aqk = a[q * d + k];
          a[p * d + k] = c * apk - s * aqk;
          a[q * d + k] = s * apk + c * aqk;
        }
        for (let k = 0; k < d; k++) {
          const vkp = v[k * d + p];
          const vkq = v[k * d + q];
          v[k * d + p] = c * vkp - s * vkq;
          v[k * d + q] = s * vkp + c * vkq;
        }
      }
    }
  }
  return { values: Float64Array.from({ length: d }, (_, i) => a[i * d + i]), vectors: v };
}
