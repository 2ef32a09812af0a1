import { describe, it, expect } from 'vitest';
import {
  isothermsChart,
  masterCurveChart,
  plottedQuantities,
  shiftFactorChart,
  vanGurpPalmenChart,
  verticalShiftChart,
} from '../../../core/report/charts';
import { fixtureAnalysis } from './analysis-fixture';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';

const a = fixtureAnalysis();

describe('plottedQuantities()', () => {
  it('plottedQuantities() picks storage and loss for oscillatory data, G(t) for relaxation', () => {
    expect(plottedQuantities(a)).toEqual(['storageModulus', 'lossModulus']);
    expect(plottedQuantities(fixtureAnalysis('relaxation'))).toEqual(['relaxationModulus']);
  });
});

describe('isothermsChart()', () => {
  it('isothermsChart() draws two series per isotherm in the chosen unit, on log axes', () => {
    const c = isothermsChart(a, 'MPa');
    expect(c.series).toHaveLength(2 * a.dataset.isotherms.length);
    expectRelClose(
      c.series[0].y[0],
      a.dataset.isotherms[0].quantities.storageModulus![0] / 1e6,
      1e-12,
      'Pa → MPa',
    );
    expect(c.x.kind).toBe('log');
    expect(c.colourBar).toEqual({ minC: 70, maxC: 130 });
  });
});

describe('masterCurveChart()', () => {
  it('masterCurveChart() plots included isotherms only and adds the Prony lines', () => {
    const c = masterCurveChart(a, 'Pa');
    expect(c.series.some((s) => s.name.startsWith('T07'))).toBe(false);
    const prony = c.series.filter((s) => s.name.startsWith('Prony'));
    expect(prony).toHaveLength(2);
    expect(prony[0].line).toBe('solid');
  });
  it('masterCurveChart() draws outliers as their own grey series', () => {
    const outlier = a.masterCurve.reducedX.map((_, i) => i === 0);
    const c = masterCurveChart({ ...a, masterCurve: { ...a.masterCurve, outlier } }, 'Pa');
    const o = c.series.filter((s) => s.name.startsWith('outliers'));
    expect(o).toHaveLength(2);
    expect(o[0].x).toEqual([a.masterCurve.reducedX[0]]);
  });
});

describe('shiftFactorChart()', () => {
  it('shiftFactorChart() plots log10 aT with error bars against °C and the model band', () => {
    const c = shiftFactorChart(a);
    const points = c.series.filter((s) => s.marker !== 'none');
    expect(points).toHaveLength(7);
    expectAbsClose(points[0].x[0], 70, 1e-9, 'K → °C');
    expect(points[0].yError).toEqual([0.01]);
    expect(points[6].marker).toBe('ring'); // excluded isotherm
    expect(c.bands).toHaveLength(1);
  });
});

describe('vanGurpPalmenChart()', () => {
  it('vanGurpPalmenChart() plots δ in degrees between 0 and 90 against |G*|', () => {
    const c = vanGurpPalmenChart(a, 'Pa')!;
    const all = c.series.flatMap((s) => s.y);
    expect(Math.min(...all)).toBeGreaterThan(0);
    expect(Math.max(...all)).toBeLessThan(90);
    expect(c.y.domain).toEqual([0, 90]);
  });
  it('vanGurpPalmenChart() is null for relaxation data', () => {
    expect(vanGurpPalmenChart(fixtureAnalysis('relaxation'), 'Pa')).toBeNull();
  });
});

describe('verticalShiftChart()', () => {
  it('verticalShiftChart() is null without a vertical shift and plots log10 bT otherwise', () => {
    expect(verticalShiftChart(a)).toBeNull();
    const b = {
      ...a,
      settings: { ...a.settings, verticalShift: 'density' as const },
      curves: a.curves.map((c, i) => ({ ...c, log10bT: 0.01 * (3 - i) })),
    };
    const c = verticalShiftChart(b)!;
    expect(c.series).toHaveLength(7);
    expect(c.series[0].y).toEqual([0.03]);
    expect(c.y.label).toContain('entropic');
  });
});
