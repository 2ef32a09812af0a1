/**
 * Metadata lines at the top of every invented sample file: the invented-data note first, then
 * the invented firm and product, then the test. Lines are `# key: value`.
 */
import type { DemoModulusUnit, DemoScenario } from './demo-types';

/** The label every sample file carries in its first line. */
export function inventedNote(s: DemoScenario): string {
  return (
    `# note: invented demo data from the Thermoshift sample generator ` +
    `(scripts/generate-samples.ts, scenario ${s.id}, seed ${s.seed}); ` +
    `not a real material, firm or measurement`
  );
}

/** Metadata lines: note, sample, supplier, then the given extra `key: value` pairs. */
export function headerLines(s: DemoScenario, extra: [string, string][]): string[] {
  return [
    inventedNote(s),
    `# sample: ${s.product} (invented)`,
    `# supplier: ${s.firm} (invented firm)`,
    ...extra.map(([k, v]) => `# ${k}: ${v}`),
  ];
}

/** Pascals in one of the file's modulus units. */
export function paPerUnit(unit: DemoModulusUnit): number {
  return unit === 'MPa' ? 1e6 : unit === 'kPa' ? 1e3 : 1;
}
