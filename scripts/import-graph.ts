/**
 * `npm run deps`: prints the folder-level import graph of core/ and app/ — every edge with the
 * number of import statements behind it, then the cycles between folders and inside each core
 * folder. The layering rules it is checked against are in docs/architecture.md.
 */
import { cycles, fileCycles, folderEdges } from './import-graph-core.ts';
import { readSources } from './import-graph-files.ts';

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
