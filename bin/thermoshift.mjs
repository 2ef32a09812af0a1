#!/usr/bin/env node
// Command-line entry point. The CLI is written in TypeScript and shares its code with the desktop
// app; tsx compiles it on the fly so the repository runs without a separate build step.
import { fileURLToPath } from 'node:url';
import { register } from 'tsx/esm/api';

// `thermoshift … | head` closes the pipe early: that is the reader's choice, not an error.
for (const stream of [process.stdout, process.stderr]) {
  stream.on('error', (e) => {
    if (e && e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    throw e;
  });
}

// The repository's tsconfig maps the `@core` alias, whatever the working directory.
register({ tsconfig: fileURLToPath(new URL('../tsconfig.json', import.meta.url)) });
const { main } = await import('../app/cli/main.ts');
process.exitCode = await main(process.argv.slice(2));
