/**
 * Writes the files `build --out DIR` (and each sample of `batch`) produces: the list and the
 * contents come from core/report `outputFiles` (the same list the app exports); here they are only
 * written, each atomically. Nothing is written when any target exists and --force is off.
 */
import { join } from 'node:path';
import type { Analysis } from '@core/pipeline';
import { outputFiles, type OutputFileOptions } from '@core/report';
import { assertWritable, writeFileAtomic } from './io/atomic-write.ts';

export interface OutputOptions extends OutputFileOptions {
  force: boolean;
}

/** Writes every output into `dir`; returns the paths written. */
export function writeOutputs(a: Analysis, dir: string, o: OutputOptions): string[] {
  const files = outputFiles(a, o).map((f) => [join(dir, f.name), f.content] as const);
  assertWritable(
    files.map(([p]) => p),
    o.force,
  );
  for (const [p, text] of files) writeFileAtomic(p, text, { force: o.force });
  return files.map(([p]) => p);
}

/** Today's date as YYYY-MM-DD (UTC), the report's default date. */
export function today(): string {
  return new Date().toISOString().slice(0, 10);
}
