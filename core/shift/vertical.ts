/**
 * Vertical shift bT per isotherm for the four modes:
 *  - 'none': bT = 1 (with the checks on, the data are still asked whether they carry a bT, so
 *    that a warning can say so);
 *  - 'density': entropic formula (density-shift.ts), no statistical error;
 *  - 'data' (oscillatory): the entropic law bT = Tref(1 + αV(T − Tref))/T (Ferry, Viscoelastic
 *    Properties of Polymers, 3rd ed., 1980, with ρ(T) = ρref/(1 + αV(T − Tref)); ρref cancels) with
 *    its one constant αV fitted to the moduli (profileExpansion). When no plausible αV fits, each
 *    isotherm keeps its own bT from δ against |G*| — δ carries no vertical shift, so the offset
 *    along log|G*| is log10 bT itself, free of aT (Mavridis & Shroff, Polym. Eng. Sci. 32, 1992; docs/conventions.md §2);
 *  - 'auto': the same fit, applied only when it lowers the mismatch beyond the noise
 *    (AUTO_CHI2_DROP), reaches AUTO_MIN_EFFECT_DECADES and gives a plausible αV. Relaxation and
 *    creep data cannot tell a vertical from a horizontal shift, so 'auto' keeps bT = 1 there
 *    unless a density is given.
 * Relaxation or creep with 'data' is refused with a ShiftOptionsError (see below).
 */
import type { Dataset } from '../data/types';
import { buildProblem } from './build-problem';
import { densityLog10bT } from './density-shift';
import { betaOf, quantityValues } from './drivers';
import type { FitProblem } from './problem';
import type { QuantityId } from '../data/types';
import { fitOffsets, robustFitSettings } from './fit-offsets';
import type { OffsetFit } from './fit-offsets';
import type { ResolvedShiftOptions, VerticalChoice } from './types';
import { ShiftOptionsError } from './options';

export interface VerticalOutcome {
  /** Per dataset index; NaN where unknown. */
  log10bT: number[];
  stdErr: number[];
  /** True when bT must be fitted jointly with aT. */
  joint: boolean;
  vgpFit: OffsetFit | null;
  extrapolatedK: number[];
  /** The mode applied and why. */
  choice: VerticalChoice;
  /** True when bT is a free value per isotherm (isotherms without one are left out). */
  free: boolean;
}

/** Largest |log10 bT| between neighbours searched by the van Gurp–Palmen scan, decades. */
const VGP_MAX_OFFSET = 1;
/** 'auto' applies bT only when it reaches at least this many decades somewhere (≈ 0.5 %). */
export const AUTO_MIN_EFFECT_DECADES = 0.002;

/** log10 bT of the entropic law with expansion αV (ρref cancels). */
export function entropicLog10bT(T: number, referenceK: number, alpha: number): number {
  return Math.log10((referenceK * (1 + alpha * (T - referenceK))) / T);
}

/** The problem with each curve's log ordinate moved by β_q·log10 bT (the same binning). */
function withOffsets(
  p: FitProblem,
  drivers: QuantityId[],
  active: number[],
  log10bT: number[],
): FitProblem {
  const beta = drivers.map(betaOf);
  return {
    ...p,
    curves: p.curves.map((series, c) =>
      series.map((ser, d) => {
        const v = beta[d] * log10bT[active[c]];
        if (v === 0) return ser;
        // Plain loops: Float64Array.from with a mapping function is several times slower.
        const y = new Float64Array(ser.y.length);
        for (let i = 0; i < y.length; i++) y[i] = ser.y[i] + v;
        const ySorted = new Float64Array(ser.ySorted.length);
        for (let i = 0; i < ySorted.length; i++) ySorted[i] = ser.ySorted[i] + v;
        return { ...ser, y, ySorted };
      }),
    ),
  };
}

/** Result of the profile of the horizontal fit's mismatch over αV. */
export interface ProfileFit {
  expansionPerK: number;
  expansionStdErr: number;
  /** (Σw r² without bT − Σw r² at the best αV) / s²: the evidence for a bT. */
  chi2Drop: number;
  z: number;
  effectDecades: number;
}

/** αV outside this range (1/K) is not a polymer's expansion: a bT so found is not trusted. */
export const PLAUSIBLE_EXPANSION_PER_K: [number, number] = [0, 2e-3];
/**
 * 'auto' applies bT when the drop of the mismatch exceeds this (in units of the residual
 * variance). Pair residuals use every point twice, so the drop is about twice a χ² with one degree
 * of freedom: 25 is about 3.5 standard errors. Calibrated on the seeded sets of
 * tests/core/shift/vertical-auto.test.ts.
 */
export const AUTO_CHI2_DROP = 25;
/**
 * … and when the fitted αV lies more than this many of its standard errors from bT ≡ 1. Without
 * a bT, |z| stayed below 4.7 on 80 seeded melt sets (2 % and 8 % noise); with the entropic bT of
 * αV = 6·10⁻⁴ /K it was 22–47 at 2 % and mostly above 5 at 8 % (vertical-auto.test.ts).
 */
export const AUTO_Z = 5;

/**
 * Profile of the horizontal fit (the user's drivers, usually G′ and G″) over the one constant αV
 * of the entropic law: each αV fixes bT for every isotherm, aT is re-fitted (warm start, outliers
 * of the first fit kept out), and a parabola through the weighted squares finds the best αV. One
 * global constant cannot trade off against the shift of each isotherm the way a free bT per
 * isotherm does, so this is as well determined as the curves allow (G′ and G″ have different
 * slopes, so a vertical shift is not a horizontal one).
 */
export function profileExpansion(
  dataset: Dataset,
  active: number[],
  s: ResolvedShiftOptions,
): ProfileFit | null {
  if (active.length < 3 || s.drivers.every((q) => q === 'tanDelta' || q === 'phaseAngle'))
    return null;
  const temps = dataset.isotherms.map((i) => i.temperatureK);
  const alpha0 = 1 / s.referenceK;
  let dropped: Set<number>[] | undefined;
  let start: Float64Array | null = null;
  const build = (d: Set<number>[] | undefined): FitProblem =>
    buildProblem(dataset, {
      active,
      drivers: s.drivers,
      fixedLog10bT: null,
      joint: false,
      minOverlapPoints: s.minOverlapPoints,
      maxPointsPerDecade: s.maxPointsPerDecade,
      dropped: d,
    });
  let base: FitProblem | null = null;
  const run = (beta: number, first: boolean): { ss: number; s2: number } | null => {
    const log10bT = temps.map((T) => entropicLog10bT(T, s.referenceK, alpha0 + beta));
    const fit = fitOffsets({
      // A fixed bT only moves each curve's log ordinate by a constant: the binned curves are
      // built once (without the outliers of the first fit) and offset for each trial αV.
      build: (d) => {
        if (first) return withOffsets(build(d), s.drivers, active, log10bT);
        base ??= build(dropped);
        return withOffsets(base, s.drivers, active, log10bT);
      },
      temperaturesK: active.map((k) => temps[k]),
      referenceK: s.referenceK,
      locked: new Map(),
      initial: start,
      ...robustFitSettings(s),
      flagOutliers: first && s.flagOutliers,
      // Only the mismatch is compared between trial αV: no standard errors needed.
      uncertainty: false,
      scanStep: s.scanStepDecades,
      directionAllowance: s.reverseAllowanceDecades,
      maxOffset: Infinity,
    });
    if (first) {
      dropped = fit.outliers;
      start = fit.theta;
    }
    if (!(fit.weightedSquares > 0) || fit.included.reduce((a, b) => a + b, 0) < 3) return null;
    return { ss: fit.weightedSquares, s2: fit.residualVariance };
  };
  // The first fit finds the start and the outliers; the mismatch without bT is then taken from a
  // re-fit under the same conditions as the others (same points, warm start), so that the
  // differences between them are differences of bT alone.
  if (!run(0, true)) return null;
  const f0 = run(0, false);
  if (!f0) return null;
  const h = 1.5e-3;
  const f1 = run(-h, false);
  const f2 = run(h, false);
  if (!f1 || !f2) return null;
  // Parabola through β = −h, 0, h.
  const a = (f1.ss + f2.ss - 2 * f0.ss) / (2 * h * h);
  if (!(a > 0)) return null;
  const b = (f2.ss - f1.ss) / (2 * h);
  let beta = Math.max(-2 * alpha0, Math.min(2 * alpha0, -b / (2 * a)));
  let fb = run(beta, false);
  if (!fb) return null;
  // The mismatch is not exactly quadratic over ±1.5·10⁻³ /K: a second parabola, close around
  // the first estimate, removes most of that bias.
  let a2 = a;
  const h2 = Math.min(h, Math.max(2e-4, 3 * Math.sqrt((2 * fb.s2) / a)));
  const g1 = run(beta - h2, false);
  const g2 = run(beta + h2, false);
  if (g1 && g2) {
    const c = (g1.ss + g2.ss - 2 * fb.ss) / (2 * h2 * h2);
    if (c > 0) {
      const step = Math.max(-h2, Math.min(h2, -(g2.ss - g1.ss) / (2 * h2) / (2 * c)));
      const g = run(beta + step, false);
      if (g && g.ss <= fb.ss) {
        beta += step;
        fb = g;
      }
      a2 = c;
    }
  }
  let best = fb;
  if (f0.ss < fb.ss) {
    best = f0;
    beta = 0;
  }
  // The pair residuals count each point twice (docs/shifting.md, uncertainty): twice the variance.
  const se = Math.sqrt((2 * best.s2) / a2);
  const alpha = alpha0 + beta;
  let effect = 0;
  for (const k of active)
    effect = Math.max(effect, Math.abs(entropicLog10bT(temps[k], s.referenceK, alpha)));
  return {
    expansionPerK: alpha,
    expansionStdErr: se,
    chi2Drop: (f0.ss - best.ss) / best.s2,
    z: beta / se,
    effectDecades: effect,
  };
}

function vgpPossible(dataset: Dataset, active: number[]): boolean {
  return (
    dataset.testKind === 'oscillatory' &&
    active.length > 0 &&
    active.every((k) => {
      const q = dataset.isotherms[k].quantities;
      return quantityValues('complexModulus', q) && quantityValues('tanDelta', q);
    })
  );
}

function vgpOffsets(dataset: Dataset, active: number[], s: ResolvedShiftOptions): OffsetFit {
  const temps = dataset.isotherms.map((i) => i.temperatureK);
  return fitOffsets({
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
}

const fmtAlpha = (a: number): string => `${(a * 1e4).toFixed(2)}·10⁻⁴ /K`;

export function verticalShift(
  dataset: Dataset,
  active: number[],
  s: ResolvedShiftOptions,
): VerticalOutcome {
  const n = dataset.isotherms.length;
  const temps = dataset.isotherms.map((i) => i.temperatureK);
  const zeros = (): number[] => new Array<number>(n).fill(0);
  const none = (reason: string, extra: Partial<VerticalChoice> = {}): VerticalOutcome => ({
    log10bT: zeros(),
    stdErr: zeros(),
    joint: false,
    vgpFit: null,
    extrapolatedK: [],
    free: false,
    choice: {
      requested: s.vertical,
      chosen: 'none',
      reason,
      expansionPerK: null,
      expansionStdErr: null,
      effectDecades: null,
      z: null,
      ...extra,
    },
  });
  const densityMode = (reason: string): VerticalOutcome => {
    const d = densityLog10bT(temps, s.referenceK, s.density!);
    const alpha = s.density!.kind === 'expansion' ? s.density!.volumetricExpansionPerK : null;
    return {
      log10bT: d.log10bT,
      stdErr: zeros(),
      joint: false,
      vgpFit: null,
      extrapolatedK: d.extrapolatedK,
      free: false,
      choice: {
        requested: s.vertical,
        chosen: 'density',
        reason,
        expansionPerK: alpha,
        expansionStdErr: null,
        effectDecades: largestAbs(d.log10bT),
        z: null,
      },
    };
  };
  if (s.vertical === 'density') return densityMode('requested: bT from density');
  if (s.vertical === 'auto' && s.density)
    return densityMode('a density was given, so bT follows from it (entropic, Tref·ρref/(T·ρ))');
  const canVgp = vgpPossible(dataset, active);
  if (s.vertical === 'none') {
    if (!s.checks || !canVgp || active.length < 3) return none('requested: no vertical shift');
    // Forced off: still look whether the data disagree, to say so (the size in decades).
    const p = profileExpansion(dataset, active, s);
    return none('requested: no vertical shift', p ? profileStats(p) : {});
  }
  if (!canVgp) {
    if (s.vertical === 'auto')
      return none(
        dataset.testKind === 'oscillatory'
          ? 'bT = 1: the data lack δ and |G*| (or G′ and G″), from which bT could be estimated'
          : `bT = 1: ${dataset.testKind} data cannot tell a vertical shift from a horizontal one (a power-law curve moves onto itself either way), so bT is not estimated from them; give the expansion coefficient αV (vertical 'density') if the material needs one`,
      );
    // A joint free fit of aT and bT on relaxation or creep curves is ill-posed wherever the curve
    // is close to a power law (a horizontal and a vertical shift then look alike): on our
    // synthetic sets it ran away by decades. It is therefore not offered.
    throw new ShiftOptionsError(
      "vertical 'data' needs oscillatory data with G' and G'' (or δ and |G*|) in every isotherm, so that bT can be found from δ against |G*|; for relaxation or creep data give a density (vertical 'density') or use 'none'.",
    );
  }
  const p = profileExpansion(dataset, active, s);
  const plausible =
    p !== null &&
    p.expansionPerK >= PLAUSIBLE_EXPANSION_PER_K[0] &&
    p.expansionPerK <= PLAUSIBLE_EXPANSION_PER_K[1];
  if (s.vertical === 'auto') {
    if (!p)
      return none(
        'bT = 1: too few isotherms overlap (or only tan δ drives the shift) to tell whether a vertical shift is needed',
      );
    const evidence = `with bT the mismatch of the shifted curves drops by ${p.chi2Drop.toFixed(1)} residual variances (${AUTO_CHI2_DROP} needed) and αV lies ${Math.abs(p.z).toFixed(1)} standard errors from bT ≡ 1 (${AUTO_Z} needed); bT would reach ${p.effectDecades.toFixed(3)} decades`;
    if (
      !(p.chi2Drop > AUTO_CHI2_DROP) ||
      !(Math.abs(p.z) > AUTO_Z) ||
      p.effectDecades < AUTO_MIN_EFFECT_DECADES
    )
      return none(`bT = 1: no vertical shift beyond the noise (${evidence})`, profileStats(p));
    if (!plausible)
      return none(
        `bT = 1: a vertical shift would lower the mismatch (${evidence}) but needs αV = ${fmtAlpha(p.expansionPerK)}, outside what polymers show (0–20·10⁻⁴ /K): the isotherms may not superpose (check the van Gurp–Palmen plot)`,
        profileStats(p),
      );
  }
  if (p && (s.vertical === 'auto' || plausible)) {
    const log10bT = temps.map((T) => entropicLog10bT(T, s.referenceK, p.expansionPerK));
    const stdErr = temps.map(
      (T) =>
        Math.abs((T - s.referenceK) / (Math.LN10 * (1 + p.expansionPerK * (T - s.referenceK)))) *
        p.expansionStdErr,
    );
    const what = `the entropic law bT = Tref(1 + αV(T − Tref))/T with αV = ${fmtAlpha(p.expansionPerK)} ± ${fmtAlpha(p.expansionStdErr)} fitted to the moduli`;
    return {
      log10bT,
      stdErr,
      joint: false,
      vgpFit: null,
      extrapolatedK: [],
      free: false,
      choice: {
        requested: s.vertical,
        chosen: 'data',
        reason:
          s.vertical === 'auto'
            ? `bT from the data: with a vertical shift the mismatch of the shifted curves drops by ${p.chi2Drop.toFixed(1)} residual variances (${AUTO_CHI2_DROP} needed) and αV lies ${Math.abs(p.z).toFixed(1)} standard errors from bT ≡ 1 (${AUTO_Z} needed); bT reaches ${p.effectDecades.toFixed(3)} decades; ${what}`
            : `requested: bT from the data; ${what}`,
        ...profileStats(p),
      },
    };
  }
  // Explicit 'data' where one αV does not fit: each isotherm's own bT from δ against |G*|.
  const fit = vgpOffsets(dataset, active, s);
  const free = new Array<number>(n).fill(NaN);
  const freeErr = new Array<number>(n).fill(NaN);
  active.forEach((k, c) => {
    if (!fit.included[c]) return;
    free[k] = fit.theta[c];
    freeErr[k] = fit.stdErr[c];
  });
  return {
    log10bT: free,
    stdErr: freeErr,
    joint: false,
    vgpFit: fit,
    extrapolatedK: [],
    free: true,
    choice: {
      requested: s.vertical,
      chosen: 'data',
      reason: `requested: bT from the data; ${p ? `one αV does not describe the data (αV = ${fmtAlpha(p.expansionPerK)})` : 'no αV could be fitted'}, so each isotherm keeps its own bT from δ against |G*|`,
      expansionPerK: null,
      expansionStdErr: null,
      effectDecades: largestAbs(free),
      z: null,
    },
  };
}

function profileStats(
  p: ProfileFit,
): Pick<VerticalChoice, 'expansionPerK' | 'expansionStdErr' | 'effectDecades' | 'z' | 'chi2Drop'> {
  return {
    expansionPerK: p.expansionPerK,
    expansionStdErr: p.expansionStdErr,
    effectDecades: p.effectDecades,
    z: p.z,
    chi2Drop: p.chi2Drop,
  };
}

/** Largest |v| over the finite entries (0 when none). */
function largestAbs(values: number[]): number {
  let m = 0;
  for (const v of values) if (Number.isFinite(v)) m = Math.max(m, Math.abs(v));
  return m;
}
