/**
 * Relaxation times on a log grid across the reduced data window (Baumgaertel & Winter, Rheol.
 * Acta 28, 1989: about one or two modes per decade; more makes the problem ill-posed).
 * Dynamic data at ω_r ∈ [ωmin, ωmax] probe τ ≈ 1/ω, so the grid spans 1/ωmax … 1/ωmin;
 * relaxation data at t_r ∈ [tmin, tmax] span tmin … tmax. `extendDecades` widens both ends,
 * `extendShortDecades` the short-τ end only.
 */
export function relaxationTimeGrid(
  window: { abscissa: 'angularFrequency' | 'time'; min: number; max: number },
  modesPerDecade: number,
  extendDecades = 0,
  extendShortDecades = 0,
): number[] {
  if (!(window.min > 0) || !(window.max >= window.min)) {
    throw new RangeError('window.min and window.max must be positive with min ≤ max');
  }
  if (!(modesPerDecade > 0)) throw new RangeError('modesPerDecade must be a positive number');
  if (!(extendDecades >= 0)) throw new RangeError('extendDecades must be ≥ 0');
  if (!(extendShortDecades >= 0)) throw new RangeError('extendShortDecades must be ≥ 0');
  const lo = window.abscissa === 'time' ? window.min : 1 / window.max;
  const hi = window.abscissa === 'time' ? window.max : 1 / window.min;
  const a = Math.log10(lo) - extendDecades - extendShortDecades;
  const b = Math.log10(hi) + extendDecades;
  const n = Math.max(1, Math.round((b - a) * modesPerDecade) + 1);
  if (n === 1) return [10 ** ((a + b) / 2)];
  return Array.from({ length: n }, (_, i) => 10 ** (a + ((b - a) * i) / (n - 1)));
}
