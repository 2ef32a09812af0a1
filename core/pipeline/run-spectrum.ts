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
import { masterColumns, type MasterColumns } from './master-columns';

const finite = (v: number): number | null => (Number.isFinite(v) ? v : null);

/** A finite positive value (NaN, ±Infinity, 0 and negatives fail). */
const positive = (v: number): boolean => v > 0 && v < Infinity;

/**
 * The master curve as the Prony fit takes it; only points with every used value positive.
 * `columns`: the master curve's typed columns, when the caller has them (reduceMasterCurve).
 */
export function reducedCurveOf(
  dataset: Dataset,
  mc: AnalysisMasterCurve,
  columns: MasterColumns = masterColumns(mc),
): ReducedCurve | null {
  // plain loops over typed columns, kept points written in place: no growing arrays
  const n = columns.x.length;
  const cx = columns.x;
  const out = columns.outlier;
  const x = new Float64Array(n);
  let m = 0;
  if (dataset.abscissa === 'angularFrequency') {
    const s = columns.quantities.storageModulus;
    const l = columns.quantities.lossModulus;
    if (!s && !l) return null;
    const storage = s ? new Float64Array(n) : null;
    const loss = l ? new Float64Array(n) : null;
    for (let i = 0; i < n; i++) {
      const xi = cx[i];
      if (out[i] || !positive(xi)) continue;
      if ((s && !positive(s[i])) || (l && !positive(l[i]))) continue;
      x[m] = xi;
      if (storage) storage[m] = s![i];
      if (loss) loss[m] = l![i];
      m++;
    }
    return {
      x: x.subarray(0, m),
      ...(storage && { storage: storage.subarray(0, m) }),
      ...(loss && { loss: loss.subarray(0, m) }),
    };
  }
  const g = columns.quantities.relaxationModulus;
  if (!g) return null;
  const relaxation = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const xi = cx[i];
    if (out[i] || !positive(xi) || !positive(g[i])) continue;
    x[m] = xi;
    relaxation[m] = g[i];
    m++;
  }
  return { x: x.subarray(0, m), relaxation: relaxation.subarray(0, m) };
}

export function runSpectrum(
  dataset: Dataset,
  masterCurve: AnalysisMasterCurve,
  models: AnalysisModels,
  settings: ResolvedAnalysisOptions,
  warnings: AnalysisWarning[],
  /** The master curve's typed columns, when the caller has them (reduceMasterCurve). */
  columns?: MasterColumns,
): { prony: AnalysisProny | null; indicators: AnalysisIndicator[] } {
  if (settings.pronyModesPerDecade === 0) return { prony: null, indicators: [] };
  const cols = columns ?? masterColumns(masterCurve);
  const curve = reducedCurveOf(dataset, masterCurve, cols);
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
      cols,
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
