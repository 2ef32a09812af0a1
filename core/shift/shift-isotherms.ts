/**
 * shiftIsotherms(): the shift engine's entry point. Finds log10 aT (and log10 bT) for every
 * isotherm by a global robust overlap fit, with standard errors, quality figures, superposition
 * checks and warnings. Method and conventions: docs/shifting.md, docs/conventions.md §2 and §4.
 */
import { SHIFT_CONVENTION } from '../data/conventions';
import type { Dataset } from '../data/types';
import { buildProblem } from './build-problem';
import { activeIsotherms } from './active';
import type { OffsetFit } from './fit-offsets';
import { fitOffsets, robustFitSettings } from './fit-offsets';
import { resolveShiftOptions, ShiftOptionsError } from './options';
import { runChecks } from './run-checks';
import type {
  CurveShift,
  LeftOut,
  ResolvedShiftOptions,
  ShiftCovariance,
  ShiftOptions,
  ShiftResult,
  ShiftWarning,
} from './types';
import { verticalShift } from './vertical';
import { shiftErrorFloor } from './shift-information';
import { describeIsotherm, formatC, warn } from './warnings';

// The conventions' wording, once for the whole program: core/data/conventions.ts.
export { SHIFT_CONVENTION };

/** Standard errors above this many decades are called out. */
const LARGE_STD_ERR_DECADES = 0.1;

/** Largest number of included isotherms whose full covariance is returned (8 MB of numbers). */
export const COVARIANCE_MAX_ISOTHERMS = 1000;

export function shiftIsotherms(dataset: Dataset, options: ShiftOptions): ShiftResult {
  const s = resolveShiftOptions(dataset, options);
  const ids = new Set(dataset.isotherms.map((i) => i.id));
  for (const id of [...s.excluded, ...s.locked.map((l) => l.id)])
    if (!ids.has(id))
      throw new ShiftOptionsError(`No isotherm with id '${id}' in dataset '${dataset.name}'.`);
  const warnings: ShiftWarning[] = [];
  const isos = dataset.isotherms;
  const temps = isos.map((i) => i.temperatureK);
  let active = activeIsotherms(dataset, s, warnings);

  const vertical = verticalShift(dataset, active, s);
  const noVertical = new Set<number>();
  if (vertical.free) {
    warn(
      warnings,
      'free-vertical-shift',
      'bT was estimated from the data (δ against |G*|) for each isotherm on its own: free vertical shifts weaken the physical meaning of the master curve; prefer bT from density unless the data demand otherwise.',
    );
    for (const k of active) if (!Number.isFinite(vertical.log10bT[k])) noVertical.add(k);
    active = active.filter((k) => !noVertical.has(k));
  }
  const vc = vertical.choice;
  let ignoredBTDecades: number | null = null;
  if (
    vc.requested === 'none' &&
    vertical.carriesBT &&
    vc.expansionPerK !== null &&
    vc.effectDecades !== null &&
    vc.z !== null
  ) {
    ignoredBTDecades = vc.effectDecades;
    warn(
      warnings,
      'vertical-shift-ignored',
      `No vertical shift was asked for, but the moduli show one: with bT (αV ≈ ${(vc.expansionPerK * 1e4).toFixed(1)}·10⁻⁴ /K, ${(-vc.z).toFixed(1)} standard errors from bT ≡ 1) the mismatch drops by ${(vc.chi2Drop ?? 0).toFixed(0)} residual variances and bT would reach ${vc.effectDecades.toFixed(3)} decades over the measured temperatures, and leaving it out moves the shifts by about as much divided by the slope of the curves. Use vertical 'auto', 'density' or 'data'.`,
    );
  }
  for (const T of vertical.extrapolatedK)
    warn(warnings, 'density-extrapolated', `The density table was extrapolated to ${formatC(T)}.`);

  const activeById = new Map(active.map((k, c) => [isos[k].id, c]));
  const lockedByIndex = new Map<number, number>();
  s.locked.forEach((l) => {
    const c = activeById.get(l.id);
    if (c !== undefined) lockedByIndex.set(c, l.log10aT);
  });
  // Warm start: the user's (live re-fit), else the shifts the αV profile found with this bT.
  const initial = s.initialLog10aT
    ? Float64Array.from(active, (k) => s.initialLog10aT![isos[k].id] ?? NaN)
    : vertical.startLog10aT && lockedByIndex.size === 0
      ? Float64Array.from(active, (k) => vertical.startLog10aT![k])
      : null;
  const fit: OffsetFit = fitOffsets({
    build: (dropped) =>
      buildProblem(dataset, {
        active,
        drivers: s.drivers,
        fixedLog10bT: vertical.joint ? null : vertical.log10bT,
        joint: vertical.joint,
        minOverlapPoints: s.minOverlapPoints,
        maxPointsPerDecade: s.maxPointsPerDecade,
        dropped,
      }),
    temperaturesK: active.map((k) => temps[k]),
    referenceK: s.referenceK,
    locked: lockedByIndex,
    initial,
    ...robustFitSettings(s),
    scanStep: s.scanStepDecades,
    directionAllowance: s.reverseAllowanceDecades,
    maxOffset: Infinity,
  });
  const n = active.length;
  // A lone isotherm away from Tref says nothing about aT(Tref).
  const includedCount = fit.included.reduce((a, b) => a + b, 0);
  if (fit.reference?.kind === 'single' && lockedByIndex.size === 0) {
    fit.included.fill(0);
    warn(
      warnings,
      'too-few-isotherms',
      `Only isotherms at ${formatC(temps[active[[...fit.reference.coef.keys()][0]]])} can be used: ` +
        `shift factors relative to ${formatC(s.referenceK)} cannot be found from one temperature.`,
    );
  } else if (n === 0) {
    warn(
      warnings,
      'no-data',
      `No isotherm of '${dataset.name}' has two or more usable points for ${s.drivers.join(', ') || 'any quantity'}.`,
    );
  }

  const position = new Int32Array(isos.length).fill(-1);
  active.forEach((k, c) => (position[k] = c));
  const lockedIds = new Set(s.locked.map((l) => l.id));
  const excludedIds = new Set(s.excluded);
  // With bT from one fitted αV the shifts also carry αV's uncertainty: var(log10 aT_k) gains
  // (∂log10 aT_k/∂αV)²·var(αV), the covariance S·Sᵀ·var(αV) (delta method; Ku, J. Res. NBS 70C,
  // 1966, "Notes on the use of propagation of error formulas").
  const alphaPart = vertical.expansionSensitivity;
  const sensitivityOf = (k: number): number =>
    alphaPart && !lockedIds.has(isos[k].id) ? (alphaPart.perIsotherm[k] ?? 0) : 0;
  const curves: CurveShift[] = isos.map((iso, k) => {
    const c = position[k];
    const inc = c >= 0 && fit.included[c] === 1;
    const lockedHere = lockedIds.has(iso.id);
    const bT = !inc ? null : vertical.joint ? fit.theta[n + c] : vertical.log10bT[k];
    const bErr = !inc ? null : vertical.joint ? fit.stdErr[n + c] : vertical.stdErr[k];
    return {
      id: iso.id,
      temperatureK: iso.temperatureK,
      log10aT: inc ? fit.theta[c] : null,
      log10aTStdErr: inc
        ? finiteOrNull(
            lockedHere
              ? 0
              : Math.sqrt(
                  fit.stdErr[c] * fit.stdErr[c] +
                    sensitivityOf(k) ** 2 * (alphaPart?.variance ?? 0),
                ),
          )
        : null,
      log10bT: bT,
      log10bTStdErr: bErr === null ? null : finiteOrNull(bErr),
      included: inc,
      excluded: excludedIds.has(iso.id),
      overlapsNothing: c >= 0 ? fit.overlapsNothing[c] === 1 && !lockedHere : false,
      locked: lockedHere,
      rmsResidualDecades: c >= 0 && Number.isFinite(fit.curveRms[c]) ? fit.curveRms[c] : null,
      outlierPoints: c >= 0 ? [...fit.outliers[c]].sort((a, b) => a - b) : [],
      leftOut: null,
    };
  });
  noShiftInformation(dataset, s, curves, warnings);

  structuralWarnings(dataset, s, fit, position, curves, includedCount, warnings);
  const checks = runChecks(dataset, s, fit, active, vertical, warnings, ignoredBTDecades);
  curves.forEach((cs, k) => {
    if (!cs.included)
      cs.leftOut = leftOutReason(dataset, fit, position[k], cs, noVertical.has(k), n);
  });
  return {
    referenceK: s.referenceK,
    convention: SHIFT_CONVENTION,
    abscissa: dataset.abscissa,
    curves,
    rmsResidualDecades: Number.isFinite(fit.rms) ? fit.rms : null,
    checks,
    covariance: covarianceOf(
      fit,
      active,
      curves,
      isos.map((i) => i.id),
      alphaPart
        ? { sensitivity: isos.map((_, k) => sensitivityOf(k)), variance: alphaPart.variance }
        : null,
    ),
    warnings,
    settings: s,
    fit: fit.info,
    vertical: vc,
  };
}

/** Standard errors of a shift above this many decades from the curve's own shape: no information. */
export const NO_SHIFT_INFORMATION_DECADES = 0.1;

/**
 * Isotherms too flat to fix a shift (shift-information.ts): their standard error is raised to
 * what their shape allows, with the `no-shift-information` warning (never a confident shift).
 */
function noShiftInformation(
  dataset: Dataset,
  s: ResolvedShiftOptions,
  curves: CurveShift[],
  warnings: ShiftWarning[],
): void {
  curves.forEach((cs, k) => {
    // The isotherm at Tref defines aT = 1: its shape needs to tell nothing.
    if (!cs.included || cs.locked || Math.abs(cs.temperatureK - s.referenceK) <= 0.01) return;
    const floor = shiftErrorFloor(dataset.isotherms[k], s.drivers);
    if (!(floor > NO_SHIFT_INFORMATION_DECADES)) return;
    cs.log10aTStdErr = Math.max(cs.log10aTStdErr ?? 0, floor);
    warn(
      warnings,
      'no-shift-information',
      `Isotherm ${describeIsotherm(dataset.isotherms[k])} is too flat to tell its shift: its shape fixes log10 aT only to ±${floor >= 10 ? floor.toExponential(0) : floor.toFixed(2)} decades (a plateau moves onto itself). Its shift is not to be trusted; measure a wider window or leave it out.`,
    );
  });
}

/** The structured reason an isotherm is not part of the master curve. */
function leftOutReason(
  dataset: Dataset,
  fit: OffsetFit,
  c: number,
  cs: CurveShift,
  noVertical: boolean,
  activeCount: number,
): LeftOut {
  const iso = dataset.isotherms.find((i) => i.id === cs.id)!;
  const who = describeIsotherm(iso);
  if (cs.excluded) return { code: 'excluded', message: `${who} was excluded by the user.` };
  if (noVertical)
    return {
      code: 'no-vertical-shift',
      message: `${who}: δ against |G*| overlaps no other isotherm, so its bT cannot be estimated from the data; it is left out (give a density, or use vertical 'auto').`,
    };
  if (c < 0)
    return {
      code: 'no-data',
      message: `${who} has fewer than two usable points for the shift quantities.`,
    };
  if (fit.reference?.kind === 'single' && activeCount > 0 && fit.included.every((v) => !v))
    return {
      code: 'too-few-isotherms',
      message: `${who}: only one temperature can be used, so no shift relative to the reference can be found.`,
    };
  if (cs.overlapsNothing)
    return {
      code: 'no-overlap',
      message: `${who} overlaps no other isotherm: it carries no shift information.`,
    };
  if (fit.disconnected[c])
    return {
      code: 'disconnected-group',
      message: `${who} overlaps only isotherms that do not connect to the rest.`,
    };
  return { code: 'no-overlap', message: `${who} could not be placed against the other isotherms.` };
}

/** The covariance of the included isotherms' shifts, in `curves` order (see ShiftCovariance). */
function covarianceOf(
  fit: OffsetFit,
  active: number[],
  curves: CurveShift[],
  ids: string[],
  /** A rank-one part S·Sᵀ·variance added to the covariance (per dataset index), or null. */
  extra: { sensitivity: number[]; variance: number } | null,
): ShiftCovariance | null {
  const position = new Map(active.map((k, c) => [k, c]));
  const rows = curves.flatMap((cs, k) => (cs.included ? [k] : []));
  if (!fit.uncertainty || rows.length === 0 || rows.length > COVARIANCE_MAX_ISOTHERMS) return null;
  const params = rows.map((k) => position.get(k)!);
  const flat = fit.uncertainty.covariance(params);
  const m = rows.length;
  const locked = rows.map((k) => curves[k].locked);
  const matrix = rows.map((_, a) =>
    rows.map((__, b) =>
      locked[a] || locked[b]
        ? 0
        : flat[a * m + b] +
          (extra ? extra.sensitivity[rows[a]] * extra.sensitivity[rows[b]] * extra.variance : 0),
    ),
  );
  return { ids: rows.map((k) => ids[k]), log10aT: matrix };
}

function finiteOrNull(v: number): number | null {
  return Number.isFinite(v) ? v : null;
}

function structuralWarnings(
  dataset: Dataset,
  s: ResolvedShiftOptions,
  fit: OffsetFit,
  position: Int32Array,
  curves: CurveShift[],
  includedCount: number,
  warnings: ShiftWarning[],
): void {
  const isos = dataset.isotherms;
  curves.forEach((cs, k) => {
    const c = position[k];
    if (c < 0 || cs.excluded) return;
    if (cs.overlapsNothing)
      warn(
        warnings,
        'no-overlap',
        `Isotherm ${describeIsotherm(isos[k])} overlaps no other isotherm: it carries no shift information and is left out of the master curve.`,
      );
    else if (fit.disconnected[c] && !cs.included)
      warn(
        warnings,
        'disconnected-group',
        `Isotherm ${describeIsotherm(isos[k])} overlaps only isotherms that do not connect to the rest: it is left out of the master curve.`,
      );
    if (cs.included && !cs.locked && cs.log10aTStdErr === null)
      warn(
        warnings,
        'large-uncertainty',
        `The uncertainty of the shift of isotherm ${describeIsotherm(isos[k])} could not be determined: its overlap does not fix it.`,
      );
    else if (cs.included && cs.log10aTStdErr !== null && cs.log10aTStdErr > LARGE_STD_ERR_DECADES)
      warn(
        warnings,
        'large-uncertainty',
        `The shift of isotherm ${describeIsotherm(isos[k])} is uncertain (±${cs.log10aTStdErr.toFixed(2)} decades): its overlap with the others is short or flat.`,
      );
    if (cs.outlierPoints.length > 0) {
      const rows = cs.outlierPoints
        .slice(0, 5)
        .map((i) =>
          isos[k].source[i]
            ? `${isos[k].source[i].file} row ${isos[k].source[i].row}`
            : `point ${i + 1}`,
        );
      warn(
        warnings,
        'outliers-flagged',
        `Isotherm ${describeIsotherm(isos[k])}: ${cs.outlierPoints.length} point(s) disagree strongly with the overlapping isotherms and were left out of the fit (${rows.join('; ')}${cs.outlierPoints.length > 5 ? '; …' : ''}). Check them (low torque, inertia, non-linear range).`,
      );
    }
  });
  if (fit.reference?.kind === 'extrapolated' && includedCount > 1)
    warn(
      warnings,
      'reference-extrapolated',
      `The reference temperature ${formatC(s.referenceK)} lies outside the measured isotherms: aT there is extrapolated linearly from the two nearest, so every shift carries that extrapolation.`,
    );
  if (fit.lockConflict !== null)
    warn(
      warnings,
      'locks-conflict-reference',
      `The fixed shifts imply log10 aT = ${fit.lockConflict.toFixed(3)} at the reference temperature instead of 0: check the fixed values.`,
    );
  if (!fit.info.converged)
    warn(
      warnings,
      'not-converged',
      `The shift fit stopped after ${fit.info.iterations} iterations without converging (${fit.info.reason}).`,
    );
}
