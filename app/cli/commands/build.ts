/**
 * `thermoshift build FILE…`: all files (or the data files of a folder) form ONE sample; runs the
 * whole job and prints the JSON summary (--json) and/or writes the output files (--out DIR).
 */
import { Command } from 'commander';
import { analysisSummary, fittedShiftModels, modelConstant } from '@core/pipeline';
import { toCelsius } from '@core/pipeline';
import type { Analysis } from '@core/pipeline';
import { formatFixed } from '@core/report';
import { quantitySymbol } from '@core/data';
import { addSampleOptions, resolveSettings, type SampleOptionValues } from '../sample-options.ts';
import { readWorkbookInputs } from '../io/read-inputs.ts';
import { skippedLines, type SkippedFile } from '../io/input-files.ts';
import { analyseSample, assertSomethingShifted } from '../run-sample.ts';
import { today, writeOutputs } from '../outputs.ts';
import { toCliError } from '../error-map.ts';
import { CliError } from '../cli-error.ts';
import { EXIT } from '../exit-codes.ts';
import { fileTemperatures } from './inspect.ts';
import { parsePredictQuery } from '../predict-query.ts';
import { predictionsText, runPredictions } from '../predictions.ts';

interface BuildOptions extends SampleOptionValues {
  json?: boolean;
  out?: string;
  force?: boolean;
  date?: string;
  quiet?: boolean;
  predict?: string[];
}

export function printWarnings(a: Analysis, label = ''): void {
  for (const w of a.warnings) {
    const where = [w.file, w.row ? `row ${w.row}` : '', w.column ? `column ${w.column}` : '']
      .filter(Boolean)
      .join(', ');
    process.stderr.write(`warning${label}: ${where ? `${where}: ` : ''}${w.message} [${w.code}]\n`);
  }
}

export function checkDate(date: string | undefined): string {
  if (date === undefined) return today();
  if (!/^\d{4}-\d{2}-\d{2}$/.test(date))
    throw new CliError(`--date: "${date}" is not YYYY-MM-DD`, EXIT.usage);
  const [y, m, d] = date.split('-').map(Number);
  const asDate = new Date(Date.UTC(y, m - 1, d));
  const real =
    asDate.getUTCFullYear() === y && asDate.getUTCMonth() === m - 1 && asDate.getUTCDate() === d;
  if (!real || y < 1900)
    throw new CliError(
      `--date: "${date}" is not a calendar date from 1900-01-01 to 9999-12-31 (month 01-12, day within the month)`,
      EXIT.usage,
    );
  return date;
}

export function registerBuild(program: Command): void {
  const cmd = program
    .command('build')
    .description(
      'Build one master curve from FILE… (one sample: e.g. one file per isotherm, or a folder of them)',
    )
    .argument('<files...>', 'data files, or a folder standing for the data files in it')
    .option('--json', 'print the JSON summary on stdout')
    .option(
      '--out <dir>',
      'write the shift table, master curve, models, Prony terms, summary.json and report.html into DIR',
    )
    .option('--force', 'overwrite existing output files')
    .option('--date <YYYY-MM-DD>', 'date printed in the report (default: today)')
    .option('--quiet', 'do not print warnings on stderr')
    .option(
      '--predict <query>',
      'answer a design query, e.g. relaxation@60C,10y or storage@170C,1Hz (QUANTITY@TEMPERATURE,TIME|FREQUENCY[,MODEL]); repeatable',
      (v: string, prev: string[] = []) => [...prev, v],
    );
  addSampleOptions(cmd);
  cmd.action(async (files: string[], o: BuildOptions) => {
    try {
      const date = checkDate(o.date);
      const queries = o.predict ?? [];
      queries.forEach(parsePredictQuery); // a typo in a query fails before the analysis runs
      const settings = resolveSettings(o);
      const skipped: SkippedFile[] = [];
      const inputs = await readWorkbookInputs(files, skipped);
      if (!o.quiet) process.stderr.write(skippedLines(skipped));
      const analysis = analyseSample(
        inputs,
        settings,
        o.settings ?? 'command line',
        fileTemperatures(o.fileTemperature ?? [], inputs),
      );
      if (!o.quiet) printWarnings(analysis);
      assertSomethingShifted(analysis);
      const predictions = runPredictions(analysis, queries);
      if (o.out) {
        const written = writeOutputs(analysis, o.out, {
          force: !!o.force,
          modulusUnit: settings.modulusUnit ?? 'Pa',
          date,
        });
        if (!o.quiet) process.stderr.write(`wrote ${written.length} files to ${o.out}\n`);
      }
      if (o.json) {
        const summary = analysisSummary(analysis);
        const out = predictions.length ? { ...summary, predictions } : summary;
        process.stdout.write(`${JSON.stringify(out, null, 2)}\n`);
      }
      if (!o.json && !o.out && !predictions.length) process.stdout.write(textSummary(analysis));
      if (!o.json && predictions.length) process.stdout.write(predictionsText(predictions));
    } catch (e) {
      throw toCliError(e);
    }
  });
}

/** A short plain-text summary when neither --json nor --out is given. */
export function textSummary(a: Analysis): string {
  const lines = [
    `${a.sample.name}: ${a.curves.length} isotherms, Tref = ${toCelsius(a.referenceTemperatureK)} °C`,
    `shifted on ${a.shiftQuantities.map((q) => quantitySymbol(q, a.dataset.deformation)).join(' and ')}`,
    `vertical shift: ${a.vertical ? `${a.vertical.chosen} (${a.vertical.reason})` : a.settings.verticalShift}`,
    ...a.curves.map(
      (c) =>
        `  ${c.isothermId} ${formatFixed(toCelsius(c.temperatureK), 2).padStart(8)} °C  log10 aT = ${formatFixed(c.log10aT, 3)} ± ${formatFixed(c.log10aTStdErr, 3)}${c.included ? '' : `  (not included${c.leftOut ? `: ${c.leftOut.message}` : c.note ? `: ${c.note}` : ''})`}`,
    ),
  ];
  // the physical laws' constants (an empirical curve is in the summary and the files)
  for (const f of fittedShiftModels(a.models).filter((m) => m.descriptor.physical)) {
    const d = f.descriptor;
    const constants = d.parameters.map(
      (p, i) =>
        `${d.law.parameters[i].name} = ${modelConstant(f, i).value.toPrecision(4)}${p.unit ? ` ${p.unit}` : ''}`,
    );
    lines.push(`${d.name}: ${constants.join(', ')}`);
  }
  lines.push('(use --json for the full summary, --out DIR for tables and the report)');
  return `${lines.join('\n')}\n`;
}
