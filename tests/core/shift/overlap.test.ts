import { describe, expect, it } from 'vitest';
import { NO_OVERLAP_PENALTY, overlapMismatch, prepareOverlap } from '../../../core/shift';
import { shiftLawLog10aT } from '../../../core/synthetic';
import { make, MELT_WLF_PB, WLF_POLYBUTADIENE } from './fixtures';
import { expectAbsClose } from '../../helpers/assert-close';

describe('overlapMismatch()', () => {
  const { dataset, truth } = make(MELT_WLF_PB, 0.02, 4);
  const prepared = prepareOverlap(dataset, { referenceK: 298 });

  it('overlapMismatch() is smallest near the true shifts and grows away from them', () => {
    const at = overlapMismatch(prepared, truth.log10aT);
    expect(at).toBeGreaterThan(0);
    for (const d of [0.05, -0.05, 0.2])
      expect(
        overlapMismatch(
          prepared,
          truth.log10aT.map((v, k) => v + d * (k - 5)),
        ),
      ).toBeGreaterThan(at);
  });

  it('overlapMismatch() lets a WLF C1 be fitted directly to the data (grid over C1, C2 fixed)', () => {
    // Polybutadiene constants C1 = 3.44, C2 = 196.6 K at 298 K (Mark, Physical Properties of
    // Polymers Handbook) generated the data; scanning C1 should find it within 2 %.
    let best = { c1: 0, m: Infinity };
    for (let c1 = 2.5; c1 <= 4.5; c1 += 0.01) {
      const law = { ...WLF_POLYBUTADIENE, c1 } as const;
      const m = overlapMismatch(
        prepared,
        prepared.temperaturesK.map((T) => shiftLawLog10aT(law, T, 298)),
      );
      if (m < best.m) best = { c1, m };
    }
    expectAbsClose(best.c1, 3.44, 0.07, 'C1');
  });

  it('overlapMismatch() penalises shifts that push an isotherm out of every overlap', () => {
    const apart = truth.log10aT.map((v, k) => (k === 10 ? v - 20 : v));
    expect(overlapMismatch(prepared, apart)).toBeGreaterThanOrEqual(NO_OVERLAP_PENALTY);
  });

  it('overlapMismatch() throws on a wrong number of shifts', () => {
    expect(() => overlapMismatch(prepared, [0, 1])).toThrow(/11 log10aT/);
  });
});
