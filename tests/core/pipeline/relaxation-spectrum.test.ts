import { describe, expect, it } from 'vitest';
import { relaxationSpectrum } from '../../../core/pipeline/relaxation-spectrum';
import { pronyRelaxation } from '../../../core/spectrum/prony-model';
import { expectRelClose } from '../../helpers/assert-close';

/**
 * E1(x) = ∫ₓ^∞ e^(−u)/u du: power series for x ≤ 1 (Abramowitz & Stegun 1964, eq. 5.1.11), the
 * continued fraction for x > 1 (Press et al., Numerical Recipes, 3rd ed. 2007, §6.3).
 */
function e1(x: number): number {
  if (x > 1) {
    let b = x + 1;
    let c = 1e300;
    let d = 1 / b;
    let h = d;
    for (let i = 1; i < 200; i++) {
      const an = -i * i;
      b += 2;
      d = 1 / (an * d + b);
      c = b + an / c;
      const del = c * d;
      h *= del;
      if (Math.abs(del - 1) < 1e-15) break;
    }
    return h * Math.exp(-x);
  }
  let sum = 0;
  let term = 1;
  for (let k = 1; k < 200; k++) {
    term *= -x / k;
    sum -= term / k;
    if (Math.abs(term / k) < 1e-17) break;
  }
  return -0.5772156649015329 - Math.log(x) + sum;
}

describe('relaxationSpectrum()', () => {
  it('relaxationSpectrum() gives back a box spectrum H0 from its Prony form, and that Prony form relaxes as the box does', () => {
    // box spectrum H(τ) = H0 on τ1 … τ2: G(t) = ∫ H0 e^(−t/τ) d ln τ = H0 [E1(t/τ2) − E1(t/τ1)]
    // (Ferry 1980, ch. 3); its Prony form has g_i = H0·Δ ln τ at 10 modes per decade
    const H0 = 1e6;
    const perDecade = 10;
    const tauS = Array.from({ length: 4 * perDecade + 1 }, (_, i) => 1e-2 * 10 ** (i / perDecade));
    const d = Math.LN10 / perDecade;
    const modulusPa = tauS.map((_, i) =>
      i === 0 || i === tauS.length - 1 ? (H0 * d) / 2 : H0 * d,
    );
    const h = relaxationSpectrum({ equilibriumModulusPa: 0, tauS, modulusPa });
    for (let i = 1; i < tauS.length - 1; i++)
      expectRelClose(h.spectrumPa[i], H0, 1e-12, `H(τ_${i})`);
    for (const t of [0.03, 0.1, 1, 10, 30]) {
      const exact = H0 * (e1(t / 1e2) - e1(t / 1e-2));
      // trapezoid rule in ln τ at 10 modes per decade: within 0.5 % of the integral
      expectRelClose(
        pronyRelaxation({ equilibriumModulusPa: 0, tauS, modulusPa }, t),
        exact,
        0.005,
        `G(${t} s)`,
      );
    }
  });

  it('relaxationSpectrum() sorts the terms by τ and handles one term (Δ ln τ = ln 10)', () => {
    const h = relaxationSpectrum({ equilibriumModulusPa: 5, tauS: [10, 1], modulusPa: [2, 3] });
    expect(h.tauS).toEqual([1, 10]);
    expect(h.modulusPa).toEqual([3, 2]);
    expect(h.spectrumPa).toEqual([3 / Math.LN10, 2 / Math.LN10]);
    expect(
      relaxationSpectrum({ equilibriumModulusPa: 0, tauS: [1], modulusPa: [7] }).spectrumPa,
    ).toEqual([7 / Math.LN10]);
  });
});
