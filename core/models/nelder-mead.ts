/**
 * Derivative-free minimisation by the Nelder–Mead simplex (Nelder & Mead, Computer Journal 7,
 * 1965; coefficients 1, 2, ½, ½ as in Lagarias, Reeds, Wright & Wright, SIAM J. Optim. 9, 1998),
 * with one restart from the best point, a common guard against a collapsed simplex.
 * Non-finite objective values count as +∞, which keeps the search inside a feasible region.
 */
import type { FitStatus } from './types';

export interface NelderMeadOptions {
  /** Initial simplex edge per coordinate. @default 0.1 × max(|x0_k|, 1) */
  step?: number[];
  /** Stop when the simplex values differ by less than this (absolute). @default 1e-12 */
  valueTolerance?: number;
  /** Stop when the simplex is smaller than this in every coordinate (absolute). @default 1e-9 */
  pointTolerance?: number;
  /** Objective evaluations allowed. @default 4000 */
  maxEvaluations?: number;
}

export interface NelderMeadResult extends FitStatus {
  point: number[];
  value: number;
  evaluations: number;
}

export function nelderMead(
  f: (x: number[]) => number,
  x0: number[],
  options: NelderMeadOptions = {},
): NelderMeadResult {
  const n = x0.length;
  if (n < 1 || x0.some((v) => !Number.isFinite(v)))
    throw new RangeError('x0 must hold finite starting values');
  const step = options.step ?? x0.map((v) => 0.1 * Math.max(Math.abs(v), 1));
  if (step.length !== n || step.some((s) => !(s > 0)))
    throw new RangeError('The step option must hold one positive step per coordinate');
  const vTol = options.valueTolerance ?? 1e-12;
  const xTol = options.pointTolerance ?? 1e-9;
  const maxEval = options.maxEvaluations ?? 4000;
  let evaluations = 0;
  const F = (x: number[]): number => {
    evaluations++;
    const v = f(x);
    return Number.isFinite(v) ? v : Infinity;
  };
  let best = { x: [...x0], v: F(x0) };
  let iterations = 0;
  let converged = false;
  for (let round = 0; round < 2 && evaluations < maxEval; round++) {
    const simplex = [
      best.x,
      ...step.map((s, k) => best.x.map((v, j) => (j === k ? v + s : v))),
    ].map((x) => ({ x, v: x === best.x ? best.v : F(x) }));
    converged = false;
    while (evaluations < maxEval) {
      simplex.sort((a, b) => a.v - b.v);
      const lo = simplex[0];
      const hi = simplex[n];
      let size = 0;
      for (const p of simplex.slice(1))
        for (let j = 0; j < n; j++) size = Math.max(size, Math.abs(p.x[j] - lo.x[j]));
      if (Math.abs(hi.v - lo.v) <= vTol && size <= xTol) {
        converged = true;
        break;
      }
      iterations++;
      const c = lo.x.map((_, j) => simplex.slice(0, n).reduce((s, p) => s + p.x[j], 0) / n);
      const along = (t: number) => c.map((v, j) => v + t * (hi.x[j] - v));
      const r = { x: along(-1), v: 0 };
      r.v = F(r.x);
      if (r.v < lo.v) {
        const e = { x: along(-2), v: 0 };
        e.v = F(e.x);
        simplex[n] = e.v < r.v ? e : r;
      } else if (r.v < simplex[n - 1].v) {
        simplex[n] = r;
      } else {
        const inside = r.v >= hi.v;
        const k = { x: along(inside ? 0.5 : -0.5), v: 0 };
        k.v = F(k.x);
        if (k.v < (inside ? hi.v : r.v)) simplex[n] = k;
        else {
          for (let i = 1; i <= n; i++) {
            const x = simplex[i].x.map((v, j) => lo.x[j] + 0.5 * (v - lo.x[j]));
            simplex[i] = { x, v: F(x) };
          }
        }
      }
    }
    simplex.sort((a, b) => a.v - b.v);
    best = { x: simplex[0].x, v: simplex[0].v };
  }
  return {
    point: best.x,
    value: best.v,
    evaluations,
    iterations,
    converged: converged && Number.isFinite(best.v),
    reason: converged
      ? 'The simplex settled on a minimum.'
      : `The search stopped after ${evaluations} evaluations without settling; treat the constants with care.`,
  };
}
