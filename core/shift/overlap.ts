/**
 * Low-level objective for model-constrained shifting: prepare the overlap problem once, then
 * evaluate the mismatch for any set of log10 aT values — e.g. those of a WLF or Arrhenius law whose
 * constants are being fitted directly to the data.
 */
import type { Dataset } from '../data/types';
import { buildProblem } from './build-problem';
import { activeIsotherms } from './active';
import { NormalSink } from './normal-equations';
import { resolveShiftOptions, ShiftOptionsError } from './options';
import type { FitProblem } from './problem';
import { forEachPair } from './residuals';
import type { ShiftOptions } from './types';
import { verticalShift } from './vertical';

/** Mismatch added for each isotherm pushed out of every overlap it could have, decades². */
export const NO_OVERLAP_PENALTY = 1;

export interface PreparedOverlap {
  /** Isotherm ids in the order overlapMismatch expects log10 aT values. */
  ids: string[];
  temperaturesK: number[];
  referenceK: number;
  /** log10 bT applied to each isotherm (0 with vertical 'none'). */
  log10bT: number[];
  problem: FitProblem;
  /** Per isotherm: has at least one isotherm it could overlap. */
  hasPartner: boolean[];
}

export function prepareOverlap(dataset: Dataset, options: ShiftOptions): PreparedOverlap {
  const s = resolveShiftOptions(dataset, options);
  let active = activeIsotherms(dataset, s, []);
  const vertical = verticalShift(dataset, active, s);
  if (vertical.joint)
    throw new ShiftOptionsError(
      "prepareOverlap() needs vertical 'none', 'density', or 'data' with δ and |G*| available (a free joint bT has no fixed objective).",
    );
  active = active.filter((k) => Number.isFinite(vertical.log10bT[k]));
  const problem = buildProblem(dataset, {
    active,
    drivers: s.drivers,
    fixedLog10bT: vertical.log10bT,
    joint: false,
    minOverlapPoints: s.minOverlapPoints,
    maxPointsPerDecade: s.maxPointsPerDecade,
  });
  const hasPartner = active.map(() => false);
  for (let q = 0; q < problem.pairs.length; q++) hasPartner[problem.pairs[q]] = true;
  return {
    ids: active.map((k) => dataset.isotherms[k].id),
    temperaturesK: active.map((k) => dataset.isotherms[k].temperatureK),
    referenceK: s.referenceK,
    log10bT: active.map((k) => vertical.log10bT[k]),
    problem,
    hasPartner,
  };
}

/**
 * Mean squared standardised mismatch over all overlaps (decades², the noise-weighted residuals of
 * residuals.ts, no robust loss), plus NO_OVERLAP_PENALTY for each isotherm that could overlap
 * another but does not at these shifts — so a model cannot improve its score by pushing curves
 * apart. `log10aT` follows `prepared.ids`.
 */
export function overlapMismatch(prepared: PreparedOverlap, log10aT: ArrayLike<number>): number {
  if (log10aT.length !== prepared.ids.length)
    throw new ShiftOptionsError(
      `overlapMismatch() needs ${prepared.ids.length} log10aT values (one per prepared isotherm), got ${log10aT.length}.`,
    );
  const sink = new NormalSink(prepared.problem, 'none', 1, false);
  const touched = new Uint8Array(prepared.ids.length);
  forEachPair(prepared.problem, log10aT, (buf) => {
    sink.consume(buf);
    for (let m = 0; m < buf.size; m++) {
      touched[buf.owner[m]] = 1;
      touched[buf.other[m]] = 1;
    }
  });
  let penalty = 0;
  prepared.hasPartner.forEach((h, k) => {
    if (h && !touched[k]) penalty += NO_OVERLAP_PENALTY;
  });
  const mean = sink.residuals > 0 ? (2 * sink.lossSum) / sink.residuals : 0;
  return mean + penalty;
}
