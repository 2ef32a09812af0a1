/**
 * Material indicators compared at the common temperature T*. Each analysis gives its indicators at
 * its own Tref; they are moved like the curve: a frequency divided by aT(T*), a time multiplied
 * by it, a viscosity multiplied by aT(T*)/bT(T*), a modulus divided by bT(T*); temperatures are not
 * compared as ratios. The analyses carry no s.e. for indicators, so the s.e. of log10(sample/reference) is
 * approximated by that of the curve mapping: the time-shift s.e. for frequencies and times, the
 * modulus-offset s.e. for moduli, both for viscosities (docs/compare.md).
 */
import type { Analysis } from '../pipeline/types';
import type { Estimate, IndicatorDifference } from './types';

interface Moved {
  log10aT: number;
  log10bT: number;
}

function movedLog10(unit: string, value: number, m: Moved): number | null {
  if (!(value > 0)) return null;
  const y = Math.log10(value);
  switch (unit) {
    case 'rad/s':
    case 'Hz':
      return y - m.log10aT;
    case 's':
      return y + m.log10aT;
    case 'Pa·s':
      return y + m.log10aT - m.log10bT;
    case 'Pa':
      return y - m.log10bT;
    default:
      return null; // a temperature (K) or a unit without a known move: not compared as a ratio
  }
}

export function indicatorDifferences(
  reference: Analysis,
  sample: Analysis,
  moved: { reference: Moved; sample: Moved },
  timeShift: Estimate | null,
  modulusOffset: Estimate | null,
): IndicatorDifference[] {
  const out: IndicatorDifference[] = [];
  for (const r of reference.indicators) {
    const s = sample.indicators.find((i) => i.key === r.key && i.unit === r.unit);
    if (!s) continue;
    const yr = movedLog10(r.unit, r.value, moved.reference);
    const ys = movedLog10(s.unit, s.value, moved.sample);
    if (yr === null || ys === null) continue;
    const h = timeShift?.stdErr ?? null;
    const v = modulusOffset?.stdErr ?? null;
    let se: number | null = null;
    if (r.unit === 'rad/s' || r.unit === 'Hz' || r.unit === 's') se = h;
    else if (r.unit === 'Pa') se = v;
    else if (r.unit === 'Pa·s') se = h !== null && v !== null ? Math.hypot(h, v) : null;
    const d = ys - yr;
    out.push({
      key: r.key,
      label: r.label,
      unit: r.unit,
      reference: 10 ** yr,
      sample: 10 ** ys,
      log10Ratio: { value: d, stdErr: se },
      percent: (10 ** d - 1) * 100,
    });
  }
  return out;
}
