/**
 * A plot described as plain data, independent of Chart.js: the screen (chart-config.ts) and the
 * SVG export (plot-svg.ts) both draw from it, so an exported SVG shows exactly the plotted data.
 */

/** Where a plotted point came from, for masking and read-outs. */
export interface PointRef {
  isothermId: string;
  /** Index of the point within its isotherm. */
  index: number;
  file: string;
  row: number;
}

export interface PlotPoint {
  x: number;
  y: number;
  ref?: PointRef;
}

export type SeriesStyle = 'disc' | 'ring' | 'line' | 'dashed';

export interface PlotSeries {
  id: string;
  label: string;
  colour: string;
  style: SeriesStyle;
  points: PlotPoint[];
  /** The isotherm this series belongs to: a drag on it moves that isotherm's shift. */
  isothermId?: string;
  /** Drawn faint (masked points, excluded and left-out isotherms, outliers). */
  faint?: boolean;
  /** Why the series is faint (or anything else worth saying), shown on hover. */
  note?: string;
  /** Symmetric y errors (same length as points), drawn in the SVG export. */
  yError?: (number | null)[];
}

export interface PlotBand {
  label: string;
  colour: string;
  x: number[];
  lower: number[];
  upper: number[];
}

export interface PlotAxis {
  kind: 'log' | 'linear';
  label: string;
}

export interface PlotSpec {
  /** Stable id, used for file names and DOM ids. */
  id: string;
  title: string;
  x: PlotAxis;
  y: PlotAxis;
  series: PlotSeries[];
  bands: PlotBand[];
  /** Legend entries shown above the plot (series are usually too many to list). */
  legend: { label: string; colour: string; style: SeriesStyle }[];
  /** Temperature colour bar, °C, when colours mean temperatures. */
  colourBar?: { minC: number; maxC: number; gradient: string };
  /** Text for the hover read-out of one point. */
  describe(series: PlotSeries, point: PlotPoint): string;
  /** True when dragging a series horizontally moves its isotherm (the master curve). */
  draggable?: boolean;
  /** True when points can be masked by clicking or box-selecting. */
  maskable?: boolean;
}

/** Visible window of a plot (data units); undefined = fit to data. */
export interface PlotWindow {
  xMin: number;
  xMax: number;
  yMin: number;
  yMax: number;
}
