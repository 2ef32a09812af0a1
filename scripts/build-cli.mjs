// Bundles the command line (app/cli + the core it uses) into one CommonJS script,
// dist/cli/thermoshift.cjs, so `thermoshift` starts without compiling TypeScript on the fly, and
// stores V8's code cache of it beside it (see bin/load-bundle.mjs).
// Run by `npm install` (prepare), by `npm test` before Vitest, and by `npm run build:cli`.
// Its dependencies are bundled in, so the bundle needs only Node itself.
import { spawnSync } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { renameSync, rmSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
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
// names this build: the code cache is used only with the bundle it was made from
const buildId = randomUUID();

// zod brings the error messages of some forty languages, a quarter of the bundle's bytes, which
// every start would read; the command line speaks English only (zod's default), so its locale
// index is reduced to English here.
const zodEnglishOnly = {
  name: 'zod-english-only',
  setup(b) {
    b.onLoad({ filter: /[\\/]zod[\\/]v4[\\/]locales[\\/]index\.c?js$/ }, (args) => ({
      contents: "export { default as en } from './en.js';\n",
      resolveDir: dirname(args.path),
      loader: 'js',
    }));
  },
};

await build({
  absWorkingDir: root,
  entryPoints: ['app/cli/main.ts'],
  outfile: 'dist/cli/thermoshift.cjs',
  bundle: true,
  platform: 'node',
  // a script, not an ES module: Node 20 can give V8's code cache to a script only (vm.Script)
  format: 'cjs',
  target: 'node20',
  // Dependencies are bundled too: resolving and parsing dozens of files in node_modules at every
  // start costs more than reading one file.
  external: [],
  // the first line names the build (bin/load-bundle.mjs reads it)
  banner: { js: `// thermoshift-bundle ${buildId}` },
  plugins: [zodEnglishOnly],
  minify: true,
  sourcemap: 'linked',
  logLevel: 'warning',
});

// A bundle of an earlier version (an ES module) would only mislead.
for (const old of ['thermoshift.mjs', 'thermoshift.mjs.map'])
  rmSync(`${root}dist/cli/${old}`, { force: true });

// V8's code cache of the bundle, taken after a build run (samples/melt-long, to a scratch folder)
// so that it holds the functions a build compiles, not only the top level. Made by this Node,
// with no extra V8 flags: another Node or other flags make V8 reject it, and the bundle is then
// compiled as usual. A failure here leaves no cache, never a broken command.
{
  const r = spawnSync(process.execPath, [`${root}scripts/cli-code-cache.mjs`], {
    encoding: 'utf8',
    env: { ...process.env, THERMOSHIFT_NO_CODE_CACHE: '1' },
  });
  if (r.status !== 0)
    console.warn(`build-cli: no code cache (thermoshift starts more slowly):\n${r.stderr}`);
}

// `thermoshift --help`, `--version` and `COMMAND --help` print text that depends only on the
// code: it is produced here once by the bundle itself and stored beside it, so bin/thermoshift.mjs
// can print it without loading the bundle (compiling 0.8 MB of JavaScript takes most of a start).
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
