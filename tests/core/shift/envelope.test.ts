import { describe, expect, it } from 'vitest';
import { Matrix, inverse } from 'ml-matrix';
import {
  envelope,
  inverseDiagonals,
  ldlFactor,
  ldlSolve,
  multiply,
  slotOf,
} from '../../../core/shift/envelope';
import { seededRandom } from '../../../core/synthetic';
import { expectRelClose } from '../../helpers/assert-close';

/** A random symmetric matrix on an envelope of varying width, positive definite when `spd`. */
function randomEnvelope(n: number, seed: number, spd: boolean) {
  const rng = seededRandom(seed);
  const first = Int32Array.from({ length: n }, (_, r) =>
    Math.max(0, r - Math.floor(rng.uniform() * 6)),
  );
  const e = envelope(first);
  const a = new Float64Array(e.size);
  const dense = Matrix.zeros(n, n);
  for (let r = 0; r < n; r++)
    for (let c = first[r]; c < r; c++) {
      const v = rng.normal();
      a[slotOf(e, r, c)] = v;
      dense.set(r, c, v);
      dense.set(c, r, v);
    }
  for (let r = 0; r < n; r++) {
    // Diagonal dominance makes it positive definite.
    let sum = 0;
    for (let c = 0; c < n; c++) if (c !== r) sum += Math.abs(dense.get(r, c));
    const d = spd ? sum + 1 + rng.uniform() : rng.normal();
    a[slotOf(e, r, r)] = d;
    dense.set(r, r, d);
  }
  return { e, a, dense };
}

describe('ldlFactor()', () => {
  it('ldlFactor() and ldlSolve() solve a banded positive definite system as ml-matrix does', () => {
    // Reference: ml-matrix 6.15.1 (a general-purpose library), dense inverse.
    const { e, a, dense } = randomEnvelope(40, 3, true);
    const b = Array.from({ length: 40 }, (_, i) => Math.sin(i));
    const x = ldlSolve(ldlFactor(e, a), b);
    const ref = inverse(dense).mmul(Matrix.columnVector(b)).to1DArray();
    x.forEach((v, i) => expectRelClose(v, ref[i], 1e-10, `x[${i}]`));
    // And A x reproduces b through the envelope product.
    multiply(e, a, x).forEach((v, i) => expectRelClose(v + 10, b[i] + 10, 1e-12, `Ax[${i}]`));
  });

  it('ldlFactor() marks a matrix that is not positive definite as singular', () => {
    const e = envelope(Int32Array.from([0, 0]));
    // [[1, 2], [2, 1]] has eigenvalues 3 and −1.
    expect(ldlFactor(e, Float64Array.from([1, 2, 1])).singular).toBe(true);
    expect(ldlFactor(e, Float64Array.from([2, 1, 2])).singular).toBe(false);
  });

  it('envelope() rejects a first column beyond its row', () => {
    expect(() => envelope(Int32Array.from([0, 2]))).toThrow(/first\[1\]/);
  });
});

describe('inverseDiagonals()', () => {
  it('inverseDiagonals() gives diag(H⁻¹) and diag(H⁻¹BH⁻¹) exactly (against ml-matrix)', () => {
    const { e, a: h, dense: H } = randomEnvelope(60, 8, true);
    // B on the same envelope, symmetric (need not be definite).
    const { a: b, dense: B } = randomEnvelope(60, 8, false);
    const out = inverseDiagonals(e, h, b)!;
    const Hi = inverse(H);
    const sandwich = Hi.mmul(B).mmul(Hi);
    for (let i = 0; i < 60; i++) {
      expectRelClose(out.inverse[i], Hi.get(i, i), 1e-9, `H⁻¹[${i}]`);
      expectRelClose(out.sandwich[i], sandwich.get(i, i), 1e-8, `H⁻¹BH⁻¹[${i}]`);
    }
  });

  it('inverseDiagonals() returns null for a singular matrix', () => {
    const e = envelope(Int32Array.from([0, 0]));
    expect(inverseDiagonals(e, Float64Array.from([1, 1, 1]), new Float64Array(3))).toBeNull();
  });
});
