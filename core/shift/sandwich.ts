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
    const n = this.n;
    const nd = this.nd;
    const code = this.code;
    const scale = this.scale;
    const joint = this.p.joint;
    // Residuals come in runs of one (owner, other, driver): look their slots up once per run.
    let runKey = -1;
    let ownH: Float64Array = new Float64Array(0);
    let othH = ownH;
    let ownV: Float64Array | null = null;
    let othV: Float64Array | null = null;
    let beta = 0;
    for (let m = 0; m < buf.size; m++) {
      const owner = OW[m];
      const other = OT[m];
      const d = DR[m];
      const key = (owner * n + other) * nd + d;
      if (key !== runKey) {
        runKey = key;
        ownH = this.slot(this.bh, owner, other, d);
        othH = this.slot(this.bh, other, owner, d);
        beta = this.p.beta[d];
        const withV = joint && beta !== 0;
        ownV = withV ? this.slot(this.bv, owner, other, d) : null;
        othV = withV ? this.slot(this.bv, other, owner, d) : null;
      }
      const r = R[m];
      const w = W[m];
      const e = EN[m];
      const k = KN[m];
      const lam = LAM[m];
      const wt = w * robustWeight(code, r * Math.sqrt(w), scale);
      // Score contribution wt·r·∇r with ∇r = g (u_owner − u_other) [+ β (v_owner − v_other)].
      // r = e_owner − (1 − λ) e_k − λ e_k+1 + …; a knot of `other` enters with the opposite sign,
      // and (u_owner − u_other) = −(u_other − u_owner), so both knots get +coef in their own frame.
      const ch = wt * G[m];
      ownH[e] += ch;
      othH[k] += ch * (1 - lam);
      othH[k + 1] += ch * lam;
      if (ownV && othV) {
        const cv = wt * beta;
        ownV[e] += cv;
        othV[k] += cv * (1 - lam);
        othV[k + 1] += cv * lam;
      }
    }
    return this;
  }

  /**
   * Calls `visit(len, idx, val, invCount)` once per measured entry with its score vector c_p in
   * sparse form (parameter indices idx[0..len), coefficients val[0..len)) and 1/n_p.
   */
  private forEachPoint(
    visit: (len: number, idx: Int32Array, val: Float64Array, invCount: number) => void,
  ): void {
    const n = this.n;
    const size = this.p.joint ? 2 * n : n;
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
        visit(len, idx, val, 1 / w[e]);
      }
    }
  }

  /** Σ_p c_p c_pᵀ / n_p over the full parameter vector (size × size, row-major). */
  meat(): Float64Array {
    const size = this.p.joint ? 2 * this.n : this.n;
    const out = new Float64Array(size * size);
    this.forEachPoint((len, idx, val, inv) => {
      for (let a = 0; a < len; a++) {
        const row = idx[a] * size;
        const va = val[a] * inv;
        for (let b = 0; b < len; b++) out[row + idx[b]] += va * val[b];
      }
    });
    return out;
  }

  /**
   * vᵀ·(Σ_p c_p c_pᵀ / n_p)·v without forming the matrix: Σ_p (c_p·v)² / n_p. Enough for the
   * variance of one linear combination of the offsets (e.g. one shift), at a fraction of the cost.
   */
  quadraticForm(v: ArrayLike<number>): number {
    let sum = 0;
    this.forEachPoint((len, idx, val, inv) => {
      let dot = 0;
      for (let a = 0; a < len; a++) dot += val[a] * v[idx[a]];
      sum += dot * dot * inv;
    });
    return sum;
  }
}
