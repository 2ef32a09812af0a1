/** Reads a JSON settings file (`--settings FILE`) and validates it; errors name the file and key. */
import { readFileSync } from 'node:fs';
import { parseSettings, type Settings } from '@core/pipeline';
import { CliError } from '../cli-error.ts';
import { EXIT } from '../exit-codes.ts';

export function readSettingsFile(path: string): Settings {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (e) {
    throw new CliError(`${path}: cannot read settings file: ${(e as Error).message}`, EXIT.usage);
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    throw new CliError(`${path}: not valid JSON: ${(e as Error).message}`, EXIT.usage);
  }
  return parseSettings(json, path);
}
