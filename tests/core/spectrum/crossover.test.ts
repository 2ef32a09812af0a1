import { describe, expect, it } from 'vitest';
import { findCrossovers } from '../../../core/spectrum/crossover';
import { pronyLoss, pronyStorage } from '../../../core/spectrum/prony-model';
import { expectRelClose } from '../../helpers/assert-close';

describe('findCrossovers()', () => {
  // One Maxwell element crosses at ωτ = 1 with G' = G'' = g/2 (analytic, Ferry 1980, ch. 3).
  it('findCrossovers() finds the Maxwell crossover at ω = 1/τ, G = g/2', () => {
    const m = { equilibriumModulusPa: 0, tauS: [0.25], modulusPa: [1e5] };
    const w = Array.from({ length: 401 }, (_, i) => 10 ** (-2 + i * 0.01));
    const { crossovers } = findCrossovers(
      w,
      w.map((v) => pronyStorage(m, v)),
      w.map((v) => pronyLoss(m, v)),
    );
    expect(crossovers).toHaveLength(1);
    expectRelClose(crossovers[0].omegaRadPerS, 4, 1e-4, 'ωc'); // log-log interpolation on a 0.01-decade grid
    expectRelClose(crossovers[0].modulusPa, 5e4, 1e-4, 'Gc');
    expect(crossovers[0].direction).toBe('storage-rises');
  });

  it('findCrossovers() returns none when G′ stays above G″ and several when they weave', () => {
    expect(findCrossovers([1, 2, 3], [10, 10, 10], [1, 2, 3]).crossovers).toEqual([]);
    const many = findCrossovers([1, 10, 100, 1000], [1, 3, 1, 3], [2, 2, 2, 2]).crossovers;
    expect(many.map((c) => c.direction)).toEqual(['storage-rises', 'loss-rises', 'storage-rises']);
  });

  it('findCrossovers() sorts unsorted input, skips bad points with a warning, handles empty input', () => {
    const r = findCrossovers([100, 1, NaN, 10], [4, 1, 5, 2], [2, 2, 1, 2]);
    expect(r.warnings.map((w) => w.pointIndex)).toEqual([2]);
    expect(r.crossovers.map((c) => c.omegaRadPerS)).toEqual([10]);
    expect(findCrossovers([], [], []).crossovers).toEqual([]);
    expect(() => findCrossovers([1], [1, 2], [1])).toThrow(/same length/);
  });
});
