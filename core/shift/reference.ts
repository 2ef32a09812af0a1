/**
 * Where the reference temperature sits among the fitted isotherms. The constraint
 * log10 aT(Tref) = Σ c_k·h_k = 0 uses: the isotherm itself when one was measured within
 * REFERENCE_MATCH_K of Tref; otherwise quadratic (Lagrange) interpolation in T through the two
 * neighbours below and above plus the next nearest isotherm — log10 aT(T) is curved (WLF), and a
 * straight line between neighbours 8 K apart is off by about 0.01 decades — or linear when only two
 * temperatures exist; outside the measured range, linear extrapolation from the two nearest
 * (flagged, since it is an extrapolation).
 */
export const REFERENCE_MATCH_K = 0.01;

export interface ReferenceWeights {
  /** Curve index → coefficient. */
  coef: Map<number, number>;
  kind: 'measured' | 'interpolated' | 'extrapolated' | 'single';
}

export function referenceWeights(
  curves: number[],
  temperaturesK: number[],
  referenceK: number,
): ReferenceWeights {
  const sorted = [...curves].sort((a, b) => temperaturesK[a] - temperaturesK[b]);
  const nearest = [...curves].sort(
    (a, b) => Math.abs(temperaturesK[a] - referenceK) - Math.abs(temperaturesK[b] - referenceK),
  )[0];
  if (Math.abs(temperaturesK[nearest] - referenceK) <= REFERENCE_MATCH_K)
    return { coef: new Map([[nearest, 1]]), kind: 'measured' };
  const distinct: number[] = [];
  for (const k of sorted)
    if (distinct.length === 0 || temperaturesK[k] > temperaturesK[distinct[distinct.length - 1]])
      distinct.push(k);
  if (distinct.length < 2) return { coef: new Map([[nearest, 1]]), kind: 'single' };
  let a: number;
  let b: number;
  let kind: ReferenceWeights['kind'] = 'interpolated';
  const first = temperaturesK[distinct[0]];
  const last = temperaturesK[distinct[distinct.length - 1]];
  if (referenceK < first) {
    [a, b] = [distinct[0], distinct[1]];
    kind = 'extrapolated';
  } else if (referenceK > last) {
    [a, b] = [distinct[distinct.length - 2], distinct[distinct.length - 1]];
    kind = 'extrapolated';
  } else {
    let i = 0;
    while (temperaturesK[distinct[i + 1]] < referenceK) i++;
    [a, b] = [distinct[i], distinct[i + 1]];
  }
  if (kind === 'interpolated' && distinct.length >= 3) {
    // Third point: the nearer of the next ones outward.
    const ia = distinct.indexOf(a);
    const ib = distinct.indexOf(b);
    const below = ia > 0 ? distinct[ia - 1] : -1;
    const above = ib < distinct.length - 1 ? distinct[ib + 1] : -1;
    const c =
      below < 0
        ? above
        : above < 0
          ? below
          : referenceK - temperaturesK[below] <= temperaturesK[above] - referenceK
            ? below
            : above;
    return { coef: lagrange([a, b, c], temperaturesK, referenceK), kind };
  }
  return { coef: lagrange([a, b], temperaturesK, referenceK), kind };
}

/** Lagrange interpolation weights of the curves' temperatures at T. */
function lagrange(nodes: number[], temperaturesK: number[], T: number): Map<number, number> {
  const coef = new Map<number, number>();
  for (const i of nodes) {
    let w = 1;
    for (const j of nodes)
      if (j !== i) w *= (T - temperaturesK[j]) / (temperaturesK[i] - temperaturesK[j]);
    coef.set(i, w);
  }
  return coef;
}
