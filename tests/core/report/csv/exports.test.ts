import { describe, it, expect } from 'vitest';
import Papa from 'papaparse';
import {
  batchIndexCsv,
  masterCurveCsv,
  modelsCsv,
  pronyCsv,
  shiftTableCsv,
  SHIFT_TABLE_COLUMNS,
} from '../../../../core/report/csv';
import { fixtureAnalysis, FIXTURE_TRUTH } from '../analysis-fixture';
import { expectAbsClose, expectRelClose } from '../../../helpers/assert-close';

/** Parses our CSV the way a spreadsheet user would: comment lines skipped, header row. */
function parse(text: string): { comments: string[]; rows: Record<string, string>[] } {
  const comments = text.split('\n').filter((l) => l.startsWith('#'));
  const body = text
    .split('\n')
    .filter((l) => !l.startsWith('#'))
    .join('\n');
  const r = Papa.parse<Record<string, string>>(body, { header: true, skipEmptyLines: true });
  expect(r.errors).toEqual([]);
  return { comments, rows: r.data };
}

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

describe('masterCurveCsv()', () => {
  it('masterCurveCsv() writes reduced points in the chosen unit with their source temperature', () => {
    const { rows } = parse(masterCurveCsv(a, 'MPa'));
    expect(rows).toHaveLength(a.masterCurve.reducedX.length);
    const i = 10;
    expectRelClose(
      Number(rows[i].reduced_frequency_rad_per_s),
      a.masterCurve.reducedX[i],
      1e-9,
      '10 digits',
    );
    expectRelClose(
      Number(rows[i].storage_modulus_MPa),
      a.masterCurve.quantities.storageModulus![i]! / 1e6,
      1e-9,
      '10 digits',
    );
    expect(rows[i].isotherm).toBe(a.masterCurve.isothermId[i]);
    expect(Number(rows[i].source_temperature_C)).toBeGreaterThan(60);
  });
  it('masterCurveCsv() names the reduced time column for relaxation data', () => {
    const text = masterCurveCsv(fixtureAnalysis('relaxation'));
    expect(text).toContain('reduced_time_s,relaxation_modulus_Pa');
  });
});

describe('modelsCsv()', () => {
  it('modelsCsv() lists C1 and C2 with standard errors and intervals', () => {
    const { rows } = parse(modelsCsv(a));
    const c1 = rows.find((r) => r.constant === 'C1')!;
    const c2 = rows.find((r) => r.constant === 'C2')!;
    expectAbsClose(Number(c1.value), FIXTURE_TRUTH.c1, 1e-9, 'written with 10 digits');
    expect(c2.unit).toBe('K');
    expect(Number(c1.std_error)).toBeGreaterThan(0);
    expect(Number(c2.ci95_low)).toBeLessThan(Number(c2.value));
  });
});

describe('pronyCsv()', () => {
  it('pronyCsv() writes τ_i, g_i and g_i/G0 that sum with Ge/G0 to one', () => {
    const text = pronyCsv(a, 'MPa')!;
    const { comments, rows } = parse(text);
    expect(rows).toHaveLength(a.prony!.tauS.length);
    const sumNorm = rows.reduce((s, r) => s + Number(r.g_i_over_G0), 0);
    const geOverG0 = a.prony!.equilibriumModulusPa / a.prony!.instantaneousModulusPa;
    expectAbsClose(
      sumNorm + geOverG0,
      1,
      1e-8,
      'normalised Prony weights sum to 1 (rounding of 10 digits)',
    );
    expectRelClose(Number(rows[0].g_i_MPa), a.prony!.modulusPa[0] / 1e6, 1e-9, '10 digits');
    expect(comments.join(' ')).toContain('shift model wlf: C1 = 8.86');
  });
  it('pronyCsv() returns null without a Prony series', () => {
    expect(pronyCsv({ ...a, prony: null })).toBeNull();
  });
});

describe('batchIndexCsv()', () => {
  it('batchIndexCsv() writes one row per sample, failures with their error', () => {
    const { rows } = parse(
      batchIndexCsv(
        [
          { sample: 'good', folder: 'good', result: { ok: true, analysis: a } },
          {
            sample: 'bad',
            folder: 'bad',
            result: { ok: false, error: 'File "x.csv", row 3: no number, here' },
          },
        ],
        '0.1.0',
      ),
    );
    expect(rows.map((r) => r.status)).toEqual(['ok', 'failed']);
    expectAbsClose(Number(rows[0].wlf_C1), FIXTURE_TRUTH.c1, 1e-9, '10 digits');
    expect(rows[0].warnings).toBe('import;fair-superposition');
    expect(rows[1].error).toBe('File "x.csv", row 3: no number, here');
  });
});
