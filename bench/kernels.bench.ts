/**
 * `npm run bench -- kernels`: the hand-written numeric kernels against a maintained library, to
 * judge whether keeping them is worth it (docs/architecture.md, "Numeric kernels").
 * - Dense LU with partial pivoting (core/shift/linear-solve.ts) against ml-matrix 6.15.1's
 *   `solve` (LU on Matrix objects) for the KKT systems of the shift fit: time and the largest
 *   difference of the solutions.
 * - Student-t quantiles (core/numeric/student-t.ts): time per call, and the value against the
 *   table value t(0.975, 10) = 2.228 (any table of Student-t percentiles; from memory).
 */
import { Matrix, solve } from 'ml-matrix';
import { luFactor, luSolve } from '../core/shift/linear-solve.ts';
import { studentTQuantile } from '../core/numeric/student-t.ts';
import { seededRandom } from '../core/synthetic/index.ts';
import { medianMs } from './timing.ts';

export async function run(): Promise<void> {
  const rng = seededRandom(7);
  for (const n of [20, 100, 400]) {
    // A symmetric positive definite matrix like a normal-equation block: AᵀA + n·I.
    const a = Array.from({ length: n }, () => Array.from({ length: n }, () => rng.normal()));
    const m = new Matrix(a).transpose().mmul(new Matrix(a)).add(Matrix.eye(n).mul(n));
    const flat = Float64Array.from(m.to1DArray());
    const b = Array.from({ length: n }, () => rng.normal());
    const ours = medianMs(() => luSolve(luFactor(flat, n), b), 9, 2);
    const lib = medianMs(() => solve(m, Matrix.columnVector(b)), 9, 2);
    const x1 = luSolve(luFactor(flat, n), b);
    const x2 = solve(m, Matrix.columnVector(b)).to1DArray();
    let diff = 0;
    for (let i = 0; i < n; i += 1) diff = Math.max(diff, Math.abs(x1[i] - x2[i]));
    console.log(
      `LU solve n = ${n}: flat arrays ${ours.toFixed(3)} ms, ml-matrix ${lib.toFixed(3)} ms ` +
        `(×${(lib / ours).toFixed(1)}); max |Δx| ${diff.toExponential(1)}`,
    );
  }
  const dofs = Array.from({ length: 1000 }, (_, i) => 1 + (i % 200));
  const tq = medianMs(() => dofs.forEach((d) => studentTQuantile(0.975, d)), 9, 2);
  console.log(
    `Student-t quantile: ${((tq * 1000) / dofs.length).toFixed(2)} µs a call; ` +
      `t(0.975, 10) = ${studentTQuantile(0.975, 10).toFixed(4)} (table: 2.228)`,
  );
}
