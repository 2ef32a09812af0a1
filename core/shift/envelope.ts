/**
 * Symmetric matrices in envelope (profile, "skyline") storage and their LDLᵀ factorisation, the
 * linear algebra of the shift fit. Row r keeps the columns first[r]..r; the factor of a matrix has
 * no fill outside its envelope (George & Liu, Computer Solution of Large Sparse Positive Definite
 * Systems, 1981, ch. 4). With the parameters ordered by temperature and only isotherms a few
 * positions apart compared, the envelope is a band of a few dozen columns, so factorising and
 * solving cost O(n·w²) and O(n·w) instead of O(n³) and O(n²) for n parameters and width w.
 */

export interface Envelope {
  n: number;
  /** First stored column of each row (≤ the row). */
  first: Int32Array;
  /** Offset of row r's first stored entry; entry (r, c) sits at start[r] + c − first[r]. */
  start: Int32Array;
  /** Number of stored entries. */
  size: number;
}

export function envelope(first: Int32Array): Envelope {
  const n = first.length;
  const start = new Int32Array(n + 1);
  for (let r = 0; r < n; r++) {
    if (!(first[r] >= 0 && first[r] <= r))
      throw new RangeError(`envelope(): first[${r}] = ${first[r]} must lie in 0..${r}`);
    start[r + 1] = start[r] + r - first[r] + 1;
  }
  return { n, first, start, size: start[n] };
}

/** Storage index of (i, j) in the lower triangle, or −1 outside the envelope. */
export function slotOf(e: Envelope, i: number, j: number): number {
  const r = i >= j ? i : j;
  const c = i >= j ? j : i;
  return c >= e.first[r] ? e.start[r] + c - e.first[r] : -1;
}

export function diagonalSlot(e: Envelope, r: number): number {
  return e.start[r] + r - e.first[r];
}

/** y = A x for the symmetric matrix A stored in `a`. */
export function multiply(e: Envelope, a: Float64Array, x: ArrayLike<number>): Float64Array {
  const y = new Float64Array(e.n);
  for (let r = 0; r < e.n; r++) {
    const f = e.first[r];
    const s = e.start[r] - f;
    let sum = a[s + r] * x[r];
    const xr = x[r];
    for (let c = f; c < r; c++) {
      const v = a[s + c];
      sum += v * x[c];
      y[c] += v * xr;
    }
    y[r] += sum;
  }
  return y;
}

export interface EnvelopeFactor {
  e: Envelope;
  /** Unit lower factor L below the diagonal and D on it: A = L·D·Lᵀ. */
  ld: Float64Array;
  singular: boolean;
}

/**
 * A = L D Lᵀ without pivoting (the matrices here are positive definite). A pivot at or below
 * `relativeTiny` × the largest diagonal entry marks the matrix singular. `inPlace` overwrites `a`
 * with the factor instead of copying it.
 */
/** Largest |diagonal entry| of `a`. */
function diagonalScale(e: Envelope, a: Float64Array): number {
  let scale = 0;
  for (let r = 0; r < e.n; r++) scale = Math.max(scale, Math.abs(a[diagonalSlot(e, r)]));
  return scale;
}

export function ldlFactor(
  e: Envelope,
  a: Float64Array,
  relativeTiny = 1e-13,
  inPlace = false,
): EnvelopeFactor {
  const scale = diagonalScale(e, a);
  const ld = inPlace ? a : Float64Array.from(a);
  const { n, first, start } = e;
  const tiny = scale * relativeTiny;
  let singular = n > 0 && !(scale > 0);
  for (let i = 0; i < n; i++) {
    const fi = first[i];
    const si = start[i] - fi;
    // W_ij = L_ij·D_j, computed in row i's storage, then turned into L_ij.
    for (let j = fi; j < i; j++) {
      const fj = first[j];
      const sj = start[j] - fj;
      const k0 = fi > fj ? fi : fj;
      let s = ld[si + j];
      for (let k = k0; k < j; k++) s -= ld[si + k] * ld[sj + k];
      ld[si + j] = s;
    }
    let d = ld[si + i];
    for (let j = fi; j < i; j++) {
      const w = ld[si + j];
      const l = w / ld[start[j] + j - first[j]];
      d -= l * w;
      ld[si + j] = l;
    }
    if (!(d > tiny)) {
      singular = true;
      d = tiny > 0 ? tiny : 1;
    }
    ld[si + i] = d;
  }
  return { e, ld, singular };
}

/** Solves A x = b from the factor. */
export function ldlSolve(f: EnvelopeFactor, b: ArrayLike<number>): Float64Array {
  const { n, first, start } = f.e;
  const ld = f.ld;
  const x = Float64Array.from(b);
  for (let i = 0; i < n; i++) {
    const s = start[i] - first[i];
    let v = x[i];
    for (let c = first[i]; c < i; c++) v -= ld[s + c] * x[c];
    x[i] = v;
  }
  for (let i = 0; i < n; i++) x[i] /= ld[start[i] + i - first[i]];
  for (let i = n - 1; i >= 0; i--) {
    const s = start[i] - first[i];
    const xi = x[i];
    for (let c = first[i]; c < i; c++) x[c] -= ld[s + c] * xi;
  }
  return x;
}

/** Rows k > c whose envelope reaches column c, per column (compressed columns). */
function columnRows(e: Envelope): { ptr: Int32Array; rows: Int32Array } {
  const { n, first } = e;
  const count = new Int32Array(n + 1);
  for (let r = 0; r < n; r++) for (let c = first[r]; c < r; c++) count[c + 1]++;
  for (let c = 0; c < n; c++) count[c + 1] += count[c];
  const rows = new Int32Array(count[n]);
  const fill = count.slice(0, n);
  for (let r = 0; r < n; r++) for (let c = first[r]; c < r; c++) rows[fill[c]++] = r;
  return { ptr: count, rows };
}

/**
 * diag(H⁻¹) and diag(H⁻¹ B H⁻¹) for symmetric positive definite H and symmetric B on the same
 * envelope, without forming any inverse. H⁻¹BH⁻¹ is the derivative of (H − εB)⁻¹ at ε = 0, so the
 * factorisation and the selected inversion of Takahashi, Fagan & Chen (1973; Erisman & Tinney,
 * Commun. ACM 18, 1975), which give the entries of an inverse inside the envelope in O(n·w²), are
 * run in dual numbers a + εb (forward-mode differentiation): the real parts give H⁻¹, the ε parts
 * H⁻¹BH⁻¹ — exactly, not approximately. Returns null when H is singular.
 */
export function inverseDiagonals(
  e: Envelope,
  h: Float64Array,
  b: Float64Array,
): { inverse: Float64Array; sandwich: Float64Array } | null {
  const { n, first, start } = e;
  // Dual LDLᵀ of H − εB: real part (l0) and ε part (l1).
  const l0 = Float64Array.from(h);
  const l1 = new Float64Array(e.size);
  for (let k = 0; k < e.size; k++) l1[k] = -b[k];
  const tiny = diagonalScale(e, h) * 1e-13;
  for (let i = 0; i < n; i++) {
    const fi = first[i];
    const si = start[i] - fi;
    for (let j = fi; j < i; j++) {
      const fj = first[j];
      const sj = start[j] - fj;
      const k0 = fi > fj ? fi : fj;
      let s0 = l0[si + j];
      let s1 = l1[si + j];
      for (let k = k0; k < j; k++) {
        const a0 = l0[si + k];
        const a1 = l1[si + k];
        const c0 = l0[sj + k];
        const c1 = l1[sj + k];
        s0 -= a0 * c0;
        s1 -= a0 * c1 + a1 * c0;
      }
      l0[si + j] = s0;
      l1[si + j] = s1;
    }
    let d0 = l0[si + i];
    let d1 = l1[si + i];
    for (let j = fi; j < i; j++) {
      const w0 = l0[si + j];
      const w1 = l1[si + j];
      const dj = start[j] + j - first[j];
      const p0 = l0[dj];
      const p1 = l1[dj];
      // L = W / D in dual numbers.
      const q0 = w0 / p0;
      const q1 = (w1 * p0 - w0 * p1) / (p0 * p0);
      d0 -= q0 * w0;
      d1 -= q0 * w1 + q1 * w0;
      l0[si + j] = q0;
      l1[si + j] = q1;
    }
    if (!(d0 > tiny)) return null;
    l0[si + i] = d0;
    l1[si + i] = d1;
  }
  // Selected inversion, from the last row up: Z = D⁻¹L⁻¹ + (I − Lᵀ) Z on the envelope.
  const z0 = new Float64Array(e.size);
  const z1 = new Float64Array(e.size);
  const { ptr, rows } = columnRows(e);
  const at = (i: number, j: number): number => {
    const r = i >= j ? i : j;
    const c = i >= j ? j : i;
    return start[r] + c - first[r];
  };
  for (let i = n - 1; i >= 0; i--) {
    const p0 = ptr[i];
    const p1 = ptr[i + 1];
    for (let q = p0; q < p1; q++) {
      const j = rows[q];
      let s0 = 0;
      let s1 = 0;
      for (let t = p0; t < p1; t++) {
        const k = rows[t];
        const lk = start[k] + i - first[k];
        const a0 = l0[lk];
        const a1 = l1[lk];
        const zk = at(k, j);
        s0 += a0 * z0[zk];
        s1 += a0 * z1[zk] + a1 * z0[zk];
      }
      const ji = start[j] + i - first[j];
      z0[ji] = -s0;
      z1[ji] = -s1;
    }
    const di = start[i] + i - first[i];
    const dd0 = l0[di];
    const dd1 = l1[di];
    let s0 = 1 / dd0;
    let s1 = -dd1 / (dd0 * dd0);
    for (let t = p0; t < p1; t++) {
      const k = rows[t];
      const lk = start[k] + i - first[k];
      s0 -= l0[lk] * z0[lk];
      s1 -= l0[lk] * z1[lk] + l1[lk] * z0[lk];
    }
    z0[di] = s0;
    z1[di] = s1;
  }
  const inverse = new Float64Array(n);
  const sandwich = new Float64Array(n);
  for (let r = 0; r < n; r++) {
    inverse[r] = z0[start[r] + r - first[r]];
    sandwich[r] = z1[start[r] + r - first[r]];
  }
  return { inverse, sandwich };
}
