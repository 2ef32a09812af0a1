/**
 * Chart.js configuration from a PlotSpec: scatter datasets per series, filled bands between two
 * invisible lines, log axes with decade ticks, no animation (plots follow drags frame by frame).
 */
import type { ChartConfiguration, ChartDataset, Plugin, Scale } from 'chart.js';
import { decadeTicks } from './decade-ticks';
import { paddedRange } from './zoom-math';
import type { PlotSeries, PlotSpec, PlotWindow } from './plot-spec';
import { withAlpha } from './temperature-colours';

export type PlotChartConfig = ChartConfiguration<'scatter', { x: number; y: number }[]>;

/** Index of the series behind each Chart.js dataset (-1 for band edges). */
export interface DatasetMap {
  seriesIndex: number[];
}

const INK = '#2b3338';
const GRID = '#e3e6e1';

/** Paints the canvas white first, so a PNG export is not transparent. */
export const whiteBackground: Plugin<'scatter'> = {
  id: 'thermoshiftWhiteBackground',
  beforeDraw(chart) {
    const { ctx, width, height } = chart;
    ctx.save();
    ctx.globalCompositeOperation = 'destination-over';
    ctx.fillStyle = '#ffffff';
    ctx.fillRect(0, 0, width, height);
    ctx.restore();
  },
};

/** A dataset may carry symmetric y errors (the shift factors' standard errors). */
type WithErrors = { yError?: (number | null)[] };

/** Draws the ±1 s.e. bars of datasets that carry `yError`; reads the live chart data. */
export const errorBars: Plugin<'scatter'> = {
  id: 'thermoshiftErrorBars',
  afterDatasetsDraw(chart) {
    const { ctx } = chart;
    const { x, y } = chart.scales;
    ctx.save();
    ctx.lineWidth = 1.2;
    for (const ds of chart.data.datasets) {
      const errs = (ds as WithErrors).yError;
      if (!errs) continue;
      ctx.strokeStyle = String(ds.borderColor);
      (ds.data as { x: number; y: number }[]).forEach((p, i) => {
        const e = errs[i];
        if (e === null || e === undefined || !(e > 0)) return;
        const px = x.getPixelForValue(p.x);
        const top = y.getPixelForValue(p.y + e);
        const bottom = y.getPixelForValue(p.y - e);
        ctx.beginPath();
        ctx.moveTo(px, top);
        ctx.lineTo(px, bottom);
        ctx.moveTo(px - 3, top);
        ctx.lineTo(px + 3, top);
        ctx.moveTo(px - 3, bottom);
        ctx.lineTo(px + 3, bottom);
        ctx.stroke();
      });
    }
    ctx.restore();
  },
};

function seriesDataset(
  s: PlotSeries,
  shiftDecades: number,
): ChartDataset<'scatter', { x: number; y: number }[]> {
  const factor = 10 ** shiftDecades;
  const colour = s.faint ? withAlpha(s.colour, 0.3) : s.colour;
  const line = s.style === 'line' || s.style === 'dashed';
  return {
    label: s.label,
    data: s.points.map((p) => ({ x: p.x * factor, y: p.y })),
    showLine: line,
    borderColor: colour,
    borderWidth: line ? 2 : 1.2,
    borderDash: s.style === 'dashed' ? [6, 4] : [],
    backgroundColor: s.style === 'disc' ? colour : 'rgba(255,255,255,0.9)',
    pointRadius: line ? 0 : s.faint ? 2.5 : 3.2,
    pointHoverRadius: line ? 0 : 5,
    pointHitRadius: line ? 0 : 5,
    pointBorderColor: colour,
    ...(s.yError ? ({ yError: s.yError } satisfies WithErrors) : {}),
  };
}

function axisOptions(kind: 'log' | 'linear', label: string, min?: number, max?: number) {
  // Chart.js formats tick labels after afterBuildTicks through ticks.callback: keep our labels.
  const labels = new Map<number, string>();
  return {
    type: kind === 'log' ? ('logarithmic' as const) : ('linear' as const),
    min,
    max,
    title: { display: true, text: label, color: INK, font: { size: 12 } },
    grid: { color: GRID },
    border: { color: '#9aa3a0' },
    // Linear axes keep Chart.js's own tick formatter (no callback key at all: `undefined` would
    // replace it and print 2.3000000000000003) and no ticks at the padded window's edges.
    ticks: {
      color: INK,
      autoSkip: kind !== 'log',
      maxRotation: 0,
      ...(kind === 'log'
        ? { callback: (value: number | string) => labels.get(Number(value)) ?? '' }
        : { includeBounds: false }),
    },
    afterBuildTicks:
      kind === 'log'
        ? (scale: Scale) => {
            const ticks = decadeTicks(scale.min, scale.max);
            labels.clear();
            for (const t of ticks) labels.set(t.value, t.label);
            scale.ticks = ticks.map((t) => ({ value: t.value, label: t.label, major: t.major }));
          }
        : undefined,
  };
}

/**
 * @param shift optional live shift of one isotherm's series while it is being dragged (decades).
 */
export function plotChartConfig(
  spec: PlotSpec,
  view: PlotWindow | undefined,
  shift?: { isothermId: string; decades: number },
): { config: PlotChartConfig; map: DatasetMap } {
  const datasets: ChartDataset<'scatter', { x: number; y: number }[]>[] = [];
  const seriesIndex: number[] = [];
  for (const b of spec.bands) {
    datasets.push(
      {
        label: `${b.label} (lower)`,
        data: b.x.map((x, i) => ({ x, y: b.lower[i] })),
        showLine: true,
        pointRadius: 0,
        pointHitRadius: 0,
        borderWidth: 0,
        borderColor: 'transparent',
      },
      {
        label: b.label,
        data: b.x.map((x, i) => ({ x, y: b.upper[i] })),
        showLine: true,
        pointRadius: 0,
        pointHitRadius: 0,
        borderWidth: 0,
        borderColor: 'transparent',
        backgroundColor: withAlpha(b.colour, 0.2),
        fill: '-1',
      },
    );
    seriesIndex.push(-1, -1);
  }
  spec.series.forEach((s, i) => {
    const d = shift && s.isothermId === shift.isothermId ? shift.decades : 0;
    datasets.push(seriesDataset(s, d));
    seriesIndex.push(i);
  });
  // Without a zoom window, the axes cover the data with a margin: markers at the extremes are
  // drawn whole, not half-cut by the frame.
  const fit = view ?? fittedWindow(spec);
  const config: PlotChartConfig = {
    type: 'scatter',
    data: { datasets },
    options: {
      animation: false,
      responsive: true,
      maintainAspectRatio: false,
      normalized: true,
      events: ['mousemove', 'mouseout'],
      layout: { padding: { top: 8, right: 14, bottom: 4, left: 4 } },
      scales: {
        x: axisOptions(spec.x.kind, spec.x.label, fit?.xMin, fit?.xMax),
        y: axisOptions(spec.y.kind, spec.y.label, fit?.yMin, fit?.yMax),
      },
      plugins: { tooltip: { enabled: false }, legend: { display: false } },
    },
    plugins: [whiteBackground, errorBars],
  };
  return { config, map: { seriesIndex } };
}

/** The window that shows every point, band and error bar of a plot with a margin around it. */
export function fittedWindow(spec: PlotSpec): PlotWindow | undefined {
  const xs: number[] = [];
  const ys: number[] = [];
  for (const s of spec.series)
    s.points.forEach((p, i) => {
      xs.push(p.x);
      ys.push(p.y);
      const e = s.yError?.[i];
      if (e) ys.push(p.y - e, p.y + e);
    });
  for (const b of spec.bands) {
    for (const v of b.x) xs.push(v);
    for (const v of b.lower) ys.push(v);
    for (const v of b.upper) ys.push(v);
  }
  const x = paddedRange(spec.x.kind, xs);
  const y = paddedRange(spec.y.kind, ys);
  return x && y ? { xMin: x[0], xMax: x[1], yMin: y[0], yMax: y[1] } : undefined;
}
