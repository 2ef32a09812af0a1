/**
 * Standard normal distribution function, Φ(x) = ½ erfc(−x/√2), with erfc from the Chebyshev
 * approximation of Press et al., Numerical Recipes in C, 2nd ed., 1992, §6.2 (erfcc; fractional error below
 * 1.2e-7 everywhere), and the two-sided 5 % quantile used for every interval in a comparison.
 */
export const Z95 = 1.959963984540054;

function erfc(x: number): number {
  const z = Math.abs(x);
  const t = 1 / (1 + 0.5 * z);
  const r =
    t *
    Math.exp(
      -z * z -
        1.26551223 +
        t *
          (1.00002368 +
            t *
              (0.37409196 +
                t *
                  (0.09678418 +
                    t *
                      (-0.18628806 +
                        t *
                          (0.27886807 +
                            t *
                              (-1.13520398 +
                                t * (1.48851587 + t * (-0.82215223 + t * 0.17087277)))))))),
    );
  return x >= 0 ? r : 2 - r;
}

export function normalCdf(x: number): number {
  return 0.5 * erfc(-x / Math.SQRT2);
}

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
