/**
 * Residual bookkeeping after a fit: RMS per curve (each residual counts for both curves of its
 * pair), overall RMS, all standardised residuals (noise of one point) for a robust spread, and the mean residual of each owned
 * entry for outlier flagging.
 */
import type { FitProblem } from './problem';
import type { ResidualSink } from './residuals';

export class StatsSink implements ResidualSink {
  readonly curveSq: Float64Array;
  readonly curveW: Float64Array;
  readonly residuals: number[] = [];
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

  add(
    owner: number,
    other: number,
    driver: number,
    e: number,
    r: number,
    w: number,
    _g: number,
    binWeight: number,
  ): void {
    const q = binWeight * r * r;
    this.curveSq[owner] += q;
    this.curveSq[other] += q;
    this.curveW[owner] += binWeight;
    this.curveW[other] += binWeight;
    this.sq += q;
    this.w += binWeight;
    const z = r * Math.sqrt(w);
    this.residuals.push(z);
    this.entrySum[owner][driver][e] += z;
    this.entryCount[owner][driver][e] += 1;
  }

  curveRms(k: number): number {
    return this.curveW[k] > 0 ? Math.sqrt(this.curveSq[k] / this.curveW[k]) : NaN;
  }

  rms(): number {
    return this.w > 0 ? Math.sqrt(this.sq / this.w) : NaN;
  }
}
