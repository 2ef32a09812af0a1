/**
 * One sample from files to Analysis: import (core/io), settings resolved against the dataset,
 * then the single core entry point buildMasterCurve. Used by `build`, `batch` and the batch bench,
 * so all three run exactly the same code.
 */
import { importFiles } from '@core/io';
import { buildMasterCurve } from '@core/pipeline';
import { settingsToAnalysisOptions, settingsToImportOptions, type Settings } from '@core/pipeline';
import type { Analysis } from '@core/pipeline';
import type { InputFile } from './io/read-inputs.ts';

export function analyseSample(
  files: InputFile[],
  settings: Settings,
  settingsSource: string,
): Analysis {
  const imported = importFiles(files, settingsToImportOptions(settings));
  const options = settingsToAnalysisOptions(settings, imported.dataset, settingsSource);
  return buildMasterCurve(imported.dataset, { ...options, importWarnings: imported.warnings });
}
