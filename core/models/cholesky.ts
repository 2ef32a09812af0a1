/**
 * Cholesky factorisation Σ = L·Lᵀ of a symmetric positive definite matrix and the triangular
 * solve L⁻¹·v (Golub & Van Loan, Matrix Computations, 4th ed., 2013, alg. 4.2.1). Row-major
 * Float64Array storage; the strict upper triangle of L is left zero.
 */

/** Lower-triangular factor, or null when a pivot is not positive (matrix not positive definite). */
export function choleskyFactor(matrix: ArrayLike<number>, n: number): Float64Array | null {
  if (matrix.length !== n * n) throw new RangeError(`matrix must hold ${n}×${n} entries`);
  const l = new Float64Array(n * n);
  for (let j = 0; j < n; j++) {
    let d = matrix[j * n + j];
    for (let k = 0; k < j; k++) d -= l[j * n + k] * l[j * n + k];
    if (!(d > 0) || !Number.isFinite(d)) return null;
    const ljj = Math.sqrt(d);
    l[j * n + j] = ljj;
    for (let i = j + 1; i < n; i++) {
      let s = matrix[i * n + j];
      for (let k = 0; k < j; k++) s -= l[i * n + k] * l[j * n + k];
      l[i * n + j] = s / ljj;
    }
  }
  return l;
}

/** Solves L·x = v by forward substitution. */
export function forwardSolve(l: Float64Array, n: number, v: ArrayLike<number>): Float64Array {
  const x = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let s = v[i];
    for (let k = 0; k < i; k++) s -= l[i * n + k] * x[k];
    x[i] = s / l[i * n + i];
  }
  return x;
}

/** Solves Lᵀ·x = v by back substitution. */
export function backSolve(l: Float64Array, n: number, v: ArrayLike<number>): Float64Array {
  const x = new Float64Array(n);
  for (let i = n - 1; i >= 0; i--) {
    let s = v[i];
    for (let k = i + 1; k < n; k++) s -= l[k * n + i] * x[k];
    x[i] = s / l[i * n + i];
  }
  return x;
}
