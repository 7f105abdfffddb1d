/**
 * Adaptive Metropolis (Haario, Saksman & Tamminen 2001, "An adaptive Metropolis algorithm",
 * Bernoulli 7(2):223-242): a random-walk Metropolis chain whose normal proposal takes the
 * covariance of the chain's own past, scaled by 2.38^2 / d (Gelman, Roberts & Gilks 1996,
 * Bayesian Statistics 5:599-607), with a global scale tuned towards an acceptance rate of 0.234
 * by a Robbins-Monro step (Andrieu & Thoms 2008, Statistics and Computing 18:343-373, algorithm 4).
 * Adaptation runs during burn-in only; the kept draws come from a fixed proposal, so they are an
 * ordinary Metropolis chain.
 */
import { SeededRandom } from '../../common/random';

/** Acceptance rate the scale adapts towards (Roberts, Gelman & Gilks 1997, Ann. Appl. Probab. 7(1)). */
const TARGET_ACCEPTANCE = 0.234;
/** Iterations between covariance updates during adaptation. */
const UPDATE_EVERY = 100;
/** Jitter added to the covariance's diagonal, relative to each initial scale. */
const JITTER = 1e-6;

export class AdaptiveMetropolis {
  readonly dimension: number;
  readonly state: Float64Array;
  logDensity: number;
  accepted = 0;
  proposed = 0;
  private readonly proposal: Float64Array;
  private readonly cholesky: Float64Array;
  private readonly mean: Float64Array;
  private readonly scatter: Float64Array;
  private readonly initialScales: Float64Array;
  private readonly normals: Float64Array;
  private samplesSeen = 0;
  private logScale = 0;

  constructor(
    private readonly target: (x: Float64Array) => number,
    start: Float64Array,
    initialScales: Float64Array,
    private readonly random: SeededRandom,
  ) {
    const d = start.length;
    this.dimension = d;
    this.state = Float64Array.from(start);
    this.logDensity = target(this.state);
    if (!Number.isFinite(this.logDensity)) throw new RangeError('the starting state has no posterior density');
    this.proposal = new Float64Array(d);
    this.cholesky = new Float64Array(d * d);
    this.mean = new Float64Array(d);
    this.scatter = new Float64Array(d * d);
    this.initialScales = Float64Array.from(initialScales);
    this.normals = new Float64Array(d);
    const s = 2.38 / Math.sqrt(d);
    for (let i = 0; i < d; i++) this.cholesky[i * d + i] = s * initialScales[i];
  }

  /** One Metropolis step; `adapt` learns from it (burn-in only). */
  step(adapt: boolean): void {
    const d = this.dimension;
    const z = this.normals;
    for (let i = 0; i < d; i++) z[i] = this.random.normal();
    const scale = Math.exp(this.logScale);
    for (let i = 0; i < d; i++) {
      let sum = 0;
      const row = i * d;
      for (let k = 0; k <= i; k++) sum += this.cholesky[row + k] * z[k];
      this.proposal[i] = this.state[i] + scale * sum;
    }
    const proposedDensity = this.target(this.proposal);
    const logRatio = proposedDensity - this.logDensity;
    const acceptance = Number.isFinite(logRatio) ? Math.min(1, Math.exp(logRatio)) : 0;
    this.proposed++;
    if (this.random.uniform() < acceptance) {
      this.state.set(this.proposal);
      this.logDensity = proposedDensity;
      this.accepted++;
    }
    if (adapt) this.learn(acceptance);
  }

  private learn(acceptance: number): void {
    const d = this.dimension;
    this.samplesSeen++;
    const n = this.samplesSeen;
    // Welford's running mean and scatter matrix.
    const delta = this.normals; // reuse as scratch: the proposal's normals are spent
    for (let i = 0; i < d; i++) delta[i] = this.state[i] - this.mean[i];
    for (let i = 0; i < d; i++) this.mean[i] += delta[i] / n;
    for (let i = 0; i < d; i++) {
      const after = this.state[i] - this.mean[i];
      const row = i * d;
      for (let k = 0; k <= i; k++) this.scatter[row + k] += after * delta[k];
    }
    this.logScale += (acceptance - TARGET_ACCEPTANCE) / Math.sqrt(n);
    this.logScale = Math.max(-6, Math.min(3, this.logScale));
    if (n >= 2 * d && n % UPDATE_EVERY === 0) this.refactor();
  }

  /** Cholesky factor of 2.38^2/d times the chain's covariance (plus jitter); kept unchanged if not positive definite. */
  private refactor(): void {
    const d = this.dimension;
    const n = this.samplesSeen;
    const factor = (2.38 * 2.38) / d / (n - 1);
    const l = new Float64Array(d * d);
    for (let i = 0; i < d; i++) {
      for (let j = 0; j <= i; j++) {
        let sum = this.scatter[i * d + j] * factor;
        if (i === j) sum += JITTER * this.initialScales[i] ** 2;
        for (let k = 0; k < j; k++) sum -= l[i * d + k] * l[j * d + k];
        if (i === j) {
          if (!(sum > 0)) return;
          l[i * d + i] = Math.sqrt(sum);
        } else {
          l[i * d + j] = sum / l[j * d + j];
        }
      }
    }
    this.cholesky.set(l);
  }
}
