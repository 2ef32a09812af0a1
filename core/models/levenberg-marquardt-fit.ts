/**
 * The one door to ml-levenberg-marquardt (pinned at 5.0.1: 5.1.0 returns wrong parameters when
 * weights are given). Nothing else in Thermoshift imports the library, so an upgrade is checked
 * in one place: tests/core/models/levenberg-marquardt-fit.test.ts compares a weighted straight
 * line against the closed-form weighted least-squares answer.
 *
 * 5.0.1 minimises Σ (v_i r_i)² for its `weights` option v; we take statistical weights
 * w_i = 1/σ_i² and pass v_i = √w_i. The library stops only when the error reaches its tolerance,
 * so we run it in short rounds and stop when a round no longer improves the fit.
 */
import { levenbergMarquardt } from 'ml-levenberg-marquardt';
import { invert, normalEquations } from './linear-algebra';
import type { FitStatus } from './types';

export interface NonlinearFitProblem {
  x: ArrayLike<number>;
  y: ArrayLike<number>;
  /** Statistical weights w_i = 1/σ_i² (all 1 when absent). */
  weights?: ArrayLike<number>;
  /** The model: parameters → function of x. */
  model: (params: number[]) => (x: number) => number;
  initial: number[];
  /** Lower bounds of the parameters. @default −Number.MAX_SAFE_INTEGER */
  min?: number[];
  /** Upper bounds of the parameters. @default Number.MAX_SAFE_INTEGER */
  max?: number[];
}

export interface NonlinearFitOptions {
  /** Total iteration budget. @default 1000 */
  maxIterations?: number;
  /** Iterations per round of the library. @default 20 */
  roundIterations?: number;
  /** A round that lowers Σ w r² by less than this fraction counts as settled. @default 1e-12 */
  relativeTolerance?: number;
  /**
   * Finite-difference step for the Jacobian, per parameter (central differences).
   * @default max(1e-7·|initial_k|, 1e-10)
   */
  step?: number[];
}

export interface NonlinearFitResult extends FitStatus {
  params: number[];
  /** Σ w_i r_i² at the returned parameters. */
  weightedSumSquares: number;
  /**
   * Parameter covariance (JᵀWJ)⁻¹·s², s² = Σ w r²/(n − p) (the weights taken as relative), from a
   * central-difference Jacobian at the returned parameters. NaN where not determined.
   */
  covariance: number[][];
}

function resolveOptions(o: NonlinearFitOptions, initial: number[]): Required<NonlinearFitOptions> {
  const r = {
    maxIterations: o.maxIterations ?? 1000,
    roundIterations: o.roundIterations ?? 20,
    relativeTolerance: o.relativeTolerance ?? 1e-12,
    step: o.step ?? initial.map((p) => Math.max(1e-7 * Math.abs(p), 1e-10)),
  };
  if (!(r.maxIterations >= 1)) throw new RangeError('The maxIterations option must be at least 1');
  if (!(r.roundIterations >= 1))
    throw new RangeError('The roundIterations option must be at least 1');
  if (!(r.relativeTolerance >= 0)) throw new RangeError('The relativeTolerance option must be ≥ 0');
  if (r.step.length !== initial.length || r.step.some((s) => !(s > 0))) {
    throw new RangeError('The step option must hold one positive step per parameter');
  }
  return r;
}

/** Weighted Σ w (y − f(x))². */
function sumSquares(p: NonlinearFitProblem, params: number[], w: ArrayLike<number>): number {
  const f = p.model(params);
  let s = 0;
  for (let i = 0; i < p.x.length; i++) {
    const r = p.y[i] - f(p.x[i]);
    s += w[i] * r * r;
  }
  return s;
}

/** Covariance of the parameters from a central-difference Jacobian (see NonlinearFitResult). */
function covarianceAt(
  p: NonlinearFitProblem,
  params: number[],
  w: ArrayLike<number>,
  step: number[],
  ss: number,
): number[][] {
  const n = p.x.length;
  const jac = Array.from({ length: n }, () => new Array<number>(params.length).fill(0));
  params.forEach((v, k) => {
    const h = Math.max(step[k], 1e-6 * Math.abs(v));
    const up = p.model(params.map((q, j) => (j === k ? q + h : q)));
    const dn = p.model(params.map((q, j) => (j === k ? q - h : q)));
    for (let i = 0; i < n; i++) jac[i][k] = (up(p.x[i]) - dn(p.x[i])) / (2 * h);
  });
  const dof = n - params.length;
  const s2 = dof > 0 ? ss / dof : NaN;
  const wArr = Array.from({ length: n }, (_, i) => w[i]);
  return invert(normalEquations(jac, wArr, new Array<number>(n).fill(0)).matrix).map((row) =>
    row.map((c) => c * s2),
  );
}

/** Weighted nonlinear least squares by Levenberg–Marquardt. */
export function levenbergMarquardtFit(
  problem: NonlinearFitProblem,
  options: NonlinearFitOptions = {},
): NonlinearFitResult {
  const n = problem.x.length;
  if (problem.y.length !== n)
    throw new RangeError(`x (${n}) and y (${problem.y.length}) must have the same length`);
  if (n < 2) throw new RangeError('A nonlinear fit needs at least 2 points');
  if (!problem.initial.length || problem.initial.some((v) => !Number.isFinite(v))) {
    throw new RangeError('initial must hold finite starting values');
  }
  const w = problem.weights ?? new Array<number>(n).fill(1);
  if (w.length !== n) throw new RangeError(`weights (${w.length}) must match the ${n} points`);
  for (let i = 0; i < n; i++) {
    if (!(w[i] > 0) || !Number.isFinite(w[i]))
      throw new RangeError(`weights[${i}] must be a positive finite number`);
  }
  const o = resolveOptions(options, problem.initial);
  const libWeights = Array.from({ length: n }, (_, i) => Math.sqrt(w[i]));
  let params = [...problem.initial];
  let ss = sumSquares(problem, params, w);
  if (!Number.isFinite(ss)) {
    return {
      params,
      weightedSumSquares: ss,
      covariance: params.map(() => params.map(() => NaN)),
      converged: false,
      iterations: 0,
      reason: 'The model cannot be evaluated at the starting values.',
    };
  }
  let iterations = 0;
  while (iterations < o.maxIterations) {
    const round = Math.min(o.roundIterations, o.maxIterations - iterations);
    const r = levenbergMarquardt({ x: problem.x, y: problem.y }, problem.model, {
      initialValues: params,
      weights: libWeights,
      maxIterations: round,
      errorTolerance: 0,
      centralDifference: true,
      gradientDifference: o.step,
      minValues: problem.min,
      maxValues: problem.max,
    });
    iterations += Math.max(1, r.iterations);
    const next = r.parameterValues;
    const nextSs = sumSquares(problem, next, w);
    if (!Number.isFinite(nextSs)) break;
    const gain = ss - nextSs;
    params = next;
    const settled = gain <= o.relativeTolerance * ss || nextSs === 0;
    ss = Math.min(ss, nextSs);
    if (settled) {
      return {
        params,
        weightedSumSquares: ss,
        covariance: covarianceAt(problem, params, w, o.step, ss),
        converged: true,
        iterations,
        reason: 'The fit settled: a further round no longer lowered the residual.',
      };
    }
  }
  return {
    params,
    weightedSumSquares: ss,
    covariance: covarianceAt(problem, params, w, o.step, ss),
    converged: false,
    iterations,
    reason: `The fit stopped after ${iterations} iterations without settling; treat the constants with care.`,
  };
}
