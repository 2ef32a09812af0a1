/**
 * The standard normal distribution function Φ(x) = ½ erfc(−x/√2), with erfc from the Chebyshev
 * fit of Press et al., Numerical Recipes (erfcc, §6.2; fractional error below 1.2e-7 everywhere).
 * Used by the Student-t quantile for very large degrees of freedom and by the comparison verdicts.
 */
/** Standard normal CDF (the incomplete beta limit of Student's t is unstable there). */
export function normalCdf(x: number): number {
  return 0.5 * erfc(-x / Math.SQRT2);
}

/** Complementary error function, Chebyshev fit (Numerical Recipes, 3rd ed., §6.2.2), |rel err| < 1.2e-7. */
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
