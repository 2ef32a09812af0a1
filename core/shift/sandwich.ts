/**
 * Noise propagation for the covariance of the offsets (the "sandwich", Huber 1967, Proc. 5th
 * Berkeley Symp. 1, 221–233). Each measured point enters several residuals: as the owner of its own
 * residuals and, through the interpolant, in the residuals of the overlapping curves' points. The
 * residuals are therefore correlated, and JᵀWJ alone overstates the information (by about 2× in
 * variance on our synthetic sets). Here the linearised estimator θ̂ − θ = M·s (M the constrained
 * inverse of JᵀWJ, s = JᵀW r the score) is propagated exactly: s = Σ_p c_p e_p over point noises
 * e_p, so Cov = σ²·M (Σ_p c_p c_pᵀ / n_p) M, with n_p the points averaged into entry p.
 * For a point of curve i, c_p = Σ_j b_pj (u_i − u_j) (unit vectors of the parameters), so one
 * scalar per (point, partner) suffices.
 */
import type { FitProblem } from './problem';
import type { ResidualBuffer } from './residual-buffer';
import { lossCode, robustWeight as weightImport } from './robust';

const robustWeight = weightImport; // local binding, see residuals.ts
import type { RobustLoss } from './types';

export class SandwichSink {
  /** key (curve·n + partner)·nd + driver → per-entry scalars for h (and v when joint). */
  private readonly bh = new Map<number, Float64Array>();
  private readonly bv = new Map<number, Float64Array>();
  private readonly n: number;
  private readonly code: number;
  private readonly nd: number;

  constructor(
    private readonly p: FitProblem,
    private readonly loss: RobustLoss,
    private readonly scale: number,
  ) {
    this.n = p.curves.length;
    this.code = lossCode(loss);
    this.nd = p.alpha.length;
  }

  private slot(
    map: Map<number, Float64Array>,
    curve: number,
    partner: number,
    d: number,
  ): Float64Array {
    const key = (curve * this.n + partner) * this.nd + d;
    let a = map.get(key);
    if (!a) {
      a = new Float64Array(this.p.curves[curve][d].lx.length);
      map.set(key, a);
    }
    return a;
  }

  consume(buf: ResidualBuffer): this {
    const {
      r: R,
      w: W,
      g: G,
      owner: OW,
      other: OT,
      driver: DR,
      entry: EN,
      knot: KN,
      lam: LAM,
    } = buf;
    for (let m = 0; m < buf.size; m++) {
      const r = R[m];
      const w = W[m];
      const owner = OW[m];
      const other = OT[m];
      const d = DR[m];
      const e = EN[m];
      const k = KN[m];
      const lam = LAM[m];
      const wt = w * robustWeight(this.code, r * Math.sqrt(w), this.scale);
      // Score contribution wt·r·∇r with ∇r = g (u_owner − u_other) [+ β (v_owner − v_other)].
      // r = e_owner − (1 − λ) e_k − λ e_k+1 + …; a knot of `other` enters with the opposite sign,
      // and (u_owner − u_other) = −(u_other − u_owner), so both knots get +coef in their own frame.
      const ch = wt * G[m];
      this.slot(this.bh, owner, other, d)[e] += ch;
      const oh = this.slot(this.bh, other, owner, d);
      oh[k] += ch * (1 - lam);
      oh[k + 1] += ch * lam;
      const beta = this.p.beta[d];
      if (this.p.joint && beta !== 0) {
        const cv = wt * beta;
        this.slot(this.bv, owner, other, d)[e] += cv;
        const ov = this.slot(this.bv, other, owner, d);
        ov[k] += cv * (1 - lam);
        ov[k + 1] += cv * lam;
      }
    }
    return this;
  }

  /** Σ_p c_p c_pᵀ / n_p over the full parameter vector (size × size, row-major). */
  meat(): Float64Array {
    const n = this.n;
    const size = this.p.joint ? 2 * n : n;
    const out = new Float64Array(size * size);
    // Group the slots by (curve, driver) so each point's vector is assembled once.
    const groups = new Map<
      number,
      { partner: number; h: Float64Array; v: Float64Array | null }[]
    >();
    for (const [key, h] of this.bh) {
      const d = key % this.nd;
      const cp = (key - d) / this.nd;
      const partner = cp % n;
      const curve = (cp - partner) / n;
      const gk = curve * this.nd + d;
      if (!groups.has(gk)) groups.set(gk, []);
      groups.get(gk)!.push({ partner, h, v: this.bv.get(key) ?? null });
    }
    const idx = new Int32Array(2 * size + 2);
    const val = new Float64Array(2 * size + 2);
    for (const [gk, slots] of groups) {
      const d = gk % this.nd;
      const curve = (gk - d) / this.nd;
      const w = this.p.curves[curve][d].w;
      for (let e = 0; e < w.length; e++) {
        let len = 0;
        let selfH = 0;
        let selfV = 0;
        for (let q = 0; q < slots.length; q++) {
          const s = slots[q];
          const bh = s.h[e];
          const bv = s.v ? s.v[e] : 0;
          if (bh === 0 && bv === 0) continue;
          selfH += bh;
          idx[len] = s.partner;
          val[len++] = -bh;
          if (s.v) {
            selfV += bv;
            idx[len] = n + s.partner;
            val[len++] = -bv;
          }
        }
        if (len === 0) continue;
        idx[len] = curve;
        val[len++] = selfH;
        if (this.p.joint) {
          idx[len] = n + curve;
          val[len++] = selfV;
        }
        const inv = 1 / w[e];
        for (let a = 0; a < len; a++) {
          const row = idx[a] * size;
          const va = val[a] * inv;
          for (let b = 0; b < len; b++) out[row + idx[b]] += va * val[b];
        }
      }
    }
    return out;
  }
}
