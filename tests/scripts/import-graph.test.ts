/**
 * The layering of docs/architecture.md, checked over the import graph that `npm run deps` prints:
 * every core folder imports only the folders its row allows, there is no cycle between folders or
 * between the files of one folder, and the app reaches core only through `@core` entry points.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  cycles,
  fileCycles,
  fileImports,
  folderEdges,
  type SourceFile,
} from '../../scripts/import-graph-core';
import { readSources } from '../../scripts/import-graph-files';

const root = join(import.meta.dirname, '..', '..');

/** The "may import" table of docs/architecture.md, as folder → allowed folders. */
function allowedEdges(): Map<string, Set<string>> {
  const text = readFileSync(join(root, 'docs', 'architecture.md'), 'utf8');
  const allowed = new Map<string, Set<string>>();
  for (const m of text.matchAll(/^\| `(core\/[a-z-]+)` \| ([^|]+) \|$/gm)) {
    const targets = m[2].trim() === '—' ? [] : m[2].split(',').map((t) => `core/${t.trim()}`);
    allowed.set(m[1], new Set(targets));
  }
  return allowed;
}

describe('folderEdges() and cycles()', () => {
  const toy: SourceFile[] = [
    { path: 'core/a/x.ts', text: "import { y } from '../b/y';\nexport const x = y;" },
    { path: 'core/b/y.ts', text: "import type { X } from '../a';\nexport const y = 1;" },
    { path: 'core/a/index.ts', text: "export * from './x';" },
    {
      path: 'app/cli/m.ts',
      text: "import { x } from '@core/a';\n// import { z } from '../../core/b/y';",
    },
  ];

  it('folderEdges() counts imports across folders, resolving folders, aliases and type imports', () => {
    expect(folderEdges(toy)).toEqual([
      { from: 'app/cli', to: 'core/a', count: 1 },
      { from: 'core/a', to: 'core/b', count: 1 },
      { from: 'core/b', to: 'core/a', count: 1 },
    ]);
  });

  it('cycles() finds a loop between folders and fileCycles() one between files', () => {
    expect(cycles(folderEdges(toy))).toEqual([['core/a', 'core/b']]);
    const files: SourceFile[] = [
      { path: 'core/s/p.ts', text: "import { q } from './q';" },
      { path: 'core/s/q.ts', text: "import type { P } from './p';" },
      { path: 'core/s/r.ts', text: "import { q } from './q';" },
    ];
    expect(fileCycles(files, 'core/s')).toEqual([['core/s/p', 'core/s/q']]);
  });
});

describe('the layers of docs/architecture.md', () => {
  const files = readSources();
  const edges = folderEdges(files);

  it('docs/architecture.md lists every core folder', () => {
    const allowed = allowedEdges();
    const folders = new Set(edges.flatMap((e) => [e.from, e.to]).filter((f) => /^core\//.test(f)));
    expect(allowed.size).toBeGreaterThanOrEqual(10);
    for (const f of folders) expect(allowed.has(f), f).toBe(true);
  });

  it('each core folder imports only the folders its row allows', () => {
    const allowed = allowedEdges();
    const wrong = edges
      .filter((e) => e.from.startsWith('core/') && !allowed.get(e.from)?.has(e.to))
      .map((e) => `${e.from} → ${e.to} (${e.count})`);
    expect(wrong).toEqual([]);
  });

  it('there are no cycles between folders nor between the files of a core folder', () => {
    expect(cycles(edges)).toEqual([]);
    const coreFolders = [...allowedEdges().keys()];
    expect(coreFolders.flatMap((f) => fileCycles(files, f))).toEqual([]);
  });

  it('the app imports core only through @core or @core/<folder>, and core never imports the app', () => {
    const imports = fileImports(files);
    const deep = imports
      .filter((i) => i.from.startsWith('app/') && i.to.startsWith('core/'))
      .filter((i) => !/^@core(\/[a-z-]+)?$/.test(i.specifier))
      .map((i) => `${i.from}: ${i.specifier}`);
    expect(deep).toEqual([]);
    expect(imports.some((i) => i.from.startsWith('app/') && i.specifier.startsWith('@core'))).toBe(
      true,
    );
    const up = imports.filter((i) => i.from.startsWith('core/') && i.to.startsWith('app/'));
    expect(up).toEqual([]);
  });
});
