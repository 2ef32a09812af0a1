import { describe, it, expect, beforeAll } from 'vitest';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import Papa from 'papaparse';
import { runCli, tempDir, writeSyntheticSample } from './cli-helpers';
import { EXIT } from '../../app/cli/exit-codes';
import { OUTPUT_FILES } from '../../core/report/output-files';
import { BATCH_INDEX_COLUMNS } from '../../core/report/csv';

describe('thermoshift batch', () => {
  const dir = tempDir('thermoshift-batch-');
  const lab = join(dir, 'week-49');
  const out = join(dir, 'out');
  let run: ReturnType<typeof runCli>;
  beforeAll(() => {
    writeSyntheticSample(join(lab, 'lot-A'), { seed: 1 });
    writeSyntheticSample(join(lab, 'lot-B'), {
      seed: 2,
      temperaturesK: [353.15, 363.15, 373.15, 383.15, 393.15],
    });
    mkdirSync(join(lab, 'lot-C'));
    writeFileSync(join(lab, 'lot-C', 'broken_80C.csv'), 'no numbers here\n');
    run = runCli([
      'batch',
      '--samples-in',
      lab,
      'samples/seal-dma',
      '--out',
      out,
      '--tref',
      '100',
      '--date',
      '2026-12-01',
    ]);
  });

  it('batch goes on after a bad sample and exits with the partial-failure code', () => {
    expect(run.status, run.stderr).toBe(EXIT.batchPartialFailure);
    expect(run.stderr).toMatch(/\[4\/4\] lot-C: FAILED: .*broken_80C\.csv/);
    expect(run.stderr).toMatch(/\[2\/4\] lot-A: ok/);
    expect(run.stderr).toMatch(/3 of 4 samples done, 1 failed/);
  });

  it('batch writes one folder per sample and an index table of all', () => {
    for (const s of ['lot-A', 'lot-B', 'seal-dma']) {
      expect(existsSync(join(out, s, OUTPUT_FILES.report)), s).toBe(true);
      expect(existsSync(join(out, s, OUTPUT_FILES.prony)), s).toBe(true);
    }
    expect(existsSync(join(out, 'lot-C'))).toBe(false);
    const text = readFileSync(join(out, 'index.csv'), 'utf8');
    const body = text
      .split('\n')
      .filter((l) => !l.startsWith('#'))
      .join('\n');
    const rows = Papa.parse<Record<string, string>>(body, {
      header: true,
      skipEmptyLines: true,
    }).data;
    expect(Object.keys(rows[0])).toEqual([...BATCH_INDEX_COLUMNS]);
    // paths given as arguments come first, then the entries of --samples-in folders
    expect(rows.map((r) => [r.sample, r.status])).toEqual([
      ['seal-dma', 'ok'],
      ['lot-A', 'ok'],
      ['lot-B', 'ok'],
      ['lot-C', 'failed'],
    ]);
    expect(rows[1].reference_temperature_C).toBe('100');
    expect(Number(rows[1].wlf_C1)).toBeGreaterThan(8);
    expect(Number(rows[1].wlf_C1)).toBeLessThan(10);
    expect(rows[2].isotherms_total).toBe('5');
    expect(rows[3].error).toMatch(/broken_80C\.csv/);
  });

  it('batch refuses to run over an existing index without --force, before any sample', () => {
    const r = runCli(['batch', '--samples-in', lab, '--out', out]);
    expect(r.status).toBe(EXIT.outputError);
    expect(r.stderr).not.toMatch(/\[1\//);
    expect(r.stderr).toMatch(/already holds Thermoshift results; use --force/);
  });

  it('batch without samples is a usage error', () => {
    const r = runCli(['batch', '--out', join(dir, 'empty')]);
    expect(r.status).toBe(EXIT.usage);
  });
});
