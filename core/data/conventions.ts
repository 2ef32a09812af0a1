/**
 * The sign and vertical-shift conventions, worded once and stated on every table, export, report
 * and shift result (docs/conventions.md §2). Two bT conventions are in print; ours is
 * reduced = bT × measured. The rules themselves are functions in core/data/reduction.ts.
 */
export const CONVENTIONS = {
  horizontal:
    'reduced frequency = aT·ω, reduced time = t/aT; aT(Tref) = 1; log10 aT < 0 above Tref (faster)',
  vertical:
    'reduced modulus = bT × measured modulus; reduced compliance = measured compliance / bT; reduced |η*| = |η*|·bT/aT; bT(Tref) = 1; entropic estimate bT = Tref·ρref/(T·ρ(T)), temperatures in K',
  logarithms: 'log10 (decades); standard errors in decades',
  temperatures: '°C in tables and summary (kelvin where a column says K)',
} as const;

/** Both conventions in one line, with the symbols of the shift engine (ShiftResult.convention). */
export const SHIFT_CONVENTION =
  `ω_r = aT·ω and t_r = t/aT: ${CONVENTIONS.horizontal}; ${CONVENTIONS.vertical}; ` +
  'tan δ and δ are not shifted vertically.';
