import { describe, it, expect } from 'vitest';
import { fixtureAnalysis } from '../analysis-fixture';
import { expectRelClose } from '../../../helpers/assert-close';
import { parseCsv as parse } from './parse-csv';
import { masterCurveCsv } from '../../../../core/report/csv/master-curve-csv';

const a = fixtureAnalysis();

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
