/**
 * Size (docs/conventions.md §7): 10⁶ points through the shift engine and the master curve, 10,000
 * isotherms of three points each, and 10,000 that overlap nothing. Speed is measured by
 * `npm run bench -- vs`, never here; these tests check that big inputs come through right (a
 * spread of a 10⁶-element array, `Math.max(...x)`, would throw a RangeError here).
 */
import { describe, expect, it } from 'vitest';
import type { Dataset } from '../../../core/data/types';
import { reduceToMasterCurve } from '../../../core/pipeline/reduce';
import { shiftIsotherms } from '../../../core/shift';
import { analysisCurvesOf } from '../../helpers/analysis-curves';
import { expectAbsClose } from '../../helpers/assert-close';
import { expectShiftsWithin, inventedMelt, maxError } from './fixtures';

const REFERENCE_K = 463.15;

/** `count` isotherms 190–270 °C (80 K) of the invented melt. */
const melt = (count: number, xMin: number, xMax: number, pointsPerDecade: number, seed: number) =>
  inventedMelt({
    temperaturesK: Array.from({ length: count }, (_, k) => REFERENCE_K + (80 * k) / (count - 1)),
    pointsPerDecade,
    seed,
    xMin,
    xMax,
  });

describe('shiftIsotherms() at scale', () => {
  // Generous timeouts: these are the largest inputs of the suite, and CI machines are shared.
  const BIG = { timeout: 240_000 };

  it(
    'shiftIsotherms() takes 10⁶ points (250 isotherms × 4000) and the master curve holds them all',
    BIG,
    () => {
      const d = melt(250, 0.1, 100, 3999 / 3, 5);
      expect(d.dataset.isotherms.reduce((n, i) => n + i.x.length, 0)).toBe(1_000_000);
      const r = shiftIsotherms(d.dataset, { referenceK: REFERENCE_K });
      expect(r.fit.converged).toBe(true);
      expectShiftsWithin(r, d.truth.log10aT, 0.005, 'max');
      // The covariance stops at 1000 isotherms; below that it is there and matches the s.e.
      expect(r.covariance?.ids).toHaveLength(250);
      const k = 100;
      expectAbsClose(
        Math.sqrt(r.covariance!.log10aT[k][k]),
        r.curves[k].log10aTStdErr!,
        1e-12,
        'diagonal = s.e.²',
      );
      const reduced = reduceToMasterCurve(d.dataset, analysisCurvesOf(r));
      expect(reduced.reducedX).toHaveLength(1_000_000);
      expect(reduced.reducedX.every((x, i) => i === 0 || x >= reduced.reducedX[i - 1])).toBe(true);
    },
  );

  it(
    'shiftIsotherms() shifts 10,000 isotherms of three points each, every one with a standard error',
    BIG,
    () => {
      // Three frequencies a decade apart (1, 3.16, 10 rad/s), 0.008 K between isotherms: only
      // neighbours a few positions apart are compared, so the work grows as their number.
      const d = melt(10_000, 1, 10, 2, 7);
      const r = shiftIsotherms(d.dataset, { referenceK: REFERENCE_K, checks: false });
      expect(r.fit.converged).toBe(true);
      const included = r.curves.filter((c) => c.included).length;
      expect(included).toBeGreaterThan(9_990);
      const shifts = r.curves.map((c, k) => (c.included ? c.log10aT : d.truth.log10aT[k]));
      // The shifts span 1.0 decade; linear interpolation over half-decade gaps costs accuracy.
      expectAbsClose(maxError(shifts, d.truth.log10aT), 0, 0.05, 'max');
      // One set's errors share the reference isotherm's noise, so their spread against the s.e. is
      // one draw, not a calibration (that is tested over 20 sets per density in dense.test.ts).
      const se = r.curves.filter((c) => c.included && !c.locked).map((c) => c.log10aTStdErr);
      expect(se.filter((v) => v === 0)).toHaveLength(1); // the isotherm at Tref
      expect(se.every((v) => v !== null && v >= 0 && v < 0.05)).toBe(true);
      // Too many isotherms for the full covariance: only the standard errors.
      expect(r.covariance).toBeNull();
    },
  );

  it(
    'shiftIsotherms() refuses 10,000 isotherms that overlap nothing, saying so for each',
    BIG,
    () => {
      // Flat curves at levels 2.3 % apart, each spanning 0.2 %: no two share any values.
      const isotherms = Array.from({ length: 10_000 }, (_, k) => {
        const level = 10 ** (2 + 0.01 * k);
        const values = [level, 1.001 * level, 1.002 * level];
        return {
          id: `T${k + 1}`,
          temperatureK: REFERENCE_K + 0.01 * k,
          temperatureSpreadK: 0,
          x: [1, 10, 100],
          quantities: { storageModulus: values, lossModulus: values.map((v) => v / 2) },
          mask: [true, true, true],
          source: [0, 1, 2].map((i) => ({ file: 'flat.csv', row: 2 + 3 * k + i })),
        };
      });
      const dataset: Dataset = {
        name: 'invented flat levels',
        testKind: 'oscillatory',
        deformation: 'shear',
        abscissa: 'angularFrequency',
        isotherms,
        files: ['flat.csv'],
        metadata: {},
      };
      const r = shiftIsotherms(dataset, { referenceK: REFERENCE_K });
      expect(r.curves.filter((c) => c.included)).toHaveLength(0);
      expect(r.warnings.filter((w) => w.code === 'no-overlap')).toHaveLength(10_000);
      expect(r.warnings[0].message).toMatch(/overlaps no other isotherm/);
    },
  );
});
