import { describe, it, expect } from 'vitest';
import { escapeHtml } from '../../../core/report/escape';

describe('escapeHtml()', () => {
  it('escapeHtml() escapes the five HTML-special characters', () => {
    expect(escapeHtml(`<a href="x">'&'</a>`)).toBe(
      '&lt;a href=&quot;x&quot;&gt;&#39;&amp;&#39;&lt;/a&gt;',
    );
  });
  it('escapeHtml() leaves ordinary text and Unicode alone', () => {
    expect(escapeHtml("G'' at 190 °C, δ = 45°")).toBe('G&#39;&#39; at 190 °C, δ = 45°');
    expect(escapeHtml('')).toBe('');
  });
});
