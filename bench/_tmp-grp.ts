import { readFileSync } from 'node:fs';
import { importFiles } from '../core/io/index.ts';
const t0 = performance.now();
const r = importFiles([{ name: 't10k.csv', text: readFileSync(process.argv[2], 'utf8') }], { groupingToleranceK: 0.002 });
console.log('import ms', Math.round(performance.now() - t0), 'isotherms', r.groups.length, 'warnings', r.warnings.length);
