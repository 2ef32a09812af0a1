/**
 * Differences in the shift models: the Arrhenius activation energy (its s.e. from each fit,
 * combined as independent), and log10 aT at chosen temperatures with both models referred to the
 * common reference temperature T*: log10 aT*(T) = log10 aT(T) − log10 aT(T*). Its s.e. is the
 * model band's s.e. at T (delta method, full covariance); when T* is not the analysis's own
 * reference the covariance between T and T* is left out (docs/compare.md), so it is approximate.
 */
import { shiftModelBand } from '../models/shift-model-band';
import { modelResult } from '../pipeline/model-results';
import type { ShiftModelKind } from '../models/types';
import type { Analysis } from '../pipeline/types';
import { pickModel } from './rereference';
import type { Estimate, ModelDifference } from './types';

function activation(a: Analysis): Estimate | null {
  const m = a.models.arrhenius;
  if (!m) return null;
  return { value: m.activationEnergyKJPerMol, stdErr: m.activationEnergyKJPerMolStdErr };
}

function shiftAt(
  a: Analysis,
  T: number,
  commonK: number,
  requested: ShiftModelKind | null,
): { e: Estimate; extrapolated: boolean } | null {
  const kind = pickModel(a, requested);
  const fit = kind ? modelResult(a.models, kind) : undefined;
  if (!fit) return null;
  const [atT, atRef] = shiftModelBand(fit.spec, [T, commonK]);
  const [lo, hi] = fit.fittedRangeK;
  return {
    e: {
      value: atT.log10aT - atRef.log10aT,
      stdErr: Number.isFinite(atT.stdErr) ? atT.stdErr : null,
    },
    extrapolated: T < lo - 1e-6 || T > hi + 1e-6,
  };
}

const combine = (a: Estimate, b: Estimate): Estimate => ({
  value: b.value - a.value,
  stdErr: a.stdErr === null || b.stdErr === null ? null : Math.hypot(a.stdErr, b.stdErr),
});

export function modelDifference(
  reference: Analysis,
  sample: Analysis,
  temperaturesK: number[],
  commonK: number,
  requested: ShiftModelKind | null,
): ModelDifference {
  const er = activation(reference);
  const es = activation(sample);
  return {
    activationEnergyKJPerMol: er && es ? combine(er, es) : null,
    reference: { activationEnergyKJPerMol: er },
    sample: { activationEnergyKJPerMol: es },
    shiftAt: temperaturesK.map((T) => {
      const r = shiftAt(reference, T, commonK, requested);
      const s = shiftAt(sample, T, commonK, requested);
      return {
        temperatureK: T,
        reference: r?.e ?? null,
        sample: s?.e ?? null,
        difference: r && s ? combine(r.e, s.e) : null,
        extrapolated: !!(r?.extrapolated || s?.extrapolated),
      };
    }),
  };
}
