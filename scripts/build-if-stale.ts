/**
 * Builds an output folder again only when it is missing or older than its sources, as make
 * does: the output's oldest file is compared with the newest file or folder among the inputs
 * (folders count too, so a deleted source file also makes the output stale). Used by the e2e
 * tests' global setup, so `npx vitest run` works from a fresh clone and `npm test` builds once.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';

export interface BuildTarget {
  /** What the log calls it, e.g. "web renderer (dist/web)". */
  name: string;
  /** Output folder, relative to the project root. */
  output: string;
  /** Source files and folders the output is made from, relative to the project root. */
  inputs: readonly string[];
  /** npm package whose command-line tool builds it, and the arguments. */
  tool: { package: string; args: readonly string[] };
}

const SOURCES = ['core', 'package.json', 'package-lock.json', 'scripts/vite-dev-style-nonce.ts'];

export const WEB_BUILD: BuildTarget = {
  name: 'web renderer (dist/web)',
  output: 'dist/web',
  inputs: ['app/renderer', 'vite.config.ts', ...SOURCES],
  tool: { package: 'vite', args: ['build', '--logLevel', 'warn'] },
};

export const ELECTRON_BUILD: BuildTarget = {
  name: 'desktop app (out/)',
  output: 'out',
  inputs: [
    'app/main',
    'app/preload',
    'app/shared',
    'app/renderer',
    'electron.vite.config.ts',
    ...SOURCES,
  ],
  tool: { package: 'electron-vite', args: ['build', '--logLevel', 'warn'] },
};

/** Calls `visit` with the modification time of every file and folder under `path`. */
function walk(path: string, visit: (mtimeMs: number, isDir: boolean) => void): void {
  const info = statSync(path);
  visit(info.mtimeMs, info.isDirectory());
  if (!info.isDirectory()) return;
  for (const name of readdirSync(path)) walk(join(path, name), visit);
}

/** Newest modification time among the inputs that exist (0 when none does). */
export function newestInputMs(root: string, inputs: readonly string[]): number {
  let newest = 0;
  for (const input of inputs) {
    const path = join(root, input);
    if (existsSync(path)) walk(path, (ms) => (newest = Math.max(newest, ms)));
  }
  return newest;
}

/** Oldest modification time among the output's files, or null when it has none. */
export function oldestOutputMs(root: string, output: string): number | null {
  const path = join(root, output);
  if (!existsSync(path)) return null;
  let oldest = Infinity;
  walk(path, (ms, isDir) => {
    if (!isDir) oldest = Math.min(oldest, ms);
  });
  return Number.isFinite(oldest) ? oldest : null;
}

/** Why the output must be built, or null when it is up to date. */
export function staleReason(root: string, target: BuildTarget): string | null {
  const built = oldestOutputMs(root, target.output);
  if (built === null) return `${target.output} is missing`;
  if (newestInputMs(root, target.inputs) > built)
    return `sources changed since ${target.output} was built`;
  return null;
}

/** The path of an npm package's command-line script (its package.json `bin`). */
function toolScript(root: string, pkg: string): string {
  const require = createRequire(join(root, 'package.json'));
  const manifestPath = require.resolve(`${pkg}/package.json`);
  const manifest = JSON.parse(readFileSync(manifestPath, 'utf8')) as {
    bin: string | Record<string, string>;
  };
  const bin = typeof manifest.bin === 'string' ? manifest.bin : manifest.bin[pkg];
  return join(dirname(manifestPath), bin);
}

/** Builds the target when it is stale; returns whether it built. Throws when the build fails. */
export function buildIfStale(
  root: string,
  target: BuildTarget,
  log: (message: string) => void = (m) => console.log(m),
): boolean {
  const reason = staleReason(root, target);
  if (!reason) return false;
  log(`[build] ${target.name}: ${reason}; building…`);
  const r = spawnSync(
    process.execPath,
    [toolScript(root, target.tool.package), ...target.tool.args],
    {
      cwd: root,
      stdio: 'inherit',
    },
  );
  if (r.status !== 0) {
    throw new Error(
      `Building the ${target.name} failed (${target.tool.package} exited with ${r.status ?? r.signal}).`,
    );
  }
  return true;
}
