/**
 * SVG export of a plot: the PlotSpec converted to the report's chart description and drawn by
 * core/report's renderChart, so exported figures match the report, under a visible title block
 * (the plot's title, with Tref, and a caption line: sample, units, conventions). The visible
 * window (zoom) becomes the axis domain. The PNG export rasterises this same figure, so both
 * files carry the title, legend, colour bar, Tref and units.
 */
import type { ChartSpec, LineStyle, Marker } from '@core/report';
import { renderChart } from '@core/report';
import type { PlotSpec, PlotWindow, SeriesStyle } from './plot-spec';

const MARKS: Record<SeriesStyle, { marker: Marker; line: LineStyle }> = {
  disc: { marker: 'disc', line: 'none' },
  ring: { marker: 'ring', line: 'none' },
  line: { marker: 'none', line: 'solid' },
  dashed: { marker: 'none', line: 'dashed' },
};

/** Standalone styling for the classes renderChart uses (the report supplies them in its page). */
const SVG_STYLE =
  '<style>.grid{stroke:#e3e6e1}.grid-minor{stroke:#f0f2ee}.tick{stroke:#6b7470}' +
  'text{fill:#2b3338;font-family:system-ui,sans-serif}</style>';

/** Size of an exported figure in CSS pixels (a PNG multiplies it by its scale). */
export interface FigureSize {
  width: number;
  height: number;
}

export const DEFAULT_FIGURE: FigureSize = { width: 760, height: 500 };

/** Height of the title block above the chart, px. */
const TITLE_BLOCK = 44;

export function plotToChartSpec(
  spec: PlotSpec,
  view?: PlotWindow,
  size: FigureSize = { width: 760, height: 460 },
): ChartSpec {
  return {
    id: `thermoshift-${spec.id}`,
    title: spec.title,
    width: size.width,
    height: size.height,
    x: {
      kind: spec.x.kind,
      label: spec.x.label,
      domain: view ? [view.xMin, view.xMax] : undefined,
    },
    y: {
      kind: spec.y.kind,
      label: spec.y.label,
      domain: view ? [view.yMin, view.yMax] : undefined,
    },
    series: spec.series.map((s) => ({
      name: s.label,
      x: s.points.map((p) => p.x),
      y: s.points.map((p) => p.y),
      colour: s.faint ? '#c4c9c6' : s.colour,
      ...MARKS[s.style],
      yError: s.yError,
    })),
    bands: spec.bands.map((b) => ({ ...b, name: b.label })),
    legend: spec.legend.map((l) => ({ name: l.label, colour: l.colour, ...MARKS[l.style] })),
    colourBar: spec.colourBar
      ? { minC: spec.colourBar.minC, maxC: spec.colourBar.maxC }
      : undefined,
  };
}

const esc = (t: string): string =>
  t.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

/**
 * The exported figure: a title block (title; caption) over the chart, `size` CSS pixels in all.
 * @param caption one line under the title, e.g. sample name, units and conventions
 */
export function plotToSvg(
  spec: PlotSpec,
  view?: PlotWindow,
  options: { size?: FigureSize; caption?: string } = {},
): string {
  const { width, height } = options.size ?? DEFAULT_FIGURE;
  const chartHeight = Math.max(200, height - TITLE_BLOCK);
  const chart = renderChart(plotToChartSpec(spec, view, { width, height: chartHeight })).replace(
    /^<svg /,
    `<svg x="0" y="${TITLE_BLOCK}" width="${width}" height="${chartHeight}" `,
  );
  const caption = options.caption
    ? `<text x="12" y="36" font-size="11" class="caption">${esc(options.caption)}</text>`
    : '';
  return (
    `<?xml version="1.0" encoding="UTF-8"?>\n` +
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${TITLE_BLOCK + chartHeight}" ` +
    `viewBox="0 0 ${width} ${TITLE_BLOCK + chartHeight}" font-size="11">${SVG_STYLE}` +
    `<rect width="100%" height="100%" fill="#fff"/>` +
    `<text x="12" y="19" font-size="14" font-weight="600">${esc(spec.title)}</text>${caption}` +
    `${chart}</svg>`
  );
}
