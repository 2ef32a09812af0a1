/**
 * Writes the files `build --out DIR` (and each sample of `batch`) produces: the list and the
 * contents come from core/report `outputFiles` (the same list the app exports); here they are only
 * written, as one set that replaces the earlier one as a whole (./io/output-set.ts).
 */
import type { Analysis } from '@core/pipeline';
import { outputFiles, type OutputFileOptions } from '@core/report';
import { writeOutputSet, type OutputEntry } from './io/output-set.ts';

export interface OutputOptions extends OutputFileOptions {
  force: boolean;
}

/** The output files of one analysis, named inside the set under `folder` ('' = top). */
export function outputEntries(a: Analysis, o: OutputFileOptions, folder = ''): OutputEntry[] {
  return outputFiles(a, o).map((f) => ({
    name: folder ? `${folder}/${f.name}` : f.name,
    content: f.content,
  }));
}

/** Writes every output into `dir` as one set; returns the paths written. */
export function writeOutputs(a: Analysis, dir: string, o: OutputOptions): string[] {
  return writeOutputSet(dir, outputEntries(a, o), { force: o.force });
}

/** Today's date as YYYY-MM-DD (UTC), the report's default date. */
export function today(): string {
  return new Date().toISOString().slice(0, 10);
}
