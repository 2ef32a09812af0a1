import { formatCelsius } from '../data/temperature';
import { shiftModel } from './registry';
import type { ShiftModelSpec } from './types';

/** Why a shift-model answer at some temperature must be read with care. */
export interface ShiftRangeFlags {
  /** T is outside the temperature range the constants were fitted over: an extrapolation. */
  outsideFittedRange: boolean;
  /** WLF used below the glass transition temperature: not valid there. */
  belowGlassTransition: boolean;
  /** WLF at or below its pole Tr − C2: the law has no meaning there. */
  beyondPole: boolean;
  /** One sentence per raised flag, for the user. */
  messages: string[];
}

const c = (k: number): string => formatCelsius(k);

/**
 * Flags for using a shift model at `temperatureK` (docs/conventions.md §3, §6): outside the fitted range is
 * extrapolation; the model's descriptor adds its own (WLF constants fitted above Tg must not be used
 * below Tg; WLF diverges at Tr − C2).
 */
export function checkShiftModelRange(model: ShiftModelSpec, temperatureK: number): ShiftRangeFlags {
  const messages: string[] = [];
  const range = model.fittedRangeK;
  const outsideFittedRange =
    !!range && (temperatureK < range[0] - 1e-9 || temperatureK > range[1] + 1e-9);
  if (outsideFittedRange && range) {
    messages.push(
      `${c(temperatureK)} is outside the fitted range ${c(range[0])} to ${c(range[1])}: the shift factor is extrapolated.`,
    );
  }
  const law = shiftModel(model.kind).validity?.(model, temperatureK);
  for (const m of law?.messages ?? []) messages.push(m);
  const belowGlassTransition = law?.belowGlassTransition ?? false;
  const beyondPole = law?.beyondPole ?? false;
  return { outsideFittedRange, belowGlassTransition, beyondPole, messages };
}
