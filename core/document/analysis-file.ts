/**
 * Our own versioned analysis file (`*.thermoshift.json`): the data, the settings and the manual
 * changes, enough to reopen an analysis exactly as it was. Validated on load; a newer format
 * version is refused with a message saying so, never half-read.
 *
 *   { "format": "thermoshift-analysis", "formatVersion": 2, "savedAt": ISO time,
 *     "savedBy": app version, "origin": text, "invented": boolean,
 *     "dataset": Dataset, "options": AnalysisOptions (without callbacks),
 *     "importWarnings": [{ file, row, column, message }] (optional),
 *     "display": { "modulus": "Pa"|"kPa"|"MPa"|"GPa", "frequency": "rad/s"|"Hz" } }
 *
 * Format 1 (Thermoshift 0.1) had no "display": it opens with Pa and rad/s, as 0.1 showed.
 *
 * Numbers that are NaN (missing values) are written as null and read back as NaN.
 */
import { z } from 'zod';
import type { DataWarning, Dataset } from '../data/types';
import { analysisOptionsSchema } from '../pipeline/options';
import type { AnalysisOptions } from '../pipeline/options';
import { THERMOSHIFT_VERSION } from '../pipeline/version';
import { FREQUENCY_UNITS, MODULUS_UNITS, SI_DISPLAY } from '../units/output-units';
import type { DisplayUnits } from '../units/output-units';
import { datasetSchema } from './dataset-schema';

/** The serialisable options (no progress callback; import warnings are kept beside them). */
export type DocumentOptions = Omit<
  AnalysisOptions,
  'onProgress' | 'importWarnings' | 'warmStartLog10aT' | 'heldExpansion'
>;

/**
 * What an analysis file holds: the imported data, the analysis settings and the manual changes
 * (exclusions, masks, locked shifts) — everything the pipeline needs to repeat the analysis, and
 * nothing it computes. The app edits it as its document; `thermoshift compare` reads it.
 */
export interface SavedAnalysis {
  dataset: Dataset;
  options: DocumentOptions;
  /** True for the invented demo data, so the UI keeps saying so. */
  invented: boolean;
  /** Short description of where the data came from, shown in the title bar. */
  origin: string;
  /** Problems the importer found in the files (shown with the analysis warnings). */
  importWarnings: DataWarning[];
  /** Units the app shows and exports in (the data stay SI). */
  display: DisplayUnits;
}

export const ANALYSIS_FORMAT = 'thermoshift-analysis';
export const ANALYSIS_FORMAT_VERSION = 2;
/** The oldest format this version still opens. */
export const OLDEST_ANALYSIS_FORMAT_VERSION = 1;
export const ANALYSIS_FILE_SUFFIX = '.thermoshift.json';

/** A file that is not a readable analysis; the message names the file and the problem. */
export class AnalysisFileError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'AnalysisFileError';
  }
}

const displaySchema = z.object({
  modulus: z.enum(MODULUS_UNITS as ['Pa', 'kPa', 'MPa', 'GPa']),
  frequency: z.enum(FREQUENCY_UNITS as ['rad/s', 'Hz']),
});

const fileSchema = z.object({
  format: z.literal(ANALYSIS_FORMAT),
  formatVersion: z.number().int().min(OLDEST_ANALYSIS_FORMAT_VERSION).max(ANALYSIS_FORMAT_VERSION),
  savedAt: z.string(),
  savedBy: z.string(),
  origin: z.string(),
  invented: z.boolean(),
  dataset: datasetSchema,
  options: analysisOptionsSchema,
  importWarnings: z
    .array(z.object({ file: z.string(), row: z.number(), column: z.number(), message: z.string() }))
    .optional(),
  /** From format 2 on. */
  display: displaySchema.optional(),
});

export function serializeAnalysis(doc: SavedAnalysis, now: Date = new Date()): string {
  const body = {
    format: ANALYSIS_FORMAT,
    formatVersion: ANALYSIS_FORMAT_VERSION,
    savedAt: now.toISOString(),
    savedBy: THERMOSHIFT_VERSION,
    origin: doc.origin,
    invented: doc.invented,
    dataset: doc.dataset,
    options: doc.options,
    importWarnings: doc.importWarnings,
    display: doc.display,
  };
  // JSON has no NaN: missing values become null (read back as NaN by datasetSchema).
  return JSON.stringify(body, (_k, v: unknown) =>
    typeof v === 'number' && !Number.isFinite(v) ? null : v,
  );
}

export function parseAnalysis(text: string, fileName: string): SavedAnalysis {
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (e) {
    throw new AnalysisFileError(
      `${fileName} is not a Thermoshift analysis: it is not valid JSON (${(e as Error).message}).`,
    );
  }
  const head = z.object({ format: z.string(), formatVersion: z.number() }).safeParse(raw);
  if (!head.success || head.data.format !== ANALYSIS_FORMAT) {
    throw new AnalysisFileError(
      `${fileName} is not a Thermoshift analysis file (no "format": "${ANALYSIS_FORMAT}" entry). ` +
        'To analyse measurement tables, use Import data instead.',
    );
  }
  if (head.data.formatVersion > ANALYSIS_FORMAT_VERSION) {
    throw new AnalysisFileError(
      `${fileName} was saved by a newer Thermoshift (analysis format ${head.data.formatVersion}); ` +
        `this version reads format ${ANALYSIS_FORMAT_VERSION}. Please update Thermoshift to open it.`,
    );
  }
  const parsed = fileSchema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const where = issue.path.map(String).join('.') || 'file';
    throw new AnalysisFileError(`${fileName} is damaged: ${where}: ${issue.message}.`);
  }
  const f = parsed.data;
  return {
    dataset: f.dataset,
    options: f.options,
    invented: f.invented,
    origin: f.origin,
    importWarnings: f.importWarnings ?? [],
    display: f.display ?? SI_DISPLAY,
  };
}
