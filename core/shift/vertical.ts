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
 *  - 'auto': the same fit, applied only when αV lies AUTO_Z standard errors below bT ≡ 1, bT
 *    reaches AUTO_MIN_EFFECT_DECADES and αV is plausible (judgeExpansion). Relaxation and
 *    creep data cannot tell a vertical from a horizontal shift, so 'auto' keeps bT = 1 there
 *    unless a density is given.
 * Relaxation or creep with 'data' is refused with a ShiftOptionsError (see below).
 */
import type { Dataset } from '../data/types';
import { buildProblem } from './build-problem';
import { densityLog10bT } from './density-shift';
import { quantityValues } from './drivers';
import { profileExpansion } from './expansion-profile';
import { entropicLog10bT, entropicLog10bTSlope } from '../data/reduction';
import type { ProfileFit } from './expansion-profile';
import { fitOffsets, robustFitSettings } from './fit-offsets';
import type { OffsetFit } from './fit-offsets';
import type { ResolvedShiftOptions, VerticalChoice } from './types';
import { ShiftOptionsError } from './options';

export { profileExpansion } from './expansion-profile';
export { entropicLog10bT } from '../data/reduction';
export type { ProfileFit } from './expansion-profile';

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
  /** True when the data carry a bT by the 'auto' rule (also when it was not applied). */
  carriesBT: boolean;
  /**
   * A sentence when the moduli call, beyond their noise, for a bT that needs an αV no polymer
   * has (a symptom of thermorheological complexity, for the superposition grade); else null.
   */
  implausible: string | null;
  /**
   * With bT from one fitted αV: per dataset index ∂log10 aT/∂αV (decades·K) and αV's variance,
   * to carry αV's uncertainty into the shifts' covariance; null otherwise.
   */
  expansionSensitivity: { perIsotherm: number[]; variance: number } | null;
  /** Per dataset index: log10 aT found with this bT by the profile (NaN unknown), a warm start. */
  startLog10aT: number[] | null;
}

/** Largest |log10 bT| between neighbours searched by the van Gurp–Palmen scan, decades. */
const VGP_MAX_OFFSET = 1;
/** 'auto' applies bT only when it reaches at least this many decades somewhere (≈ 0.5 %). */
export const AUTO_MIN_EFFECT_DECADES = 0.002;

/** αV outside this range (1/K) is not a polymer's expansion: a bT so found is not trusted. */
export const PLAUSIBLE_EXPANSION_PER_K: [number, number] = [0, 2e-3];
/**
 * An estimate of αV more than this many of its standard errors outside PLAUSIBLE_EXPANSION_PER_K
 * is implausible (the isotherms may not superpose); one within it is taken at the nearest end of
 * the range (the profile is close to a parabola, so that is the best αV inside the range).
 */
export const PLAUSIBLE_MARGIN_STD_ERR = 3;
/**
 * 'auto' applies bT when αV lies more than this many standard errors below 1/Tref (bT ≡ 1). The
 * test is one-sided: a polymer's αV is below 1/T (αV·T ≈ 0.2–0.3, common practice), so a bT
 * always makes bT < 1 above Tref. The standard error propagates the point noise through every
 * pair comparison (expansion-profile.ts). Measured without a bT: z scattered with an RMS of
 * 1.0–1.1 and |z| ≤ 3.3 on 120 seeded melt sets (Arrhenius and WLF melts of
 * tests/core/shift/fixtures.ts, 5 and 8 points per decade, 2 % noise), |z| ≤ 2.3 on the 80 sets of
 * tests/core/shift/vertical-auto.test.ts; so 4 is crossed by noise alone about once in 10,000
 * sets. With the entropic bT of αV = 6·10⁻⁴ /K, z lay at −14 to −28 at 2 % noise and −1.7 to
 * −8.5 at 8 % on those melts.
 */
export const AUTO_Z = 4;

/** What the data's αV means: the value applied, whether it is plausible, whether bT is needed. */
export interface ExpansionJudgement {
  /** The fitted αV taken into PLAUSIBLE_EXPANSION_PER_K, 1/K. */
  applied: number;
  plausible: boolean;
  /** Largest |log10 bT| with the applied αV over the measured temperatures, decades. */
  effectDecades: number;
  /** True when 'auto' applies bT from the data (significant, plausible and large enough). */
  carriesBT: boolean;
}

export function judgeExpansion(
  p: ProfileFit,
  temperaturesK: number[],
  referenceK: number,
): ExpansionJudgement {
  const [lo, hi] = PLAUSIBLE_EXPANSION_PER_K;
  const margin = PLAUSIBLE_MARGIN_STD_ERR * p.expansionStdErr;
  const plausible = p.expansionPerK >= lo - margin && p.expansionPerK <= hi + margin;
  const applied = Math.max(lo, Math.min(hi, p.expansionPerK));
  let effectDecades = 0;
  for (const T of temperaturesK)
    effectDecades = Math.max(effectDecades, Math.abs(entropicLog10bT(T, referenceK, applied)));
  return {
    applied,
    plausible,
    effectDecades,
    carriesBT: plausible && p.z < -AUTO_Z && effectDecades >= AUTO_MIN_EFFECT_DECADES,
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

/**
 * One outcome: `fields` that differ from a plain bT (no joint fit, no free per-isotherm bT, no
 * αV sensitivity or warm start; bT = 1 unless given), with the choice `chosen` and its reason.
 */
function outcome(
  s: ResolvedShiftOptions,
  n: number,
  chosen: VerticalChoice['chosen'],
  reason: string,
  choice: Partial<VerticalChoice>,
  fields: Partial<Omit<VerticalOutcome, 'choice'>> = {},
): VerticalOutcome {
  return {
    log10bT: new Array<number>(n).fill(0),
    stdErr: new Array<number>(n).fill(0),
    joint: false,
    vgpFit: null,
    extrapolatedK: [],
    free: false,
    carriesBT: false,
    implausible: null,
    expansionSensitivity: null,
    startLog10aT: null,
    ...fields,
    choice: {
      requested: s.vertical,
      chosen,
      reason,
      expansionPerK: null,
      expansionStdErr: null,
      effectDecades: null,
      z: null,
      ...choice,
    },
  };
}

/** Entropic log10 bT at each temperature for one αV, with its s.e. from αV's (NaN when none). */
function entropicFromExpansion(
  temps: number[],
  referenceK: number,
  alpha: number,
  alphaStdErr: number | null,
): { log10bT: number[]; stdErr: number[] } {
  return {
    log10bT: temps.map((T) => entropicLog10bT(T, referenceK, alpha)),
    stdErr: temps.map((T) =>
      alphaStdErr === null
        ? NaN
        : Math.abs(entropicLog10bTSlope(T, referenceK, alpha)) * alphaStdErr,
    ),
  };
}

export function verticalShift(
  dataset: Dataset,
  active: number[],
  s: ResolvedShiftOptions,
): VerticalOutcome {
  const n = dataset.isotherms.length;
  const temps = dataset.isotherms.map((i) => i.temperatureK);
  const activeTemps = active.map((k) => temps[k]);
  const none = (
    reason: string,
    extra: Partial<VerticalChoice> = {},
    fields: Partial<Omit<VerticalOutcome, 'choice'>> = {},
  ): VerticalOutcome => outcome(s, n, 'none', reason, extra, fields);
  const densityMode = (reason: string): VerticalOutcome => {
    const d = densityLog10bT(temps, s.referenceK, s.density!);
    const alpha = s.density!.kind === 'expansion' ? s.density!.volumetricExpansionPerK : null;
    return outcome(
      s,
      n,
      'density',
      reason,
      { expansionPerK: alpha, effectDecades: largestAbs(d.log10bT) },
      { log10bT: d.log10bT, extrapolatedK: d.extrapolatedK },
    );
  };
  if (s.vertical === 'density') return densityMode('requested: bT from density');
  if (s.vertical === 'auto' && s.density)
    return densityMode('a density was given, so bT follows from it (entropic, Tref·ρref/(T·ρ))');
  const canVgp = vgpPossible(dataset, active);
  if (s.vertical === 'none') {
    if (!s.checks || !canVgp || active.length < 3) return none('requested: no vertical shift');
    // Forced off: still look whether the data disagree, to say so (the size in decades).
    const p = profileExpansion(dataset, active, s);
    if (!p) return none('requested: no vertical shift');
    const j = judgeExpansion(p, activeTemps, s.referenceK);
    return none('requested: no vertical shift', profileStats(p, j), {
      carriesBT: j.carriesBT,
      implausible: implausibleSentence(p, j),
    });
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
  if (s.heldExpansion?.expansionPerK === null)
    return none(
      'bT = 1 held from the last full fit (live re-fit; whether the data need a bT is judged again when the change is complete)',
    );
  if (s.heldExpansion && s.heldExpansion.expansionPerK !== null) {
    // A live re-fit keeps the αV of the last full fit: bT changes only when the curve is released.
    const { expansionPerK: alpha, expansionStdErr: se } = s.heldExpansion;
    const bT = entropicFromExpansion(temps, s.referenceK, alpha, se);
    return outcome(
      s,
      n,
      'data',
      `bT from the entropic law bT = Tref(1 + αV(T − Tref))/T with αV = ${fmtAlpha(alpha)} held from the last full fit (live re-fit; αV is fitted again when the change is complete)`,
      {
        expansionPerK: alpha,
        expansionStdErr: se,
        effectDecades: largestAbs(active.map((k) => bT.log10bT[k])),
      },
      { ...bT, carriesBT: true },
    );
  }
  const p = profileExpansion(dataset, active, s);
  const j = p ? judgeExpansion(p, activeTemps, s.referenceK) : null;
  if (s.vertical === 'auto') {
    if (!p || !j)
      return none(
        'bT = 1: too few isotherms overlap (or only tan δ drives the shift) to tell whether a vertical shift is needed',
      );
    const evidence = `αV = ${fmtAlpha(p.expansionPerK)} ± ${fmtAlpha(p.expansionStdErr)} fitted to the moduli lies ${(-p.z).toFixed(1)} standard errors below 1/Tref, where bT ≡ 1 (${AUTO_Z} needed), and the mismatch of the shifted curves drops by ${p.chi2Drop.toFixed(1)} residual variances; bT would reach ${j.effectDecades.toFixed(3)} decades`;
    if (!j.plausible && p.z < -AUTO_Z)
      return none(
        `bT = 1: a vertical shift would lower the mismatch (${evidence}) but needs αV outside what polymers show (0–20·10⁻⁴ /K): the isotherms may not superpose (check the van Gurp–Palmen plot)`,
        profileStats(p, j),
        { implausible: implausibleSentence(p, j) },
      );
    if (!j.carriesBT)
      return none(`bT = 1: no vertical shift beyond the noise (${evidence})`, profileStats(p, j));
  }
  if (p && j && (s.vertical === 'auto' || j.plausible)) {
    const alpha = j.applied;
    const bound =
      alpha !== p.expansionPerK
        ? ` (the fit gave ${fmtAlpha(p.expansionPerK)}, within ${PLAUSIBLE_MARGIN_STD_ERR} standard errors of the plausible range 0–20·10⁻⁴ /K, so its nearest end is used)`
        : '';
    const what = `the entropic law bT = Tref(1 + αV(T − Tref))/T with αV = ${fmtAlpha(alpha)} ± ${fmtAlpha(p.expansionStdErr)} fitted to the moduli${bound}`;
    return outcome(
      s,
      n,
      'data',
      s.vertical === 'auto'
        ? `bT from the data: αV lies ${(-p.z).toFixed(1)} standard errors below 1/Tref, where bT ≡ 1 (${AUTO_Z} needed), the mismatch of the shifted curves drops by ${p.chi2Drop.toFixed(1)} residual variances, and bT reaches ${j.effectDecades.toFixed(3)} decades; ${what}`
        : `requested: bT from the data; ${what}`,
      { ...profileStats(p, j), expansionPerK: alpha },
      {
        ...entropicFromExpansion(temps, s.referenceK, alpha, p.expansionStdErr),
        carriesBT: j.carriesBT,
        expansionSensitivity: {
          perIsotherm: p.sensitivity,
          variance: p.expansionStdErr * p.expansionStdErr,
        },
        startLog10aT: alpha === p.expansionPerK ? p.log10aT : null,
      },
    );
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
  return outcome(
    s,
    n,
    'data',
    `requested: bT from the data; ${p ? `one αV does not describe the data (αV = ${fmtAlpha(p.expansionPerK)})` : 'no αV could be fitted'}, so each isotherm keeps its own bT from δ against |G*|`,
    { effectDecades: largestAbs(free) },
    {
      log10bT: free,
      stdErr: freeErr,
      vgpFit: fit,
      free: true,
      carriesBT: j?.carriesBT ?? false,
      implausible: p && j ? implausibleSentence(p, j) : null,
    },
  );
}

/**
 * The superposition grade's sentence when the moduli ask, beyond their noise, for a vertical
 * shift no thermal expansion gives; null otherwise. Two components with different shift laws (a
 * blend) leave a mismatch that a vertical offset growing with ΔT partly absorbs, in the direction
 * of an αV below zero: measured on seeded blends (tests/core/shift/verdict.test.ts) αV ran to the
 * end of the search range (−1/Tref) at 8–15 standard errors from bT ≡ 1.
 */
function implausibleSentence(p: ProfileFit, j: ExpansionJudgement): string | null {
  if (j.plausible || !(p.z < -AUTO_Z)) return null;
  return `the moduli call for a vertical shift that no thermal expansion gives (αV = ${fmtAlpha(p.expansionPerK)} ± ${fmtAlpha(p.expansionStdErr)}, ${(-p.z).toFixed(1)} standard errors from bT ≡ 1; polymers: 0–20·10⁻⁴ /K)`;
}

function profileStats(
  p: ProfileFit,
  j: ExpansionJudgement,
): Pick<VerticalChoice, 'expansionPerK' | 'expansionStdErr' | 'effectDecades' | 'z' | 'chi2Drop'> {
  return {
    expansionPerK: p.expansionPerK,
    expansionStdErr: p.expansionStdErr,
    effectDecades: j.effectDecades,
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
