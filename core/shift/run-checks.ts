/** Runs the superposition checks after the main fit and turns them into a grade and warnings. */
import type { Dataset, QuantityId } from '../data/types';
import { buildProblem } from './build-problem';
import { gradeOf, mismatchRatio, noiseOfProblem, vanGurpPalmenDispersion } from './checks';
import { hasQuantity } from './drivers';
import type { OffsetFit } from './fit-offsets';
import { solveOffsets } from './solve';
import { candidatePairs } from './pairs';
import type { FitProblem } from './problem';
import type { ResolvedShiftOptions, ShiftChecks, ShiftWarning } from './types';
import type { VerticalOutcome } from './vertical';
import { warn } from './warnings';

function comparedQuantities(dataset: Dataset, s: ResolvedShiftOptions): QuantityId[] {
  if (s.drivers.length >= 2) return s.drivers;
  if (
    dataset.testKind === 'oscillatory' &&
    hasQuantity(dataset, 'storageModulus') &&
    hasQuantity(dataset, 'lossModulus')
  )
    return ['storageModulus', 'lossModulus'];
  return [];
}

/**
 * The problem for one quantity alone: reuses the main fit's series when that quantity drove it
 * (no rebuilding), otherwise builds it with the main fit's outliers left out.
 */
function singleDriver(
  dataset: Dataset,
  s: ResolvedShiftOptions,
  fit: OffsetFit,
  active: number[],
  vertical: VerticalOutcome,
  q: QuantityId,
): FitProblem {
  const d = s.drivers.indexOf(q);
  if (d >= 0) {
    const p: FitProblem = {
      ...fit.problem,
      curves: fit.problem.curves.map((c) => [c[d]]),
      alpha: fit.problem.alpha.subarray(d, d + 1),
      beta: fit.problem.beta.subarray(d, d + 1),
    };
    p.pairs = candidatePairs(p);
    return p;
  }
  return buildProblem(dataset, {
    active,
    drivers: [q],
    fixedLog10bT: vertical.joint ? null : vertical.log10bT,
    joint: vertical.joint,
    minOverlapPoints: s.minOverlapPoints,
    maxPointsPerDecade: s.maxPointsPerDecade,
    dropped: fit.outliers,
  });
}

interface Disagreement {
  decades: number;
  z: number;
}

function disagreement(
  dataset: Dataset,
  s: ResolvedShiftOptions,
  fit: OffsetFit,
  active: number[],
  vertical: VerticalOutcome,
  quantities: QuantityId[],
): Disagreement | null {
  const n = active.length;
  const locked = new Map<number, number>();
  s.locked.forEach((l) => {
    const c = active.findIndex((k) => dataset.isotherms[k].id === l.id);
    if (c >= 0) locked.set(c, l.log10aT);
  });
  // One damped Newton step from the joint optimum for each quantity alone (the shifts differ by
  // a few hundredths of a decade, well inside the quadratic region), with the same reference,
  // locks and robust scale; the standard errors come from the same sandwich as the main fit.
  const fits = quantities.map((q) => {
    const p = singleDriver(dataset, s, fit, active, vertical, q);
    const keep: number[] = [];
    for (let k = 0; k < p.pairs.length; k += 2)
      if (fit.included[p.pairs[k]] && fit.included[p.pairs[k + 1]])
        keep.push(p.pairs[k], p.pairs[k + 1]);
    const sub: FitProblem = { ...p, pairs: Int32Array.from(keep) };
    const out = solveOffsets(sub, fit.theta, {
      loss: s.robustLoss,
      scale: fit.scale,
      maxIterations: 2,
      fixed: fit.fixed,
      constraints: fit.constraints,
      prior: fit.prior,
      buffer: fit.buffer,
      toleranceDecades: s.toleranceDecades,
    });
    const size = fit.theta.length;
    const stdErr = Float64Array.from({ length: size }, (_, i) =>
      out.covariance ? Math.sqrt(Math.max(0, out.covariance[i * size + i])) : NaN,
    );
    return { theta: out.theta, stdErr, included: fit.included };
  });
  let best: Disagreement | null = null;
  for (let a = 0; a < fits.length; a++)
    for (let b = a + 1; b < fits.length; b++)
      for (let c = 0; c < n; c++) {
        if (!fit.included[c] || !fits[a].included[c] || !fits[b].included[c] || locked.has(c))
          continue;
        const d = Math.abs(fits[a].theta[c] - fits[b].theta[c]);
        const se = Math.hypot(fits[a].stdErr[c], fits[b].stdErr[c]);
        const z = se > 0 ? d / se : Infinity;
        if (!Number.isFinite(d)) continue;
        if (!best || d > best.decades) best = { decades: d, z };
      }
  return best;
}

export function runChecks(
  dataset: Dataset,
  s: ResolvedShiftOptions,
  fit: OffsetFit,
  active: number[],
  vertical: VerticalOutcome,
  warnings: ShiftWarning[],
): ShiftChecks {
  const includedCount = fit.included.reduce((a, b) => a + b, 0);
  const noise = noiseOfProblem(fit.problem, fit.included);
  const mismatch = includedCount > 1 ? mismatchRatio(fit.robustSigma, noise) : null;
  const compared = s.checks && includedCount > 1 ? comparedQuantities(dataset, s) : [];
  const vgp =
    s.checks && dataset.testKind === 'oscillatory' && includedCount > 1
      ? vanGurpPalmenDispersion(
          dataset,
          active,
          fit.included,
          (k) => {
            const c = active.indexOf(k);
            const v = vertical.joint ? fit.theta[active.length + c] : vertical.log10bT[k];
            return Number.isFinite(v) ? v : 0;
          },
          s.minOverlapPoints,
        )
      : null;
  const dis =
    compared.length >= 2 ? disagreement(dataset, s, fit, active, vertical, compared) : null;
  const grade =
    includedCount > 1
      ? gradeOf(mismatch, vgp?.ratio ?? null, dis?.decades ?? null, dis?.z ?? null)
      : 'unknown';
  const checks: ShiftChecks = {
    vanGurpPalmenRmsDeg: vgp?.rmsDeg ?? null,
    vanGurpPalmenRatio: vgp?.ratio ?? null,
    quantityDisagreementDecades: dis?.decades ?? null,
    quantityDisagreementZ: dis && Number.isFinite(dis.z) ? dis.z : null,
    quantitiesCompared: dis ? compared : [],
    mismatchRatio: mismatch,
    noiseDecades: Number.isFinite(noise) ? noise : null,
    grade,
    superpositionOk: grade === 'good' || grade === 'fair',
  };
  const figures = [
    mismatch !== null ? `mismatch ${mismatch.toFixed(1)}× the noise` : '',
    vgp
      ? `van Gurp–Palmen spread ${vgp.ratio !== null ? `${vgp.ratio.toFixed(1)}× the noise, ` : ''}${vgp.rmsDeg.toFixed(1)}° RMS`
      : '',
    dis
      ? `shifts from ${compared.join(' and ')} differ by up to ${dis.decades.toFixed(2)} decades`
      : '',
  ]
    .filter(Boolean)
    .join('; ');
  if (grade === 'poor')
    warn(
      warnings,
      'poor-superposition',
      `The isotherms do not superpose well (${figures}). The material may be thermorheologically complex (blend, block copolymer, filled or semicrystalline near melting) or the data outside the linear range: do not rely on this master curve without further tests.`,
    );
  else if (grade === 'fair')
    warn(
      warnings,
      'fair-superposition',
      `Superposition is only fair (${figures}); check the shifted curves before using the master curve.`,
    );
  if (dis && dis.decades > 0.1 && dis.z > 3)
    warn(
      warnings,
      'quantities-disagree',
      `Shifts found from ${compared.join(' and ')} separately differ by up to ${dis.decades.toFixed(2)} decades.`,
    );
  return checks;
}
