/**
 * Robust losses for iteratively reweighted least squares (Huber 1964, "Robust estimation of a
 * location parameter", Ann. Math. Stat. 35; Cauchy/Lorentzian loss as in Holland & Welsch 1977,
 * Commun. Stat. A6). ρ is the loss, weight = ψ(r)/r the IRLS weight. Residuals in decades.
 */
import type { RobustLoss } from './types';

/** Huber's tuning constant for 95 % efficiency under normal errors (Huber 1964). */
export const HUBER_K = 1.345;

/** Consistency factor: σ ≈ 1.4826·MAD for normal errors. */
export const MAD_TO_SIGMA = 1.4826;

export function robustRho(loss: RobustLoss, r: number, c: number): number {
  if (loss === 'none') return 0.5 * r * r;
  const a = Math.abs(r);
  if (loss === 'huber') return a <= c ? 0.5 * r * r : c * a - 0.5 * c * c;
  const z = r / c;
  return 0.5 * c * c * Math.log1p(z * z);
}

export function robustWeight(loss: RobustLoss, r: number, c: number): number {
  if (loss === 'none') return 1;
  const a = Math.abs(r);
  if (loss === 'huber') return a <= c ? 1 : c / a;
  const z = r / c;
  return 1 / (1 + z * z);
}

/** Median of the absolute values (a copy is sorted; the input is left alone). */
export function medianAbs(values: ArrayLike<number>): number {
  const n = values.length;
  if (n === 0) return NaN;
  const a = new Float64Array(n);
  for (let i = 0; i < n; i++) a[i] = Math.abs(values[i]);
  a.sort();
  return n % 2 ? a[(n - 1) >> 1] : 0.5 * (a[n / 2 - 1] + a[n / 2]);
}

/** Median of a list (copy sorted). */
export function median(values: ArrayLike<number>): number {
  const n = values.length;
  if (n === 0) return NaN;
  const a = Float64Array.from(values as ArrayLike<number>).sort();
  return n % 2 ? a[(n - 1) >> 1] : 0.5 * (a[n / 2 - 1] + a[n / 2]);
}
