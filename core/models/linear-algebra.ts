/**
 * Small dense linear algebra for the model fits (a few parameters): the normal matrix JᵀWJ and its
 * inverse by Gauss–Jordan elimination with partial pivoting. Singular matrices give NaN entries,
 * which the fits report as "parameters not determined".
 */

/** JᵀWJ and JᵀWr for rows J[i] (one per point), weights w[i] and residuals r[i]. */
export function normalEquations(
  jacobian: readonly number[][],
  weights: readonly number[],
  residuals: readonly number[],
): { matrix: number[][]; vector: number[] } {
  const p = jacobian.length ? jacobian[0].length : 0;
  const matrix = Array.from({ length: p }, () => new Array<number>(p).fill(0));
  const vector = new Array<number>(p).fill(0);
  jacobian.forEach((row, i) => {
    for (let a = 0; a < p; a++) {
      vector[a] += weights[i] * row[a] * residuals[i];
      for (let b = 0; b < p; b++) matrix[a][b] += weights[i] * row[a] * row[b];
    }
  });
  return { matrix, vector };
}

/** Inverse of a small symmetric positive matrix; NaN-filled when it is (numerically) singular. */
export function invert(m: readonly number[][]): number[][] {
  const n = m.length;
  const a = m.map((row, i) => [...row, ...Array.from({ length: n }, (_, j) => (i === j ? 1 : 0))]);
  let scale = 0;
  for (let i = 0; i < n; i++) scale = Math.max(scale, Math.abs(m[i][i]));
  for (let c = 0; c < n; c++) {
    let piv = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(a[r][c]) > Math.abs(a[piv][c])) piv = r;
    if (!(Math.abs(a[piv][c]) > 1e-14 * scale)) {
      return Array.from({ length: n }, () => new Array<number>(n).fill(NaN));
    }
    [a[c], a[piv]] = [a[piv], a[c]];
    const d = a[c][c];
    for (let j = 0; j < 2 * n; j++) a[c][j] /= d;
    for (let r = 0; r < n; r++) {
      if (r === c) continue;
      const f = a[r][c];
      if (f !== 0) for (let j = 0; j < 2 * n; j++) a[r][j] -= f * a[c][j];
    }
  }
  return a.map((row) => row.slice(n));
}

/** Matrix–vector product. */
export function multiply(m: readonly number[][], v: readonly number[]): number[] {
  return m.map((row) => row.reduce((s, x, j) => s + x * v[j], 0));
}

/** gᵀ C g: the variance of a linear combination g of parameters with covariance C. */
export function quadraticForm(c: readonly number[][], g: readonly number[]): number {
  let s = 0;
  for (let a = 0; a < g.length; a++) for (let b = 0; b < g.length; b++) s += g[a] * c[a][b] * g[b];
  return s;
}
