import { describe, expect, it } from 'vitest';
import { stableOrder } from '../../../core/pipeline/stable-order';

/** The general stable sort the run merge replaces. */
const reference = (xs: ArrayLike<number>): number[] =>
  Array.from({ length: xs.length }, (_, i) => i).sort((a, b) => xs[a] - xs[b] || a - b);

/** Seeded linear congruential numbers in [0, 1) (Numerical Recipes constants, from memory). */
function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296;
  };
}

describe('stableOrder()', () => {
  it('stableOrder() matches the stable comparison sort on sweeps, ties and random values', () => {
    const rand = lcg(7);
    const cases: number[][] = [[], [3], [2, 1], [1, 1, 1], [3, 2, 2, 1, 5, 5, 4]];
    // isotherms as sweeps: descending, ascending, with repeated frequencies and shared grids
    for (let t = 0; t < 20; t++) {
      const xs: number[] = [];
      const curves = 1 + Math.floor(rand() * 30);
      for (let c = 0; c < curves; c++) {
        const shift = Math.floor(rand() * 5) / 2;
        const m = 1 + Math.floor(rand() * 40);
        const down = rand() < 0.5;
        for (let i = 0; i < m; i++) {
          const k = down ? m - i : i;
          xs.push(rand() < 0.1 ? Math.floor(rand() * 4) : k / 4 + shift);
        }
      }
      cases.push(xs);
    }
    for (let t = 0; t < 5; t++) cases.push(Array.from({ length: 500 }, () => rand()));
    for (const xs of cases) expect([...stableOrder(Float64Array.from(xs))]).toEqual(reference(xs));
  });

  it('stableOrder() falls back to the comparison sort when a value is NaN', () => {
    // NaN makes the comparison inconsistent: the former code's own sort (of a Uint32Array)
    const xs = Float64Array.from([3, NaN, 1, 2, NaN, 0]);
    const former = Uint32Array.from(xs, (_, i) => i).sort((a, b) => xs[a] - xs[b] || a - b);
    expect([...stableOrder(xs)]).toEqual([...former]);
  });
});
