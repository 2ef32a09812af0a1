#!/usr/bin/env node
// Command-line entry point. The CLI is written in TypeScript and shares its code with the desktop
// app; tsx compiles it on the fly so the repository runs without a separate build step.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('../app/cli/main.ts');
process.exitCode = await main(process.argv.slice(2));
