/**
 * The linear algebra of one constrained step: the KKT system of the normal equations with the
 * reference condition (and bT(Tref) = 1) as linear equality constraints
 *   [A + λ·diag(A)  Cᵀ] [δ]   [−g       ]
 *   [C              0 ] [μ] = [rhs − Cθ ]
 * (Nocedal & Wright, Numerical Optimization, 2nd ed. 2006, §16.1), the projection of a start onto
 * the constraints, the Gaussian prior on log10 bT, and the sandwich covariance from the inverse.
 */
import { luFactor, luInverse, luSolve } from './linear-solve';
import type { NormalSink } from './normal-equations';

export interface LinearConstraint {
  /** Coefficients over the full parameter vector. */
  coef: Float64Array;
  rhs: number;
}

/** Adds ½·scale²·θ²/σ² per parameter with a prior (1/σ² in `prior`, 0 for none). */
export function addPrior(
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
export function projectOntoConstraints(
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
export function kktMatrix(
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

/** Step of the free parameters (length m), or null when the system is singular. */
export function kktStep(
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

/** σ²·M B M over the full parameter vector, M the constrained inverse of A, B the meat. */
export function covarianceOf(
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
