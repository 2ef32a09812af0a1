import { describe, expect, it } from 'vitest';
import { buildSeries, localSlopes } from '../../../core/shift/series';
import { standardisedLocalResiduals } from '../../../core/shift/noise';
import { seededRandom } from '../../../core/synthetic';
import { expectAbsClose } from '../../helpers/assert-close';

describe('buildSeries()', () => {
  it('buildSeries() sorts, drops NaN and merges duplicate abscissae', () => {
    const s = buildSeries([2, 1, NaN, 1, 3], [20, 10, 5, 12, 30], [0, 1, 2, 3, 4], 40);
    expect(Array.from(s.lx)).toEqual([1, 2, 3]);
    expect(Array.from(s.y)).toEqual([11, 20, 30]);
    expect(Array.from(s.w)).toEqual([2, 1, 1]);
    expect(Array.from(s.pointIndex.subarray(s.binStart[0], s.binStart[1])).sort()).toEqual([1, 3]);
  });

  it('buildSeries() bins curves denser than maxPointsPerDecade, weighting bins by count', () => {
    const n = 1001; // 1000 points per decade over one decade
    const lx = Array.from({ length: n }, (_, i) => i / 1000);
    const s = buildSeries(
      lx,
      lx.map((x) => 2 * x),
      lx.map((_, i) => i),
      40,
    );
    expect(s.lx.length).toBeGreaterThan(38);
    expect(s.lx.length).toBeLessThan(43);
    expect(s.w.reduce((a, b) => a + b, 0)).toBe(n);
    s.lx.forEach((x, e) => expectAbsClose(s.y[e], 2 * x, 1e-12, 'bin mean on a line'));
  });

  it('buildSeries() bins a dense unsorted curve exactly like the same points sorted', () => {
    const rng = seededRandom(3);
    const n = 800; // 400 points per decade over two decades, shuffled (like noisy |G*|)
    const lx = Array.from({ length: n }, () => 2 * rng.uniform());
    const y = lx.map((x) => Math.sin(3 * x) + 0.01 * rng.normal());
    const idx = lx.map((_, i) => i);
    const order = [...idx].sort((a, b) => lx[a] - lx[b]);
    const shuffled = buildSeries(lx, y, idx, 40);
    const sorted = buildSeries(
      order.map((i) => lx[i]),
      order.map((i) => y[i]),
      order,
      40,
    );
    expect(Array.from(shuffled.w)).toEqual(Array.from(sorted.w));
    // Same points per bin, summed in another order: equal up to rounding.
    shuffled.lx.forEach((x, e) => {
      expectAbsClose(x, sorted.lx[e], 1e-12, `bin ${e} abscissa`);
      expectAbsClose(shuffled.y[e], sorted.y[e], 1e-12, `bin ${e} mean`);
      const a = Array.from(
        shuffled.pointIndex.subarray(shuffled.binStart[e], shuffled.binStart[e + 1]),
      );
      const b = Array.from(sorted.pointIndex.subarray(sorted.binStart[e], sorted.binStart[e + 1]));
      expect(a.sort((u, v) => u - v)).toEqual(b.sort((u, v) => u - v));
    });
  });

  it('buildSeries() handles empty and one-point curves', () => {
    expect(buildSeries([], [], [], 40).lx.length).toBe(0);
    expect(buildSeries([1], [2], [0], 40).lx.length).toBe(1);
  });
});

describe('localSlopes()', () => {
  it('localSlopes() on even spacing uses the Savitzky–Golay derivative weights (−2, −1, 0, 1, 2)/10', () => {
    // Savitzky & Golay, Anal. Chem. 36, 1627 (1964): 5-point quadratic, first derivative.
    const y = Float64Array.from([0.3, -1.2, 0.7, 2.5, 1.1]);
    const lx = Float64Array.from([0, 1, 2, 3, 4]);
    const expected = (-2 * y[0] - y[1] + y[3] + 2 * y[4]) / 10;
    expectAbsClose(localSlopes(lx, y)[2], expected, 1e-12, 'centre slope');
  });

  it('localSlopes() is exact on a quadratic, also at the ends and with uneven spacing', () => {
    const lx = Float64Array.from([0, 0.3, 0.5, 1.2, 1.3, 2]);
    const y = lx.map((x) => 1 + 2 * x - 0.5 * x * x);
    localSlopes(lx, y).forEach((s, i) => expectAbsClose(s, 2 - lx[i], 1e-9, `slope at ${lx[i]}`));
  });
});

describe('standardisedLocalResiduals()', () => {
  it('standardisedLocalResiduals() has unit variance for pure noise on a curved baseline', () => {
    // Leverage of the centre of a 5-point quadratic is 17/35 (Savitzky & Golay 1964 smoothing
    // weights (−3, 12, 17, 12, −3)/35); dividing by √(1 − h) restores the noise variance.
    const rng = seededRandom(3);
    const n = 4000;
    const lx = Float64Array.from({ length: n }, (_, i) => i * 0.05);
    const y = lx.map((x) => Math.sin(x) * 0.2 + 0.01 * rng.normal());
    const out: number[] = [];
    standardisedLocalResiduals(lx, y, out);
    const sd = Math.sqrt(out.reduce((a, b) => a + b * b, 0) / out.length);
    expectAbsClose(sd, 0.01, 0.0005, 'noise recovered');
  });
});

describe('standardisedLocalResiduals() on short curves', () => {
  it('standardisedLocalResiduals() uses a quadratic through all four points of a 4-point curve', () => {
    // A quadratic through four points leaves one degree of freedom: exact data gives 0.
    const lx = [0, 0.3, 0.7, 1];
    const out: number[] = [];
    standardisedLocalResiduals(
      lx,
      lx.map((x) => 1 + x - 2 * x * x),
      out,
    );
    expect(out).toHaveLength(2);
    out.forEach((r) => expectAbsClose(r, 0, 1e-12, 'exact quadratic'));
    const none: number[] = [];
    standardisedLocalResiduals([0, 1, 2], [1, 2, 3], none);
    expect(none).toEqual([]);
  });
});
