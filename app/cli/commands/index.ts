import type { Command } from 'commander';

/** Every command of the CLI; each module adds one `registerX(program)`. */
export function registerCommands(program: Command): void {
  void program;
}
