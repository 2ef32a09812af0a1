/**
 * Step 2 of the pipeline: the shift-factor models (core/models) fitted to the included shifts by
 * generalised least squares with the shift engine's covariance (read through shiftCovarianceFor;
 * without one, each shift is weighted by its own standard error and the fit says so), each with
 * its 95 % band over the fitted range. Locked shifts are not measurements and are left out; the
 * reference isotherm is exact. A model that cannot be fitted (too few shifts) becomes a warning,
 * not an error; a fit that stops without converging gives a `not-converged` warning naming it.
 */
import {
  fitArrhenius,
  fitPolynomial,
  fitWlf,
  rereferenceWlf,
  shiftModelBand,
  suggestShiftModel,
  wlfApparentActivationEnergyKJPerMol,
  wlfFreeVolume,
} from '../models';
import type { ShiftFitCommon, ShiftPoint } from '../models/types';
import type { ResolvedAnalysisOptions } from './options';
import type { ShiftCovarianceFor } from './shift-covariance';
import type { AnalysisCurve, AnalysisModels, AnalysisWarning, ModelFitStats } from './types';

const BAND_POINTS = 61;

function stats(fit: ShiftFitCommon, ids: Map<number, string>): ModelFitStats {
  const [lo, hi] = fit.fittedRangeK;
  const grid = Array.from(
    { length: BAND_POINTS },
    (_, i) => lo + ((hi - lo) * i) / (BAND_POINTS - 1),
  );
  const band = shiftModelBand(fit, grid);
  const finite = (v: number): number | null => (Number.isFinite(v) ? v : null);
  const covarianceKnown = fit.covariance.every((row) => row.every(Number.isFinite));
  return {
    r2: finite(fit.rSquared),
    rmsResidualDecades: finite(fit.rmsResidual),
    reducedChiSquare: finite(fit.reducedChiSquare),
    weighting: {
      kind: fit.weighting.kind,
      note: fit.weighting.note,
      leftOut: fit.weighting.leftOut.map((p) => ({
        isothermId: ids.get(p.temperatureK) ?? '',
        temperatureK: p.temperatureK,
        reason: p.reason,
      })),
    },
    residuals: fit.residuals.map((r) => ({
      isothermId: ids.get(r.temperatureK) ?? '',
      temperatureK: r.temperatureK,
      residualDecades: r.residual,
    })),
    fittedRangeK: [lo, hi],
    converged: fit.converged,
    convergence: fit.reason,
    band: {
      temperatureK: grid,
      // `+ 0` turns −0 into 0, so the analysis survives a JSON round trip unchanged
      log10aT: band.map((b) => b.log10aT + 0),
      lower95: band.map((b) => b.lower95 + 0),
      upper95: band.map((b) => b.upper95 + 0),
    },
    spec: {
      kind: fit.kind,
      referenceK: fit.referenceK,
      values: [...fit.values],
      // plain JSON: an undeterminable covariance is left out rather than stored as NaN
      ...(covarianceKnown && { covariance: fit.covariance.map((row) => [...row]) }),
      tQuantile95: fit.tQuantile95,
      fittedRangeK: [lo, hi],
      ...(fit.glassTransitionK !== undefined && { glassTransitionK: fit.glassTransitionK }),
    },
  };
}

const param = (fit: ShiftFitCommon, i: number) => {
  const p = fit.parameters[i];
  return {
    se: p && Number.isFinite(p.stdErr) ? p.stdErr : null,
    ci: p && p.ci95.every(Number.isFinite) ? ([p.ci95[0], p.ci95[1]] as [number, number]) : null,
  };
};

const MODEL_NAME = { wlf: 'WLF', arrhenius: 'Arrhenius', polynomial: 'polynomial' } as const;

/**
 * @param covariance the shifts' covariance for the included curves with a shift, in their order
 *   (from shiftCovarianceFor); without it the fits weight each shift by its own standard error
 */
export function fitShiftModels(
  curves: readonly AnalysisCurve[],
  s: ResolvedAnalysisOptions,
  warnings: AnalysisWarning[],
  covariance?: (ids: string[]) => ShiftCovarianceFor,
): AnalysisModels {
  const used = curves.filter((c) => c.included && c.log10aT !== null);
  const locked = new Set(Object.keys(s.lockedLog10aT));
  const points: ShiftPoint[] = used.map((c) => ({
    temperatureK: c.temperatureK,
    log10aT: c.log10aT as number,
    ...(c.log10aTStdErr !== null && { stdErr: c.log10aTStdErr }),
    ...(locked.has(c.isothermId) && { locked: true }),
  }));
  const ids = new Map(used.map((c) => [c.temperatureK, c.isothermId]));
  const cov = covariance
    ? covariance(used.map((c) => c.isothermId))
    : {
        matrix: null,
        reason: 'no covariance of the shifts was passed to the model fits',
      };
  const opts = {
    referenceK: s.referenceTemperatureK,
    ...(s.glassTransitionK !== null && { glassTransitionK: s.glassTransitionK }),
    covariance: cov.matrix,
    diagonalReason: `${cov.reason}: each shift is weighted by its own standard error (weighted least squares)`,
  };
  const models: AnalysisModels = {};
  const fits: Parameters<typeof suggestShiftModel>[0] = {};
  const attempt = <T extends ShiftFitCommon>(
    kind: keyof typeof MODEL_NAME,
    f: () => T,
  ): T | undefined => {
    const name = MODEL_NAME[kind];
    try {
      const fit = f();
      for (const w of fit.warnings)
        warnings.push({ code: `model-${kind}`, message: `${name} fit: ${w.message}`, model: kind });
      if (!fit.converged)
        warnings.push({
          code: 'not-converged',
          message: `The ${name} fit of the shift factors did not converge: ${fit.reason}`,
          model: kind,
        });
      return fit;
    } catch (e) {
      warnings.push({
        code: 'model-failed',
        message: `The ${name} model could not be fitted: ${e instanceof Error ? e.message : String(e)}`,
        model: kind,
      });
      return undefined;
    }
  };
  if (s.models.includes('wlf')) {
    const f = attempt('wlf', () => fitWlf(points, opts));
    if (f) {
      fits.wlf = f;
      let atTg: { c1: number; c2K: number; referenceK: number } | undefined;
      if (s.glassTransitionK !== null)
        try {
          atTg = rereferenceWlf(f.c1, f.c2K, f.referenceK, s.glassTransitionK);
        } catch (e) {
          warnings.push({ code: 'model-wlf', message: e instanceof Error ? e.message : String(e) });
        }
      let freeVolume: { fractionalFreeVolume: number; expansionPerK: number } | null = null;
      try {
        freeVolume = wlfFreeVolume(f.c1, f.c2K);
      } catch {
        freeVolume = null; // negative constants: no free-volume reading, the fit itself is reported
      }
      models.wlf = {
        c1: f.c1,
        c1StdErr: param(f, 0).se,
        c1Ci95: param(f, 0).ci,
        c2K: f.c2K,
        c2KStdErr: param(f, 1).se,
        c2KCi95: param(f, 1).ci,
        referenceK: f.referenceK,
        ...(atTg && { atGlassTransition: atTg }),
        apparentActivationEnergyKJPerMol: wlfApparentActivationEnergyKJPerMol(
          f.referenceK,
          f.c1,
          f.c2K,
          f.referenceK,
        ),
        freeVolume,
        ...stats(f, ids),
      };
    }
  }
  if (s.models.includes('arrhenius')) {
    const f = attempt('arrhenius', () => fitArrhenius(points, opts));
    if (f) {
      fits.arrhenius = f;
      models.arrhenius = {
        activationEnergyKJPerMol: f.activationEnergyKJPerMol,
        activationEnergyKJPerMolStdErr: param(f, 0).se,
        activationEnergyKJPerMolCi95: param(f, 0).ci,
        referenceK: f.referenceK,
        ...stats(f, ids),
      };
    }
  }
  if (s.models.includes('polynomial')) {
    const f = attempt('polynomial', () => fitPolynomial(points, opts));
    if (f) {
      fits.polynomial = f;
      models.polynomial = {
        a1PerK: f.a1PerK,
        a1PerKStdErr: param(f, 0).se,
        a2PerK2: f.a2PerK2,
        a2PerK2StdErr: param(f, 1).se,
        referenceK: f.referenceK,
        ...stats(f, ids),
      };
    }
  }
  if (fits.wlf || fits.arrhenius || fits.polynomial) {
    const hint = suggestShiftModel(fits, s.glassTransitionK ?? undefined);
    models.hint = { model: hint.recommended, reason: hint.reasons.join(' ') };
  }
  return models;
}
