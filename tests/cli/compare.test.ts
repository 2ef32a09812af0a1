/**
 * `thermoshift compare` and `batch --spec` on the invented lot-release demo (samples/lot-release,
 * written by scripts/generate-samples.ts with known differences: lot 4 relaxes 0.25 decade more
 * slowly than the reference, lots 2 and 3 are within the invented specification).
 */
import { describe, it, expect } from 'vitest';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import Papa from 'papaparse';
import { runCli, tempDir } from './cli-helpers';
import { EXIT } from '../../app/cli/exit-codes';
import { COMPARE_OUTPUT_FILES } from '../../app/cli/commands/compare';
import type { Comparison } from '../../core/compare';
import { expectAbsClose } from '../helpers/assert-close';

const L = 'samples/lot-release';
const REF = `${L}/fr44-lot-1-reference.csv`;
const LOTS = [2, 3, 4].map((k) => `${L}/fr44-lot-${k}.csv`);
const SPEC = `${L}/fr44-release.spec.json`;

describe('thermoshift compare', () => {
  it('thermoshift compare judges the demo lots, names the failed criteria and exits with EXIT.specFailed', () => {
    const out = join(tempDir('thermoshift-compare-'), 'out');
    const r = runCli([
      'compare',
      REF,
      ...LOTS,
      '--spec',
      SPEC,
      '--out',
      out,
      '--date',
      '2026-12-02',
    ]);
    expect(r.stderr).not.toMatch(/Error:|at .*\.ts/);
    expect(r.status).toBe(EXIT.specFailed);
    expect(r.stdout).toMatch(/lot 2 \(invented\): PASS/);
    expect(r.stdout).toMatch(/lot 3 \(invented\): PASS/);
    expect(r.stdout).toMatch(/lot 4 \(invented\): FAIL/);
    expect(r.stdout).toMatch(
      /\[fail\] relaxation times: FAIL: .* beyond the upper limit \+0\.100 decades/,
    );
    for (const f of COMPARE_OUTPUT_FILES) expect(existsSync(join(out, f))).toBe(true);
    const c = JSON.parse(readFileSync(join(out, 'comparison.json'), 'utf8')) as Comparison;
    // truth from the generator: +0.25 decade (lot 4), +0.02 (lot 2), 3 % softer (lot 3)
    expectAbsClose(c.comparisons[2].timeShiftDecades?.value ?? NaN, 0.25, 0.02, 'lot 4 time shift');
    expectAbsClose(c.comparisons[0].timeShiftDecades?.value ?? NaN, 0.02, 0.02, 'lot 2 time shift');
    expectAbsClose(
      10 ** (c.comparisons[1].modulusOffsetDecades?.value ?? NaN),
      0.97,
      0.02,
      'lot 3 level',
    );
    const verdicts = Papa.parse<string[]>(
      readFileSync(join(out, 'comparison-verdicts.csv'), 'utf8').trim(),
    ).data;
    expect(verdicts[0]).toContain('verdict');
    expect(verdicts.filter((row) => row[4] === 'fail').length).toBeGreaterThanOrEqual(1);
    const html = readFileSync(join(out, 'comparison-report.html'), 'utf8');
    expect(html).toMatch(/lot 4 \(invented\): FAIL/);
    expect(html).toMatch(/Confirm by testing/);
  });

  it('thermoshift compare --json without a spec prints the comparison and exits 0', () => {
    const r = runCli(['compare', REF, LOTS[0], '--json']);
    expect(r.status).toBe(EXIT.ok);
    const c = JSON.parse(r.stdout) as Comparison;
    expect(c.format).toBe('thermoshift-comparison');
    expect(c.comparisons[0].overall).toBe('no-spec');
  });

  it('thermoshift compare refuses a bad specification naming the file and entry', () => {
    const dir = tempDir('thermoshift-compare-spec-');
    const bad = join(dir, 'bad.spec.json');
    writeFileSync(
      bad,
      JSON.stringify({
        format: 'thermoshift-spec',
        formatVersion: 1,
        name: 'x',
        criteria: [{ kind: 'timeShift' }],
      }),
    );
    const r = runCli(['compare', REF, LOTS[0], '--spec', bad]);
    expect(r.status).toBe(EXIT.usage);
    expect(r.stderr).toMatch(/bad\.spec\.json: criteria\.0/);
  });

  it('thermoshift batch --spec adds a verdict column to index.csv and exits with EXIT.specFailed', () => {
    const out = join(tempDir('thermoshift-batch-spec-'), 'out');
    const r = runCli([
      'batch',
      ...LOTS,
      '--out',
      out,
      '--spec',
      SPEC,
      '--reference',
      REF,
      '--date',
      '2026-12-02',
    ]);
    expect(r.status).toBe(EXIT.specFailed);
    const rows = Papa.parse<string[]>(
      readFileSync(join(out, 'index.csv'), 'utf8')
        .split('\n')
        .filter((l) => !l.startsWith('#'))
        .join('\n')
        .trim(),
    ).data;
    const col = rows[0].indexOf('verdict');
    expect(col).toBe(rows[0].length - 1);
    expect(rows.slice(1).map((row) => row[col])).toEqual([
      'pass',
      'pass',
      expect.stringMatching(/^fail \(.*relaxation times/),
    ]);
  });
});
