import { describe, expect, it } from 'vitest';
import { tanDeltaPeak, tanDeltaPeakTemperature } from '../../../core/spectrum/tan-delta-peak';
import type { ShiftModelSpec } from '../../../core/models/types';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';

// Standard linear solid G' = Ge + g x²/(1+x²), G'' = g x/(1+x²), x = ωτ:
// tan δ = g x/(Ge + G0 x²), maximal at x = √(Ge/G0) with tan δ = g/(2√(Ge·G0)) (analytic).
const ge = 1e6;
const g = 9.9e7;
const tau = 1e-3;
const sls = { equilibriumModulusPa: ge, tauS: [tau], modulusPa: [g] };
const omegaPeak = Math.sqrt(ge / (ge + g)) / tau; // 100 rad/s
const win = { abscissa: 'angularFrequency' as const, min: 1e-2, max: 1e6 };

describe('tanDeltaPeak()', () => {
  it('tanDeltaPeak() of the standard linear solid matches the analytic peak', () => {
    const p = tanDeltaPeak(sls, win);
    expectRelClose(p.omegaRadPerS, omegaPeak, 1e-3, 'ω peak'); // parabola on a 50-per-decade scan
    expectRelClose(p.tanDelta, g / (2 * Math.sqrt(ge * (ge + g))), 1e-6, 'tan δ max');
    expect(p.atEdge).toBe(false);
  });

  it('tanDeltaPeak() marks a peak beyond the window', () => {
    expect(tanDeltaPeak(sls, { abscissa: 'angularFrequency', min: 1e3, max: 1e5 }).atEdge).toBe(
      true,
    );
  });
});

describe('tanDeltaPeakTemperature()', () => {
  // With WLF, aT(T)·2π·1 Hz = ω_peak gives log10 aT = L = log10(ω_peak/2π) and, inverting
  // log10 aT = −C1 d/(C2 + d): d = −L·C2/(C1 + L) (algebra on Williams, Landel & Ferry 1955).
  it('tanDeltaPeakTemperature() at 1 Hz matches the inverted WLF law', () => {
    const model: ShiftModelSpec = {
      kind: 'wlf',
      referenceK: 300,
      values: [10, 80],
      fittedRangeK: [250, 350],
    };
    const L = Math.log10(omegaPeak / (2 * Math.PI));
    const expected = 300 + (-L * 80) / (10 + L);
    const r = tanDeltaPeakTemperature(sls, model, win);
    expectAbsClose(r.temperatureK, expected, 0.01, 'T peak'); // 0.1 K scan, parabola-refined
    expect(r.atEdge).toBe(false);
    expect(r.outsideReducedWindow).toBe(false);
    expect(r.messages).toEqual([]);
  });

  it('tanDeltaPeakTemperature() flags a peak at the edge of the scanned range', () => {
    const model: ShiftModelSpec = {
      kind: 'arrhenius',
      referenceK: 300,
      values: [100],
      fittedRangeK: [320, 330],
    };
    expect(tanDeltaPeakTemperature(sls, model, win).atEdge).toBe(true);
    expect(() =>
      tanDeltaPeakTemperature(sls, { kind: 'arrhenius', referenceK: 300, values: [100] }, win),
    ).toThrow(/rangeK/);
  });
});
