/**
 * Axis ticks. Log axes get a major tick on every decade (labelled 10ⁿ), thinned to at most
 * `maxLabels` labels, and minor ticks at 2…9 × 10ⁿ when few decades are shown. Linear axes get
 * 1-2-5 steps (as d3-array's `ticks`).
 */
import { superscript } from '../format';

export interface Tick {
  value: number;
  major: boolean;
  /** Label for major ticks; '' for minor ticks. */
  label: string;
}

export function logTicks(domain: [number, number], maxLabels = 8): Tick[] {
  const a = Math.floor(Math.log10(domain[0]) + 1e-9);
  const b = Math.ceil(Math.log10(domain[1]) - 1e-9);
  const decades = b - a;
  const every = Math.max(1, Math.ceil((decades + 1) / maxLabels));
  const ticks: Tick[] = [];
  for (let e = a; e <= b; e++) {
    const v = 10 ** e;
    if (v >= domain[0] * (1 - 1e-9) && v <= domain[1] * (1 + 1e-9))
      ticks.push({
        value: v,
        major: true,
        label: (e - a) % every === 0 ? `10${superscript(e)}` : '',
      });
    if (decades <= 8 && e < b)
      for (let m = 2; m <= 9; m++) {
        const mv = m * v;
        if (mv > domain[0] && mv < domain[1]) ticks.push({ value: mv, major: false, label: '' });
      }
  }
  return ticks;
}

export function linearTicks(domain: [number, number], count = 6): Tick[] {
  const [lo, hi] = domain;
  const raw = (hi - lo) / Math.max(1, count);
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * mag).find((s) => s >= raw) ?? 10 * mag;
  const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  const ticks: Tick[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) {
    const value = Math.abs(v) < step * 1e-9 ? 0 : v;
    ticks.push({ value, major: true, label: value.toFixed(decimals) });
  }
  return ticks;
}
