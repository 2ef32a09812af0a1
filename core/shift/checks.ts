/**
 * Superposition checks (docs/conventions.md §4): the van Gurp–Palmen dispersion (δ against |G*|, needs no
 * horizontal shift; van Gurp & Palmen, Rheology Bulletin 67, 1998), the mismatch left after
 * shifting compared with the noise inside each curve, and the disagreement between shifts found
 * from different quantities. Each is expressed as a ratio to what noise alone would give, so the
 * grade does not depend on how noisy the instrument is.
 */
import type { Dataset } from '../data/types';
import { quantityValues } from './drivers';
import { buildProblem } from './build-problem';
import type { FitProblem } from './problem';
import { forEachPair } from './residuals';
import { ResidualBuffer } from './residual-buffer';
import { noiseLevel } from './noise';
import { StatsSink } from './stats-sink';
import { MAD_TO_SIGMA, medianAbs } from './robust';
import type { SuperpositionGrade } from './types';

/** Mismatch below this is immaterial for a master curve whatever the noise, decades (≈ 1 %). */
export const MISMATCH_FLOOR_DECADES = 0.005;
/** The same for δ, degrees. */
export const VGP_FLOOR_DEG = 0.3;

/** Grade thresholds on the ratios (calibrated on the synthetic sets in tests/core/shift). */
export const FAIR_RATIO = 1.8;
export const POOR_RATIO = 2.5;
/** Shifts from two quantities disagree when they differ by more than this and by > Z_LIMIT σ. */
export const DISAGREE_DECADES = 0.1;
export const DISAGREE_Z = 5;

export function noiseOfProblem(p: FitProblem, included: Uint8Array): number {
  const curves: { lx: Float64Array; y: Float64Array; w: Float64Array }[] = [];
  p.curves.forEach((c, k) => {
    if (included[k]) c.forEach((s) => curves.push(s));
  });
  return noiseLevel(curves);
}

export function mismatchRatio(robustSigma: number, noise: number): number | null {
  if (!Number.isFinite(robustSigma) || !Number.isFinite(noise)) return null;
  return robustSigma / Math.hypot(noise, MISMATCH_FLOOR_DECADES);
}

export interface VgpDispersion {
  rmsDeg: number;
  /** null when the noise of δ cannot be estimated (curves under 4 points). */
  ratio: number | null;
}

/**
 * δ (degrees) against log10(bT·|G*|) across the included isotherms, compared pairwise where their
 * |G*| ranges overlap; no horizontal shift is involved. `buffer`: residual storage to reuse.
 */
export function vanGurpPalmenDispersion(
  dataset: Dataset,
  active: number[],
  included: Uint8Array,
  log10bT: (k: number) => number,
  minOverlapPoints: number,
  buffer: ResidualBuffer = new ResidualBuffer(),
): VgpDispersion | null {
  const use = active.filter((_, c) => included[c]);
  const q0 = dataset.isotherms[0]?.quantities ?? {};
  if (use.length < 2 || !quantityValues('phaseAngle', q0) || !quantityValues('complexModulus', q0))
    return null;
  const p = buildProblem(dataset, {
    active: use,
    drivers: ['phaseAngle'],
    fixedLog10bT: null,
    joint: false,
    minOverlapPoints,
    maxPointsPerDecade: 40,
    abscissa: (k) => quantityValues('complexModulus', dataset.isotherms[k].quantities) ?? [],
    ordinate: (_q, v) => (v > 0 && v < 90 ? v : NaN),
    sigma: 1,
  });
  const theta = Float64Array.from(use, (k) => log10bT(k));
  const stats = new StatsSink(p);
  forEachPair(p, theta, (b) => stats.consume(b), buffer);
  if (stats.residuals.length === 0) return null;
  const rmsDeg = stats.rms();
  const robust = MAD_TO_SIGMA * medianAbs(stats.residuals);
  const noise = noiseLevel(p.curves.map((c) => c[0]));
  const ratio = Number.isFinite(noise) ? robust / Math.hypot(noise, VGP_FLOOR_DEG) : null;
  return { rmsDeg, ratio };
}

export function gradeOf(
  mismatch: number | null,
  vgp: number | null,
  disagreement: number | null,
  z: number | null,
): SuperpositionGrade {
  return gradeWithReasons(mismatch, vgp, disagreement, z, null).grade;
}

/**
 * Shifts from two quantities count as disagreeing for a `fair` grade only beyond this many
 * combined standard errors: the largest of many isotherms' differences is compared, and at 2.5
 * about one set in twenty of a simple material with ten isotherms would be called fair by chance
 * (Bonferroni, as in fit-offsets.ts). 4.5 rather than 4: on sparse curves (5–8 points per decade)
 * the G′-alone and G″-alone shifts differ by 1.1–1.3× their stated combined error (RMS over 120
 * seeded melt sets at 4 % noise with the true bT), so 4 stated errors are only about 3.3 actual
 * ones, and a simple melt with ten isotherms was called fair about once in 240 sets.
 */
export const FAIR_DISAGREE_Z = 4.5;

/** The grade and, for each criterion that set it, a sentence with its figure and threshold. */
export function gradeWithReasons(
  mismatch: number | null,
  vgp: number | null,
  disagreement: number | null,
  z: number | null,
  ignoredBTDecades: number | null,
  /**
   * A sentence when the moduli call, beyond their noise, for a vertical shift that no thermal
   * expansion gives (vertical.ts, judgeExpansion); else null. @default null
   */
  implausibleVertical: string | null = null,
): { grade: SuperpositionGrade; reasons: string[] } {
  const ratios = [mismatch, vgp].filter((r): r is number => r !== null && Number.isFinite(r));
  if (ratios.length === 0 && disagreement === null) return { grade: 'unknown', reasons: [] };
  const disagrees = (lim: number, zl: number): boolean =>
    disagreement !== null && z !== null && disagreement > lim && z > zl;
  const poor: string[] = [];
  const fair: string[] = [];
  const ratioReason = (name: string, r: number | null): void => {
    if (r === null || !Number.isFinite(r)) return;
    if (r > POOR_RATIO) poor.push(`${name} ${r.toFixed(1)}× the noise (poor above ${POOR_RATIO})`);
    else if (r > FAIR_RATIO)
      fair.push(`${name} ${r.toFixed(1)}× the noise (fair above ${FAIR_RATIO})`);
  };
  ratioReason('mismatch after shifting', mismatch);
  ratioReason('van Gurp–Palmen spread', vgp);
  const dis = (): string =>
    `shifts from different quantities differ by up to ${disagreement!.toFixed(2)} decades (${z!.toFixed(1)} standard errors)`;
  if (disagrees(DISAGREE_DECADES, DISAGREE_Z)) poor.push(dis());
  else if (disagrees(DISAGREE_DECADES / 2, FAIR_DISAGREE_Z)) fair.push(dis());
  if (implausibleVertical !== null) fair.push(implausibleVertical);
  if (ignoredBTDecades !== null)
    fair.push(
      `the data carry a vertical shift of up to ${ignoredBTDecades.toFixed(3)} decades that was not applied`,
    );
  if (poor.length) return { grade: 'poor', reasons: [...poor, ...fair] };
  if (fair.length) return { grade: 'fair', reasons: fair };
  return { grade: 'good', reasons: [] };
}
