/**
 * Metadata lines at the top of every invented sample file: the invented-data note first, then
 * the invented firm and product, then the test. Lines are `# key: value`.
 */
import type { DemoModulusUnit, DemoScenario } from './demo-types';

/**
 * The explicit marker of our own demo data: the sample generator starts the note of every file
 * with it, and `isInventedDemo` looks for exactly this (not for the word "invented" anywhere).
 */
export const INVENTED_DEMO_MARKER = 'invented demo data from the Thermoshift sample generator';

/** The label every sample file carries in its first line. */
export function inventedNote(s: DemoScenario): string {
  return (
    `# note: ${INVENTED_DEMO_MARKER} ` +
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

/**
 * True for data made by our generator: a `note` that starts with the marker (the demo sample
 * files), or `invented: yes` (core/synthetic datasets). A lab file that merely contains the word
 * "invented" somewhere is not marked.
 */
export function isInventedDemo(metadata: Readonly<Record<string, string>>): boolean {
  return (
    (metadata.note ?? '').startsWith(INVENTED_DEMO_MARKER) ||
    (metadata.invented ?? '').trim().toLowerCase() === 'yes'
  );
}
