import { describe, it, expect } from 'vitest';
import { findStructure, isUnitsRow } from '../../../core/io/structure';
import { detectDialect } from '../../../core/io/dialect';
import { headLines } from '../../../core/io/lines';

function structureOf(text: string) {
  const lines = headLines(text, 100);
  const dialect = detectDialect(
    lines.map((l) => l.text).filter((l) => l.trim() && !l.startsWith('#')),
  );
  return findStructure(lines, dialect!);
}

describe('findStructure()', () => {
  it('findStructure() finds metadata, header, units row and first data row', () => {
    const s = structureOf('# sample: X\nOperator: Y\n\nT,f,G\n°C,Hz,Pa\n40,1,2\n');
    expect(s).toMatchObject({
      header: ['T', 'f', 'G'],
      headerRow: 4,
      units: ['°C', 'Hz', 'Pa'],
      unitsRow: 5,
      firstDataRow: 6,
      metadata: { sample: 'X', Operator: 'Y' },
    });
  });

  it('findStructure() reads "key;value" metadata and no header when there is none', () => {
    const s = structureOf('Sample;PP-7;;\nf;G;;\n1;2;;\n');
    expect(s).toMatchObject({ headerRow: 2, firstDataRow: 3, metadata: { Sample: 'PP-7' } });
    expect(structureOf('1;2\n3;4\n')).toMatchObject({ header: [], headerRow: 0, firstDataRow: 1 });
  });

  it('findStructure() splits a space-aligned header with units in brackets', () => {
    const s = structureOf("T (°C)  f (Hz)  G' (Pa)\n40 1 2\n");
    expect(s?.header).toEqual(['T (°C)', 'f (Hz)', "G' (Pa)"]);
    const t = structureOf("T (°C) f (Hz) G' (Pa)\n40 1 2\n");
    expect(t?.header).toEqual(['T (°C)', 'f (Hz)', "G' (Pa)"]);
  });
});

describe('isUnitsRow()', () => {
  it('isUnitsRow() accepts rows of units and refuses headers', () => {
    expect(isUnitsRow(['[°C]', '(Hz)', 'MPa', '-', ''])).toBe(true);
    expect(isUnitsRow(['T', 'f', "G'"])).toBe(false);
    expect(isUnitsRow(['', ''])).toBe(false);
  });
});
