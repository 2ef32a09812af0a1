import { invert, multiply } from './linear-algebra';
import type { ShiftWeighting } from './shift-weighting';

/**
 * Closed-form generalised least squares for a model linear in its constants,
 * log10 aT = Σ_k X_ik b_k: minimises ‖L⁻¹P(y − Xb)‖² with the design columns taken in the
 * weighting's convention (Seber & Lee, Linear Regression Analysis, 2nd ed., 2003, §3.10).
 * Returns the constants (NaN when the temperatures do not determine them).
 */
export function glsLinearFit(
  design: readonly number[][],
  y: readonly number[],
  weighting: ShiftWeighting,
): number[] {
  const p = design.length ? design[0].length : 0;
  const cols = Array.from({ length: p }, (_, k) =>
    weighting.whiten(weighting.adjust(design.map((row) => row[k]))),
  );
  const wy = weighting.whiten(y);
  const dot = (a: ArrayLike<number>, b: ArrayLike<number>): number => {
    let s = 0;
    for (let i = 0; i < a.length; i++) s += a[i] * b[i];
    return s;
  };
  const normal = cols.map((a) => cols.map((b) => dot(a, b)));
  return multiply(
    invert(normal),
    cols.map((a) => dot(a, wy)),
  );
}
