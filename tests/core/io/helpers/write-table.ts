/**
 * Writes a known-truth dataset (core/synthetic) as lab-style text in a chosen layout, delimiter,
 * decimal separator and units, so import tests can compare what comes back with the truth.
 * The unit factors here are written out from the sources (SI Brochure, BIPM 2019; NIST SP 811,
 * 2008), independently of core/units.
 */
import type { Dataset, QuantityId } from '../../../../core/data/types';

export type TempUnit = '°C' | 'K' | '°F';
export interface WriteOptions {
  delimiter?: ',' | ';' | '\t' | '   ';
  decimalComma?: boolean;
  crlf?: boolean;
  bom?: boolean;
  temperatureUnit?: TempUnit;
  /** 'Hz' writes f = ω/(2π); 'rad/s' writes ω; 's'/'min'/'h' write t. */
  xUnit?: 'Hz' | 'rad/s' | 's' | 'min' | 'h';
  /** Unit and its value in Pa (or Pa·s, 1/Pa) per quantity. */
  units?: Partial<Record<QuantityId, [unit: string, perUnit: number]>>;
  /** Header text (without unit) per quantity. */
  names?: Partial<Record<QuantityId, string>>;
  metadata?: string[];
  unitsRow?: boolean;
}

export const KELVIN: Record<TempUnit, (k: number) => number> = {
  '°C': (k) => k - 273.15, // SI Brochure (BIPM, 2019): t/°C = T/K − 273.15
  K: (k) => k,
  '°F': (k) => k * 1.8 - 459.67, // NIST SP 811 (2008), B.9
};

const X_FROM_SI: Record<NonNullable<WriteOptions['xUnit']>, (v: number) => number> = {
  Hz: (w) => w / (2 * Math.PI), // ω = 2πf (SI Brochure, BIPM 2019)
  'rad/s': (w) => w,
  s: (t) => t,
  min: (t) => t / 60,
  h: (t) => t / 3600,
};

const DEFAULT_NAMES: Record<QuantityId, string> = {
  storageModulus: "G'",
  lossModulus: "G''",
  tanDelta: 'tan δ',
  phaseAngle: 'δ',
  complexModulus: '|G*|',
  complexViscosity: '|η*|',
  relaxationModulus: 'G(t)',
  creepCompliance: 'J(t)',
};

const DEFAULT_UNITS: Record<QuantityId, string> = {
  storageModulus: 'Pa',
  lossModulus: 'Pa',
  tanDelta: '-',
  phaseAngle: '°',
  complexModulus: 'Pa',
  complexViscosity: 'Pa·s',
  relaxationModulus: 'Pa',
  creepCompliance: '1/Pa',
};

function num(v: number, decimalComma: boolean): string {
  const s = String(v);
  return decimalComma ? s.replace('.', ',') : s;
}

function setup(ds: Dataset, o: WriteOptions) {
  const d = o.delimiter ?? ',';
  const dc = o.decimalComma ?? false;
  const tu = o.temperatureUnit ?? '°C';
  const xu = o.xUnit ?? (ds.abscissa === 'time' ? 's' : 'rad/s');
  const qs = (Object.keys(ds.isotherms[0].quantities) as QuantityId[]).filter(
    (q) => ds.isotherms[0].quantities[q],
  );
  const unitOf = (q: QuantityId): [string, number] => o.units?.[q] ?? [DEFAULT_UNITS[q], 1];
  const nameOf = (q: QuantityId) => o.names?.[q] ?? DEFAULT_NAMES[q];
  const xName = ds.abscissa === 'time' ? 'Time' : xu === 'Hz' ? 'Frequency' : 'Angular frequency';
  const eol = o.crlf ? '\r\n' : '\n';
  const head = [...(o.metadata ?? []).map((m) => `# ${m}`)];
  return { d, dc, tu, xu, qs, unitOf, nameOf, xName, eol, head };
}

/** Long layout: T, x, quantities; one row per point. */
export function writeLong(ds: Dataset, o: WriteOptions = {}): string {
  const s = setup(ds, o);
  const lines = [...s.head];
  if (o.unitsRow) {
    lines.push(['Temperature', s.xName, ...s.qs.map(s.nameOf)].join(s.d));
    lines.push([s.tu, s.xu, ...s.qs.map((q) => s.unitOf(q)[0])].join(s.d));
  } else {
    lines.push(
      [
        `Temperature (${s.tu})`,
        `${s.xName} (${s.xu})`,
        ...s.qs.map((q) => `${s.nameOf(q)} [${s.unitOf(q)[0]}]`),
      ].join(s.d),
    );
  }
  for (const iso of ds.isotherms) {
    iso.x.forEach((x, i) => {
      const cells = [
        KELVIN[s.tu](iso.temperatureK),
        X_FROM_SI[s.xu](x),
        ...s.qs.map((q) => iso.quantities[q]![i] / s.unitOf(q)[1]),
      ];
      lines.push(cells.map((v) => num(v, s.dc)).join(s.d));
    });
  }
  return (o.bom ? '\uFEFF' : '') + lines.join(s.eol) + s.eol;
}

/** One file per isotherm, the temperature in a metadata line (or none: use the file name). */
export function writePerIsotherm(
  ds: Dataset,
  o: WriteOptions & { temperatureLine?: boolean } = {},
): string[] {
  const s = setup(ds, o);
  return ds.isotherms.map((iso) => {
    const lines = [...s.head];
    if (o.temperatureLine ?? true)
      lines.push(`# Temperature: ${KELVIN[s.tu](iso.temperatureK)} ${s.tu}`);
    lines.push(
      [`${s.xName} (${s.xu})`, ...s.qs.map((q) => `${s.nameOf(q)} [${s.unitOf(q)[0]}]`)].join(s.d),
    );
    iso.x.forEach((x, i) => {
      lines.push(
        [X_FROM_SI[s.xu](x), ...s.qs.map((q) => iso.quantities[q]![i] / s.unitOf(q)[1])]
          .map((v) => num(v, s.dc))
          .join(s.d),
      );
    });
    return lines.join(s.eol) + s.eol;
  });
}

/** Wide layout: shared x column (all isotherms must share x), one column per quantity and temperature. */
export function writeWide(ds: Dataset, o: WriteOptions = {}): string {
  const s = setup(ds, o);
  const lines = [...s.head];
  const header = [`${s.xName} (${s.xu})`];
  for (const iso of ds.isotherms) {
    for (const q of s.qs)
      header.push(`${s.nameOf(q)} ${KELVIN[s.tu](iso.temperatureK)}${s.tu} [${s.unitOf(q)[0]}]`);
  }
  lines.push(header.join(s.d));
  ds.isotherms[0].x.forEach((x, i) => {
    const cells = [X_FROM_SI[s.xu](x)];
    for (const iso of ds.isotherms)
      for (const q of s.qs) cells.push(iso.quantities[q]![i] / s.unitOf(q)[1]);
    lines.push(cells.map((v) => num(v, s.dc)).join(s.d));
  });
  return lines.join(s.eol) + s.eol;
}
