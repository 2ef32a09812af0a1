import { describe, expect, it } from 'vitest';
import { useLatestRunner } from '../../../app/renderer/src/composables/useLatestRunner';

describe('useLatestRunner()', () => {
  it('useLatestRunner() runs the first input and then only the newest of those that waited', async () => {
    const ran: number[] = [];
    let release: () => void = () => undefined;
    const r = useLatestRunner<number>(async (n) => {
      ran.push(n);
      if (n === 1) await new Promise<void>((res) => (release = res));
    });
    r.schedule(1);
    r.schedule(2);
    r.schedule(3);
    expect(r.busy.value).toBe(true);
    release();
    await r.idle();
    expect(ran).toEqual([1, 3]);
    expect(r.busy.value).toBe(false);
  });

  it('useLatestRunner() keeps going after a failed run', async () => {
    const ran: number[] = [];
    const r = useLatestRunner<number>(async (n) => {
      ran.push(n);
      if (n === 1) throw new Error('boom');
    });
    const quiet = console.error;
    console.error = () => undefined;
    try {
      r.schedule(1);
      await r.idle();
      r.schedule(2);
      await r.idle();
    } finally {
      console.error = quiet;
    }
    expect(ran).toEqual([1, 2]);
  });
});
