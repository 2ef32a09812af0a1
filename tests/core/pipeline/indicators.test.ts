import { describe, it, expect } from 'vitest';
import { computeIndicators } from '../../../core/pipeline/indicators';
import type { Dataset } from '../../../core/data/types';
import type { AnalysisWarning } from '../../../core/pipeline/types';
import type { PronySeries } from '../../../core/spectrum/prony-model';
import { pronyMasterCurve } from '../../helpers/prony-master';
import { expectRelClose } from '../../helpers/assert-close';

const dataset = {
  abscissa: 'angularFrequency',
  deformation: 'shear',
  testKind: 'oscillatory',
} as Dataset;
const window = { abscissa: 'angularFrequency' as const, min: 1e-3, max: 1e3 };

const masterOf = (p: PronySeries) => pronyMasterCurve(p);

describe('computeIndicators()', () => {
  it('computeIndicators() finds the crossover of one Maxwell element at ω = 1/τ with G′ = G″ = g/2 (Ferry 1980, ch. 3)', () => {
    const p: PronySeries = { equilibriumModulusPa: 0, tauS: [0.5], modulusPa: [2e5] };
    const w: AnalysisWarning[] = [];
    const ind = Object.fromEntries(
      computeIndicators(dataset, masterOf(p), p, window, {}, w).map((i) => [i.key, i]),
    );
    expectRelClose(
      ind.crossoverFrequency.value,
      2,
      0.01,
      'interpolated between points 50 per decade',
    );
    expectRelClose(ind.crossoverModulus.value, 1e5, 0.01, 'interpolated');
    // η0 = g·τ for a Maxwell element; |η*| = gτ/√(1 + ω²τ²) is close to, not exactly, a Cross law
    expectRelClose(ind.zeroShearViscosity.value, 1e5, 0.05, 'Cross fit of an exact Maxwell |η*|');
    expect(ind.glassyModulus).toBeUndefined();
  });
  it('computeIndicators() gives glassy and rubbery moduli and the tan δ peak for a solid', () => {
    const p: PronySeries = {
      equilibriumModulusPa: 1e6,
      tauS: [1e-4, 1e-3, 1e-2, 1e-1, 1],
      modulusPa: [2e8, 2e8, 2e8, 2e8, 2e8],
    };
    const models = {
      wlf: {
        c1: 8.86,
        c2K: 101.6,
        referenceK: 373.15,
        fittedRangeK: [343.15, 403.15] as [number, number],
      },
    } as Parameters<typeof computeIndicators>[4];
    const ind = Object.fromEntries(
      computeIndicators(dataset, masterOf(p), p, window, models, []).map((i) => [i.key, i]),
    );
    expectRelClose(ind.glassyModulus.value, 1.001e9, 1e-12, 'G0 = Ge + Σ g_i');
    expect(ind.rubberyModulus.value).toBe(1e6);
    expect(ind.tanDeltaPeakFrequency.value).toBeGreaterThan(1e-3);
    expect(ind.tanDeltaPeakTemperature1Hz.unit).toBe('°C');
    expect(ind.zeroShearViscosity).toBeUndefined(); // a solid: its G'' > G' transition is no terminal zone
  });

  it('computeIndicators() labels a tensile solid with E-symbols (E0, Ee, E″/E′) and a shear one with G-symbols', () => {
    const p: PronySeries = {
      equilibriumModulusPa: 1e6,
      tauS: [1e-4, 1e-3, 1e-2, 1e-1, 1],
      modulusPa: [2e8, 2e8, 2e8, 2e8, 2e8],
    };
    for (const [deformation, m] of [
      ['tension', 'E'],
      ['shear', 'G'],
    ] as const) {
      const ind = Object.fromEntries(
        computeIndicators({ ...dataset, deformation }, masterOf(p), p, window, {}, []).map((i) => [
          i.key,
          i,
        ]),
      );
      expect(ind.glassyModulus.label).toContain(`${m}0`);
      expect(ind.rubberyModulus.label).toContain(`${m}e`);
      expect(ind.tanDeltaPeakFrequency.label).toContain(`${m}''/${m}'`);
    }
  });
});
