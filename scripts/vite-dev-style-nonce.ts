/**
 * Vite plugin for the dev server only (`npm run web`, electron-vite dev). The page's CSP allows
 * styles from 'self' and nothing inline, but in development Vite injects every stylesheet as a
 * <style> element (for hot reload). This plugin draws a fresh random nonce per server start, adds
 * it to the CSP's style-src and hands it to Vite (`html.cspNonce`), which puts it on the styles it
 * injects. Production builds write plain .css files and are not touched.
 */
import { randomBytes } from 'node:crypto';
import type { Plugin } from 'vite';

/** index.html with `'nonce-…'` added to the style-src of its CSP meta tag. */
export function withStyleNonce(html: string, nonce: string): string {
  let found = false;
  const out = html.replace(
    /(http-equiv="Content-Security-Policy"[^>]*content="[^"]*style-src)([^;"]*)/,
    (_m, head: string, sources: string) => {
      found = true;
      return `${head}${sources} 'nonce-${nonce}'`;
    },
  );
  if (!found)
    throw new Error('index.html has no Content-Security-Policy meta tag with a style-src');
  return out;
}

export function devStyleNonce(nonce = randomBytes(18).toString('base64')): Plugin {
  return {
    name: 'thermoshift:dev-style-nonce',
    apply: 'serve',
    config: () => ({ html: { cspNonce: nonce } }),
    transformIndexHtml: { order: 'pre', handler: (html) => withStyleNonce(html, nonce) },
  };
}
