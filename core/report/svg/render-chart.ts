/**
 * Renders a chart description as a self-contained inline SVG: framed plot area, log axes with
 * decade ticks or linear 1-2-5 ticks, light grid, shaded bands, series (lines and markers, clipped
 * to the plot area), error bars, a legend row above the plot and an optional temperature colour
 * bar at the right. Scales with the page via viewBox; no script, no external resource.
 */
import type { ChartAxis, ChartSpec } from './chart-types';
import { drawable, niceDomain, project, type Scale } from './scale';
import { linearTicks, logTicks, type Tick } from './ticks';
import { lineSvg, markerSvg, pathData, round2 } from './marks';
import { rampStops } from './colour';
import { escapeHtml } from '../escape';
import { formatNumber } from '../format';

const MARGIN = { left: 66, right: 18, top: 34, bottom: 44 };
const COLOUR_BAR_WIDTH = 64;

function axisScale(axis: ChartAxis, values: number[], range: [number, number]): Scale {
  return { kind: axis.kind, domain: axis.domain ?? niceDomain(values, axis.kind), range };
}

function ticksFor(s: Scale): Tick[] {
  return s.kind === 'log' ? logTicks(s.domain) : linearTicks(s.domain);
}

/** A coordinate as written into the SVG: a number, or one already rounded to text. */
type Coord = number | string;

/** Tick marks stand 5 px out at major ticks, 3 px at minor ones. */
const tickLength = (major: boolean): number => (major ? 5 : 3);

/** A grid line across the plot, solid at major ticks and faint at minor ones (CSS classes). */
const gridLine = (x1: Coord, x2: Coord, y1: Coord, y2: Coord, major: boolean): string =>
  `<line x1="${x1}" x2="${x2}" y1="${y1}" y2="${y2}" class="${major ? 'grid' : 'grid-minor'}"/>`;

/** A tick mark outside the plot. */
const tickLine = (x1: Coord, x2: Coord, y1: Coord, y2: Coord): string =>
  `<line x1="${x1}" x2="${x2}" y1="${y1}" y2="${y2}" class="tick"/>`;

export function renderChart(spec: ChartSpec): string {
  const right = MARGIN.right + (spec.colourBar ? COLOUR_BAR_WIDTH : 0);
  const x0 = MARGIN.left;
  const x1 = spec.width - right;
  const legend = legendLayout(spec, x0, x1);
  const y0 = MARGIN.top + 16 * Math.max(0, legend.rows - 1);
  const y1 = spec.height - MARGIN.bottom;
  const bands = spec.bands ?? [];
  const xs = [...spec.series.flatMap((s) => s.x), ...bands.flatMap((b) => b.x)];
  const ys = [
    ...spec.series.flatMap((s) =>
      s.y.flatMap((v, i) => {
        const e = s.yError?.[i];
        return e ? [v - e, v + e] : [v];
      }),
    ),
    ...bands.flatMap((b) => [...b.lower, ...b.upper]),
  ];
  const sx = axisScale(spec.x, xs, [x0, x1]);
  const sy = axisScale(spec.y, ys, [y1, y0]);
  const id = escapeHtml(spec.id);
  const px = (v: number): number => project(sx, v);
  const py = (v: number): number => project(sy, v);
  const ok = (x: number, y: number): boolean => drawable(sx, x) && drawable(sy, y);

  const out: string[] = [];
  out.push(
    `<svg class="chart" id="${id}" xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${spec.width} ${spec.height}" role="img" aria-labelledby="${id}-title" font-family="inherit" font-size="11">`,
    `<title id="${id}-title">${escapeHtml(spec.title)}</title>`,
    `<defs><clipPath id="${id}-clip"><rect x="${x0}" y="${y0}" width="${x1 - x0}" height="${y1 - y0}"/></clipPath></defs>`,
    `<rect x="${x0}" y="${y0}" width="${x1 - x0}" height="${y1 - y0}" fill="#fff"/>`,
  );
  // grid and ticks
  const g: string[] = [];
  for (const t of ticksFor(sx)) {
    const x = round2(px(t.value));
    g.push(gridLine(x, x, y0, y1, t.major), tickLine(x, x, y1, y1 + tickLength(t.major)));
    if (t.label)
      g.push(`<text x="${x}" y="${y1 + 17}" text-anchor="middle">${escapeHtml(t.label)}</text>`);
  }
  for (const t of ticksFor(sy)) {
    const y = round2(py(t.value));
    g.push(gridLine(x0, x1, y, y, t.major), tickLine(x0 - tickLength(t.major), x0, y, y));
    if (t.label)
      g.push(
        `<text x="${x0 - 8}" y="${y}" dy="0.35em" text-anchor="end">${escapeHtml(t.label)}</text>`,
      );
  }
  out.push(`<g class="axes" stroke-width="1">${g.join('')}</g>`);
  // plotted data, clipped
  const data: string[] = [];
  for (const b of bands) {
    const upper = b.x.map((x, i) => (ok(x, b.upper[i]) ? { x: px(x), y: py(b.upper[i]) } : null));
    const lower = b.x.map((x, i) => (ok(x, b.lower[i]) ? { x: px(x), y: py(b.lower[i]) } : null));
    const pts = [...upper, ...lower.reverse()].filter((p) => p !== null);
    if (pts.length > 2)
      data.push(
        `<path class="band" d="${pathData(pts)}Z" fill="${b.colour}" fill-opacity="0.18" stroke="none"/>`,
      );
  }
  for (const s of spec.series) {
    const pts = s.x.map((x, i) => (ok(x, s.y[i]) ? { x: px(x), y: py(s.y[i]) } : null));
    data.push(lineSvg(pathData(pts), s.colour, s.line));
    if (s.yError)
      s.x.forEach((x, i) => {
        const e = s.yError?.[i];
        if (!e || !ok(x, s.y[i]) || !drawable(sy, s.y[i] - e)) return;
        const X = round2(px(x));
        data.push(
          `<line class="err" x1="${X}" x2="${X}" y1="${round2(py(s.y[i] - e))}" y2="${round2(py(s.y[i] + e))}" stroke="${s.colour}" stroke-width="1"/>`,
        );
      });
    pts.forEach((p) => p && data.push(markerSvg(s.marker, p.x, p.y, s.colour)));
  }
  out.push(`<g class="data" clip-path="url(#${id}-clip)">${data.join('')}</g>`);
  out.push(
    `<rect x="${x0}" y="${y0}" width="${x1 - x0}" height="${y1 - y0}" fill="none" class="frame"/>`,
  );
  // axis labels
  out.push(
    `<text class="axis-label" x="${(x0 + x1) / 2}" y="${spec.height - 8}" text-anchor="middle">${escapeHtml(spec.x.label)}</text>`,
    `<text class="axis-label" transform="translate(14 ${(y0 + y1) / 2}) rotate(-90)" text-anchor="middle">${escapeHtml(spec.y.label)}</text>`,
  );
  out.push(legend.svg);
  if (spec.colourBar) out.push(colourBarSvg(id, spec.colourBar, x1 + 16, y0, y1));
  out.push('</svg>');
  return out.join('');
}

/** Legend entries laid out left to right, wrapping onto further rows 16 px apart. */
function legendLayout(spec: ChartSpec, x0: number, x1: number): { rows: number; svg: string } {
  const entries = spec.legend ?? [];
  if (entries.length === 0) return { rows: 0, svg: '' };
  const parts: string[] = [];
  let x = x0;
  let row = 0;
  for (const e of entries) {
    const w = 30 + e.name.length * 5.8;
    if (x > x0 && x + w > x1 + 10) {
      row++;
      x = x0;
    }
    const y = 16 + 16 * row;
    const line = e.line === 'none' ? '' : lineSvg(`M${x},${y}L${x + 18},${y}`, e.colour, e.line);
    parts.push(line, markerSvg(e.marker, x + 9, y, e.colour, 'legend-pt'));
    parts.push(`<text x="${x + 22}" y="${y}" dy="0.35em">${escapeHtml(e.name)}</text>`);
    x += w;
  }
  return { rows: row + 1, svg: `<g class="legend">${parts.join('')}</g>` };
}

function colourBarSvg(
  id: string,
  bar: { minC: number; maxC: number },
  x: number,
  y0: number,
  y1: number,
): string {
  const stops = rampStops()
    .map((s) => `<stop offset="${s.offset}" stop-color="${s.colour}"/>`)
    .join('');
  return (
    `<g class="colour-bar"><defs><linearGradient id="${id}-ramp" x1="0" y1="1" x2="0" y2="0">${stops}</linearGradient></defs>` +
    `<rect x="${x}" y="${y0}" width="10" height="${y1 - y0}" fill="url(#${id}-ramp)" stroke="#555" stroke-width="0.5"/>` +
    `<text x="${x + 14}" y="${y0}" dy="0.7em">${escapeHtml(formatNumber(bar.maxC, 3))} °C</text>` +
    `<text x="${x + 14}" y="${y1}">${escapeHtml(formatNumber(bar.minC, 3))} °C</text>` +
    `<text x="${x + 5}" y="${y0 - 8}" text-anchor="middle">T</text></g>`
  );
}
