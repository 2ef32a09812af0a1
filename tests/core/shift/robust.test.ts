import { describe, expect, it } from 'vitest';
import {
  HUBER_K,
  MAD_TO_SIGMA,
  median,
  medianAbs,
  robustRho,
  robustWeight,
} from '../../../core/shift/robust';
import { seededRandom } from '../../../core/synthetic';
import { expectAbsClose } from '../../helpers/assert-close';

describe('robustRho()', () => {
  it('robustRho() is Huber’s loss: quadratic inside the corner, linear outside (Huber 1964)', () => {
    expectAbsClose(robustRho('huber', 0.5, 1), 0.125, 1e-15, 'inside');
    expectAbsClose(robustRho('huber', 3, 1), 2.5, 1e-15, 'outside: c|r| − c²/2');
    expectAbsClose(robustWeight('huber', 3, 1), 1 / 3, 1e-15, 'ψ(r)/r = c/|r|');
    expect(robustWeight('huber', 0.3, 1)).toBe(1);
    expect(robustRho('none', 3, 1)).toBe(4.5);
  });

  it('robustRho() for Cauchy is (c²/2)·ln(1 + (r/c)²) with weight 1/(1 + (r/c)²)', () => {
    expectAbsClose(robustRho('cauchy', 2, 2), 2 * Math.log(2), 1e-15, 'ρ');
    expectAbsClose(robustWeight('cauchy', 2, 2), 0.5, 1e-15, 'w');
    // The weight stays positive far out, so every residual keeps some curvature.
    expectAbsClose(robustWeight('cauchy', 10, 1), 1 / 101, 1e-15, 'w far out');
  });

  it('HUBER_K and MAD_TO_SIGMA are the textbook constants', () => {
    // 1.345 gives 95 % efficiency under normal errors (Huber 1964); 1/Φ⁻¹(0.75) = 1/0.67449 =
    // 1.4826 (standard normal table).
    expect(HUBER_K).toBe(1.345);
    expectAbsClose(MAD_TO_SIGMA, 1 / 0.67449, 1e-4, '1/Φ⁻¹(3/4)');
  });
});

describe('median()', () => {
  it('median() by selection equals the median of a sorted copy (odd, even, duplicates)', () => {
    const rng = seededRandom(7);
    for (const n of [1, 2, 3, 10, 101, 1000]) {
      const a = Array.from({ length: n }, () => Math.round(rng.normal() * 5));
      const s = [...a].sort((x, y) => x - y);
      const m = n % 2 ? s[(n - 1) / 2] : (s[n / 2 - 1] + s[n / 2]) / 2;
      expect(median(a)).toBe(m);
    }
    expect(median([])).toBeNaN();
    expect(medianAbs([-3, 1, 2])).toBe(2);
  });
});
