import { describe, expect, it } from 'vitest';
import { suggestShiftModel } from '../../../core/models/model-hint';
import { fitArrhenius } from '../../../core/models/fit-arrhenius';
import { fitPolynomial } from '../../../core/models/fit-polynomial';
import { fitWlf } from '../../../core/models/fit-wlf';
import { arrheniusLog10aT, wlfLog10aT } from '../../../core/models/shift-laws';
import { seededRandom } from '../../../core/synthetic';
import type { ShiftPoint } from '../../../core/models/types';
import { lawPoints } from '../../helpers/law-points';

function fitAll(pts: ShiftPoint[], referenceK: number) {
  return {
    wlf: fitWlf(pts, { referenceK }),
    arrhenius: fitArrhenius(pts, { referenceK }),
    polynomial: fitPolynomial(pts, { referenceK }),
  };
}

const K = 273.15;

describe('suggestShiftModel()', () => {
  it('suggestShiftModel() picks WLF for curved log aT near Tg', () => {
    const rng = seededRandom(1);
    const temps = [-10, 0, 10, 20, 30, 40, 50, 60].map((c) => c + K);
    const pts = lawPoints(
      temps,
      (T) => wlfLog10aT(T, 17.44, 51.6, -10 + K) - wlfLog10aT(20 + K, 17.44, 51.6, -10 + K),
      0.01,
      rng,
    );
    expect(suggestShiftModel(fitAll(pts, 20 + K)).recommended).toBe('wlf');
    const withTg = suggestShiftModel(fitAll(pts, 20 + K), -15 + K);
    expect(withTg.recommended).toBe('wlf');
    expect(withTg.reasons[0]).toMatch(/Tg/);
  });

  it('suggestShiftModel() picks Arrhenius for a melt far above Tg', () => {
    const rng = seededRandom(2);
    const temps = [150, 170, 190, 210, 230].map((c) => c + K);
    const pts = lawPoints(temps, (T) => arrheniusLog10aT(T, 30e3, 190 + K), 0.01, rng);
    const hint = suggestShiftModel(fitAll(pts, 190 + K));
    expect(hint.recommended).toBe('arrhenius');
    expect(suggestShiftModel(fitAll(pts, 190 + K), -100 + K).reasons.join(' ')).toMatch(
      /more than 100 K above Tg/,
    );
    expect(Object.keys(hint.aicc).sort()).toEqual(['arrhenius', 'polynomial', 'wlf']);
  });

  it('suggestShiftModel() avoids WLF when isotherms lie below Tg', () => {
    const rng = seededRandom(3);
    const temps = [-40, -30, -20, -10, 0].map((c) => c + K);
    const pts = lawPoints(temps, (T) => arrheniusLog10aT(T, 80e3, -20 + K), 0.01, rng);
    const hint = suggestShiftModel(fitAll(pts, -20 + K), -10 + K);
    expect(hint.recommended).toBe('arrhenius');
    expect(hint.reasons[0]).toMatch(/below Tg/);
  });

  it('suggestShiftModel() falls back to the polynomial only when log aT bends the wrong way for both laws', () => {
    // WLF and Arrhenius are both convex in T (d² log aT/dT² > 0); a concave curve fits neither
    const rng = seededRandom(6);
    const pts = [-30, -20, -10, 10, 20, 30].map((d) => ({
      temperatureK: 300 + d,
      log10aT: -0.1 * d - 0.002 * d * d + 0.005 * rng.normal(),
      stdErr: 0.005,
    }));
    const hint = suggestShiftModel(fitAll(pts, 300));
    expect(hint.recommended).toBe('polynomial');
    expect(hint.reasons.join(' ')).toMatch(/Do not extrapolate/);
  });
});
