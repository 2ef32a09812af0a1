/**
 * The state of every isotherm of an analysis, as the list and every plot show it: used in the
 * master curve; excluded by the user; left out by the shift engine (with the engine's reason);
 * and whether its shift is locked by hand. Also where a curve that is not in the fit is drawn on
 * the shifted plots (faded, never hidden): at its own shift when the engine found one, at
 * log10 aT = 0 for the isotherm at Tref, else at the shift the fitted model gives at its
 * temperature — or nowhere when there is none.
 */
import { shiftModelLog10aT } from '../models/shift-model-eval';
import { log10bTAt } from './vertical-at';
import type { Analysis, ShiftModelKind } from './types';
import { findShiftModel } from '../models';
import { fittedShiftModels, modelResult } from './model-results';

export type IsothermUse = 'used' | 'excluded' | 'left-out';

export interface IsothermState {
  isothermId: string;
  temperatureK: number;
  use: IsothermUse;
  /** True when the user locked the shift. */
  locked: boolean;
  /** Why the engine left it out (use = 'left-out'); the user's exclusion says so itself. */
  reason: string | null;
  /** A sentence for the list and the hover text. */
  description: string;
  /** Shift to draw it at on shifted plots, decades; null when it cannot be placed. */
  drawLog10aT: number | null;
  drawLog10bT: number;
  /** Where drawLog10aT came from. */
  placedBy: 'fit' | 'lock' | 'reference' | ShiftModelKind | null;
}

export function isothermStates(a: Analysis): IsothermState[] {
  const excluded = new Set(a.settings.excludedIsothermIds);
  const locks = a.settings.lockedLog10aT;
  const hint = a.models.hint?.model;
  const model =
    (hint && modelResult(a.models, hint) ? hint : undefined) ??
    fittedShiftModels(a.models)[0]?.descriptor.kind;
  return a.curves.map((c): IsothermState => {
    const locked = c.isothermId in locks;
    const use: IsothermUse = c.included
      ? 'used'
      : excluded.has(c.isothermId)
        ? 'excluded'
        : 'left-out';
    // The engine's structured reason (an analysis saved before it existed keeps its note).
    const reason =
      use === 'left-out' ? (c.leftOut?.message ?? c.note ?? 'not part of the fit') : null;
    let drawLog10aT: number | null = c.log10aT;
    let placedBy: IsothermState['placedBy'] = c.log10aT === null ? null : locked ? 'lock' : 'fit';
    if (drawLog10aT === null && locked) {
      drawLog10aT = locks[c.isothermId];
      placedBy = 'lock';
    } else if (drawLog10aT === null && Math.abs(c.temperatureK - a.referenceTemperatureK) < 1e-6) {
      drawLog10aT = 0;
      placedBy = 'reference';
    } else if (drawLog10aT === null && model) {
      drawLog10aT = shiftModelLog10aT(modelResult(a.models, model)!.spec, c.temperatureK);
      placedBy = Number.isFinite(drawLog10aT) ? model : null;
      if (placedBy === null) drawLog10aT = null;
    }
    const where =
      placedBy === 'reference'
        ? ' Drawn faded at Tref (log10 aT = 0).'
        : placedBy && findShiftModel(placedBy)
          ? ` Drawn faded at the ${findShiftModel(placedBy)!.name} shift for its temperature.`
          : use !== 'used' && drawLog10aT === null
            ? ' It has no shift, so the shifted plots cannot show it.'
            : use !== 'used'
              ? ' Drawn faded at its own shift.'
              : '';
    const description =
      (use === 'used'
        ? 'Used in the master curve.'
        : use === 'excluded'
          ? 'Excluded by you: not in the fit.'
          : `Left out by the shift engine: ${reason}.`) +
      (locked ? ' Shift locked by hand.' : '') +
      where;
    return {
      isothermId: c.isothermId,
      temperatureK: c.temperatureK,
      use,
      locked,
      reason,
      description,
      drawLog10aT,
      drawLog10bT: c.log10bT ?? log10bTAt(a, c.temperatureK).log10bT,
      placedBy,
    };
  });
}
