/**
 * The normal quantiles of a comparison: the two-sided 5 % quantile used for every interval, and
 * the Bonferroni quantile for simultaneous tests. Φ itself is core/numeric's `normalCdf`.
 */
import { normalCdf } from '../numeric';

export const Z95 = 1.959963984540054;

/** Two-sided quantile for `tests` simultaneous tests at 5 % overall (Bonferroni); 2 tests: 2.241. */
export function bonferroniZ(tests: number): number {
  // bisection on Φ(z) = 1 − 0.025/tests
  const target = 1 - 0.025 / tests;
  let lo = 0;
  let hi = 10;
  for (let i = 0; i < 80; i++) {
    const mid = (lo + hi) / 2;
    if (normalCdf(mid) < target) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}
