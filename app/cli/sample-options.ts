/**
 * The analysis options shared by `build` and `batch`: declared once on a command, read back as
 * Settings (the same shape as a settings file), merged with `--settings FILE` (command line wins).
 * Every value is checked here with a message naming the option.
 */
import { Command, Option } from 'commander';
import { QUANTITY_IDS, type QuantityId } from '@core/data';
import {
  mergeSettings,
  parseSettings,
  settingTemperatureK,
  shiftModelKinds,
  type Settings,
} from '@core/pipeline';
import { MODULUS_UNITS } from '@core/units';
import { CliError } from './cli-error.ts';
import { EXIT } from './exit-codes.ts';
import { readSettingsFile } from './io/settings-file.ts';

/** Short names accepted by --shift-by, besides the full quantity ids. */
export const QUANTITY_ALIASES: Record<string, QuantityId> = {
  storage: 'storageModulus',
  loss: 'lossModulus',
  tandelta: 'tanDelta',
  tan: 'tanDelta',
  phase: 'phaseAngle',
  complex: 'complexModulus',
  viscosity: 'complexViscosity',
  relaxation: 'relaxationModulus',
  creep: 'creepCompliance',
};

const collect = (value: string, previous: string[] = []): string[] => [
  ...previous,
  ...value
    .split(',')
    .map((s) => s.trim())
    .filter(Boolean),
];
const collectWhole = (value: string, previous: string[] = []): string[] => [...previous, value];

/** Shown after each command's option list. */
export const HELP_FOOTER = `
Exit codes: 0 done (warnings may have been printed), 1 data could not be read or analysed,
2 wrong command line or settings, 3 an output file exists (use --force) or cannot be written,
4 batch finished with failed samples, 70 internal error (rerun with --debug and report it).
Full reference: docs/cli.md. Master curves are engineering estimates: mind extrapolation, the
validity of superposition and the linear range; confirm by testing and follow the applicable
codes and licensed engineering practice.
`;

export function addSampleOptions(cmd: Command): Command {
  return cmd
    .addHelpText('after', HELP_FOOTER)
    .option(
      '--tref <T>',
      'reference temperature: °C (190) or kelvin with K (463.15K); default: the measured temperature nearest the middle of the range',
    )
    .option(
      '--shift-by <quantities>',
      `quantities that drive the horizontal shift, comma-separated (${Object.keys(QUANTITY_ALIASES).join(', ')} or full ids), or "auto"`,
    )
    .addOption(
      new Option(
        '--vertical <mode>',
        'vertical shift bT: auto (default: bT from the data when they carry one, the density when --expansion is given), none, density (entropic, needs --expansion; --density optional, for the record) or data (αV of the entropic law fitted to the data)',
      ).choices(['auto', 'none', 'density', 'data']),
    )
    .option(
      '--density <kg/m3>',
      'density at the reference temperature, kg/m³ (for the record: bT depends on --expansion alone)',
    )
    .option(
      '--expansion <1/K>',
      'volumetric thermal expansion coefficient αV, 1/K (for --vertical density, or auto)',
    )
    .option(
      '--models <list>',
      `shift-factor models to fit: ${shiftModelKinds().join(', ')} (comma-separated) or none`,
    )
    .addOption(
      new Option(
        '--modes-per-decade <n>',
        'Prony relaxation times per decade (0 = no Prony series; default 2, which meets the 3 % fit target)',
      ).choices(['0', '1', '2']),
    )
    .addOption(
      new Option(
        '--prony-equilibrium <mode>',
        'equilibrium modulus Ge of the Prony series: auto (0 when the data reach the terminal zone of a liquid), fit or zero (default auto)',
      ).choices(['auto', 'fit', 'zero']),
    )
    .option(
      '--tg <T>',
      'glass transition temperature (°C or K suffix): WLF constants are also given at Tg',
    )
    .option(
      '--exclude <T>',
      'leave an isotherm out, by temperature (°C or K suffix) or id; repeat or comma-separate',
      collect,
    )
    .option(
      '--mask <FILE:ROW>',
      'leave points out: FILE:ROW or FILE:FIRST-LAST (rows as numbered in that file); repeatable',
      collectWhole,
    )
    .option(
      '--group-tolerance <K>',
      'measured temperatures closer than this many kelvin form one isotherm, unless they are separate steady sweeps (default 1)',
    )
    .option(
      '--file-temperature <FILE=T>',
      'temperature of a one-isotherm file that names none, e.g. "run7.txt=40C"; repeatable',
      collectWhole,
    )
    .option(
      '--column <COL=ROLE[:UNIT]>',
      'explicit column mapping, e.g. "Freq=frequency:Hz" or "3=storageModulus:MPa"; repeatable',
      collectWhole,
    )
    .addOption(
      new Option('--modulus-unit <unit>', 'unit of moduli in the output files and report').choices([
        ...MODULUS_UNITS,
      ]),
    )
    .option(
      '--settings <file>',
      'JSON settings file (see docs/cli.md); command-line options override it',
    );
}

export interface SampleOptionValues {
  tref?: string;
  shiftBy?: string;
  vertical?: 'auto' | 'none' | 'density' | 'data';
  density?: string;
  expansion?: string;
  models?: string;
  modesPerDecade?: string;
  pronyEquilibrium?: 'auto' | 'fit' | 'zero';
  tg?: string;
  exclude?: string[];
  mask?: string[];
  groupTolerance?: string;
  column?: string[];
  fileTemperature?: string[];
  modulusUnit?: string;
  settings?: string;
}

function usage(message: string): CliError {
  return new CliError(message, EXIT.usage);
}

function positiveNumber(text: string, option: string, allowZero: boolean, max: number): number {
  const v = Number(text);
  if (!Number.isFinite(v) || v < 0 || (!allowZero && v === 0))
    throw usage(`${option}: "${text}" is not a ${allowZero ? 'non-negative' : 'positive'} number`);
  if (v > max)
    throw usage(
      `${option}: "${text}" is outside the valid range (${allowZero ? 0 : 'above 0'} to ${max})`,
    );
  return v;
}

/**
 * Upper bounds of the numeric options: far beyond any real material (densest solids ≈ 22,600
 * kg/m³; polymers expand by ≈ 1e-4 to 1e-3 per K, common practice), so only typos are refused.
 */
const MAX_DENSITY_KG_PER_M3 = 100_000;
const MAX_EXPANSION_PER_K = 0.1;
const MAX_GROUP_TOLERANCE_K = 1000;

function quantityList(text: string): 'auto' | QuantityId[] {
  if (text.trim() === 'auto') return 'auto';
  return text.split(',').map((raw) => {
    const s = raw.trim();
    const id = (QUANTITY_IDS as readonly string[]).includes(s)
      ? (s as QuantityId)
      : QUANTITY_ALIASES[s.toLowerCase()];
    if (!id)
      throw usage(
        `--shift-by: unknown quantity "${s}" (use ${Object.keys(QUANTITY_ALIASES).join(', ')}, a full id such as storageModulus, or auto)`,
      );
    return id;
  });
}

/** "COL=ROLE[:UNIT]" → a column mapping; COL is a 1-based index or header text. */
export function parseColumnOption(text: string): NonNullable<Settings['columns']>[number] {
  const eq = text.lastIndexOf('=');
  if (eq <= 0) throw usage(`--column: "${text}" is not COLUMN=ROLE or COLUMN=ROLE:UNIT`);
  const col = text.slice(0, eq).trim();
  const [role, ...unitParts] = text.slice(eq + 1).split(':');
  const unit = unitParts.join(':').trim();
  return {
    column: /^\d+$/.test(col) ? Number(col) : col,
    role: role.trim() as NonNullable<Settings['columns']>[number]['role'],
    ...(unit && { unit }),
  };
}

/** The command-line options as Settings (only the ones given). */
export function optionsToSettings(o: SampleOptionValues): Settings {
  const s: Record<string, unknown> = {};
  if (o.tref !== undefined) {
    settingTemperatureK(o.tref, '--tref', 'command line'); // checked here to name the option
    s.referenceTemperature = o.tref;
  }
  if (o.shiftBy !== undefined) s.shiftBy = quantityList(o.shiftBy);
  if (o.vertical !== undefined) s.verticalShift = o.vertical;
  if (o.density !== undefined)
    s.densityKgPerM3 = positiveNumber(o.density, '--density', false, MAX_DENSITY_KG_PER_M3);
  if (o.expansion !== undefined)
    s.expansionPerK = positiveNumber(o.expansion, '--expansion', true, MAX_EXPANSION_PER_K);
  if (o.models !== undefined)
    s.models =
      o.models.trim() === 'none' ? [] : o.models.split(',').map((m) => m.trim().toLowerCase());
  if (o.modesPerDecade !== undefined) s.pronyModesPerDecade = Number(o.modesPerDecade);
  if (o.pronyEquilibrium !== undefined) s.pronyEquilibrium = o.pronyEquilibrium;
  if (o.tg !== undefined) {
    settingTemperatureK(o.tg, '--tg', 'command line');
    s.glassTransition = o.tg;
  }
  if (o.exclude?.length) s.exclude = o.exclude;
  if (o.mask?.length) s.mask = o.mask;
  if (o.groupTolerance !== undefined)
    s.groupingToleranceK = positiveNumber(
      o.groupTolerance,
      '--group-tolerance',
      true,
      MAX_GROUP_TOLERANCE_K,
    );
  if (o.column?.length) s.columns = o.column.map(parseColumnOption);
  if (o.modulusUnit !== undefined) s.modulusUnit = o.modulusUnit;
  return parseSettings(s, 'command line');
}

/** Settings file (if any) overridden by the command line. */
export function resolveSettings(o: SampleOptionValues): Settings {
  const fromCli = optionsToSettings(o);
  return o.settings ? mergeSettings(readSettingsFile(o.settings), fromCli) : fromCli;
}
