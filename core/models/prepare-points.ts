import type { FitWarning, ShiftPoint } from './types';

/** The points a shift-model fit uses, with statistical weights 1/σ². */
export interface PreparedPoints {
  /** Index of each used point in the caller's array. */
  index: number[];
  temperatureK: number[];
  log10aT: number[];
  /** σ used, decades. */
  sigma: number[];
  /** Lowest and highest temperature among the usable points (the reference point included), K. */
  rangeK: [number, number];
  warnings: FitWarning[];
}

const celsius = (k: number): string => `${(k - 273.15).toFixed(1)} °C`;

/**
 * Checks shift points before a fit. Points with a non-finite temperature or log10 aT are skipped
 * with a warning. The point at the reference temperature (log10 aT = 0 by definition) carries no
 * information and is left out quietly. Zero, negative, NaN or missing standard errors are replaced
 * by the median of the valid ones (or 1 when none is valid: an unweighted fit), with a warning.
 */
export function preparePoints(points: readonly ShiftPoint[], referenceK: number): PreparedPoints {
  if (!Array.isArray(points)) throw new TypeError('points must be an array of shift points');
  if (!(referenceK > 0))
    throw new RangeError(`referenceK must be a positive temperature in K, got ${referenceK}`);
  const warnings: FitWarning[] = [];
  const kept: number[] = [];
  const usable: number[] = [];
  points.forEach((p, i) => {
    if (!Number.isFinite(p.temperatureK) || !(p.temperatureK > 0)) {
      warnings.push({
        pointIndex: i,
        message: `Point ${i + 1}: temperature is missing or not positive in K; skipped.`,
      });
    } else if (!Number.isFinite(p.log10aT)) {
      warnings.push({
        pointIndex: i,
        message: `Point ${i + 1} at ${celsius(p.temperatureK)}: shift factor is missing; skipped.`,
      });
    } else if (Math.abs(p.temperatureK - referenceK) < 1e-9 && Math.abs(p.log10aT) < 1e-12) {
      usable.push(p.temperatureK); // aT(Tref) = 1 is exact: every model passes through it.
    } else {
      usable.push(p.temperatureK);
      kept.push(i);
    }
  });
  const valid = kept
    .map((i) => points[i].stdErr)
    .filter((s): s is number => s !== undefined && Number.isFinite(s) && s > 0);
  const sorted = [...valid].sort((a, b) => a - b);
  const fallback = sorted.length ? sorted[Math.floor(sorted.length / 2)] : 1;
  if (kept.length > 0 && valid.length === 0) {
    warnings.push({
      pointIndex: -1,
      message: 'No shift factor has a usable standard error: the fit is unweighted.',
    });
  }
  const sigma = kept.map((i) => {
    const s = points[i].stdErr;
    if (s !== undefined && Number.isFinite(s) && s > 0) return s;
    if (valid.length > 0) {
      warnings.push({
        pointIndex: i,
        message: `Point ${i + 1} at ${celsius(points[i].temperatureK)}: standard error is ${s === undefined ? 'missing' : String(s)}; the median error ${fallback.toPrecision(3)} decades is used instead.`,
      });
    }
    return fallback;
  });
  return {
    index: kept,
    temperatureK: kept.map((i) => points[i].temperatureK),
    log10aT: kept.map((i) => points[i].log10aT),
    sigma,
    rangeK: usable.length ? [Math.min(...usable), Math.max(...usable)] : [NaN, NaN],
    warnings,
  };
}
