import { describe, expect, it } from 'vitest';
import { axisDistance, panAxis, zoomAxis } from '../../../app/renderer/src/charts/zoom-math';
import { expectAbsClose } from '../../helpers/assert-close';

describe('zoomAxis()', () => {
  it('zoomAxis() on a log axis zooms in decades about the anchor', () => {
    const [lo, hi] = zoomAxis('log', 1e-2, 1e4, 1, 0.5);
    // exact in log space; 1e-12 decades allows for floating-point rounding only
    expectAbsClose(Math.log10(lo), -1, 1e-12, 'lower decade');
    expectAbsClose(Math.log10(hi), 2, 1e-12, 'upper decade');
  });

  it('zoomAxis() on a linear axis keeps the anchor where it is', () => {
    expect(zoomAxis('linear', 0, 100, 20, 2)).toEqual([-20, 180]);
  });
});

describe('panAxis()', () => {
  it('panAxis() moves the data under the pointer with it', () => {
    // 400 px show 4 decades; dragging 100 px right shows one decade lower
    const [lo, hi] = panAxis('log', 1, 1e4, 200, 300, 0, 400);
    expectAbsClose(Math.log10(lo), -1, 1e-12, 'lower decade');
    expectAbsClose(Math.log10(hi), 3, 1e-12, 'upper decade');
  });
});

describe('axisDistance()', () => {
  it('axisDistance() counts decades on log axes and units on linear ones', () => {
    expectAbsClose(axisDistance('log', 2, 200), 2, 1e-12, 'decades');
    expect(axisDistance('linear', 2, 200)).toBe(198);
  });
});
