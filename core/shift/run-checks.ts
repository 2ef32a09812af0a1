/** Runs the superposition checks after the main fit and turns them into a grade and warnings. */
import type { Dataset, QuantityId } from '../data/types';
import {
  DISAGREE_DECADES,
  DISAGREE_Z,
  gradeWithReasons,
  mismatchRatio,
  noiseOfProblem,
  vanGurpPalmenDispersion,
} from './checks';
import { hasQuantity } from './drivers';
import type { OffsetFit } from './fit-offsets';
import { quantityDisagreement } from './quantity-shifts';
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

export function runChecks(
  dataset: Dataset,
  s: ResolvedShiftOptions,
  fit: OffsetFit,
  active: number[],
  vertical: VerticalOutcome,
  warnings: ShiftWarning[],
  /** Size of a vertical shift the data carry but the user turned off, decades; else null. */
  ignoredBTDecades: number | null = null,
): ShiftChecks {
  const includedCount = fit.included.reduce((a, b) => a + b, 0);
  const position = new Map(active.map((k, c) => [k, c]));
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
            const c = position.get(k)!;
            const v = vertical.joint ? fit.theta[active.length + c] : vertical.log10bT[k];
            return Number.isFinite(v) ? v : 0;
          },
          s.minOverlapPoints,
          fit.buffer,
        )
      : null;
  const dis =
    compared.length >= 2 ? quantityDisagreement(dataset, s, fit, active, vertical, compared) : null;
  const { grade, reasons } =
    includedCount > 1
      ? gradeWithReasons(
          mismatch,
          vgp?.ratio ?? null,
          dis?.decades ?? null,
          dis?.z ?? null,
          ignoredBTDecades,
          vertical.implausible,
        )
      : { grade: 'unknown' as const, reasons: [] };
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
  const figures = reasons.join('; ');
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
  if (dis && dis.decades > DISAGREE_DECADES && dis.z > DISAGREE_Z)
    warn(
      warnings,
      'quantities-disagree',
      `Shifts found from ${compared.join(' and ')} separately differ by up to ${dis.decades.toFixed(2)} decades.`,
    );
  return checks;
}
