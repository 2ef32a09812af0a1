/** `perDecade` points per decade from min to max inclusive (at least 2), log-spaced. */
export function logSpace(min: number, max: number, perDecade: number): number[] {
  if (!(min > 0) || !(max > min)) throw new RangeError('logSpace needs 0 < min < max');
  const a = Math.log10(min);
  const b = Math.log10(max);
  const n = Math.max(2, Math.ceil((b - a) * perDecade) + 1);
  return Array.from({ length: n }, (_, i) => 10 ** (a + ((b - a) * i) / (n - 1)));
}
