/**
 * SVG export of a plot: the PlotSpec converted to the report's chart description and drawn by
 * core/report's renderChart, so exported figures match the report. The visible window (zoom)
 * becomes the axis domain.
 */
import type { ChartSpec, LineStyle, Marker } from '../../../../core/report/svg/chart-types';
import { renderChart } from '../../../../core/report/svg/render-chart';
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

export function plotToChartSpec(spec: PlotSpec, view?: PlotWindow): ChartSpec {
  return {
    id: `thermoshift-${spec.id}`,
    title: spec.title,
    width: 760,
    height: 460,
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

export function plotToSvg(spec: PlotSpec, view?: PlotWindow): string {
  const svg = renderChart(plotToChartSpec(spec, view));
  const withNs = svg.includes('xmlns=')
    ? svg
    : svg.replace('<svg', '<svg xmlns="http://www.w3.org/2000/svg"');
  return `<?xml version="1.0" encoding="UTF-8"?>\n${withNs.replace(/(<svg[^>]*>)/, `$1${SVG_STYLE}`)}`;
}
