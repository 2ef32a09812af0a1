import { describe, expect, it } from 'vitest';
import { fitArrhenius } from '../../../core/models/fit-arrhenius';
import { fitPolynomial } from '../../../core/models/fit-polynomial';
import { fitWlf } from '../../../core/models/fit-wlf';
import { shiftModelBand } from '../../../core/models/shift-model-band';
import { arrheniusLog10aT, wlfLog10aT } from '../../../core/models/shift-laws';
import type { ShiftFitCommon, ShiftFitOptions, ShiftPoint } from '../../../core/models/types';
import { seededRandom } from '../../../core/synthetic';
import { pairShifts } from '../../helpers/pair-shifts';

const K = 273.15;
const T10 = [0, 10, 20, 30, 40, 50, 60, 70, 80, 90].map((c) => c + K);
const T7 = [150, 160, 170, 180, 190, 200, 210].map((c) => c + K);

/**
 * Pointwise coverage of the 95 % band of log10 aT over `sets` seeded data sets drawn from a known
 * covariance (tests/helpers/pair-shifts.ts: pair comparisons of 0.01 decades solved under the
 * reference condition, as the shift engine does), with (GLS) and without (diagonal) the
 * covariance. The reference temperature itself is left out: there the band is 0 and exact.
 */
function coverage(
  temps: number[],
  referenceK: number,
  law: (T: number) => number,
  fit: (p: ShiftPoint[], o: ShiftFitOptions) => ShiftFitCommon,
  sets: number,
): { gls: number; diagonal: number; converged: number } {
  const f = pairShifts({ temperaturesK: temps, referenceK, pairNoiseDecades: 0.01 });
  const away = temps.filter((T) => Math.abs(T - referenceK) > 1e-9);
  let gls = 0;
  let diagonal = 0;
  let converged = 0;
  for (let s = 1; s <= sets; s++) {
    const pts = f.draw(law, seededRandom(1000 + s));
    for (const withCov of [true, false]) {
      const r = fit(pts, { referenceK, ...(withCov && { covariance: f.covariance }) });
      if (withCov) {
        expect(r.weighting.kind).toBe('full-covariance');
        if (r.converged) converged++;
      }
      for (const b of shiftModelBand(r, away)) {
        const truth = law(b.temperatureK);
        if (truth < b.lower95 || truth > b.upper95) continue;
        if (withCov) gls++;
        else diagonal++;
      }
    }
  }
  const n = sets * away.length;
  return { gls: gls / n, diagonal: diagonal / n, converged: converged / sets };
}

// Acceptance (docs/conventions.md §7): the 95 % band of the GLS fit covers the truth 90–98 % of the
// time over ≥ 500 seeded sets. The binomial sd of a 95 % rate over 500 sets × 6–9 temperatures is
// about 0.3 %, but the temperatures of one set are strongly correlated, so the effective count is
// nearer the 500 sets (sd ≈ 1 %): 90–98 % is three or more sd either side. Measured (these
// seeds): WLF 94.6 % (reference measured) and 94.6 % (reference between isotherms), Arrhenius
// 95.1 % / 95.1 %, polynomial 95.8 %; the diagonal (old) weighting covers only 70–78 %.
describe('generalised least squares on correlated shift factors', () => {
  it('fitWlf() with the shift covariance: the 95 % band covers the true WLF law 90–98 % of the time (500 sets, reference isotherm measured)', () => {
    const law = (T: number) => wlfLog10aT(T, 8.86, 101.6, 50 + K);
    const c = coverage(T10, 50 + K, law, fitWlf, 500);
    expect(c.converged).toBe(1);
    expect(c.gls).toBeGreaterThanOrEqual(0.9);
    expect(c.gls).toBeLessThanOrEqual(0.98);
    // weighting each shift by its own error ignores the shared reference noise: the band is too narrow
    expect(c.diagonal).toBeLessThan(c.gls - 0.1);
  });

  it('fitWlf() with the shift covariance: 90–98 % coverage when Tref lies between isotherms (singular covariance, 500 sets)', () => {
    const law = (T: number) => wlfLog10aT(T, 8.86, 101.6, 55 + K);
    const c = coverage(T10, 55 + K, law, fitWlf, 500);
    expect(c.converged).toBe(1);
    expect(c.gls).toBeGreaterThanOrEqual(0.9);
    expect(c.gls).toBeLessThanOrEqual(0.98);
  });

  it('fitArrhenius() and fitPolynomial() with the shift covariance cover their true laws 90–98 % of the time (500 sets each)', () => {
    for (const [Tr, fit, law] of [
      [190 + K, fitArrhenius, (T: number) => arrheniusLog10aT(T, 45e3, 190 + K)],
      [185 + K, fitArrhenius, (T: number) => arrheniusLog10aT(T, 45e3, 185 + K)],
      [180 + K, fitPolynomial, (T: number) => -0.01 * (T - 180 - K) + 1e-4 * (T - 180 - K) ** 2],
    ] as const) {
      const c = coverage(T7, Tr, law, fit, 500);
      expect(c.gls, `${fit.name} at Tref ${Tr} K`).toBeGreaterThanOrEqual(0.9);
      expect(c.gls, `${fit.name} at Tref ${Tr} K`).toBeLessThanOrEqual(0.98);
      expect(c.diagonal).toBeLessThan(c.gls);
    }
  });
});
