import { describe, expect, it } from 'vitest';
import { scanPair } from '../../../core/shift/scan';
import { syntheticIsotherms } from '../../../core/synthetic';
import { expectAbsClose } from '../../helpers/assert-close';
import { horizontalProblem, MELT_WLF_PB } from './fixtures';

describe('scanPair()', () => {
  const { dataset, truth } = syntheticIsotherms({
    ...MELT_WLF_PB.options,
    relativeNoise: 0,
    seed: 1,
  });
  const p = horizontalProblem(dataset);
  const settings = { step: 0.05, directionAllowance: 0.5, maxOffset: Infinity };

  it('scanPair() finds the offset of neighbouring noise-free isotherms within the fine step', () => {
    for (const [u, v] of [
      [5, 6],
      [5, 4],
      [0, 1],
    ]) {
      const r = scanPair(p, u, v, Math.sign(v - u), settings)!;
      expectAbsClose(r.dh, truth.log10aT[v] - truth.log10aT[u], 0.01, `pair ${u}→${v}`);
    }
  });

  it('scanPair() refines below the grid: noise-free neighbours within a fiftieth of its finest step', () => {
    // Chained over hundreds of closely spaced isotherms, grid rounding would add up.
    for (const [u, v] of [
      [5, 6],
      [5, 4],
    ]) {
      const r = scanPair(p, u, v, Math.sign(v - u), settings)!;
      expectAbsClose(r.dh, truth.log10aT[v] - truth.log10aT[u], 0.0001, `pair ${u}→${v}`);
    }
  });

  it('scanPair() respects the direction prior (aT falls with temperature)', () => {
    // Told that curve 5 is the hotter one (it is colder), with no allowance, the scan may not go
    // beyond dh = 0 although the true offset is positive.
    const r = scanPair(p, 6, 5, 1, { ...settings, directionAllowance: 0 })!;
    expect(r.dh).toBeLessThanOrEqual(1e-12);
  });
});
