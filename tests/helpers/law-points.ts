/**
 * Shift points from a known shift law, the set-up of the model-fit tests: one point per
 * temperature, each with standard error `stdErr` and, when `rng` is given, seeded normal noise of
 * that size added to the law's log10 aT (drawn in the order of the temperatures).
 */
import type { ShiftPoint } from '../../core/models/types';

export function lawPoints(
  temperaturesK: number[],
  log10aT: (temperatureK: number) => number,
  stdErr: number,
  rng?: { normal: () => number },
): ShiftPoint[] {
  return temperaturesK.map((T) => ({
    temperatureK: T,
    log10aT: rng ? log10aT(T) + stdErr * rng.normal() : log10aT(T),
    stdErr,
  }));
}
