/**
 * The self-contained HTML datasheet report of one analysis: a pure function from an Analysis to
 * a string. No script, no external resource: charts are inline SVG, styles inline, so the file
 * opens offline and prints to A4 or Letter PDF from any browser.
 */
import type { Analysis } from '../pipeline/types';
import { toCelsius } from '../pipeline/temperature';
import { isInventedDemo } from '../synthetic/demo-header';
import { sampleFacts } from './sample-facts';
import { CONVENTIONS } from '../pipeline/conventions';
import { escapeHtml } from './escape';
import { REPORT_CSS } from './styles';
import { CAUTIONS, methodParagraphs } from './text-blocks';
import {
  isothermsChart,
  masterCurveChart,
  shiftFactorChart,
  vanGurpPalmenChart,
  verticalShiftChart,
} from './charts';
import { renderChart } from './svg/render-chart';
import type { ChartSpec } from './svg/chart-types';
import { htmlTable, type TableSpec } from './html-table';
import { indicatorTable, modelTable, pronyTable, settingsTable, shiftTable } from './tables';
import type { FrequencyUnit, ModulusUnit } from '../units/output-units';

export interface ReportOptions {
  /** Date printed in the title block (passed in: core reads no clock), e.g. "2026-12-01". */
  date: string;
  /** Unit for moduli in charts and tables. @default 'Pa' */
  modulusUnit?: ModulusUnit;
  /** Unit of frequencies in charts and tables: ω in rad/s, or f = ω/2π in Hz. @default 'rad/s' */
  frequencyUnit?: FrequencyUnit;
  /** Title override. @default "Master curve datasheet — <sample name>" */
  title?: string;
}

const esc = escapeHtml;

function chartBlock(spec: ChartSpec | null, caption: string): string {
  if (!spec) return '';
  return `<figure class="chart-block">${renderChart(spec)}<figcaption>${esc(caption)}</figcaption></figure>`;
}

const table = (t: TableSpec | null): string => (t ? htmlTable(t) : '');

function titleBlock(a: Analysis, o: ReportOptions, title: string): string {
  const invented = isInventedDemo(a.sample.metadata);
  const rows = sampleFacts(a);
  return (
    `<header class="title-block"><div><h1>${esc(title)}</h1><dl>` +
    rows.map(([k, v]) => `<dt>${esc(k)}</dt><dd>${esc(v)}</dd>`).join('') +
    `</dl>${invented ? '<div class="invented">INVENTED DEMO DATA — describes no real product</div>' : ''}</div>` +
    `<div class="stamp">Thermoshift ${esc(a.version)}<br>${esc(o.date)}</div></header>`
  );
}

function cautionsBlock(): string {
  return (
    `<section class="cautions" id="cautions"><h2>Cautions</h2><ul>` +
    CAUTIONS.map((c) => `<li>${esc(c)}</li>`).join('') +
    `</ul></section>`
  );
}

function warningsBlock(a: Analysis): string {
  if (a.warnings.length === 0)
    return '<section id="warnings"><h2>Warnings</h2><p>No warnings were raised. This does not prove that superposition holds; see the cautions.</p></section>';
  const items = a.warnings.map((w) => {
    const where = [w.file, w.row ? `row ${w.row}` : '', w.column ? `column ${w.column}` : '']
      .filter(Boolean)
      .join(', ');
    return `<li><code>${esc(w.code)}</code> ${esc(w.message)}${where ? ` <span class="where">(${esc(where)})</span>` : ''}</li>`;
  });
  return `<section id="warnings" class="warnings"><h2>Warnings (${a.warnings.length})</h2><ul>${items.join('')}</ul></section>`;
}

export function reportHtml(a: Analysis, options: ReportOptions): string {
  const unit = options.modulusUnit ?? 'Pa';
  const freq = options.frequencyUnit ?? 'rad/s';
  const title = options.title ?? `Master curve datasheet — ${a.sample.name}`;
  const tref = toCelsius(a.referenceTemperatureK);
  const body = [
    titleBlock(a, options, title),
    cautionsBlock(),
    warningsBlock(a),
    '<section id="charts"><h2>Data and master curve</h2>',
    chartBlock(
      isothermsChart(a, unit, freq),
      'Measured isotherms, coloured by temperature (unshifted; masked points not shown).',
    ),
    chartBlock(
      masterCurveChart(a, unit, freq),
      `Master curve at Tref = ${tref} °C: every included point at its reduced abscissa, coloured by the temperature it was measured at${a.prony ? '; the line is the fitted Prony series' : ''}. ${CONVENTIONS.horizontal}.`,
    ),
    chartBlock(
      shiftFactorChart(a),
      `Shift factors log10 aT ± standard error against temperature, with each fitted model and its 95 % confidence band; open circles are isotherms left out. ${CONVENTIONS.horizontal}.`,
    ),
    chartBlock(
      verticalShiftChart(a),
      `Vertical shift factors log10 bT ± standard error (${CONVENTIONS.vertical}). Large or erratic bT is itself a sign that superposition fails.`,
    ),
    chartBlock(
      vanGurpPalmenChart(a, unit),
      'van Gurp–Palmen plot: phase angle δ against the complex modulus. It needs no horizontal shift; isotherms that do not fall on one line indicate that superposition fails.',
    ),
    '</section>',
    '<section id="tables" class="page-break"><h2>Tables</h2>',
    table(shiftTable(a)),
    table(modelTable(a)),
    table(pronyTable(a, unit)),
    table(indicatorTable(a, freq)),
    '</section>',
    '<section id="method"><h2>Method and settings</h2>',
    ...methodParagraphs(a).map((p) => `<p>${esc(p)}</p>`),
    `<p>Conventions: ${esc(CONVENTIONS.horizontal)}. ${esc(CONVENTIONS.vertical)}.</p>`,
    table(settingsTable(a)),
    '</section>',
    `<footer>Generated by Thermoshift ${esc(a.version)} on ${esc(options.date)}. Moduli in ${esc(unit)}. ` +
      `This report supports, and does not replace, the judgement of a qualified engineer; see the cautions on the first page.</footer>`,
  ];
  return (
    `<!DOCTYPE html><html lang="en"><head><meta charset="utf-8">` +
    `<meta name="viewport" content="width=device-width, initial-scale=1">` +
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">` +
    `<title>${esc(title)}</title><style>${REPORT_CSS}</style></head><body>${body.join('\n')}</body></html>\n`
  );
}
