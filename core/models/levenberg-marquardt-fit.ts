/**
 * The one door to ml-levenberg-marquardt (pinned at 5.0.1: 5.1.0 returns wrong parameters when
 * weights are given). Nothing else in Thermoshift imports the library, so an upgrade is checked
 * in one place: tests/core/models/levenberg-marquardt-fit.test.ts compares a weighted straight
 * line against the closed-form weighted least-squares answer.
 *
 * 5.0.1 minimises Σ (v_i r_i)² for its `weights` option v; we take statistical weights
 * w_i = 1/σ_i² and pass v_i = √w_i. The library stops only when the error reaches its tolerance,
 * so we run it in short rounds: 4 iterations first, doubling up to `roundIterations`, so a fit
 * that converges in a few steps stops after a few (a round that finds nothing better goes straight
 * to full length). Whether the fit has converged is decided here, not by the rounds:
 * by the relative-offset criterion of Bates & Watts (Technometrics 23, 179–183, 1981), the size of
 * the Gauss–Newton step still available compared with the statistical noise of the residuals.
 * A fit that stops (rounds no longer improve it, or the budget runs out) without meeting that
 * tolerance is reported as not converged, with the reason.
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
  /**
   * Longest round of the library, in iterations; the first rounds are shorter (4, 8, 16, … up to
   * this). @default 20
   */
  roundIterations?: number;
  /** A round that lowers Σ w r² by less than this fraction counts as settled. @default 1e-12 */
  relativeTolerance?: number;
  /**
   * Convergence tolerance on the Bates–Watts relative offset √(Δ/p)/√(S/(n−p)), Δ the decrease a
   * Gauss–Newton step would still give, S = Σ w r²: the remaining step is this small a fraction
   * of the parameters' statistical uncertainty. @default 1e-3
   */
  offsetTolerance?: number;
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
  /** Bates–Watts relative offset at the returned parameters (0 for an exact fit; NaN when undetermined). */
  relativeOffset: number;
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
    offsetTolerance: o.offsetTolerance ?? 1e-3,
    step: o.step ?? initial.map((p) => Math.max(1e-7 * Math.abs(p), 1e-10)),
  };
  if (!(r.maxIterations >= 1)) throw new RangeError('The maxIterations option must be at least 1');
  if (!(r.roundIterations >= 1))
    throw new RangeError('The roundIterations option must be at least 1');
  if (!(r.relativeTolerance >= 0)) throw new RangeError('The relativeTolerance option must be ≥ 0');
  if (!(r.offsetTolerance > 0)) throw new RangeError('The offsetTolerance option must be > 0');
  if (r.step.length !== initial.length || r.step.some((s) => !(s > 0))) {
    throw new RangeError('The step option must hold one positive step per parameter');
  }
  return r;
}

/** Iterations of the first round (see the module comment). */
const FIRST_ROUND = 4;

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

/** Central-difference Jacobian ∂f(x_i)/∂p_k at the parameters (n rows of p). */
function jacobianAt(p: NonlinearFitProblem, params: number[], step: number[]): number[][] {
  const n = p.x.length;
  const jac = Array.from({ length: n }, () => new Array<number>(params.length).fill(0));
  params.forEach((v, k) => {
    const h = Math.max(step[k], 1e-6 * Math.abs(v));
    const up = p.model(params.map((q, j) => (j === k ? q + h : q)));
    const dn = p.model(params.map((q, j) => (j === k ? q - h : q)));
    for (let i = 0; i < n; i++) jac[i][k] = (up(p.x[i]) - dn(p.x[i])) / (2 * h);
  });
  return jac;
}

/** Covariance (JᵀWJ)⁻¹·s² of the parameters (see NonlinearFitResult). */
function covarianceOf(jac: number[][], w: ArrayLike<number>, ss: number): number[][] {
  const n = jac.length;
  const dof = n - (jac[0]?.length ?? 0);
  const s2 = dof > 0 ? ss / dof : NaN;
  const wArr = Array.from({ length: n }, (_, i) => w[i]);
  return invert(normalEquations(jac, wArr, new Array<number>(n).fill(0)).matrix).map((row) =>
    row.map((c) => c * s2),
  );
}

/**
 * Bates–Watts relative offset at the parameters: √(Δ/p) / √(S/(n − p)) with Δ = gᵀA⁻¹g the
 * decrease a Gauss–Newton step would give (g = JᵀWr, A = JᵀWJ) and S = Σ w r² (S alone when
 * n = p). Parameters held at a bound, with the step pointing out of the box, are left out
 * (projected step). 0 for an exact fit.
 */
function relativeOffset(
  p: NonlinearFitProblem,
  params: number[],
  jac: number[][],
  w: ArrayLike<number>,
  ss: number,
  scaleSs: number,
): number {
  const n = jac.length;
  if (!(ss > 1e-28 * scaleSs)) return 0;
  const f = p.model(params);
  const r = Array.from({ length: n }, (_, i) => p.y[i] - f(p.x[i]));
  let free = params.map((_, k) => k);
  for (let round = 0; round <= params.length; round++) {
    const sub = jac.map((row) => free.map((k) => row[k]));
    const { matrix, vector } = normalEquations(
      sub,
      Array.from({ length: n }, (_, i) => w[i]),
      r,
    );
    const step = multiplyInverse(matrix, vector);
    if (!step) return Infinity;
    const blocked = free.filter((k, j) => {
      const lo = p.min?.[k];
      const hi = p.max?.[k];
      const v = params[k];
      const at = (b: number | undefined) =>
        b !== undefined && Math.abs(v - b) <= 1e-9 * Math.max(1, Math.abs(b));
      return (at(lo) && step[j] < 0) || (at(hi) && step[j] > 0);
    });
    if (blocked.length === 0) {
      const decrease = step.reduce((s, d, j) => s + d * vector[j], 0);
      const dof = n - params.length;
      const noise = dof > 0 ? ss / dof : ss;
      return Math.sqrt(Math.max(0, decrease) / Math.max(1, free.length) / noise);
    }
    free = free.filter((k) => !blocked.includes(k));
    if (free.length === 0) return 0;
  }
  return Infinity;
}

/** A⁻¹v, or null when A is singular. */
function multiplyInverse(a: number[][], v: number[]): number[] | null {
  const inv = invert(a);
  if (inv.some((row) => row.some((x) => !Number.isFinite(x)))) return null;
  return inv.map((row) => row.reduce((s, x, j) => s + x * v[j], 0));
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
  let scaleSs = 0;
  for (let i = 0; i < n; i++) scaleSs += w[i] * problem.y[i] * problem.y[i];
  scaleSs = Math.max(scaleSs, 1e-300);
  let params = [...problem.initial];
  let ss = sumSquares(problem, params, w);
  const result = (converged: boolean, iterations: number, reason: string, offset: number) => {
    const jac = jacobianAt(problem, params, o.step);
    return {
      params,
      weightedSumSquares: ss,
      covariance: covarianceOf(jac, w, ss),
      relativeOffset: offset,
      converged,
      iterations,
      reason,
    };
  };
  if (!Number.isFinite(ss)) {
    return {
      params,
      weightedSumSquares: ss,
      covariance: params.map(() => params.map(() => NaN)),
      relativeOffset: NaN,
      converged: false,
      iterations: 0,
      reason: 'The model cannot be evaluated at the starting values.',
    };
  }
  let iterations = 0;
  let stalls = 0;
  let offset = Infinity;
  let length = Math.min(FIRST_ROUND, o.roundIterations);
  while (iterations < o.maxIterations) {
    const round = Math.min(length, o.maxIterations - iterations);
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
    if (!Number.isFinite(nextSs)) {
      return result(
        false,
        iterations,
        'The fit stepped to constants where the model cannot be evaluated; the last usable constants are kept.',
        NaN,
      );
    }
    const gain = ss - nextSs;
    // the next round starts where this one did when it found nothing better
    const sameStart = nextSs > ss || next.every((v, k) => v === params[k]);
    if (nextSs <= ss) {
      params = next;
      ss = nextSs;
    }
    offset = relativeOffset(problem, params, jacobianAt(problem, params, o.step), w, ss, scaleSs);
    if (offset <= o.offsetTolerance) {
      return result(
        true,
        iterations,
        `Converged: the remaining step is ${offset.toExponential(1)} of the constants' uncertainty (tolerance ${o.offsetTolerance}).`,
        offset,
      );
    }
    // a full round that no longer lowers the residual, three times in a row, is a stall; a full
    // round that kept its starting constants is one at once: the library is deterministic, so the
    // next round would start from the same constants and damping and repeat this one step for step
    const full = length >= o.roundIterations;
    stalls = full && gain <= o.relativeTolerance * ss ? stalls + 1 : 0;
    if (full && (stalls >= 3 || sameStart)) break;
    // a short round that found nothing better is the start of a full one: go to full length
    length = sameStart ? o.roundIterations : Math.min(2 * length, o.roundIterations);
  }
  const why =
    iterations >= o.maxIterations
      ? `The fit used its ${o.maxIterations} iterations`
      : `The fit stalled after ${iterations} iterations (further steps no longer lowered the residual)`;
  return result(
    false,
    iterations,
    `${why} without meeting its tolerance: the remaining step is ${Number.isFinite(offset) ? offset.toPrecision(2) : 'undetermined'} of the constants' uncertainty (tolerance ${o.offsetTolerance}); treat the constants with care.`,
    offset,
  );
}
