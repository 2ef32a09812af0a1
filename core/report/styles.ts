/**
 * The report's stylesheet: one column for print (A4 and Letter both fit: the page size is left to
 * the browser's print dialog), figures and table rows never split across pages, table headers
 * repeated on each page, charts scaled to the page width so nothing is clipped.
 */
export const REPORT_CSS = `
:root { --ink: #1b1f24; --muted: #5a6470; --rule: #c9d1d9; --accent: #2a5d67; --warn: #8a3b12; }
* { box-sizing: border-box; }
body { margin: 0 auto; max-width: 190mm; padding: 10mm 8mm; color: var(--ink);
  font: 10.5pt/1.45 "Segoe UI", "Helvetica Neue", Arial, "Liberation Sans", sans-serif; }
h1 { font-size: 18pt; margin: 0 0 2mm; letter-spacing: 0.01em; }
h2 { font-size: 12.5pt; margin: 7mm 0 2mm; padding-bottom: 1mm; border-bottom: 1.5px solid var(--accent); color: var(--accent); break-after: avoid; }
p { margin: 1.5mm 0; }
.title-block { border: 1.5px solid var(--ink); padding: 4mm 5mm; display: grid; grid-template-columns: 1fr auto; gap: 2mm 8mm; }
.title-block dl { display: grid; grid-template-columns: max-content 1fr; gap: 0.5mm 4mm; margin: 0; font-size: 9.5pt; }
.title-block dt { color: var(--muted); }
.title-block dd { margin: 0; }
.stamp { align-self: start; border: 1px solid var(--ink); padding: 1.5mm 3mm; font-size: 9pt; text-align: right; }
.invented { display: inline-block; margin-top: 2mm; padding: 1mm 2.5mm; border: 1.5px dashed var(--warn); color: var(--warn); font-weight: 600; font-size: 9pt; }
.cautions { border-left: 4px solid var(--warn); background: #fbf5ef; padding: 2mm 4mm; margin: 4mm 0; break-inside: avoid; }
.cautions h2 { border: 0; color: var(--warn); margin-top: 1mm; }
.cautions ul { margin: 1mm 0 1mm 4mm; padding: 0; }
figure { margin: 3mm 0; break-inside: avoid; page-break-inside: avoid; }
figure.chart-block figcaption { font-size: 9pt; color: var(--muted); margin-top: 1mm; }
svg.chart { display: block; width: 100%; max-width: 170mm; height: auto; margin: 0 auto; }
svg.chart .grid { stroke: #e3e7eb; } svg.chart .grid-minor { stroke: #f1f3f5; }
svg.chart .tick, svg.chart .frame { stroke: #333; } svg.chart text { fill: #222; }
svg.chart .axis-label { font-size: 11.5px; }
table { border-collapse: collapse; width: 100%; font-size: 9pt; }
caption { text-align: left; font-weight: 600; padding-bottom: 1mm; }
th, td { border-bottom: 1px solid var(--rule); padding: 0.8mm 2mm; text-align: left; vertical-align: top; }
th { border-bottom: 1.5px solid var(--ink); font-weight: 600; }
td.num, th.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
tr { break-inside: avoid; } thead { display: table-header-group; }
tr.excluded td { color: var(--muted); font-style: italic; }
.table-note { font-size: 8.5pt; color: var(--muted); margin: 1mm 0 0; }
.warnings li { margin: 0.5mm 0; } .warnings code { font-size: 8.5pt; color: var(--warn); }
footer { margin-top: 8mm; padding-top: 2mm; border-top: 1px solid var(--rule); font-size: 8.5pt; color: var(--muted); }
@media screen and (min-width: 1200px) { body { max-width: 250mm; } }
@media print {
  @page { margin: 14mm 12mm; }
  body { max-width: none; padding: 0; font-size: 9.5pt; }
  .page-break { break-before: page; page-break-before: always; }
  a { color: inherit; text-decoration: none; }
}
`;
