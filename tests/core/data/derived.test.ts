import { describe, expect, it } from 'vitest';
import {
  complexModulusOf,
  phaseAngleOf,
  phaseRadians,
  quantityValues,
  storageAndLossOf,
  tanDeltaOf,
} from '../../../core/data/derived';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';

// |G*| = √(G′² + G″²), tan δ = G″/G′ (Ferry, Viscoelastic Properties of Polymers, 3rd ed., 1980);
// the 3-4-5 triangle: δ = atan(4/3) = 53.130102354° (from memory, checked by atan2 below).
describe('complexModulusOf(), phaseAngleOf(), tanDeltaOf(), storageAndLossOf()', () => {
  it('complexModulusOf() and phaseAngleOf() give |G*| and δ of the 3-4-5 triangle', () => {
    expect(complexModulusOf(3e6, 4e6)).toBe(5e6);
    expectAbsClose(phaseAngleOf(3e6, 4e6), 53.130102354, 1e-9, 'δ (degrees)');
    expect(tanDeltaOf(3e6, 4e6)).toBe(4 / 3);
    const [gp, gpp] = storageAndLossOf(5e6, phaseRadians(undefined, 4 / 3));
    expectRelClose(gp, 3e6, 1e-14, "G'");
    expectRelClose(gpp, 4e6, 1e-14, "G''");
  });

  it('phaseRadians() takes δ where it is finite, else atan tan δ, else NaN', () => {
    expect(phaseRadians(90, 1)).toBe(Math.PI / 2);
    expect(phaseRadians(NaN, 1)).toBe(Math.PI / 4);
    expect(phaseRadians(undefined, undefined)).toBeNaN();
  });
});

describe('quantityValues()', () => {
  it('quantityValues() prefers the measured quantity over the one derived from G′ and G″', () => {
    const q = { storageModulus: [3, 6], lossModulus: [4, 8], complexModulus: [5.01, 10.02] };
    expect(quantityValues('complexModulus', q)).toBe(q.complexModulus);
    expect(quantityValues('complexModulus', { ...q, complexModulus: undefined })).toEqual([5, 10]);
    expect(quantityValues('tanDelta', q)).toEqual([4 / 3, 4 / 3]);
  });

  it('quantityValues() derives tan δ ↔ δ without G′ and G″, and |η*| = |G*|/ω only with ω', () => {
    expect(quantityValues('tanDelta', { phaseAngle: [45] })![0]).toBeCloseTo(1, 15);
    expect(quantityValues('phaseAngle', { tanDelta: [1] })![0]).toBeCloseTo(45, 13);
    const q = { storageModulus: [3], lossModulus: [4] };
    expect(quantityValues('complexViscosity', q)).toBeUndefined();
    expect(quantityValues('complexViscosity', q, [2])).toEqual([2.5]);
    expect(quantityValues('storageModulus', { lossModulus: [1] })).toBeUndefined();
  });
});
