/**
 * What an import costs in memory, per table row, and the budget it is checked against. One
 * module so the figures and how they were measured stay together.
 *
 * Measured (Node 20, 2 CPU machine, 2026-12-02) with `/usr/bin/time -v`: a
 * long CSV of N rows × 4 columns (T, f, G', G'') imported by `importFiles` through the chunked
 * reader, peak RSS of the whole process minus the RSS of an empty run, divided by N:
 *   N = 1e6: peak RSS 385 MB, empty run 92 MB → 293 bytes per row, rounded up to 300;
 *   N = 2e7 (614 MB file, budget raised): peak RSS 4,292 MB, empty run 86 MB → 210 bytes per row;
 *   `thermoshift inspect` on N = 1e7 (whole process): peak RSS 1,915 MB → 190 bytes per row.
 * The largest per-row figure (the small file, where fixed costs weigh most) is kept, so the
 * estimate errs on the safe side for big files.
 * The cost is dominated by the Dataset (plain number arrays per isotherm and one `{file, row}`
 * source object per point) and the scanned columns held while the records are built.
 */

/** Peak bytes per row of a 4-column long table, measured as described above. */
export const BYTES_PER_ROW_MEASURED = 300;

/** Extra bytes per row for each read column beyond four (two Float64 copies: scan and records). */
export const BYTES_PER_EXTRA_COLUMN = 16;

/** Default budget, bytes: what an ordinary 8 GB computer can give one import (common practice). */
export const DEFAULT_MEMORY_BUDGET_BYTES = 4e9;

/** Estimated peak bytes to import `rows` rows that read `columns` columns. */
export function estimateImportBytes(rows: number, columns: number): number {
  return rows * (BYTES_PER_ROW_MEASURED + Math.max(0, columns - 4) * BYTES_PER_EXTRA_COLUMN);
}
