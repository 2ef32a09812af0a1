import { describe, it, expect } from 'vitest';
import {
  combineProny,
  meltProny,
  resolveMeltPronyOptions,
  resolveTransitionPronyOptions,
  transitionProny,
} from '../../../core/synthetic';
import {
  pronyInstantaneous,
  pronyLoss,
  pronyRelaxation,
  pronyStorage,
} from '../../../core/spectrum/prony-model';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';

describe('meltProny()', () => {
  const melt = meltProny({ plateauModulusPa: 3e5, peakTauS: 0.01, widthDecades: 1.1 });

  it('meltProny() has no equilibrium modulus and its modes sum to the plateau modulus', () => {
    expect(melt.equilibriumModulusPa).toBe(0);
    expectRelClose(pronyInstantaneous(melt), 3e5, 1e-12, 'Σ g_i');
    expect(melt.modulusPa.every((g) => g > 0)).toBe(true);
  });

  it('meltProny() puts its strongest mode at the peak relaxation time', () => {
    const strongest = melt.modulusPa.indexOf(Math.max(...melt.modulusPa));
    expectAbsClose(Math.log10(melt.tauS[strongest]), -2, 0.26, 'log10 τ of strongest mode');
  });

  it('meltProny() shows a terminal zone: G′ → ω²Σgτ², G″ → ωη0 as ω → 0', () => {
    // Low-frequency limits of the generalised Maxwell model (Ferry, Viscoelastic Properties of
    // Polymers, 3rd ed., 1980, ch. 3): exact up to terms of order (ωτ_max)², here ≤ 1e-10.
    const w = 1e-5 / Math.max(...melt.tauS);
    const eta0 = melt.tauS.reduce((s, t, i) => s + t * melt.modulusPa[i], 0);
    const m2 = melt.tauS.reduce((s, t, i) => s + t * t * melt.modulusPa[i], 0);
    expectRelClose(pronyStorage(melt, w), w * w * m2, 1e-8, "G'");
    expectRelClose(pronyLoss(melt, w), w * eta0, 1e-8, "G''");
  });

  it('meltProny() rejects a non-positive width, naming it', () => {
    expect(() => meltProny({ plateauModulusPa: 1, peakTauS: 1, widthDecades: 0 })).toThrow(
      /widthDecades/,
    );
    expect(() => meltProny({ plateauModulusPa: NaN, peakTauS: 1, widthDecades: 1 })).toThrow(
      /plateauModulusPa/,
    );
  });
});

describe('transitionProny()', () => {
  const rubber = transitionProny({
    glassyModulusPa: 2.5e9,
    rubberyModulusPa: 6e6,
    centreTauS: 1,
    widthDecades: 1.6,
  });

  it('transitionProny() runs exactly from the glassy to the rubbery modulus', () => {
    expect(rubber.equilibriumModulusPa).toBe(6e6);
    expectRelClose(pronyInstantaneous(rubber), 2.5e9, 1e-12, 'Ge + Σ g_i');
  });

  it('transitionProny() relaxes monotonically from glass to rubber', () => {
    const times = Array.from({ length: 41 }, (_, i) => 10 ** (-10 + i * 0.5));
    const e = times.map((t) => pronyRelaxation(rubber, t));
    for (let i = 1; i < e.length; i++) expect(e[i]).toBeLessThan(e[i - 1]);
    expectRelClose(e[0], 2.5e9, 0.02, 'E(1e-10 s) near the glass');
    expectRelClose(e[e.length - 1], 6e6, 0.02, 'E(1e10 s) near the rubber');
  });

  it('transitionProny() is half-way in log modulus near its centre time', () => {
    // Strengths come from the first-order (Alfrey) spectrum estimate, which blurs the curve by
    // about a Maxwell mode's width: that approximation error is 0.05 decades here; allow 0.1.
    const mid = (Math.log10(2.5e9) + Math.log10(6e6)) / 2;
    expectAbsClose(Math.log10(pronyRelaxation(rubber, 1)), mid, 0.1, 'log10 E(τc)');
  });

  it('transitionProny() rejects a glassy modulus below the rubbery one', () => {
    expect(() =>
      transitionProny({ glassyModulusPa: 1, rubberyModulusPa: 2, centreTauS: 1, widthDecades: 1 }),
    ).toThrow(/glassyModulusPa/);
  });
});

describe('combineProny()', () => {
  it('combineProny() adds the models: G′ of the sum is the sum of G′', () => {
    const a = meltProny({ plateauModulusPa: 1e5, peakTauS: 1, widthDecades: 1 });
    const b = transitionProny({
      glassyModulusPa: 1e9,
      rubberyModulusPa: 1e6,
      centreTauS: 1e-3,
      widthDecades: 1,
    });
    const c = combineProny(a, b);
    expect(c.equilibriumModulusPa).toBe(1e6);
    expect(c.tauS).toHaveLength(a.tauS.length + b.tauS.length);
    expect([...c.tauS].sort((x, y) => x - y)).toEqual(c.tauS);
    for (const w of [1e-3, 1, 1e3]) {
      // Same terms summed in another order: only floating-point rounding differs.
      expectRelClose(pronyStorage(c, w), pronyStorage(a, w) + pronyStorage(b, w), 1e-12);
    }
  });

  it('combineProny() of nothing is an empty model', () => {
    expect(combineProny()).toEqual({ equilibriumModulusPa: 0, tauS: [], modulusPa: [] });
  });
});

describe('resolveMeltPronyOptions()', () => {
  it('resolveMeltPronyOptions() fills in the documented defaults', () => {
    const base = { plateauModulusPa: 1, peakTauS: 1, widthDecades: 1 };
    expect(resolveMeltPronyOptions(base)).toEqual({ ...base, modesPerDecade: 2, reachWidths: 3 });
    expect(resolveMeltPronyOptions({ ...base, modesPerDecade: undefined }).modesPerDecade).toBe(2);
  });
});

describe('resolveTransitionPronyOptions()', () => {
  it('resolveTransitionPronyOptions() fills in the documented defaults', () => {
    const base = { glassyModulusPa: 2, rubberyModulusPa: 1, centreTauS: 1, widthDecades: 1 };
    expect(resolveTransitionPronyOptions(base)).toEqual({
      ...base,
      modesPerDecade: 2,
      reachWidths: 6,
    });
  });

  it('resolveTransitionPronyOptions() names a bad mode density', () => {
    const base = { glassyModulusPa: 2, rubberyModulusPa: 1, centreTauS: 1, widthDecades: 1 };
    expect(() => resolveTransitionPronyOptions({ ...base, modesPerDecade: -1 })).toThrow(
      /modesPerDecade/,
    );
  });
});
