/** Prony series, interconversion, master-curve indicators and design predictions (docs/conventions.md §5). */
export * from './prony-model';
export type * from './types';
export { relaxationTimeGrid } from './tau-grid';
export { fitProny, resolvePronyFitOptions } from './prony-fit';
export type { PronyFitError, PronyFitOptions, PronyFitResult } from './prony-fit';
export { denormaliseProny, normaliseProny, pronyZeroShearViscosity } from './prony-forms';
export { creepCompliance, creepFromProny } from './creep-from-prony';
export type { RetardationSeries } from './creep-from-prony';
export { shearFromTensile, tensileFactor, tensileFromShear } from './modulus-convert';
export { findCrossovers } from './crossover';
export type { Crossover } from './crossover';
export { fitViscosityCurve } from './viscosity-fit';
export type { ViscosityFitResult, ViscosityModel } from './viscosity-fit';
export { modulusPlateaus, plateauModulus } from './plateaus';
export type { ModulusPlateaus, PlateauModulus } from './plateaus';
export { frequencyWindow, tanDeltaPeak, tanDeltaPeakTemperature } from './tan-delta-peak';
export type { TanDeltaPeak, TanDeltaPeakTemperature } from './tan-delta-peak';
export { predictQuantity, STANDING_CAUTIONS } from './predict';
export type {
  Prediction,
  PredictionContext,
  PredictionFlags,
  PredictionQuery,
  PredictedQuantity,
} from './predict';
export { pronySymbols, type PronySymbols } from './prony-symbols';
