import { describe, it, expect } from 'vitest';
import { recogniseName } from '../../../core/io/header-name';

describe('recogniseName()', () => {
  const table: [string, string, string?][] = [
    ["G'", 'storageModulus', 'shear'],
    ['G′', 'storageModulus', 'shear'],
    ['Gp', 'storageModulus', 'shear'],
    ["E'", 'storageModulus', 'tension'],
    ['Storage modulus', 'storageModulus'],
    ["Storage modulus E'", 'storageModulus', 'tension'],
    ["G' storage modulus", 'storageModulus', 'shear'],
    ['Shear storage modulus', 'storageModulus', 'shear'],
    ["G''", 'lossModulus', 'shear'],
    ['G"', 'lossModulus', 'shear'],
    ['E″', 'lossModulus', 'tension'],
    ['tensile loss modulus', 'lossModulus', 'tension'],
    ['tan δ', 'tanDelta'],
    ['tan(delta)', 'tanDelta'],
    ['tan_delta', 'tanDelta'],
    ['Loss factor', 'tanDelta'],
    ['Phase angle', 'phaseAngle'],
    ['delta', 'phaseAngle'],
    ['δ', 'phaseAngle'],
    ['|G*|', 'complexModulus', 'shear'],
    ['| E* |', 'complexModulus', 'tension'],
    ['Complex modulus', 'complexModulus'],
    ['|η*|', 'complexViscosity'],
    ['eta*', 'complexViscosity'],
    ['Complex viscosity', 'complexViscosity'],
    ['Angular frequency', 'angularFrequency'],
    ['omega', 'angularFrequency'],
    ['ω', 'angularFrequency'],
    ['Frequency', 'frequency'],
    ['f', 'frequency'],
    ['freq', 'frequency'],
    ['Time', 'time'],
    ['t', 'time'],
    ['T', 'temperature'],
    ['Temp', 'temperature'],
    ['Temperature', 'temperature'],
    ['Sample temperature', 'temperature'],
    ['G(t)', 'relaxationModulus', 'shear'],
    ['E(t)', 'relaxationModulus', 'tension'],
    ['Relaxation modulus', 'relaxationModulus'],
    ['J(t)', 'creepCompliance', 'shear'],
    ['D(t)', 'creepCompliance', 'tension'],
    ['Creep compliance', 'creepCompliance'],
    ['Temperature T', 'temperature'],
    ['Time t', 'time'],
    ['Complex viscosity |η*|', 'complexViscosity'],
    ['Complex modulus |G*|', 'complexModulus', 'shear'],
    ['Osc. frequency', 'frequency'],
    ['Temperatur', 'temperature'],
    ['Zeit', 'time'],
    ['Kreisfrequenz', 'angularFrequency'],
    ["Speichermodul E'", 'storageModulus', 'tension'],
    ['Verlustmodul', 'lossModulus'],
    ['Verlustfaktor tan δ', 'tanDelta'],
    ['Phasenwinkel', 'phaseAngle'],
    ['Module de perte', 'lossModulus'],
    ['Fréquence', 'frequency'],
  ];
  for (const [name, role, mode] of table) {
    it(`recogniseName() reads "${name}" as ${role}${mode ? ` (${mode})` : ''}`, () => {
      const r = recogniseName(name);
      expect(r?.role).toBe(role);
      expect(r?.deformation).toBe(mode);
    });
  }

  it('recogniseName() leaves unknown names alone', () => {
    for (const name of ['Strain', 'Torque', 'Point No.', '', 'x'.repeat(200)]) {
      expect(recogniseName(name), name).toBeUndefined();
    }
  });

  it('recogniseName() refuses a name whose parts disagree', () => {
    expect(recogniseName("Storage modulus G''")).toBeUndefined();
  });
});
