/**
 * The zero-shear viscosity of a melt, three ways, and which one is reported:
 * - the viscosity law the data choose (Cross or Carreau–Yasuda, core/spectrum/viscosity-fit.ts);
 * - η0 = Σ g_i τ_i of the Prony series when it has Ge = 0 (exact for a liquid Prony series:
 *   Ferry, Viscoelastic Properties of Polymers, 3rd ed., 1980, ch. 3);
 * - |η*| at the lowest reduced frequency, a model-free lower bound (|η*| falls with ω for any
 *   liquid Prony series).
 * When the data reach the terminal zone (slopes near 2 and 1) the series follows it exactly and
 * Σ g_i τ_i is reported; otherwise η0 lies beyond the data and the law's extrapolation is
 * reported, flagged. A reported η0 below the bound is always flagged (warning `eta0-below-bound`).
 */
import { complexModulusOf } from '../data/derived';
import type { DeformationMode } from '../data/types';
import type { PronySeries } from '../spectrum/prony-model';
import { pronySymbols } from '../spectrum/prony-symbols';
import { pronyZeroShearViscosity } from '../spectrum/prony-forms';
import { fitViscosityCurve, type ViscosityFitResult } from '../spectrum/viscosity-fit';
import type { AnalysisIndicator, AnalysisMasterCurve, AnalysisWarning } from './types';

const LAW: Record<ViscosityFitResult['model'], string> = {
  cross: 'Cross',
  'carreau-yasuda': 'Carreau–Yasuda',
};

const fmt = (v: number): string => v.toPrecision(3);

/** |η*| points of the master curve (measured |η*|, else |G*|/ω_r), outliers left out. */
export function viscosityPoints(mc: AnalysisMasterCurve): { w: Float64Array; eta: Float64Array } {
  const n = mc.reducedX.length;
  const w = new Float64Array(n);
  const eta = new Float64Array(n);
  const v = mc.quantities.complexViscosity;
  const s = mc.quantities.storageModulus;
  const l = mc.quantities.lossModulus;
  for (let i = 0; i < n; i++) {
    const x = mc.reducedX[i];
    w[i] = mc.outlier[i] ? NaN : x;
    const e = v?.[i];
    const a = s?.[i];
    const b = l?.[i];
    eta[i] = e != null ? e : a != null && b != null ? complexModulusOf(a, b) / x : NaN;
  }
  return { w, eta };
}

export function zeroShearIndicators(
  mc: AnalysisMasterCurve,
  series: PronySeries,
  terminalReached: boolean,
  deformation: DeformationMode,
  warnings: AnalysisWarning[],
  /** The |η*| points when the caller has them (binnedMaster), else taken from `mc`. */
  points: { w: Float64Array; eta: Float64Array } = viscosityPoints(mc),
): AnalysisIndicator[] {
  const { w, eta } = points;
  const fit = fitViscosityCurve(w, eta, 'auto');
  const shear = deformation === 'shear';
  const y = pronySymbols(deformation);
  const sym = shear ? 'η0' : 'ηE,0';
  const what = shear
    ? 'zero-shear viscosity η0'
    : 'zero-rate tensile viscosity ηE,0 (from |E*|/ω; about 3·η0 for an incompressible liquid)';
  const liquid = series.equilibriumModulusPa === 0;
  const pronyEta = liquid ? pronyZeroShearViscosity(series) : NaN;
  const lawEta = fit.converged ? fit.zeroShearViscosityPaS : NaN;
  const bound = fit.lowestFrequencyViscosityPaS;
  const boundAt = fit.lowestFrequencyRadPerS;
  const useProny = terminalReached && liquid && pronyEta > 0;
  const out: AnalysisIndicator[] = [];
  if (!fit.converged)
    warnings.push({
      code: 'not-converged',
      model: fit.model,
      message: `The ${LAW[fit.model]} fit of |η*| did not converge: ${fit.reason}`,
    });
  const value = useProny ? pronyEta : lawEta;
  if (Number.isFinite(value)) {
    const ratio = Math.log10(value / bound);
    const noise = 2 * fit.lowestFrequencyLog10StdErr;
    const check =
      ratio >= 0
        ? `above |η*| at the lowest reduced frequency (${fmt(bound)} Pa·s at ${fmt(boundAt)} rad/s), the model-free lower bound`
        : ratio >= -noise
          ? `${fmt(100 * (1 - value / bound))} % below |η*| at the lowest reduced frequency (${fmt(bound)} Pa·s), within that point's noise`
          : `BELOW |η*| at the lowest reduced frequency (${fmt(bound)} Pa·s at ${fmt(boundAt)} rad/s), a model-free lower bound: this ${sym} cannot be right`;
    if (ratio < -noise)
      warnings.push({
        code: 'eta0-below-bound',
        message: `The ${what} ${fmt(value)} Pa·s (${useProny ? 'Prony series' : `${LAW[fit.model]} law`}) lies below |η*| = ${fmt(bound)} Pa·s measured at the lowest reduced frequency, a model-free lower bound: use the bound instead and check the low-frequency data.`,
      });
    const method = useProny
      ? `Σ ${y.term} τ_i of the Prony series; the data reach the terminal zone`
      : `${LAW[fit.model]} law of |η*|`;
    const law = useProny
      ? fit.converged
        ? `; the ${LAW[fit.model]} law gives ${fmt(lawEta)} Pa·s`
        : ''
      : Number.isFinite(pronyEta)
        ? `; Σ ${y.term} τ_i of the Prony series gives ${fmt(pronyEta)} Pa·s`
        : '';
    const extrapolated =
      !useProny && fit.extrapolated
        ? 'extrapolated beyond the lowest reduced frequency (no plateau of |η*| measured); '
        : '';
    out.push({
      key: 'zeroShearViscosity',
      label: `${what} (${method})`,
      value,
      unit: 'Pa·s',
      note: `${extrapolated}${check}${law}. ${useProny ? '' : `${fit.choice} `}${fit.note}`,
    });
  }
  if (useProny && Number.isFinite(lawEta))
    out.push({
      key: 'zeroShearViscosityLaw',
      label: `${sym} from the ${LAW[fit.model]} law of |η*|`,
      value: lawEta,
      unit: 'Pa·s',
      note: fit.choice,
    });
  if (!useProny && Number.isFinite(pronyEta))
    out.push({
      key: 'zeroShearViscosityProny',
      label: `${sym} = Σ ${y.term} τ_i of the Prony series (${y.equilibrium} = 0)`,
      value: pronyEta,
      unit: 'Pa·s',
      note: 'the data do not reach the terminal zone: modes beyond the window are missing, so this is a lower estimate',
    });
  out.push({
    key: 'zeroShearViscosityLowerBound',
    label: `|η*| at the lowest reduced frequency (model-free lower bound for ${sym})`,
    value: bound,
    unit: 'Pa·s',
    note: `mean of the points in the lowest 1/20-decade bin, at ${fmt(boundAt)} rad/s`,
  });
  return out;
}
