/**
 * Residual bookkeeping after a fit: RMS per curve (each residual counts for both curves of its
 * pair), overall RMS, the standardised residuals (noise of one point) for a robust spread, and the
 * mean standardised residual of each owned entry for outlier flagging. Of the standardised
 * residuals at most SAMPLE_LIMIT are kept, an evenly spaced sample of all of them (every
 * 2ᵏ-th): plenty for a median (its relative error is about 1/√SAMPLE_LIMIT = 0.2 %), without
 * storing millions.
 */
import type { FitProblem } from './problem';
import type { ResidualBuffer } from './residual-buffer';

/** Largest number of standardised residuals kept for the robust spread. */
export const SAMPLE_LIMIT = 1 << 18;

export class StatsSink {
  readonly curveSq: Float64Array;
  readonly curveW: Float64Array;
  /** Sample of the standardised residuals (grown as needed; `residuals` trims). */
  private z: Float64Array = new Float64Array(1024);
  private size = 0;
  /** Every stride-th residual is kept; `seen` counts them all. */
  private stride = 1;
  private seen = 0;
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

  /** The standardised residuals consumed, z = r·√w (noise of one point): all, or a sample. */
  get residuals(): Float64Array {
    return this.z.subarray(0, this.size);
  }

  /** Adds the residuals of `buf` (call once per filled buffer, e.g. per pair). */
  consume(buf: ResidualBuffer): this {
    const { r: R, w: W, bin: BIN, owner: OW, other: OT, driver: DR, entry: EN } = buf;
    if (this.size + buf.size > this.z.length && this.z.length < SAMPLE_LIMIT) {
      let cap = this.z.length;
      while (cap < this.size + buf.size && cap < SAMPLE_LIMIT) cap *= 2;
      const grown = new Float64Array(cap);
      grown.set(this.z.subarray(0, this.size));
      this.z = grown;
    }
    const Z = this.z;
    let at = this.size;
    let stride = this.stride;
    let seen = this.seen;
    const curveSq = this.curveSq;
    const curveW = this.curveW;
    let sq = 0;
    let wSum = 0;
    // Residuals come in runs of one (owner, driver): look their entry arrays up once per run.
    let runOwner = -1;
    let runDriver = -1;
    let sums: Float64Array = Z;
    let counts: Float64Array = Z;
    for (let m = 0; m < buf.size; m++) {
      const r = R[m];
      const b = BIN[m];
      const q = b * r * r;
      const owner = OW[m];
      const other = OT[m];
      curveSq[owner] += q;
      curveSq[other] += q;
      curveW[owner] += b;
      curveW[other] += b;
      sq += q;
      wSum += b;
      const z = r * Math.sqrt(W[m]);
      if (seen++ % stride === 0) {
        if (at === Z.length) {
          // Full: keep every other one and take every other one from now on.
          for (let k = 0; 2 * k < at; k++) Z[k] = Z[2 * k];
          at = (at + 1) >> 1;
          stride *= 2;
          seen = 1;
        }
        Z[at++] = z;
      }
      if (owner !== runOwner || DR[m] !== runDriver) {
        runOwner = owner;
        runDriver = DR[m];
        sums = this.entrySum[owner][runDriver];
        counts = this.entryCount[owner][runDriver];
      }
      sums[EN[m]] += z;
      counts[EN[m]] += 1;
    }
    this.sq += sq;
    this.w += wSum;
    this.stride = stride;
    this.seen = seen;

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
