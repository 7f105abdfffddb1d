/**
 * Derivative-free minimisation by the Nelder-Mead simplex (Nelder & Mead 1965, Computer Journal
 * 7(4):308-313), with the standard coefficients and the tie-breaking and acceptance rules of
 * Lagarias, Reeds, Wright & Wright 1998 (SIAM J. Optim. 9(1):112-147): reflection 1,
 * expansion 2, contraction 1/2, shrink 1/2. Renewal-model likelihoods have two parameters and
 * smooth surfaces, the case the method handles well; one restart from the best point guards
 * against a simplex that collapsed before reaching the optimum [common practice].
 *
 * An objective may return +Infinity (or NaN, treated as +Infinity) outside its parameter bounds.
 */

export interface NelderMeadOptions {
  /** Size of the first simplex along each axis (default 0.1). */
  readonly initialStep?: number;
  /** Give up after this many objective evaluations (default 2000). */
  readonly maxEvaluations?: number;
  /** Converged when the simplex values span at most this much (default 1e-10). */
  readonly valueTolerance?: number;
  /** ... and every vertex lies within this distance of the best along each axis (default 1e-8). */
  readonly pointTolerance?: number;
  /** Restarts from the best point after convergence (default 1). */
  readonly restarts?: number;
}

export interface NelderMeadResult {
  readonly point: Float64Array;
  readonly value: number;
  readonly evaluations: number;
  readonly converged: boolean;
}

/** Minimise `objective` from `start`. */
export function minimiseNelderMead(
  objective: (point: Float64Array) => number,
  start: ArrayLike<number>,
  options: NelderMeadOptions = {},
): NelderMeadResult {
  const initialStep = options.initialStep ?? 0.1;
  const maxEvaluations = options.maxEvaluations ?? 2000;
  const valueTolerance = options.valueTolerance ?? 1e-10;
  const pointTolerance = options.pointTolerance ?? 1e-8;
  const restarts = options.restarts ?? 1;

  let evaluations = 0;
  const evaluate = (point: Float64Array): number => {
    evaluations++;
    const value = objective(point);
    return Number.isNaN(value) ? Infinity : value;
  };

  let best: Float64Array = Float64Array.from(start);
  let bestValue = evaluate(best);
  let converged = false;
  for (let round = 0; round <= restarts; round++) {
    const run = simplexSearch(evaluate, best, bestValue, initialStep, {
      maxEvaluations: () => maxEvaluations - evaluations,
      valueTolerance,
      pointTolerance,
    });
    const improvement = bestValue - run.value;
    best = run.point;
    bestValue = run.value;
    converged = run.converged;
    // A restart that finds nothing better confirms the optimum.
    if (!converged || (round > 0 && !(improvement > valueTolerance))) break;
  }
  return { point: best, value: bestValue, evaluations, converged };
}

interface SearchLimits {
  readonly maxEvaluations: () => number;
  readonly valueTolerance: number;
  readonly pointTolerance: number;
}

function simplexSearch(
  evaluate: (point: Float64Array) => number,
  start: Float64Array,
  startValue: number,
  initialStep: number,
  limits: SearchLimits,
): { point: Float64Array; value: number; converged: boolean } {
  const n = start.length;
  const vertices: Float64Array[] = [start.slice()];
  const values: number[] = [startValue];
  let budget = limits.maxEvaluations();
  for (let i = 0; i < n; i++) {
    const vertex = start.slice();
    vertex[i] += initialStep;
    vertices.push(vertex);
    values.push(evaluate(vertex));
    budget--;
  }
  const order = Array.from({ length: n + 1 }, (_, i) => i);
  const centroid = new Float64Array(n);
  const reflected = new Float64Array(n);
  const trial = new Float64Array(n);

  const sortVertices = (): void => {
    // Stable on ties, so an older vertex keeps precedence (Lagarias et al. 1998).
    order.sort((x, y) => values[x] - values[y] || x - y);
  };

  sortVertices();
  while (budget > 0) {
    const bestIndex = order[0];
    const worstIndex = order[n];
    const secondWorstIndex = order[n - 1];
    if (hasConverged(vertices, values, order, limits)) {
      return { point: vertices[bestIndex].slice(), value: values[bestIndex], converged: true };
    }

    centroid.fill(0);
    for (let r = 0; r < n; r++) {
      const vertex = vertices[order[r]];
      for (let i = 0; i < n; i++) centroid[i] += vertex[i] / n;
    }
    const worst = vertices[worstIndex];
    for (let i = 0; i < n; i++) reflected[i] = centroid[i] + (centroid[i] - worst[i]);
    const reflectedValue = evaluate(reflected);
    budget--;

    if (reflectedValue < values[bestIndex]) {
      for (let i = 0; i < n; i++) trial[i] = centroid[i] + 2 * (centroid[i] - worst[i]);
      const expandedValue = evaluate(trial);
      budget--;
      if (expandedValue < reflectedValue) replace(worstIndex, trial, expandedValue);
      else replace(worstIndex, reflected, reflectedValue);
    } else if (reflectedValue < values[secondWorstIndex]) {
      replace(worstIndex, reflected, reflectedValue);
    } else {
      const outside = reflectedValue < values[worstIndex];
      const towards = outside ? reflected : worst;
      for (let i = 0; i < n; i++) trial[i] = centroid[i] + 0.5 * (towards[i] - centroid[i]);
      const contractedValue = evaluate(trial);
      budget--;
      const accepted = outside ? contractedValue <= reflectedValue : contractedValue < values[worstIndex];
      if (accepted) {
        replace(worstIndex, trial, contractedValue);
      } else {
        const bestVertex = vertices[bestIndex];
        for (let r = 1; r <= n; r++) {
          const vertex = vertices[order[r]];
          for (let i = 0; i < n; i++) vertex[i] = bestVertex[i] + 0.5 * (vertex[i] - bestVertex[i]);
          values[order[r]] = evaluate(vertex);
          budget--;
        }
      }
    }
    sortVertices();
  }
  const bestIndex = order[0];
  return { point: vertices[bestIndex].slice(), value: values[bestIndex], converged: false };

  function replace(index: number, point: Float64Array, value: number): void {
    vertices[index].set(point);
    values[index] = value;
  }
}

function hasConverged(
  vertices: readonly Float64Array[],
  values: readonly number[],
  order: readonly number[],
  limits: SearchLimits,
): boolean {
  const n = order.length - 1;
  const bestValue = values[order[0]];
  if (!Number.isFinite(bestValue)) return false;
  if (!(values[order[n]] - bestValue <= limits.valueTolerance)) return false;
  const best = vertices[order[0]];
  for (let r = 1; r <= n; r++) {
    const vertex = vertices[order[r]];
    for (let i = 0; i < best.length; i++) {
      if (Math.abs(vertex[i] - best[i]) > limits.pointTolerance) return false;
    }
  }
  return true;
}
