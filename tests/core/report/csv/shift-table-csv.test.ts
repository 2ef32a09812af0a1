import { describe, it, expect } from 'vitest';
import { fixtureAnalysis } from '../analysis-fixture';
import { expectAbsClose } from '../../../helpers/assert-close';
import { parseCsv as parse } from './parse-csv';
import { shiftTableCsv, SHIFT_TABLE_COLUMNS } from '../../../../core/report/csv/shift-table-csv';

const a = fixtureAnalysis();

describe('shiftTableCsv()', () => {
  const { comments, rows } = parse(shiftTableCsv(a));
  it('shiftTableCsv() has one row per isotherm with the documented columns', () => {
    expect(rows).toHaveLength(a.curves.length);
    expect(Object.keys(rows[0])).toEqual([...SHIFT_TABLE_COLUMNS]);
  });
  it('shiftTableCsv() states the sign and bT conventions in its header comment', () => {
    expect(comments.join(' ')).toContain('log10 aT < 0 above Tref');
    expect(comments.join(' ')).toContain('reduced modulus = bT × measured modulus');
  });
  it('shiftTableCsv() round-trips log10 aT and marks excluded isotherms', () => {
    rows.forEach((r, i) =>
      expectAbsClose(Number(r.log10_aT), a.curves[i].log10aT!, 1e-9, 'written with 10 digits'),
    );
    expect(rows[6].included).toBe('no');
    expect(rows[0].included).toBe('yes');
    expectAbsClose(Number(rows[3].temperature_C), 100, 1e-9, '373.15 K is exactly 100 °C');
  });
});
