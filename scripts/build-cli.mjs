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
  minify: true,
  sourcemap: 'linked',
  logLevel: 'warning',
});

// `thermoshift --help`, `--version` and `COMMAND --help` print text that depends only on the
// code: it is produced here once by the bundle itself and stored beside it, so bin/thermoshift.mjs
// can print it without loading the bundle (compiling 0.8 MB of JavaScript takes most of a start).
const { spawnSync } = await import('node:child_process');
const { writeFileSync, renameSync } = await import('node:fs');
const runBundle = (args) => {
  const r = spawnSync(process.execPath, [`${root}bin/thermoshift.mjs`, ...args], {
    encoding: 'utf8',
    env: { ...process.env, THERMOSHIFT_NO_HELP_CACHE: '1' },
  });
  if (r.status !== 0) throw new Error(`build-cli: ${args.join(' ')} failed:\n${r.stderr}`);
  return r.stdout;
};
const help = { '--help': runBundle(['--help']), '--version': runBundle(['--version']) };
for (const line of help['--help'].split('\n')) {
  const m = /^ {2}([a-z][a-z-]*)\b/.exec(line);
  if (m && m[1] !== 'help') help[`${m[1]} --help`] = runBundle([m[1], '--help']);
}
writeFileSync(`${root}dist/cli/help.json.tmp`, `${JSON.stringify(help)}\n`);
renameSync(`${root}dist/cli/help.json.tmp`, `${root}dist/cli/help.json`);
