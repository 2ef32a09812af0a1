/**
 * The CLI runs from its bundle (dist/cli/thermoshift.mjs, built by scripts/build-cli.mjs), and the
 * help and version texts stored beside it are exactly what the bundle itself prints.
 */
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT, runCli } from './cli-helpers';

const uncached = (args: string[]): string =>
  spawnSync(process.execPath, [join(ROOT, 'bin/thermoshift.mjs'), ...args], {
    encoding: 'utf8',
    env: { ...process.env, THERMOSHIFT_NO_HELP_CACHE: '1' },
  }).stdout;

describe('thermoshift start-up', () => {
  it('bin/thermoshift.mjs runs the bundle, not the TypeScript sources', () => {
    expect(existsSync(join(ROOT, 'dist/cli/thermoshift.mjs'))).toBe(true);
    const r = runCli(['inspect', join(ROOT, 'samples/seal-dma')]);
    expect(r.status, r.stderr).toBe(0);
    expect(r.stderr).not.toMatch(/compiling the sources/);
  });

  it('the stored help and version texts equal what the bundle prints', () => {
    for (const args of [['--help'], ['-h'], ['--version'], ['build', '--help'], ['batch', '-h']]) {
      const r = runCli(args);
      expect(r.status, args.join(' ')).toBe(0);
      expect(r.stdout, args.join(' ')).toBe(uncached(args));
      expect(r.stdout.length).toBeGreaterThan(5);
    }
  });
});
