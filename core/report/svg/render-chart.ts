/**
 * Renders a chart description as a self-contained inline SVG: framed plot area, log axes with
 * decade ticks or linear 1-2-5 ticks, light grid, shaded bands, series (lines and markers, clipped
 * to the plot area), error bars, a legend row above the plot and an optional temperature colour
 * bar at the right. Scales with the page via viewBox; no script, no external resource.
 */
import type { ChartAxis, ChartSpec } from './chart-types';
import { DomainAccumulator, drawable, project, type Scale } from './scale';
import { linearTicks, logTicks, type Tick } from './ticks';
import { lineSvg, markerSvg, pathData, round2 } from './marks';
import { rampStops } from './colour';
import { escapeHtml } from '../escape';
import { formatNumber } from '../format';

const MARGIN = { left: 66, right: 18, top: 34, bottom: 44 };
const COLOUR_BAR_WIDTH = 64;

function axisScale(axis: ChartAxis, acc: DomainAccumulator, range: [number, number]): Scale {
  return { kind: axis.kind, domain: axis.domain ?? acc.nice(), range };
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
  // axis ranges in one pass over the values (10⁶ points make no intermediate arrays)
  const ax = new DomainAccumulator(spec.x.kind);
  const ay = new DomainAccumulator(spec.y.kind);
  for (const s of spec.series)
    for (let i = 0; i < s.x.length; i++) {
      ax.add(s.x[i]);
      const v = s.y[i];
      const e = s.yError?.[i];
      if (e) {
        ay.add(v - e);
        ay.add(v + e);
      } else ay.add(v);
    }
  for (const b of bands) {
    for (const x of b.x) ax.add(x);
    for (let i = 0; i < b.lower.length; i++) {
      ay.add(b.lower[i]);
      ay.add(b.upper[i]);
    }
  }
  const sx = axisScale(spec.x, ax, [x0, x1]);
  const sy = axisScale(spec.y, ay, [y1, y0]);
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
    const n = s.x.length;
    const X = new Float64Array(n);
    const Y = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const ok2 = ok(s.x[i], s.y[i]);
      X[i] = ok2 ? px(s.x[i]) : NaN;
      Y[i] = ok2 ? py(s.y[i]) : NaN;
    }
    if (s.line !== 'none') data.push(lineSvg(pathData(thinLine(X, Y)), s.colour, s.line));
    if (s.yError)
      s.x.forEach((x, i) => {
        const e = s.yError?.[i];
        if (!e || !ok(x, s.y[i]) || !drawable(sy, s.y[i] - e)) return;
        const Xe = round2(px(x));
        data.push(
          `<line class="err" x1="${Xe}" x2="${Xe}" y1="${round2(py(s.y[i] - e))}" y2="${round2(py(s.y[i] + e))}" stroke="${s.colour}" stroke-width="1"/>`,
        );
      });
    // one marker per pixel and series: overlapping markers add nothing to the picture, and
    // 10⁶ points would make a file of tens of megabytes
    if (s.marker !== 'none') {
      const drawn = new Set<number>();
      for (let i = 0; i < n; i++) {
        if (Number.isNaN(X[i])) continue;
        const key = Math.round(X[i]) * 100003 + Math.round(Y[i]);
        if (drawn.has(key)) continue;
        drawn.add(key);
        data.push(markerSvg(s.marker, X[i], Y[i], s.colour));
      }
    }
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

type Pt = { x: number; y: number } | null;

/**
 * The points of a line (projected; NaN = a gap), thinned for drawing: with more than 4000, per
 * pixel column its first, lowest, highest and last point in order (min–max decimation), the same
 * picture with at most four points a pixel. Gaps are kept.
 */
function thinLine(X: Float64Array, Y: Float64Array): Pt[] {
  const n = X.length;
  const out: Pt[] = [];
  if (n < 4000) {
    for (let i = 0; i < n; i++) out.push(Number.isNaN(X[i]) ? null : { x: X[i], y: Y[i] });
    return out;
  }
  let start = -1;
  let column = NaN;
  const flush = (end: number): void => {
    if (start < 0) return;
    let lo = start;
    let hi = start;
    for (let i = start; i < end; i++) {
      if (Y[i] < Y[lo]) lo = i;
      if (Y[i] > Y[hi]) hi = i;
    }
    const keep = [...new Set([start, Math.min(lo, hi), Math.max(lo, hi), end - 1])];
    for (const i of keep) out.push({ x: X[i], y: Y[i] });
    start = -1;
  };
  for (let i = 0; i < n; i++) {
    if (Number.isNaN(X[i])) {
      flush(i);
      out.push(null);
      column = NaN;
      continue;
    }
    const c = Math.floor(X[i]);
    if (c !== column) {
      flush(i);
      column = c;
      start = i;
    }
  }
  flush(n);
  return out;
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
