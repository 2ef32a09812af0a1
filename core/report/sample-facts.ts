/**
 * The rows of the report's title block: facts about the whole sample only. File headers also
 * carry facts about one measurement (its temperature, strain, frequency, date …); the importer
 * merges the headers of all files, so such a row would state one file's condition as if it were
 * the sample's — those keys are left out here. A header key that repeats a row the report
 * already has (sample, test, files …) is merged into that row instead of printed twice.
 */
import type { Analysis } from '../pipeline/types';
import { toCelsius, toKelvinText } from '../pipeline/temperature';

/** Header keys that describe one measurement, not the sample (common practice of lab exports). */
const PER_MEASUREMENT =
  /^(?:t|temp|temperature|.*\btemperature\b.*|set ?point|isotherm|strain.*|.*\bstrain\b.*|amplitude.*|stress.*|frequency.*|freq|date|time|.*\bdate\b.*|run|file|file ?name|measurement|step|segment|sample temperature)$/i;

/** A header key that names a row of its own ("sample", "test" …), lower case. */
const OWN_ROWS = new Set(['sample', 'sample name', 'name', 'test', 'files', 'isotherms']);

export function sampleFacts(a: Analysis): [string, string][] {
  const meta = Object.entries(a.sample.metadata).filter(
    ([k, v]) => v.trim() !== '' && !PER_MEASUREMENT.test(k.trim()),
  );
  const said = (key: string): string | undefined =>
    meta.find(([k]) => k.trim().toLowerCase() === key)?.[1];
  const testFromFiles = said('test');
  const test = `${a.sample.testKind}, ${a.sample.deformation}${testFromFiles ? ` (${testFromFiles})` : ''}`;
  return [
    ['sample', a.sample.name],
    ['test', test],
    [
      'reference temperature',
      `${toCelsius(a.referenceTemperatureK)} °C (${toKelvinText(a.referenceTemperatureK)} K)`,
    ],
    [
      'isotherms',
      `${a.curves.filter((c) => c.included).length} of ${a.curves.length} in the master curve`,
    ],
    ['files', a.sample.files.join(', ')],
    ...meta.filter(([k, v]) => !OWN_ROWS.has(k.trim().toLowerCase()) && v !== a.sample.name),
  ];
}
