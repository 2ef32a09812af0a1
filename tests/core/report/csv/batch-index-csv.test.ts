import { describe, it, expect } from 'vitest';
import { fixtureAnalysis, FIXTURE_TRUTH } from '../analysis-fixture';
import { expectAbsClose } from '../../../helpers/assert-close';
import { parseCsv as parse } from './parse-csv';
import { batchIndexCsv } from '../../../../core/report/csv/batch-index-csv';

const a = fixtureAnalysis();

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
