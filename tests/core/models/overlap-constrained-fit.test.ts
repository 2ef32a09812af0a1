import { describe, expect, it } from 'vitest';
import { fitModelToOverlap } from '../../../core/models/overlap-constrained-fit';
import { arrheniusLog10aT, wlfLog10aT } from '../../../core/models/shift-laws';
import { overlapMismatch, prepareOverlap } from '../../../core/shift';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';
import {
  INVENTED_REFERENCE_K,
  inventedWlfIsotherms,
  inventedWlfProny,
} from '../../helpers/invented-wlf-material';

describe('fitModelToOverlap()', () => {
  it('fitModelToOverlap() recovers WLF constants from a quadratic objective around known shifts', () => {
    const T = [280, 290, 300, 310, 320, 330];
    const target = T.map((t) => wlfLog10aT(t, 9, 90, 300));
    const r = fitModelToOverlap(
      {
        temperaturesK: T,
        referenceK: 300,
        mismatch: (a) => a.reduce((s, v, k) => s + (v - target[k]) ** 2, 0),
      },
      { kind: 'wlf', initial: [14, 140] },
    );
    expect(r.converged).toBe(true);
    expectRelClose(r.values[0], 9, 1e-4, 'C1'); // simplex tolerance
    expectRelClose(r.values[1], 90, 1e-4, 'C2');
    expect(r.mismatch).toBeLessThan(r.initialMismatch);
  });

  it('fitModelToOverlap() recovers Ea from a quadratic objective', () => {
    const T = [420, 440, 460, 480];
    const target = T.map((t) => arrheniusLog10aT(t, 52e3, 450));
    const r = fitModelToOverlap(
      {
        temperaturesK: T,
        referenceK: 450,
        mismatch: (a) => a.reduce((s, v, k) => s + (v - target[k]) ** 2, 0),
      },
      { kind: 'arrhenius', initial: [30] },
    );
    expectRelClose(r.values[0], 52, 1e-5, 'Ea');
  });

  // End to end with the shift engine's overlap objective on invented isotherms (1 % noise, WLF
  // C1 = 9, C2 = 100 K at 30 °C): the law's shifts land within 0.03 decades of the truth and the
  // mismatch at the fit is no worse than at the true constants (measured max deviation 0.002 decades).
  it('fitModelToOverlap() with the shift engine objective follows the true WLF shifts', () => {
    const refK = INVENTED_REFERENCE_K;
    const { dataset } = inventedWlfIsotherms(
      inventedWlfProny(),
      [273.15, 283.15, 293.15, 303.15, 313.15, 323.15, 333.15],
      8,
      0.01,
      3,
    );
    const prepared = prepareOverlap(dataset, { referenceK: refK, vertical: 'none' });
    const objective = {
      temperaturesK: prepared.temperaturesK,
      referenceK: prepared.referenceK,
      mismatch: (a: number[]) => overlapMismatch(prepared, a),
    };
    const r = fitModelToOverlap(objective, { kind: 'wlf', initial: [12, 130] });
    expect(r.converged).toBe(true);
    // measured: C1 8.978, C2 99.81 K (0.2 % off); 2 % allows for other noise draws
    expectRelClose(r.values[0], 9, 0.02, 'C1');
    expectRelClose(r.values[1], 100, 0.02, 'C2');
    prepared.temperaturesK.forEach((T, k) =>
      expectAbsClose(r.log10aT[k], wlfLog10aT(T, 9, 100, refK), 0.03, `log10 aT at ${T} K`),
    );
    const atTruth = objective.mismatch(
      prepared.temperaturesK.map((T) => wlfLog10aT(T, 9, 100, refK)),
    );
    expect(r.mismatch).toBeLessThanOrEqual(atTruth * (1 + 1e-9));
  });

  it('fitModelToOverlap() rejects wrong calls', () => {
    const o = { temperaturesK: [280, 300], referenceK: 300, mismatch: () => 0 };
    expect(() => fitModelToOverlap(o, { kind: 'wlf', initial: [9] })).toThrow(
      /initial must hold 2/,
    );
    expect(() => fitModelToOverlap(o, { kind: 'wlf', initial: [9, 10] })).toThrow(/initial C2/);
    expect(() =>
      fitModelToOverlap({ ...o, temperaturesK: [300] }, { kind: 'arrhenius', initial: [50] }),
    ).toThrow(/two isotherms/);
  });
});
