import { describe, expect, it } from 'vitest';
import { ref, shallowRef } from 'vue';
import { useCurveEdits } from '../../../app/renderer/src/composables/useCurveEdits';
import { useWorkbench } from '../../../app/renderer/src/composables/useWorkbench';
import { newDocument } from '../../../app/renderer/src/document/analysis-document';
import type { UseEngineReturn } from '../../../app/renderer/src/engine/useEngine';
import type { Analysis } from '../../../core/pipeline/types';
import { tinyDataset } from '../document/tiny-dataset';

const idleEngine: UseEngineReturn = {
  pending: ref(0),
  progress: ref(null),
  usesWorker: false,
  run: async () => ({ kind: 'failed', message: 'not needed here', errorName: 'Error' }),
};

function setup() {
  const wb = useWorkbench(idleEngine);
  wb.reset(newDocument(tinyDataset(), 'tiny'));
  const analysis = shallowRef<Analysis | null>({
    curves: [{ isothermId: 'T02', log10aT: -0.5 }],
  } as unknown as Analysis);
  const notes: string[] = [];
  return { wb, edits: useCurveEdits(wb, analysis, (t) => notes.push(t)), notes };
}

describe('useCurveEdits()', () => {
  it('useCurveEdits() nudges from the fitted shift and locks the result', () => {
    const { wb, edits } = setup();
    edits.nudge('T02', 0.05);
    expect(wb.doc.value!.options.lockedLog10aT).toEqual({ T02: -0.45 });
    edits.toggleLock('T02');
    expect(wb.doc.value!.options.lockedLog10aT).toEqual({});
  });

  it('useCurveEdits() releases locked shifts when Tref changes, says so, and undo restores them', () => {
    const { wb, edits, notes } = setup();
    edits.toggleLock('T02');
    edits.changeSettings({ referenceTemperatureK: 330 });
    expect(wb.doc.value!.options.lockedLog10aT).toEqual({});
    expect(notes[0]).toMatch(/released 1 locked shift/);
    wb.undo();
    expect(wb.doc.value!.options.lockedLog10aT).toEqual({ T02: -0.5 });
  });

  it('useCurveEdits() drag previews then commits one step from where the drag began', () => {
    const { wb, edits } = setup();
    edits.drag('T02', 0.2, false);
    edits.drag('T02', 0.3, true);
    expect(wb.doc.value!.options.lockedLog10aT).toEqual({ T02: -0.2 });
    wb.undo();
    expect(wb.doc.value!.options.lockedLog10aT).toBeUndefined();
  });
});
