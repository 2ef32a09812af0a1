/** Median wall time of `fn` over `repeats` runs after `warmup` runs, in milliseconds. */
export function medianMs(fn: () => unknown, repeats = 7, warmup = 2): number {
  for (let i = 0; i < warmup; i++) fn();
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const t0 = performance.now();
    fn();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}
