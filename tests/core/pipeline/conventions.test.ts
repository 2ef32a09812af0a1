import { describe, it, expect } from 'vitest';
import { CONVENTIONS, conventionCommentLines } from '../../../core/pipeline/conventions';

describe('conventionCommentLines()', () => {
  it('conventionCommentLines() states both conventions as CSV comment lines', () => {
    const lines = conventionCommentLines();
    expect(lines.every((l) => l.startsWith('# '))).toBe(true);
    expect(lines.join('\n')).toContain(CONVENTIONS.horizontal);
    expect(lines.join('\n')).toContain(CONVENTIONS.vertical);
  });
  it('CONVENTIONS use the sign of docs/conventions.md §2: log10 aT < 0 above Tref, reduced = bT × measured', () => {
    expect(CONVENTIONS.horizontal).toContain('aT·ω');
    expect(CONVENTIONS.horizontal).toContain('log10 aT < 0 above Tref');
    expect(CONVENTIONS.vertical).toContain('reduced modulus = bT × measured modulus');
  });
});
