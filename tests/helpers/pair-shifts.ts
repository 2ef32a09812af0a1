/**
 * Shift points with the correlation structure of an overlap fit, drawn from a known covariance:
 * every isotherm is compared with its neighbours (and, more weakly, with the next ones) through
 * noisy pair offsets d_ij = f_i − f_j + ε_ij, and the offsets are solved jointly under the
 * reference condition cᵀθ = 0, as the shift engine does. The estimate's covariance is exactly
 * σ²·M, M the top-left block of the inverse KKT matrix [[L, c], [cᵀ, 0]] (L the weighted graph
 * Laplacian), so the points come with their true covariance. The reference condition is either
 * the isotherm at Tref (c = e_r) or quadratic Lagrange interpolation between three isotherms.
 */
import type { ShiftPoint } from '../../core/models/types';
import { invert } from '../../core/models/linear-algebra';
import type { Random } from '../../core/synthetic';

export interface PairShiftDesign {
  temperaturesK: number[];
  referenceK: number;
  /** Noise of one neighbour comparison, decades. */
  pairNoiseDecades: number;
  /** Relative weight of the next-neighbour comparisons (0: neighbours only). @default 0.3 */
  nextWeight?: number;
}

interface Pair {
  i: number;
  j: number;
  sd: number;
}

export interface PairShiftFactory {
  /** Reference weights c (sum 1). */
  constraint: number[];
  /** True covariance of the points, decades² (same order as the temperatures). */
  covariance: number[][];
  /** Seeded points around the law, in the engine's convention (cᵀy = 0). */
  draw(law: (temperatureK: number) => number, rng: Random): ShiftPoint[];
}

function referenceWeights(T: number[], Tr: number): number[] {
  const c = T.map(() => 0);
  const at = T.findIndex((t) => Math.abs(t - Tr) < 1e-9);
  if (at >= 0) {
    c[at] = 1;
    return c;
  }
  const order = T.map((_, i) => i).sort((a, b) => Math.abs(T[a] - Tr) - Math.abs(T[b] - Tr));
  const nodes = order.slice(0, 3);
  for (const i of nodes) {
    let w = 1;
    for (const j of nodes) if (j !== i) w *= (Tr - T[j]) / (T[i] - T[j]);
    c[i] = w;
  }
  return c;
}

export function pairShifts(d: PairShiftDesign): PairShiftFactory {
  const T = d.temperaturesK;
  const n = T.length;
  const pairs: Pair[] = [];
  const next = d.nextWeight ?? 0.3;
  for (let i = 0; i + 1 < n; i++) pairs.push({ i, j: i + 1, sd: d.pairNoiseDecades });
  if (next > 0)
    for (let i = 0; i + 2 < n; i++)
      pairs.push({ i, j: i + 2, sd: d.pairNoiseDecades / Math.sqrt(next) });
  const c = referenceWeights(T, d.referenceK);
  const kkt = Array.from({ length: n + 1 }, () => new Array<number>(n + 1).fill(0));
  for (const p of pairs) {
    const w = 1 / (p.sd * p.sd);
    kkt[p.i][p.i] += w;
    kkt[p.j][p.j] += w;
    kkt[p.i][p.j] -= w;
    kkt[p.j][p.i] -= w;
  }
  c.forEach((v, k) => {
    kkt[k][n] = v;
    kkt[n][k] = v;
  });
  const inv = invert(kkt);
  const covariance = Array.from({ length: n }, (_, a) =>
    Array.from({ length: n }, (_, b) => inv[a][b]),
  );
  return {
    constraint: c,
    covariance,
    draw(law, rng) {
      const f = T.map(law);
      const b = new Array<number>(n + 1).fill(0);
      for (const p of pairs) {
        const w = 1 / (p.sd * p.sd);
        const obs = f[p.i] - f[p.j] + p.sd * rng.normal();
        b[p.i] += w * obs;
        b[p.j] -= w * obs;
      }
      const theta = inv.slice(0, n).map((row) => row.reduce((s, v, k) => s + v * b[k], 0));
      return T.map((t, k) => ({
        temperatureK: t,
        log10aT: Math.abs(theta[k]) < 1e-15 ? 0 : theta[k],
        stdErr: Math.sqrt(Math.max(0, covariance[k][k])),
      }));
    },
  };
}
