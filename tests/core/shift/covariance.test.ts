import { describe, expect, it } from 'vitest';
import { Matrix, inverse } from 'ml-matrix';
import { shiftIsotherms } from '../../../core/shift';
import { offsetCovariance, offsetStdErrors } from '../../../core/shift/covariance';
import { residualsAt } from '../../../core/shift/residuals';
import { robustWeight } from '../../../core/shift/robust';
import { referenceWeights } from '../../../core/shift/reference';
import type { SolveSettings } from '../../../core/shift/solve';
import { solveOffsets } from '../../../core/shift/solve';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';
import { horizontalProblem, make, MELT_ARRHENIUS } from './fixtures';

describe('offsetStdErrors()', () => {
  const { dataset, truth } = make(MELT_ARRHENIUS, 0.02, 3);
  const n = dataset.isotherms.length;
  const p = horizontalProblem(dataset);
  const temps = dataset.isotherms.map((i) => i.temperatureK);
  const ref = referenceWeights([...Array(n).keys()], temps, MELT_ARRHENIUS.options.referenceK);
  const coef = new Float64Array(n);
  ref.coef.forEach((c, k) => (coef[k] = c));
  const settings: SolveSettings = {
    loss: 'huber',
    scale: 0.012,
    maxIterations: 30,
    fixed: new Uint8Array(n),
    constraints: [{ coef, rhs: 0 }],
    toleranceDecades: 1e-4,
    covariance: false,
  };
  const out = solveOffsets(p, truth.log10aT, settings);

  it('offsetStdErrors() equals the square root of the full covariance diagonal', () => {
    expect(out.uncertainty).toBeNull(); // not asked for
    const cov = offsetCovariance(p, out.theta, settings, out.residualVariance)!;
    const some = [0, 3, 9];
    const se = offsetStdErrors(p, out.theta, settings, out.residualVariance, some);
    some.forEach((c, i) => {
      expect(se[i]).toBeGreaterThan(0);
      // Same algebra in another order: equal to rounding.
      expectRelClose(se[i], Math.sqrt(cov[c * n + c]), 1e-9, `curve ${c}`);
    });
  });

  it('offsetStdErrors() gives NaN for a fixed parameter', () => {
    const fixed = new Uint8Array(n);
    fixed[2] = 1;
    const se = offsetStdErrors(p, out.theta, { ...settings, fixed }, out.residualVariance, [2]);
    expect(se[0]).toBeNaN();
  });
});

describe('offsetCovariance()', () => {
  it('offsetCovariance() equals the sandwich worked out densely from every residual', () => {
    // The same estimator computed the straightforward way (Huber 1967: Cov = s²·M B M with M the
    // constrained inverse of the curvature and B the noise of every measured entry propagated
    // through the score), with dense matrices from ml-matrix: here with a reference between two
    // isotherms (interpolated, three coefficients) and one locked isotherm.
    const { dataset } = make(MELT_ARRHENIUS, 0.02, 4);
    const n = dataset.isotherms.length;
    const p = horizontalProblem(dataset);
    const temps = dataset.isotherms.map((i) => i.temperatureK);
    const ref = referenceWeights([...Array(n).keys()], temps, 468.15);
    expect(ref.kind).toBe('interpolated');
    const coef = new Float64Array(n);
    ref.coef.forEach((c, k) => (coef[k] = c));
    const fixed = new Uint8Array(n);
    fixed[8] = 1;
    const settings: SolveSettings = {
      loss: 'huber',
      scale: 0.012,
      maxIterations: 30,
      fixed,
      constraints: [{ coef, rhs: 0 }],
      toleranceDecades: 1e-4,
      covariance: false,
    };
    const out = solveOffsets(p, new Float64Array(n), settings);
    const s2 = out.residualVariance;
    const cov = offsetCovariance(p, out.theta, settings, s2)!;

    const buf = residualsAt({ ...p, smoothSlopes: true }, out.theta);
    const free = [...Array(n).keys()].filter((k) => !fixed[k]);
    const at = new Map(free.map((k, u) => [k, u]));
    const m = free.length;
    const A = Matrix.zeros(m, m);
    const score = new Map<string, { weight: number; v: Float64Array }>();
    const sens = (curve: number, d: number, e: number) => {
      const key = `${curve}/${d}/${e}`;
      if (!score.has(key))
        score.set(key, { weight: 1 / p.curves[curve][d].w[e], v: new Float64Array(m) });
      return score.get(key)!.v;
    };
    for (let k = 0; k < buf.size; k++) {
      const z = buf.r[k] * Math.sqrt(buf.w[k]);
      const wt = buf.w[k] * robustWeight('huber', z, settings.scale);
      const g = buf.g[k];
      const u = at.get(buf.owner[k]);
      const t = at.get(buf.other[k]);
      // ∇r = g (e_owner − e_other) over the free parameters.
      const grad = new Float64Array(m);
      if (u !== undefined) grad[u] += g;
      if (t !== undefined) grad[t] -= g;
      for (let a = 0; a < m; a++)
        for (let b = 0; b < m; b++) A.set(a, b, A.get(a, b) + wt * grad[a] * grad[b]);
      const lam = buf.lam[k];
      const own = sens(buf.owner[k], buf.driver[k], buf.entry[k]);
      const left = sens(buf.other[k], buf.driver[k], buf.knot[k]);
      const right = sens(buf.other[k], buf.driver[k], buf.knot[k] + 1);
      for (let a = 0; a < m; a++) {
        own[a] += wt * grad[a];
        left[a] -= (1 - lam) * wt * grad[a];
        right[a] -= lam * wt * grad[a];
      }
    }
    const B = Matrix.zeros(m, m);
    for (const { weight, v } of score.values())
      for (let a = 0; a < m; a++)
        for (let b = 0; b < m; b++) B.set(a, b, B.get(a, b) + weight * v[a] * v[b]);
    const K = Matrix.zeros(m + 1, m + 1);
    for (let a = 0; a < m; a++) {
      for (let b = 0; b < m; b++) K.set(a, b, A.get(a, b));
      K.set(a, m, coef[free[a]]);
      K.set(m, a, coef[free[a]]);
    }
    const M = inverse(K).subMatrix(0, m - 1, 0, m - 1);
    const dense = M.mmul(B).mmul(M).mul(s2);
    for (let a = 0; a < m; a++)
      for (let b = 0; b < m; b++)
        expectAbsClose(
          cov[free[a] * n + free[b]],
          dense.get(a, b),
          1e-9 * dense.get(a, a),
          `cov[${free[a]}][${free[b]}]`,
        );
    // The locked isotherm has no variance and no covariance.
    for (let k = 0; k < n; k++) expect(cov[8 * n + k]).toBe(0);
  });
});

describe('shiftIsotherms() covariance', () => {
  it('shiftIsotherms() returns the covariance of log10 aT of the included isotherms, its diagonal the s.e.²', () => {
    const { dataset } = make(MELT_ARRHENIUS, 0.02, 5);
    const r = shiftIsotherms(dataset, {
      referenceK: MELT_ARRHENIUS.options.referenceK,
      locked: [{ id: 'T02', log10aT: 0.4 }],
    });
    const c = r.covariance!;
    expect(c.ids).toEqual(r.curves.filter((cv) => cv.included).map((cv) => cv.id));
    c.ids.forEach((id, a) => {
      const curve = r.curves.find((cv) => cv.id === id)!;
      expectAbsClose(Math.sqrt(c.log10aT[a][a]), curve.log10aTStdErr!, 1e-12, id);
      c.ids.forEach((_, b) => expect(c.log10aT[a][b]).toBe(c.log10aT[b][a]));
    });
    // The reference isotherm (measured at Tref) and the locked one have no variance at all.
    const zeroRows = c.ids.filter((_, a) => c.log10aT[a].every((v) => v === 0));
    expect(zeroRows.sort()).toEqual(['T02', 'T05']);
    // Neighbouring shifts share the noise of the curves between them: positively correlated.
    expect(c.log10aT[2][3]).toBeGreaterThan(0);
    expect(() => JSON.stringify(r)).not.toThrow();
  });
});
