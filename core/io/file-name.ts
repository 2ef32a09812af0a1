import { parseTemperatureText } from '../units';
import type { TemperatureReading } from '../units';
import { splitSheetName } from './workbook';

/**
 * File name without folders and extension. A workbook's sheet ("seal.xlsx › 40 °C", see
 * workbook.ts) stands for a file of its own: its base name is the sheet's name, whole.
 */
export function baseName(name: string): string {
  const sheet = splitSheetName(name);
  if (sheet) return sheet.sheet;
  const file = name.split(/[\\/]/).pop() ?? name;
  const dot = file.lastIndexOf('.');
  return dot > 0 ? file.slice(0, dot) : file;
}

/**
 * "…_40C", "…-313K", "T=-20°C", "…_m20C", "…_40p5C", "…_-20C": temperature in a file name.
 * A "-" right after a letter or digit is a separator ("sample-313K" is 313 K); write negative
 * temperatures as "_-20C", "_m20C" or "T=-20C". When several match, the last one counts.
 */
const FILE_TEMPERATURE =
  /(?:^|[^A-Za-z0-9.])(?:T\s*=?\s*)?(m|-|minus)?(\d+(?:[.p,]\d+)?)\s*(°\s*C|°\s*F|deg\s*C|degC|℃|C|K|F)(?=$|[^A-Za-z0-9])/gi;

export function temperatureFromFileName(name: string): TemperatureReading | undefined {
  const base = baseName(name);
  if (base.length > 200) return undefined;
  let last: TemperatureReading | undefined;
  for (const m of base.matchAll(FILE_TEMPERATURE)) {
    const value = m[2].replace(/[p,]/i, '.');
    const t = parseTemperatureText(`${m[1] ? '-' : ''}${value} ${m[3]}`);
    if (t) last = t;
  }
  return last;
}

/** The file name with its temperature part removed: "elastomer_40C.csv" → "elastomer". */
export function sampleNameFromFileName(name: string): string {
  // A workbook holds one sample; its sheets are usually named by temperature or "Sheet1".
  const sheet = splitSheetName(name);
  if (sheet) return sampleNameFromFileName(sheet.workbook);
  const base = baseName(name);
  const stripped = base
    .replace(FILE_TEMPERATURE, '')
    .replace(/[\s_-]+$/, '')
    .trim();
  return stripped || base;
}
