import { describe, it, expect } from 'vitest';
import { launchBrowser } from '../helpers/browser';

describe('launchBrowser()', () => {
  it('launchBrowser() starts Debian Chromium and renders a page', async () => {
    const ctx = await launchBrowser();
    try {
      const page = await ctx.newPage();
      await page.setContent('<p id="x">superposed</p>');
      expect(await page.textContent('#x')).toBe('superposed');
    } finally {
      await ctx.close();
    }
  });
});
