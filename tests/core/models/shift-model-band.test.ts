import { describe, expect, it } from 'vitest';
import { shiftModelBand } from '../../../core/models/shift-model-band';
import { fitArrhenius } from '../../../core/models/fit-arrhenius';
import { fitWlf } from '../../../core/models/fit-wlf';
import { arrheniusLog10aT, wlfLog10aT } from '../../../core/models/shift-laws';
import { seededRandom } from '../../../core/synthetic';
import { expectAbsClose } from '../../helpers/assert-close';
import { lawPoints } from '../../helpers/law-points';

describe('shiftModelBand()', () => {
  it('shiftModelBand() for Arrhenius is t·SE(Ea)·|∂log10aT/∂Ea| (one parameter, analytic)', () => {
    const rng = seededRandom(2);
    const pts = lawPoints(
      [400, 420, 440, 460, 480],
      (T) => arrheniusLog10aT(T, 40e3, 440),
      0.01,
      rng,
    );
    const f = fitArrhenius(pts, { referenceK: 440 });
    const [b] = shiftModelBand(f, [480]);
    const slope = arrheniusLog10aT(480, 1000, 440);
    expectAbsClose(
      b.upper95 - b.log10aT,
      f.tQuantile95 * f.parameters[0].stdErr * Math.abs(slope),
      1e-12,
    );
  });

  it('shiftModelBand() for WLF is zero at Tr and narrower than propagating C1, C2 as if independent', () => {
    const rng = seededRandom(4);
    const pts = lawPoints(
      [280, 290, 300, 310, 320, 330, 340],
      (T) => wlfLog10aT(T, 9, 100, 300),
      0.015,
      rng,
    );
    const f = fitWlf(pts, { referenceK: 300 });
    const [atRef, cold] = shiftModelBand(f, [300, 280]);
    expect(atRef.stdErr).toBe(0);
    const d = 280 - 300;
    const g = [-d / (f.c2K + d), (f.c1 * d) / (f.c2K + d) ** 2];
    const independent = Math.sqrt(g[0] ** 2 * f.covariance[0][0] + g[1] ** 2 * f.covariance[1][1]);
    expect(cold.stdErr).toBeLessThan(independent);
    expect(cold.stdErr).toBeGreaterThan(0);
  });

  it('shiftModelBand() without covariance returns the curve with NaN errors', () => {
    const [b] = shiftModelBand({ kind: 'wlf', referenceK: 300, values: [9, 100] }, [320]);
    expectAbsClose(b.log10aT, wlfLog10aT(320, 9, 100, 300), 1e-12);
    expect(Number.isNaN(b.stdErr)).toBe(true);
    expect(b.lower95).toBe(b.log10aT);
  });
});
