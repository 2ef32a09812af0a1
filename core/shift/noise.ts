/**
 * Noise level inside a curve, free of the shift: each entry is compared with a least-squares
 * quadratic through it and its four nearest neighbours (5-point window in log space), and the
 * residual is standardised by √(1 − h), h the leverage of the centre point, so that for pure noise
 * it has the noise's variance (Draper & Smith, Applied Regression Analysis, 3rd ed. 1998, §8.1).
 * The quadratic follows the curve's smooth bends, so curvature hardly inflates the estimate.
 * A robust spread (1.4826·MAD) of the pooled standardised residuals is returned, in decades.
 */
import { MAD_TO_SIGMA, medianAbs } from './robust';

/**
 * Standardised residual at entry c of a least-squares quadratic through entries lo..hi (inclusive),
 * or NaN when the window cannot give one. Leverage from (M⁻¹)₀₀ with abscissae centred on c.
 */
function windowResidual(
  lx: ArrayLike<number>,
  y: ArrayLike<number>,
  lo: number,
  hi: number,
  c: number,
): number {
  let s0 = 0;
  let s1 = 0;
  let s2 = 0;
  let s3 = 0;
  let s4 = 0;
  let t0 = 0;
  let t1 = 0;
  let t2 = 0;
  for (let i = lo; i <= hi; i++) {
    const x = lx[i] - lx[c];
    const x2 = x * x;
    s0 += 1;
    s1 += x;
    s2 += x2;
    s3 += x2 * x;
    s4 += x2 * x2;
    t0 += y[i];
    t1 += x * y[i];
    t2 += x2 * y[i];
  }
  // Normal matrix M = [[s0 s1 s2][s1 s2 s3][s2 s3 s4]]; the fitted value at x = 0 is b0, and the
  // leverage of entry c is (M⁻¹)₀₀ since its design row is (1, 0, 0).
  const det = s0 * (s2 * s4 - s3 * s3) - s1 * (s1 * s4 - s3 * s2) + s2 * (s1 * s3 - s2 * s2);
  if (!(Math.abs(det) > 1e-300)) return NaN;
  const i00 = (s2 * s4 - s3 * s3) / det;
  const i01 = -(s1 * s4 - s2 * s3) / det;
  const i02 = (s1 * s3 - s2 * s2) / det;
  const b0 = i00 * t0 + i01 * t1 + i02 * t2;
  if (!(i00 < 1 - 1e-9)) return NaN;
  return (y[c] - b0) / Math.sqrt(1 - i00);
}

/**
 * Standardised residuals of every entry with a 5-point window (entries 2..n−3); a curve of only
 * four entries (e.g. a DMA step at 1, 2, 5 and 10 Hz) gives its two inner entries from a quadratic
 * through all four.
 */
export function standardisedLocalResiduals(
  lx: ArrayLike<number>,
  y: ArrayLike<number>,
  out: number[],
): void {
  const n = lx.length;
  if (n === 4) {
    for (const c of [1, 2]) {
      const r = windowResidual(lx, y, 0, 3, c);
      if (Number.isFinite(r)) out.push(r);
    }
    return;
  }
  for (let c = 2; c < n - 2; c++) {
    const r = windowResidual(lx, y, c - 2, c + 2, c);
    if (Number.isFinite(r)) out.push(r);
  }
}

/** Robust noise level of a set of curves, decades; NaN when no curve has 4 entries. */
export function noiseLevel(curves: { lx: ArrayLike<number>; y: ArrayLike<number> }[]): number {
  const out: number[] = [];
  for (const c of curves) standardisedLocalResiduals(c.lx, c.y, out);
  return out.length > 0 ? MAD_TO_SIGMA * medianAbs(out) : NaN;
}
