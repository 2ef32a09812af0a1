import { describe, it, expect } from 'vitest';
import { bandIndex, groupTemperatures } from '../../../core/io/grouping';

const c = (t: number) => t + 273.15;

describe('groupTemperatures()', () => {
  it('groupTemperatures() keeps wandering readings of one set point together', () => {
    const bands = groupTemperatures([39.8, 40.1, 40.3, 59.9, 60.2].map(c), 1);
    expect(bands).toHaveLength(2);
    expect(bands[0].maxK - bands[0].minK).toBeCloseTo(0.5, 12);
    expect(bands.every((b) => !b.cut)).toBe(true);
  });

  it('groupTemperatures() regroups a stepped multi-frequency ramp into one band per step', () => {
    const ramp = [-0.3, -0.08, 0.03, 0.22, 3.75, 3.93, 4.1, 4.31, 7.8, 8.0, 8.2, 8.3].map(c);
    const bands = groupTemperatures(ramp, 1);
    expect(bands).toHaveLength(3);
    expect(bandIndex(bands, c(4.1))).toBe(1);
    expect(bandIndex(bands, c(8.3))).toBe(2);
  });

  it('groupTemperatures() cuts a continuous ramp into bands no wider than the tolerance', () => {
    const ramp = Array.from({ length: 50 }, (_, i) => c(20 + 0.3 * i));
    const bands = groupTemperatures(ramp, 1);
    expect(bands.every((b) => b.cut && b.maxK - b.minK <= 1 + 1e-12)).toBe(true);
    expect(bands.length).toBeGreaterThan(10);
  });

  it('groupTemperatures() with tolerance 0 separates every distinct temperature', () => {
    expect(groupTemperatures([300, 300, 300.01], 0)).toHaveLength(2);
  });

  it('groupTemperatures() handles empty and single inputs', () => {
    expect(groupTemperatures([], 1)).toEqual([]);
    expect(groupTemperatures([300], 1)).toEqual([{ minK: 300, maxK: 300, cut: false }]);
  });
});
