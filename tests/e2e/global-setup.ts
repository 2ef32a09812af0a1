/**
 * Global setup of the e2e project: builds what the browser tests load, when it is missing or
 * older than its sources — the web renderer (dist/web, served by vite preview) and the desktop
 * build (out/, whose renderer the app:// test serves). So `npx vitest run` alone works from a
 * fresh clone after `npm ci`, and a second run builds nothing.
 */
import { fileURLToPath } from 'node:url';
import { buildIfStale, ELECTRON_BUILD, WEB_BUILD } from '../../scripts/build-if-stale';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));

export default function setup(): void {
  for (const target of [WEB_BUILD, ELECTRON_BUILD]) buildIfStale(ROOT, target);
}
