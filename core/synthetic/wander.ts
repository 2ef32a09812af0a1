/**
 * Measured temperatures that wander about a set point, as a thermocouple reading does while the
 * oven regulates: a first-order autoregressive walk, clipped to ±amplitude.
 */
import type { Random } from './random';

/**
 * `count` offsets from the set point, K. Each step keeps `memory` of the previous offset and adds
 * fresh normal noise; the result never leaves [−amplitudeK, amplitudeK].
 */
export function wanderingOffsetsK(
  count: number,
  amplitudeK: number,
  rng: Random,
  memory = 0.7,
): number[] {
  if (!Number.isInteger(count) || count < 0) {
    throw new RangeError(`count must be a non-negative integer, got ${count}`);
  }
  if (!(amplitudeK >= 0)) throw new RangeError(`amplitudeK must be ≥ 0, got ${amplitudeK}`);
  if (!(memory >= 0 && memory < 1)) throw new RangeError(`memory must be in [0, 1), got ${memory}`);
  const innovation = amplitudeK * 0.5 * Math.sqrt(1 - memory * memory);
  const out: number[] = [];
  let w = 0;
  for (let i = 0; i < count; i++) {
    w = memory * w + innovation * rng.normal();
    w = Math.min(amplitudeK, Math.max(-amplitudeK, w));
    out.push(w);
  }
  return out;
}
