/**
 * The CLI tests run the bundle dist/cli/thermoshift.mjs, as users do; it is rebuilt here once per
 * Vitest run (esbuild takes well under a second) so a test never runs a stale bundle.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

export default function setup(): void {
  const root = fileURLToPath(new URL('../..', import.meta.url));
  const r = spawnSync(process.execPath, ['scripts/build-cli.mjs'], { cwd: root, encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`scripts/build-cli.mjs failed:\n${r.stderr}`);
}
