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
  residuals: Float64Array = new Float64Array(0);
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

  consume(buf: ResidualBuffer): this {
    const { r: R, w: W, bin: BIN, owner: OW, other: OT, driver: DR, entry: EN } = buf;
    this.residuals = new Float64Array(buf.size);
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
      this.residuals[m] = z;
      this.entrySum[owner][DR[m]][EN[m]] += z;
      this.entryCount[owner][DR[m]][EN[m]] += 1;
    }
    return this;
  }

  curveRms(k: number): number {
    return this.curveW[k] > 0 ? Math.sqrt(this.curveSq[k] / this.curveW[k]) : NaN;
  }

  rms(): number {
    return this.w > 0 ? Math.sqrt(this.sq / this.w) : NaN;
  }
}
