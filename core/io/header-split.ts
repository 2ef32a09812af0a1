import { parseTemperatureText, parseUnit } from '../units';
import type { TemperatureReading } from '../units';
import { recogniseName } from './header-name';
import type { RecognisedName } from './header-name';

/** A header cell taken apart: name, unit text, recognised role, and (wide layout) a temperature. */
export interface HeaderInfo {
  raw: string;
  name: string;
  /** Unit as written ('' when none). */
  unitText: string;
  recognised?: RecognisedName;
  /** Temperature written in the header ("G' 40°C", "E'(T=-20 C) [MPa]", "40"). */
  temperature?: TemperatureReading;
}

const NUM = String.raw`([-+−]?\d+(?:[.,]\d+)?)`;
const T_UNIT = String.raw`(°\s*[CF]|deg\s*[CF]|℃|℉|K|C|F)`;
/** "40°C", "-20 C", "313 K", optionally after "T=", "@" or "at". */
const TEMP_WITH_UNIT = new RegExp(
  String.raw`(?:\bT\s*=\s*|@\s*|\bat\s+)?${NUM}\s*${T_UNIT}(?![A-Za-z])`,
);
/** "T=40" without a unit (°C assumed). */
const TEMP_AFTER_T = new RegExp(String.raw`\bT\s*=\s*${NUM}(?![\d.,])`);
const PURE_NUMBER = new RegExp(String.raw`^\s*${NUM}\s*$`);

function stripQuotes(s: string): string {
  const t = s.trim();
  return t.length >= 2 && t.startsWith('"') && t.endsWith('"') ? t.slice(1, -1).trim() : t;
}

function tidy(s: string): string {
  return s
    .replace(/\(\s*\)|\[\s*\]/g, '')
    .replace(/\s+/g, ' ')
    .replace(/^[\s_@,;-]+|[\s_@,;-]+$/g, '')
    .trim();
}

/** Takes a temperature out of a header; returns the rest. */
function takeTemperature(h: string): { rest: string; temperature?: TemperatureReading } {
  const pure = PURE_NUMBER.exec(h);
  if (pure) {
    const t = parseTemperatureText(pure[1]);
    return t ? { rest: '', temperature: t } : { rest: h };
  }
  const m = TEMP_WITH_UNIT.exec(h) ?? TEMP_AFTER_T.exec(h);
  if (!m) return { rest: h };
  const t = parseTemperatureText(m[2] ? `${m[1]} ${m[2]}` : m[1]);
  if (!t) return { rest: h };
  return { rest: tidy(h.slice(0, m.index) + ' ' + h.slice(m.index + m[0].length)), temperature: t };
}

interface Split {
  name: string;
  unit: string;
}

/** Ways a unit is attached to a name, most explicit first. */
function splits(h: string): Split[] {
  const out: Split[] = [];
  const bracket = /^(.*?)\s*\[([^\]]*)\]\s*$/.exec(h);
  if (bracket) out.push({ name: bracket[1], unit: bracket[2] });
  const paren = /^(.*?)\s*\(([^()]*)\)\s*$/.exec(h);
  if (paren) out.push({ name: paren[1], unit: paren[2] });
  const inWord = /^(.*?)\s+in\s+(\S.*)$/i.exec(h);
  if (inWord) out.push({ name: inWord[1], unit: inWord[2] });
  for (let i = h.indexOf('/'); i > 0; i = h.indexOf('/', i + 1)) {
    out.push({ name: h.slice(0, i), unit: h.slice(i + 1) });
  }
  const comma = /^(.*?),\s*(\S+)$/.exec(h);
  if (comma) out.push({ name: comma[1], unit: comma[2] });
  return out;
}

/** Splits at "_" or a space, accepted only when the tail is a known unit ("Temp_C", "f Hz"). */
function looseSplits(h: string): Split[] {
  const out: Split[] = [];
  for (let i = h.length - 1; i > 0; i--) {
    const c = h[i];
    if (c === '_' || c === ' ') {
      const unit = h.slice(i + 1);
      if (unit && parseUnit(unit).ok) out.push({ name: h.slice(0, i), unit });
    }
  }
  return out;
}

/**
 * Reads a header cell: "Temperature (°C)", "G' [MPa]", "Storage modulus in MPa", "f/Hz",
 * "freq_Hz", "E'(T=-20 C) [MPa]", "G' 40°C", "40" … Unrecognised names come back without
 * `recognised`; the unit text is then still split off when it is written in brackets.
 */
export function splitHeader(cell: string): HeaderInfo {
  const raw = stripQuotes(cell);
  if (raw.length === 0 || raw.length > 120) return { raw, name: raw, unitText: '' };
  const { rest, temperature } = takeTemperature(raw);
  const base = { raw, ...(temperature ? { temperature } : {}) };
  if (rest === '') return { ...base, name: '', unitText: '' };
  const whole = recogniseName(rest);
  if (whole) return { ...base, name: rest, unitText: '', recognised: whole };
  for (const s of [...splits(rest), ...looseSplits(rest)]) {
    const name = tidy(s.name);
    const recognised = recogniseName(name);
    if (recognised) return { ...base, name, unitText: s.unit.trim(), recognised };
  }
  const first = splits(rest)[0];
  if (first && first.name.trim() === '' && parseUnit(first.unit).ok) {
    return { ...base, name: '', unitText: first.unit.trim() };
  }
  return first
    ? { ...base, name: tidy(first.name), unitText: first.unit.trim() }
    : { ...base, name: rest, unitText: '' };
}
