/**
 * One file per isotherm, as a European DMA export writes them: semicolon delimiter, decimal
 * comma, CRLF line ends, units in brackets or after "in". Every other file states its temperature
 * in a metadata line; the rest carry it only in the file name (`seal_-20C.txt`).
 */
import type { DemoMeasurements, DemoWritten } from './demo-types';
import { headerLines, paPerUnit } from './demo-header';
import { formatSignificant } from './number-text';

/** File name of one isotherm: `<prefix>_<T>C.txt`, e.g. `seal_-20C.txt`. */
export function perIsothermFileName(prefix: string, setPointC: number): string {
  return `${prefix}_${setPointC}C.txt`;
}

/** Writes one file per isotherm; files with an even index state the temperature inside. */
export function writePerIsothermLayout(m: DemoMeasurements, prefix: string): DemoWritten {
  const s = m.scenario;
  const unit = paPerUnit(s.modulusUnit);
  const files: DemoWritten['files'] = [];
  const sources: DemoWritten['sources'] = [];
  m.isotherms.forEach((iso, k) => {
    const path = perIsothermFileName(prefix, iso.setPointC);
    const extra: [string, string][] = [
      ['instrument', 'DMA, tension clamp, strain amplitude 0.05 %'],
      ['test', 'frequency sweep from low to high frequency'],
    ];
    if (k % 2 === 0) extra.push(['Temperature', `${iso.setPointC} °C`]);
    const lines = headerLines(s, extra);
    lines.push(`Frequency in ${s.xUnit};E' [${s.modulusUnit}];E'' [${s.modulusUnit}];tan δ`);
    const first = lines.length;
    iso.points.forEach((p) =>
      lines.push(
        [
          formatSignificant(p.xFile, 5, 'plain', true),
          formatSignificant(p.primaryPa / unit, 5, 'plain', true),
          formatSignificant(p.lossPa / unit, 5, 'plain', true),
          formatSignificant(p.lossPa / p.primaryPa, 4, 'plain', true),
        ].join(';'),
      ),
    );
    files.push({ path, content: lines.join('\r\n') + '\r\n' });
    sources.push(iso.points.map((_, i) => ({ file: path, row: first + i + 1 })));
  });
  return { files, sources };
}
