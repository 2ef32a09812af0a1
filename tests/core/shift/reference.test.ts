import { describe, expect, it } from 'vitest';
import { referenceWeights } from '../../../core/shift/reference';
import { wlfLog10aT } from '../../../core/models/shift-laws';
import { expectAbsClose } from '../../helpers/assert-close';

describe('referenceWeights()', () => {
  const temps = [280, 290, 300, 310, 320];
  const all = [0, 1, 2, 3, 4];

  it('referenceWeights() uses a measured isotherm directly', () => {
    const r = referenceWeights(all, temps, 300.005);
    expect(r.kind).toBe('measured');
    expect([...r.coef]).toEqual([[2, 1]]);
  });

  it('referenceWeights() interpolates a quadratic exactly between measured temperatures', () => {
    // Lagrange interpolation through three nodes reproduces any quadratic (analytic result).
    const q = (T: number) => 0.002 * (T - 290) ** 2 - 0.1 * T + 3;
    const r = referenceWeights(all, temps, 296);
    expect(r.kind).toBe('interpolated');
    let v = 0;
    r.coef.forEach((c, k) => (v += c * q(temps[k])));
    expectAbsClose(v, q(296), 1e-12, 'quadratic at 296 K');
  });

  it('referenceWeights() follows a WLF curve between isotherms 10 K apart far better than a straight line', () => {
    // WLF universal constants (Williams, Landel & Ferry 1955) referenced at 300 K: strongly curved.
    const law = (T: number) => wlfLog10aT(T, 8.86, 101.6, 300);
    const r = referenceWeights(all, temps, 305);
    let v = 0;
    r.coef.forEach((c, k) => (v += c * law(temps[k])));
    const linear = (law(300) + law(310)) / 2;
    // The straight line is off by 0.010 decades here; the quadratic by 0.003.
    expectAbsClose(v, law(305), 0.004, 'WLF at 305 K');
    expect(Math.abs(linear - law(305))).toBeGreaterThan(3 * Math.abs(v - law(305)));
  });

  it('referenceWeights() extrapolates linearly outside the range and says so', () => {
    const r = referenceWeights(all, temps, 270);
    expect(r.kind).toBe('extrapolated');
    expect([...r.coef.keys()].sort()).toEqual([0, 1]);
    expectAbsClose(r.coef.get(0)!, 2, 1e-12, 'weight of 280 K');
    expectAbsClose(r.coef.get(1)!, -1, 1e-12, 'weight of 290 K');
  });

  it('referenceWeights() with one temperature reports it as single', () => {
    expect(referenceWeights([0], [300], 310).kind).toBe('single');
    expect(referenceWeights([0, 1], [300, 300], 310).kind).toBe('single');
  });
});
