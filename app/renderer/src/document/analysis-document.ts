/**
 * What the user edits: the imported data, the analysis settings and the manual changes (exclusions,
 * masks, locked shifts). Everything the pipeline needs to repeat the analysis, and nothing it
 * computes. Stored immutably: every edit makes a new document (history.ts keeps the old ones).
 */
import type { DataWarning, Dataset } from '@core/data';
import type { DocumentOptions, SavedAnalysis } from '@core/document';
import { SI_DISPLAY, type DisplayUnits } from '../format/display-units';

export type { DocumentOptions };

/** The document is what an analysis file holds (core/document/analysis-file.ts). */
export type AnalysisDocument = SavedAnalysis;

export function newDocument(
  dataset: Dataset,
  origin: string,
  opts: {
    invented?: boolean;
    importWarnings?: DataWarning[];
    options?: DocumentOptions;
    display?: DisplayUnits;
  } = {},
): AnalysisDocument {
  return {
    dataset,
    options: opts.options ?? {},
    invented: opts.invented ?? false,
    origin,
    importWarnings: opts.importWarnings ?? [],
    display: opts.display ?? SI_DISPLAY,
  };
}

export function withDisplay(doc: AnalysisDocument, display: DisplayUnits): AnalysisDocument {
  return { ...doc, display };
}

export function withOptions(
  doc: AnalysisDocument,
  patch: Partial<DocumentOptions>,
): AnalysisDocument {
  return { ...doc, options: { ...doc.options, ...patch } };
}

/** Includes or excludes one isotherm. */
export function toggleExcluded(doc: AnalysisDocument, isothermId: string): AnalysisDocument {
  const now = doc.options.excludedIsothermIds ?? [];
  const next = now.includes(isothermId)
    ? now.filter((id) => id !== isothermId)
    : [...now, isothermId];
  return withOptions(doc, { excludedIsothermIds: next });
}

/** Locks one isotherm at a manual log10 aT (decades), or unlocks it with `null`. */
export function setLocked(
  doc: AnalysisDocument,
  isothermId: string,
  log10aT: number | null,
): AnalysisDocument {
  const next = { ...(doc.options.lockedLog10aT ?? {}) };
  if (log10aT === null) delete next[isothermId];
  else next[isothermId] = log10aT;
  return withOptions(doc, { lockedLog10aT: next });
}

export interface PointRef {
  file: string;
  row: number;
}

const key = (p: PointRef): string => `${p.file}\u0000${p.row}`;

/** Masks points (or unmasks them when every one given is already masked). */
export function toggleMasked(doc: AnalysisDocument, points: PointRef[]): AnalysisDocument {
  if (points.length === 0) return doc;
  const now = doc.options.maskedPoints ?? [];
  const have = new Set(now.map(key));
  const allMasked = points.every((p) => have.has(key(p)));
  const next = allMasked
    ? now.filter((p) => !points.some((q) => key(q) === key(p)))
    : [...now, ...points.filter((p) => !have.has(key(p)))];
  return withOptions(doc, { maskedPoints: next });
}

export function isMasked(doc: AnalysisDocument, p: PointRef): boolean {
  return (doc.options.maskedPoints ?? []).some((q) => q.file === p.file && q.row === p.row);
}
