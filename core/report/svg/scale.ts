/**
 * Scales mapping data values to SVG coordinates: linear, or log10 for quantities that span
 * decades. A scale is a plain object so charts stay pure functions.
 */
export interface Scale {
  kind: 'linear' | 'log';
  /** Data domain [min, max]; for log scales both > 0. */
  domain: [number, number];
  /** Pixel range [start, end]; end < start for y axes (SVG y grows downwards). */
  range: [number, number];
}

export function project(scale: Scale, value: number): number {
  const [d0, d1] = scale.domain;
  const [r0, r1] = scale.range;
  const t =
    scale.kind === 'log'
      ? (Math.log10(value) - Math.log10(d0)) / (Math.log10(d1) - Math.log10(d0))
      : (value - d0) / (d1 - d0);
  return r0 + t * (r1 - r0);
}

/** True when the value can be drawn on this scale (finite, and > 0 on a log scale). */
export function drawable(scale: Scale, value: number): boolean {
  return Number.isFinite(value) && (scale.kind === 'linear' || value > 0);
}

/**
 * A domain covering the values: for log scales widened outward to whole decades (so decade ticks
 * frame the data), for linear scales padded by 4 % on each side. Falls back to [1, 10] or [0, 1]
 * when there is nothing to show.
 */
export function niceDomain(values: ArrayLike<number>, kind: 'linear' | 'log'): [number, number] {
  const acc = new DomainAccumulator(kind);
  for (let i = 0; i < values.length; i++) acc.add(values[i]);
  return acc.nice();
}

/** Collects the range of drawable values one by one (no array of every value is built). */
export class DomainAccumulator {
  private lo = Infinity;
  private hi = -Infinity;
  constructor(readonly kind: 'linear' | 'log') {}

  add(v: number): void {
    if (!Number.isFinite(v) || (this.kind === 'log' && !(v > 0))) return;
    if (v < this.lo) this.lo = v;
    if (v > this.hi) this.hi = v;
  }

  /** The nice domain of everything added (see niceDomain). */
  nice(): [number, number] {
    let lo = this.lo;
    let hi = this.hi;
    if (!(hi >= lo)) return this.kind === 'log' ? [1, 10] : [0, 1];
    if (this.kind === 'log') {
      let a = Math.floor(Math.log10(lo) + 1e-9);
      let b = Math.min(308, Math.ceil(Math.log10(hi) - 1e-9)); // 1e309 overflows to Infinity
      a = Math.max(-307, a);
      if (b <= a) b = a + 1;
      if (b - a > 24) a = b - 24; // keep a readable axis for absurd ranges
      return [10 ** a, 10 ** b];
    }
    if (hi === lo) {
      const pad = Math.abs(lo) > 0 ? Math.abs(lo) * 0.1 : 1;
      lo -= pad;
      hi += pad;
    }
    const pad = (hi - lo) * 0.04;
    return [lo - pad, hi + pad];
  }
}
