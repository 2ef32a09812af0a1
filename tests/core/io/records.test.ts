import { describe, it, expect } from 'vitest';
import { buildRecords } from '../../../core/io/records';
import { scanTable } from '../../../core/io/scan-table';
import { planHeader } from './helpers/plan-header';

function run(header: string[], body: string, fileT?: number) {
  const { plan, warnings: sink } = planHeader(header);
  const table = scanTable(body, 0, 2, {
    delimiter: 'comma',
    decimalComma: false,
    wanted: header.map(() => true),
    maxProblems: 100,
    perCell: plan.layout === 'wide',
  });
  return { rec: buildRecords(table, plan, fileT, sink), warnings: sink.list };
}

describe('buildRecords()', () => {
  it('buildRecords() converts long rows to stored units', () => {
    const { rec } = run(['T (°C)', 'f (Hz)', "G' (kPa)"], '40,1,2\n60,2,3\n');
    expect(rec.n).toBe(2);
    expect([...rec.temperatureK]).toEqual([313.15, 333.15]);
    expect([...rec.x]).toEqual([2 * Math.PI, 4 * Math.PI]);
    expect([...rec.quantities.get('storageModulus')!]).toEqual([2000, 3000]);
    expect([...rec.row]).toEqual([2, 3]);
  });

  it('buildRecords() gives the file temperature to one-isotherm files', () => {
    const { rec } = run(['t (s)', 'G(t) (Pa)'], '1,5\n2,4\n', 300);
    expect([...rec.temperatureK]).toEqual([300, 300]);
  });

  it('buildRecords() makes one point per temperature column of a wide row, skipping bad cells only', () => {
    const { rec, warnings } = run(['t (s)', 'G(t) 20°C', 'G(t) 40°C'], '1,5,\n2,4,-3\n');
    expect(rec.n).toBe(2);
    expect([...rec.temperatureK.subarray(0, 2)]).toEqual([293.15, 293.15]);
    expect(rec.usedRows).toBe(2);
    expect(warnings.filter((w) => w.row > 1).map((w) => [w.row, w.column])).toEqual([
      [2, 3],
      [3, 3],
    ]);
  });

  it('buildRecords() skips rows with non-positive x or values, naming row and column', () => {
    const { rec, warnings } = run(['T (°C)', 'f (Hz)', "G' (Pa)"], '40,0,1\n40,1,-1\n40,2,1\n');
    expect(rec.n).toBe(1);
    expect(warnings.filter((w) => w.row > 1).map((w) => [w.row, w.column])).toEqual([
      [2, 2],
      [3, 3],
    ]);
  });
});
