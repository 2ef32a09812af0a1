import { parseTemperatureText } from '../units';
import type { TemperatureReading } from '../units';
import type { DeformationMode } from '../data/types';
import { splitCells } from './cells';
import type { DelimiterName } from './types';

/**
 * A metadata line above the table: "# key: value", "key = value", "key: value", or, in a
 * delimited file, "key;value". Returns undefined for anything else.
 */
export function parseMetadataLine(
  line: string,
  delimiter: DelimiterName,
): { key: string; value: string } | undefined {
  if (line.length > 1000) return undefined;
  const text = line.replace(/^\s*(#|%|!|\/\/)+\s*/, '').trim();
  const kv = /^([^:=]{1,80}?)\s*[:=]\s*(.*)$/.exec(text);
  if (kv && kv[1].trim() !== '') return { key: kv[1].trim(), value: unquote(kv[2].trim()) };
  if (delimiter !== 'spaces') {
    const cells = splitCells(text, delimiter).map((c) => c.trim());
    const rest = cells.slice(1).filter((c) => c !== '');
    if (cells[0] && /[A-Za-z]/.test(cells[0]) && rest.length === 1) {
      return { key: cells[0], value: rest[0] };
    }
  }
  return undefined;
}

function unquote(s: string): string {
  return s.length >= 2 && /^(["']).*\1$/.test(s) ? s.slice(1, -1) : s;
}

const TEMPERATURE_KEY =
  /^(?:t|temp|temperature|(?:test|set|sample|measuring|measurement|isotherm|nominal) temperature|temperature set ?point|set ?point|isotherm|t ?set)$/;

/** Key without a bracketed unit, lower case: "Temperature (°C)" → ["temperature", "°C"]. */
function splitKey(key: string): [string, string | undefined] {
  const m = /^(.*?)\s*[([]([^)\]]*)[)\]]\s*$/.exec(key);
  return m ? [m[1].trim().toLowerCase(), m[2]] : [key.trim().toLowerCase(), undefined];
}

/** The temperature a metadata block states ("# temperature: 40 °C", "T = 313.15 K"), if any. */
export function temperatureFromMetadata(
  metadata: Record<string, string>,
): { reading: TemperatureReading; key: string } | undefined {
  for (const [key, value] of Object.entries(metadata)) {
    const [name, unit] = splitKey(key);
    if (key.trim() !== 'T' && !TEMPERATURE_KEY.test(name)) continue;
    if (name === 't' && key.trim() !== 'T') continue; // lower-case t is time
    const reading = parseTemperatureText(value, unit);
    if (reading) return { reading, key };
  }
  return undefined;
}

/** "mode: tension", "deformation = shear", "geometry: parallel plate" → the deformation mode. */
export function deformationFromMetadata(
  metadata: Record<string, string>,
): DeformationMode | undefined {
  for (const [key, value] of Object.entries(metadata)) {
    if (
      !/^(?:mode|deformation(?: mode)?|test mode|geometry|clamp|fixture|instrument|test|method)$/i.test(
        key.trim(),
      )
    )
      continue;
    if (/tens|bend|flex|cantilever|dma|compress/i.test(value)) return 'tension';
    if (/shear|torsion|plate|cone|couette|rheomet/i.test(value)) return 'shear';
  }
  return undefined;
}

/** Metadata naming what the columns of a wide table hold ("quantity: E' [MPa]"). */
export function quantityFromMetadata(metadata: Record<string, string>): string | undefined {
  for (const [key, value] of Object.entries(metadata)) {
    if (/^(?:quantity|measured|property|values|data)$/i.test(key.trim())) return value;
  }
  return undefined;
}

/** Sample name from metadata (sample, sample name, material, specimen, name). */
export function nameFromMetadata(metadata: Record<string, string>): string | undefined {
  for (const [key, value] of Object.entries(metadata)) {
    if (/^(?:sample(?: ?(?:name|id))?|material|specimen|name)$/i.test(key.trim()) && value) {
      return value;
    }
  }
  return undefined;
}
