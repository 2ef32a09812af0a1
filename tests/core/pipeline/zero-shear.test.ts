import { describe, expect, it } from 'vitest';
import { zeroShearIndicators } from '../../../core/pipeline/zero-shear';
import type { AnalysisIndicator, AnalysisWarning } from '../../../core/pipeline/types';
import type { PronySeries } from '../../../core/spectrum/prony-model';
import { pronyMasterCurve } from '../../helpers/prony-master';
import { expectRelClose } from '../../helpers/assert-close';

const masterOf = (p: PronySeries, lo = 1e-3, hi = 1e3) => pronyMasterCurve(p, lo, hi, 121, 450);

const keyed = (list: AnalysisIndicator[]) => Object.fromEntries(list.map((i) => [i.key, i]));

describe('zeroShearIndicators()', () => {
  // η0 = Σ g_i τ_i (Ferry 1980, ch. 3): two Maxwell modes, 1e5 Pa at 0.1 s and 1e4 Pa at 1 s → 2e4 Pa·s
  it('zeroShearIndicators() reports Σ g_i τ_i when the data reach the terminal zone, with the law and the bound beside it', () => {
    const p: PronySeries = { equilibriumModulusPa: 0, tauS: [0.1, 1], modulusPa: [1e5, 1e4] };
    const w: AnalysisWarning[] = [];
    const ind = keyed(zeroShearIndicators(masterOf(p), p, true, 'shear', w));
    expectRelClose(ind.zeroShearViscosity.value, 2e4, 1e-12, 'closed form');
    expect(ind.zeroShearViscosity.label).toMatch(/^zero-shear viscosity η0 \(Σ g_i τ_i/);
    // |η*| at 1e-3 rad/s of exact data is η0 to 1e-6: the bound, not below within noise
    expectRelClose(ind.zeroShearViscosityLowerBound.value, 2e4, 1e-3, 'lowest bin, ωτ ≤ 1e-3');
    expect(ind.zeroShearViscosityLaw.label).toMatch(/Cross|Carreau–Yasuda/);
    expect(w.filter((x) => x.code === 'eta0-below-bound')).toEqual([]);
  });

  it('zeroShearIndicators() flags an η0 below |η*| at the lowest reduced frequency', () => {
    const data: PronySeries = { equilibriumModulusPa: 0, tauS: [0.1, 1], modulusPa: [1e5, 1e4] };
    // a series that misses the slow mode: Σ g_i τ_i = 1e4, half the measured plateau
    const series: PronySeries = { equilibriumModulusPa: 0, tauS: [0.1], modulusPa: [1e5] };
    const w: AnalysisWarning[] = [];
    const ind = keyed(zeroShearIndicators(masterOf(data), series, true, 'shear', w));
    expect(ind.zeroShearViscosity.note).toMatch(/BELOW \|η\*\| at the lowest reduced frequency/);
    expect(w.map((x) => x.code)).toContain('eta0-below-bound');
  });

  it('zeroShearIndicators() without a terminal zone reports the law and labels tension with E-symbols', () => {
    const p: PronySeries = {
      equilibriumModulusPa: 0,
      tauS: [0.1, 1, 10],
      modulusPa: [1e5, 3e4, 1e4],
    };
    const ind = keyed(zeroShearIndicators(masterOf(p, 1, 1e4), p, false, 'tension', []));
    expect(ind.zeroShearViscosity.label).toMatch(/^zero-rate tensile viscosity ηE,0/);
    expect(ind.zeroShearViscosity.label).toMatch(/law of \|η\*\|/);
    expect(ind.zeroShearViscosityProny.note).toMatch(/lower estimate/);
    expect(ind.zeroShearViscosityLowerBound.label).toMatch(/ηE,0/);
  });
});
