/**
 * Long layouts: one table, one row per point, with a temperature column.
 * - 'long' (melt): comma-delimited, a header row and a units row under it, LF line ends.
 * - 'ramp' (multi-frequency heating ramp): columns aligned with runs of spaces, units in brackets.
 */
import { complexModulusOf } from '../data/derived';
import type { DemoMeasurements, DemoWritten } from './demo-types';
import { headerLines, paPerUnit } from './demo-header';
import { formatCelsius, formatSignificant } from './number-text';
import { maxOf } from '../data/extent';

/** "150 to 230 °C every 10 K" from ascending, evenly spaced set points. */
export function setPointSpan(setPointsC: number[]): string {
  const first = setPointsC[0];
  const last = setPointsC[setPointsC.length - 1];
  const step = setPointsC.length > 1 ? setPointsC[1] - first : 0;
  return `${first} to ${last} °C every ${step} K`;
}

function meltTable(m: DemoMeasurements): { head: string[]; rows: string[] } {
  const s = m.scenario;
  const unit = paPerUnit(s.modulusUnit);
  const head = headerLines(s, [
    ['instrument', 'rotational rheometer, parallel plates 25 mm, gap 1.0 mm'],
    ['test', 'frequency sweep, strain amplitude 5 %, sweep from high to low frequency'],
    ['temperatures', `measured at the plate; set points ${setPointSpan(s.setPointsC)}`],
  ]);
  head.push(
    "Temperature,Angular frequency,Storage modulus G',Loss modulus G'',Complex viscosity",
    `°C,${s.xUnit},${s.modulusUnit},${s.modulusUnit},${s.modulusUnit}·s`,
  );
  const rows = m.isotherms.flatMap((iso) =>
    iso.points.map((p) => {
      const etaPaS = complexModulusOf(p.primaryPa, p.lossPa) / p.xSI;
      return [
        formatCelsius(p.temperatureC, 2),
        formatSignificant(p.xFile, 5),
        formatSignificant(p.primaryPa / unit, 5),
        formatSignificant(p.lossPa / unit, 5),
        formatSignificant(etaPaS / unit, 5),
      ];
    }),
  );
  return { head, rows: rows.map((r) => r.join(',')) };
}

function rampTable(m: DemoMeasurements): { head: string[]; rows: string[] } {
  const s = m.scenario;
  const unit = paPerUnit(s.modulusUnit);
  const head = headerLines(s, [
    ['instrument', 'DMA, tension clamp, strain amplitude 0.1 %'],
    [
      'program',
      `stepped heating, ${setPointSpan(s.setPointsC)}, ${s.xValues.join('/')} ${s.xUnit}`,
    ],
  ]);
  const u = s.modulusUnit;
  const cells = ['Temperature[°C]', `Frequency[${s.xUnit}]`, `E'[${u}]`, `E''[${u}]`, 'tan_delta'];
  const body = m.isotherms.flatMap((iso) =>
    iso.points.map((p) => [
      formatCelsius(p.temperatureC, 2),
      formatSignificant(p.xFile, 4),
      formatSignificant(p.primaryPa / unit, 5),
      formatSignificant(p.lossPa / unit, 5),
      formatSignificant(p.lossPa / p.primaryPa, 4),
    ]),
  );
  const widths = cells.map((c, j) => Math.max(c.length, maxOf(body.map((r) => r[j].length))) + 2);
  const align = (r: string[]): string =>
    r.map((c, j) => (j === r.length - 1 ? c : c.padEnd(widths[j]))).join('');
  head.push(align(cells));
  return { head, rows: body.map(align) };
}

/** Writes the long table of the melt ('long') or ramp ('ramp') scenario. */
export function writeLongLayout(m: DemoMeasurements, fileName: string): DemoWritten {
  const { head, rows } = m.scenario.layout === 'ramp' ? rampTable(m) : meltTable(m);
  const lines = [...head, ...rows];
  let row = head.length;
  const sources = m.isotherms.map((iso) => iso.points.map(() => ({ file: fileName, row: ++row })));
  return { files: [{ path: fileName, content: lines.join('\n') + '\n' }], sources };
}
