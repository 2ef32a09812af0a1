/**
 * The repository explains itself: code, comments, tests and docs give the reasoning or link a file
 * in docs/, never a document outside the repository or a numbered tracker entry (which a reader of
 * the files cannot open). The science and the accuracy targets live in docs/conventions.md.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = join(import.meta.dirname, '..', '..');
const FOLDERS = ['core', 'app', 'tests', 'docs', 'scripts', 'bench'];
const TOP_FILES = ['README.md', 'DEVELOPERS.md', 'eslint.config.js'];
const SOURCE = /\.(ts|vue|md|js|mjs|cjs|html)$/;

function walk(dir: string, out: string[]): void {
  for (const name of readdirSync(dir)) {
    const full = join(dir, name);
    if (statSync(full).isDirectory()) walk(full, out);
    else if (SOURCE.test(name)) out.push(full);
  }
}

// Built from parts so that this file does not match itself.
const OUTSIDE_DOC = new RegExp(['DOMAIN', '\\.md'].join(''), 'i');
const TRACKER_ENTRY = new RegExp(['\\bissues?', '\\s+#?\\d'].join(''), 'i');

describe('the repository is self-contained', () => {
  it('no file cites a document outside the repository or a numbered tracker entry', () => {
    const files: string[] = TOP_FILES.map((f) => join(root, f));
    for (const folder of FOLDERS) walk(join(root, folder), files);
    expect(files.length).toBeGreaterThan(200);
    const hits: string[] = [];
    for (const file of files) {
      readFileSync(file, 'utf8')
        .split('\n')
        .forEach((line, i) => {
          if (OUTSIDE_DOC.test(line) || TRACKER_ENTRY.test(line)) {
            hits.push(`${relative(root, file)}:${i + 1}: ${line.trim()}`);
          }
        });
    }
    expect(hits).toEqual([]);
  });

  it('the conventions the code cites are in docs/conventions.md', () => {
    const text = readFileSync(join(root, 'docs', 'conventions.md'), 'utf8');
    for (let section = 1; section <= 7; section += 1) {
      expect(text, `§${section}`).toMatch(new RegExp(`^## §${section} `, 'm'));
    }
    expect(text).toContain('log10 aT < 0');
    expect(text).toContain('bT × measured');
  });
});
