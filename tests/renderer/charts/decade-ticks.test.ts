import { describe, expect, it } from 'vitest';
import {
  decadeTicks,
  mantissaLabel,
  powerOfTenLabel,
} from '../../../app/renderer/src/charts/decade-ticks';

describe('decadeTicks()', () => {
  it('decadeTicks() puts a labelled tick on every decade in view', () => {
    const t = decadeTicks(0.05, 2000);
    expect(t.map((x) => x.value)).toEqual([0.1, 1, 10, 100, 1000]);
    expect(t.map((x) => x.label)).toEqual(['10⁻¹', '10⁰', '10¹', '10²', '10³']);
  });

  it('decadeTicks() thins labels over very wide spans but keeps every decade ticked', () => {
    const t = decadeTicks(1e-10, 1e10, 10);
    expect(t).toHaveLength(21);
    expect(t.filter((x) => x.label).length).toBeLessThanOrEqual(11);
    expect(t[0].label).toBe('10⁻¹⁰');
  });

  it('decadeTicks() adds 2 and 5 steps when three decades or fewer are in view', () => {
    expect(decadeTicks(1.5, 30).map((x) => x.value)).toEqual([2, 5, 10, 20]);
    expect(
      decadeTicks(3e3, 2e5)
        .filter((x) => x.major)
        .map((x) => x.label),
    ).toEqual(['10⁴', '10⁵']);
    expect(decadeTicks(3e3, 2e5).map((x) => x.label)).toContain('5×10³');
  });

  it('decadeTicks() returns nothing for an empty, reversed or non-positive range', () => {
    expect(decadeTicks(0, 10)).toEqual([]);
    expect(decadeTicks(10, 1)).toEqual([]);
    expect(decadeTicks(Number.NaN, 10)).toEqual([]);
    expect(decadeTicks(1, Number.POSITIVE_INFINITY)).toEqual([]);
  });
});

describe('powerOfTenLabel() and mantissaLabel()', () => {
  it('powerOfTenLabel() and mantissaLabel() write powers of ten with superscripts', () => {
    expect(powerOfTenLabel(-12)).toBe('10⁻¹²');
    expect(mantissaLabel(2000)).toBe('2×10³');
    expect(mantissaLabel(0.05)).toBe('5×10⁻²');
  });
});
