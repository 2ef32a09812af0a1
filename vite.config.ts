import { defineConfig } from 'vite';
import vue from '@vitejs/plugin-vue';
import { fileURLToPath } from 'node:url';
import { devStyleNonce } from './scripts/vite-dev-style-nonce.ts';
import { coreAlias } from './scripts/core-alias.ts';

// The renderer is built as a plain web page with relative URLs (base './'): Electron serves it on
// app://thermoshift/, and `npm run web` / the browser tests serve the very same build. Both run
// under the CSP of index.html (no inline styles); only the dev server adds a per-start nonce for
// the <style> elements Vite injects (scripts/vite-dev-style-nonce.ts).
export default defineConfig({
  root: fileURLToPath(new URL('./app/renderer', import.meta.url)),
  base: './',
  publicDir: false,
  plugins: [vue(), devStyleNonce()],
  resolve: { alias: coreAlias },
  build: {
    outDir: fileURLToPath(new URL('./dist/web', import.meta.url)),
    emptyOutDir: true,
    chunkSizeWarningLimit: 1500,
  },
  worker: { format: 'es' },
});
