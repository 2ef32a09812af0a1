import { describe, expect, it } from 'vitest';
import {
  wlfApparentActivationEnergyKJPerMol,
  wlfFreeVolume,
} from '../../../core/models/wlf-derived';
import { wlfLog10aT } from '../../../core/models/shift-laws';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';

describe('wlfApparentActivationEnergyKJPerMol()', () => {
  it('wlfApparentActivationEnergyKJPerMol() equals R·d ln aT/d(1/T) by finite differences (analytic identity)', () => {
    const R = 8.314462618;
    for (const T of [330, 360, 400]) {
      const h = 1e-3;
      const lnA = (t: number) => wlfLog10aT(t, 8.86, 101.6, 323) * Math.LN10;
      const slope = (lnA(T + h) - lnA(T - h)) / (1 / (T + h) - 1 / (T - h));
      expectRelClose(
        wlfApparentActivationEnergyKJPerMol(T, 8.86, 101.6, 323),
        (R * slope) / 1000,
        1e-6,
      ); // finite difference
    }
  });

  it('wlfApparentActivationEnergyKJPerMol() at Tg with the universal constants is about 2.303·R·17.44·Tg²/51.6', () => {
    // hand-computed for Tg = 373 K: 2.302585·8.314463 = 19.14482 ; ×17.44 = 333.886 ;
    // ×373² (139129) = 4.64532e7 ; /51.6 = 9.0025e5 J/mol = 900.25 kJ/mol
    expectAbsClose(wlfApparentActivationEnergyKJPerMol(373, 17.44, 51.6, 373), 900.25, 0.05); // hand rounding
  });
});

describe('wlfFreeVolume()', () => {
  // Ferry, Viscoelastic Properties of Polymers, 3rd ed. (1980), ch. 11: with the universal
  // constants f_g ≈ 0.025 and α_f ≈ 4.8e-4 /K (from memory).
  it('wlfFreeVolume() gives f_g ≈ 0.025 and α_f ≈ 4.8e-4 /K for the universal constants', () => {
    const v = wlfFreeVolume(17.44, 51.6);
    expectAbsClose(v.fractionalFreeVolume, 0.0249, 0.0001);
    expectRelClose(v.expansionPerK, 4.83e-4, 0.01);
  });

  it('wlfFreeVolume() rejects non-positive constants', () => {
    expect(() => wlfFreeVolume(-1, 50)).toThrow(/positive/);
  });
});
