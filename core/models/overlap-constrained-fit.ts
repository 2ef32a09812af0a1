/**
 * Model-constrained shifting: the constants of a WLF or Arrhenius law fitted directly to the
 * overlap mismatch of the isotherms, so every shift follows the law exactly (docs/conventions.md §2–§3).
 * The mismatch comes from the shift engine (core/shift: prepareOverlap/overlapMismatch) and is
 * passed in as a function, which keeps this module free of the engine's internals.
 * Minimised by Nelder–Mead on constants scaled by their starting values.
 * No standard errors are given here: the mismatch is not a likelihood with a known point count;
 * quote the band of the two-step fit (shifts, then the model) for uncertainty.
 */
import { minOf } from '../data/extent';
import { nelderMead } from './nelder-mead';
import { modelLog10aT } from './shift-model-eval';
import type { FitStatus } from './types';

export interface OverlapObjective {
  /** Temperatures of the isotherms, K, in the order `mismatch` expects log10 aT values. */
  temperaturesK: number[];
  referenceK: number;
  /** Overlap mismatch for one log10 aT per isotherm (lower is better). */
  mismatch: (log10aT: number[]) => number;
}

export interface ConstrainedFitOptions {
  kind: 'wlf' | 'arrhenius';
  /** Starting constants: WLF [C1, C2 (K)], Arrhenius [Ea (kJ/mol)] — e.g. from the two-step fit. */
  initial: number[];
  /** Objective evaluations allowed. @default 4000 */
  maxEvaluations?: number;
}

export interface ConstrainedFitResult extends FitStatus {
  kind: 'wlf' | 'arrhenius';
  referenceK: number;
  /** WLF [C1, C2 (K)] or Arrhenius [Ea (kJ/mol)]. */
  values: number[];
  /** The law's log10 aT for each isotherm, in the objective's order. */
  log10aT: number[];
  /** Mismatch at the fitted constants and at the starting constants. */
  mismatch: number;
  initialMismatch: number;
  evaluations: number;
}

/** Fits a shift law's constants to the overlap mismatch. */
export function fitModelToOverlap(
  objective: OverlapObjective,
  options: ConstrainedFitOptions,
): ConstrainedFitResult {
  const { kind, initial } = options;
  const p = kind === 'wlf' ? 2 : 1;
  if (kind !== 'wlf' && kind !== 'arrhenius')
    throw new RangeError(`kind must be 'wlf' or 'arrhenius', got ${String(kind)}`);
  if (initial.length !== p || initial.some((v) => !Number.isFinite(v) || v === 0)) {
    throw new RangeError(`initial must hold ${p} finite non-zero constant(s) for ${kind}`);
  }
  const T = objective.temperaturesK;
  const Tr = objective.referenceK;
  if (T.length < 2) throw new RangeError('A model-constrained fit needs at least two isotherms');
  const minC2 = Math.max(Tr - minOf(T), 0);
  if (kind === 'wlf' && !(initial[1] > minC2)) {
    throw new RangeError(
      `initial C2 must exceed ${minC2.toFixed(2)} K (the WLF pole must lie below the coldest isotherm)`,
    );
  }
  const shifts = (values: number[]): number[] => T.map((t) => modelLog10aT(kind, values, Tr, t));
  const unscale = (u: number[]): number[] => u.map((v, k) => v * initial[k]);
  const f = (u: number[]): number => {
    const values = unscale(u);
    if (kind === 'wlf' && !(values[1] > minC2)) return Infinity;
    return objective.mismatch(shifts(values));
  };
  const initialMismatch = f(initial.map(() => 1));
  const nm = nelderMead(
    f,
    initial.map(() => 1),
    { step: initial.map(() => 0.05), maxEvaluations: options.maxEvaluations ?? 4000 },
  );
  const values = unscale(nm.point);
  return {
    kind,
    referenceK: Tr,
    values,
    log10aT: shifts(values),
    mismatch: nm.value,
    initialMismatch,
    evaluations: nm.evaluations,
    converged: nm.converged,
    iterations: nm.iterations,
    reason: nm.reason,
  };
}
