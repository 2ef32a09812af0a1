/**
 * How much a curve's shape can tell about its horizontal shift. A shift moves a curve along log x;
 * a point fixes it only as far as the curve is sloped there (a point on a slope s moves by s·Δ
 * decades when the curve moves by Δ). With noise σ per point, no comparison can fix the shift
 * better than σ/√(Σ s²) (the Cramér–Rao bound of a known-shape curve; Kay, Fundamentals of
 * Statistical Signal Processing: Estimation Theory, 1993, ch. 3). On a flat plateau Σ s² is near
 * zero and the bound is huge whatever the pair comparisons say — the engine's curvature-based
 * standard error, which uses the scatter of the comparisons, cannot see that when the curves are
 * noise-free or equally flat.
 */
import type { Isotherm, QuantityId } from '../data/types';
import { logOrdinate, quantityValues } from './drivers';
import { centredQuadraticSums, quadraticSums, S1, S2, S3, S4, T0, T1, T2 } from './local-quadratic';

/** Smallest noise assumed for one point, decades (≈ 1 %): no instrument measures better. */
export const INFORMATION_NOISE_FLOOR_DECADES = 0.005;
/** Smallest Σ s² used, so that a perfectly flat curve gets a finite (huge) bound. */
const MIN_INFORMATION = 1e-6;

/**
 * Lower bound of the standard error of log10 aT from one curve's own shape, decades: slopes of a
 * least-squares quadratic in log–log space, noise from its residuals (at least the floor).
 */
export function shiftErrorFloor(iso: Isotherm, drivers: QuantityId[]): number {
  let info = 0;
  let ss = 0;
  let dof = 0;
  // log10 x once for all drivers, plain loops into typed arrays (10⁶ points in milliseconds)
  const n = iso.x.length;
  const logX = new Float64Array(n);
  for (let i = 0; i < n; i++) logX[i] = iso.x[i] > 0 ? Math.log10(iso.x[i]) : NaN;
  const lx = new Float64Array(n);
  const ly = new Float64Array(n);
  for (const q of drivers) {
    const v = quantityValues(q, iso.quantities);
    if (!v) continue;
    let m = 0;
    for (let i = 0; i < n; i++) {
      const y = logOrdinate(q, v[i]);
      if (iso.mask[i] && iso.x[i] > 0 && Number.isFinite(y)) {
        lx[m] = logX[i];
        ly[m] = y;
        m++;
      }
    }
    if (m < 4) continue;
    const c = quadratic(lx, ly, m);
    if (!c) continue;
    for (let i = 0; i < m; i++) {
      const x = lx[i];
      const s = c[1] + 2 * c[2] * x;
      info += s * s;
      ss += (ly[i] - (c[0] + c[1] * x + c[2] * x * x)) ** 2;
    }
    dof += m - 3;
  }
  if (dof <= 0) return NaN;
  const sigma = Math.max(Math.sqrt(ss / dof), INFORMATION_NOISE_FLOOR_DECADES);
  return sigma / Math.sqrt(Math.max(info, MIN_INFORMATION));
}

/**
 * Least-squares y ≈ c0 + c1 x + c2 x² over the first n entries (x centred for conditioning);
 * null when degenerate.
 */
function quadratic(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  n: number,
): [number, number, number] | null {
  // Centred on the middle entry (the sums of local-quadratic.ts): u = x − m.
  const m = x[n >> 1];
  const sums = quadraticSums();
  const d = centredQuadraticSums(x, y, 0, n - 1, n >> 1, sums); // det of A below
  const [s1, s2, s3, s4] = [sums[S1], sums[S2], sums[S3], sums[S4]];
  const A = [
    [n, s1, s2],
    [s1, s2, s3],
    [s2, s3, s4],
  ];
  const b = [sums[T0], sums[T1], sums[T2]];
  const det3 = (M: number[][]): number =>
    M[0][0] * (M[1][1] * M[2][2] - M[1][2] * M[2][1]) -
    M[0][1] * (M[1][0] * M[2][2] - M[1][2] * M[2][0]) +
    M[0][2] * (M[1][0] * M[2][1] - M[1][1] * M[2][0]);
  if (!(Math.abs(d) > 1e-12 * Math.max(1, s4 * s2 * n))) return null;
  const col = (j: number): number[][] => A.map((row, r) => row.map((v, c) => (c === j ? b[r] : v)));
  const [a0, a1, a2] = [0, 1, 2].map((j) => det3(col(j)) / d);
  // Back from u = x − m: y = a0 + a1 (x − m) + a2 (x − m)².
  return [a0 - a1 * m + a2 * m * m, a1 - 2 * a2 * m, a2];
}
