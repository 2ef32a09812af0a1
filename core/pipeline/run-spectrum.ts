/**
 * Step 3 of the pipeline: the Prony series fitted to the master curve at Tref (core/spectrum),
 * and the indicators computed from it. Each part that cannot be computed becomes a warning.
 */
import type { Dataset } from '../data/types';
import { fitProny } from '../spectrum/prony-fit';
import type { ReducedCurve } from '../spectrum/types';
import type { ResolvedAnalysisOptions } from './options';
import type {
  AnalysisIndicator,
  AnalysisMasterCurve,
  AnalysisModels,
  AnalysisProny,
  AnalysisWarning,
} from './types';
import { computeIndicators } from './indicators';

const finite = (v: number): number | null => (Number.isFinite(v) ? v : null);

const positive = (v: number | null | undefined): v is number =>
  typeof v === 'number' && Number.isFinite(v) && v > 0;

/** The master curve as the Prony fit takes it; only points with every used value positive. */
export function reducedCurveOf(dataset: Dataset, mc: AnalysisMasterCurve): ReducedCurve | null {
  // plain loops over the points (no index arrays and closures): 10⁶ points take milliseconds
  const x: number[] = [];
  if (dataset.abscissa === 'angularFrequency') {
    const s = mc.quantities.storageModulus;
    const l = mc.quantities.lossModulus;
    if (!s && !l) return null;
    const storage: number[] = [];
    const loss: number[] = [];
    for (let i = 0; i < mc.reducedX.length; i++) {
      const xi = mc.reducedX[i];
      if (mc.outlier[i] || !positive(xi)) continue;
      const si = s?.[i];
      const li = l?.[i];
      if ((s && !positive(si)) || (l && !positive(li))) continue;
      x.push(xi);
      if (s) storage.push(si as number);
      if (l) loss.push(li as number);
    }
    return { x, ...(s && { storage }), ...(l && { loss }) };
  }
  const g = mc.quantities.relaxationModulus;
  if (!g) return null;
  const relaxation: number[] = [];
  for (let i = 0; i < mc.reducedX.length; i++) {
    const xi = mc.reducedX[i];
    const gi = g[i];
    if (mc.outlier[i] || !positive(xi) || !positive(gi)) continue;
    x.push(xi);
    relaxation.push(gi);
  }
  return { x, relaxation };
}

export function runSpectrum(
  dataset: Dataset,
  masterCurve: AnalysisMasterCurve,
  models: AnalysisModels,
  settings: ResolvedAnalysisOptions,
  warnings: AnalysisWarning[],
): { prony: AnalysisProny | null; indicators: AnalysisIndicator[] } {
  if (settings.pronyModesPerDecade === 0) return { prony: null, indicators: [] };
  const curve = reducedCurveOf(dataset, masterCurve);
  if (!curve) {
    warnings.push({
      code: 'prony-not-fitted',
      message: `No Prony series: it is fitted to storage/loss or relaxation moduli, and this ${dataset.testKind} data has none.`,
    });
    return { prony: null, indicators: [] };
  }
  try {
    const fit = fitProny(curve, {
      modesPerDecade: settings.pronyModesPerDecade,
      equilibrium: settings.pronyEquilibrium,
    });
    if (!fit.converged)
      warnings.push({
        code: 'not-converged',
        model: 'prony',
        message: `The Prony series fit did not converge: ${fit.reason}`,
      });
    for (const w of fit.warnings.filter((x) => x.pointIndex < 0))
      warnings.push({ code: 'prony', message: `Prony fit: ${w.message}`, model: 'prony' });
    const errs = [fit.fitError.storageRms, fit.fitError.lossRms, fit.fitError.relaxationRms].filter(
      Number.isFinite,
    );
    const rms = errs.length ? Math.sqrt(errs.reduce((a, e) => a + e * e, 0) / errs.length) : null;
    const prony: AnalysisProny = {
      fittedTo: curve.relaxation
        ? ['relaxationModulus']
        : [
            ...(curve.storage ? (['storageModulus'] as const) : []),
            ...(curve.loss ? (['lossModulus'] as const) : []),
          ],
      deformation: dataset.deformation,
      equilibriumModulusPa: fit.series.equilibriumModulusPa,
      equilibrium: { ...fit.equilibrium },
      terminalSlopes: {
        storage: finite(fit.terminal.storageSlope),
        loss: finite(fit.terminal.lossSlope),
        relaxation: finite(fit.terminal.relaxationSlope),
      },
      pointCount: fit.pointCount,
      binCount: fit.binCount,
      instantaneousModulusPa: fit.normalised.instantaneousModulusPa,
      tauS: [...fit.series.tauS],
      modulusPa: [...fit.series.modulusPa],
      modesPerDecade: settings.pronyModesPerDecade,
      rmsRelativeError: rms,
      reducedWindow: [fit.window.min, fit.window.max],
    };
    const indicators = computeIndicators(
      dataset,
      masterCurve,
      fit.series,
      fit.window,
      models,
      warnings,
    );
    return { prony, indicators };
  } catch (e) {
    warnings.push({
      code: 'prony-not-fitted',
      message: `No Prony series could be fitted: ${e instanceof Error ? e.message : String(e)}`,
    });
    return { prony: null, indicators: [] };
  }
}
