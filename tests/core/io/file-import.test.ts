import { describe, it, expect } from 'vitest';
import { importFile } from '../../../core/io/file-import';
import { resolveImportOptions } from '../../../core/io/options';

describe('importFile()', () => {
  it('importFile() reports dialect, rows, metadata and the file temperature', () => {
    const text = "# Temperature: 40 °C\n# operator: nobody\nf (Hz);E' (MPa)\n0,1;10\n1;12\n";
    const r = importFile({ name: 'x.csv', text }, resolveImportOptions());
    expect(r.report).toMatchObject({
      file: 'x.csv',
      layout: 'perIsotherm',
      delimiter: 'semicolon',
      decimalSeparator: ',',
      headerRow: 3,
      unitsRow: 0,
      firstDataRow: 4,
      dataRows: 2,
      usedRows: 2,
      temperatureK: 313.15,
      temperatureFrom: 'metadata',
      testKind: 'oscillatory',
    });
    expect(r.report.metadata).toEqual({ Temperature: '40 °C', operator: 'nobody' });
    expect(r.plan.deformation).toBe('tension');
    expect(r.records.n).toBe(2);
  });

  it('importFile() prefers a forced temperature over metadata and file name', () => {
    const text = "# Temperature: 40 °C\nf (Hz),G' (Pa)\n1,2\n2,3\n";
    const o = resolveImportOptions({ fileTemperatureK: { 'x_60C.csv': 350 } });
    expect(importFile({ name: 'x_60C.csv', text }, o).report).toMatchObject({
      temperatureK: 350,
      temperatureFrom: 'option',
    });
  });
});
