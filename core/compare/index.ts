/** Comparing master curves: samples and lots against a reference, with specification verdicts. */
export { compareAnalyses, COMPARE_CAUTIONS } from './compare-analyses';
export {
  CompareError,
  resolveCompareOptions,
  type CompareOptions,
  type ResolvedCompareOptions,
} from './options';
export {
  specSchema,
  specCriterionSchema,
  parseSpecification,
  criterionName,
  SpecError,
  SPEC_FORMAT,
  SPEC_FORMAT_VERSION,
  type Specification,
  type SpecCriterion,
} from './spec-schema';
export { toPercent } from './verdicts';
export { comparisonCsv, verdictsCsv } from './comparison-csv';
export type { SpecVerdict } from './spec-types';
export type * from './types';
export {
  comparisonReportHtml,
  differenceChart,
  overlayChart,
  sampleColour,
  SAMPLE_COLOURS,
  verdictTable,
  figuresTable,
  type ComparisonReportOptions,
} from './comparison-report';
