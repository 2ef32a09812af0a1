import { describe, expect, it } from 'vitest';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import {
  buildIfStale,
  ELECTRON_BUILD,
  staleReason,
  WEB_BUILD,
  type BuildTarget,
} from '../../scripts/build-if-stale';

const T0 = new Date('2026-01-01T00:00:00Z');
const T1 = new Date('2026-01-02T00:00:00Z');
const T2 = new Date('2026-01-03T00:00:00Z');

/** A project with sources in src/, a fake build tool writing out/ and a log of its runs. */
function project() {
  const root = mkdtempSync(join(tmpdir(), 'ts-build-'));
  writeFileSync(join(root, 'package.json'), '{"name":"p","private":true}');
  mkdirSync(join(root, 'src'));
  writeFileSync(join(root, 'src', 'a.ts'), 'a');
  const tool = join(root, 'node_modules', 'fake-builder');
  mkdirSync(tool, { recursive: true });
  writeFileSync(
    join(tool, 'package.json'),
    '{"name":"fake-builder","bin":{"fake-builder":"cli.mjs"}}',
  );
  writeFileSync(
    join(tool, 'cli.mjs'),
    [
      "import { appendFileSync, mkdirSync, writeFileSync } from 'node:fs';",
      "if (process.argv[2] === 'fail') process.exit(3);",
      "mkdirSync('out', { recursive: true });",
      "writeFileSync('out/index.html', 'built');",
      "appendFileSync('runs.log', process.argv.slice(2).join(' ') + '\\n');",
    ].join('\n'),
  );
  const target: BuildTarget = {
    name: 'test output',
    output: 'out',
    inputs: ['src', 'missing-input.ts'],
    tool: { package: 'fake-builder', args: ['build', '--quiet'] },
  };
  const runs = (): string[] => {
    try {
      return readFileSync(join(root, 'runs.log'), 'utf8').trim().split('\n');
    } catch {
      return [];
    }
  };
  const touch = (path: string, at: Date) => utimesSync(join(root, path), at, at);
  return { root, target, runs, touch };
}

describe('staleReason()', () => {
  it('staleReason() says the output is missing, stale after a source change, and fresh otherwise', () => {
    const p = project();
    expect(staleReason(p.root, p.target)).toBe('out is missing');
    mkdirSync(join(p.root, 'out'));
    expect(staleReason(p.root, p.target)).toBe('out is missing'); // an empty folder is no build
    writeFileSync(join(p.root, 'out', 'index.html'), 'x');
    p.touch('src/a.ts', T0);
    p.touch('src', T0);
    p.touch('out/index.html', T1);
    expect(staleReason(p.root, p.target)).toBeNull();
    p.touch('src/a.ts', T2);
    expect(staleReason(p.root, p.target)).toBe('sources changed since out was built');
  });

  it('staleReason() notices a deleted source file through its folder', () => {
    const p = project();
    writeFileSync(join(p.root, 'src', 'b.ts'), 'b');
    mkdirSync(join(p.root, 'out'));
    writeFileSync(join(p.root, 'out', 'index.html'), 'x');
    for (const f of ['src/a.ts', 'src/b.ts', 'src']) p.touch(f, T0);
    p.touch('out/index.html', T1);
    expect(staleReason(p.root, p.target)).toBeNull();
    rmSync(join(p.root, 'src', 'b.ts'));
    p.touch('src', T2); // what the file system does on delete, made explicit
    expect(staleReason(p.root, p.target)).toBe('sources changed since out was built');
  });

  it('staleReason() compares with the oldest output file, so a half-rewritten output is stale', () => {
    const p = project();
    mkdirSync(join(p.root, 'out'));
    writeFileSync(join(p.root, 'out', 'index.html'), 'x');
    writeFileSync(join(p.root, 'out', 'old.js'), 'x');
    for (const f of ['src/a.ts', 'src']) p.touch(f, T1);
    p.touch('out/index.html', T2);
    p.touch('out/old.js', T0);
    expect(staleReason(p.root, p.target)).toBe('sources changed since out was built');
  });
});

describe('buildIfStale()', () => {
  it('buildIfStale() runs the tool once, then not again until a source changes', () => {
    const p = project();
    const log: string[] = [];
    expect(buildIfStale(p.root, p.target, (m) => log.push(m))).toBe(true);
    expect(p.runs()).toEqual(['build --quiet']);
    expect(log[0]).toMatch(/test output: out is missing/);
    expect(buildIfStale(p.root, p.target, () => undefined)).toBe(false);
    expect(p.runs()).toHaveLength(1);
    p.touch('out/index.html', T1);
    p.touch('src/a.ts', T2);
    expect(buildIfStale(p.root, p.target, () => undefined)).toBe(true);
    expect(p.runs()).toHaveLength(2);
  });

  it('buildIfStale() throws naming the target when the build fails', () => {
    const p = project();
    const failing = { ...p.target, tool: { ...p.target.tool, args: ['fail'] } };
    expect(() => buildIfStale(p.root, failing, () => undefined)).toThrow(
      /Building the test output failed \(fake-builder exited with 3\)/,
    );
  });
});

describe('WEB_BUILD and ELECTRON_BUILD', () => {
  it('WEB_BUILD and ELECTRON_BUILD name the folders the e2e tests load and the configs that shape them', () => {
    expect(WEB_BUILD.output).toBe('dist/web');
    expect(WEB_BUILD.inputs).toEqual(
      expect.arrayContaining(['app/renderer', 'core', 'vite.config.ts']),
    );
    expect(ELECTRON_BUILD.output).toBe('out');
    expect(ELECTRON_BUILD.inputs).toEqual(
      expect.arrayContaining([
        'app/main',
        'app/preload',
        'app/renderer',
        'core',
        'electron.vite.config.ts',
      ]),
    );
  });
});
