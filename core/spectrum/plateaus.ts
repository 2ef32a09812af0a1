import { extremeIndex, parabolicVertex } from './extremum';
import { logSpace } from './log-grid';
import type { PronySeries } from './prony-model';
import { pronyInstantaneous, pronyLoss, pronyStorage } from './prony-model';
import { frequencyWindow } from './tan-delta-peak';
import type { ReducedWindow } from './types';

export interface PlateauModulus {
  /** G' at the tan δ minimum, Pa. */
  modulusPa: number;
  /** Reduced frequency of the tan δ minimum, rad/s. */
  omegaRadPerS: number;
  tanDeltaMin: number;
  /** The minimum is at an edge of the window: no plateau inside it, the value is a bound only. */
  atEdge: boolean;
}

/**
 * Plateau modulus estimate G_N⁰ ≈ G' at the minimum of tan δ (common practice for entangled
 * melts), on the Prony series scanned at 50 points per decade over the reduced window.
 */
export function plateauModulus(series: PronySeries, window: ReducedWindow): PlateauModulus {
  const [lo, hi] = frequencyWindow(window);
  const w = logSpace(lo, hi, 50);
  const lx = w.map(Math.log10);
  const ly = w.map((v) => Math.log10(pronyLoss(series, v) / pronyStorage(series, v)));
  const i = extremeIndex(ly, -1);
  if (i < 0) throw new RangeError('tan δ cannot be evaluated in this window');
  const v = parabolicVertex(lx, ly, i);
  const wMin = 10 ** v.x;
  return {
    modulusPa: pronyStorage(series, wMin),
    omegaRadPerS: wMin,
    tanDeltaMin: 10 ** v.y,
    atEdge: i === 0 || i === w.length - 1,
  };
}

export interface ModulusPlateaus {
  /** G0 = Ge + Σ g_i: the glassy (high-frequency) limit of the series, Pa. */
  glassyModulusPa: number;
  /** Ge: the rubbery/equilibrium (low-frequency) limit of the series, Pa. */
  rubberyModulusPa: number;
  /** G' at the highest and lowest reduced frequency of the window, Pa. */
  storageAtWindowTopPa: number;
  storageAtWindowBottomPa: number;
  /** The series is flat (|d log G'/d log ω| < 0.05) at the top / bottom of the window: the plateau was reached in the data. */
  glassyPlateauReached: boolean;
  rubberyPlateauReached: boolean;
}

const slopeAt = (s: PronySeries, w: number): number => {
  const h = 1.01;
  return Math.log10(pronyStorage(s, w * h) / pronyStorage(s, w / h)) / (2 * Math.log10(h));
};

/**
 * Glassy and rubbery moduli of a solid from its Prony series, with a check that each plateau is
 * actually inside the measured window (otherwise the limits are extrapolations of the series).
 */
export function modulusPlateaus(series: PronySeries, window: ReducedWindow): ModulusPlateaus {
  const [lo, hi] = frequencyWindow(window);
  return {
    glassyModulusPa: pronyInstantaneous(series),
    rubberyModulusPa: series.equilibriumModulusPa,
    storageAtWindowTopPa: pronyStorage(series, hi),
    storageAtWindowBottomPa: pronyStorage(series, lo),
    glassyPlateauReached: Math.abs(slopeAt(series, hi)) < 0.05,
    rubberyPlateauReached: series.equilibriumModulusPa > 0 && Math.abs(slopeAt(series, lo)) < 0.05,
  };
}
