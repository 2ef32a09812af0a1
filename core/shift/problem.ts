/**
 * The internal fit problem: every active isotherm as one series per driving quantity, in log space,
 * with typed arrays for the hot loops. Parameters θ: one horizontal offset h_k per curve (log10 aT,
 * or log10 bT when bT is found by shifting δ along log|G*|), followed by one vertical offset v_k
 * per curve when a joint vertical fit is asked for.
 */

/** One curve of one quantity, sorted by abscissa, duplicates merged, maybe binned. */
export interface FitSeries {
  /** Abscissa in log space (log10 ω, log10 t or log10 |G*|), strictly ascending. */
  lx: Float64Array;
  /** Ordinate in log space (decades) or δ. */
  y: Float64Array;
  /** Weight of each entry: the number of measured points averaged into it. */
  w: Float64Array;
  /** Measured point indices, entry e owning pointIndex[binStart[e] .. binStart[e+1]). */
  pointIndex: Int32Array;
  binStart: Int32Array;
  /** y sorted ascending, for quick overlap tests in y. */
  ySorted: Float64Array;
  /** dy/dlx at each entry from a local quadratic through 5 entries (noise-damped slope). */
  slope: Float64Array;
  /** 1/w per entry, and per segment k (entries k, k+1): its slope and 1/length (hot-loop cache). */
  invW: Float64Array;
  segSlope: Float64Array;
  invH: Float64Array;
}

export interface FitProblem {
  /** Reduced abscissa u = lx + sigma·h. +1 for frequency (ω_r = aT ω), −1 for time (t_r = t/aT). */
  sigma: 1 | -1;
  /** Per driver: coefficient of h in the reduced ordinate (−1 for |η*|, else 0). */
  alpha: Float64Array;
  /** Per driver: coefficient of v in the reduced ordinate (+1 modulus, −1 compliance, 0 tan δ). */
  beta: Float64Array;
  /** True when vertical offsets v_k are fitted too. */
  joint: boolean;
  /** curves[k][d]: curve k, driver d. */
  curves: FitSeries[][];
  /** Candidate pairs as a flat list i0, j0, i1, j1, … (i < j). */
  pairs: Int32Array;
  /**
   * Curve indices in order of temperature (ties by index). Pairs are sought among curves close
   * in this order and the matrices are banded in it (layout.ts). Identity when absent.
   */
  order?: Int32Array;
  minOverlapPoints: number;
  /**
   * Use the noise-damped slopes in the Jacobian. The fit itself uses the exact segment slopes
   * (the true gradient of the objective); the covariance uses these, because squared slopes of
   * noisy segments overstate the information where a curve is flat.
   */
  smoothSlopes?: boolean;
  /**
   * Build the curvature of the refinement from the exact segment slopes, as the gradient does,
   * instead of the noise-damped ones. The squared slopes of noisy segments overstate the
   * curvature where a curve is nearly flat, which keeps the steps there short: the per-quantity
   * check (quantity-shifts.ts) relies on that, since its two iterations from the joint optimum
   * must not run far along a quantity (such as G′ on a rubbery plateau) that hardly fixes the
   * shift on its own.
   */
  segmentCurvature?: boolean;
}

export function parameterCount(p: FitProblem): number {
  return p.curves.length * (p.joint ? 2 : 1);
}
