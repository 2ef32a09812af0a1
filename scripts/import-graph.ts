/**
 * `npm run deps`: prints the folder-level import graph of core/ and app/ — every edge with the
 * number of import statements behind it, then the cycles between folders and inside each core
 * folder. The layering rules it is checked against are in docs/architecture.md.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import { cycles, fileCycles, folderEdges, type SourceFile } from './import-graph-core.ts';

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

const files = readSources();
const edges = folderEdges(files);
console.log(`Folder-level import graph (${files.length} files, ${edges.length} edges)`);
for (const e of edges) console.log(`  ${e.from.padEnd(16)} → ${e.to.padEnd(16)} ${e.count}`);
const folderCycles = cycles(edges);
console.log(`Cycles between folders: ${folderCycles.length === 0 ? 'none' : ''}`);
for (const c of folderCycles) console.log(`  ${c.join(' ↔ ')}`);
const folders = [...new Set(files.map((f) => f.path.split('/').slice(0, 2).join('/')))]
  .filter((f) => f.startsWith('core/') && !f.endsWith('.ts'))
  .sort();
const inner = folders.flatMap((f) => fileCycles(files, f));
console.log(`Cycles between files inside a core folder: ${inner.length === 0 ? 'none' : ''}`);
for (const c of inner) console.log(`  ${c.join(' ↔ ')}`);
