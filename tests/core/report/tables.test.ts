import { describe, it, expect } from 'vitest';
import {
  indicatorTable,
  modelTable,
  pronyTable,
  settingsTable,
  shiftTable,
} from '../../../core/report/tables';
import { fixtureAnalysis } from './analysis-fixture';

const a = fixtureAnalysis();

describe('shiftTable()', () => {
  it('shiftTable() has a row per isotherm, marks excluded ones and states the conventions', () => {
    const t = shiftTable(a);
    expect(t.rows).toHaveLength(7);
    expect(t.rows[3][2]).toBe('0.000'); // the reference isotherm
    expect(t.rowClass?.[6]).toBe('excluded');
    expect(t.note).toContain('log10 aT < 0 above Tref');
    expect(t.note).toContain('reduced modulus = bT × measured modulus');
  });
});

describe('modelTable()', () => {
  it('modelTable() lists C1 and C2 with errors and intervals, or is null without models', () => {
    const t = modelTable(a)!;
    expect(t.rows.map((r) => r[1])).toEqual(['C1', 'C2', 'apparent Ea at Tr']);
    expect(t.rows[0][2]).toBe('8.86');
    expect(t.rows[1][4]).toBe('92 … 111');
    expect(t.note).toContain('do not hold below Tg');
    expect(modelTable({ ...a, models: {} })).toBeNull();
  });
});

describe('pronyTable()', () => {
  it('pronyTable() converts moduli to the chosen unit and adds the equilibrium row', () => {
    const t = pronyTable(a, 'MPa')!;
    expect(t.rows).toHaveLength(a.prony!.tauS.length + 1);
    expect(t.rows[t.rows.length - 1][2]).toBe('1'); // Ge = 1e6 Pa = 1 MPa
    expect(t.head[2]).toBe('g_i (MPa)');
    expect(pronyTable({ ...a, prony: null }, 'Pa')).toBeNull();
  });
});

describe('indicatorTable() and settingsTable()', () => {
  it('indicatorTable() lists each indicator; settingsTable() lists every resolved setting', () => {
    expect(indicatorTable(a)!.rows[0]).toEqual(['glassy modulus', '1×10⁹', 'Pa', '']);
    expect(indicatorTable({ ...a, indicators: [] })).toBeNull();
    const s = settingsTable(a);
    expect(s.rows.map((r) => r[0])).toEqual([...Object.keys(a.settings), 'shift quantities used']);
    expect(s.rows.find((r) => r[0] === 'excludedIsothermIds')![1]).toBe('T07');
  });
});
