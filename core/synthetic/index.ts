export * from './random';
export * from './isotherm-set';
export * from './creep-set';
export * from './spectrum-shapes';
export * from './wander';
export * from './sweep-file';
export type { SyntheticDensity, SyntheticOutliers, SyntheticSetOptions } from './isotherm-frame';
export * from './number-text';
export type * from './demo-types';
export * from './demo-scenarios';
export { demoModelAt, demoShiftAt, demoXToSI, measureDemoScenario } from './demo-measure';
export type { DemoTruth, DemoTruthIsotherm, DemoTruthLaw } from './demo-truth';
export { demoTruth } from './demo-truth';
export type { DemoSample } from './demo-samples';
export { buildDemoSample, demoDataset, demoSampleFiles } from './demo-samples';
export * from './workbook-writer';
export type { DemoBinaryFile } from './demo-workbook';
export { DEMO_WORKBOOK_PATH, demoWorkbook, demoWorkbookReadme } from './demo-workbook';
export { INVENTED_DEMO_MARKER, isInventedDemo } from './demo-header';
export {
  LOT_FIRM,
  LOT_PRODUCT,
  LOTS,
  lotReleaseFiles,
  lotScenario,
  lotSpecification,
} from './lot-release';
export type { LotDefinition } from './lot-release';
