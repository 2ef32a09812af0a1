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
import type { FitProblem } from './problem';
import { parameterCount } from './problem';
import { residualsAt } from './residuals';
import { ResidualBuffer } from './residual-buffer';
import { luFactor, luInverse, luSolve } from './linear-solve';
import { NormalSink } from './normal-equations';
import { normalAt } from './normal-walk';
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
  /** Stop when no parameter moves by more than this, decades. */
  toleranceDecades: number;
  /**
   * Optional Gaussian prior per parameter: 1/σ² (decades⁻²), 0 for none. Enters as
   * ½·scale²·θ²/σ², on the same footing as the standardised residuals.
   */
  prior?: Float64Array;
  /** Reused residual storage (optional). */
  buffer?: ResidualBuffer;
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

/** Largest change of any offset in one iteration, decades. */
const MAX_STEP_DECADES = 0.5;
/** Relative decrease of the objective below which the fit has converged. */
const REL_TOL = 1e-7;
/** Rejected steps in a row after which no further decrease is possible. */
const MAX_REJECTIONS = 4;

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
  const buf = s.buffer ?? new ResidualBuffer();
  const evaluate = (t: Float64Array, matrix: boolean): NormalSink => {
    return addPrior(normalAt(p, t, s.loss, s.scale, matrix), t, s.prior, s.scale);
  };
  let cur = evaluate(theta, true);
  // A point that leaves the overlaps keeps costing the mean loss per point at the start, so the
  // score (normalised by the N0 points at the start) cannot improve merely because fewer points
  // are compared.
  const n0 = cur.count;
  const lostLoss = n0 > 0 ? cur.lossSum / n0 : 0;
  const score = (k: NormalSink): number =>
    n0 > 0 ? (k.lossSum + lostLoss * Math.max(0, n0 - k.count)) / n0 : k.objective();
  let lambda = 1e-6;
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
      for (let k = 0; k < m; k++) maxStep = Math.max(maxStep, Math.abs(step[k]));
      // Trust region: no shift moves by more than MAX_STEP_DECADES in one iteration.
      const shrink = maxStep > MAX_STEP_DECADES ? MAX_STEP_DECADES / maxStep : 1;
      for (let k = 0; k < m; k++) trial[free[k]] += shrink * step[k];
      maxStep *= shrink;
      if (maxStep < s.toleranceDecades) {
        converged = true;
        reason = 'step below tolerance';
        break;
      }
      const next = evaluate(trial, true);
      const before = score(cur);
      const after = score(next);
      if (after <= before) {
        theta.set(trial);
        cur = next;
        lambda = Math.max(lambda / 10, 1e-12);
        accepted = true;
        if (maxStep < s.toleranceDecades) {
          converged = true;
          reason = 'step below tolerance';
        } else if (before - after <= REL_TOL * before) {
          converged = true;
          reason = 'objective change below tolerance';
        }
      } else {
        lambda *= 4;
        rejections++;
        if (maxStep < 3 * s.toleranceDecades) {
          converged = true;
          reason = 'rejected step below 3× tolerance';
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
  residualsAt(smooth, theta, buf);
  const bread = addPrior(
    new NormalSink(smooth, s.loss, s.scale, true).consume(buf),
    theta,
    s.prior,
    s.scale,
  );
  const sandwich = new SandwichSink(smooth, s.loss, s.scale).consume(buf);
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

function addPrior(
  sink: NormalSink,
  theta: ArrayLike<number>,
  prior: Float64Array | undefined,
  scale: number,
): NormalSink {
  if (!prior) return sink;
  const c2 = scale * scale;
  for (let i = 0; i < prior.length; i++) {
    if (prior[i] === 0) continue;
    const k = c2 * prior[i];
    sink.lossSum += 0.5 * k * theta[i] * theta[i];
    if (sink.withMatrix) {
      sink.a[i * sink.size + i] += k;
      sink.g[i] += k * theta[i];
    }
  }
  return sink;
}

/** Smallest change of the free parameters that satisfies the constraints. */
function projectOntoConstraints(
  theta: Float64Array,
  free: number[],
  cons: LinearConstraint[],
): void {
  const nc = cons.length;
  if (nc === 0) return;
  const cct = new Float64Array(nc * nc);
  const viol = new Float64Array(nc);
  for (let a = 0; a < nc; a++) {
    let v = cons[a].rhs;
    for (let i = 0; i < theta.length; i++) v -= cons[a].coef[i] * theta[i];
    viol[a] = v;
    for (let b = 0; b < nc; b++) {
      let sum = 0;
      for (const i of free) sum += cons[a].coef[i] * cons[b].coef[i];
      cct[a * nc + b] = sum;
    }
  }
  const f = luFactor(cct, nc);
  if (f.singular) return;
  const mu = luSolve(f, viol);
  for (const i of free) {
    let d = 0;
    for (let a = 0; a < nc; a++) d += cons[a].coef[i] * mu[a];
    theta[i] += d;
  }
}

/** KKT matrix (row-major, (m + nc)²) with Marquardt damping λ·diag(A). */
function kktMatrix(
  sink: NormalSink,
  free: number[],
  cons: LinearConstraint[],
  lambda: number,
): Float64Array {
  const m = free.length;
  const nc = cons.length;
  const n = m + nc;
  const size = sink.size;
  const k = new Float64Array(n * n);
  let meanDiag = 0;
  for (const i of free) meanDiag += sink.a[i * size + i];
  meanDiag = m > 0 ? meanDiag / m : 0;
  // A parameter without any residual keeps a tiny diagonal so the system stays solvable.
  const floor = 1e-9 * meanDiag + 1e-12;
  for (let u = 0; u < m; u++) {
    const row = free[u] * size;
    for (let v = 0; v < m; v++) k[u * n + v] = sink.a[row + free[v]];
    const d = Math.max(sink.a[row + free[u]], floor);
    k[u * n + u] = d * (1 + lambda);
  }
  for (let a = 0; a < nc; a++)
    for (let u = 0; u < m; u++) {
      const c = cons[a].coef[free[u]];
      k[(m + a) * n + u] = c;
      k[u * n + m + a] = c;
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
  const f = luFactor(kktMatrix(sink, free, cons, lambda), m + nc);
  if (f.singular) return null;
  const b = new Float64Array(m + nc);
  for (let u = 0; u < m; u++) b[u] = -sink.g[free[u]];
  for (let a = 0; a < nc; a++) {
    let v = cons[a].rhs;
    for (let i = 0; i < theta.length; i++) v -= cons[a].coef[i] * theta[i];
    b[m + a] = v;
  }
  const x = luSolve(f, b);
  const out = x.subarray(0, m);
  for (let u = 0; u < m; u++) if (!Number.isFinite(out[u])) return null;
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
  const n = m + cons.length;
  const cov = new Float64Array(size * size);
  if (m === 0) return cov;
  const f = luFactor(kktMatrix(sink, free, cons, 0), n);
  if (f.singular) return null;
  const inv = luInverse(f);
  // Cov = σ²·M B M (sandwich), M = top-left m×m block of the inverse (symmetric).
  const mb = new Float64Array(m * m);
  for (let u = 0; u < m; u++)
    for (let w = 0; w < m; w++) {
      const muw = inv[u * n + w];
      if (muw === 0) continue;
      const row = free[w] * size;
      for (let v = 0; v < m; v++) mb[u * m + v] += muw * meat[row + free[v]];
    }
  for (let u = 0; u < m; u++)
    for (let v = u; v < m; v++) {
      let sum = 0;
      for (let w = 0; w < m; w++) sum += mb[u * m + w] * inv[w * n + v];
      cov[free[u] * size + free[v]] = s2 * sum;
      cov[free[v] * size + free[u]] = s2 * sum;
    }
  return cov;
}
