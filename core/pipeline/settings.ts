/**
 * Settings as a lab writes them (a JSON settings file, the command line, the app's saved state):
 * temperatures in °C or with a K suffix, exclusions by temperature, masked points as "file:row".
 * `parseSettings` validates with messages naming the bad key; `settingsToImportOptions` and
 * `settingsToAnalysisOptions` turn them into the core's options (the latter needs the dataset to
 * match temperatures and files).
 */
import { z } from 'zod';
import { QUANTITY_IDS, type Dataset, type QuantityId } from '../data/types';
import { parseTemperatureText } from '../units/temperature';
import type { ImportOptions } from '../io/types';
import { describeIssue, shiftModelKindSchema, type AnalysisOptions } from './options';
import { MODULUS_UNITS, type ModulusUnit } from '../units/output-units';
import { toCelsius } from './temperature';
import { ZERO_CELSIUS_K } from '../data/temperature';

const quantityId = z.enum(QUANTITY_IDS as [QuantityId, ...QuantityId[]]);
/** °C as a number, or text such as "190", "190 °C", "463.15K". */
const temperature = z.union([z.number(), z.string().min(1)]);

const columnMapping = z.strictObject({
  file: z.string().optional(),
  column: z.union([z.number().int().min(1), z.string().min(1)]),
  role: z.enum([
    'temperature',
    'frequency',
    'angularFrequency',
    'time',
    'ignore',
    ...(QUANTITY_IDS as [QuantityId, ...QuantityId[]]),
  ]),
  unit: z.string().optional(),
  temperatureK: z.number().positive().optional(),
  deformation: z.enum(['shear', 'tension']).optional(),
});

export const settingsSchema = z.strictObject({
  /** Reference temperature: °C, or text with a unit ("463.15K"). @default automatic */
  referenceTemperature: temperature.optional(),
  /** Quantities that drive the horizontal shift. @default 'auto' */
  shiftBy: z.union([z.literal('auto'), z.array(quantityId).min(1)]).optional(),
  /** @default 'auto' */
  verticalShift: z.enum(['auto', 'none', 'density', 'data']).optional(),
  /** Density at the reference temperature, kg/m³ (for the record; bT needs only expansionPerK). */
  densityKgPerM3: z.number().positive().optional(),
  /** Volumetric thermal expansion coefficient αV, 1/K (for verticalShift 'density'). */
  expansionPerK: z.number().min(0).max(0.01).optional(),
  /** Registry kinds of the shift models to fit. @default every registered model */
  models: z.array(shiftModelKindSchema).optional(),
  /** 0 skips the Prony fit. @default 2 */
  pronyModesPerDecade: z.union([z.literal(0), z.literal(1), z.literal(2)]).optional(),
  /** Equilibrium modulus of the Prony series: 'auto' (0 for a liquid in its terminal zone), 'fit' or 'zero'. @default 'auto' */
  pronyEquilibrium: z.enum(['auto', 'fit', 'zero']).optional(),
  /** Glass transition temperature (°C or with unit). */
  glassTransition: temperature.optional(),
  /** Isotherms to leave out, by temperature (°C or with unit) or id ("T03"). @default [] */
  exclude: z.array(temperature).optional(),
  /** Points to leave out: "file:row" or "file:first-last" (1-based rows of that file). @default [] */
  mask: z.array(z.string().min(3)).optional(),
  /** Measured temperatures closer than this form one isotherm, K. @default 1 */
  groupingToleranceK: z.number().min(0).optional(),
  /** Explicit column mapping (see docs/cli.md). @default [] */
  columns: z.array(columnMapping).optional(),
  /** Unit of moduli in exports and the report. @default 'Pa' */
  modulusUnit: z.enum(MODULUS_UNITS as [ModulusUnit, ...ModulusUnit[]]).optional(),
});

export type Settings = z.infer<typeof settingsSchema>;

/** A setting that is wrong: `key` names it, `source` says where it came from. */
export class SettingsError extends Error {
  constructor(
    message: string,
    readonly key: string,
    readonly source: string,
  ) {
    super(message);
    this.name = 'SettingsError';
  }
}

/** Validates settings (e.g. a parsed JSON settings file). `source` names it in messages. */
export function parseSettings(value: unknown, source: string): Settings {
  const parsed = settingsSchema.safeParse(value);
  if (!parsed.success) {
    const { key, text } = describeIssue(parsed.error.issues[0]);
    throw new SettingsError(`${source}: ${text}`, key, source);
  }
  return parsed.data;
}

/** Later settings win, key by key (e.g. command line over settings file). */
export function mergeSettings(...layers: Settings[]): Settings {
  const out: Record<string, unknown> = {};
  for (const layer of layers)
    for (const [k, v] of Object.entries(layer)) if (v !== undefined) out[k] = v;
  return out as Settings;
}

/** Highest temperature a setting may name, K (1000 °C). */
export const MAX_SETTING_TEMPERATURE_K = 1273.15;

/** Reads a temperature setting: a number is °C; text may carry a unit ("463.15K", "190 °C"). */
export function settingTemperatureK(value: number | string, key: string, source: string): number {
  const reading =
    typeof value === 'number' ? parseTemperatureText(String(value)) : parseTemperatureText(value);
  if (!reading)
    throw new SettingsError(
      `${source}: ${key}: "${value}" is not a temperature (write °C, e.g. 190, or kelvin with K, e.g. 463.15K)`,
      key,
      source,
    );
  // No polymer is tested at or below 0 K or above 1000 °C: a value outside is a typo (1e20, or
  // kelvin written as °C twice) and would only produce numbers without meaning.
  if (!(reading.temperatureK > 0 && reading.temperatureK <= MAX_SETTING_TEMPERATURE_K))
    throw new SettingsError(
      `${source}: ${key}: "${value}" is outside the valid range (above ${-ZERO_CELSIUS_K} °C, at most 1000 °C)`,
      key,
      source,
    );
  // −20 °C + 273.15 gives 253.14999999999998 in binary floating point: round to 1e-9 K
  return Math.round(reading.temperatureK * 1e9) / 1e9;
}

export function settingsToImportOptions(s: Settings): ImportOptions {
  return {
    ...(s.groupingToleranceK !== undefined && { groupingToleranceK: s.groupingToleranceK }),
    ...(s.columns && { columns: s.columns }),
  };
}

/** The isotherm of `dataset` nearest a temperature, within the larger of 1 K and its spread. */
function isothermAt(dataset: Dataset, temperatureK: number): string | undefined {
  let best: { id: string; d: number } | undefined;
  for (const iso of dataset.isotherms) {
    const d = Math.abs(iso.temperatureK - temperatureK);
    if (d <= Math.max(1, iso.temperatureSpreadK) && (!best || d < best.d)) best = { id: iso.id, d };
  }
  return best?.id;
}

/** Parses "file:row" or "file:first-last" into rows of that file (matched to the dataset's files). */
export function parseMask(
  text: string,
  dataset: Dataset,
  source: string,
): { file: string; row: number }[] {
  const i = text.lastIndexOf(':');
  const m = i > 0 ? /^\s*(\d+)\s*(?:-\s*(\d+)\s*)?$/.exec(text.slice(i + 1)) : null;
  if (!m)
    throw new SettingsError(
      `${source}: mask: "${text}" is not FILE:ROW or FILE:FIRST-LAST`,
      'mask',
      source,
    );
  const wanted = text.slice(0, i);
  const base = (f: string): string => f.split(/[\\/]/).pop() ?? f;
  const file =
    dataset.files.find((f) => f === wanted) ?? dataset.files.find((f) => base(f) === base(wanted));
  if (!file)
    throw new SettingsError(
      `${source}: mask: file "${wanted}" is not one of the input files (${dataset.files.join(', ')})`,
      'mask',
      source,
    );
  const first = Number(m[1]);
  const last = m[2] ? Number(m[2]) : first;
  if (last < first)
    throw new SettingsError(
      `${source}: mask: "${text}" has its last row before its first`,
      'mask',
      source,
    );
  // The valid rows are those holding data in that file; refusing others here also keeps a typo
  // such as 1-4294967296 from building an array of four billion rows.
  let lastRow = 0;
  for (const iso of dataset.isotherms)
    for (const src of iso.source) if (src.file === file && src.row > lastRow) lastRow = src.row;
  if (first < 1 || last > lastRow)
    throw new SettingsError(
      `${source}: mask: "${text}" is outside the rows of ${file} that hold data (1-${lastRow})`,
      'mask',
      source,
    );
  return Array.from({ length: last - first + 1 }, (_, k) => ({ file, row: first + k }));
}

export function settingsToAnalysisOptions(
  s: Settings,
  dataset: Dataset,
  source: string,
): AnalysisOptions {
  const o: AnalysisOptions = {};
  if (s.referenceTemperature !== undefined)
    o.referenceTemperatureK = settingTemperatureK(
      s.referenceTemperature,
      'referenceTemperature',
      source,
    );
  if (s.shiftBy !== undefined) o.shiftQuantities = s.shiftBy;
  if (s.verticalShift !== undefined) o.verticalShift = s.verticalShift;
  if (s.verticalShift === 'density' && s.expansionPerK === undefined)
    throw new SettingsError(
      `${source}: verticalShift "density" needs expansionPerK (densityKgPerM3 is optional)`,
      'expansionPerK',
      source,
    );
  if (s.expansionPerK !== undefined && s.verticalShift !== 'none' && s.verticalShift !== 'data')
    o.density = {
      ...(s.densityKgPerM3 !== undefined && { referenceDensityKgPerM3: s.densityKgPerM3 }),
      volumetricExpansionPerK: s.expansionPerK,
    };
  if (s.models !== undefined) o.models = s.models;
  if (s.pronyModesPerDecade !== undefined) o.pronyModesPerDecade = s.pronyModesPerDecade;
  if (s.pronyEquilibrium !== undefined) o.pronyEquilibrium = s.pronyEquilibrium;
  if (s.glassTransition !== undefined)
    o.glassTransitionK = settingTemperatureK(s.glassTransition, 'glassTransition', source);
  if (s.exclude?.length) {
    o.excludedIsothermIds = s.exclude.map((t) => {
      if (typeof t === 'string' && dataset.isotherms.some((iso) => iso.id === t)) return t;
      const tk = settingTemperatureK(t, 'exclude', source);
      const id = isothermAt(dataset, tk);
      if (!id)
        throw new SettingsError(
          `${source}: exclude: no isotherm at ${toCelsius(tk)} °C (measured: ${dataset.isotherms.map((iso) => `${toCelsius(iso.temperatureK)} °C`).join(', ')})`,
          'exclude',
          source,
        );
      return id;
    });
  }
  if (s.mask?.length) o.maskedPoints = s.mask.flatMap((m) => parseMask(m, dataset, source));
  return o;
}
