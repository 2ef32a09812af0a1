import { describe, it, expect } from 'vitest';
import { fixtureAnalysis, FIXTURE_TRUTH } from '../analysis-fixture';
import { expectAbsClose } from '../../../helpers/assert-close';
import { parseCsv as parse } from './parse-csv';
import { modelsCsv } from '../../../../core/report/csv/models-csv';

const a = fixtureAnalysis();

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
