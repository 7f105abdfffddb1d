/**
 * Convergence diagnostics for several Markov chains of one quantity: the rank-normalised split
 * R-hat and the bulk effective sample size of Vehtari, Gelman, Simpson, Carpenter & Buerkner
 * (2021, "Rank-normalization, folding, and localization: an improved R-hat for assessing
 * convergence of MCMC", Bayesian Analysis 16(2):667-718), built on the split R-hat and the
 * multi-chain autocorrelation estimate of Gelman et al. (2013, Bayesian Data Analysis, 3rd ed.,
 * section 11.4-11.5) with Geyer's (1992, Statistical Science 7(4):473-483) initial monotone
 * sequence truncation.
 */

import { jStat } from '../common/jstat';

export interface ChainDiagnostics {
  /** max(rank-normalised split R-hat, folded rank-normalised split R-hat). */
  readonly rhat: number;
  /** Bulk effective sample size over all chains. */
  readonly ess: number;
}

/** Split each chain into halves (dropping the middle draw of an odd length). */
function splitChains(chains: readonly Float64Array[]): Float64Array[] {
  const n = Math.min(...chains.map((c) => c.length));
  const half = Math.floor(n / 2);
  const out: Float64Array[] = [];
  for (const chain of chains) {
    out.push(chain.slice(0, half));
    out.push(chain.slice(n - half, n));
  }
  return out;
}

/**
 * Phi^-1((r - 3/8) / (S + 1/4)) for every whole rank r = 1..S, by S: every quantity of a run has
 * the same number of draws, and draws of continuous ages rarely tie, so one table per draw count
 * replaces an inverse normal per draw (the table is the same function at the same points).
 */
const normalScoreTables = new Map<number, Float64Array>();

/** Blom's normal score of a (possibly average) rank among `total` draws. */
function normalScore(rank: number, total: number): number {
  return jStat.normal.inv((rank - 0.375) / (total + 0.25), 0, 1);
}

function normalScores(total: number): Float64Array {
  let table = normalScoreTables.get(total);
  if (!table) {
    table = new Float64Array(total);
    for (let rank = 1; rank <= total; rank++) table[rank - 1] = normalScore(rank, total);
    if (normalScoreTables.size >= 16) normalScoreTables.clear();
    normalScoreTables.set(total, table);
  }
  return table;
}

/** Every chain's draws (chains of equal length) in one ascending array. */
function pooledSorted(chains: readonly Float64Array[]): Float64Array {
  const n = chains[0].length;
  const pooled = new Float64Array(n * chains.length);
  chains.forEach((chain, j) => pooled.set(chain, j * n));
  return pooled.sort();
}

/**
 * Rank-normalise draws pooled over chains: z = Phi^-1((r - 3/8) / (S + 1/4)) with r the rank
 * (average rank for ties) and S the number of draws (Vehtari et al. 2021, eq. 14, Blom's offset).
 */
function rankNormalise(chains: readonly Float64Array[]): Float64Array[] {
  const sorted = pooledSorted(chains);
  const total = sorted.length;
  const scores = normalScores(total);
  // z for each run of equal values, stored at the run's first index.
  const zAtRunStart = new Float64Array(total);
  let i = 0;
  while (i < total) {
    let j = i;
    while (j + 1 < total && sorted[j + 1] === sorted[i]) j++;
    // A run of one is the whole rank i + 1, read from the table; a tie has a half-integer rank.
    zAtRunStart[i] = j === i ? scores[i] : normalScore((i + j) / 2 + 1, total);
    i = j + 1;
  }
  const firstIndexOf = (x: number): number => {
    let lo = 0;
    let hi = total - 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (sorted[mid] < x) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  };
  return chains.map((chain) => chain.map((x) => zAtRunStart[firstIndexOf(x)]));
}

interface ChainMoments {
  readonly means: Float64Array;
  readonly variances: Float64Array;
  /** W: the mean within-chain variance. */
  readonly within: number;
  /** var+ = (n - 1) / n W + B / n. */
  readonly pooledVariance: number;
}

function moments(chains: readonly Float64Array[]): ChainMoments {
  const m = chains.length;
  const n = chains[0].length;
  const means = new Float64Array(m);
  const variances = new Float64Array(m);
  let grand = 0;
  chains.forEach((chain, j) => {
    let sum = 0;
    for (const x of chain) sum += x;
    means[j] = sum / n;
    let ss = 0;
    for (const x of chain) ss += (x - means[j]) ** 2;
    variances[j] = ss / (n - 1);
    grand += means[j] / m;
  });
  let between = 0;
  for (let j = 0; j < m; j++) between += ((means[j] - grand) ** 2 * n) / (m - 1);
  let within = 0;
  for (let j = 0; j < m; j++) within += variances[j] / m;
  return { means, variances, within, pooledVariance: ((n - 1) / n) * within + between / n };
}

/** Split R-hat of already split chains: sqrt(var+ / W) (BDA3 eq. 11.4). */
function rhatOf(chains: readonly Float64Array[]): number {
  const { within, pooledVariance } = moments(chains);
  if (!(within > 0)) return pooledVariance > 0 ? Infinity : 1;
  return Math.sqrt(pooledVariance / within);
}

/**
 * Effective sample size of already split chains: rho_t = 1 - (W - mean_j acov_j(t)) / var+
 * (BDA3 eq. 11.7), summed in pairs P_k = rho_2k + rho_2k+1 until a pair is negative, each pair
 * capped by the one before (Geyer's initial monotone sequence); tau = -1 + 2 sum P_k and
 * ESS = S / tau, capped at S log10 S as Vehtari et al. (2021) do for antithetic chains.
 */
function essOf(chains: readonly Float64Array[]): number {
  const m = chains.length;
  const n = chains[0].length;
  const total = m * n;
  const { means, within, pooledVariance } = moments(chains);
  if (!(pooledVariance > 0)) return total;
  const autocovariance = (lag: number): number => {
    let sum = 0;
    for (let j = 0; j < m; j++) {
      const chain = chains[j];
      const mean = means[j];
      let acc = 0;
      for (let t = 0; t + lag < n; t++) acc += (chain[t] - mean) * (chain[t + lag] - mean);
      sum += acc / n;
    }
    return sum / m;
  };
  const rho = (lag: number): number => 1 - (within - autocovariance(lag)) / pooledVariance;
  // rho_0 is (var+ - W + mean acov_0) / var+, which is 1 up to the (n-1)/n factor; use it as is.
  let previousPair = Infinity;
  let sum = 0;
  for (let k = 0; 2 * k + 1 < n; k++) {
    let pair = rho(2 * k) + rho(2 * k + 1);
    if (pair < 0) break;
    pair = Math.min(pair, previousPair);
    sum += pair;
    previousPair = pair;
  }
  const tau = Math.max(-1 + 2 * sum, 1 / Math.log10(total));
  return total / tau;
}

/**
 * Rank-normalised split R-hat (the larger of the bulk and the folded, |x - median|, versions) and
 * bulk effective sample size of one quantity sampled by several chains of equal length (at least
 * 4 draws each). A quantity that never varies has R-hat 1 and an ESS equal to the draw count.
 */
export function chainDiagnostics(chains: readonly Float64Array[]): ChainDiagnostics {
  if (chains.length < 1 || chains.some((chain) => chain.length < 4)) {
    throw new RangeError('convergence diagnostics need at least one chain of at least 4 draws');
  }
  const split = splitChains(chains);
  const first = split[0][0];
  if (split.every((chain) => chain.every((x) => x === first))) {
    return { rhat: 1, ess: split.length * split[0].length };
  }
  const ranked = rankNormalise(split);
  const pooled = pooledSorted(split);
  const mid = pooled.length / 2;
  const median = pooled.length % 2 === 1 ? pooled[Math.floor(mid)] : (pooled[mid - 1] + pooled[mid]) / 2;
  const folded = rankNormalise(split.map((chain) => chain.map((x) => Math.abs(x - median))));
  return {
    rhat: Math.max(rhatOf(ranked), rhatOf(folded)),
    ess: essOf(ranked),
  };
}
