import { describe, expect, it } from 'vitest';
import { fixtureAnalysis } from './analysis-fixture';
import { expectRelClose } from '../../helpers/assert-close';
import { parseCsv } from './csv/parse-csv';
import { masterCurveCsv } from '../../../core/report/csv/master-curve-csv';
import { masterCurveChart, isothermsChart } from '../../../core/report/charts';
import { indicatorTable } from '../../../core/report/tables';
import { reportHtml } from '../../../core/report/report-html';
import { OUTPUT_FILE_SPECS } from '../../../core/report/output-files';
import { toOutputFrequency } from '../../../core/units/output-units';

// f = ω/2π: 1 Hz is one cycle per second, 2π rad/s (SI Brochure, BIPM 2019, §2.3.4).
const a = fixtureAnalysis();

describe('toOutputFrequency()', () => {
  it('toOutputFrequency() gives f = ω/2π in Hz and ω itself in rad/s', () => {
    expectRelClose(toOutputFrequency(2 * Math.PI, 'Hz'), 1, 1e-15, '2π rad/s = 1 Hz');
    expect(toOutputFrequency(5, 'rad/s')).toBe(5);
  });
});

describe('frequencies in Hz in the exports', () => {
  it('masterCurveCsv() writes aT·f in Hz when asked, each value ω/2π', () => {
    const text = masterCurveCsv(a, 'MPa', 'Hz');
    expect(text).toMatch(/reduced_frequency_Hz: aT·f, f = ω\/2π/);
    const { rows } = parseCsv(text);
    expect(rows[0]).not.toHaveProperty('reduced_frequency_rad_per_s');
    for (const i of [0, 10, rows.length - 1])
      expectRelClose(
        Number(rows[i].reduced_frequency_Hz),
        a.masterCurve.reducedX[i] / (2 * Math.PI),
        1e-9,
        'written to 10 digits',
      );
  });

  it('masterCurveCsv() keeps reduced time in s for relaxation data whatever the frequency unit', () => {
    const r = fixtureAnalysis('relaxation');
    expect(masterCurveCsv(r, 'Pa', 'Hz')).toBe(masterCurveCsv(r, 'Pa', 'rad/s'));
  });

  it('masterCurveChart() and isothermsChart() draw and label the frequency in Hz', () => {
    const hz = masterCurveChart(a, 'Pa', 'Hz');
    const rad = masterCurveChart(a, 'Pa');
    expect(hz.x.label).toBe('reduced frequency aT·f (Hz)');
    expectRelClose(hz.series[0].x[0], rad.series[0].x[0] / (2 * Math.PI), 1e-12, 'same point');
    expect(isothermsChart(a, 'Pa', 'Hz').x.label).toBe('frequency f (Hz)');
  });

  it('indicatorTable() writes frequencies such as the crossover in Hz', () => {
    const withCrossover = {
      ...a,
      indicators: [
        ...a.indicators,
        { key: 'crossover', label: 'crossover frequency', value: 6 * Math.PI, unit: 'rad/s' },
      ],
    };
    const hz = indicatorTable(withCrossover, 'Hz')!;
    const rad = indicatorTable(withCrossover)!;
    const k = hz.rows.length - 1;
    expect(rad.rows[k].slice(1, 3)).toEqual(['18.85', 'rad/s']);
    expect(hz.rows[k].slice(1, 3)).toEqual(['3', 'Hz']);
    // the other indicators (moduli, viscosities) keep their units
    expect(hz.rows.slice(0, k)).toEqual(rad.rows.slice(0, k));
  });

  it('reportHtml() and the export list pass the frequency unit on', () => {
    expect(reportHtml(a, { date: '2026-01-01', frequencyUnit: 'Hz' })).toContain('aT·f (Hz)');
    expect(reportHtml(a, { date: '2026-01-01' })).not.toContain('aT·f (Hz)');
    const spec = OUTPUT_FILE_SPECS.find((s) => s.name === 'master-curve.csv')!;
    expect(spec.build(a, { date: '2026-01-01', frequencyUnit: 'Hz' })).toMatch(
      /^reduced_frequency_Hz,/m,
    );
  });
});
