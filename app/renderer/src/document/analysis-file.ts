/**
 * The analysis file as the app saves and opens it. The format itself (parse, validate,
 * serialise) is core's, core/document/analysis-file.ts, shared with `thermoshift compare`.
 */
import { ANALYSIS_FILE_SUFFIX } from '@core/document';
import { fileStem } from '../exports/export-files';

export {
  ANALYSIS_FILE_SUFFIX,
  ANALYSIS_FORMAT,
  ANALYSIS_FORMAT_VERSION,
  AnalysisFileError,
  OLDEST_ANALYSIS_FORMAT_VERSION,
  parseAnalysis,
  serializeAnalysis,
} from '@core/document';

/** A file name for saving: the same stem as every export of the analysis, with our suffix. */
export function analysisFileName(sampleName: string): string {
  return `${fileStem(sampleName)}${ANALYSIS_FILE_SUFFIX}`;
}
