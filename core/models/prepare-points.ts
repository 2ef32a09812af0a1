import { formatCelsius } from '../data/temperature';
import type { FitWarning, ShiftPoint } from './types';

/** A shift point left out of a fit on purpose, with the reason (not a problem: no warning). */
export interface LeftOutPoint {
  temperatureK: number;
  reason: string;
}

/** The points a shift-model fit uses. */
export interface PreparedPoints {
  /** Index of each used point in the caller's array (to pick their covariance). */
  index: number[];
  temperatureK: number[];
  log10aT: number[];
  /** σ used, decades. */
  sigma: number[];
  /** Lowest and highest temperature among the points the fit rests on (the reference included), K. */
  rangeK: [number, number];
  /** Exact or hand-set points left out of the fit, with the reason. */
  leftOut: LeftOutPoint[];
  warnings: FitWarning[];
}

/** Within this distance of Tref a point with log10 aT = 0 is the reference isotherm (as the engine). */
const REFERENCE_MATCH_K = 0.01;

const celsius = (k: number): string => formatCelsius(k);

/**
 * Checks shift points before a fit; messages name temperatures, never positions in the list.
 * - A point with a non-finite temperature or log10 aT is skipped with a warning.
 * - The reference isotherm (log10 aT = 0 within 0.01 K of Tref, the engine's match) is exact:
 *   every model passes through it; it is left out quietly.
 * - A locked point (a shift set by hand) is not a measurement: it is left out and listed.
 * - A zero, negative, NaN or missing standard error on a measured point is replaced by the median
 *   of the valid ones (1 when none is valid: an unweighted fit), with a warning.
 */
export function preparePoints(points: readonly ShiftPoint[], referenceK: number): PreparedPoints {
  if (!Array.isArray(points)) throw new TypeError('points must be an array of shift points');
  if (!(referenceK > 0))
    throw new RangeError(`referenceK must be a positive temperature in K, got ${referenceK}`);
  const warnings: FitWarning[] = [];
  const leftOut: LeftOutPoint[] = [];
  const kept: number[] = [];
  const anchors: number[] = [];
  points.forEach((p, i) => {
    if (!Number.isFinite(p.temperatureK) || !(p.temperatureK > 0)) {
      warnings.push({
        pointIndex: i,
        message:
          'A shift factor without a usable temperature (missing or not positive in K) was skipped.',
      });
    } else if (!Number.isFinite(p.log10aT)) {
      warnings.push({
        pointIndex: i,
        message: `The shift factor at ${celsius(p.temperatureK)} is missing; skipped.`,
      });
    } else if (p.locked) {
      leftOut.push({
        temperatureK: p.temperatureK,
        reason: 'shift fixed by hand: not a measurement',
      });
    } else if (
      Math.abs(p.log10aT) < 1e-9 &&
      Math.abs(p.temperatureK - referenceK) <= REFERENCE_MATCH_K
    ) {
      anchors.push(p.temperatureK); // aT(Tref) = 1 is exact: every model passes through it
    } else {
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
        message: `The shift factor at ${celsius(points[i].temperatureK)} has ${s === undefined ? 'no' : `an unusable (${String(s)})`} standard error; the median error ${fallback.toPrecision(3)} decades is used instead.`,
      });
    }
    return fallback;
  });
  const temperatureK = kept.map((i) => points[i].temperatureK);
  let lo = Infinity;
  let hi = -Infinity;
  for (const T of [...temperatureK, ...anchors]) {
    if (T < lo) lo = T;
    if (T > hi) hi = T;
  }
  return {
    index: kept,
    temperatureK,
    log10aT: kept.map((i) => points[i].log10aT),
    sigma,
    rangeK: lo <= hi ? [lo, hi] : [NaN, NaN],
    leftOut,
    warnings,
  };
}
