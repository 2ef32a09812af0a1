/**
 * Accumulates the IRLS normal equations JᵀWJ and JᵀWr directly from the residual stream: each
 * residual touches at most four parameters (h_i, h_j, v_i, v_j), so no Jacobian is stored.
 */
import type { FitProblem } from './problem';
import { parameterCount } from './problem';
import type { ResidualSink } from './residuals';
import { lossCode, robustRho, robustWeight } from './robust';
import type { RobustLoss } from './types';

export class NormalSink implements ResidualSink {
  readonly size: number;
  readonly a: Float64Array;
  readonly g: Float64Array;
  lossSum = 0;
  weightedSquares = 0;
  count = 0;
  private readonly n: number;
  private readonly code: number;
  private readonly idx = new Int32Array(4);
  private readonly cf = new Float64Array(4);

  constructor(
    private readonly p: FitProblem,
    private readonly loss: RobustLoss,
    private readonly scale: number,
    private readonly withMatrix = true,
  ) {
    this.size = parameterCount(p);
    this.n = p.curves.length;
    this.code = lossCode(loss);
    this.a = new Float64Array(withMatrix ? this.size * this.size : 0);
    this.g = new Float64Array(withMatrix ? this.size : 0);
  }

  add(
    owner: number,
    other: number,
    driver: number,
    _e: number,
    r: number,
    w: number,
    g: number,
    binWeight: number,
  ): void {
    // Standardised residual z = r·√w has the noise of one point; the robust loss acts on z.
    const z = r * Math.sqrt(w);
    this.lossSum += robustRho(this.code, z, this.scale);
    this.count += binWeight;
    const wt = w * robustWeight(this.code, z, this.scale);
    this.weightedSquares += wt * r * r;
    if (!this.withMatrix) return;
    const idx = this.idx;
    const cf = this.cf;
    idx[0] = owner;
    idx[1] = other;
    cf[0] = g;
    cf[1] = -g;
    let m = 2;
    const beta = this.p.beta[driver];
    if (this.p.joint && beta !== 0) {
      idx[2] = this.n + owner;
      idx[3] = this.n + other;
      cf[2] = beta;
      cf[3] = -beta;
      m = 4;
    }
    const s = this.size;
    for (let u = 0; u < m; u++) {
      const cu = wt * cf[u];
      this.g[idx[u]] += cu * r;
      const row = idx[u] * s;
      for (let v = 0; v < m; v++) this.a[row + idx[v]] += cu * cf[v];
    }
  }

  /** Mean robust loss per measured point in the overlaps: the objective minimised. */
  objective(): number {
    return this.count > 0 ? this.lossSum / this.count : Infinity;
  }
}
