/**
 * How the shift points are weighted in a shift-model fit: generalised least squares with the
 * shift engine's covariance of log10 aT (Aitken, Proc. R. Soc. Edinb. 55, 1935; Seber & Lee,
 * Linear Regression Analysis, 2nd ed., 2003, §3.10), or the diagonal of it (each point by its own
 * standard error) when no covariance is given or it cannot be used.
 *
 * All shifts are measured against the same reference condition, so they share its noise: the
 * covariance has large off-diagonal terms. When the reference temperature lies between measured
 * isotherms, the engine fixes Σ c_k·log10 aT_k = 0 (c the interpolation weights) and the
 * covariance is singular along c. The fit then (a) finds c as the null vector of the covariance,
 * (b) compares the data with the law in the engine's own convention, f − (cᵀf/cᵀ1)·1 (shifts are
 * defined up to a common offset, which the reference condition fixes), and (c) whitens with the
 * Cholesky factor of Σ + s·c·cᵀ, which equals using the pseudo-inverse of Σ on residuals that are
 * orthogonal to c (Rao, Linear Statistical Inference, 2nd ed., 1973, §4a.3).
 */
import { backSolve, choleskyFactor, forwardSolve } from './cholesky';

export interface ShiftWeighting {
  /** 'full-covariance': generalised least squares; 'diagonal': each point by its own error. */
  kind: 'full-covariance' | 'diagonal';
  /** One sentence on how the points were weighted (and why, when diagonal). */
  note: string;
  /** Number of points. */
  size: number;
  /** Standard error of each point, √Σ_kk, decades. */
  sigma: number[];
  /** Unit vector c with cᵀ·log10 aT = 0 exactly (reference between isotherms), else null. */
  constraint: Float64Array | null;
  /** Independent data: points minus exact constraints. */
  independent: number;
  /** Whitened vector L⁻¹·(v − c·cᵀv): its squared norm is vᵀΣ⁺v. */
  whiten(v: ArrayLike<number>): Float64Array;
  /** A model's log10 aT vector in the engine's convention: f − (cᵀf/cᵀ1)·1 (f itself without c). */
  adjust(f: ArrayLike<number>): Float64Array;
}

/** Relative size below which a Cholesky pivot or a variance counts as zero. */
const SINGULAR = 1e-9;

function diagonalWeighting(sigma: readonly number[], note: string): ShiftWeighting {
  const n = sigma.length;
  return {
    kind: 'diagonal',
    note,
    size: n,
    sigma: [...sigma],
    constraint: null,
    independent: n,
    whiten: (v) => Float64Array.from({ length: n }, (_, i) => v[i] / sigma[i]),
    adjust: (f) => Float64Array.from(f),
  };
}

/** Unit null vector of a symmetric positive semi-definite matrix by inverse iteration, or null. */
function nullVector(m: Float64Array, n: number, scale: number): Float64Array | null {
  const shifted = Float64Array.from(m);
  for (let i = 0; i < n; i++) shifted[i * n + i] += 1e-10 * scale;
  const l = choleskyFactor(shifted, n);
  if (!l) return null;
  let x = new Float64Array(n).fill(1 / Math.sqrt(n));
  for (let it = 0; it < 4; it++) {
    const z = backSolve(l, n, forwardSolve(l, n, x));
    const norm = Math.sqrt(z.reduce((s, v) => s + v * v, 0));
    if (!(norm > 0)) return null;
    x = z.map((v) => v / norm);
  }
  let q = 0;
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) q += x[i] * m[i * n + j] * x[j];
  return q <= SINGULAR * scale ? x : null;
}

/**
 * The weighting of `sigma.length` shift points. `covariance` (decades², same order) is used when
 * it is finite, symmetric and positive definite apart from at most one exact constraint;
 * otherwise the diagonal σ² is used and `note` says why (`diagonalReason` when none was given).
 */
export function shiftWeighting(
  sigma: readonly number[],
  covariance: readonly (readonly number[])[] | null | undefined,
  diagonalReason = 'no covariance of the shifts was given: each shift is weighted by its own standard error (weighted least squares)',
): ShiftWeighting {
  const n = sigma.length;
  if (!covariance) return diagonalWeighting(sigma, diagonalReason);
  const fallback = (why: string) =>
    diagonalWeighting(sigma, `${why}: each shift is weighted by its own standard error instead`);
  if (covariance.length !== n || covariance.some((row) => row.length !== n))
    return fallback('the shift covariance does not match the shift factors');
  const m = new Float64Array(n * n);
  let trace = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const v = 0.5 * (covariance[i][j] + covariance[j][i]);
      if (!Number.isFinite(v)) return fallback('the shift covariance holds undetermined entries');
      m[i * n + j] = v;
    }
    trace += m[i * n + i];
  }
  const scale = trace / Math.max(1, n);
  if (!(scale > 0)) return fallback('the shift covariance is zero');
  const sd = Array.from({ length: n }, (_, i) => Math.sqrt(Math.max(0, m[i * n + i])));
  const full = (l: Float64Array, c: Float64Array | null): ShiftWeighting => {
    const c1 = c ? c.reduce((s, v) => s + v, 0) : 0;
    const offset = c !== null && Math.abs(c1) > 1e-3;
    const project = (v: ArrayLike<number>): Float64Array => {
      const out = Float64Array.from(v);
      if (!c) return out;
      let d = 0;
      for (let i = 0; i < n; i++) d += c[i] * out[i];
      for (let i = 0; i < n; i++) out[i] -= d * c[i];
      return out;
    };
    return {
      kind: 'full-covariance',
      note: c
        ? 'generalised least squares with the full covariance of the shifts, which obey one exact condition (the reference temperature lies between isotherms)'
        : 'generalised least squares with the full covariance of the shifts',
      size: n,
      sigma: sd,
      constraint: c,
      independent: c ? n - 1 : n,
      whiten: (v) => forwardSolve(l, n, project(v)),
      adjust: (f) => {
        const out = Float64Array.from(f);
        if (!offset || !c) return out;
        let k = 0;
        for (let i = 0; i < n; i++) k += c[i] * out[i];
        k /= c1;
        for (let i = 0; i < n; i++) out[i] -= k;
        return out;
      },
    };
  };
  const l = choleskyFactor(m, n);
  if (l && wellConditioned(l, m, n)) return full(l, null);
  const c = nullVector(m, n, scale);
  if (!c) return fallback('the shift covariance is not positive definite');
  const withC = Float64Array.from(m);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) withC[i * n + j] += scale * c[i] * c[j];
  const l2 = choleskyFactor(withC, n);
  if (!l2 || !wellConditioned(l2, withC, n))
    return fallback('the shift covariance has more than one exact condition');
  return full(l2, c);
}

/** Every pivot² at least SINGULAR × its diagonal entry: no direction of (near) zero variance. */
function wellConditioned(l: Float64Array, m: Float64Array, n: number): boolean {
  for (let j = 0; j < n; j++) if (!(l[j * n + j] ** 2 > SINGULAR * m[j * n + j])) return false;
  return true;
}

/**
 * The weighting of prepared points: the rows and columns of `covariance` (given in the order of
 * the caller's points) that belong to the points kept, or the diagonal of their σ.
 */
export function weightingOfPoints(
  pts: { index: number[]; sigma: number[] },
  covariance: readonly (readonly number[])[] | null | undefined,
  diagonalReason?: string,
): ShiftWeighting {
  if (!covariance) return shiftWeighting(pts.sigma, null, diagonalReason);
  // The shift-model fits of one analysis (WLF, Arrhenius, polynomial) weight the same points with
  // the same covariance: the factorisations (O(n³), a few tens of ms at 500 isotherms) are made
  // once per covariance and set of points. The weighting is read only, so sharing it is safe.
  const cached = weightingCache.get(covariance);
  const hit = cached?.find(
    (e) =>
      e.diagonalReason === diagonalReason &&
      sameNumbers(e.index, pts.index) &&
      sameNumbers(e.sigma, pts.sigma),
  );
  if (hit) return hit.weighting;
  const pick = pts.index.map((i) => pts.index.map((j) => covariance[i]?.[j] ?? NaN));
  const weighting = shiftWeighting(pts.sigma, pick, diagonalReason);
  const entry = { index: [...pts.index], sigma: [...pts.sigma], diagonalReason, weighting };
  if (cached) cached.push(entry);
  else weightingCache.set(covariance, [entry]);
  return weighting;
}

interface CachedWeighting {
  index: number[];
  sigma: number[];
  diagonalReason: string | undefined;
  weighting: ShiftWeighting;
}

/** Weightings by the covariance they were made from (dropped with it). */
const weightingCache = new WeakMap<object, CachedWeighting[]>();

function sameNumbers(a: readonly number[], b: readonly number[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (!Object.is(a[i], b[i])) return false;
  return true;
}
