import { describe, it, expect } from 'vitest';
import { deriveQuantities } from '../../../core/io/derive';
import type { Isotherm } from '../../../core/data/types';
import { expectRelClose } from '../../helpers/assert-close';

function iso(quantities: Isotherm['quantities']): Isotherm {
  const n = Object.values(quantities)[0]!.length;
  return {
    id: 'T01',
    temperatureK: 300,
    temperatureSpreadK: 0,
    x: Array.from({ length: n }, (_, i) => i + 1),
    quantities,
    mask: new Array(n).fill(true),
    source: [],
  };
}

describe('deriveQuantities()', () => {
  // G' = |G*| cos δ, G'' = |G*| sin δ, tan δ = G''/G' (docs/conventions.md §1; definitions of the complex modulus).
  it("deriveQuantities() gives G' = |G*| cos δ and G'' = |G*| sin δ from |G*| and δ", () => {
    const i = iso({ complexModulus: [2e6, 1e5], phaseAngle: [60, 30] });
    expect(deriveQuantities(i).sort()).toEqual(['lossModulus', 'storageModulus', 'tanDelta']);
    expectRelClose(i.quantities.storageModulus![0], 1e6, 1e-12, 'cos 60° = 1/2');
    expectRelClose(i.quantities.lossModulus![1], 5e4, 1e-12, 'sin 30° = 1/2');
    expectRelClose(i.quantities.tanDelta![0], Math.sqrt(3), 1e-12, 'tan 60° = √3');
  });

  it('deriveQuantities() uses tan δ when δ is missing', () => {
    const i = iso({ complexModulus: [Math.SQRT2], tanDelta: [1] });
    deriveQuantities(i);
    expectRelClose(i.quantities.storageModulus![0], 1, 1e-12, '45°');
    expectRelClose(i.quantities.lossModulus![0], 1, 1e-12, '45°');
  });

  it('deriveQuantities() never overwrites measured values', () => {
    const i = iso({
      storageModulus: [7],
      lossModulus: [3],
      tanDelta: [0.5],
      complexModulus: [10],
      phaseAngle: [10],
    });
    expect(deriveQuantities(i)).toEqual([]);
    expect(i.quantities.storageModulus).toEqual([7]);
    expect(i.quantities.tanDelta).toEqual([0.5]);
  });

  it('deriveQuantities() fills only the missing points', () => {
    const i = iso({
      storageModulus: [1, NaN],
      lossModulus: [2, NaN],
      complexModulus: [NaN, 2],
      phaseAngle: [NaN, 90],
    });
    deriveQuantities(i);
    expect(i.quantities.storageModulus![0]).toBe(1);
    expectRelClose(i.quantities.lossModulus![1], 2, 1e-12, 'sin 90° = 1');
  });
});
