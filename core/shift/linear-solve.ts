/**
 * Dense LU decomposition with partial pivoting on a flat Float64Array (Golub & Van Loan, Matrix
 * Computations, 4th ed. 2013, Alg. 3.4.1). Used for the small KKT systems of the shift fit, which
 * are solved every iteration: on flat typed arrays this is several times faster than ml-matrix's
 * Matrix objects for the 50–400 unknowns of the larger data sets.
 */
export interface LuFactors {
  n: number;
  lu: Float64Array;
  piv: Int32Array;
  singular: boolean;
}

/** Factor the n×n row-major matrix `a` (copied). */
export function luFactor(a: Float64Array, n: number): LuFactors {
  const lu = Float64Array.from(a);
  const piv = new Int32Array(n);
  let singular = false;
  let scale = 0;
  for (let i = 0; i < n * n; i++) scale = Math.max(scale, Math.abs(lu[i]));
  const tiny = scale * 1e-14;
  for (let i = 0; i < n; i++) piv[i] = i;
  for (let k = 0; k < n; k++) {
    let p = k;
    let max = Math.abs(lu[k * n + k]);
    for (let i = k + 1; i < n; i++) {
      const v = Math.abs(lu[i * n + k]);
      if (v > max) {
        max = v;
        p = i;
      }
    }
    if (!(max > tiny)) {
      singular = true;
      continue;
    }
    if (p !== k) {
      for (let j = 0; j < n; j++) {
        const t = lu[k * n + j];
        lu[k * n + j] = lu[p * n + j];
        lu[p * n + j] = t;
      }
      const t = piv[k];
      piv[k] = piv[p];
      piv[p] = t;
    }
    const d = lu[k * n + k];
    for (let i = k + 1; i < n; i++) {
      const f = (lu[i * n + k] /= d);
      if (f === 0) continue;
      const ri = i * n;
      const rk = k * n;
      for (let j = k + 1; j < n; j++) lu[ri + j] -= f * lu[rk + j];
    }
  }
  return { n, lu, piv, singular };
}

/** Solve A x = b from the factors. */
export function luSolve(f: LuFactors, b: ArrayLike<number>): Float64Array {
  const { n, lu, piv } = f;
  const x = new Float64Array(n);
  for (let i = 0; i < n; i++) x[i] = b[piv[i]];
  for (let i = 0; i < n; i++) {
    let s = x[i];
    for (let j = 0; j < i; j++) s -= lu[i * n + j] * x[j];
    x[i] = s;
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = x[i];
    for (let j = i + 1; j < n; j++) s -= lu[i * n + j] * x[j];
    x[i] = s / lu[i * n + i];
  }
  return x;
}

/** A⁻¹ (row-major) from the factors. */
export function luInverse(f: LuFactors): Float64Array {
  const n = f.n;
  const inv = new Float64Array(n * n);
  const e = new Float64Array(n);
  for (let c = 0; c < n; c++) {
    e.fill(0);
    e[c] = 1;
    const x = luSolve(f, e);
    for (let r = 0; r < n; r++) inv[r * n + c] = x[r];
  }
  return inv;
}
