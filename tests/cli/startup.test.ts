/**
 * The CLI runs from its bundle (dist/cli/thermoshift.cjs, built by scripts/build-cli.mjs) with the
 * V8 code cache stored beside it, which is used only with the bundle it was made from; the help
 * and version texts stored beside it are exactly what the bundle itself prints.
 */
import { spawnSync } from 'node:child_process';
import { copyFileSync, existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import { ROOT, runCli, tempDir } from './cli-helpers';

const BUNDLE = join(ROOT, 'dist/cli/thermoshift.cjs');

/** Loads a bundle in a fresh Node as bin/thermoshift.mjs does; prints whether its cache was used. */
const loadIn = (bundle: string): { cacheUsed: boolean; version: string } => {
  const loader = pathToFileURL(join(ROOT, 'bin/load-bundle.mjs')).href;
  const script = `import { loadBundle } from ${JSON.stringify(loader)};
const b = loadBundle(${JSON.stringify(bundle)});
const write = process.stdout.write.bind(process.stdout);
let version = '';
process.stdout.write = (s) => ((version += s), true);
await b.exports.main(['--version']);
write(JSON.stringify({ cacheUsed: b.cacheUsed, version: version.trim() }));`;
  const r = spawnSync(process.execPath, ['--input-type=module', '-e', script], {
    encoding: 'utf8',
  });
  expect(r.status, r.stderr).toBe(0);
  return JSON.parse(r.stdout) as { cacheUsed: boolean; version: string };
};

const uncached = (args: string[]): string =>
  spawnSync(process.execPath, [join(ROOT, 'bin/thermoshift.mjs'), ...args], {
    encoding: 'utf8',
    env: { ...process.env, THERMOSHIFT_NO_HELP_CACHE: '1' },
  }).stdout;

describe('thermoshift start-up', () => {
  it('bin/thermoshift.mjs runs the bundle, not the TypeScript sources', () => {
    expect(existsSync(BUNDLE)).toBe(true);
    const r = runCli(['inspect', join(ROOT, 'samples/seal-dma')]);
    expect(r.status, r.stderr).toBe(0);
    expect(r.stderr).not.toMatch(/compiling the sources/);
  });

  it('the bundle is loaded with its V8 code cache, and a cache of another build or script is ignored', () => {
    const own = loadIn(BUNDLE);
    expect(own.cacheUsed).toBe(true);
    expect(own.version).toMatch(/^\d+\.\d+\.\d+/);
    const dir = tempDir();
    const source = readFileSync(BUNDLE, 'utf8');
    const cache = readFileSync(`${BUNDLE}.v8cache`);
    // the same code under another build line: the header no longer matches
    const other = join(dir, 'other.cjs');
    writeFileSync(
      other,
      source.replace(/^\/\/ thermoshift-bundle \S+/, '// thermoshift-bundle other'),
    );
    copyFileSync(`${BUNDLE}.v8cache`, `${other}.v8cache`);
    expect(loadIn(other)).toEqual({ cacheUsed: false, version: own.version });
    // the right header before V8 bytes made for another script: V8 rejects them
    const alien = join(dir, 'alien.cjs');
    writeFileSync(alien, source);
    const header = cache.subarray(0, cache.indexOf(0x0a) + 1);
    const foreign = spawnSync(
      process.execPath,
      ['-e', "process.stdout.write(new (require('node:vm').Script)('1 + 1').createCachedData())"],
      { encoding: 'buffer' },
    ).stdout;
    writeFileSync(`${alien}.v8cache`, Buffer.concat([header, foreign]));
    expect(loadIn(alien)).toEqual({ cacheUsed: false, version: own.version });
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
