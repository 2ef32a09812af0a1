import { describe, it, expect } from 'vitest';
import {
  baseName,
  sampleNameFromFileName,
  temperatureFromFileName,
} from '../../../core/io/file-name';
import { expectAbsClose } from '../../helpers/assert-close';

describe('temperatureFromFileName()', () => {
  const table: [string, number][] = [
    ['elastomer_40C.csv', 313.15],
    ['data/run-313K.txt', 313],
    ['T=-20°C.csv', 253.15],
    ['seal_m20C.csv', 253.15],
    ['seal_-20C.txt', 253.15],
    ['seal-20C.txt', 293.15],
    ['batch2_40p5C.dat', 313.65],
    ['PP_T40C.csv', 313.15],
    ['C:\\lab\\melt_150degC.txt', 423.15],
    ['pad_104F.csv', 313.15],
    ['film_a_20C_then_40C.csv', 313.15],
  ];
  for (const [name, kelvin] of table) {
    it(`temperatureFromFileName() reads "${name}"`, () => {
      expectAbsClose(temperatureFromFileName(name)!.temperatureK, kelvin, 1e-9, name);
    });
  }

  it('temperatureFromFileName() finds nothing in names without a temperature', () => {
    for (const name of ['results.csv', 'run2.txt', 'ABC.csv', 'x'.repeat(500)]) {
      expect(temperatureFromFileName(name), name).toBeUndefined();
    }
  });
});

describe('sampleNameFromFileName()', () => {
  it('sampleNameFromFileName() drops folders, extension and the temperature part', () => {
    expect(baseName('a/b/c.d.csv')).toBe('c.d');
    expect(sampleNameFromFileName('a/elastomer_40C.csv')).toBe('elastomer');
    expect(sampleNameFromFileName('results.csv')).toBe('results');
  });
});
