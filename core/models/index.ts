/** Shift-factor models (docs/conventions.md §3): the registry of models, fits, bands, re-referencing, derived quantities, hints. */
export * from './shift-laws';
export type * from './types';
export { resolveShiftFitOptions } from './shift-fit-options';
export type { ResolvedShiftFitOptions } from './shift-fit-options';
export { preparePoints } from './prepare-points';
export type { PreparedPoints } from './prepare-points';
export { weightedLinearFit } from './weighted-linear-fit';
export type { WeightedLinearFit } from './weighted-linear-fit';
export { levenbergMarquardtFit } from './levenberg-marquardt-fit';
export type {
  NonlinearFitOptions,
  NonlinearFitProblem,
  NonlinearFitResult,
} from './levenberg-marquardt-fit';
export { fitWlf, WLF_C2_RUNAWAY_K } from './fit-wlf';
export type { WlfFitOptions } from './fit-wlf';
export { fitArrhenius } from './fit-arrhenius';
export { fitPolynomial } from './fit-polynomial';
export { shiftModelLog10aT } from './shift-model-eval';
export { shiftModelBand } from './shift-model-band';
export type { BandPoint } from './shift-model-band';
export { rereferenceWlf, rereferenceWlfFit } from './wlf-rereference';
export { wlfApparentActivationEnergyKJPerMol, wlfFreeVolume } from './wlf-derived';
export { checkShiftModelRange } from './range-check';
export type { ShiftRangeFlags } from './range-check';
export { suggestShiftModel, WLF_WINDOW_ABOVE_TG_K } from './model-hint';
export type { ModelHint } from './model-hint';
export {
  findShiftModel,
  registerShiftModel,
  shiftModel,
  shiftModelKindList,
  shiftModelKinds,
  shiftModels,
} from './registry';
export type {
  AnyShiftModelDescriptor,
  ShiftModelDerived,
  ShiftModelDerivedRow,
  ShiftModelDescriptor,
  ShiftModelParameter,
  ShiftModelValidity,
  WlfDerived,
} from './registry';
export { fitLinearShiftLaw } from './fit-linear-law';
