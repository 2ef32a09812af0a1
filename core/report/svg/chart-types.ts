/** Plain descriptions of a chart; `renderChart` turns one into an inline SVG string. */
export type Marker = 'disc' | 'ring' | 'square' | 'none';
export type LineStyle = 'solid' | 'dashed' | 'none';

export interface ChartSeries {
  name: string;
  x: number[];
  y: number[];
  colour: string;
  line: LineStyle;
  marker: Marker;
  /** Symmetric error in y units, drawn as bars (same length as y; null for none). */
  yError?: (number | null)[];
}

/** A shaded region between two curves (e.g. a model's 95 % band). */
export interface ChartBand {
  name: string;
  x: number[];
  lower: number[];
  upper: number[];
  colour: string;
}

export interface ChartAxis {
  kind: 'linear' | 'log';
  label: string;
  /** Fixed domain; otherwise derived from the data. */
  domain?: [number, number];
}

export interface LegendEntry {
  name: string;
  colour: string;
  marker: Marker;
  line: LineStyle;
}

export interface ChartSpec {
  /** Unique within the page; used for SVG ids. */
  id: string;
  title: string;
  width: number;
  height: number;
  x: ChartAxis;
  y: ChartAxis;
  series: ChartSeries[];
  bands?: ChartBand[];
  legend?: LegendEntry[];
  /** Temperature colour bar, °C. */
  colourBar?: { minC: number; maxC: number };
}
