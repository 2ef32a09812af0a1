/**
 * What a live re-fit (a curve being dragged) keeps from the analysis on show. Pure functions, so
 * that the app and bench/app-refit.bench.ts send the same request.
 */
import type { Analysis } from '@core/pipeline';
import type { HeldExpansion } from '@core/shift';
import type { AnalysisDocument } from './analysis-document';

/**
 * The vertical shift of the shown analysis to keep during a live re-fit, when 'auto' or 'data'
 * decided it from the data: its αV (the αV fit takes several horizontal fits, and one drag step
 * changes αV by far less than its standard error), or bT = 1 when 'auto' found none. Only for the
 * same data, reference temperature and vertical setting; a released curve is fitted in full
 * again, αV and the choice included.
 */
export function heldExpansionFrom(
  shown: Analysis | null,
  doc: AnalysisDocument,
): HeldExpansion | undefined {
  if (!shown || shown.dataset.name !== doc.dataset.name) return undefined;
  const tref = doc.options.referenceTemperatureK;
  if (tref !== undefined && tref !== shown.referenceTemperatureK) return undefined;
  const mode = doc.options.verticalShift ?? 'auto';
  if ((mode !== 'auto' && mode !== 'data') || mode !== (shown.settings.verticalShift ?? 'auto'))
    return undefined;
  if (doc.options.density && mode === 'auto') return undefined;
  const v = shown.vertical;
  if (!v) return undefined;
  if (v.chosen === 'data' && v.expansionPerK !== null)
    return { expansionPerK: v.expansionPerK, expansionStdErr: v.expansionStdErr };
  if (v.chosen === 'none' && mode === 'auto') return { expansionPerK: null, expansionStdErr: null };
  return undefined;
}
