/**
 * Noise propagation for the covariance of the offsets (the "sandwich", Huber 1967, Proc. 5th
 * Berkeley Symp. 1, 221–233). Each measured point enters several residuals: as the owner of its own
 * residuals and, through the interpolant, in the residuals of the overlapping curves' points. The
 * residuals are therefore correlated, and JᵀWJ alone overstates the information (by about 2× in
 * variance on our synthetic sets). Here the linearised estimator θ̂ − θ = M·s (M the constrained
 * inverse of JᵀWJ, s = JᵀW r the score) is propagated exactly: s = Σ_p c_p e_p over point noises
 * e_p, so Cov = σ²·M (Σ_p c_p c_pᵀ / n_p) M, with n_p the points averaged into entry p.
 * For a point of curve i, c_p = Σ_j b_pj (u_i − u_j) (unit vectors of the parameters), so one
 * scalar per (point, partner) suffices. B couples a curve with its partners and the partners with
 * each other, all of them within the envelope of layout.ts.
 */
import type { ParameterLayout } from './layout';
import { partnerLists, slotIn as slotImport } from './layout';
import type { FitProblem } from './problem';
import type { ResidualBuffer } from './residual-buffer';
import { lossCode, robustWeight as weightImport } from './robust';
import type { RobustLoss } from './types';

// Local bindings, see residuals.ts.
const robustWeight = weightImport;
const slotIn = slotImport;

export class SandwichSink {
  /** Per curve and driver: entries × partners scalars for h (and v when joint), flat. */
  private readonly bh: Float64Array[][];
  private readonly bv: (Float64Array | null)[][];
  private readonly ptr: Int32Array;
  private readonly list: Int32Array;
  private readonly n: number;
  private readonly code: number;

  constructor(
    private readonly p: FitProblem,
    loss: RobustLoss,
    private readonly scale: number,
  ) {
    this.n = p.curves.length;
    this.code = lossCode(loss);
    const { ptr, list } = partnerLists(p);
    this.ptr = ptr;
    this.list = list;
    this.bh = p.curves.map((c, i) =>
      c.map((s) => new Float64Array(s.lx.length * (ptr[i + 1] - ptr[i]))),
    );
    this.bv = p.curves.map((c, i) =>
      c.map((s, d) =>
        p.joint && p.beta[d] !== 0 ? new Float64Array(s.lx.length * (ptr[i + 1] - ptr[i])) : null,
      ),
    );
  }

  /** Position of `partner` in the sorted partner list of `curve`. */
  private slot(curve: number, partner: number): number {
    let lo = this.ptr[curve];
    let hi = this.ptr[curve + 1] - 1;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (this.list[mid] < partner) lo = mid + 1;
      else hi = mid;
    }
    return lo - this.ptr[curve];
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
    const nd = this.p.alpha.length;
    const code = this.code;
    const scale = this.scale;
    // Residuals come in runs of one (owner, other, driver): look their slots up once per run.
    let runKey = -1;
    let ownH: Float64Array = new Float64Array(0);
    let othH = ownH;
    let ownV: Float64Array | null = null;
    let othV: Float64Array | null = null;
    let ownStride = 0;
    let othStride = 0;
    let ownSlot = 0;
    let othSlot = 0;
    let beta = 0;
    for (let m = 0; m < buf.size; m++) {
      const owner = OW[m];
      const other = OT[m];
      const d = DR[m];
      const key = (owner * n + other) * nd + d;
      if (key !== runKey) {
        runKey = key;
        ownH = this.bh[owner][d];
        othH = this.bh[other][d];
        ownV = this.bv[owner][d];
        othV = this.bv[other][d];
        ownStride = this.ptr[owner + 1] - this.ptr[owner];
        othStride = this.ptr[other + 1] - this.ptr[other];
        ownSlot = this.slot(owner, other);
        othSlot = this.slot(other, owner);
        beta = this.p.beta[d];
      }
      const r = R[m];
      const w = W[m];
      const e = EN[m] * ownStride + ownSlot;
      const k = KN[m] * othStride + othSlot;
      const lam = LAM[m];
      const wt = w * robustWeight(code, r * Math.sqrt(w), scale);
      // Score contribution wt·r·∇r with ∇r = g (u_owner − u_other) [+ β (v_owner − v_other)].
      // r = e_owner − (1 − λ) e_k − λ e_k+1 + …; a knot of `other` enters with the opposite sign,
      // and (u_owner − u_other) = −(u_other − u_owner), so both knots get +coef in their own frame.
      const ch = wt * G[m];
      ownH[e] += ch;
      othH[k] += ch * (1 - lam);
      othH[k + othStride] += ch * lam;
      if (ownV && othV) {
        const cv = wt * beta;
        ownV[e] += cv;
        othV[k] += cv * (1 - lam);
        othV[k + othStride] += cv * lam;
      }
    }
    return this;
  }

  /**
   * Σ_p c_p c_pᵀ / n_p in envelope storage (positions of `layout`): for each measured entry p of
   * curve i, c_p = Σ_j b_pj (u_i − u_j) (and the same for v), n_p its point count. The products
   * of one curve's entries are summed in a small dense matrix over the curve and its partners
   * first, then scattered once.
   */
  meat(layout: ParameterLayout): Float64Array {
    const out = new Float64Array(layout.env.size);
    const n = this.n;
    const joint = this.p.joint;
    for (let curve = 0; curve < n; curve++) {
      const deg = this.ptr[curve + 1] - this.ptr[curve];
      if (deg === 0) continue;
      const partners = this.list.subarray(this.ptr[curve], this.ptr[curve + 1]);
      // Local coordinates: 0 = the curve, 1..deg = its partners; v offsets after them.
      const dim = joint ? 2 * (deg + 1) : deg + 1;
      const local = new Float64Array(dim * dim);
      const c = new Float64Array(dim);
      this.p.curves[curve].forEach((series, d) => {
        const h = this.bh[curve][d];
        const v = this.bv[curve][d];
        const counts = series.w;
        for (let e = 0; e < counts.length; e++) {
          let selfH = 0;
          let selfV = 0;
          let any = false;
          for (let q = 0; q < deg; q++) {
            const bh = h[e * deg + q];
            const bv = v ? v[e * deg + q] : 0;
            c[1 + q] = -bh;
            selfH += bh;
            if (joint) {
              c[deg + 2 + q] = -bv;
              selfV += bv;
            }
            if (bh !== 0 || bv !== 0) any = true;
          }
          if (!any) continue;
          c[0] = selfH;
          if (joint) c[deg + 1] = selfV;
          const inv = 1 / counts[e];
          for (let a = 0; a < dim; a++) {
            const ca = c[a] * inv;
            if (ca === 0) continue;
            const row = a * dim;
            for (let b = 0; b <= a; b++) local[row + b] += ca * c[b];
          }
        }
      });
      const param = (k: number): number =>
        k === 0
          ? curve
          : k <= deg
            ? partners[k - 1]
            : k === deg + 1
              ? n + curve
              : n + partners[k - deg - 2];
      for (let a = 0; a < dim; a++)
        for (let b = 0; b <= a; b++) {
          const val = local[a * dim + b];
          if (val !== 0) out[slotIn(layout, param(a), param(b))] += val;
        }
    }
    return out;
  }
}
