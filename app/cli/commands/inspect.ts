/**
 * `thermoshift inspect FILE…`: shows what the importer recognised in the files of one sample
 * (layout, delimiter, columns and units, isotherms, warnings) without analysing anything.
 */
import { basename } from 'node:path';
import { Command, Option } from 'commander';
import { kelvinToCelsius, quantitySymbol } from '@core/data';
import type { ColumnMapping, ColumnRole, ImportResult } from '@core/io';
import { COLUMN_ROLES, expandWorkbooks, ImportError, importFiles, layoutText } from '@core/io';
import { parseTemperatureText } from '@core/units';
import { CliError } from '../cli-error.ts';
import { EXIT } from '../exit-codes.ts';
import { skippedLines, type SkippedFile } from '../io/input-files.ts';
import { readInputs, type InputFile } from '../io/read-inputs.ts';

interface InspectOptions {
  json?: boolean;
  tolerance?: string;
  column?: string[];
  fileTemperature?: string[];
  testKind?: 'oscillatory' | 'relaxation' | 'creep';
  deformation?: 'shear' | 'tension';
}

const collect = (value: string, previous: string[] = []): string[] => [...previous, value];

/**
 * Files named on the command line, read as build and batch read them (../io/read-inputs.ts: the
 * same folder walk, decoding and chunked reading). Skipped files are told on stderr.
 */
export function readSourceFiles(paths: string[]): InputFile[] {
  const skipped: SkippedFile[] = [];
  const files = readInputs(paths, skipped);
  process.stderr.write(skippedLines(skipped));
  return files;
}

/** "COL=ROLE[:UNIT][@TEMPERATURE]" → a column mapping; COL is a 1-based index or header text. */
export function parseColumnSpec(text: string): ColumnMapping {
  const m = /^(.+)=([A-Za-z]+)(?::([^@]*))?(?:@(.+))?$/.exec(text.trim());
  const role = m?.[2] as ColumnRole | undefined;
  if (!m || !role || !COLUMN_ROLES.includes(role)) {
    throw new CliError(
      `--column "${text}": write COLUMN=ROLE[:UNIT][@TEMPERATURE], e.g. "3=storageModulus:MPa"; ` +
        `ROLE is one of ${COLUMN_ROLES.join(', ')}`,
      EXIT.usage,
    );
  }
  const col = m[1].trim();
  const mapping: ColumnMapping = { column: /^\d+$/.test(col) ? Number(col) : col, role };
  if (m[3] !== undefined && m[3].trim() !== '') mapping.unit = m[3].trim();
  if (m[4] !== undefined) {
    const t = parseTemperatureText(m[4]);
    if (!t)
      throw new CliError(
        `--column "${text}": "${m[4]}" is not a temperature (e.g. 40C or 313.15K)`,
        EXIT.usage,
      );
    mapping.temperatureK = t.temperatureK;
  }
  return mapping;
}

/**
 * "FILE=T" specs → temperatures in kelvin by input file name (the name or its last part).
 * `strict`: a spec naming no input file is an error (off in batch, where it names one sample's file).
 */
export function fileTemperatures(
  specs: string[],
  files: { name: string }[],
  strict = true,
): Record<string, number> {
  const out: Record<string, number> = {};
  for (const spec of specs) {
    const eq = spec.lastIndexOf('=');
    const t = eq > 0 ? parseTemperatureText(spec.slice(eq + 1)) : undefined;
    if (!t)
      throw new CliError(
        `--file-temperature "${spec}": write FILE=TEMPERATURE, e.g. "seal_a.txt=40C"`,
        EXIT.usage,
      );
    const key = spec.slice(0, eq).trim();
    const hits = files.filter((f) => f.name === key || basename(f.name) === key);
    if (hits.length === 0 && strict)
      throw new CliError(
        `--file-temperature "${spec}": no input file is called "${key}"`,
        EXIT.usage,
      );
    for (const f of hits) out[f.name] = t.temperatureK;
  }
  return out;
}

function tolerance(text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  const v = Number(text);
  if (!(text.trim() !== '' && Number.isFinite(v) && v >= 0)) {
    throw new CliError(`--tolerance: "${text}" is not a number of kelvin ≥ 0`, EXIT.usage);
  }
  return v;
}

const C = (k: number): number => Number(kelvinToCelsius(k).toFixed(2));
const g = (v: number): string => Number(v.toPrecision(4)).toString();

/** The inspection as plain data: what `--json` prints. */
export function inspection(r: ImportResult) {
  const d = r.dataset;
  const xUnit = d.abscissa === 'time' ? 's' : 'rad/s';
  return {
    sample: {
      name: d.name,
      testKind: d.testKind,
      deformation: d.deformation,
      abscissa: d.abscissa,
      xUnit,
    },
    groupingToleranceK: r.options.groupingToleranceK,
    grouping: r.grouping,
    files: r.files,
    isotherms: r.groups.map((gr) => ({
      id: gr.id,
      temperatureC: C(gr.temperatureK),
      temperatureK: Number(gr.temperatureK.toFixed(3)),
      spreadK: Number(gr.temperatureSpreadK.toFixed(3)),
      points: gr.points,
      xMin: gr.xMin,
      xMax: gr.xMax,
      quantities: gr.quantities.map((q) => ({
        id: q,
        symbol: quantitySymbol(q, d.deformation),
        unit: r.units[q] ?? '',
        derived: r.derived.includes(q),
      })),
      files: gr.files,
    })),
    warnings: r.warnings,
    metadata: d.metadata,
  };
}

const DELIMITER_WORDS = {
  comma: 'comma',
  semicolon: 'semicolon',
  tab: 'tab',
  spaces: 'spaces',
} as const;
/** The inspection as text for people. */
export function inspectionText(r: ImportResult): string {
  const v = inspection(r);
  const xName = r.abscissa === 'time' ? 't (s)' : 'ω (rad/s)';
  const out: string[] = [
    `Sample "${v.sample.name}": ${v.sample.testKind}, ${v.sample.deformation}, x = ${xName}, ${r.files.length} file(s)`,
  ];
  for (const f of r.files) {
    const t =
      f.temperatureK !== undefined
        ? `, temperature ${C(f.temperatureK)} °C (from ${f.temperatureFrom})`
        : '';
    out.push(
      '',
      `${f.file}: ${layoutText(f.layout).name}${t}; delimiter ${DELIMITER_WORDS[f.delimiter]}, decimal "${f.decimalSeparator}", ${f.encoding}; ` +
        `header row ${f.headerRow || '–'}, units row ${f.unitsRow || '–'}; ${f.usedRows} of ${f.dataRows} rows used`,
    );
    for (const c of f.columns) {
      const temp = c.temperatureK !== undefined ? ` at ${C(c.temperatureK)} °C` : '';
      const what =
        c.role === 'ignore'
          ? `ignored${c.note ? ` (${c.note})` : ''}`
          : `${c.role}${temp}, ${c.unit || '–'} → ${c.siUnit || '–'}${c.note ? ` (${c.note})` : ''}`;
      out.push(`  column ${c.index} "${c.header}": ${what}`);
    }
  }
  out.push('', `Isotherms (grouping tolerance ${v.groupingToleranceK} K):`);
  out.push(`  how they were formed: ${r.grouping.description}`);
  out.push(
    `  ${'id'.padEnd(5)}${'T (°C)'.padStart(9)}${'spread (K)'.padStart(12)}${'points'.padStart(8)}  ${`${xName} range`.padEnd(22)}quantities`,
  );
  for (const i of v.isotherms) {
    const qs = i.quantities
      .map((q) => `${q.symbol}${q.unit ? ` (${q.unit})` : ''}${q.derived ? ' derived' : ''}`)
      .join(', ');
    out.push(
      `  ${i.id.padEnd(5)}${i.temperatureC.toFixed(2).padStart(9)}${i.spreadK.toFixed(2).padStart(12)}${String(i.points).padStart(8)}  ${`${g(i.xMin)} – ${g(i.xMax)}`.padEnd(22)}${qs}`,
    );
  }
  out.push('', r.warnings.length === 0 ? 'No warnings.' : `Warnings (${r.warnings.length}):`);
  for (const w of r.warnings) {
    const where = [w.file, w.row ? `row ${w.row}` : '', w.column ? `column ${w.column}` : '']
      .filter(Boolean)
      .join(', ');
    out.push(`  ${where}: ${w.message}`);
  }
  out.push(
    '',
    'Check the columns and units above against the instrument settings before building a master curve (docs/import.md).',
  );
  return `${out.join('\n')}\n`;
}

export function registerInspect(program: Command): void {
  program
    .command('inspect')
    .description(
      'Show what is recognised in FILE… (one sample): columns, units, isotherms, warnings',
    )
    .argument('<files...>', 'data files, or a folder standing for the data files in it')
    .option('--json', 'print the inspection as JSON')
    .option(
      '--tolerance <K>',
      'measured temperatures closer than this many kelvin form one isotherm, unless they are separate steady sweeps (default 1)',
    )
    .option(
      '--column <COL=ROLE[:UNIT][@T]>',
      'explicit column mapping, e.g. "3=storageModulus:MPa" or "2=relaxationModulus:MPa@40C"; repeatable',
      collect,
    )
    .option(
      '--file-temperature <FILE=T>',
      'temperature of a one-isotherm file, e.g. "run7.txt=40C"; repeatable',
      collect,
    )
    .addOption(
      new Option('--test-kind <kind>', 'override the test kind').choices([
        'oscillatory',
        'relaxation',
        'creep',
      ]),
    )
    .addOption(
      new Option('--deformation <mode>', 'override the deformation mode').choices([
        'shear',
        'tension',
      ]),
    )
    .action(async (paths: string[], o: InspectOptions) => {
      const read = readSourceFiles(paths);
      const toleranceK = tolerance(o.tolerance);
      let result: ImportResult;
      try {
        const files = await expandWorkbooks(read);
        result = importFiles(files, {
          ...(toleranceK !== undefined ? { groupingToleranceK: toleranceK } : {}),
          columns: (o.column ?? []).map(parseColumnSpec),
          fileTemperatureK: fileTemperatures(o.fileTemperature ?? [], files),
          ...(o.testKind ? { testKind: o.testKind } : {}),
          ...(o.deformation ? { deformation: o.deformation } : {}),
        });
      } catch (e) {
        if (e instanceof ImportError) throw new CliError(e.message, EXIT.dataError);
        throw e;
      }
      process.stdout.write(
        o.json ? `${JSON.stringify(inspection(result), null, 2)}\n` : inspectionText(result),
      );
    });
}
