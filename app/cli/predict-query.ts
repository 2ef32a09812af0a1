/**
 * `--predict QUERY`: "QUANTITY@TEMPERATURE,TIME|FREQUENCY[,MODEL]", e.g. `relaxation@60C,10y`
 * (relaxed modulus after ten years at 60 °C), `storage@170C,1Hz`, `creep@23C,1000h,wlf`.
 * Temperatures as everywhere on the command line (°C, or kelvin with K); times in s, min, h, d,
 * y; frequencies in Hz, kHz, mHz or rad/s. Parsed into core's AnalysisQuery (SI units).
 */
import type { AnalysisQuery } from '@core/pipeline';
import { findShiftModel, settingTemperatureK, shiftModelKindList } from '@core/pipeline';
import type { ShiftModelKind } from '@core/pipeline';
import type { PredictedQuantity } from '@core/spectrum';
import { QUERY_FREQUENCY_UNITS, QUERY_TIME_UNITS } from '@core/units';
import { CliError } from './cli-error.ts';
import { EXIT } from './exit-codes.ts';

/** Quantity words accepted (case-insensitive) → the predicted quantity. */
export const PREDICT_QUANTITIES: Readonly<Record<string, PredictedQuantity>> = {
  storage: 'storage',
  storagemodulus: 'storage',
  loss: 'loss',
  lossmodulus: 'loss',
  tandelta: 'tanDelta',
  viscosity: 'complexViscosity',
  complexviscosity: 'complexViscosity',
  relaxation: 'relaxation',
  relaxationmodulus: 'relaxation',
  creep: 'creep',
  creepcompliance: 'creep',
};

const TIME_UNITS = QUERY_TIME_UNITS;
const FREQUENCY_UNITS = QUERY_FREQUENCY_UNITS;

const usage = (query: string, why: string): CliError =>
  new CliError(
    `--predict "${query}": ${why} (write QUANTITY@TEMPERATURE,TIME or FREQUENCY, e.g. relaxation@60C,10y or storage@170C,1Hz)`,
    EXIT.usage,
  );

/** Parses one `--predict` value. @throws CliError (usage) naming the query and what is wrong */
export function parsePredictQuery(query: string): AnalysisQuery & { text: string } {
  const at = query.indexOf('@');
  if (at <= 0) throw usage(query, 'no QUANTITY@ at the start');
  const word = query.slice(0, at).trim();
  const quantity = PREDICT_QUANTITIES[word.toLowerCase()];
  if (!quantity)
    throw usage(
      query,
      `unknown quantity "${word}" (use ${Object.keys(PREDICT_QUANTITIES).join(', ')})`,
    );
  const parts = query
    .slice(at + 1)
    .split(',')
    .map((p) => p.trim());
  if (parts.length < 2 || parts.length > 3)
    throw usage(query, 'expected a temperature and a time or frequency');
  const [tText, xText, modelText] = parts;
  let temperatureK: number;
  try {
    temperatureK = settingTemperatureK(tText.replace(/°?C$/i, ''), '--predict', 'command line');
  } catch {
    throw usage(query, `"${tText}" is not a temperature (°C, e.g. 60C, or kelvin, e.g. 333.15K)`);
  }
  const m = /^([0-9]*\.?[0-9]+(?:e[+-]?[0-9]+)?)\s*([a-z/]+)$/i.exec(xText);
  if (!m) throw usage(query, `"${xText}" is not a number with a unit`);
  const amount = Number(m[1]);
  const timeLike = quantity === 'relaxation' || quantity === 'creep';
  const factor = timeLike ? TIME_UNITS[m[2].toLowerCase()] : FREQUENCY_UNITS[m[2]];
  if (factor === undefined || !(amount > 0))
    throw usage(
      query,
      timeLike
        ? `${quantity} needs a positive time in ${Object.keys(TIME_UNITS).join(', ')}`
        : `${quantity} needs a positive frequency in Hz, kHz, mHz or rad/s`,
    );
  let model: ShiftModelKind | undefined;
  if (modelText !== undefined) {
    const k = modelText.toLowerCase();
    if (!findShiftModel(k))
      throw usage(query, `unknown shift model "${modelText}" (use ${shiftModelKindList('or')})`);
    model = k;
  }
  return {
    text: query,
    quantity,
    temperatureK,
    ...(timeLike ? { timeS: amount * factor } : { omegaRadPerS: amount * factor }),
    ...(model && { model }),
  };
}
