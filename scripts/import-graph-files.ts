/** Reads the sources of core/ and app/ for the import graph (`npm run deps`, the layering test). */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import type { SourceFile } from './import-graph-core.ts';

const root = join(import.meta.dirname, '..');

function walk(dir: string, out: string[]): void {
  for (const name of readdirSync(dir)) {
    const full = join(dir, name);
    if (statSync(full).isDirectory()) walk(full, out);
    else if (/\.(ts|vue)$/.test(name)) out.push(full);
  }
}

export function readSources(): SourceFile[] {
  const paths: string[] = [];
  walk(join(root, 'core'), paths);
  walk(join(root, 'app'), paths);
  return paths.map((p) => ({
    path: relative(root, p).split(sep).join('/'),
    text: readFileSync(p, 'utf8'),
  }));
}
