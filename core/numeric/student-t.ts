/**
 * Student's t distribution: CDF through the regularised incomplete beta function and the
 * quantile by bisection on that CDF. Incomplete beta by the modified Lentz continued fraction
 * (Press, Teukolsky, Vetterling & Flannery, Numerical Recipes, 3rd ed., 2007, §6.4);
 * log-gamma by the Lanczos approximation (same book, §6.1, g = 7 coefficients).
 */
import { normalCdf } from './normal';

const LANCZOS = [
  0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313,
  -176.61502916214059, 12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6,
  1.5056327351493116e-7,
];

/** ln Γ(x) for x > 0. */
export function logGamma(x: number): number {
  if (x < 0.5) return Math.log(Math.PI / Math.sin(Math.PI * x)) - logGamma(1 - x);
  const z = x - 1;
  let a = LANCZOS[0];
  const t = z + 7.5;
  for (let i = 1; i < 9; i++) a += LANCZOS[i] / (z + i);
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(a);
}

function betaContinuedFraction(a: number, b: number, x: number): number {
  const tiny = 1e-300;
  let c = 1;
  let d = 1 - ((a + b) * x) / (a + 1);
  if (Math.abs(d) < tiny) d = tiny;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= 10000; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((a - 1 + m2) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (a + b + m) * x) / ((a + m2) * (a + 1 + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < 1e-15) break;
  }
  return h;
}

/** Regularised incomplete beta I_x(a, b), 0 ≤ x ≤ 1. */
export function incompleteBeta(x: number, a: number, b: number): number {
  if (x <= 0) return 0;
  if (x >= 1) return 1;
  const lnFront =
    logGamma(a + b) - logGamma(a) - logGamma(b) + a * Math.log(x) + b * Math.log(1 - x);
  const front = Math.exp(lnFront);
  return x < (a + 1) / (a + b + 2)
    ? (front * betaContinuedFraction(a, b, x)) / a
    : 1 - (front * betaContinuedFraction(b, a, 1 - x)) / b;
}

/** P(T ≤ t) for Student's t with `dof` degrees of freedom (dof > 0, may be non-integer). */
export function studentTCdf(t: number, dof: number): number {
  if (!(dof > 0)) throw new RangeError(`dof must be a positive number, got ${dof}`);
  if (Number.isNaN(t)) return NaN;
  const tail = 0.5 * incompleteBeta(dof / (dof + t * t), dof / 2, 0.5);
  return t >= 0 ? 1 - tail : tail;
}

/**
 * Quantile t_p(dof): the t with P(T ≤ t) = p. Bisection to full double precision; for dof above
 * 1e7 the normal quantile is returned (the difference is below 1e-7).
 */
export function studentTQuantile(p: number, dof: number): number {
  if (!(p > 0 && p < 1)) throw new RangeError(`p must lie strictly between 0 and 1, got ${p}`);
  if (!(dof > 0)) throw new RangeError(`dof must be a positive number, got ${dof}`);
  if (p < 0.5) return -studentTQuantile(1 - p, dof);
  if (p === 0.5) return 0;
  const cdf = dof > 1e7 ? normalCdf : (t: number) => studentTCdf(t, dof);
  let lo = 0;
  let hi = 1;
  while (cdf(hi) < p) {
    lo = hi;
    hi *= 2;
    if (hi > 1e300) return Infinity;
  }
  for (let i = 0; i < 200 && hi - lo > 1e-15 * hi; i++) {
    const mid = 0.5 * (lo + hi);
    if (cdf(mid) < p) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
