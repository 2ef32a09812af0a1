/** SVG fragments for markers, lines and legend swatches. Coordinates are already projected. */
import type { LineStyle, Marker } from './chart-types';

const r2 = (v: number): string => (Math.round(v * 100) / 100).toString();

export function markerSvg(
  marker: Marker,
  x: number,
  y: number,
  colour: string,
  cls = 'pt',
): string {
  switch (marker) {
    case 'disc':
      return `<circle class="${cls}" cx="${r2(x)}" cy="${r2(y)}" r="2.6" fill="${colour}"/>`;
    case 'ring':
      return `<circle class="${cls}" cx="${r2(x)}" cy="${r2(y)}" r="2.6" fill="#fff" stroke="${colour}" stroke-width="1.2"/>`;
    case 'square':
      return `<rect class="${cls}" x="${r2(x - 2.4)}" y="${r2(y - 2.4)}" width="4.8" height="4.8" fill="#fff" stroke="${colour}" stroke-width="1.2"/>`;
    case 'none':
      return '';
  }
}

/** A polyline path through the points; breaks the line where a point is missing (null). */
export function pathData(points: ({ x: number; y: number } | null)[]): string {
  let d = '';
  let pen = false;
  for (const p of points) {
    if (!p) {
      pen = false;
      continue;
    }
    d += `${pen ? 'L' : 'M'}${r2(p.x)},${r2(p.y)}`;
    pen = true;
  }
  return d;
}

export function lineSvg(d: string, colour: string, line: LineStyle): string {
  if (line === 'none' || d === '') return '';
  const dash = line === 'dashed' ? ' stroke-dasharray="5 3"' : '';
  return `<path class="series-line" d="${d}" fill="none" stroke="${colour}" stroke-width="1.4"${dash}/>`;
}

export { r2 as round2 };
