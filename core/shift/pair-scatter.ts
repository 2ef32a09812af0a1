/**
 * Scatter of one pair's terms into the symmetric normal matrix (envelope storage, layout.ts). A
 * residual between curves i and j has gradient (e_i − e_j) in the horizontal offsets (scaled) and,
 * in a joint fit, (e_vi − e_vj) in the vertical ones, so its curvature lands on a ±pattern of at
 * most 16 entries (Nocedal & Wright, Numerical Optimization, 2nd ed. 2006, §10.3: JᵀJ of a sparse
 * Jacobian). Shared by the buffered (normal-equations.ts) and the streaming (normal-walk.ts)
 * accumulation. Only the lower triangle is stored, so each symmetric pair of entries is added once.
 */
import type { ParameterLayout } from './layout';
import { slotIn as slotImport } from './layout';

const slotIn = slotImport; // local binding (see residuals.ts)

/** A += v·(e_i − e_j)(e_i − e_j)ᵀ. */
export function addPairOuter(
  A: Float64Array,
  l: ParameterLayout,
  i: number,
  j: number,
  v: number,
): void {
  A[slotIn(l, i, i)] += v;
  A[slotIn(l, j, j)] += v;
  A[slotIn(l, i, j)] -= v;
}

/** A += v·[(e_i − e_j)(e_vi − e_vj)ᵀ + (e_vi − e_vj)(e_i − e_j)ᵀ]: the h–v cross terms. */
export function addPairCross(
  A: Float64Array,
  l: ParameterLayout,
  i: number,
  j: number,
  vi: number,
  vj: number,
  v: number,
): void {
  A[slotIn(l, i, vi)] += v;
  A[slotIn(l, j, vj)] += v;
  A[slotIn(l, i, vj)] -= v;
  A[slotIn(l, j, vi)] -= v;
}
