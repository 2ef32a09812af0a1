/**
 * `thermoshift compare REF SAMPLE… [--spec FILE] [--tref T] [--json] [--out DIR]`: compares the
 * master curve of each SAMPLE with that of REF (core/compare compareAnalyses). Each argument is a
 * data file, a folder of per-isotherm files, or a saved analysis (`*.thermoshift.json`). Prints a
 * summary (or the comparison as JSON with --json); --out writes comparison.json, the differences
 * and verdicts as CSV and a printable report. With --spec the exit code says the verdict:
 * EXIT.specFailed when a sample failed a criterion, EXIT.specInconclusive when none failed but one
 * was inconclusive (docs/compare.md, README "Command line").
 */
import { kelvinToCelsius } from '@core/data';
import { Command } from 'commander';
import { readFileSync } from 'node:fs';
import { compareAnalyses } from '@core/compare';
import { comparisonCsv, verdictsCsv } from '@core/compare';
import { comparisonReportHtml } from '@core/compare';
import { parseSpecification, SpecError, type Specification } from '@core/compare';
import { CompareError } from '@core/compare';
import type { Comparison } from '@core/compare';
import { buildMasterCurve } from '@core/pipeline';
import { settingTemperatureK, type Settings } from '@core/pipeline';
import type { Analysis } from '@core/pipeline';
import { parseAnalysis, ANALYSIS_FILE_SUFFIX } from '@core/document';
import { addSampleOptions, resolveSettings, type SampleOptionValues } from '../sample-options.ts';
import { readInputs } from '../io/read-inputs.ts';
import { analyseSample } from '../run-sample.ts';
import { writeOutputSet } from '../io/output-set.ts';
import { toCliError } from '../error-map.ts';
import { CliError } from '../cli-error.ts';
import { EXIT } from '../exit-codes.ts';
import { checkDate } from './build.ts';

interface CompareOptionValues extends SampleOptionValues {
  spec?: string;
  json?: boolean;
  out?: string;
  force?: boolean;
  date?: string;
}

export const COMPARE_OUTPUT_FILES = [
  'comparison.json',
  'comparison-differences.csv',
  'comparison-verdicts.csv',
  'comparison-report.html',
] as const;

/** Reads a specification file; a bad one is a usage error naming the file and entry. */
export function readSpecFile(path: string): Specification {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch {
    throw new CliError(`${path}: cannot read the specification file`, EXIT.usage);
  }
  try {
    return parseSpecification(text, path);
  } catch (e) {
    if (e instanceof SpecError) throw new CliError(e.message, EXIT.usage);
    throw e;
  }
}

/** One argument as an Analysis: a saved analysis is rebuilt from its data and options. */
export function loadAnalysis(path: string, settings: Settings, source: string): Analysis {
  if (path.toLowerCase().endsWith(ANALYSIS_FILE_SUFFIX)) {
    let text: string;
    try {
      text = readFileSync(path, 'utf8');
    } catch (e) {
      throw new CliError(`${path}: cannot read: ${(e as Error).message}`, EXIT.dataError);
    }
    try {
      const doc = parseAnalysis(text, path);
      return buildMasterCurve(doc.dataset, { ...doc.options, importWarnings: doc.importWarnings });
    } catch (e) {
      throw new CliError((e as Error).message, EXIT.dataError);
    }
  }
  return analyseSample(readInputs([path]), settings, source);
}

const sgn = (v: number, d: number): string => `${v >= 0 ? '+' : ''}${v.toFixed(d)}`;

/** The summary printed on stdout. */
export function comparisonText(c: Comparison): string {
  const lines = [
    `Comparison at ${kelvinToCelsius(c.referenceTemperatureK).toFixed(1)} °C, reference: ${c.reference.name}${c.specName ? `, specification: ${c.specName}` : ''}`,
  ];
  for (const s of c.comparisons) {
    lines.push(
      '',
      `${s.name}: ${s.overall === 'no-spec' ? (s.differsBeyondNoise ? 'differs beyond noise' : 'no difference beyond noise') : s.overall.toUpperCase()}`,
    );
    const t = s.timeShiftDecades;
    const m = s.modulusOffsetDecades;
    if (t)
      lines.push(
        `  time shift        ${sgn(t.value, 3)} ± ${(t.stdErr ?? NaN).toFixed(3)} decades (relaxation times, sample vs reference)`,
      );
    if (m)
      lines.push(
        `  modulus level     ${sgn((10 ** m.value - 1) * 100, 1)} % ± ${(Math.LN10 * 10 ** m.value * (m.stdErr ?? NaN) * 100).toFixed(1)} %`,
      );
    const ea = s.models.activationEnergyKJPerMol;
    if (ea)
      lines.push(
        `  Ea difference     ${sgn(ea.value, 2)} ± ${(ea.stdErr ?? NaN).toFixed(2)} kJ/mol`,
      );
    for (const d of s.differences)
      if (d.largest)
        lines.push(
          `  largest Δ ${d.quantity.padEnd(18)} ${sgn((10 ** d.largest.log10Difference - 1) * 100, 1)} % at ${d.largest.reducedX.toPrecision(3)} ${c.abscissa === 'time' ? 's' : 'rad/s'}`,
        );
    for (const v of s.verdicts) lines.push(`  [${v.verdict}] ${v.criterion}: ${v.reason}`);
    for (const w of s.warnings) lines.push(`  warning: ${w}`);
  }
  lines.push('', ...c.cautions.map((x) => `Caution: ${x}`));
  return `${lines.join('\n')}\n`;
}

/** The exit code a comparison's verdicts give. */
export function verdictExitCode(c: Comparison): number {
  if (c.comparisons.some((s) => s.overall === 'fail')) return EXIT.specFailed;
  if (c.comparisons.some((s) => s.overall === 'inconclusive')) return EXIT.specInconclusive;
  return EXIT.ok;
}

export function registerCompare(program: Command): void {
  const cmd = program
    .command('compare')
    .description(
      'Compare master curves: each SAMPLE against REF (data files, folders or saved *.thermoshift.json analyses)',
    )
    .argument('<reference>', 'the reference lot: data file, folder or saved analysis')
    .argument('<samples...>', 'samples to compare with it')
    .option(
      '--spec <file>',
      'specification bands (JSON, docs/compare.md): pass / fail / inconclusive per criterion',
    )
    .option('--json', 'print the comparison as JSON instead of the summary')
    .option('--out <dir>', `write ${COMPARE_OUTPUT_FILES.join(', ')} into DIR`)
    .option('--force', 'overwrite existing output files')
    .option('--date <YYYY-MM-DD>', 'date printed in the report (default: today)');
  addSampleOptions(cmd);
  cmd.action((refPath: string, paths: string[], o: CompareOptionValues) => {
    const spec = o.spec ? readSpecFile(o.spec) : undefined;
    let comparison: Comparison;
    try {
      const settings = resolveSettings(o);
      if (settings.referenceTemperature === undefined && spec?.referenceTemperature !== undefined)
        settings.referenceTemperature = spec.referenceTemperature;
      const source = o.settings ?? 'command line';
      const T =
        settings.referenceTemperature !== undefined
          ? settingTemperatureK(settings.referenceTemperature, '--tref', source)
          : undefined;
      const reference = loadAnalysis(refPath, settings, source);
      const samples = paths.map((p) => loadAnalysis(p, settings, source));
      comparison = compareAnalyses(reference, samples, { spec, referenceTemperatureK: T });
    } catch (e) {
      if (e instanceof CompareError) throw new CliError(e.message, EXIT.dataError);
      throw toCliError(e);
    }
    if (o.out) {
      const date = checkDate(o.date);
      const texts = [
        `${JSON.stringify(comparison, null, 2)}\n`,
        comparisonCsv(comparison),
        verdictsCsv(comparison),
        comparisonReportHtml(comparison, { date }),
      ];
      // One set, swapped in as a whole like build's outputs (../io/output-set.ts).
      const targets = writeOutputSet(
        o.out,
        COMPARE_OUTPUT_FILES.map((name, k) => ({ name, content: texts[k] })),
        { force: !!o.force },
      );
      process.stderr.write(`compare: wrote ${targets.length} files to ${o.out}\n`);
    }
    process.stdout.write(o.json ? `${JSON.stringify(comparison)}\n` : comparisonText(comparison));
    if (spec) process.exitCode = verdictExitCode(comparison);
  });
}
