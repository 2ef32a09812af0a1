// Writes V8's code cache of the command-line bundle, dist/cli/thermoshift.cjs.v8cache (run by
// scripts/build-cli.mjs right after bundling). It loads the bundle as bin/thermoshift.mjs does,
// runs one build of the invented sample samples/melt-long into a scratch folder, so that the
// functions a build needs are compiled, and then stores the bytecode V8 holds for the bundle.
import { mkdtempSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { cacheHeader, loadBundle } from '../bin/load-bundle.mjs';

const root = fileURLToPath(new URL('..', import.meta.url));
const bundle = join(root, 'dist/cli/thermoshift.cjs');
const cache = `${bundle}.v8cache`;
rmSync(cache, { force: true });
const { exports, script, buildId } = loadBundle(bundle);
if (!buildId) throw new Error(`${bundle} does not start with its build line`);
const scratch = mkdtempSync(join(tmpdir(), 'thermoshift-cache-'));
try {
  const code = await exports.main([
    'build',
    join(root, 'samples/melt-long'),
    '--out',
    scratch,
    '--date',
    '2000-01-01',
    '--quiet',
  ]);
  if (code !== 0) throw new Error(`the build run for the code cache exited with ${code}`);
} finally {
  rmSync(scratch, { recursive: true, force: true });
}
writeFileSync(
  `${cache}.tmp`,
  Buffer.concat([Buffer.from(cacheHeader(buildId)), script.createCachedData()]),
);
renameSync(`${cache}.tmp`, cache);
