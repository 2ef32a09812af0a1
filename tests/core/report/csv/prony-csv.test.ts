import { describe, it, expect } from 'vitest';
import { fixtureAnalysis } from '../analysis-fixture';
import { expectAbsClose, expectRelClose } from '../../../helpers/assert-close';
import { parseCsv as parse } from './parse-csv';
import { pronyCsv } from '../../../../core/report/csv/prony-csv';

const a = fixtureAnalysis();

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
