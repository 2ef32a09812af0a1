import { describe, expect, it } from 'vitest';
import { interpolateSorted, log10bTAt } from '../../../core/pipeline/vertical-at';
import { fixtureAnalysis } from '../report/analysis-fixture';
import { expectAbsClose } from '../../helpers/assert-close';

describe('interpolateSorted()', () => {
  it('interpolateSorted() is linear inside and null outside the grid', () => {
    expect(interpolateSorted([1, 3], [10, 30], 2)).toBe(20);
    expect(interpolateSorted([1, 3], [10, 30], 3)).toBe(30);
    expect(interpolateSorted([1, 3], [10, 30], 0.5)).toBeNull();
    expect(interpolateSorted([], [], 1)).toBeNull();
    expect(interpolateSorted([2], [5], 2)).toBe(5);
  });
});

describe('log10bTAt()', () => {
  it('log10bTAt() is 0 without a vertical shift', () => {
    const a = fixtureAnalysis();
    expect(log10bTAt(a, 350)).toEqual({
      log10bT: 0,
      note: 'no vertical shift (bT = 1)',
      extrapolated: false,
    });
  });

  it('log10bTAt() interpolates estimated bT between the included isotherms and says when it extrapolates', () => {
    const base = fixtureAnalysis();
    const a = {
      ...base,
      settings: { ...base.settings, verticalShift: 'data' as const },
      curves: base.curves.map((c, k) => ({ ...c, log10bT: 0.01 * k })),
    };
    // isotherms 1 and 2 are 10 K apart with log10 bT 0.01 and 0.02: halfway gives 0.015
    const mid = (a.curves[1].temperatureK + a.curves[2].temperatureK) / 2;
    expectAbsClose(log10bTAt(a, mid).log10bT, 0.015, 1e-12, 'linear interpolation');
    const cold = log10bTAt(a, a.curves[0].temperatureK - 20);
    expect(cold.extrapolated).toBe(true);
    expect(cold.log10bT).toBe(0);
  });
});
