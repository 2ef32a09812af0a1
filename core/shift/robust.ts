/**
 * Robust losses for iteratively reweighted least squares (Huber 1964, "Robust estimation of a
 * location parameter", Ann. Math. Stat. 35; Cauchy/Lorentzian loss as in Holland & Welsch 1977,
 * Commun. Stat. A6). ρ is the loss, weight = ψ(r)/r the IRLS weight, which the fit uses for
 * both the gradient and the curvature (iteratively reweighted least squares). Residuals in
 * decades.
 */
import type { RobustLoss } from './types';

/** Huber's tuning constant for 95 % efficiency under normal errors (Huber 1964). */
export const HUBER_K = 1.345;

/** Consistency factor: σ ≈ 1.4826·MAD for normal errors. */
export const MAD_TO_SIGMA = 1.4826;

/** Numeric loss codes for the hot loops. */
export const LOSS_NONE = 0;
export const LOSS_HUBER = 1;
export const LOSS_CAUCHY = 2;

export function lossCode(loss: RobustLoss): number {
  return loss === 'none' ? LOSS_NONE : loss === 'huber' ? LOSS_HUBER : LOSS_CAUCHY;
}

export function robustRho(loss: RobustLoss | number, r: number, c: number): number {
  const code = typeof loss === 'number' ? loss : lossCode(loss);
  if (code === LOSS_NONE) return 0.5 * r * r;
  const a = Math.abs(r);
  if (code === LOSS_HUBER) return a <= c ? 0.5 * r * r : c * a - 0.5 * c * c;
  const z = r / c;
  return 0.5 * c * c * Math.log1p(z * z);
}

export function robustWeight(loss: RobustLoss | number, r: number, c: number): number {
  const code = typeof loss === 'number' ? loss : lossCode(loss);
  if (code === LOSS_NONE) return 1;
  const a = Math.abs(r);
  if (code === LOSS_HUBER) return a <= c ? 1 : c / a;
  const z = r / c;
  return 1 / (1 + z * z);
}

/** Median of the absolute values (a copy is partially sorted; the input is left alone). */
export function medianAbs(values: ArrayLike<number>): number {
  const n = values.length;
  if (n === 0) return NaN;
  const a = new Float64Array(n);
  for (let i = 0; i < n; i++) a[i] = Math.abs(values[i]);
  return medianInPlace(a);
}

/** Median of a list (copy partially sorted). */
export function median(values: ArrayLike<number>): number {
  const n = values.length;
  if (n === 0) return NaN;
  return medianInPlace(Float64Array.from(values as ArrayLike<number>));
}

function medianInPlace(a: Float64Array): number {
  const n = a.length;
  const hi = select(a, n >> 1);
  if (n % 2) return hi;
  // The lower middle is the largest value left of position n/2 after selection.
  let lo = -Infinity;
  for (let i = 0; i < n >> 1; i++) if (a[i] > lo) lo = a[i];
  return 0.5 * (lo + hi);
}

/** k-th smallest value, Hoare's selection (Hoare, Commun. ACM 4, 1961, "Find"); reorders `a`. */
function select(a: Float64Array, k: number): number {
  let left = 0;
  let right = a.length - 1;
  while (right > left) {
    const pivot = a[(left + right) >> 1];
    let i = left;
    let j = right;
    while (i <= j) {
      while (a[i] < pivot) i++;
      while (a[j] > pivot) j--;
      if (i <= j) {
        const t = a[i];
        a[i] = a[j];
        a[j] = t;
        i++;
        j--;
      }
    }
    if (k <= j) right = j;
    else if (k >= i) left = i;
    else break;
  }
  return a[k];
}
