/**
 * The single entry point of the Thermoshift core (`buildMasterCurve`) and what goes with it: the
 * options and settings schemas, the stable JSON summary, and the conventions stated everywhere.
 */
export { buildMasterCurve, sampleOf } from './build-master-curve';
export {
  analysisOptionsSchema,
  resolveAnalysisOptions,
  defaultReferenceK,
  OptionsError,
  DEFAULT_MODELS,
  DEFAULT_PRONY_MODES_PER_DECADE,
  type AnalysisOptions,
  type ResolvedAnalysisOptions,
} from './options';
export {
  settingsSchema,
  parseSettings,
  mergeSettings,
  settingsToAnalysisOptions,
  settingsToImportOptions,
  settingTemperatureK,
  parseMask,
  SettingsError,
  type Settings,
} from './settings';
export {
  analysisSummary,
  SUMMARY_SCHEMA,
  type AnalysisSummary,
  type SummaryCurve,
} from './summary';
export { CONVENTIONS, conventionCommentLines } from './conventions';
export { reduceToMasterCurve } from './reduce';
export { PipelineError } from './errors';
export {
  predictFromAnalysis,
  defaultPredictionModel,
  PredictionError,
  type AnalysisQuery,
  type AnalysisPrediction,
} from './predict-from-analysis';
export { appliedVertical, log10bTAt, type VerticalShiftAt } from './vertical-at';
export { vanGurpPalmenSeries, type VanGurpPalmenSeries } from './van-gurp-palmen';
export { THERMOSHIFT_VERSION } from './version';
export { toCelsius } from './temperature';
export type * from './types';
// Plot series and per-isotherm views of an analysis, shared by the report and the app.
export { isothermStates, type IsothermState, type IsothermUse } from './isotherm-states';
export {
  hasQuantity,
  isothermValues,
  reducedIsotherms,
  type ReducedIsotherm,
} from './reduced-isotherms';
export { coleColeSeries, lossTangentSeries, type CheckSeries } from './superposition-plots';
export { arrheniusPlot, type ArrheniusPlot, type ArrheniusPoint } from './arrhenius-plot';
export { overlapResiduals, type IsothermResiduals } from './overlap-residuals';
export { pronyCurve, type PronyCurve } from './prony-curves';
export { relaxationSpectrum, type RelaxationSpectrum } from './relaxation-spectrum';
export {
  findShiftModel,
  registerShiftModel,
  shiftModel,
  shiftModelKindList,
  shiftModelKinds,
  shiftModels,
} from '../models';
export type { AnyShiftModelDescriptor, ShiftModelDescriptor } from '../models';
export {
  fittedShiftModels,
  modelConstant,
  modelResult,
  type FittedShiftModel,
  type ShiftModelResult,
} from './model-results';
