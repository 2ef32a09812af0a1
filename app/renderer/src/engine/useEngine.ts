/**
 * The analysis engine as a composable: sends requests to the Web Worker (or runs them on the main
 * thread where no worker can be made) and resolves each with its result. The worker is terminated
 * when the owning scope is disposed.
 */
import { onScopeDispose, ref, type Ref } from 'vue';
import type { EngineRequest, EngineResult, WorkerInbound, WorkerOutbound } from './engine-protocol';
import { runRequest } from './run-request';

export interface UseEngineOptions {
  /** Makes the worker; return null to run on the main thread. @default a module worker */
  createWorker?: () => Worker | null;
}

export interface UseEngineReturn {
  run(req: EngineRequest): Promise<EngineResult>;
  /** Number of requests in flight. */
  pending: Ref<number>;
  /** Progress of the running request, 0–1, and its stage. */
  progress: Ref<{ fraction: number; stage: string } | null>;
  /** True when the work runs in a worker (false: main-thread fallback). */
  usesWorker: boolean;
}

function defaultWorker(): Worker | null {
  if (typeof Worker === 'undefined') return null;
  try {
    return new Worker(new URL('./analysis.worker.ts', import.meta.url), { type: 'module' });
  } catch {
    return null;
  }
}

export function useEngine(options: UseEngineOptions = {}): UseEngineReturn {
  const worker = (options.createWorker ?? defaultWorker)();
  const pending = ref(0);
  const progress = ref<{ fraction: number; stage: string } | null>(null);
  const waiting = new Map<number, { req: EngineRequest; resolve: (r: EngineResult) => void }>();
  let nextId = 1;
  /** Set when the worker failed (e.g. module workers refused): then everything runs here. */
  let broken = false;

  worker?.addEventListener('message', (e: MessageEvent<WorkerOutbound>) => {
    const m = e.data;
    if (m.kind === 'progress') {
      progress.value = { fraction: m.fraction, stage: m.stage };
      return;
    }
    const { id, ...result } = m;
    waiting.get(id)?.resolve(result);
    waiting.delete(id);
  });
  worker?.addEventListener('error', (e) => {
    // The worker could not start or crashed: answer what was waiting on the main thread (slower,
    // but the analysis still works) and stop using the worker.
    console.error(
      '[thermoshift] analysis worker failed; computing in the window instead',
      e.message,
    );
    broken = true;
    worker.terminate();
    for (const { req, resolve } of waiting.values()) resolve(runRequest(req));
    waiting.clear();
  });

  async function run(req: EngineRequest): Promise<EngineResult> {
    pending.value++;
    try {
      if (!worker || broken) {
        await Promise.resolve();
        return runRequest(req);
      }
      const id = nextId++;
      return await new Promise<EngineResult>((resolve) => {
        waiting.set(id, { req, resolve });
        const msg: WorkerInbound = { ...req, id };
        worker.postMessage(msg);
      });
    } finally {
      pending.value--;
      if (pending.value === 0) progress.value = null;
    }
  }

  onScopeDispose(() => worker?.terminate());
  return { run, pending, progress, usesWorker: worker !== null };
}
