/**
 * The sign and vertical-shift conventions, worded once and stated on every table, export and
 * report (docs/conventions.md §2). Two bT conventions are in print; ours is reduced = bT × measured.
 */
export const CONVENTIONS = {
  horizontal:
    'reduced frequency = aT·ω, reduced time = t/aT; aT(Tref) = 1; log10 aT < 0 above Tref (faster)',
  vertical:
    'reduced modulus = bT × measured modulus; reduced compliance = measured compliance / bT; reduced |η*| = |η*|·bT/aT; bT(Tref) = 1; entropic estimate bT = Tref·ρref/(T·ρ(T)), temperatures in K',
  logarithms: 'log10 (decades); standard errors in decades',
  temperatures: '°C in tables and summary (kelvin where a column says K)',
} as const;

/** The conventions as comment lines for CSV headers (each line starts with "# "). */
export function conventionCommentLines(): string[] {
  return [
    `# convention (horizontal): ${CONVENTIONS.horizontal}`,
    `# convention (vertical): ${CONVENTIONS.vertical}`,
    `# logarithms: ${CONVENTIONS.logarithms}`,
  ];
}
