import { describe, expect, it } from 'vitest';
import { OUTPUT_FILES, OUTPUT_FILE_SPECS, outputFiles } from '../../../core/report/output-files';
import { analysisSummary } from '../../../core/pipeline/summary';
import { shiftTableCsv, pronyCsv } from '../../../core/report/csv';
import { fixtureAnalysis } from './analysis-fixture';

describe('OUTPUT_FILE_SPECS', () => {
  it('OUTPUT_FILE_SPECS lists every documented output file once, each with a label', () => {
    const names = OUTPUT_FILE_SPECS.map((s) => s.name);
    expect([...names].sort()).toEqual(Object.values(OUTPUT_FILES).sort());
    for (const s of OUTPUT_FILE_SPECS) expect(s.label.length).toBeGreaterThan(3);
  });
});

describe('outputFiles()', () => {
  it('outputFiles() builds every file from the core builders (the CLI writes them, the app exports them)', () => {
    const a = fixtureAnalysis();
    const files = outputFiles(a, { date: '2026-12-01' });
    expect(files.map((f) => f.name)).toEqual(OUTPUT_FILE_SPECS.map((s) => s.name));
    const byName = new Map(files.map((f) => [f.name, f.content]));
    expect(byName.get(OUTPUT_FILES.shiftTable)).toBe(shiftTableCsv(a));
    expect(byName.get(OUTPUT_FILES.prony)).toBe(pronyCsv(a, 'Pa'));
    expect(JSON.parse(byName.get(OUTPUT_FILES.summary)!)).toEqual(
      JSON.parse(JSON.stringify(analysisSummary(a))),
    );
    const models = JSON.parse(byName.get(OUTPUT_FILES.modelsJson)!) as { models: unknown };
    expect(models.models).toEqual(JSON.parse(JSON.stringify(analysisSummary(a).models)));
    expect(byName.get(OUTPUT_FILES.report)).toContain('2026-12-01');
  });

  it('outputFiles() writes moduli in the asked unit', () => {
    const a = fixtureAnalysis();
    const mpa = outputFiles(a, { date: '2026-12-01', modulusUnit: 'MPa' });
    expect(mpa.find((f) => f.name === OUTPUT_FILES.prony)!.content).toBe(pronyCsv(a, 'MPa'));
  });

  it('outputFiles() leaves out the Prony table when no series was fitted', () => {
    const a = { ...fixtureAnalysis(), prony: null };
    const names = outputFiles(a, { date: '2026-12-01' }).map((f) => f.name);
    expect(names).not.toContain(OUTPUT_FILES.prony);
    expect(names).toHaveLength(Object.keys(OUTPUT_FILES).length - 1);
  });
});
