// Bundles the command line (app/cli + the core it uses) into one ES module,
// dist/cli/thermoshift.mjs, so `thermoshift` starts without compiling TypeScript on the fly.
// Run by `npm install` (prepare), by `npm test` before Vitest, and by `npm run build:cli`.
// Its dependencies are bundled in, so the bundle needs only Node itself.
import { fileURLToPath } from 'node:url';

let build;
try {
  ({ build } = await import('esbuild'));
} catch {
  // An install without dev dependencies has no esbuild: bin/thermoshift.mjs then runs the sources.
  console.warn(
    'build-cli: esbuild is not installed; thermoshift will compile its sources at start',
  );
  process.exit(0);
}

const root = fileURLToPath(new URL('..', import.meta.url));

await build({
  absWorkingDir: root,
  entryPoints: ['app/cli/main.ts'],
  outfile: 'dist/cli/thermoshift.mjs',
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  // Dependencies are bundled too: resolving and parsing dozens of files in node_modules at every
  // start costs more than reading one file.
  external: [],
  // CommonJS dependencies (commander) call require() for Node's own modules.
  banner: {
    js: "import { createRequire as __thermoshiftRequire } from 'node:module'; const require = __thermoshiftRequire(import.meta.url);",
  },
  sourcemap: 'linked',
  logLevel: 'warning',
});
