/**
 * Accumulates the normal equations (curvature Σ w·ψ(z)/z·g gᵀ, gradient Σ w·ψ(z)/z·g r: the
 * iteratively reweighted least-squares system of the robust loss) from a residual buffer: each
 * residual touches at most four parameters (h_i, h_j, v_i, v_j), so no Jacobian is stored. The
 * curvature is kept in envelope storage (layout.ts), so a fit of thousands of isotherms needs
 * memory and time in proportion to their number, not its square.
 */
import type { ParameterLayout } from './layout';
import { parameterLayout } from './layout';
import type { FitProblem } from './problem';
import { parameterCount } from './problem';
import type { ResidualBuffer } from './residual-buffer';
import {
  LOSS_HUBER as HUBER_CODE,
  lossCode,
  robustRho as rhoImport,
  robustWeight as weightImport,
} from './robust';
import type { RobustLoss } from './types';
import { addPairCross as crossImport, addPairOuter as outerImport } from './pair-scatter';

// Local bindings (see residuals.ts): no getter per call under CommonJS transpilers.
const LOSS_HUBER = HUBER_CODE;
const robustRho = rhoImport;
const robustWeight = weightImport;
const addPairOuter = outerImport;
const addPairCross = crossImport;

export class NormalSink {
  readonly size: number;
  /** Curvature in envelope storage (positions of `layout`); empty without the matrix. */
  readonly a: Float64Array;
  /** Gradient, by parameter. */
  readonly g: Float64Array;
  /** Where the parameters sit in `a` (null without the matrix). */
  readonly layout: ParameterLayout | null;
  /** Σ ρ(z) over the residuals. */
  lossSum = 0;
  weightedSquares = 0;
  /** Measured points compared (an entry averaged from c points counts c times). */
  count = 0;
  /** Residuals (compared entries): the degrees of freedom of the residual variance. */
  residuals = 0;
  readonly isHuber: boolean;
  private readonly n: number;
  private readonly code: number;

  constructor(
    private readonly p: FitProblem,
    loss: RobustLoss,
    readonly scale: number,
    readonly withMatrix = true,
    layout: ParameterLayout | null = null,
  ) {
    this.size = parameterCount(p);
    this.n = p.curves.length;
    this.code = lossCode(loss);
    this.isHuber = this.code === LOSS_HUBER;
    this.layout = withMatrix ? (layout ?? parameterLayout(p)) : null;
    this.a = new Float64Array(this.layout ? this.layout.env.size : 0);
    this.g = new Float64Array(withMatrix ? this.size : 0);
  }

  consume(buf: ResidualBuffer): this {
    const { r: R, w: W, g: G, bin: BIN, owner: OW, other: OT, driver: DR } = buf;
    const l = this.layout!;
    const a = this.a;
    const grad = this.g;
    const code = this.code;
    const c = this.scale;
    const joint = this.p.joint;
    const betas = this.p.beta;
    const n = this.n;
    for (let m = 0; m < buf.size; m++) {
      const r = R[m];
      const w = W[m];
      // Standardised residual z = r·√w has the noise of one point; the robust loss acts on z.
      const z = r * Math.sqrt(w);
      const az = Math.abs(z);
      let rho: number;
      let psiOverZ: number;
      if (code === LOSS_HUBER) {
        rho = az <= c ? 0.5 * z * z : c * az - 0.5 * c * c;
        psiOverZ = az <= c ? 1 : c / az;
      } else {
        rho = robustRho(code, z, c);
        psiOverZ = robustWeight(code, z, c);
      }
      this.lossSum += rho;
      this.count += BIN[m];
      this.residuals++;
      const wt = w * psiOverZ;
      this.weightedSquares += wt * r * r;
      if (!this.withMatrix) continue;
      const i = OW[m];
      const j = OT[m];
      const gi = G[m];
      const wg = wt * gi;
      // Curvature and gradient with the same weight ψ(z)/z (see normal-walk.ts).
      const wgg = wg * gi;
      grad[i] += wg * r;
      grad[j] -= wg * r;
      addPairOuter(a, l, i, j, wgg);
      const beta = betas[DR[m]];
      if (joint && beta !== 0) {
        const vi = n + i;
        const vj = n + j;
        const wb = wt * beta;
        const wbb = wb * beta;
        const wgb = wg * beta;
        grad[vi] += wb * r;
        grad[vj] -= wb * r;
        addPairOuter(a, l, vi, vj, wbb);
        // Cross terms h–v: (g, −g) ⊗ (β, −β).
        addPairCross(a, l, i, j, vi, vj, wgb);
      }
    }
    return this;
  }

  rho(z: number): number {
    return robustRho(this.code, z, this.scale);
  }

  weight(z: number): number {
    return robustWeight(this.code, z, this.scale);
  }

  /** Mean robust loss per measured point in the overlaps: the objective minimised. */
  objective(): number {
    return this.count > 0 ? this.lossSum / this.count : Infinity;
  }
}
