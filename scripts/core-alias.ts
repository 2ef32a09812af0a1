/**
 * The app's one way into the library: `@core` is core/index.ts, `@core/<folder>` is
 * core/<folder>/index.ts. tsconfig.base.json (`paths`) says the same for tsc, vue-tsc and tsx (the
 * CLI); vite.config.ts (and so Vitest) and electron.vite.config.ts read this list.
 */
import { fileURLToPath } from 'node:url';

const core = fileURLToPath(new URL('../core', import.meta.url));

export const coreAlias: { find: RegExp; replacement: string }[] = [
  { find: /^@core$/, replacement: `${core}/index.ts` },
  { find: /^@core\/([a-z-]+)$/, replacement: `${core}/$1/index.ts` },
];
