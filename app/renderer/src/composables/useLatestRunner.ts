/**
 * Runs an async job for the latest input only: while one run is in flight, newer inputs replace
 * each other and only the newest runs next. Dragging a curve thus re-fits as fast as the engine
 * allows without a queue of stale fits, and results arrive in order.
 */
import { ref, type Ref } from 'vue';

export interface UseLatestRunnerReturn<I> {
  schedule(input: I): void;
  /** True while a run is in flight or waiting. */
  busy: Ref<boolean>;
  /** Resolves when nothing is in flight or waiting. */
  idle(): Promise<void>;
}

export function useLatestRunner<I>(job: (input: I) => Promise<void>): UseLatestRunnerReturn<I> {
  const busy = ref(false);
  let running = false;
  let queued: { input: I } | null = null;
  let idleWaiters: (() => void)[] = [];

  async function loop(): Promise<void> {
    running = true;
    while (queued) {
      const { input } = queued;
      queued = null;
      try {
        await job(input);
      } catch (e) {
        console.error('[thermoshift] analysis run failed', e);
      }
    }
    running = false;
    busy.value = false;
    idleWaiters.forEach((w) => w());
    idleWaiters = [];
  }

  return {
    schedule(input) {
      queued = { input };
      busy.value = true;
      if (!running) void loop();
    },
    busy,
    idle: () => (!running && !queued ? Promise.resolve() : new Promise((r) => idleWaiters.push(r))),
  };
}
