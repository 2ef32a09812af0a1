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
import { CliError } from './cli-error.ts';
import { EXIT } from './exit-codes.ts';

export function analyseSample(
  files: InputFile[],
  settings: Settings,
  settingsSource: string,
  fileTemperatureK: Record<string, number> = {},
): Analysis {
  const imported = importFiles(files, { ...settingsToImportOptions(settings), fileTemperatureK });
  const options = settingsToAnalysisOptions(settings, imported.dataset, settingsSource);
  return buildMasterCurve(imported.dataset, { ...options, importWarnings: imported.warnings });
}

/**
 * A run of two or more isotherms in which at most one stays in the fit (every other one overlaps
 * nothing, is too short or was left out) has no master curve: that is a data error (exit 1), not
 * a result, so no one mistakes the lone reference isotherm for a master curve.
 */
export function assertSomethingShifted(a: Analysis): void {
  const included = a.curves.filter((c) => c.included);
  if (a.curves.length < 2 || included.length >= 2) return;
  const why = a.curves
    .filter((c) => !c.included)
    .map((c) => `${c.isothermId}${c.note ? ` (${c.note})` : ''}`)
    .join(', ');
  throw new CliError(
    `nothing could be shifted: ${included.length} of ${a.curves.length} isotherms stay in the fit; left out: ${why}`,
    EXIT.dataError,
  );
}
