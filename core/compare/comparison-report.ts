/**
 * The comparison report: one HTML page in the datasheet style (core/report's styles, tables and
 * SVG charts), printable to PDF from any browser. It shows the overlay of the smoothed master
 * curves (one colour per sample), the difference of each sample from the reference with its 95 %
 * band and the specification band, the verdict table with the reason of every criterion, the
 * figures of the comparison, and the cautions.
 */
import { kelvinToCelsius } from '../data/temperature';
import { escapeHtml as esc } from '../report/escape';
import { htmlTable, type TableSpec } from '../report/html-table';
import { REPORT_CSS } from '../report/styles';
import { CAUTIONS } from '../report/text-blocks';
import { renderChart } from '../report/svg/render-chart';
import type { ChartBand, ChartSeries, ChartSpec } from '../report/svg/chart-types';
import { Z95 } from './normal';
import type { Comparison } from './types';
import { toPercent } from './verdicts';

/** Colours of the samples in order: the reference first (dark grey), then a colour-blind-safe set. */
export const SAMPLE_COLOURS: readonly string[] = [
  '#3b3b3b',
  '#0f6fb3',
  '#d1641b',
  '#2a9a6a',
  '#a33e8e',
  '#b59b16',
  '#5b8fd9',
];

export const sampleColour = (k: number): string => SAMPLE_COLOURS[k % SAMPLE_COLOURS.length];

export interface ComparisonReportOptions {
  date: string;
  title?: string;
}

const main = (c: Comparison): 'storageModulus' | 'relaxationModulus' =>
  c.abscissa === 'time' ? 'relaxationModulus' : 'storageModulus';

/** The reduced abscissa shared by the overlay and the difference plots. */
function reducedAxis(c: Comparison): ChartSpec['x'] {
  return {
    kind: 'log',
    label: c.abscissa === 'time' ? 'reduced time t/aT (s)' : 'reduced frequency aT·ω (rad/s)',
  };
}

export function overlayChart(c: Comparison): ChartSpec {
  const q = main(c);
  const curves = [c.reference, ...c.samples];
  const series: ChartSeries[] = curves.map((s, k) => {
    const n = s.nodes[q] ?? [];
    return {
      name: k === 0 ? `${s.name} (reference)` : s.name,
      x: n.map((p) => 10 ** p.log10x),
      y: n.map((p) => 10 ** p.log10y),
      colour: sampleColour(k),
      line: 'solid',
      marker: k === 0 ? 'ring' : 'disc',
    };
  });
  return {
    id: 'compare-overlay',
    title: `${q === 'storageModulus' ? 'Storage modulus' : 'Relaxation modulus'} at ${kelvinToCelsius(c.referenceTemperatureK).toFixed(1)} °C`,
    width: 640,
    height: 380,
    x: reducedAxis(c),
    y: { kind: 'log', label: 'modulus (Pa)' },
    series,
    legend: series.map((s) => ({ name: s.name, colour: s.colour, marker: s.marker, line: s.line })),
  };
}

export function differenceChart(
  c: Comparison,
  specBandPercent: [number, number] | null,
): ChartSpec {
  const q = main(c);
  const series: ChartSeries[] = [];
  const bands: ChartBand[] = [];
  c.comparisons.forEach((s, k) => {
    const d = s.differences.find((x) => x.quantity === q);
    if (!d) return;
    const x = d.log10x.map((u) => 10 ** u);
    const y = d.log10Difference.map((v) => (10 ** v - 1) * 100);
    series.push({ name: s.name, x, y, colour: sampleColour(k + 1), line: 'solid', marker: 'disc' });
    bands.push({
      name: `${s.name} 95 %`,
      x,
      lower: d.log10Difference.map((v, i) => (10 ** (v - Z95 * d.stdErr[i]) - 1) * 100),
      upper: d.log10Difference.map((v, i) => (10 ** (v + Z95 * d.stdErr[i]) - 1) * 100),
      colour: sampleColour(k + 1),
    });
  });
  if (specBandPercent) {
    const xs = series.flatMap((s) => s.x);
    let lo = Infinity;
    let hi = -Infinity;
    for (const v of xs) {
      lo = Math.min(lo, v);
      hi = Math.max(hi, v);
    }
    if (Number.isFinite(lo))
      for (const limit of specBandPercent)
        series.push({
          name: 'specification limit',
          x: [lo, hi],
          y: [limit, limit],
          colour: '#b00020',
          line: 'dashed',
          marker: 'none',
        });
  }
  return {
    id: 'compare-difference',
    title: 'Difference from the reference (sample − reference), with 95 % band',
    width: 640,
    height: 320,
    x: reducedAxis(c),
    y: { kind: 'linear', label: 'difference (%)' },
    series,
    bands,
    legend: series
      .filter((s, i, all) => all.findIndex((t) => t.name === s.name) === i)
      .map((s) => ({ name: s.name, colour: s.colour, marker: s.marker, line: s.line })),
  };
}

const f = (v: number | null | undefined, d = 3): string =>
  v === null || v === undefined || !Number.isFinite(v) ? '–' : v.toFixed(d);

export function verdictTable(c: Comparison): TableSpec {
  const rows: string[][] = [];
  for (const s of c.comparisons)
    for (const v of s.verdicts)
      rows.push([
        s.name,
        v.criterion,
        v.verdict.toUpperCase(),
        `${f(v.value, 2)} ± ${f(v.stdErr, 2)} ${v.unit}`,
        `${f(v.limits[0], 2)} … ${f(v.limits[1], 2)}`,
        v.probabilityOutside === null ? '–' : `${(v.probabilityOutside * 100).toFixed(1)} %`,
        v.reason,
      ]);
  return {
    id: 'verdicts',
    caption: `Verdicts against ${c.specName ?? 'the specification'}`,
    head: ['sample', 'criterion', 'verdict', 'difference ± s.e.', 'limits', 'P(outside)', 'reason'],
    rows,
    numeric: [3, 4, 5],
    note: 'pass: the whole 95 % interval lies within the limits; fail: it lies wholly outside; inconclusive: it straddles a limit. P(outside) is the probability, by the normal approximation, that the true difference lies outside the limits.',
  };
}

export function figuresTable(c: Comparison): TableSpec {
  return {
    id: 'figures',
    caption: 'Differences from the reference',
    head: [
      'sample',
      'time shift (decades)',
      'modulus level (%)',
      'ΔEa (kJ/mol)',
      'differs beyond noise',
      'overall',
    ],
    rows: c.comparisons.map((s) => {
      const m = s.modulusOffsetDecades ? toPercent(s.modulusOffsetDecades) : null;
      const ea = s.models.activationEnergyKJPerMol;
      return [
        s.name,
        s.timeShiftDecades
          ? `${f(s.timeShiftDecades.value)} ± ${f(s.timeShiftDecades.stdErr)}`
          : '–',
        m ? `${f(m.value, 1)} ± ${f(m.stdErr, 1)}` : '–',
        ea ? `${f(ea.value, 2)} ± ${f(ea.stdErr, 2)}` : '–',
        s.differsBeyondNoise ? 'yes' : 'no',
        s.overall,
      ];
    }),
    numeric: [1, 2, 3],
    note: 'Time shift: +0.1 means the sample relaxes 10^0.1 = 1.26 times more slowly than the reference. ± is one standard error.',
  };
}

export function comparisonReportHtml(c: Comparison, o: ComparisonReportOptions): string {
  const title = o.title ?? `Comparison report — ${c.reference.name}`;
  const body = [
    `<header><h1>${esc(title)}</h1><p>Reference: ${esc(c.reference.name)}; samples: ${esc(c.samples.map((s) => s.name).join(', '))}; common reference temperature ${esc(kelvinToCelsius(c.referenceTemperatureK).toFixed(1))} °C${c.specName ? `; specification: ${esc(c.specName)}` : ''}.</p></header>`,
    `<section id="cautions"><h2>Cautions</h2><ul>${[...c.cautions, ...CAUTIONS].map((x) => `<li>${esc(x)}</li>`).join('')}</ul></section>`,
    '<section id="verdict-summary"><h2>Verdicts</h2>',
    ...c.comparisons.map((s) => {
      const failed = s.verdicts.filter((v) => v.verdict === 'fail');
      const open = s.verdicts.filter((v) => v.verdict === 'inconclusive');
      const headline = s.overall === 'no-spec' ? 'no specification given' : s.overall.toUpperCase();
      const detail = [...failed, ...open]
        .map((v) => `<li><strong>${esc(v.criterion)}</strong>: ${esc(v.reason)}</li>`)
        .join('');
      return `<p class="verdict verdict-${esc(s.overall)}"><strong>${esc(s.name)}: ${esc(headline)}</strong></p>${detail ? `<ul>${detail}</ul>` : ''}`;
    }),
    c.comparisons.some((s) => s.verdicts.length) ? htmlTable(verdictTable(c)) : '',
    '</section>',
    '<section id="charts"><h2>Curves</h2>',
    `<figure class="chart-block">${renderChart(overlayChart(c))}<figcaption>${esc('Master curves smoothed on the shared grid, all at the common reference temperature; the reference in dark grey.')}</figcaption></figure>`,
    `<figure class="chart-block">${renderChart(differenceChart(c, null))}<figcaption>${esc('Difference of each sample from the reference with its 95 % band (both curves\u2019 scatter, shift and placement uncertainty).')}</figcaption></figure>`,
    '</section>',
    `<section id="tables"><h2>Figures</h2>${htmlTable(figuresTable(c))}</section>`,
    ...c.comparisons.flatMap((s) => s.warnings.map((w) => `<p class="warning">${esc(w)}</p>`)),
    `<footer>Generated by Thermoshift on ${esc(o.date)}. Method: docs/compare.md. This report supports, and does not replace, the judgement of a qualified engineer.</footer>`,
  ];
  return (
    `<!DOCTYPE html><html lang="en"><head><meta charset="utf-8">` +
    `<meta name="viewport" content="width=device-width, initial-scale=1">` +
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">` +
    `<title>${esc(title)}</title><style>${REPORT_CSS}</style></head><body>${body.join('\n')}</body></html>\n`
  );
}
