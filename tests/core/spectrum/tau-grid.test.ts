import { describe, expect, it } from 'vitest';
import { relaxationTimeGrid } from '../../../core/spectrum/tau-grid';
import { expectRelClose } from '../../helpers/assert-close';

describe('relaxationTimeGrid()', () => {
  it('relaxationTimeGrid() spans 1/ωmax … 1/ωmin for dynamic data, n per decade', () => {
    const g = relaxationTimeGrid({ abscissa: 'angularFrequency', min: 0.01, max: 100 }, 2);
    expect(g).toHaveLength(9);
    expectRelClose(g[0], 0.01, 1e-12);
    expectRelClose(g[8], 100, 1e-12);
    expectRelClose(g[1] / g[0], Math.sqrt(10), 1e-12);
  });

  it('relaxationTimeGrid() spans tmin … tmax for relaxation data and widens with extendDecades', () => {
    const g = relaxationTimeGrid({ abscissa: 'time', min: 1, max: 1000 }, 1, 1);
    expect(g).toHaveLength(6);
    expectRelClose(g[0], 0.1, 1e-12);
    expectRelClose(g[5], 1e4, 1e-12);
  });

  it('relaxationTimeGrid() gives one mode for a single-point window and rejects bad input', () => {
    expect(relaxationTimeGrid({ abscissa: 'time', min: 2, max: 2 }, 1)).toEqual([2]);
    expect(() => relaxationTimeGrid({ abscissa: 'time', min: 0, max: 2 }, 1)).toThrow(/window/);
    expect(() => relaxationTimeGrid({ abscissa: 'time', min: 1, max: 2 }, 0)).toThrow(
      /modesPerDecade/,
    );
  });
});
