/**
 * The single entry point of the Thermoshift core: one call runs the whole job on one sample —
 * shifts → shift-factor models → Prony series → indicators — collecting every warning, and
 * returns plain JSON-serialisable data with the resolved settings, so the analysis can be
 * repeated exactly. The CLI (`thermoshift build`/`batch`) and the desktop app both call it.
 * Pure and synchronous; `options.onProgress` reports the stages.
 */
import type { Dataset } from '../data/types';
import { defaultReferenceK, resolveAnalysisOptions, type AnalysisOptions } from './options';
import { applyMasks, checkExcluded } from './apply-masks';
import { runShift } from './run-shift';
import { fitShiftModels } from './fit-models';
import { shiftCovarianceFor } from './shift-covariance';
import { reduceMasterCurve } from './reduce';
import { runSpectrum } from './run-spectrum';
import { PipelineError } from './errors';
import { THERMOSHIFT_VERSION } from './version';
import type { Analysis, AnalysisSample, AnalysisWarning } from './types';

/**
 * Builds the master curve of one sample.
 * @param dataset isotherms of one sample (from core/io `importFiles`, or core/synthetic)
 * @param options analysis options; every field optional (see AnalysisOptions for defaults)
 * @throws OptionsError for invalid options (naming the key), PipelineError when nothing can be shifted
 */
export function buildMasterCurve(dataset: Dataset, options: AnalysisOptions = {}): Analysis {
  const progress = options.onProgress ?? (() => undefined);
  if (!dataset || !Array.isArray(dataset.isotherms))
    throw new TypeError('buildMasterCurve: dataset must be a Dataset with an isotherms array');
  if (dataset.isotherms.length === 0)
    throw new PipelineError(`Sample "${dataset.name}": the data holds no isotherm to shift`);
  const excluded = new Set(options.excludedIsothermIds ?? []);
  const active = dataset.isotherms.filter((i) => !excluded.has(i.id));
  if (active.length === 0)
    throw new PipelineError(
      `Sample "${dataset.name}": every isotherm is excluded; nothing is left to shift`,
    );
  let settings = resolveAnalysisOptions(
    options,
    active.map((i) => i.temperatureK),
  );
  checkExcluded(dataset, settings.excludedIsothermIds);
  const warnings: AnalysisWarning[] = (options.importWarnings ?? []).map((w) => ({
    code: 'import',
    message: w.message,
    ...(w.file && { file: w.file }),
    ...(w.row > 0 && { row: w.row }),
    ...(w.column > 0 && { column: w.column }),
  }));
  const data = applyMasks(dataset, settings.maskedPoints, warnings);

  progress(0.05, 'shift');
  let { result, curves } = runShift(
    data,
    settings,
    options.warmStartLog10aT,
    options.heldExpansion,
  );
  // An automatic Tref must be an isotherm that stays in the fit: if the one chosen was left out
  // (e.g. it overlaps nothing), aT = 1 would be extrapolated from others. Choose again among the
  // included ones (the one nearest the middle of their range) and shift once more.
  const atRef = curves.find(
    (c) => Math.abs(c.temperatureK - settings.referenceTemperatureK) < 0.01,
  );
  if (settings.referenceTemperatureAuto && atRef && !atRef.included) {
    const kept = curves.filter((c) => c.included).map((c) => c.temperatureK);
    if (kept.length > 0) {
      settings = { ...settings, referenceTemperatureK: defaultReferenceK(kept) };
      ({ result, curves } = runShift(data, settings, undefined));
    }
  }
  for (const w of result.warnings) warnings.push({ code: w.code, message: w.message });
  const { masterCurve, columns } = reduceMasterCurve(
    data,
    curves,
    Object.fromEntries(result.curves.map((c) => [c.id, c.outlierPoints])),
  );

  progress(0.6, 'models');
  const models = fitShiftModels(curves, settings, warnings, (ids) =>
    shiftCovarianceFor(result, ids),
  );

  progress(0.75, 'spectrum');
  const { prony, indicators } = runSpectrum(data, masterCurve, models, settings, warnings, columns);

  progress(1, 'done');
  return {
    version: THERMOSHIFT_VERSION,
    sample: sampleOf(dataset),
    settings,
    referenceTemperatureK: settings.referenceTemperatureK,
    dataset: data,
    shiftQuantities: [...result.settings.drivers],
    vertical: { ...result.vertical },
    curves,
    overallQualityRmsDecades: result.rmsResidualDecades,
    masterCurve,
    models,
    prony,
    indicators,
    warnings,
  };
}

/** What an analysis says about its sample: name, kind of test, files and metadata (copied). */
export function sampleOf(dataset: Dataset): AnalysisSample {
  return {
    name: dataset.name,
    testKind: dataset.testKind,
    deformation: dataset.deformation,
    abscissa: dataset.abscissa,
    files: [...dataset.files],
    metadata: { ...dataset.metadata },
  };
}
