/**
 * Wide layout: one shared time (or frequency) column and one column per temperature,
 * tab-delimited, LF line ends, moduli in instrument exponent style (1.2346E+03).
 * Every isotherm must share the same x values in the same order.
 */
import type { DemoMeasurements, DemoWritten } from './demo-types';
import { headerLines, paPerUnit } from './demo-header';
import { formatSignificant } from './number-text';

/** Writes the wide table: `t (s)` then `E(t) 20°C [MPa]`, … one column per set point. */
export function writeWideLayout(m: DemoMeasurements, fileName: string): DemoWritten {
  const s = m.scenario;
  const unit = paPerUnit(s.modulusUnit);
  const symbol = s.deformation === 'shear' ? 'G(t)' : 'E(t)';
  const lines = headerLines(s, [
    ['instrument', 'DMA, film tension clamp'],
    ['test', 'stress relaxation after a step strain of 0.5 %, one specimen per temperature'],
  ]);
  lines.push(
    [
      `t (${s.xUnit})`,
      ...m.isotherms.map((iso) => `${symbol} ${iso.setPointC}°C [${s.modulusUnit}]`),
    ].join('\t'),
  );
  const first = lines.length;
  s.xValues.forEach((x, i) => {
    const cells = m.isotherms.map((iso) => {
      if (iso.points[i].xFile !== x) throw new Error('wide layout needs a shared x column');
      return formatSignificant(iso.points[i].primaryPa / unit, 5, 'exp');
    });
    lines.push([formatSignificant(x, 5), ...cells].join('\t'));
  });
  const sources = m.isotherms.map((iso) =>
    iso.points.map((_, i) => ({ file: fileName, row: first + i + 1 })),
  );
  return { files: [{ path: fileName, content: lines.join('\n') + '\n' }], sources };
}
