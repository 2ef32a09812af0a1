/** What a joint refinement of the offsets (solve.ts) is told: loss, limits, locks, constraints. */
import type { LinearConstraint } from './kkt';
import type { ResidualBuffer } from './residual-buffer';
import type { RobustLoss } from './types';

export interface SolveSettings {
  loss: RobustLoss;
  scale: number;
  maxIterations: number;
  /** 1 = parameter kept at its starting value. */
  fixed: Uint8Array;
  constraints: LinearConstraint[];
  /** Stop when no parameter moves by more than this, decades. */
  toleranceDecades: number;
  /**
   * Optional Gaussian prior per parameter: 1/σ² (decades⁻²), 0 for none. Enters as
   * ½·scale²·θ²/σ², on the same footing as the standardised residuals.
   */
  prior?: Float64Array;
  /** Reused residual storage (optional). */
  buffer?: ResidualBuffer;
  /**
   * Compute the uncertainty at the optimum (a sandwich over every residual). Off for a pass that
   * is followed by another one. @default true
   */
  covariance?: boolean;
}
