/**
 * Messages between the renderer and the analysis worker. Requests carry plain data only (a
 * Dataset, options, file texts); results are the core's plain JSON results.
 */
import type { DataWarning, Dataset } from '@core/data';
import type { ImportOptions, ImportResult } from '@core/io';
import type { Analysis } from '@core/pipeline';
import type { HeldExpansion } from '@core/shift';
import type { DocumentOptions } from '../document/analysis-document';
import type { TextFile } from '../platform/file-access';

export type EngineRequest =
  | {
      kind: 'analyse';
      dataset: Dataset;
      options: DocumentOptions;
      importWarnings: DataWarning[];
      /** Shifts to start from (live re-fit while dragging): log10 aT by isotherm id. */
      warmStartLog10aT?: Record<string, number>;
      /** The last full fit's bT to keep (live re-fit while dragging): αV is not fitted again. */
      heldExpansion?: HeldExpansion;
    }
  | { kind: 'import'; files: TextFile[]; options: ImportOptions };

export type EngineResult =
  | { kind: 'analysed'; analysis: Analysis }
  | { kind: 'imported'; result: ImportResult }
  | { kind: 'failed'; message: string; errorName: string };

export type WorkerInbound = EngineRequest & { id: number };
export type WorkerOutbound =
  | (EngineResult & { id: number })
  | { id: number; kind: 'progress'; fraction: number; stage: string };
