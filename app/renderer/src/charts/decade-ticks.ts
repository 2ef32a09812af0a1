/**
 * Tick positions for a log10 axis: every decade (10ⁿ), labelled as a power of ten. When the axis
 * spans three decades or fewer, 2 and 5 multiples are added so there are always a few labels;
 * over very wide spans only every k-th decade is labelled.
 */
import { superscript } from '@core/report';

export interface LogTick {
  value: number;
  /** Text to show, '' for an unlabelled minor tick. */
  label: string;
  major: boolean;
}

/** "10⁻³", "10⁰" … for integer exponents. */
export function powerOfTenLabel(exponent: number): string {
  return `10${superscript(exponent)}`;
}

/** A compact label for a value on a log axis that is not a power of ten (e.g. 2×10³). */
export function mantissaLabel(value: number): string {
  const e = Math.floor(Math.log10(value) + 1e-9);
  const m = Math.round(value / 10 ** e);
  return m === 1 ? powerOfTenLabel(e) : `${m}×${powerOfTenLabel(e)}`;
}

export function decadeTicks(min: number, max: number, maxLabels = 10): LogTick[] {
  if (!(min > 0) || !(max > min) || !Number.isFinite(max)) return [];
  const lo = Math.ceil(Math.log10(min) - 1e-9);
  const hi = Math.floor(Math.log10(max) + 1e-9);
  const decades = hi - lo + 1;
  if (decades >= 4) {
    const every = Math.max(1, Math.ceil(decades / maxLabels));
    const ticks: LogTick[] = [];
    for (let e = lo; e <= hi; e++) {
      const labelled = (e - lo) % every === 0;
      ticks.push({ value: 10 ** e, label: labelled ? powerOfTenLabel(e) : '', major: labelled });
    }
    return ticks;
  }
  // Three decades or fewer in view: 1, 2, 5 steps.
  const ticks: LogTick[] = [];
  for (let e = Math.floor(Math.log10(min)); e <= Math.ceil(Math.log10(max)); e++) {
    for (const m of [1, 2, 5]) {
      const v = m * 10 ** e;
      if (v >= min * (1 - 1e-9) && v <= max * (1 + 1e-9))
        ticks.push({ value: v, label: mantissaLabel(v), major: m === 1 });
    }
  }
  return ticks;
}
