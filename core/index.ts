/**
 * Thermoshift core: a pure TypeScript library (no DOM, no Node, no Electron).
 * The one entry point for scripts is `buildMasterCurve(dataset, options)` (core/pipeline), fed by
 * `importFiles(files, options)` (core/io); the app and the `thermoshift` command call the same.
 */
export * from './data';
export * from './units';
export * from './numeric';
export * from './io';
export * from './shift';
export * from './models';
export * from './spectrum';
export * from './pipeline';
export * from './report';
export * from './compare';
export * from './document';
// core/pipeline re-exports the kind of shift model from core/models: name the one source.
export type { ShiftModelKind } from './models';
