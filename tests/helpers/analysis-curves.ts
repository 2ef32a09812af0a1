/** A shift result's curves as the analysis keeps them (AnalysisCurve), for feeding reduceToMasterCurve(). */
import type { AnalysisCurve } from '../../core/pipeline/types';
import type { ShiftResult } from '../../core/shift';

export function analysisCurvesOf(result: ShiftResult): AnalysisCurve[] {
  return result.curves.map((c) => ({
    isothermId: c.id,
    temperatureK: c.temperatureK,
    log10aT: c.log10aT,
    log10aTStdErr: c.log10aTStdErr,
    log10bT: c.log10bT,
    log10bTStdErr: c.log10bTStdErr,
    included: c.included,
    qualityRmsDecades: c.rmsResidualDecades,
  }));
}
