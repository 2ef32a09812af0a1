/**
 * Folder-level import graph of the source tree (pure: reads nothing itself). `scripts/import-graph.ts`
 * feeds it the files; `tests/architecture/layers.test.ts` checks the layering with it.
 *
 * A node is a folder: `core/<x>` for the library, `app/<x>` (cli, main, preload, renderer, shared)
 * for the application. An edge A → B counts the import statements in A's files that resolve to a
 * file in B (type-only imports included: they couple the folders just the same).
 */

export interface SourceFile {
  /** Path relative to the repository root, with forward slashes, e.g. `core/shift/solve.ts`. */
  path: string;
  text: string;
}

export interface ImportEdge {
  from: string;
  to: string;
  count: number;
}

export interface FileImport {
  from: string;
  to: string;
  specifier: string;
}

const IMPORT_RE =
  /(?:^|[\s;])(?:import|export)\s+(?:type\s+)?(?:[^'"`;]*?\sfrom\s+)?['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)/g;

/** Path aliases of tsconfig/vite: `@core` → `core/index.ts`, `@core/x` → `core/x/index.ts`. */
export const ALIASES: Record<string, string> = { '@core': 'core' };

/** The folder node of a repository path, or undefined outside core/ and app/. */
export function folderOf(path: string): string | undefined {
  const parts = path.split('/');
  if (parts[0] !== 'core' && parts[0] !== 'app') return undefined;
  if (parts.length === 2) return parts[0];
  return `${parts[0]}/${parts[1]}`;
}

function normalise(parts: string[]): string {
  const out: string[] = [];
  for (const p of parts) {
    if (p === '' || p === '.') continue;
    if (p === '..') out.pop();
    else out.push(p);
  }
  return out.join('/');
}

/** Resolves an import specifier of `fromPath` to a repository path (extension-less), if local. */
export function resolveSpecifier(fromPath: string, specifier: string): string | undefined {
  for (const [alias, target] of Object.entries(ALIASES)) {
    if (specifier === alias || specifier.startsWith(`${alias}/`)) {
      return target + specifier.slice(alias.length);
    }
  }
  if (!specifier.startsWith('.')) return undefined;
  const dir = fromPath.split('/').slice(0, -1);
  return normalise([...dir, ...specifier.split('/')]);
}

/** Every local import of every file (strings in comments are skipped line by line). */
export function fileImports(files: readonly SourceFile[]): FileImport[] {
  const known = new Set(files.map((f) => f.path));
  // A specifier names a file (with or without its extension) or a folder (its index.ts).
  const toFile = (p: string): string => {
    for (const candidate of [p, `${p}.ts`, `${p}.vue`, `${p}/index.ts`]) {
      if (known.has(candidate)) return candidate;
    }
    return p;
  };
  const out: FileImport[] = [];
  for (const file of files) {
    const code = file.text
      .split('\n')
      .filter((line) => !/^\s*(\/\/|\*|\/\*)/.test(line))
      .join('\n');
    for (const m of code.matchAll(IMPORT_RE)) {
      const specifier = m[1] ?? m[2];
      if (specifier === undefined) continue;
      const to = resolveSpecifier(file.path, specifier);
      if (to !== undefined) out.push({ from: file.path, to: toFile(to), specifier });
    }
  }
  return out;
}

/** Folder-level edges with counts, sorted; imports inside one folder are left out. */
export function folderEdges(files: readonly SourceFile[]): ImportEdge[] {
  const counts = new Map<string, number>();
  for (const imp of fileImports(files)) {
    const a = folderOf(imp.from);
    const b = folderOf(imp.to);
    if (a === undefined || b === undefined || a === b) continue;
    const key = `${a}\t${b}`;
    counts.set(key, (counts.get(key) ?? 0) + 1);
  }
  return [...counts.entries()]
    .map(([key, count]) => {
      const [from, to] = key.split('\t');
      return { from, to, count };
    })
    .sort((x, y) => (x.from === y.from ? x.to.localeCompare(y.to) : x.from.localeCompare(y.from)));
}

/** Cycles of a directed graph: its strongly connected components with more than one node. */
export function cycles(edges: readonly { from: string; to: string }[]): string[][] {
  const next = new Map<string, string[]>();
  for (const e of edges) {
    if (!next.has(e.from)) next.set(e.from, []);
    if (!next.has(e.to)) next.set(e.to, []);
    next.get(e.from)!.push(e.to);
  }
  // Tarjan's algorithm (Tarjan 1972, "Depth-first search and linear graph algorithms").
  let counter = 0;
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const found: string[][] = [];
  const visit = (v: string): void => {
    index.set(v, counter);
    low.set(v, counter);
    counter += 1;
    stack.push(v);
    onStack.add(v);
    for (const w of next.get(v) ?? []) {
      if (!index.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) {
        low.set(v, Math.min(low.get(v)!, index.get(w)!));
      }
    }
    if (low.get(v) === index.get(v)) {
      const component: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        onStack.delete(w);
        component.push(w);
      } while (w !== v);
      if (component.length > 1) found.push(component.sort());
    }
  };
  for (const v of [...next.keys()].sort()) if (!index.has(v)) visit(v);
  return found;
}

/** File-level cycles inside one folder (e.g. core/shift/covariance.ts ↔ solve.ts). */
export function fileCycles(files: readonly SourceFile[], folder: string): string[][] {
  const edges: { from: string; to: string }[] = [];
  for (const imp of fileImports(files)) {
    if (folderOf(imp.from) !== folder) continue;
    const to = imp.to.replace(/\.(ts|vue)$/, '');
    if (folderOf(imp.to) !== folder) continue;
    edges.push({ from: imp.from.replace(/\.(ts|vue)$/, ''), to });
  }
  return cycles(edges);
}
