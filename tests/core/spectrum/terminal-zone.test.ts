import { describe, expect, it } from 'vitest';
import { logBins } from '../../../core/spectrum/log-bins';
import { fitProny } from '../../../core/spectrum/prony-fit';
import { pronyZeroShearViscosity } from '../../../core/spectrum/prony-forms';
import { pronyLoss, pronyRelaxation, pronyStorage } from '../../../core/spectrum/prony-model';
import { terminalZone } from '../../../core/spectrum/terminal-zone';
import { meltProny, seededRandom, smoothProny } from '../../../core/synthetic';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';

/** Noisy G′, G″ of a series at `n` log-random frequencies over [lo, hi] (seeded). */
function sweep(p: ReturnType<typeof meltProny>, lo: number, hi: number, n: number, seed: number) {
  const rng = seededRandom(seed);
  const x: number[] = [];
  const storage: number[] = [];
  const loss: number[] = [];
  for (let i = 0; i < n; i++) {
    const w = lo * (hi / lo) ** rng.uniform();
    x.push(w);
    storage.push(pronyStorage(p, w) * Math.exp(0.02 * rng.normal()));
    loss.push(pronyLoss(p, w) * Math.exp(0.02 * rng.normal()));
  }
  return { x, storage, loss };
}

describe('terminalZone()', () => {
  // Closed forms (Ferry, Viscoelastic Properties of Polymers, 3rd ed., 1980, ch. 3): for Ge = 0,
  // G′ → ω²·Σ g_i τ_i² and G″ → ω·Σ g_i τ_i as ω → 0, slopes 2 and 1.
  it('terminalZone() sees slopes near 2 and 1 below 1/τ_max of a melt, and none for a solid', () => {
    const melt = meltProny({ plateauModulusPa: 2e5, peakTauS: 0.01, widthDecades: 0.8 });
    const tmax = melt.tauS[melt.tauS.length - 1];
    const m = sweep(melt, 0.01 / tmax, 1e4 / tmax, 2000, 3);
    const b = logBins(m.x, [m.storage, m.loss], 20);
    const t = terminalZone(b, 0, b.index.length - 1, 'angularFrequency');
    expect(t.reached).toBe(true);
    expectAbsClose(t.storageSlope, 2, 0.1, 'lowest decade at ωτ_max ≤ 0.1: within 5 % of ω²');
    expectAbsClose(t.lossSlope, 1, 0.05, 'G″ reaches ω¹ sooner than G′ reaches ω²');
    const solid = smoothProny({
      tauMinS: 1e-6,
      tauMaxS: 1e2,
      modesPerDecade: 2,
      glassyModulusPa: 1e9,
      equilibriumModulusPa: 1e6,
    });
    const s = sweep(solid, 1e-4, 1e2, 2000, 4);
    const bs = logBins(s.x, [s.storage, s.loss], 20);
    expect(terminalZone(bs, 0, bs.index.length - 1, 'angularFrequency').reached).toBe(false);
  });

  it('terminalZone() on relaxation data: a liquid falls faster than 1/t at long times, a solid levels off', () => {
    const melt = meltProny({ plateauModulusPa: 2e5, peakTauS: 1, widthDecades: 0.5 });
    const t = Array.from({ length: 200 }, (_, i) => 10 ** (-3 + (i * 5.5) / 199));
    const g = t.map((v) => pronyRelaxation(melt, v));
    const b = logBins(t, [g], 20);
    expect(terminalZone(b, 0, b.index.length - 1, 'time').reached).toBe(true);
    const solid = { ...melt, equilibriumModulusPa: 1e4 };
    const bs = logBins(t, [t.map((v) => pronyRelaxation(solid, v))], 20);
    expect(terminalZone(bs, 0, bs.index.length - 1, 'time').reached).toBe(false);
  });
});

describe('fitProny() on a melt in its terminal zone', () => {
  // η0 = Σ g_i τ_i and the steady-state compliance Je⁰ = Σ g_i τ_i² / (Σ g_i τ_i)² of a liquid
  // Prony series (Ferry 1980, ch. 3) are checked against the true series; the fitted series
  // has Ge = 0, so its terminal slopes are exactly 2 and 1 (the closed forms above).
  it('fitProny() sets Ge = 0 and recovers η0 = Σ g_i τ_i and Je⁰ = Σ g_i τ_i²/η0² of the true series', () => {
    const errors: number[] = [];
    for (let seed = 1; seed <= 20; seed++) {
      const rng = seededRandom(seed);
      const melt = meltProny({
        plateauModulusPa: 2e5,
        peakTauS: 10 ** (rng.uniform() * 2 - 1),
        widthDecades: 0.6 + rng.uniform(),
      });
      const tmax = melt.tauS[melt.tauS.length - 1];
      const m = sweep(melt, 0.05 / tmax, 1e5 / tmax, 3000, seed);
      const f = fitProny(m);
      expect(f.equilibrium.mode).toBe('zero');
      expect(f.series.equilibriumModulusPa).toBe(0);
      const eta0 = pronyZeroShearViscosity(melt);
      const fitted = pronyZeroShearViscosity(f.series);
      errors.push(fitted / eta0 - 1);
      const je = (p: typeof melt) =>
        p.modulusPa.reduce((s, g, i) => s + g * p.tauS[i] ** 2, 0) /
        pronyZeroShearViscosity(p) ** 2;
      // Je⁰ weighs the longest modes most: 5 % at 2 % noise (measured worst 1.9 % over these seeds)
      expectRelClose(je(f.series), je(melt), 0.05, `Je⁰, seed ${seed}`);
      // the fitted series' own terminal slopes, from its closed form at ω = 1e-3/τ_max
      const w = 1e-3 / tmax;
      const slope = (fn: (x: number) => number) =>
        Math.log10(fn(w * 1.01) / fn(w / 1.01)) / (2 * Math.log10(1.01));
      expectAbsClose(
        slope((x) => pronyStorage(f.series, x)),
        2,
        1e-3,
        'G′ ~ ω²',
      );
      expectAbsClose(
        slope((x) => pronyLoss(f.series, x)),
        1,
        1e-3,
        'G″ ~ ω',
      );
    }
    // η0 within 1 % of Σ g_i τ_i of the truth at 2 % noise (measured worst 0.10 % over these seeds)
    for (const e of errors) expect(Math.abs(e)).toBeLessThan(0.01);
  });

  it('fitProny() fits Ge when asked, and leaves it 0 when told', () => {
    const melt = meltProny({ plateauModulusPa: 2e5, peakTauS: 0.1, widthDecades: 0.8 });
    const tmax = melt.tauS[melt.tauS.length - 1];
    const m = sweep(melt, 0.05 / tmax, 1e4 / tmax, 1000, 9);
    expect(fitProny(m, { equilibrium: 'fit' }).equilibrium.mode).toBe('fitted');
    expect(fitProny(m, { equilibrium: 'zero' }).equilibrium.reason).toMatch(/as asked/);
  });
});
