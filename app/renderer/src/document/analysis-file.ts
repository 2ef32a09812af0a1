/**
 * The name the app saves an analysis under. The file format itself (parse, validate, serialise)
 * is core's, core/document/analysis-file.ts, shared with `thermoshift compare`.
 */
import { ANALYSIS_FILE_SUFFIX } from '@core/document';
import { fileStem } from '../exports/export-files';

/** A file name for saving: the same stem as every export of the analysis, with our suffix. */
export function analysisFileName(sampleName: string): string {
  return `${fileStem(sampleName)}${ANALYSIS_FILE_SUFFIX}`;
}
