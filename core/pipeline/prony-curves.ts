/**
 * The fitted Prony series (generalised Maxwell model, Ferry 1980 ch. 3; docs/conventions.md §5) drawn as a
 * curve of any quantity a master-curve view shows, over the reduced window it was fitted on:
 * G′, G″, |G*|, tan δ = G″/G′ and |η*| = |G*|/ω against reduced frequency, and the relaxation
 * modulus G(t) = Ge + Σ g_i exp(−t/τ_i) against reduced time (for frequency data over
 * t = 1/ω of the window). null when the analysis has no Prony series or the quantity has no form.
 */
import { complexModulusOf } from '../data/derived';
import type { QuantityId } from '../data/types';
import { pronyLoss, pronyRelaxation, pronyStorage } from '../spectrum/prony-model';
import type { Analysis } from './types';

export interface PronyCurve {
  /** Reduced abscissa: aT·ω (rad/s) or t/aT (s). */
  x: number[];
  /** The quantity from the series, SI. */
  y: number[];
  abscissa: 'angularFrequency' | 'time';
}

const grid = (lo: number, hi: number, n: number): number[] =>
  Array.from({ length: n }, (_, i) => lo * (hi / lo) ** (i / (n - 1)));

export function pronyCurve(a: Analysis, q: QuantityId, points = 160): PronyCurve | null {
  const p = a.prony;
  if (!p || !(p.reducedWindow[0] > 0) || !(p.reducedWindow[1] > p.reducedWindow[0])) return null;
  const [lo, hi] = p.reducedWindow;
  const freq = a.sample.abscissa === 'angularFrequency';
  if (q === 'relaxationModulus') {
    const ts = freq ? grid(1 / hi, 1 / lo, points) : grid(lo, hi, points);
    return { x: ts, y: ts.map((t) => pronyRelaxation(p, t)), abscissa: 'time' };
  }
  if (!freq) return null;
  const ws = grid(lo, hi, points);
  const f: Partial<Record<QuantityId, (w: number) => number>> = {
    storageModulus: (w) => pronyStorage(p, w),
    lossModulus: (w) => pronyLoss(p, w),
    complexModulus: (w) => complexModulusOf(pronyStorage(p, w), pronyLoss(p, w)),
    tanDelta: (w) => pronyLoss(p, w) / pronyStorage(p, w),
    complexViscosity: (w) => complexModulusOf(pronyStorage(p, w), pronyLoss(p, w)) / w,
  };
  const fn = f[q];
  return fn ? { x: ws, y: ws.map(fn), abscissa: 'angularFrequency' } : null;
}
