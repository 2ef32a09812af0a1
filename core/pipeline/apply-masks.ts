/**
 * Applies the user's point masks (file + row) and checks the excluded isotherm ids, returning a
 * new dataset (the input is not changed). A mask that matches no point is a warning, so a typo
 * does not pass silently.
 */
import type { Dataset } from '../data/types';
import { OptionsError, type ResolvedAnalysisOptions } from './options';
import type { AnalysisWarning } from './types';

export function applyMasks(
  dataset: Dataset,
  masked: ResolvedAnalysisOptions['maskedPoints'],
  warnings: AnalysisWarning[],
): Dataset {
  if (masked.length === 0) return dataset;
  const key = (file: string, row: number): string => `${file}\u0000${row}`;
  const wanted = new Set(masked.map((m) => key(m.file, m.row)));
  const hit = new Set<string>();
  const isotherms = dataset.isotherms.map((iso) => ({
    ...iso,
    mask: iso.mask.map((m, i) => {
      const k = key(iso.source[i].file, iso.source[i].row);
      if (!wanted.has(k)) return m;
      hit.add(k);
      return false;
    }),
  }));
  for (const m of masked)
    if (!hit.has(key(m.file, m.row)))
      warnings.push({
        code: 'mask-unmatched',
        message: `Masked point ${m.file} row ${m.row} is not a data point of this sample; nothing was masked there.`,
        file: m.file,
        row: m.row,
      });
  return { ...dataset, isotherms };
}

export function checkExcluded(dataset: Dataset, ids: readonly string[]): void {
  const known = new Set(dataset.isotherms.map((i) => i.id));
  const bad = ids.find((id) => !known.has(id));
  if (bad !== undefined)
    throw new OptionsError(
      `Invalid analysis option excludedIsothermIds: no isotherm "${bad}" (isotherms: ${[...known].join(', ')})`,
      'excludedIsothermIds',
    );
}
