/**
 * Noise level inside a curve, free of the shift: each entry is compared with a least-squares
 * quadratic through it and its four nearest neighbours (5-point window in log space), and the
 * residual is standardised by √(1 − h), h the leverage of the centre point, so that for pure noise
 * it has the noise's variance (Draper & Smith, Applied Regression Analysis, 3rd ed. 1998, §8.1).
 * The quadratic follows the curve's smooth bends, so curvature hardly inflates the estimate.
 * A robust spread (1.4826·MAD) of the pooled standardised residuals is returned, in decades.
 */
import { MAD_TO_SIGMA, medianAbs } from './robust';
import { centredQuadraticSums, quadraticSums, S1, S2, S3, S4, T0, T1, T2 } from './local-quadratic';

/**
 * Standardised residual at entry c of a least-squares quadratic through entries lo..hi (inclusive),
 * or NaN when the window cannot give one. Leverage from (M⁻¹)₀₀ with abscissae centred on c;
 * `m` is scratch space for the window sums.
 */
function windowResidual(
  lx: ArrayLike<number>,
  y: ArrayLike<number>,
  lo: number,
  hi: number,
  c: number,
  m: Float64Array,
): number {
  const det = centredQuadraticSums(lx, y, lo, hi, c, m);
  // The fitted value at x = 0 is b0, and the leverage of entry c is (M⁻¹)₀₀ since its design row
  // is (1, 0, 0).
  if (!(Math.abs(det) > 1e-300)) return NaN;
  const i00 = (m[S2] * m[S4] - m[S3] * m[S3]) / det;
  const i01 = -(m[S1] * m[S4] - m[S2] * m[S3]) / det;
  const i02 = (m[S1] * m[S3] - m[S2] * m[S2]) / det;
  const b0 = i00 * m[T0] + i01 * m[T1] + i02 * m[T2];
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
  w?: ArrayLike<number>,
): void {
  const n = lx.length;
  const sums = quadraticSums();
  // An entry averaged from w points has 1/√w of a point's noise: scaled back to one point, so the
  // estimate is the noise of a measured point whether or not the curve was binned (neighbouring
  // bins of a dense curve hold about the same number of points).
  const push = (r: number, c: number) => {
    if (Number.isFinite(r)) out.push(w ? r * Math.sqrt(w[c]) : r);
  };
  if (n === 4) {
    for (const c of [1, 2]) push(windowResidual(lx, y, 0, 3, c, sums), c);
    return;
  }
  for (let c = 2; c < n - 2; c++) push(windowResidual(lx, y, c - 2, c + 2, c, sums), c);
}

/**
 * Robust noise level of a set of curves, decades, per measured point (`w`: points averaged into
 * each entry, 1 when absent); NaN when no curve has 4 entries.
 */
export function noiseLevel(
  curves: { lx: ArrayLike<number>; y: ArrayLike<number>; w?: ArrayLike<number> }[],
): number {
  const out: number[] = [];
  for (const c of curves) standardisedLocalResiduals(c.lx, c.y, out, c.w);
  return out.length > 0 ? MAD_TO_SIGMA * medianAbs(out) : NaN;
}
