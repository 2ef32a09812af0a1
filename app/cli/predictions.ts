/**
 * `build --predict`: answers design queries from the analysis through core's predictFromAnalysis,
 * as JSON entries (added to the `--json` summary under `predictions`) and as text lines.
 */
import { predictFromAnalysis, PredictionError, type AnalysisPrediction } from '@core/pipeline';
import { toCelsius } from '@core/pipeline';
import type { Analysis } from '@core/pipeline';
import { CliError } from './cli-error.ts';
import { EXIT } from './exit-codes.ts';
import { parsePredictQuery } from './predict-query.ts';

/** One answer in the JSON summary (documented in docs/cli.md). */
export interface PredictionEntry {
  query: string;
  quantity: AnalysisPrediction['quantity'];
  model: AnalysisPrediction['model'];
  /** °C */
  temperature: number;
  temperatureK: number;
  timeS?: number;
  omegaRadPerS?: number;
  value: number;
  unit: string;
  /** 95 % range from the shift model's band; null outside the fitted temperature range. */
  range95: [number, number] | null;
  log10aT: number;
  log10aTRange95: [number, number] | null;
  log10bT: number;
  reducedX: number;
  flags: AnalysisPrediction['flags'];
  cautions: string[];
}

/** Answers every query. @throws CliError (usage for a bad query, data error when not answerable) */
export function runPredictions(a: Analysis, queries: readonly string[]): PredictionEntry[] {
  return queries.map((text) => {
    const q = parsePredictQuery(text);
    let p: AnalysisPrediction;
    try {
      p = predictFromAnalysis(a, q);
    } catch (e) {
      if (e instanceof PredictionError || e instanceof RangeError)
        throw new CliError(`--predict "${text}": ${e.message}`, EXIT.dataError);
      throw e;
    }
    return {
      query: text,
      quantity: p.quantity,
      model: p.model,
      temperature: toCelsius(q.temperatureK),
      temperatureK: q.temperatureK,
      ...(q.timeS !== undefined && { timeS: q.timeS }),
      ...(q.omegaRadPerS !== undefined && { omegaRadPerS: q.omegaRadPerS }),
      value: p.value,
      unit: p.unit,
      range95: p.valueRange ?? null,
      log10aT: p.log10aT,
      log10aTRange95: p.log10aTRange ?? null,
      log10bT: p.log10bT,
      reducedX: p.reducedX,
      flags: p.flags,
      cautions: p.cautions,
    };
  });
}

const num = (v: number): string => v.toPrecision(4);

/** Plain-text lines of the answers, cautions included. */
export function predictionsText(entries: readonly PredictionEntry[]): string {
  const lines: string[] = [];
  for (const e of entries) {
    const unit = e.unit === '1' ? '' : ` ${e.unit}`;
    const range = e.range95 ? ` (95 %: ${num(e.range95[0])} … ${num(e.range95[1])}${unit})` : '';
    lines.push(
      `${e.query}: ${e.quantity} = ${num(e.value)}${unit}${range} [${e.model}, log10 aT = ${e.log10aT.toFixed(3)}]`,
    );
    for (const c of e.cautions) lines.push(`  - ${c}`);
  }
  return `${lines.join('\n')}\n`;
}
