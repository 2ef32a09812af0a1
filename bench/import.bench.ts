/**
 * Import speed: a 1,000,000-row long-format file (T, f, G', G''), generated in memory — 250
 * isotherms 2 K apart with 4,000 frequencies each, measured temperatures wandering ±0.2 K.
 * Target: under 3 s on an ordinary computer. Also the same rows with semicolons and decimal
 * commas (the slower, strict number path), quoted cells (the papaparse path), and the plain rows
 * handed over in 4 MB whole-line chunks as the command line does (`chunked`). Last, 10,000
 * isotherms of 3 points each (30,000 rows), which must cost at most N log N in the isotherms.
 */
import { LineChunker, importFiles } from '../core/io/index.ts';
import { medianMs } from './timing.ts';

const ISOTHERMS = 250;
const PER_ISOTHERM = 4000;

function longText(style: 'plain' | 'decimalComma' | 'quoted'): string {
  const d = style === 'decimalComma' ? ';' : ',';
  const header =
    style === 'decimalComma' ? "T (°C);f (Hz);G' (Pa);G'' (Pa)" : "T (°C),f (Hz),G' (Pa),G'' (Pa)";
  const rows: string[] = [header];
  const freqs = Array.from({ length: PER_ISOTHERM }, (_, i) =>
    (1e-3 * 10 ** (i / (PER_ISOTHERM / 6))).toPrecision(6),
  );
  for (let k = 0; k < ISOTHERMS; k++) {
    for (let i = 0; i < PER_ISOTHERM; i++) {
      const t = (-100 + 2 * k + 0.2 * Math.sin(i)).toFixed(2);
      const gp = (1e5 * (1 + k + i / PER_ISOTHERM)).toPrecision(6);
      const gpp = (2e4 * (1 + k + i / PER_ISOTHERM)).toPrecision(6);
      let row = `${t}${d}${freqs[i]}${d}${gp}${d}${gpp}`;
      if (style === 'decimalComma') row = row.replace(/\./g, ',');
      if (style === 'quoted') row = `"${t}",${freqs[i]},${gp},${gpp}`;
      rows.push(row);
    }
  }
  return rows.join('\r\n');
}

/** The text in whole-line chunks of about 4 M characters (as app/cli/io/read-text-chunks.ts). */
function* chunks(text: string): Generator<string> {
  const c = new LineChunker();
  for (let i = 0; i < text.length; i += 4 << 20) {
    const s = c.push(text.slice(i, i + (4 << 20)));
    if (s) yield s;
  }
  const rest = c.end();
  if (rest) yield rest;
}

function manyIsothermsText(): string {
  const rows = ["T (°C),f (Hz),G' (Pa),G'' (Pa)"];
  for (let i = 0; i < 10_000; i++)
    for (let k = 0; k < 3; k++)
      rows.push(`${(-10 + i * 0.01).toFixed(3)},${10 ** (k * 0.5 - 1)},${1e5 + i},${2e4 + i}`);
  return rows.join('\n');
}

export async function run(): Promise<void> {
  {
    const text = longText('plain');
    const ms = medianMs(
      () => importFiles([{ name: 'bench-chunked.csv', text: '', chunks: chunks(text) }]),
      5,
      1,
    );
    console.log(
      `importFiles chunked      ${(ISOTHERMS * PER_ISOTHERM).toLocaleString('en')} rows in 4 MB chunks: median ${(ms / 1000).toFixed(2)} s (target < 1.5 s)`,
    );
    const many = manyIsothermsText();
    let n = 0;
    const ms2 = medianMs(
      () => {
        n = importFiles([{ name: 'bench-10k.csv', text: many }], { groupingToleranceK: 0.002 })
          .groups.length;
      },
      3,
      1,
    );
    console.log(
      `importFiles ${n.toLocaleString('en')} isotherms × 3 points: median ${(ms2 / 1000).toFixed(2)} s`,
    );
  }
  for (const style of ['plain', 'decimalComma', 'quoted'] as const) {
    const text = longText(style);
    let isotherms = 0;
    const ms = medianMs(
      () => {
        isotherms = importFiles([{ name: `bench-${style}.csv`, text }]).dataset.isotherms.length;
      },
      style === 'plain' ? 5 : 3,
      1,
    );
    const rows = ISOTHERMS * PER_ISOTHERM;
    console.log(
      `importFiles ${style.padEnd(12)} ${rows.toLocaleString('en')} rows (${(text.length / 1e6).toFixed(1)} MB), ` +
        `${isotherms} isotherms: median ${(ms / 1000).toFixed(2)} s${style === 'plain' ? ' (target < 3 s)' : ''}`,
    );
  }
}
