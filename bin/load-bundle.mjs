// Loads the command-line bundle dist/cli/thermoshift.cjs (made by scripts/build-cli.mjs) with
// V8's code cache: compiling its ~1 MB of JavaScript is most of a start, and the cache stored
// beside it (dist/cli/thermoshift.cjs.v8cache) holds the bytecode of the functions a build run
// uses, so V8 reads them instead of compiling them again. The cache is used only when its header
// names the same build as the bundle's first line; V8 itself rejects a cache made by another Node
// or with other V8 flags (cachedDataRejected), and the bundle is then compiled as usual.
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, resolve } from 'node:path';
import vm from 'node:vm';

/** First line of the bundle: `// thermoshift-bundle <build id>` (scripts/build-cli.mjs). */
const BUILD_LINE = /^\/\/ thermoshift-bundle (\S+)\n/;

/** Header of the cache file, before V8's bytes. */
export const cacheHeader = (buildId) => `thermoshift-v8-cache ${buildId}\n`;

/**
 * Compiles and runs the bundle (a CommonJS script) and returns its exports with the compiled
 * script (whose createCachedData() gives the cache) and whether a cache was used.
 */
export function loadBundle(path, cachePath = `${path}.v8cache`) {
  const bundlePath = resolve(path);
  const source = readFileSync(bundlePath, 'utf8');
  const buildId = BUILD_LINE.exec(source)?.[1];
  let cachedData;
  if (buildId && !process.env.THERMOSHIFT_NO_CODE_CACHE) {
    try {
      const bytes = readFileSync(cachePath);
      const header = Buffer.from(cacheHeader(buildId));
      if (bytes.subarray(0, header.length).equals(header))
        cachedData = bytes.subarray(header.length);
    } catch {
      // no cache: compile as usual
    }
  }
  const script = new vm.Script(
    `(function (exports, require, module, __filename, __dirname) {${source}\n})`,
    { filename: bundlePath, cachedData },
  );
  const module = { exports: {} };
  script.runInThisContext()(
    module.exports,
    createRequire(bundlePath),
    module,
    bundlePath,
    dirname(bundlePath),
  );
  return {
    exports: module.exports,
    script,
    buildId,
    cacheUsed: cachedData !== undefined && !script.cachedDataRejected,
  };
}
