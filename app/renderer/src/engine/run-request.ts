/**
 * Runs one engine request with the core: the same code in the worker and (where workers are
 * unavailable, e.g. component tests) on the main thread. Errors become messages, never throws.
 */
import { importFiles } from '@core/io';
import { buildMasterCurve } from '@core/pipeline';
import type { EngineRequest, EngineResult } from './engine-protocol';

export function runRequest(
  req: EngineRequest,
  onProgress?: (fraction: number, stage: string) => void,
): EngineResult {
  try {
    if (req.kind === 'import') {
      return { kind: 'imported', result: importFiles(req.files, req.options) };
    }
    const analysis = buildMasterCurve(req.dataset, {
      ...req.options,
      importWarnings: req.importWarnings,
      ...(req.warmStartLog10aT && { warmStartLog10aT: req.warmStartLog10aT }),
      ...(req.heldExpansion && { heldExpansion: req.heldExpansion }),
      onProgress,
    });
    return { kind: 'analysed', analysis };
  } catch (e) {
    const err = e instanceof Error ? e : new Error(String(e));
    return { kind: 'failed', message: err.message, errorName: err.name };
  }
}
