/**
 * Scatter of one pair's terms into the s×s row-major normal matrix. A residual between curves i
 * and j has gradient (e_i − e_j) in the horizontal offsets (scaled) and, in a joint fit,
 * (e_vi − e_vj) in the vertical ones, so its curvature lands on a ±pattern of at most 16 entries
 * (Nocedal & Wright, Numerical Optimization, 2nd ed. 2006, §10.3: J ᵀJ of a sparse Jacobian).
 * Shared by the buffered (normal-equations.ts) and the streaming (normal-walk.ts) accumulation.
 */

/** A += v·(e_i − e_j)(e_i − e_j)ᵀ. */
export function addPairOuter(A: Float64Array, s: number, i: number, j: number, v: number): void {
  A[i * s + i] += v;
  A[j * s + j] += v;
  A[i * s + j] -= v;
  A[j * s + i] -= v;
}

/** A += v·[(e_i − e_j)(e_vi − e_vj)ᵀ + (e_vi − e_vj)(e_i − e_j)ᵀ]: the h–v cross terms. */
export function addPairCross(
  A: Float64Array,
  s: number,
  i: number,
  j: number,
  vi: number,
  vj: number,
  v: number,
): void {
  A[i * s + vi] += v;
  A[vi * s + i] += v;
  A[j * s + vj] += v;
  A[vj * s + j] += v;
  A[i * s + vj] -= v;
  A[vj * s + i] -= v;
  A[j * s + vi] -= v;
  A[vi * s + j] -= v;
}
