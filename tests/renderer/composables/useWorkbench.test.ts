import { describe, expect, it } from 'vitest';
import { ref } from 'vue';
import { useWorkbench } from '../../../app/renderer/src/composables/useWorkbench';
import { newDocument, setLocked } from '../../../app/renderer/src/document/analysis-document';
import type { EngineRequest, EngineResult } from '../../../app/renderer/src/engine/engine-protocol';
import type { UseEngineReturn } from '../../../app/renderer/src/engine/useEngine';
import type { Analysis } from '../../../core/pipeline/types';
import { tinyDataset } from '../document/tiny-dataset';

/** An engine that answers every analysis with a marker of the options it was asked with. */
function fakeEngine(seen: EngineRequest[]): UseEngineReturn {
  return {
    pending: ref(0),
    progress: ref(null),
    usesWorker: false,
    run: async (req): Promise<EngineResult> => {
      seen.push(req);
      return {
        kind: 'analysed',
        analysis: { settings: req.kind === 'analyse' ? req.options : {} } as unknown as Analysis,
      };
    },
  };
}

describe('useWorkbench()', () => {
  it('useWorkbench() makes a whole drag (previews then commit) one undo step', async () => {
    const seen: EngineRequest[] = [];
    const wb = useWorkbench(fakeEngine(seen));
    const start = newDocument(tinyDataset(), 'tiny');
    wb.reset(start);
    wb.commit(setLocked(start, 'T01', 0.1));
    const before = wb.doc.value!;
    wb.preview(setLocked(before, 'T02', 0.2));
    wb.preview(setLocked(before, 'T02', 0.3));
    wb.commit(setLocked(before, 'T02', 0.4));
    await wb.settled();
    expect(wb.doc.value!.options.lockedLog10aT).toEqual({ T01: 0.1, T02: 0.4 });
    wb.undo();
    expect(wb.doc.value).toBe(before);
    wb.undo();
    expect(wb.doc.value).toBe(start);
    expect(wb.canUndo.value).toBe(false);
    wb.redo();
    wb.redo();
    expect(wb.doc.value!.options.lockedLog10aT).toEqual({ T01: 0.1, T02: 0.4 });
    await wb.settled();
    expect(wb.analysis.value!.settings).toEqual(wb.doc.value!.options);
  });

  it('useWorkbench() cancelPreview() goes back to where the drag started', async () => {
    const wb = useWorkbench(fakeEngine([]));
    const start = newDocument(tinyDataset(), 'tiny');
    wb.reset(start);
    wb.preview(setLocked(start, 'T01', 1));
    wb.cancelPreview();
    expect(wb.doc.value).toBe(start);
    await wb.settled();
  });
});
