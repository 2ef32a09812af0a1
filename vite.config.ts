import { defineConfig } from 'vite';
import vue from '@vitejs/plugin-vue';
import { fileURLToPath } from 'node:url';

// The renderer is built as a plain web page: Electron loads it with loadFile() (hence base './'),
// and `npm run web` / the browser tests serve the very same build.
export default defineConfig({
  root: fileURLToPath(new URL('./app/renderer', import.meta.url)),
  base: './',
  publicDir: false,
  plugins: [vue()],
  build: {
    outDir: fileURLToPath(new URL('./dist/web', import.meta.url)),
    emptyOutDir: true,
    chunkSizeWarningLimit: 1500,
  },
  worker: { format: 'es' },
});
