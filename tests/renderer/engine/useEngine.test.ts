import { describe, expect, it } from 'vitest';
import { effectScope } from 'vue';
import { useEngine } from '../../../app/renderer/src/engine/useEngine';
import { runRequest } from '../../../app/renderer/src/engine/run-request';
import type { WorkerInbound } from '../../../app/renderer/src/engine/engine-protocol';
import { tinyDataset } from '../document/tiny-dataset';

/** A stand-in worker that answers with the real runRequest, or fails on first use. */
class FakeWorker extends EventTarget {
  terminated = false;
  constructor(private readonly fail: boolean) {
    super();
  }
  postMessage(m: WorkerInbound): void {
    queueMicrotask(() => {
      if (this.fail)
        return void this.dispatchEvent(Object.assign(new Event('error'), { message: 'refused' }));
      const { id, ...req } = m;
      this.dispatchEvent(new MessageEvent('message', { data: { id, ...runRequest(req) } }));
    });
  }
  terminate(): void {
    this.terminated = true;
  }
}

const importRequest = {
  kind: 'import' as const,
  files: [
    {
      name: 'a.csv',
      text: "Temperature (°C),Frequency (Hz),G' (Pa),G'' (Pa)\n40,1,1000,500\n40,10,5000,2000\n",
    },
  ],
  options: {},
};

describe('useEngine()', () => {
  it('useEngine() answers each request through the worker with the core’s result', async () => {
    const w = new FakeWorker(false);
    const scope = effectScope();
    const engine = scope.run(() => useEngine({ createWorker: () => w as unknown as Worker }))!;
    const r = await engine.run(importRequest);
    expect(r.kind).toBe('imported');
    expect(engine.pending.value).toBe(0);
    scope.stop();
    expect(w.terminated).toBe(true);
  });

  it('useEngine() falls back to the window when the worker fails, so nothing is lost', async () => {
    const w = new FakeWorker(true);
    const scope = effectScope();
    const engine = scope.run(() => useEngine({ createWorker: () => w as unknown as Worker }))!;
    const errors: unknown[] = [];
    const quiet = console.error;
    console.error = (...a: unknown[]) => void errors.push(a);
    try {
      const r = await engine.run(importRequest);
      expect(r.kind).toBe('imported');
      const again = await engine.run({
        kind: 'analyse',
        dataset: tinyDataset(),
        options: { excludedIsothermIds: ['T01', 'T02'] },
        importWarnings: [],
      });
      expect(again.kind).toBe('failed'); // every isotherm excluded: the core says so, in words
      expect(again.kind === 'failed' && again.message).toMatch(/every isotherm is excluded/);
    } finally {
      console.error = quiet;
      scope.stop();
    }
    expect(errors).toHaveLength(1);
    expect(w.terminated).toBe(true);
  });
});
