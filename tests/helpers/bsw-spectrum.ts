/**
 * The BSW relaxation spectrum as a Prony series, for outside checks of the shift engine:
 *   H(λ) = G_N⁰ [n_e (λ/λ_max)^n_e + n_g (λ/λ_c)^−n_g]  for λ ≤ λ_max, 0 above
 * (Baumgaertel, Schausberger & Winter, Rheol. Acta 29, 400, 1990, for the first, entanglement
 * term; the second, glass-transition term as in Baumgaertel, De Rosa, Machado, Masse & Winter,
 * Rheol. Acta 31, 75, 1992). G′ and G″ follow from H by G′ = ∫ H ω²λ²/(1+ω²λ²) d ln λ and
 * G″ = ∫ H ωλ/(1+ω²λ²) d ln λ (Ferry 1980, ch. 3); the integrals are taken by the midpoint rule
 * on `perDecade` modes a decade (20: the kernels are smooth in ln λ, error ≪ 0.1 %).
 */
import type { PronySeries } from '../../core/spectrum/prony-model';

export interface BswOptions {
  /** Entanglement exponent n_e. */
  ne: number;
  /** Plateau modulus G_N⁰, Pa. */
  plateauModulusPa: number;
  /** Longest relaxation time λ_max, s. */
  lambdaMaxS: number;
  /** Glass exponent n_g and crossover time λ_c, s; leave out for the entanglement term alone. */
  ng?: number;
  lambdaCS?: number;
  /** Decades of λ below λ_max that carry modes. */
  decades: number;
  /** Modes a decade. @default 20 */
  perDecade?: number;
}

export function bswProny(o: BswOptions): PronySeries {
  const per = o.perDecade ?? 20;
  const n = Math.round(o.decades * per);
  const dln = Math.LN10 / per;
  const tauS: number[] = [];
  const modulusPa: number[] = [];
  for (let i = n - 1; i >= 0; i--) {
    const l = o.lambdaMaxS * 10 ** (-(i + 0.5) / per);
    let h = o.ne * o.plateauModulusPa * (l / o.lambdaMaxS) ** o.ne;
    if (o.ng !== undefined && o.lambdaCS !== undefined)
      h += o.ng * o.plateauModulusPa * (l / o.lambdaCS) ** -o.ng;
    tauS.push(l);
    modulusPa.push(h * dln);
  }
  return { equilibriumModulusPa: 0, tauS, modulusPa };
}
