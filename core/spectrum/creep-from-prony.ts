/**
 * Creep compliance from a relaxation Prony series, exactly. G and J are linked by
 * ∫₀ᵗ G(t−u) J(u) du = t, equivalently ∫₀ᵗ G(t−u) dJ(u) = 1 (unit stress from a creep strain
 * history), i.e. s·Ĝ(s)·s·Ĵ(s) = 1 in the Laplace domain (Tschoegl, The Phenomenological Theory
 * of Linear Viscoelastic Behavior, 1989, ch. 4; Park & Schapery, Int. J. Solids Struct. 36, 1999).
 * With F(s) = s·Ĝ(s) = Ge + Σ g_i s/(s + 1/τ_i), J is a Prony series in creep form:
 *   J(t) = Jg + Σ_k j_k (1 − e^(−t/λ_k)) + t/η0,
 * whose retardation rates −1/λ_k are the zeros of F, one between each pair of neighbouring poles
 * −1/τ_i (F rises monotonically between poles) and, when Ge > 0, one in (−1/τ_max, 0).
 * Jg = 1/G0; j_k from the residues; for Ge = 0 the flow term has η0 = Σ g_i τ_i.
 */
import type { PronySeries } from './prony-model';

/** J(t) = Jg + Σ j_k (1 − exp(−t/λ_k)) + t·fluidity. Units 1/Pa, s, 1/(Pa·s). */
export interface RetardationSeries {
  /** Jg = 1/G0, 1/Pa. */
  glassyCompliancePerPa: number;
  /** λ_k, s, ascending. */
  retardationTimesS: number[];
  /** j_k ≥ 0, 1/Pa. */
  compliancePerPa: number[];
  /** 1/η0 for a fluid (Ge = 0), 1/(Pa·s); 0 for a solid. */
  fluidityPerPaS: number;
  /** Jg + Σ j_k: the equilibrium compliance of a solid (= 1/Ge) or the steady-state recoverable compliance of a fluid, 1/Pa. */
  limitCompliancePerPa: number;
}

/**
 * Bisection on u = ln(−s) in (lo, hi) for a function that is `signLo` just above lo and the
 * opposite just below hi. The endpoints are poles, so their values are never evaluated.
 */
function bisect(h: (u: number) => number, lo: number, hi: number, signLo: number): number {
  for (let i = 0; i < 400 && hi - lo > 1e-15 * Math.max(1, Math.abs(lo), Math.abs(hi)); i++) {
    const mid = 0.5 * (lo + hi);
    const hm = h(mid);
    if (hm === 0) return mid;
    if (Math.sign(hm) === signLo) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/** Converts a relaxation Prony series to its exact creep-compliance series. */
export function creepFromProny(series: PronySeries): RetardationSeries {
  const modes = series.tauS
    .map((t, i) => ({ a: 1 / t, g: series.modulusPa[i] }))
    .filter((m) => m.g > 0 && m.a > 0 && Number.isFinite(m.a))
    .sort((p, q) => p.a - q.a);
  const ge = Math.max(0, series.equilibriumModulusPa);
  const g0 = modes.reduce((s, m) => s + m.g, ge);
  if (!(g0 > 0))
    throw new RangeError('The Prony series has no positive modulus: no creep compliance exists');
  if (modes.length === 0) {
    return {
      glassyCompliancePerPa: 1 / ge,
      retardationTimesS: [],
      compliancePerPa: [],
      fluidityPerPaS: 0,
      limitCompliancePerPa: 1 / ge,
    };
  }
  const fluid = ge === 0;
  // Fluid: work with H(s) = F(s)/s = Σ g_i/(s + a_i); solid: with F(s).
  const fn = (s: number): number =>
    fluid
      ? modes.reduce((acc, m) => acc + m.g / (s + m.a), 0)
      : modes.reduce((acc, m) => acc + (m.g * s) / (s + m.a), ge);
  const dfn = (s: number): number =>
    fluid
      ? -modes.reduce((acc, m) => acc + m.g / (s + m.a) ** 2, 0)
      : modes.reduce((acc, m) => acc + (m.g * m.a) / (s + m.a) ** 2, 0);
  const h = (u: number): number => fn(-Math.exp(u));
  const roots: number[] = [];
  for (let k = 0; k + 1 < modes.length; k++) {
    // as u rises past ln a_k, s moves left across the pole −a_k: F jumps to +∞, H to −∞
    roots.push(
      -Math.exp(bisect(h, Math.log(modes[k].a), Math.log(modes[k + 1].a), fluid ? -1 : 1)),
    );
  }
  // solid: F(0) = Ge > 0 and F → −∞ just right of −a_min: one more zero in (−a_min, 0)
  if (!fluid) roots.push(-Math.exp(bisect(h, Math.log(modes[0].a) - 700, Math.log(modes[0].a), 1)));
  const jg = 1 / g0;
  const items = roots
    .map((r) => ({ lambda: -1 / r, j: fluid ? -1 / (r * r * dfn(r)) : -1 / (r * dfn(r)) }))
    .sort((p, q) => p.lambda - q.lambda);
  const eta0 = fluid ? modes.reduce((s, m) => s + m.g / m.a, 0) : Infinity;
  const sumJ = items.reduce((s, it) => s + it.j, 0);
  return {
    glassyCompliancePerPa: jg,
    retardationTimesS: items.map((it) => it.lambda),
    compliancePerPa: items.map((it) => it.j),
    fluidityPerPaS: fluid ? 1 / eta0 : 0,
    limitCompliancePerPa: jg + sumJ,
  };
}

/** J(t) of a retardation series, 1/Pa. */
export function creepCompliance(r: RetardationSeries, timeS: number): number {
  let s = r.glassyCompliancePerPa + timeS * r.fluidityPerPaS;
  for (let k = 0; k < r.retardationTimesS.length; k++)
    s += r.compliancePerPa[k] * -Math.expm1(-timeS / r.retardationTimesS[k]);
  return s;
}
