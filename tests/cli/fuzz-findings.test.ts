/**
 * Every case the fuzz harness (npm run fuzz) ever found, replayed: the mutated files in
 * tests/fixtures/fuzz-findings/<finding>/data go through the same command and the same judge
 * (scripts/fuzz-judge.ts); none may end in exit 70, a hang or silent nonsense. A finding whose
 * finding.json has an `open` note is a known, not yet fixed case: it runs as `it.fails`, so the
 * test turns red the day it is fixed and the note must be removed.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { judge, runCli } from '../../scripts/fuzz-judge';
import { ROOT, tempDir } from './cli-helpers';

const FINDINGS = join(ROOT, 'tests/fixtures/fuzz-findings');

interface Finding {
  command: 'inspect' | 'build';
  mutations: string[];
  open?: string;
}

describe('fuzz findings', () => {
  for (const name of readdirSync(FINDINGS).sort()) {
    const finding = JSON.parse(
      readFileSync(join(FINDINGS, name, 'finding.json'), 'utf8'),
    ) as Finding;
    const data = join(FINDINGS, name, 'data');
    const test = finding.open ? it.fails : it;
    test(`${name} (${finding.mutations.join('; ')}) ends without exit 70, hang or nonsense`, () => {
      const args =
        finding.command === 'inspect'
          ? ['inspect', data, '--json']
          : ['build', data, '--out', join(tempDir(), 'out'), '--json', '--quiet'];
      const r = runCli(join(ROOT, 'bin/thermoshift.mjs'), args);
      expect(judge(finding.command, r), r.stderr).toBeUndefined();
    });
  }
});
