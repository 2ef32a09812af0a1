/**
 * Step 2 of the pipeline: the shift-factor models (core/models) fitted to the included shifts by
 * generalised least squares with the shift engine's covariance (read through shiftCovarianceFor;
 * without one, each shift is weighted by its own standard error and the fit says so), each with
 * its 95 % band over the fitted range. Locked shifts are not measurements and are left out; the
 * reference isotherm is exact. A model that cannot be fitted (too few shifts) becomes a warning,
 * not an error; a fit that stops without converging gives a `not-converged` warning naming it.
 * Each model is fitted, named and given its derived quantities by its registry descriptor.
 */
import { findShiftModel, shiftModelBand, shiftModels, suggestShiftModel } from '../models';
import type { ShiftFitCommon, ShiftPoint } from '../models/types';
import { setModelResult, type ShiftModelResult } from './model-results';
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
  const fits: Record<string, ShiftFitCommon> = {};
  const attempt = (
    kind: string,
    name: string,
    f: () => ShiftFitCommon,
  ): ShiftFitCommon | undefined => {
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
  // a kind that is no longer registered (options made while it was) is said, not dropped
  for (const kind of s.models)
    if (!findShiftModel(kind))
      warnings.push({
        code: 'model-failed',
        message: `The ${kind} model could not be fitted: no shift model of that kind is registered`,
        model: kind,
      });
  // in the registry's order, whatever the order of the settings
  for (const d of shiftModels().filter((m) => s.models.includes(m.kind))) {
    const f = attempt(d.kind, d.name, () => d.fit(points, opts));
    if (!f) continue;
    fits[d.kind] = f;
    const constants: Record<string, unknown> = {};
    d.parameters.forEach((p, i) => {
      constants[p.analysisKey] = f.values[i];
      constants[`${p.analysisKey}StdErr`] = param(f, i).se;
      if (p.interval) constants[`${p.analysisKey}Ci95`] = param(f, i).ci;
    });
    const derived = d.derived?.analysis(f, { glassTransitionK: s.glassTransitionK }, (message) =>
      warnings.push({ code: `model-${d.kind}`, message }),
    );
    setModelResult(models, d.kind, {
      ...constants,
      referenceK: f.referenceK,
      ...derived,
      ...stats(f, ids),
    } as ShiftModelResult);
  }
  // the suggestion weighs the built-in laws by its own rule (core/models/model-hint.ts); a model
  // added through the registry is fitted and reported but not ranked
  const known = fits as Parameters<typeof suggestShiftModel>[0];
  if (known.wlf || known.arrhenius || known.polynomial) {
    const hint = suggestShiftModel(known, s.glassTransitionK ?? undefined);
    models.hint = { model: hint.recommended, reason: hint.reasons.join(' ') };
  }
  return models;
}
