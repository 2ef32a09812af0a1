import { describe, it, expect } from 'vitest';
import { reducedAbscissa, reductionFactor } from '../../../core/data/reduction';
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
