import { describe, expect, it } from 'vitest';
import { ref } from 'vue';
import {
  heldExpansionFrom,
  useWorkbench,
  warmStartFrom,
} from '../../../app/renderer/src/composables/useWorkbench';
import { newDocument, setLocked } from '../../../app/renderer/src/document/analysis-document';
import type { EngineRequest, EngineResult } from '../../../app/renderer/src/engine/engine-protocol';
import type { UseEngineReturn } from '../../../app/renderer/src/engine/useEngine';
import type { Analysis } from '../../../core/pipeline/types';
import { tinyDataset } from '../document/tiny-dataset';

/** An invented αV found from the data by the last full fit (1/K). */
const FITTED = { expansionPerK: 6.1e-4, expansionStdErr: 2e-5 };

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
        analysis: {
          settings: req.kind === 'analyse' ? req.options : {},
          dataset: req.kind === 'analyse' ? req.dataset : null,
          referenceTemperatureK: 400,
          vertical: {
            requested: 'auto',
            chosen: 'data',
            reason: 'invented',
            ...FITTED,
            effectDecades: 0.03,
            z: -20,
          },
          curves:
            req.kind === 'analyse'
              ? req.dataset.isotherms.map((i, k) => ({ isothermId: i.id, log10aT: -0.5 * k }))
              : [],
        } as unknown as Analysis,
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

describe('warmStartFrom()', () => {
  it('warmStartFrom() starts a live re-fit from the shifts on show, and the drag previews send them', async () => {
    const seen: EngineRequest[] = [];
    const wb = useWorkbench(fakeEngine(seen));
    const start = newDocument(tinyDataset(), 'tiny');
    wb.reset(start);
    await wb.settled();
    const ids = start.dataset.isotherms.map((i) => i.id);
    const expected = Object.fromEntries(ids.map((id, k) => [id, -0.5 * k]));
    expect(warmStartFrom(wb.analysis.value, start)).toEqual(expected);
    wb.preview(setLocked(start, ids[1], 0.2));
    await wb.settled();
    const last = seen[seen.length - 1];
    expect(last.kind === 'analyse' && last.warmStartLog10aT).toEqual(expected);
    expect(warmStartFrom(null, start)).toBeUndefined();
    const otherTref = { ...start, options: { ...start.options, referenceTemperatureK: 300 } };
    expect(warmStartFrom(wb.analysis.value, otherTref)).toBeUndefined();
  });
});

describe('heldExpansionFrom()', () => {
  it('heldExpansionFrom() keeps the αV of the last full fit during a drag and lets the release fit it again', async () => {
    const seen: EngineRequest[] = [];
    const wb = useWorkbench(fakeEngine(seen));
    const start = newDocument(tinyDataset(), 'tiny');
    wb.reset(start);
    await wb.settled();
    expect(heldExpansionFrom(wb.analysis.value, start)).toEqual(FITTED);
    const id = start.dataset.isotherms[1].id;
    wb.preview(setLocked(start, id, 0.2));
    await wb.settled();
    const drag = seen[seen.length - 1];
    expect(drag.kind === 'analyse' && drag.heldExpansion).toEqual(FITTED);
    wb.commit(setLocked(start, id, 0.2));
    await wb.settled();
    const release = seen[seen.length - 1];
    expect(release.kind === 'analyse' && release.heldExpansion).toBeUndefined();
    // Not when bT is given (density) or off, nor for another reference temperature.
    const density = {
      ...start,
      options: {
        ...start.options,
        verticalShift: 'density' as const,
        density: { volumetricExpansionPerK: 6e-4 },
      },
    };
    expect(heldExpansionFrom(wb.analysis.value, density)).toBeUndefined();
    const otherTref = { ...start, options: { ...start.options, referenceTemperatureK: 300 } };
    expect(heldExpansionFrom(wb.analysis.value, otherTref)).toBeUndefined();
    expect(heldExpansionFrom(null, start)).toBeUndefined();
    // 'auto' that found no bT keeps bT = 1 during the drag (no αV fit at every step either).
    const none = {
      ...wb.analysis.value!,
      vertical: { ...wb.analysis.value!.vertical!, chosen: 'none' as const, expansionPerK: null },
    };
    expect(heldExpansionFrom(none, start)).toEqual({ expansionPerK: null, expansionStdErr: null });
  });
});
