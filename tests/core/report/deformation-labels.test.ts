import { describe, expect, it } from 'vitest';
import { pronyCsv } from '../../../core/report/csv/prony-csv';
import { masterCurveCsv } from '../../../core/report/csv/master-curve-csv';
import { reportHtml } from '../../../core/report/report-html';
import { outputFiles } from '../../../core/report/output-files';
import { pronyTable } from '../../../core/report/tables';
import { analysisSummary } from '../../../core/pipeline/summary';
import { fixtureAnalysis } from './analysis-fixture';

// Tensile data must come out with E-symbols and shear data with G-symbols in every output, with
// the deformation printed next to the Prony terms: E ≈ 3G for a rubber (docs/conventions.md §1), so tensile
// terms typed into a simulation as shear terms are off by about three.
const MODES = [
  { mode: 'shear', own: ['G(t)', 'Ge', 'G0', 'g_i'], other: ['E(t)', 'Ee', 'E0', 'E_i'] },
  { mode: 'tension', own: ['E(t)', 'Ee', 'E0', 'E_i'], other: ['G(t)', 'Ge', 'G0', 'g_i'] },
] as const;

/** Whole-word occurrences of a symbol (so "G0" is not found inside "G0x" or "EG0"). */
const has = (text: string, sym: string): boolean =>
  new RegExp(`(^|[^A-Za-z0-9_])${sym.replace(/[()]/g, '\\$&')}($|[^A-Za-z0-9])`).test(text);

describe.each(MODES)('outputs of $mode data', ({ mode, own, other }) => {
  const a = fixtureAnalysis('oscillatory', mode);

  it(`pronyCsv() of ${mode} data states the deformation and uses ${own.join(', ')}`, () => {
    const csv = pronyCsv(a)!;
    expect(csv).toMatch(
      new RegExp(`^# deformation: ${mode} \\(${mode === 'shear' ? 'G' : 'E'}\\)`, 'm'),
    );
    const header = csv.split('\n').find((l) => !l.startsWith('#'))!;
    expect(header).toBe(`i,tau_s,${own[3]}_Pa,${own[3]}_over_${own[2]}`);
    for (const s of own) expect(has(csv, s), s).toBe(true);
    for (const s of other) expect(has(csv, s), s).toBe(false);
  });

  it(`pronyTable() and the report of ${mode} data name the deformation and its symbols`, () => {
    const t = pronyTable(a, 'Pa')!;
    expect(t.caption).toMatch(new RegExp(`Prony series, ${mode}`));
    expect(t.head).toEqual(['i', 'τ_i (s)', `${own[3]} (Pa)`, `${own[3]} / ${own[2]}`]);
    const html = reportHtml(a, { date: '2026-12-01' });
    const prony = html.slice(html.indexOf('id="table-prony"'));
    const section = prony.slice(0, prony.indexOf('</table>') + 400);
    for (const s of own) expect(has(section, s), s).toBe(true);
    for (const s of other) expect(has(section, s), s).toBe(false);
    // chart axes: E′, E″ in tension, G′, G″ in shear (the report escapes ' as &#39;)
    const m = mode === 'shear' ? 'G' : 'E';
    expect(html).toContain(`${m}&#39;, ${m}&#39;&#39;`);
    expect(html).toContain(`|${m}*|`);
  });

  it(`analysisSummary() of ${mode} data carries the deformation and symbols of the Prony terms`, () => {
    const s = analysisSummary(a);
    expect(s.prony!.deformation).toBe(mode);
    expect(s.prony!.symbols).toEqual({
      relaxation: own[0],
      equilibrium: own[1],
      instantaneous: own[2],
      term: own[3],
    });
  });

  it(`masterCurveCsv() of ${mode} data maps its columns to ${mode} symbols`, () => {
    const m = mode === 'shear' ? 'G' : 'E';
    expect(masterCurveCsv(a)).toContain(
      `# symbols (${mode}): storage_modulus = ${m}', loss_modulus = ${m}''`,
    );
  });

  it(`outputFiles() of ${mode} data never shows the other mode's Prony symbols`, () => {
    const files = outputFiles(a, { date: '2026-12-01' });
    const prony = files.find((f) => f.name === 'prony-terms.csv')!.content;
    for (const s of other) expect(has(prony, s), s).toBe(false);
    const summary = JSON.parse(files.find((f) => f.name === 'summary.json')!.content);
    expect(summary.prony.symbols.term).toBe(own[3]);
  });
});
