import { describe, expect, it } from 'vitest';
import type { Dataset } from '../../../core/data/types';
import { candidatePairs, NEIGHBOUR_POSITIONS } from '../../../core/shift/pairs';
import { startingOffsets } from '../../../core/shift/start';
import { horizontalProblem as problem } from './fixtures';

/** Isotherms of G′ = G″ = level·ω^0.5 at the given temperatures (invented, noise-free). */
function powerLaw(levels: number[], temperaturesK: number[]): Dataset {
  const x = [0.1, 0.3, 1, 3, 10, 30, 100];
  return {
    name: 'invented power law',
    testKind: 'oscillatory',
    deformation: 'shear',
    abscissa: 'angularFrequency',
    isotherms: levels.map((level, k) => {
      const g = x.map((w) => level * Math.sqrt(w));
      return {
        id: `T${k + 1}`,
        temperatureK: temperaturesK[k],
        temperatureSpreadK: 0,
        x,
        quantities: { storageModulus: g, lossModulus: g },
        mask: x.map(() => true),
        source: x.map((_, i) => ({ file: 'p.csv', row: 2 + 7 * k + i })),
      };
    }),
    files: ['p.csv'],
    metadata: {},
  };
}

const pairList = (pairs: Int32Array) =>
  Array.from({ length: pairs.length / 2 }, (_, q) => [pairs[2 * q], pairs[2 * q + 1]]);

describe('candidatePairs()', () => {
  it('candidatePairs() pairs isotherms at most ten positions apart in temperature, in any order', () => {
    // 30 isotherms that all overlap, listed out of temperature order.
    const temps = Array.from({ length: 30 }, (_, k) => 400 + ((7 * k) % 30));
    const p = problem(
      powerLaw(
        temps.map(() => 1e4),
        temps,
      ),
    );
    const rank = (k: number) => temps[k] - 400;
    const pairs = pairList(candidatePairs(p));
    expect(pairs.every(([i, j]) => Math.abs(rank(i) - rank(j)) <= NEIGHBOUR_POSITIONS)).toBe(true);
    // Every pair within ten positions is there: 30·10 − 10·11/2.
    expect(pairs).toHaveLength(30 * 10 - 55);
    expect(pairs.every(([i, j]) => i < j)).toBe(true);
  });

  it('candidatePairs() pairs an isotherm that overlaps none of its neighbours with the nearest one further out', () => {
    // Level 1e4 at ranks 1–11, 1e8 at ranks 0 and 12: rank 0 overlaps only rank 12.
    const levels = Array.from({ length: 20 }, (_, k) => (k === 0 || k === 12 ? 1e8 : 1e4));
    const temps = levels.map((_, k) => 400 + k);
    const pairs = pairList(candidatePairs(problem(powerLaw(levels, temps))));
    expect(pairs.filter(([i, j]) => i === 0 || j === 0)).toEqual([[0, 12]]);
  });
});

describe('startingOffsets()', () => {
  it('startingOffsets() places every isotherm reached from the known one, nearest in temperature first', () => {
    // aT·ω superposes exactly: G(ω) = level·(aT ω)^0.5 with level fixed, so the scan finds aT.
    const temps = Array.from({ length: 40 }, (_, k) => 400 + 0.5 * k);
    const log10aT = temps.map((t) => -0.02 * (t - 400));
    const d = powerLaw(
      temps.map(() => 1e4),
      temps,
    );
    d.isotherms.forEach((iso, k) => {
      const g = iso.x.map((w) => 1e4 * Math.sqrt(10 ** log10aT[k] * w));
      iso.quantities = { storageModulus: g, lossModulus: g.map((v) => v * 1.5) };
    });
    const p = problem(d);
    const out = startingOffsets(p, temps, new Map([[0, 0]]), new Map(), {
      step: 0.05,
      directionAllowance: 0.5,
      maxOffset: Infinity,
    });
    expect([...out.placed].every((v) => v === 1)).toBe(true);
    // A power law is a straight line in log–log: the mean absolute mismatch is V-shaped and the
    // parabola through three grid points does not sit on its tip, so within half the finest step.
    out.theta.forEach((v, k) => expect(Math.abs(v - log10aT[k])).toBeLessThan(0.0025 * k + 1e-12));
  });
});
