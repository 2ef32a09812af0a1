import { describe, it } from 'vitest';
import {
  pronyInstantaneous,
  pronyLoss,
  pronyRelaxation,
  pronyStorage,
} from '../../../core/spectrum/prony-model';
import { smoothProny } from '../../../core/synthetic';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';

// One Maxwell element (Ferry, Viscoelastic Properties of Polymers, 3rd ed., 1980, ch. 3):
// G'(ω) = G ω²τ²/(1+ω²τ²), G''(ω) = G ωτ/(1+ω²τ²), G(t) = G e^(−t/τ).
const maxwell = { equilibriumModulusPa: 0, tauS: [0.5], modulusPa: [2e6] };

describe('pronyStorage() / pronyLoss() / pronyRelaxation()', () => {
  it('pronyStorage() and pronyLoss() of one Maxwell element match the analytic forms', () => {
    for (const w of [1e-3, 0.2, 2, 50, 1e4]) {
      const wt = w * 0.5;
      expectRelClose(pronyStorage(maxwell, w), (2e6 * wt * wt) / (1 + wt * wt), 1e-14);
      expectRelClose(pronyLoss(maxwell, w), (2e6 * wt) / (1 + wt * wt), 1e-14);
    }
    // at ωτ = 1 both equal G/2 (the crossover of one element)
    expectRelClose(pronyStorage(maxwell, 2), 1e6, 1e-14);
    expectRelClose(pronyLoss(maxwell, 2), 1e6, 1e-14);
  });

  it('pronyRelaxation() of one Maxwell element is G e^(−t/τ), and G0 is its sum', () => {
    for (const t of [0, 0.1, 1, 5])
      expectRelClose(pronyRelaxation(maxwell, t), 2e6 * Math.exp(-t / 0.5), 1e-14);
    expectRelClose(
      pronyInstantaneous({ equilibriumModulusPa: 1, tauS: [1, 2], modulusPa: [2, 3] }),
      6,
      0,
    );
  });

  // Booij & Thoone, Rheol. Acta 21 (1982): G''(ω) ≈ (π/2)·dG'/d ln ω. For a local power law
  // G' ∝ ω^n the exact ratio is tan(nπ/2)/(nπ/2), 1 + (nπ/2)²/3 + …: about 1–2 % for the slopes
  // below 0.2 of this spectrum; the tolerance 5 % covers that and the discreteness of the modes.
  it('pronyLoss() of a smooth spectrum agrees with the Booij–Thoone relation within 5 %', () => {
    const s = smoothProny({
      tauMinS: 1e-6,
      tauMaxS: 1e4,
      modesPerDecade: 4,
      glassyModulusPa: 1e9,
      equilibriumModulusPa: 1e6,
      slope: 0.15,
    });
    for (const w of [1e-2, 1, 1e2, 1e4]) {
      const h = 1e-4;
      const dG = (pronyStorage(s, w * Math.exp(h)) - pronyStorage(s, w * Math.exp(-h))) / (2 * h);
      expectRelClose(pronyLoss(s, w), (Math.PI / 2) * dG, 0.05, `ω = ${w}`);
    }
  });

  it('pronyStorage() tends to Ge at low and G0 at high frequency', () => {
    const s = { equilibriumModulusPa: 1e5, tauS: [1e-3, 1], modulusPa: [1e8, 1e6] };
    expectRelClose(pronyStorage(s, 1e-9), 1e5, 1e-9);
    expectRelClose(pronyStorage(s, 1e12), pronyInstantaneous(s), 1e-9);
    expectAbsClose(pronyLoss(s, 0), 0, 0);
  });
});
