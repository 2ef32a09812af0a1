/**
 * The edits of the isotherms, each one undo step: include/exclude, lock/unlock a shift, nudge or
 * drag a curve (the rest re-fitted around it, live while dragging), mask points, change settings.
 */
import type { ShallowRef } from 'vue';
import type { Analysis } from '@core/pipeline';
import {
  setLocked,
  toggleExcluded,
  toggleMasked,
  withOptions,
  type AnalysisDocument,
  type DocumentOptions,
} from '../document/analysis-document';
import type { PointRef } from '../charts/plot-spec';
import type { UseWorkbenchReturn } from './useWorkbench';

export interface UseCurveEditsReturn {
  toggleInclude(id: string): void;
  toggleLock(id: string): void;
  nudge(id: string, decades: number): void;
  drag(id: string, decades: number, done: boolean): void;
  mask(points: PointRef[]): void;
  changeSettings(patch: Partial<DocumentOptions>): void;
}

export function useCurveEdits(
  wb: UseWorkbenchReturn,
  analysis: ShallowRef<Analysis | null>,
  /** Tells the user about a side effect of an edit. */
  notify: (text: string) => void = () => undefined,
): UseCurveEditsReturn {
  /** The shift an isotherm has now: its locked value, else the fitted one. */
  const currentShift = (doc: AnalysisDocument, id: string): number | null =>
    doc.options.lockedLog10aT?.[id] ??
    analysis.value?.curves.find((c) => c.isothermId === id)?.log10aT ??
    null;

  let drag: { id: string; from: AnalysisDocument; base: number } | null = null;

  const edit = (f: (d: AnalysisDocument) => AnalysisDocument): void => {
    const d = wb.doc.value;
    if (d) wb.commit(f(d));
  };

  return {
    toggleInclude: (id) => edit((d) => toggleExcluded(d, id)),
    toggleLock: (id) =>
      edit((d) =>
        d.options.lockedLog10aT && id in d.options.lockedLog10aT
          ? setLocked(d, id, null)
          : setLocked(d, id, currentShift(d, id) ?? 0),
      ),
    nudge: (id, decades) => edit((d) => setLocked(d, id, (currentShift(d, id) ?? 0) + decades)),
    drag(id, decades, done) {
      const d = wb.doc.value;
      if (!d) return;
      if (!drag || drag.id !== id) drag = { id, from: d, base: currentShift(d, id) ?? 0 };
      const next = setLocked(drag.from, id, drag.base + decades);
      if (!done) wb.preview(next);
      else if (Math.abs(decades) < 1e-4) wb.cancelPreview();
      else wb.commit(next);
      if (done) drag = null;
    },
    mask: (points) =>
      edit((d) =>
        toggleMasked(
          d,
          points.map((p) => ({ file: p.file, row: p.row })),
        ),
      ),
    changeSettings: (patch) =>
      edit((d) => {
        const locks = Object.keys(d.options.lockedLog10aT ?? {}).length;
        const trefChanges =
          'referenceTemperatureK' in patch &&
          patch.referenceTemperatureK !== d.options.referenceTemperatureK;
        if (!trefChanges || locks === 0) return withOptions(d, patch);
        // Locked shifts are relative to Tref: with a new Tref they would mean other shifts.
        notify(
          `The new reference temperature released ${locks} locked shift${locks > 1 ? 's' : ''} (they were relative to the old one). Undo brings them back.`,
        );
        return withOptions(d, { ...patch, lockedLog10aT: {} });
      }),
  };
}
