/**
 * Least-squares quadratic b0 + b1·x + b2·x² through a window of a curve, with the abscissae
 * centred on one entry so that b0 is the fitted value there and b1 the slope. Shared by the slope
 * smoother (series.ts) and the noise estimate (noise.ts); the normal matrix is
 * M = [[s0 s1 s2][s1 s2 s3][s2 s3 s4]] and the right-hand side (t0 t1 t2).
 */

/** Indices into the sums array: s0..s4 = Σ xᵏ, t0..t2 = Σ xᵏ·y. */
export const S0 = 0;
export const S1 = 1;
export const S2 = 2;
export const S3 = 3;
export const S4 = 4;
export const T0 = 5;
export const T1 = 6;
export const T2 = 7;

/** A scratch array for `centredQuadraticSums` (8 entries). */
export const quadraticSums = (): Float64Array => new Float64Array(8);

/**
 * Fills `sums` with s0..s4, t0..t2 over entries lo..hi (inclusive) of (lx, y), x = lx[i] − lx[c];
 * returns det M.
 */
export function centredQuadraticSums(
  lx: ArrayLike<number>,
  y: ArrayLike<number>,
  lo: number,
  hi: number,
  c: number,
  sums: Float64Array,
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
  sums[S0] = s0;
  sums[S1] = s1;
  sums[S2] = s2;
  sums[S3] = s3;
  sums[S4] = s4;
  sums[T0] = t0;
  sums[T1] = t1;
  sums[T2] = t2;
  return s0 * (s2 * s4 - s3 * s3) - s1 * (s1 * s4 - s3 * s2) + s2 * (s1 * s3 - s2 * s2);
}
