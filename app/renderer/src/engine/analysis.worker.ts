/**
 * The analysis worker: imports and master-curve fits run here, so the window never blocks.
 * One request at a time; the renderer coalesces requests so no stale work piles up.
 */
import '../zod-without-eval';
import type { WorkerInbound, WorkerOutbound } from './engine-protocol';
import { runRequest } from './run-request';

const post = (m: WorkerOutbound): void => (self as unknown as Worker).postMessage(m);

self.addEventListener('message', (event: MessageEvent<WorkerInbound>) => {
  const { id, ...req } = event.data;
  let last = 0;
  const result = runRequest(req, (fraction, stage) => {
    const now = performance.now();
    if (now - last > 50) {
      last = now;
      post({ id, kind: 'progress', fraction, stage });
    }
  });
  post({ id, ...result });
});
