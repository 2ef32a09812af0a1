import { describe, expect, it } from 'vitest';
import { nelderMead } from '../../../core/models/nelder-mead';
import { expectAbsClose } from '../../helpers/assert-close';

describe('nelderMead()', () => {
  // Rosenbrock's valley (Rosenbrock, Computer Journal 3, 1960) from the classic start (−1.2, 1):
  // minimum 0 at (1, 1).
  it('nelderMead() finds the minimum of the Rosenbrock function', () => {
    const r = nelderMead(([x, y]) => 100 * (y - x * x) ** 2 + (1 - x) ** 2, [-1.2, 1]);
    expect(r.converged).toBe(true);
    expectAbsClose(r.point[0], 1, 1e-4);
    expectAbsClose(r.point[1], 1, 1e-4);
    expect(r.value).toBeLessThan(1e-8);
  });

  it('nelderMead() works in one dimension and stays out of regions where the objective is not finite', () => {
    const r = nelderMead(([x]) => (x < 2 ? NaN : (x - 3) ** 2), [5]);
    expectAbsClose(r.point[0], 3, 1e-5);
    const edge = nelderMead(([x]) => (x < 2 ? Infinity : x), [5]);
    expect(edge.point[0]).toBeGreaterThanOrEqual(2);
    expectAbsClose(edge.point[0], 2, 1e-4);
  });

  it('nelderMead() reports not converged when the budget runs out, and rejects bad starts', () => {
    const r = nelderMead(([x, y]) => 100 * (y - x * x) ** 2 + (1 - x) ** 2, [-1.2, 1], {
      maxEvaluations: 20,
    });
    expect(r.converged).toBe(false);
    expect(r.evaluations).toBeLessThanOrEqual(22);
    expect(() => nelderMead(() => 0, [NaN])).toThrow(/x0/);
    expect(() => nelderMead(() => 0, [1], { step: [0] })).toThrow(/step/);
  });
});
