/**
 * Plans the columns of a one-line header as file "a.csv" (header on row 1, no units row, no
 * mappings), the set-up shared by the column-plan and record tests.
 */
import { draftColumns } from '../../../../core/io/column-draft';
import { planColumns } from '../../../../core/io/column-plan';
import { WarningSink } from '../../../../core/io/warning-sink';
import type { TestKind } from '../../../../core/data/types';

export function planHeader(header: string[], testKind: TestKind | 'auto' = 'auto') {
  const warnings = new WarningSink('a.csv', 100);
  const drafts = draftColumns({
    file: 'a.csv',
    header,
    headerRow: 1,
    units: [],
    unitsRow: 0,
    ncols: header.length,
    mappings: [],
  });
  return {
    plan: planColumns(drafts, { file: 'a.csv', headerRow: 1, testKind, warnings }),
    warnings,
  };
}
