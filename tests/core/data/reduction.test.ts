import { describe, it, expect } from 'vitest';
import {
  abscissaShiftSign,
  measuredFromReduced,
  reducedAbscissa,
  reductionExponents,
  reductionFactor,
} from '../../../core/data/reduction';
import { QUANTITY_IDS } from '../../../core/data/types';
import { expectRelClose } from '../../helpers/assert-close';

// Conventions of docs/conventions.md §2 (Ferry, Viscoelastic Properties of Polymers, 3rd ed., 1980).
describe('reducedAbscissa()', () => {
  it('reducedAbscissa() multiplies frequency by aT and divides time by aT', () => {
    expect(reducedAbscissa('angularFrequency', 10, 0.1)).toBe(1);
    expect(reducedAbscissa('time', 10, 0.1)).toBe(100);
  });
});

describe('reductionFactor()', () => {
  it('reductionFactor() is bT for moduli, 1/bT for compliance, bT/aT for |η*| and 1 for tan δ, δ', () => {
    expect(reductionFactor('storageModulus', 0.1, 1.05)).toBe(1.05);
    expect(reductionFactor('relaxationModulus', 0.1, 1.05)).toBe(1.05);
    expectRelClose(reductionFactor('creepCompliance', 0.1, 1.05), 1 / 1.05, 1e-15);
    expectRelClose(reductionFactor('complexViscosity', 0.1, 1.05), 10.5, 1e-15);
    expect(reductionFactor('tanDelta', 0.1, 1.05)).toBe(1);
    expect(reductionFactor('phaseAngle', 0.1, 1.05)).toBe(1);
  });
});

describe('reductionExponents()', () => {
  it('reductionExponents() is the log form of reductionFactor() for every quantity', () => {
    const [log10aT, log10bT] = [-2.5, 0.03];
    for (const q of QUANTITY_IDS) {
      const e = reductionExponents(q);
      const f = reductionFactor(q, 10 ** log10aT, 10 ** log10bT);
      expect(Math.abs(Math.log10(f) - (e.aT * log10aT + e.bT * log10bT)), q).toBeLessThan(1e-12);
    }
    expect(reductionExponents('complexViscosity')).toEqual({ aT: -1, bT: 1 });
    expect(reductionExponents('creepCompliance')).toEqual({ aT: 0, bT: -1 });
  });

  it('abscissaShiftSign() is the log form of reducedAbscissa()', () => {
    for (const kind of ['angularFrequency', 'time'] as const) {
      const xr = reducedAbscissa(kind, 10, 1e-3);
      expect(Math.log10(xr) - (1 + abscissaShiftSign(kind) * -3)).toBeCloseTo(0, 12);
    }
  });
});

describe('measuredFromReduced()', () => {
  it('measuredFromReduced() undoes reductionFactor() for every quantity', () => {
    const [aT, bT] = [3e-4, 1.07];
    for (const q of QUANTITY_IDS) {
      const measured = 123.4;
      const back = measuredFromReduced(q, measured * reductionFactor(q, aT, bT), aT, bT);
      expectRelClose(back, measured, 1e-14, q);
    }
    expect(measuredFromReduced('creepCompliance', 2e-9, 0.1, 1.05)).toBe(2e-9 * 1.05);
  });
});
