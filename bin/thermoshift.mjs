#!/usr/bin/env node
// Command-line entry point. Runs the bundle dist/cli/thermoshift.cjs (made by
// scripts/build-cli.mjs at `npm install` and before `npm test`) with its V8 code cache
// (./load-bundle.mjs); only when the bundle is missing does it fall back to compiling the
// TypeScript sources on the fly with tsx, which is slower.
import { existsSync, readFileSync, statSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

// `thermoshift … | head` closes the pipe early: that is the reader's choice, not an error.
for (const stream of [process.stdout, process.stderr]) {
  stream.on('error', (e) => {
    if (e && e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    throw e;
  });
}

const bundle = fileURLToPath(new URL('../dist/cli/thermoshift.cjs', import.meta.url));

// Help and version texts made by scripts/build-cli.mjs from this very bundle: printing them
// needs no JavaScript of the CLI to be compiled.
const argv = process.argv.slice(2);
const key = argv.join(' ').replace(/(^| )-h$/, '$1--help');
if (
  !process.env.THERMOSHIFT_NO_HELP_CACHE &&
  !process.env.THERMOSHIFT_FROM_SOURCE &&
  /(^|^[a-z-]+ )--(help|version)$|^-V$/.test(key)
) {
  try {
    const help = JSON.parse(
      readFileSync(new URL('../dist/cli/help.json', import.meta.url), 'utf8'),
    );
    const text = help[key === '-V' ? '--version' : key];
    if (
      typeof text === 'string' &&
      statSync(bundle).mtimeMs <=
        statSync(new URL('../dist/cli/help.json', import.meta.url)).mtimeMs
    ) {
      process.stdout.write(text);
      process.exit(0);
    }
  } catch {
    // no cached text: the bundle prints it
  }
}
let main;
if (existsSync(bundle) && !process.env.THERMOSHIFT_FROM_SOURCE) {
  const { loadBundle } = await import('./load-bundle.mjs');
  ({ main } = loadBundle(bundle).exports);
} else {
  if (!process.env.THERMOSHIFT_FROM_SOURCE)
    process.stderr.write(
      'thermoshift: dist/cli/thermoshift.cjs is missing (run `npm run build:cli`); compiling the sources instead\n',
    );
  const { register } = await import('tsx/esm/api');
  // The repository's tsconfig maps the `@core` alias, whatever the working directory.
  register({ tsconfig: fileURLToPath(new URL('../tsconfig.json', import.meta.url)) });
  ({ main } = await import('../app/cli/main.ts'));
}
process.exitCode = await main(argv);
