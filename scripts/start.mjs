#!/usr/bin/env node
/**
 * `npm start`: opens the Thermoshift desktop app.
 * 1. If the Electron runtime is present (or can be fetched), build with electron-vite and launch it.
 * 2. Otherwise (offline machines, no runtime) build the web version, serve it with `vite preview`
 *    on 127.0.0.1, print the URL and try to open the default browser.
 * Either way it says which one happened. THERMOSHIFT_WEB=1 forces the web version.
 */
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const require = createRequire(import.meta.url);
const say = (s) => console.log(`[thermoshift] ${s}`);

/** Path of the Electron executable if it is installed, else null (never triggers a download). */
function installedElectron() {
  try {
    const dir = dirname(require.resolve('electron/package.json'));
    const pathFile = join(dir, 'path.txt');
    if (!existsSync(pathFile)) return null;
    const exe = join(dir, 'dist', readFileSync(pathFile, 'utf8'));
    return existsSync(exe) ? exe : null;
  } catch {
    return null;
  }
}

/** Tries once to fetch the Electron runtime (electron's own installer), with a time limit. */
function fetchElectron() {
  try {
    const dir = dirname(require.resolve('electron/package.json'));
    say('Electron runtime not installed yet; trying to download it once…');
    const r = spawnSync(process.execPath, [join(dir, 'install.js')], {
      stdio: 'ignore',
      timeout: 120_000,
    });
    return r.status === 0 ? installedElectron() : null;
  } catch {
    return null;
  }
}

function run(cmd, args) {
  const r = spawnSync(cmd, args, {
    cwd: root,
    stdio: 'inherit',
    shell: process.platform === 'win32',
  });
  if (r.status !== 0) {
    console.error(`[thermoshift] "${cmd} ${args.join(' ')}" failed.`);
    process.exit(r.status ?? 1);
  }
}

function openBrowser(url) {
  const cmd =
    process.platform === 'darwin' ? 'open' : process.platform === 'win32' ? 'cmd' : 'xdg-open';
  const args = process.platform === 'win32' ? ['/c', 'start', '', url] : [url];
  try {
    const child = spawn(cmd, args, { stdio: 'ignore', detached: true });
    child.on('error', () => say('Could not open a browser by itself; open the address above.'));
    child.unref();
  } catch {
    say('Could not open a browser by itself; open the address above.');
  }
}

async function startWeb(reason) {
  say(`${reason} Starting the web version instead (same app, runs in your browser).`);
  run('npx', ['vite', 'build', '--logLevel', 'warn']);
  const { preview } = await import('vite');
  const server = await preview({
    root,
    configFile: join(root, 'vite.config.ts'),
    preview: {
      host: '127.0.0.1',
      port: Number(process.env.PORT ?? 4173),
      strictPort: false,
      open: false,
    },
  });
  const url = server.resolvedUrls?.local?.[0] ?? 'http://127.0.0.1:4173/';
  say(`Thermoshift (web version) is running at ${url}`);
  say('Press Ctrl+C to stop it.');
  openBrowser(url);
}

const forceWeb = process.env.THERMOSHIFT_WEB === '1';
const electron = forceWeb ? null : (installedElectron() ?? fetchElectron());
if (electron) {
  say('Building the desktop app…');
  run('npx', ['electron-vite', 'build']);
  say('Launching the Thermoshift desktop app (Electron).');
  const child = spawn(electron, [root], { cwd: root, stdio: 'inherit' });
  child.on('exit', (code) => process.exit(code ?? 0));
} else {
  await startWeb(
    forceWeb
      ? 'THERMOSHIFT_WEB=1 is set.'
      : 'The Electron runtime is not available on this computer (it could not be downloaded).',
  );
}
