/**
 * `npm run bench`: runs every bench/*.bench.ts module in turn. Each exports `run(): Promise<void>`
 * and prints its own figures. Speed is measured here, never asserted in tests.
 * `npm run bench -- shift` runs only the modules whose file name contains "shift".
 * `npm run bench -- vs` (side by side with the yardstick, several minutes) runs only when named.
 */
import { readdirSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { join } from 'node:path';
import os from 'node:os';

const dir = fileURLToPath(new URL('.', import.meta.url));
const filter = process.argv[2] ?? '';
const files = readdirSync(dir)
  .filter((f) => f.endsWith('.bench.ts') && f.includes(filter))
  .filter((f) => filter !== '' || f !== 'vs.bench.ts')
  .sort();

console.log(`Thermoshift benchmarks — Node ${process.version}, ${os.cpus()[0]?.model ?? 'cpu'}`);
for (const f of files) {
  console.log(`\n== ${f} ==`);
  const mod = (await import(pathToFileURL(join(dir, f)).href)) as { run: () => Promise<void> };
  await mod.run();
}
