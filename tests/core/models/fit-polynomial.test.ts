import { describe, expect, it } from 'vitest';
import { fitPolynomial } from '../../../core/models/fit-polynomial';
import { expectAbsClose } from '../../helpers/assert-close';

describe('fitPolynomial()', () => {
  it('fitPolynomial() recovers a1 and a2 from exact data', () => {
    const pts = [-20, -10, 10, 20, 30].map((d) => ({
      temperatureK: 294 + d,
      log10aT: -0.12 * d + 5e-4 * d * d,
      stdErr: 0.02,
    }));
    const f = fitPolynomial(pts, { referenceK: 294 });
    expectAbsClose(f.a1PerK, -0.12, 1e-12);
    expectAbsClose(f.a2PerK2, 5e-4, 1e-12);
    expectAbsClose(f.rSquared, 1, 1e-12);
    expect(f.degreesOfFreedom).toBe(3);
  });

  it('fitPolynomial() on three points solves the hand-computed 2×2 system', () => {
    // d = 1, 2 ; y = 1, 3 (exact): a1 + a2 = 1, 2a1 + 4a2 = 3 → a2 = 0.5, a1 = 0.5
    const f = fitPolynomial(
      [
        { temperatureK: 301, log10aT: 1, stdErr: 1 },
        { temperatureK: 302, log10aT: 3, stdErr: 1 },
      ],
      { referenceK: 300 },
    );
    expectAbsClose(f.a1PerK, 0.5, 1e-12);
    expectAbsClose(f.a2PerK2, 0.5, 1e-12);
    expect(f.degreesOfFreedom).toBe(0);
    expect(f.warnings.some((w) => /no degrees of freedom/.test(w.message))).toBe(true);
  });

  it('fitPolynomial() with one temperature repeated reports not converged', () => {
    const f = fitPolynomial(
      [
        { temperatureK: 310, log10aT: -1, stdErr: 0.1 },
        { temperatureK: 310, log10aT: -1.1, stdErr: 0.1 },
      ],
      { referenceK: 300 },
    );
    expect(f.converged).toBe(false);
  });
});
