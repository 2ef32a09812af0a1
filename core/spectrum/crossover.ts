import type { SpectrumWarning } from './types';

/** One point where G' = G''. */
export interface Crossover {
  /** Reduced angular frequency, rad/s. */
  omegaRadPerS: number;
  /** G' = G'' there, Pa. */
  modulusPa: number;
  /** 'storage-rises': G'' > G' below, G' > G'' above (the usual terminal-to-plateau crossover). */
  direction: 'storage-rises' | 'loss-rises';
}

/**
 * Every crossover G'(ω) = G''(ω) in the data, by linear interpolation of log G' − log G'' and of
 * log G' against log ω between neighbouring points (common practice). None, one or several may
 * exist. Points with non-positive or missing moduli are skipped with a warning.
 */
export function findCrossovers(
  omegaRadPerS: ArrayLike<number>,
  storagePa: ArrayLike<number>,
  lossPa: ArrayLike<number>,
): { crossovers: Crossover[]; warnings: SpectrumWarning[] } {
  const n = omegaRadPerS.length;
  if (storagePa.length !== n || lossPa.length !== n) {
    throw new RangeError(
      `omegaRadPerS (${n}), storagePa (${storagePa.length}) and lossPa (${lossPa.length}) must have the same length`,
    );
  }
  const warnings: SpectrumWarning[] = [];
  const pts: { lw: number; ls: number; d: number }[] = [];
  for (let i = 0; i < n; i++) {
    const w = omegaRadPerS[i];
    const s = storagePa[i];
    const l = lossPa[i];
    if (w > 0 && s > 0 && l > 0 && Number.isFinite(w + s + l)) {
      pts.push({ lw: Math.log10(w), ls: Math.log10(s), d: Math.log10(s) - Math.log10(l) });
    } else
      warnings.push({
        pointIndex: i,
        message: `Point ${i + 1}: frequency or moduli not positive; skipped for the crossover.`,
      });
  }
  pts.sort((a, b) => a.lw - b.lw);
  const crossovers: Crossover[] = [];
  for (let i = 0; i + 1 < pts.length; i++) {
    const a = pts[i];
    const b = pts[i + 1];
    if (a.lw === b.lw) continue;
    if (a.d === 0 && i > 0) continue; // counted as the end of the previous segment
    if ((a.d < 0 && b.d >= 0) || (a.d > 0 && b.d <= 0) || (a.d === 0 && i === 0)) {
      const f = a.d === b.d ? 0 : a.d / (a.d - b.d);
      crossovers.push({
        omegaRadPerS: 10 ** (a.lw + f * (b.lw - a.lw)),
        modulusPa: 10 ** (a.ls + f * (b.ls - a.ls)),
        direction: b.d > a.d ? 'storage-rises' : 'loss-rises',
      });
    }
  }
  return { crossovers, warnings };
}

/**
 * Keeps the crossovers the measured data confirm: inside the window by at least `marginDecades`,
 * and with the binned data's log G′ − log G″ of the right sign on both sides (at least two bins
 * within `reachDecades` on each side). A series crossing at the window edge, where no data lie
 * beyond, is dropped: the data cannot show it.
 */
export function confirmedCrossovers(
  crossovers: readonly Crossover[],
  bins: {
    log10x: ArrayLike<number>;
    storage: { log10y: ArrayLike<number>; count: ArrayLike<number> };
    loss: { log10y: ArrayLike<number>; count: ArrayLike<number> };
  },
  reachDecades = 0.3,
): Crossover[] {
  return crossovers.filter((c) => {
    const lc = Math.log10(c.omegaRadPerS);
    let below = 0;
    let nb = 0;
    let above = 0;
    let na = 0;
    for (let j = 0; j < bins.log10x.length; j++) {
      const lx = bins.log10x[j];
      if (!(bins.storage.count[j] > 0 && bins.loss.count[j] > 0)) continue;
      const d = bins.storage.log10y[j] - bins.loss.log10y[j];
      if (lx < lc && lx >= lc - reachDecades) {
        below += d;
        nb++;
      } else if (lx > lc && lx <= lc + reachDecades) {
        above += d;
        na++;
      }
    }
    if (nb < 2 || na < 2) return false;
    const rising = c.direction === 'storage-rises';
    return rising ? below < 0 && above > 0 : below > 0 && above < 0;
  });
}
