import { describe, expect, it } from 'vitest';
import { creepCompliance, creepFromProny } from '../../../core/spectrum/creep-from-prony';
import { pronyRelaxation } from '../../../core/spectrum/prony-model';
import { smoothProny } from '../../../core/synthetic';
import { expectRelClose } from '../../helpers/assert-close';

describe('creepFromProny()', () => {
  // One Maxwell element: J(t) = 1/G + t/η with η = Gτ (Ferry 1980, ch. 3).
  it('creepFromProny() of one Maxwell element gives J(t) = 1/G + t/η', () => {
    const r = creepFromProny({ equilibriumModulusPa: 0, tauS: [2], modulusPa: [1e6] });
    expect(r.retardationTimesS).toEqual([]);
    for (const t of [0, 1, 10, 1e3])
      expectRelClose(creepCompliance(r, t), 1 / 1e6 + t / 2e6, 1e-14);
  });

  // Standard linear solid, G(t) = Ge + g e^(−t/τ): J(t) = 1/Ge − (1/Ge − 1/G0) e^(−t/λ),
  // λ = τ·G0/Ge (Findley, Lai & Onaran, Creep and Relaxation of Nonlinear Viscoelastic
  // Materials, 1976, ch. 5).
  it('creepFromProny() of the standard linear solid matches the analytic creep compliance', () => {
    const ge = 2e6;
    const g = 8e6;
    const tau = 0.3;
    const r = creepFromProny({ equilibriumModulusPa: ge, tauS: [tau], modulusPa: [g] });
    const g0 = ge + g;
    expectRelClose(r.retardationTimesS[0], (tau * g0) / ge, 1e-12, 'λ');
    for (const t of [0, 0.1, 1, 3, 30]) {
      expectRelClose(
        creepCompliance(r, t),
        1 / ge - (1 / ge - 1 / g0) * Math.exp((-t * ge) / (g0 * tau)),
        1e-12,
        `J(${t})`,
      );
    }
  });

  // Laplace-domain identity s²·Ĝ(s)·Ĵ(s) = 1 (Tschoegl 1989, ch. 4), checked at many s for a
  // 37-mode solid and a fluid spanning 10 decades.
  it.each([
    ['solid', 1e6],
    ['fluid', 0],
  ])('creepFromProny() satisfies s²ĜĴ = 1 for a many-mode %s', (_, ge) => {
    const p = smoothProny({
      tauMinS: 1e-6,
      tauMaxS: 1e3,
      modesPerDecade: 4,
      glassyModulusPa: 1e9,
      equilibriumModulusPa: ge as number,
    });
    const r = creepFromProny(p);
    expect(r.compliancePerPa.every((j) => j > 0)).toBe(true);
    for (const s of [1e-5, 1e-2, 1, 1e3, 1e6]) {
      const G =
        p.equilibriumModulusPa / s +
        p.modulusPa.reduce((a, gi, i) => a + gi / (s + 1 / p.tauS[i]), 0);
      const J =
        r.glassyCompliancePerPa / s +
        r.compliancePerPa.reduce(
          (a, j, k) => a + j * (1 / s - 1 / (s + 1 / r.retardationTimesS[k])),
          0,
        ) +
        r.fluidityPerPaS / (s * s);
      expectRelClose(s * s * G * J, 1, 1e-9, `s = ${s}`); // double-precision sums over 37 modes
    }
  });

  // Time-domain interconversion relations (Ferry 1980, ch. 3; Tschoegl 1989, ch. 4):
  // ∫₀ᵗ G(t−u) J(u) du = t, and its Stieltjes form ∫₀ᵗ G(t−u) dJ(u) = 1 (J(0) jump included).
  it('creepFromProny() satisfies ∫G(t−u)J(u)du = t and ∫G(t−u)dJ(u) = 1 by quadrature', () => {
    const p = {
      equilibriumModulusPa: 1e5,
      tauS: [0.01, 0.1, 1, 10],
      modulusPa: [4e6, 1e6, 3e5, 1e5],
    };
    const r = creepFromProny(p);
    const dJ = (u: number) =>
      r.compliancePerPa.reduce(
        (a, j, k) => a + (j / r.retardationTimesS[k]) * Math.exp(-u / r.retardationTimesS[k]),
        r.fluidityPerPaS,
      );
    for (const t of [0.05, 5, 50]) {
      const n = 20000; // Simpson with 20000 panels on smooth integrands
      const h = t / n;
      let conv = 0;
      let stieltjes = 0;
      for (let i = 0; i <= n; i++) {
        const u = i * h;
        const w = i === 0 || i === n ? 1 : i % 2 ? 4 : 2;
        conv += w * pronyRelaxation(p, t - u) * creepCompliance(r, u);
        stieltjes += w * pronyRelaxation(p, t - u) * dJ(u);
      }
      expectRelClose((conv * h) / 3, t, 1e-6, `∫GJ at t = ${t}`); // quadrature error
      expectRelClose(
        pronyRelaxation(p, t) * creepCompliance(r, 0) + (stieltjes * h) / 3,
        1,
        1e-6,
        `∫G dJ at t = ${t}`,
      );
    }
  });

  // Limits (Ferry 1980, ch. 3): a solid creeps to J = 1/Ge; a fluid's steady-state recoverable
  // compliance is Je⁰ = Σ g_i τ_i² / (Σ g_i τ_i)² and its flow term t/η0 with η0 = Σ g_i τ_i.
  it('creepFromProny() reaches 1/Ge for a solid and Je⁰ = Σgτ²/η0² for a fluid', () => {
    const solid = { equilibriumModulusPa: 3e5, tauS: [1e-3, 0.1, 10], modulusPa: [5e8, 2e7, 1e6] };
    expectRelClose(creepFromProny(solid).limitCompliancePerPa, 1 / 3e5, 1e-9);
    const fluid = { ...solid, equilibriumModulusPa: 0 };
    const eta0 = fluid.modulusPa.reduce((s, g, i) => s + g * fluid.tauS[i], 0);
    const je = fluid.modulusPa.reduce((s, g, i) => s + g * fluid.tauS[i] ** 2, 0) / eta0 ** 2;
    const r = creepFromProny(fluid);
    expectRelClose(r.limitCompliancePerPa, je, 1e-9);
    expectRelClose(r.fluidityPerPaS, 1 / eta0, 1e-12);
  });

  it('creepFromProny() gives J = 1/Ge for an elastic series and rejects an empty one', () => {
    expectRelClose(
      creepCompliance(creepFromProny({ equilibriumModulusPa: 4, tauS: [], modulusPa: [] }), 10),
      0.25,
      0,
    );
    expect(() => creepFromProny({ equilibriumModulusPa: 0, tauS: [1], modulusPa: [0] })).toThrow(
      /no positive modulus/,
    );
  });
});
