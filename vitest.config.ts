import { defineConfig, mergeConfig } from 'vitest/config';
import viteConfig from './vite.config.ts';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('.', import.meta.url));

export default mergeConfig(
  viteConfig,
  defineConfig({
    root,
    test: {
      projects: [
        {
          extends: true,
          test: {
            name: 'unit',
            root,
            environment: 'node',
            include: [
              'tests/core/**/*.test.ts',
              'tests/cli/**/*.test.ts',
              'tests/main/**/*.test.ts',
              'tests/scripts/**/*.test.ts',
            ],
            testTimeout: 60_000,
            // Bundles the CLI (dist/cli) that tests/cli runs.
            globalSetup: ['tests/cli/global-setup.ts'],
          },
        },
        {
          extends: true,
          test: {
            name: 'component',
            root,
            environment: 'happy-dom',
            include: ['tests/renderer/**/*.test.ts'],
          },
        },
        {
          extends: true,
          test: {
            name: 'e2e',
            root,
            environment: 'node',
            include: ['tests/e2e/**/*.test.ts'],
            // Builds dist/web and out/ when missing or stale (runs only when e2e tests run).
            globalSetup: ['tests/e2e/global-setup.ts'],
            testTimeout: 120_000,
            hookTimeout: 120_000,
            fileParallelism: false,
          },
        },
      ],
    },
  }),
);
