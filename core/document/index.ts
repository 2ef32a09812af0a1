/** core/document: the saved-analysis file format (parse, validate, serialise), pure. */
export {
  ANALYSIS_FILE_SUFFIX,
  ANALYSIS_FORMAT,
  ANALYSIS_FORMAT_VERSION,
  AnalysisFileError,
  OLDEST_ANALYSIS_FORMAT_VERSION,
  parseAnalysis,
  serializeAnalysis,
} from './analysis-file';
export type { DocumentOptions, SavedAnalysis } from './analysis-file';
export { datasetSchema } from './dataset-schema';
