import { describe, it, expect } from 'vitest';
import { drawable, niceDomain, project } from '../../../../core/report/svg/scale';
import { expectAbsClose } from '../../../helpers/assert-close';

const scale = <K extends 'log' | 'linear'>(
  kind: K,
  domain: [number, number],
  range: [number, number],
) => ({ kind, domain, range });

describe('project()', () => {
  it('project() maps decades evenly on a log scale', () => {
    const s = scale('log', [1, 1000], [0, 300]);
    expectAbsClose(project(s, 1), 0, 1e-9, 'exact up to rounding');
    expectAbsClose(project(s, 10), 100, 1e-9, 'exact up to rounding');
    expectAbsClose(project(s, 1000), 300, 1e-9, 'exact up to rounding');
  });
  it('project() handles an inverted pixel range (SVG y axis)', () => {
    const s = scale('linear', [0, 10], [200, 0]);
    expectAbsClose(project(s, 2.5), 150, 1e-9, 'exact up to rounding');
  });
});

describe('niceDomain()', () => {
  it('niceDomain() widens a log domain to whole decades', () => {
    expect(niceDomain([3, 470], 'log')).toEqual([1, 1000]);
  });
  it('niceDomain() ignores non-positive and non-finite values on a log scale', () => {
    expect(niceDomain([0, -5, NaN, 20, 30], 'log')).toEqual([10, 100]);
  });
  it('niceDomain() gives one decade for a single value', () => {
    expect(niceDomain([10], 'log')).toEqual([10, 100]);
  });
  it('niceDomain() falls back when there is nothing to show', () => {
    expect(niceDomain([], 'log')).toEqual([1, 10]);
    expect(niceDomain([NaN], 'linear')).toEqual([0, 1]);
  });
  it('niceDomain() pads a linear domain and opens an empty range', () => {
    const [lo, hi] = niceDomain([5, 5], 'linear');
    expect(lo).toBeLessThan(5);
    expect(hi).toBeGreaterThan(5);
  });
  it('niceDomain() limits absurd log ranges to 24 decades', () => {
    const [lo, hi] = niceDomain([Number.MIN_VALUE, Number.MAX_VALUE], 'log');
    expectAbsClose(Math.log10(hi) - Math.log10(lo), 24, 1e-9, 'decade count is exact');
  });
});

describe('drawable()', () => {
  it('drawable() rejects zero on a log scale but not on a linear one', () => {
    expect(drawable({ kind: 'log', domain: [1, 10], range: [0, 1] }, 0)).toBe(false);
    expect(drawable({ kind: 'linear', domain: [1, 10], range: [0, 1] }, 0)).toBe(true);
  });
});
