import { describe, expect, it } from 'vitest';
import { extremeIndex, parabolicVertex } from '../../../core/spectrum/extremum';
import { expectAbsClose } from '../../helpers/assert-close';

describe('extremeIndex()', () => {
  it('extremeIndex() finds the largest or smallest finite value and −1 for none', () => {
    expect(extremeIndex([1, NaN, 5, 3], 1)).toBe(2);
    expect(extremeIndex([1, NaN, 5, -3], -1)).toBe(3);
    expect(extremeIndex([NaN], 1)).toBe(-1);
    expect(extremeIndex([], 1)).toBe(-1);
  });
});

describe('parabolicVertex()', () => {
  it('parabolicVertex() is exact for a parabola (y = 2 − (x − 0.3)²)', () => {
    const x = [0, 0.5, 1];
    const y = x.map((v) => 2 - (v - 0.3) ** 2);
    const v = parabolicVertex(x, y, 1);
    expectAbsClose(v.x, 0.3, 1e-12);
    expectAbsClose(v.y, 2, 1e-12);
  });

  it('parabolicVertex() returns the point itself at an edge or on a straight line', () => {
    expect(parabolicVertex([0, 1, 2], [0, 1, 2], 0)).toEqual({ x: 0, y: 0 });
    expect(parabolicVertex([0, 1, 2], [0, 1, 2], 1)).toEqual({ x: 1, y: 1 });
  });
});
