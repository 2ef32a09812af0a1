import type { WlfFit } from './types';
import { studentTQuantile } from '../numeric/student-t';

/**
 * WLF constants at another reference temperature (Ferry 1980, ch. 11; docs/conventions.md §3):
 * C1' = C1·C2/(C2 + T' − Tr), C2' = C2 + T' − Tr. The curve itself is unchanged, only the point
 * where log10 aT = 0 moves.
 */
export function rereferenceWlf(
  c1: number,
  c2K: number,
  fromK: number,
  toK: number,
): { c1: number; c2K: number; referenceK: number } {
  const c2New = c2K + toK - fromK;
  if (!(c2New > 0)) {
    throw new RangeError(
      `Cannot move the WLF reference to ${toK} K: it lies at or below the WLF pole (Tr − C2 = ${(fromK - c2K).toFixed(1)} K)`,
    );
  }
  return { c1: (c1 * c2K) / c2New, c2K: c2New, referenceK: toK };
}

/**
 * A fitted WLF model re-referenced to `toK` (e.g. Tg when the user gives one), with the
 * covariance carried over by the Jacobian of the map (C1, C2) → (C1', C2'). Note: log10 aT is
 * relative to the new reference, so the band of the re-referenced curve is zero at T', not at Tr.
 */
export function rereferenceWlfFit(
  fit: WlfFit,
  toK: number,
): {
  c1: number;
  c2K: number;
  referenceK: number;
  covariance: number[][];
  c1StdErr: number;
  c2StdErr: number;
  c1Ci95: [number, number];
  c2Ci95: [number, number];
} {
  const { c1, c2K } = fit;
  const d = toK - fit.referenceK;
  const r = rereferenceWlf(c1, c2K, fit.referenceK, toK);
  const s = c2K + d;
  // ∂C1'/∂C1 = C2/s, ∂C1'/∂C2 = C1·d/s², ∂C2'/∂C1 = 0, ∂C2'/∂C2 = 1
  const j = [
    [c2K / s, (c1 * d) / (s * s)],
    [0, 1],
  ];
  const c = fit.covariance;
  const cov = j.map((ja) =>
    j.map(
      (jb) =>
        ja[0] * (c[0][0] * jb[0] + c[0][1] * jb[1]) + ja[1] * (c[1][0] * jb[0] + c[1][1] * jb[1]),
    ),
  );
  const t = Number.isFinite(fit.tQuantile95) ? fit.tQuantile95 : studentTQuantile(0.975, 1e8);
  const se1 = Math.sqrt(cov[0][0]);
  const se2 = Math.sqrt(cov[1][1]);
  return {
    ...r,
    covariance: cov,
    c1StdErr: se1,
    c2StdErr: se2,
    c1Ci95: [r.c1 - t * se1, r.c1 + t * se1],
    c2Ci95: [r.c2K - t * se2, r.c2K + t * se2],
  };
}
