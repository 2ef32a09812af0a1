import { describe, expect, it } from 'vitest';
import { rereferenceWlf, rereferenceWlfFit } from '../../../core/models/wlf-rereference';
import { fitWlf } from '../../../core/models/fit-wlf';
import { wlfLog10aT } from '../../../core/models/shift-laws';
import { seededRandom } from '../../../core/synthetic';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';
import { lawPoints } from '../../helpers/law-points';

describe('rereferenceWlf()', () => {
  // Williams, Landel & Ferry, J. Am. Chem. Soc. 77, 3701 (1955): 'universal' constants
  // C1 = 17.44, C2 = 51.6 K at Tg become about 8.86 and 101.6 K at Tg + 50 K.
  it('rereferenceWlf() moves the universal constants from Tg to Tg + 50 K', () => {
    const r = rereferenceWlf(17.44, 51.6, 200, 250);
    expectAbsClose(r.c1, 8.86, 0.005, 'C1 at Tg+50'); // published to 3 significant figures
    expectAbsClose(r.c2K, 101.6, 1e-12, 'C2 at Tg+50');
    expect(r.referenceK).toBe(250);
  });

  // Physical Properties of Polymers Handbook (J. E. Mark ed.): polybutadiene 96 % cis,
  // T0 = 298 K, C1 = 3.44, C2 = 196.6 K, Tg = 161 K. Moving to Tg: C2g = 59.6 K,
  // C1g = 3.44·196.6/59.6 = 11.35 (hand-computed).
  it('rereferenceWlf() moves the handbook polybutadiene constants to Tg as computed by hand', () => {
    const g = rereferenceWlf(3.44, 196.6, 298, 161);
    expectAbsClose(g.c2K, 59.6, 1e-9);
    expectAbsClose(g.c1, 11.347, 0.001);
  });

  it('rereferenceWlf() leaves the curve unchanged apart from its zero', () => {
    const r = rereferenceWlf(3.44, 196.6, 298, 250);
    for (const T of [200, 260, 330]) {
      expectAbsClose(
        wlfLog10aT(T, r.c1, r.c2K, 250),
        wlfLog10aT(T, 3.44, 196.6, 298) - wlfLog10aT(250, 3.44, 196.6, 298),
        1e-12,
      );
    }
  });

  it('rereferenceWlf() refuses a reference at or below the WLF pole', () => {
    expect(() => rereferenceWlf(17.44, 51.6, 200, 148.4)).toThrow(/pole/);
  });
});

describe('rereferenceWlfFit()', () => {
  it('rereferenceWlfFit() carries the covariance so the band at any T is unchanged relative to the new zero', () => {
    const rng = seededRandom(5);
    const pts = lawPoints(
      [280, 290, 300, 310, 320, 330, 340],
      (T) => wlfLog10aT(T, 9, 100, 300),
      0.01,
      rng,
    );
    const f = fitWlf(pts, { referenceK: 300, glassTransitionK: 260 });
    const g = rereferenceWlfFit(f, 260);
    expectRelClose(g.c1, rereferenceWlf(f.c1, f.c2K, 300, 260).c1, 1e-12);
    // Monte-Carlo-free check: the linear map's variance of C2' equals var(C2) (∂C2'/∂C2 = 1)
    expectRelClose(g.c2StdErr, f.parameters[1].stdErr, 1e-12);
    expect(g.c1Ci95[0]).toBeLessThan(g.c1);
    expect(g.c1Ci95[1]).toBeGreaterThan(g.c1);
  });
});
