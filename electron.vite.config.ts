/**
 * electron-vite builds the three parts of the desktop app into out/: main (ESM), preload (CommonJS
 * `preload.cjs`, because sandboxed preloads cannot be ES modules) and the renderer (the same page
 * `npm run web` serves, root app/renderer), which main serves on app://thermoshift/. Dependencies
 * are bundled, so out/** is self-contained for electron-builder.
 */
import { defineConfig } from 'electron-vite';
import vue from '@vitejs/plugin-vue';
import { fileURLToPath } from 'node:url';
import { devStyleNonce } from './scripts/vite-dev-style-nonce.ts';
import { coreAlias } from './scripts/core-alias.ts';

const at = (p: string): string => fileURLToPath(new URL(p, import.meta.url));

export default defineConfig({
  main: {
    resolve: { alias: coreAlias },
    build: {
      externalizeDeps: false,
      outDir: at('./out/main'),
      lib: { entry: at('./app/main/main.ts'), formats: ['es'], fileName: () => 'main.js' },
    },
  },
  preload: {
    build: {
      externalizeDeps: false,
      outDir: at('./out/preload'),
      lib: {
        entry: at('./app/preload/preload.ts'),
        formats: ['cjs'],
        fileName: () => 'preload.cjs',
      },
    },
  },
  renderer: {
    root: at('./app/renderer'),
    base: './',
    publicDir: false,
    plugins: [vue(), devStyleNonce()],
    resolve: { alias: coreAlias },
    worker: { format: 'es' },
    build: {
      outDir: at('./out/renderer'),
      minify: true,
      chunkSizeWarningLimit: 1500,
      rollupOptions: { input: at('./app/renderer/index.html') },
    },
  },
});
