import { describe, it, expect } from 'vitest';
import { reducedCurveOf, runSpectrum } from '../../../core/pipeline/run-spectrum';
import { resolveAnalysisOptions } from '../../../core/pipeline/options';
import type { Dataset } from '../../../core/data/types';
import type { AnalysisMasterCurve, AnalysisWarning } from '../../../core/pipeline/types';

const osc = {
  abscissa: 'angularFrequency',
  testKind: 'oscillatory',
  deformation: 'shear',
} as Dataset;
const mc: AnalysisMasterCurve = {
  reducedX: [0.1, 1, 10, 100],
  quantities: { storageModulus: [1, null, 3, 4], lossModulus: [1, 2, 3, 4] },
  isothermId: ['a', 'a', 'b', 'b'],
  temperatureK: [300, 300, 310, 310],
  outlier: [false, false, true, false],
};

describe('reducedCurveOf()', () => {
  it('reducedCurveOf() keeps points with every value positive and no outlier flag', () => {
    expect(reducedCurveOf(osc, mc)).toEqual({
      x: Float64Array.of(0.1, 100),
      storage: Float64Array.of(1, 4),
      loss: Float64Array.of(1, 4),
    });
  });
  it('reducedCurveOf() returns null for creep data', () => {
    const creep = { ...osc, abscissa: 'time', testKind: 'creep' } as Dataset;
    expect(
      reducedCurveOf(creep, { ...mc, quantities: { creepCompliance: [1, 2, 3, 4] } }),
    ).toBeNull();
  });
});

describe('runSpectrum()', () => {
  it('runSpectrum() skips the Prony fit when modes per decade is 0', () => {
    const w: AnalysisWarning[] = [];
    const s = resolveAnalysisOptions({ pronyModesPerDecade: 0 }, [300]);
    expect(runSpectrum(osc, mc, {}, s, w)).toEqual({ prony: null, indicators: [] });
    expect(w).toEqual([]);
  });
  it('runSpectrum() explains why no series was fitted', () => {
    const w: AnalysisWarning[] = [];
    const s = resolveAnalysisOptions({}, [300]);
    const creep = { ...osc, abscissa: 'time', testKind: 'creep' } as Dataset;
    expect(runSpectrum(creep, { ...mc, quantities: {} }, {}, s, w).prony).toBeNull();
    expect(w[0].code).toBe('prony-not-fitted');
    const w2: AnalysisWarning[] = [];
    runSpectrum(
      osc,
      {
        ...mc,
        reducedX: [1],
        quantities: { storageModulus: [1], lossModulus: [1] },
        outlier: [false],
      },
      {},
      s,
      w2,
    );
    expect(w2[0].message).toMatch(/No Prony series could be fitted/);
  });
});
