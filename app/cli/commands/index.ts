import type { Command } from 'commander';
import { registerInspect } from './inspect.ts';
import { registerBuild } from './build.ts';
import { registerBatch } from './batch.ts';
import { registerCompare } from './compare.ts';

/** Every command of the CLI; each module adds one `registerX(program)`. */
export function registerCommands(program: Command): void {
  void program;
  registerInspect(program);
  registerBuild(program);
  registerBatch(program);
  registerCompare(program);
}
