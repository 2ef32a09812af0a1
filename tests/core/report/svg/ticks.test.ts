import { describe, it, expect } from 'vitest';
import { linearTicks, logTicks } from '../../../../core/report/svg/ticks';

describe('logTicks()', () => {
  it('logTicks() puts a labelled major tick on every decade', () => {
    const major = logTicks([0.01, 100]).filter((t) => t.major);
    expect(major.map((t) => t.value)).toEqual([0.01, 0.1, 1, 10, 100]);
    expect(major.map((t) => t.label)).toEqual(['10⁻²', '10⁻¹', '10⁰', '10¹', '10²']);
  });
  it('logTicks() adds minor ticks 2…9 per decade when few decades are shown', () => {
    const minor = logTicks([1, 10]).filter((t) => !t.major);
    expect(minor.map((t) => t.value)).toEqual([2, 3, 4, 5, 6, 7, 8, 9]);
  });
  it('logTicks() thins labels and drops minor ticks over many decades', () => {
    const ticks = logTicks([1e-10, 1e10]);
    expect(ticks.every((t) => t.major)).toBe(true);
    expect(ticks.filter((t) => t.label).length).toBeLessThanOrEqual(8);
  });
});

describe('linearTicks()', () => {
  it('linearTicks() uses 1-2-5 steps inside the domain', () => {
    expect(linearTicks([0, 10]).map((t) => t.value)).toEqual([0, 2, 4, 6, 8, 10]);
    expect(linearTicks([-7.3, 2.1]).map((t) => t.label)).toEqual(['-6', '-4', '-2', '0', '2']);
  });
  it('linearTicks() labels small steps with enough decimals', () => {
    expect(linearTicks([0, 0.5]).map((t) => t.label)).toContain('0.1');
  });
});
