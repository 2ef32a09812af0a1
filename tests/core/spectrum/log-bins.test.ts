import { describe, expect, it } from 'vitest';
import { densestRun, logBins } from '../../../core/spectrum/log-bins';
import { seededRandom } from '../../../core/synthetic';
import { expectAbsClose } from '../../helpers/assert-close';

describe('logBins()', () => {
  it('logBins() gives a power law back exactly: the bin line removes the slope across the bin', () => {
    // y = 3·x², 100 points a decade: the bin mean of log y at the bin mean of log x lies on the line
    const x = Array.from({ length: 401 }, (_, i) => 10 ** (-2 + i / 100));
    const b = logBins(x, [x.map((v) => 3 * v * v)], 10);
    expect(b.index.length).toBe(41);
    b.log10x.forEach((lx, j) =>
      expectAbsClose(b.quantities[0].log10y[j], Math.log10(3) + 2 * lx, 1e-12, 'exact'),
    );
  });

  it('logBins() standard errors shrink as 1/√n and the pooled scatter finds the noise', () => {
    const rng = seededRandom(3);
    const sd = 0.01; // decades
    const x = Array.from({ length: 20000 }, () => 10 ** (4 * rng.uniform()));
    const y = x.map((v) => v ** 0.5 * 10 ** (sd * rng.normal()));
    const b = logBins(x, [y], 20);
    expectAbsClose(b.pointScatter[0], sd, 0.0005, '20 000 points: a few % of the noise');
    const q = b.quantities[0];
    for (let j = 0; j < q.count.length; j++)
      expectAbsClose(q.stdErr[j] * Math.sqrt(q.count[j]), sd, 0.003, 'per-bin, shrunk to the pool');
  });

  it('logBins() skips non-positive and non-finite values and keeps the quantities apart', () => {
    const b = logBins(
      [1, 2, -1, 3, NaN],
      [
        [1, 2, 3, NaN, 5],
        [1, -2, 3, 4, 5],
      ],
      10,
    );
    expect(Array.from(b.quantities[0].count).reduce((s, v) => s + v, 0)).toBe(2);
    expect(Array.from(b.quantities[1].count).reduce((s, v) => s + v, 0)).toBe(2);
    expect(() => logBins([1], [[1, 2]], 10)).toThrow(/match x/);
    expect(() => logBins([1], [[1]], 0)).toThrow(/binsPerDecade/);
  });

  it('logBins() falls back to second differences for the scatter when no bin has three points', () => {
    const rng = seededRandom(9);
    const x = Array.from({ length: 400 }, (_, i) => 10 ** (i / 100)); // one point per 1/100 decade
    const y = x.map((v) => v * 10 ** (0.02 * rng.normal()));
    const b = logBins(x, [y], 100);
    expectAbsClose(b.pointScatter[0], 0.02, 0.004, 'robust estimate from 400 points');
  });
});

describe('densestRun()', () => {
  it('densestRun() keeps the stretch holding most points and counts the far ones out', () => {
    const x = [1e-300, ...Array.from({ length: 100 }, (_, i) => 10 ** (i / 50)), 1e12];
    const b = logBins(x, [x.map(() => 1)], 20);
    const r = densestRun(b);
    expect(r.outside).toBe(2);
    expectAbsClose(b.log10x[r.first], 0, 0.05);
    expectAbsClose(b.log10x[r.last], 1.98, 0.05);
  });
});
