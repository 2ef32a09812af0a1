/**
 * Residual bookkeeping after a fit: RMS per curve (each residual counts for both curves of its
 * pair), overall RMS, all standardised residuals (noise of one point) for a robust spread, and the
 * mean standardised residual of each owned entry for outlier flagging.
 */
import type { FitProblem } from './problem';
import type { ResidualBuffer } from './residual-buffer';

export class StatsSink {
  readonly curveSq: Float64Array;
  readonly curveW: Float64Array;
  /** Standardised residuals seen so far (grown as needed; `residuals` trims). */
  private z: Float64Array = new Float64Array(1024);
  private size = 0;
  /** entrySum[k][d][e], entryCount[k][d][e]. */
  readonly entrySum: Float64Array[][];
  readonly entryCount: Float64Array[][];
  sq = 0;
  w = 0;

  constructor(p: FitProblem) {
    const n = p.curves.length;
    this.curveSq = new Float64Array(n);
    this.curveW = new Float64Array(n);
    this.entrySum = p.curves.map((c) => c.map((s) => new Float64Array(s.lx.length)));
    this.entryCount = p.curves.map((c) => c.map((s) => new Float64Array(s.lx.length)));
  }

  /** All standardised residuals consumed, z = r·√w (noise of one point). */
  get residuals(): Float64Array {
    return this.z.subarray(0, this.size);
  }

  /** Adds the residuals of `buf` (call once per filled buffer, e.g. per pair). */
  consume(buf: ResidualBuffer): this {
    const { r: R, w: W, bin: BIN, owner: OW, other: OT, driver: DR, entry: EN } = buf;
    if (this.size + buf.size > this.z.length) {
      let cap = this.z.length;
      while (cap < this.size + buf.size) cap *= 2;
      const grown = new Float64Array(cap);
      grown.set(this.z.subarray(0, this.size));
      this.z = grown;
    }
    const Z = this.z;
    let at = this.size;
    for (let m = 0; m < buf.size; m++) {
      const r = R[m];
      const b = BIN[m];
      const q = b * r * r;
      const owner = OW[m];
      const other = OT[m];
      this.curveSq[owner] += q;
      this.curveSq[other] += q;
      this.curveW[owner] += b;
      this.curveW[other] += b;
      this.sq += q;
      this.w += b;
      const z = r * Math.sqrt(W[m]);
      Z[at++] = z;
      this.entrySum[owner][DR[m]][EN[m]] += z;
      this.entryCount[owner][DR[m]][EN[m]] += 1;
    }
    this.size = at;
    return this;
  }

  curveRms(k: number): number {
    return this.curveW[k] > 0 ? Math.sqrt(this.curveSq[k] / this.curveW[k]) : NaN;
  }

  rms(): number {
    return this.w > 0 ? Math.sqrt(this.sq / this.w) : NaN;
  }
}
