/**
 * Vertical shift bT per isotherm for the three modes:
 *  - 'none': bT = 1;
 *  - 'density': entropic formula (density-shift.ts), no statistical error;
 *  - 'data' with δ and |G*| available (oscillatory): shift log tan δ along log|G*| — δ carries no
 *    vertical shift, so the offset along log|G*| is log10 bT itself, free of aT (Mavridis & Shroff,
 *    Polym. Eng. Sci. 32, 1992; docs/conventions.md §2);
 *  - 'data' otherwise (relaxation, creep): refused with a ShiftOptionsError (see below).
 */
import type { Dataset } from '../data/types';
import { buildProblem } from './build-problem';
import { densityLog10bT } from './density-shift';
import { quantityValues } from './drivers';
import { fitOffsets, robustFitSettings } from './fit-offsets';
import type { OffsetFit } from './fit-offsets';
import type { ResolvedShiftOptions } from './types';
import { ShiftOptionsError } from './options';

export interface VerticalOutcome {
  /** Per dataset index; NaN where unknown. */
  log10bT: number[];
  stdErr: number[];
  /** True when bT must be fitted jointly with aT. */
  joint: boolean;
  vgpFit: OffsetFit | null;
  extrapolatedK: number[];
}

/** Largest |log10 bT| between neighbours searched by the van Gurp–Palmen scan, decades. */
const VGP_MAX_OFFSET = 1;

export function verticalShift(
  dataset: Dataset,
  active: number[],
  s: ResolvedShiftOptions,
): VerticalOutcome {
  const n = dataset.isotherms.length;
  const temps = dataset.isotherms.map((i) => i.temperatureK);
  const zeros = (): number[] => new Array<number>(n).fill(0);
  if (s.vertical === 'none')
    return { log10bT: zeros(), stdErr: zeros(), joint: false, vgpFit: null, extrapolatedK: [] };
  if (s.vertical === 'density') {
    const d = densityLog10bT(temps, s.referenceK, s.density!);
    return {
      log10bT: d.log10bT,
      stdErr: zeros(),
      joint: false,
      vgpFit: null,
      extrapolatedK: d.extrapolatedK,
    };
  }
  const canVgp =
    dataset.testKind === 'oscillatory' &&
    active.every((k) => {
      const q = dataset.isotherms[k].quantities;
      return quantityValues('complexModulus', q) && quantityValues('tanDelta', q);
    });
  if (!canVgp)
    // A joint free fit of aT and bT on relaxation or creep curves is ill-posed wherever the curve
    // is close to a power law (a horizontal and a vertical shift then look alike): on our
    // synthetic sets it ran away by decades. It is therefore not offered.
    throw new ShiftOptionsError(
      "vertical 'data' needs oscillatory data with G' and G'' (or δ and |G*|) in every isotherm, so that bT can be found from δ against |G*|; for relaxation or creep data give a density (vertical 'density') or use 'none'.",
    );
  const fit = fitOffsets({
    build: (dropped) =>
      buildProblem(dataset, {
        active,
        drivers: ['tanDelta'],
        fixedLog10bT: null,
        joint: false,
        minOverlapPoints: s.minOverlapPoints,
        maxPointsPerDecade: s.maxPointsPerDecade,
        dropped,
        abscissa: (k) => quantityValues('complexModulus', dataset.isotherms[k].quantities) ?? [],
        sigma: 1,
      }),
    temperaturesK: active.map((k) => temps[k]),
    referenceK: s.referenceK,
    locked: new Map(),
    initial: null,
    ...robustFitSettings(s),
    scanStep: s.scanStepDecades / 5,
    directionAllowance: null,
    maxOffset: VGP_MAX_OFFSET,
  });
  const log10bT = new Array<number>(n).fill(NaN);
  const stdErr = new Array<number>(n).fill(NaN);
  active.forEach((k, c) => {
    if (!fit.included[c]) return;
    log10bT[k] = fit.theta[c];
    stdErr[k] = fit.stdErr[c];
  });
  return { log10bT, stdErr, joint: false, vgpFit: fit, extrapolatedK: [] };
}
