/**
 * Joint refinement of all offsets: Levenberg–Marquardt on the IRLS normal equations (Marquardt,
 * J. SIAM 11, 1963), with fixed (locked) parameters removed and linear equality constraints
 * (the reference: aT(Tref) = 1, bT(Tref) = 1) kept exactly through the KKT system
 *   [A + λ·diag(A)  Cᵀ] [δ]   [−g       ]
 *   [C              0 ] [μ] = [rhs − Cθ ]
 * (Nocedal & Wright, Numerical Optimization, 2nd ed. 2006, §16.1). The covariance of the offsets is
 * s²·(top-left block of the inverse KKT matrix without damping), s² the weighted residual variance:
 * the curvature of the objective at the optimum, so errors are relative to the constraints, i.e. to
 * the reference temperature.
 */
import { LuDecomposition, Matrix } from 'ml-matrix';
import type { FitProblem } from './problem';
import { parameterCount } from './problem';
import { allResiduals } from './residuals';
import { NormalSink } from './normal-equations';
import { SandwichSink } from './sandwich';
import type { RobustLoss } from './types';

export interface LinearConstraint {
  /** Coefficients over the full parameter vector. */
  coef: Float64Array;
  rhs: number;
}

export interface SolveSettings {
  loss: RobustLoss;
  scale: number;
  maxIterations: number;
  /** 1 = parameter kept at its starting value. */
  fixed: Uint8Array;
  constraints: LinearConstraint[];
}

export interface SolveOutcome {
  theta: Float64Array;
  converged: boolean;
  iterations: number;
  reason: string;
  /** Covariance over the full parameter vector (zeros for fixed ones); null if singular. */
  covariance: Float64Array | null;
  /** Weighted residual variance, decades². */
  residualVariance: number;
  residualCount: number;
  objective: number;
}

/** Steps below this are immaterial (decades). */
const STEP_TOL_DECADES = 1e-6;
/** Relative decrease of the objective below which the fit has converged. */
const REL_TOL = 1e-10;
/** Rejected steps in a row after which no further decrease is possible. */
const MAX_REJECTIONS = 4;
/** A rejected step smaller than this means the optimum is reached for all practical purposes. */
const SMALL_STEP_DECADES = 1e-4;

export function solveOffsets(
  p: FitProblem,
  theta0: ArrayLike<number>,
  s: SolveSettings,
): SolveOutcome {
  const size = parameterCount(p);
  const theta = Float64Array.from(theta0);
  const free: number[] = [];
  for (let i = 0; i < size; i++) if (!s.fixed[i]) free.push(i);
  const m = free.length;
  const cons = s.constraints.filter((c) => free.some((i) => c.coef[i] !== 0));
  const nc = cons.length;
  projectOntoConstraints(theta, free, cons);
  const evaluate = (t: Float64Array, matrix: boolean): NormalSink => {
    const sink = new NormalSink(p, s.loss, s.scale, matrix);
    allResiduals(p, t, sink);
    return sink;
  };
  let cur = evaluate(theta, true);
  let lambda = 1e-3;
  let iterations = 0;
  let converged = m === 0;
  let reason = m === 0 ? 'nothing to fit' : 'iteration limit';
  while (!converged && iterations < s.maxIterations) {
    iterations++;
    let accepted = false;
    let rejections = 0;
    while (!accepted && rejections < MAX_REJECTIONS) {
      const step = kktStep(cur, free, cons, theta, lambda);
      if (!step) {
        lambda *= 10;
        rejections++;
        continue;
      }
      const trial = Float64Array.from(theta);
      let maxStep = 0;
      for (let k = 0; k < m; k++) {
        trial[free[k]] += step[k];
        maxStep = Math.max(maxStep, Math.abs(step[k]));
      }
      if (maxStep < STEP_TOL_DECADES) {
        converged = true;
        reason = 'step below tolerance';
        break;
      }
      const next = evaluate(trial, true);
      const before = cur.objective();
      const after = next.objective();
      if (after <= before) {
        theta.set(trial);
        cur = next;
        lambda = Math.max(lambda / 3, 1e-9);
        accepted = true;
        if (before - after <= REL_TOL * before) {
          converged = true;
          reason = 'objective change below tolerance';
        }
      } else {
        lambda *= 4;
        rejections++;
        if (maxStep < SMALL_STEP_DECADES) {
          converged = true;
          reason = 'step below 1e-4 decades';
          break;
        }
      }
    }
    if (!accepted && !converged) {
      converged = true;
      reason = 'no further decrease';
    }
  }
  const dof = Math.max(1, cur.count - m + nc);
  const residualVariance = cur.weightedSquares / dof;
  // Covariance with noise-damped slopes (see FitProblem.smoothSlopes).
  const smooth: FitProblem = { ...p, smoothSlopes: true };
  const bread = new NormalSink(smooth, s.loss, s.scale, true);
  allResiduals(smooth, theta, bread);
  const sandwich = new SandwichSink(smooth, s.loss, s.scale);
  allResiduals(smooth, theta, sandwich);
  const covariance = covarianceOf(bread, free, cons, residualVariance, sandwich.meat());
  return {
    theta,
    converged,
    iterations,
    reason,
    covariance,
    residualVariance,
    residualCount: cur.count,
    objective: cur.objective(),
  };
}

/** Smallest change of the free parameters that satisfies the constraints. */
function projectOntoConstraints(
  theta: Float64Array,
  free: number[],
  cons: LinearConstraint[],
): void {
  if (cons.length === 0) return;
  const nc = cons.length;
  const cct = new Matrix(nc, nc);
  const viol = new Matrix(nc, 1);
  for (let a = 0; a < nc; a++) {
    let v = cons[a].rhs;
    for (let i = 0; i < theta.length; i++) v -= cons[a].coef[i] * theta[i];
    viol.set(a, 0, v);
    for (let b = 0; b < nc; b++) {
      let sum = 0;
      for (const i of free) sum += cons[a].coef[i] * cons[b].coef[i];
      cct.set(a, b, sum);
    }
  }
  const mu = new LuDecomposition(cct).solve(viol);
  for (const i of free) {
    let d = 0;
    for (let a = 0; a < nc; a++) d += cons[a].coef[i] * mu.get(a, 0);
    theta[i] += d;
  }
}

function kktMatrix(
  sink: NormalSink,
  free: number[],
  cons: LinearConstraint[],
  lambda: number,
): Matrix {
  const m = free.length;
  const nc = cons.length;
  const size = sink.size;
  const k = new Matrix(m + nc, m + nc);
  let meanDiag = 0;
  for (const i of free) meanDiag += sink.a[i * size + i];
  meanDiag = m > 0 ? meanDiag / m : 0;
  const floor = 1e-9 * meanDiag + 1e-12;
  for (let u = 0; u < m; u++) {
    const row = free[u] * size;
    for (let v = 0; v < m; v++) k.set(u, v, sink.a[row + free[v]]);
    const d = Math.max(sink.a[row + free[u]], floor);
    k.set(u, u, d * (1 + lambda) + (d === floor ? floor : 0));
  }
  for (let a = 0; a < nc; a++)
    for (let u = 0; u < m; u++) {
      const c = cons[a].coef[free[u]];
      k.set(m + a, u, c);
      k.set(u, m + a, c);
    }
  return k;
}

function kktStep(
  sink: NormalSink,
  free: number[],
  cons: LinearConstraint[],
  theta: Float64Array,
  lambda: number,
): Float64Array | null {
  const m = free.length;
  const nc = cons.length;
  const k = kktMatrix(sink, free, cons, lambda);
  const b = new Matrix(m + nc, 1);
  for (let u = 0; u < m; u++) b.set(u, 0, -sink.g[free[u]]);
  for (let a = 0; a < nc; a++) {
    let v = cons[a].rhs;
    for (let i = 0; i < theta.length; i++) v -= cons[a].coef[i] * theta[i];
    b.set(m + a, 0, v);
  }
  const lu = new LuDecomposition(k);
  if (lu.isSingular()) return null;
  const x = lu.solve(b);
  const out = new Float64Array(m);
  for (let u = 0; u < m; u++) {
    out[u] = x.get(u, 0);
    if (!Number.isFinite(out[u])) return null;
  }
  return out;
}

function covarianceOf(
  sink: NormalSink,
  free: number[],
  cons: LinearConstraint[],
  s2: number,
  meat: Float64Array,
): Float64Array | null {
  const size = sink.size;
  const m = free.length;
  const cov = new Float64Array(size * size);
  if (m === 0) return cov;
  const k = kktMatrix(sink, free, cons, 0);
  const lu = new LuDecomposition(k);
  if (lu.isSingular()) return null;
  const inv = lu.solve(Matrix.eye(k.rows));
  const mm = new Matrix(m, m);
  const bb = new Matrix(m, m);
  for (let u = 0; u < m; u++)
    for (let v = 0; v < m; v++) {
      mm.set(u, v, inv.get(u, v));
      bb.set(u, v, meat[free[u] * size + free[v]]);
    }
  // Cov = σ²·M B M (sandwich); M is symmetric.
  const c = mm.mmul(bb).mmul(mm);
  for (let u = 0; u < m; u++)
    for (let v = 0; v < m; v++) cov[free[u] * size + free[v]] = s2 * c.get(u, v);
  return cov;
}
