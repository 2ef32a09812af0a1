import { describe, it, expect } from 'vitest';
import { reduceToMasterCurve } from '../../../core/pipeline/reduce';
import type { Dataset } from '../../../core/data/types';
import type { AnalysisCurve } from '../../../core/pipeline/types';
import { expectRelClose } from '../../helpers/assert-close';

// One Maxwell element, G'(ω) = g ω²τ²/(1+ω²τ²), G''(ω) = g ωτ/(1+ω²τ²) (Ferry 1980, ch. 3).
const g = 1e6;
const tau = 0.1;
const gp = (w: number) => (g * w * w * tau * tau) / (1 + w * w * tau * tau);
const gpp = (w: number) => (g * w * tau) / (1 + w * w * tau * tau);

function isotherm(id: string, T: number, aT: number, bT: number) {
  const x = [0.1, 1, 10, 100];
  return {
    id,
    temperatureK: T,
    temperatureSpreadK: 0,
    x,
    // measured at T: G(ω) = G_ref(aT·ω)/bT (docs/conventions.md §2)
    quantities: {
      storageModulus: x.map((w) => gp(aT * w) / bT),
      lossModulus: x.map((w) => gpp(aT * w) / bT),
      tanDelta: x.map((w) => gpp(aT * w) / gp(aT * w)),
      complexViscosity: x.map((w) => Math.hypot(gp(aT * w), gpp(aT * w)) / bT / w),
    },
    mask: [true, true, true, false],
    source: x.map((_, i) => ({ file: 'f.csv', row: i + 2 })),
  };
}

const dataset: Dataset = {
  name: 's',
  testKind: 'oscillatory',
  deformation: 'shear',
  abscissa: 'angularFrequency',
  isotherms: [
    isotherm('T01', 300, 10, 1.05),
    isotherm('T02', 320, 1, 1),
    isotherm('T03', 340, 0.1, 0.97),
  ],
  files: ['f.csv'],
  metadata: {},
};
const curve = (id: string, T: number, aT: number, bT: number, included = true): AnalysisCurve => ({
  isothermId: id,
  temperatureK: T,
  log10aT: Math.log10(aT),
  log10aTStdErr: 0,
  log10bT: Math.log10(bT),
  log10bTStdErr: 0,
  included,
  qualityRmsDecades: 0,
});

describe('reduceToMasterCurve()', () => {
  it('reduceToMasterCurve() puts every point back on the reference Maxwell curve (ω_r = aT·ω, G_r = bT·G)', () => {
    const mc = reduceToMasterCurve(dataset, [
      curve('T01', 300, 10, 1.05),
      curve('T02', 320, 1, 1),
      curve('T03', 340, 0.1, 0.97),
    ]);
    expect(mc.reducedX).toHaveLength(9); // 3 isotherms × 3 unmasked points
    mc.reducedX.forEach((w, i) => {
      expectRelClose(mc.quantities.storageModulus![i]!, gp(w), 1e-12, 'exact up to rounding');
      expectRelClose(mc.quantities.lossModulus![i]!, gpp(w), 1e-12, 'exact up to rounding');
      expectRelClose(
        mc.quantities.tanDelta![i]!,
        gpp(w) / gp(w),
        1e-12,
        'tan δ carries no vertical shift',
      );
      expectRelClose(
        mc.quantities.complexViscosity![i]!,
        Math.hypot(gp(w), gpp(w)) / w,
        1e-12,
        'reduced |η*| = |η*|·bT/aT',
      );
    });
    expect([...mc.reducedX].sort((a, b) => a - b)).toEqual(mc.reducedX);
  });
  it('reduceToMasterCurve() leaves out isotherms that are not included or have no shift', () => {
    const mc = reduceToMasterCurve(dataset, [
      curve('T01', 300, 10, 1, false),
      { ...curve('T02', 320, 1, 1), log10aT: null },
      curve('T03', 340, 0.1, 1),
    ]);
    expect(new Set(mc.isothermId)).toEqual(new Set(['T03']));
    expect(mc.temperatureK.every((t) => t === 340)).toBe(true);
  });
  it('reduceToMasterCurve() divides compliance by bT and uses t/aT for time data', () => {
    const d: Dataset = {
      ...dataset,
      testKind: 'creep',
      abscissa: 'time',
      isotherms: [
        {
          id: 'A',
          temperatureK: 300,
          temperatureSpreadK: 0,
          x: [10],
          quantities: { creepCompliance: [2e-6] },
          mask: [true],
          source: [{ file: 'f', row: 1 }],
        },
      ],
    };
    const mc = reduceToMasterCurve(d, [curve('A', 300, 100, 2)]);
    expectRelClose(mc.reducedX[0], 0.1, 1e-12, 't_r = t/aT');
    expectRelClose(mc.quantities.creepCompliance![0]!, 1e-6, 1e-12, 'J_r = J/bT');
  });
  it('reduceToMasterCurve() keeps outliers flagged by the shift engine, marked as such', () => {
    const mc = reduceToMasterCurve(dataset, [curve('T02', 320, 1, 1)], { T02: [1] });
    expect(mc.outlier).toEqual([false, true, false]);
    expect(mc.reducedX).toEqual([0.1, 1, 10]);
  });
  it('reduceToMasterCurve() gives an empty curve for no data', () => {
    expect(reduceToMasterCurve({ ...dataset, isotherms: [] }, []).reducedX).toEqual([]);
  });
});
