import { describe, expect, it } from 'vitest';
import { minimiseNelderMead } from './nelder-mead';

describe(minimiseNelderMead.name, () => {
  it('finds the minimum of the Rosenbrock valley at (1, 1) from (-1.2, 1) (Rosenbrock 1960, Computer Journal 3(3)) [analytic]', () => {
    const rosenbrock = (x: Float64Array): number => 100 * (x[1] - x[0] ** 2) ** 2 + (1 - x[0]) ** 2;
    const result = minimiseNelderMead(rosenbrock, [-1.2, 1], { valueTolerance: 1e-14, pointTolerance: 1e-9 });
    expect(result.converged).toBe(true);
    expect(result.point[0]).toBeCloseTo(1, 6);
    expect(result.point[1]).toBeCloseTo(1, 6);
    expect(result.value).toBeLessThan(1e-12);
  });

  it('finds the centre of an elongated, rotated quadratic bowl [analytic]', () => {
    const bowl = (x: Float64Array): number => {
      const u = x[0] - 3 + (x[1] + 2);
      const v = x[0] - 3 - (x[1] + 2);
      return 1000 * u * u + v * v + 7;
    };
    const result = minimiseNelderMead(bowl, [0, 0]);
    expect(result.point[0]).toBeCloseTo(3, 6);
    expect(result.point[1]).toBeCloseTo(-2, 6);
    expect(result.value).toBeCloseTo(7, 9);
  });

  it('stays inside a region where the objective is finite', () => {
    // Minimum of (x - 2)^2 restricted to x <= 1 is at the boundary x = 1.
    const bounded = (x: Float64Array): number => (x[0] > 1 ? Infinity : (x[0] - 2) ** 2);
    const result = minimiseNelderMead(bounded, [0]);
    expect(result.point[0]).toBeLessThanOrEqual(1);
    expect(result.point[0]).toBeCloseTo(1, 6);
  });

  it('says it has not converged when the budget runs out', () => {
    const rosenbrock = (x: Float64Array): number => 100 * (x[1] - x[0] ** 2) ** 2 + (1 - x[0]) ** 2;
    const result = minimiseNelderMead(rosenbrock, [-1.2, 1], { maxEvaluations: 20 });
    expect(result.converged).toBe(false);
    expect(result.evaluations).toBeLessThanOrEqual(22);
  });
});
