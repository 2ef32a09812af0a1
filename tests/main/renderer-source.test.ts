import { describe, expect, it } from 'vitest';
import { rendererSource } from '../../app/main/renderer-source';

const APP = { url: 'app://thermoshift/index.html', origin: 'app://thermoshift' };

describe('rendererSource()', () => {
  it('rendererSource() loads app:// in a packaged app even when ELECTRON_RENDERER_URL is set', () => {
    expect(rendererSource({ packaged: true, devUrl: 'http://localhost:5173/' })).toEqual(APP);
    expect(rendererSource({ packaged: true, devUrl: 'https://evil.example/' })).toEqual(APP);
    expect(rendererSource({ packaged: true })).toEqual(APP);
  });

  it('rendererSource() uses the dev server only when unpackaged, trusting its exact origin', () => {
    expect(rendererSource({ packaged: false, devUrl: 'http://localhost:5173/' })).toEqual({
      url: 'http://localhost:5173/',
      origin: 'http://localhost:5173',
      devUrl: 'http://localhost:5173/',
    });
    expect(rendererSource({ packaged: false })).toEqual(APP);
  });

  it('rendererSource() ignores a dev URL that is not an http(s) address', () => {
    for (const devUrl of ['', 'file:///tmp/index.html', 'javascript:alert(1)', 'not a url'])
      expect(rendererSource({ packaged: false, devUrl }), devUrl).toEqual(APP);
  });
});
