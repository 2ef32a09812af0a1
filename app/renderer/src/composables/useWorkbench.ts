/**
 * The state of the open analysis: the document with its undo/redo history, the latest analysis
 * from the engine, and the edit commands. Every edit goes through `commit()` (one undo step);
 * a drag previews through `preview()` and commits once on release.
 */
import { computed, shallowRef, ref, type ComputedRef, type Ref, type ShallowRef } from 'vue';
import type { Analysis } from '@core/pipeline';
import type { AnalysisDocument } from '../document/analysis-document';
import {
  createHistory,
  pushHistory,
  redo as redoHistory,
  replacePresent,
  undo as undoHistory,
  type History,
} from '../document/history';
import type { UseEngineReturn } from '../engine/useEngine';
import { useLatestRunner } from './useLatestRunner';
import { heldExpansionFrom } from '../document/live-refit';

export { heldExpansionFrom } from '../document/live-refit';

export interface UseWorkbenchReturn {
  doc: ComputedRef<AnalysisDocument | null>;
  analysis: ShallowRef<Analysis | null>;
  /** The message of the last failed analysis (null when the last one worked). */
  analysisError: Ref<string | null>;
  busy: Ref<boolean>;
  canUndo: ComputedRef<boolean>;
  canRedo: ComputedRef<boolean>;
  /** Makes `next` the current document, as one undo step. */
  commit(next: AnalysisDocument): void;
  /** Shows `next` (and re-fits) without an undo step; a later commit() records it. */
  preview(next: AnalysisDocument): void;
  /** Drops a preview and goes back to the document it started from. */
  cancelPreview(): void;
  /** Starts over with a document (e.g. a restored autosave): no undo step before it. */
  reset(doc: AnalysisDocument): void;
  undo(): void;
  redo(): void;
  /** Resolves when the analysis of the current document has arrived. */
  settled(): Promise<void>;
}

/**
 * The shifts shown now, as the starting point of a live re-fit (a drag moves one curve a little,
 * so the others start next to their optimum and the shift engine skips its scan). Only when the
 * shown analysis has the same data and reference temperature as the document to re-fit.
 */
export function warmStartFrom(
  shown: Analysis | null,
  doc: AnalysisDocument,
): Record<string, number> | undefined {
  if (!shown || shown.dataset.name !== doc.dataset.name) return undefined;
  const tref = doc.options.referenceTemperatureK;
  if (tref !== undefined && tref !== shown.referenceTemperatureK) return undefined;
  const ids = new Set(doc.dataset.isotherms.map((i) => i.id));
  const out: Record<string, number> = {};
  for (const c of shown.curves)
    if (c.log10aT !== null && ids.has(c.isothermId)) out[c.isothermId] = c.log10aT;
  return Object.keys(out).length ? out : undefined;
}

export function useWorkbench(engine: UseEngineReturn): UseWorkbenchReturn {
  const history = shallowRef<History<AnalysisDocument | null>>(createHistory(null));
  const analysis = shallowRef<Analysis | null>(null);
  const analysisError = ref<string | null>(null);

  // While a curve is dragged, previews re-fit the shifts only (no models, no Prony series): a few
  // tens of milliseconds instead of a few hundred, so the other curves follow the pointer.
  const runner = useLatestRunner<{ doc: AnalysisDocument; light: boolean }>(
    async ({ doc, light }) => {
      const warm = light ? warmStartFrom(analysis.value, doc) : undefined;
      const held = light ? heldExpansionFrom(analysis.value, doc) : undefined;
      const r = await engine.run({
        kind: 'analyse',
        dataset: doc.dataset,
        options: light ? { ...doc.options, models: [], pronyModesPerDecade: 0 } : doc.options,
        importWarnings: doc.importWarnings,
        ...(warm && { warmStartLog10aT: warm }),
        ...(held && { heldExpansion: held }),
      });
      if (history.value.present !== doc) {
        // A newer document is waiting; still show this result if nothing better exists yet.
        if (r.kind === 'analysed' && !analysis.value) analysis.value = r.analysis;
        return;
      }
      if (r.kind === 'analysed') {
        analysis.value = r.analysis;
        analysisError.value = null;
      } else if (r.kind === 'failed') {
        analysisError.value = r.message;
      }
    },
  );

  // The document a drag started from: the undo step of the drag goes back to it.
  let previewBase: AnalysisDocument | null = null;

  const show = (h: History<AnalysisDocument | null>, light = false): void => {
    history.value = h;
    if (h.present) runner.schedule({ doc: h.present, light });
  };

  return {
    doc: computed(() => history.value.present),
    analysis,
    analysisError,
    busy: runner.busy,
    canUndo: computed(() => history.value.past.some((d) => d !== null)),
    canRedo: computed(() => history.value.future.length > 0),
    commit: (next) => {
      const base = previewBase ? replacePresent(history.value, previewBase) : history.value;
      previewBase = null;
      show(pushHistory(base, next));
    },
    preview: (next) => {
      previewBase ??= history.value.present;
      show(replacePresent(history.value, next), true);
    },
    cancelPreview: () => {
      if (previewBase) show(replacePresent(history.value, previewBase));
      previewBase = null;
    },
    reset: (doc) => {
      previewBase = null;
      show(createHistory<AnalysisDocument | null>(doc));
    },
    undo: () => {
      if (previewBase) return;
      const h = undoHistory(history.value);
      if (h.present) show(h);
    },
    redo: () => {
      if (!previewBase) show(redoHistory(history.value));
    },
    settled: () => runner.idle(),
  };
}
