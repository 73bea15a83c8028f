// The pure decisions of `npm start`: which mode runs, where the Chromium profile lives, and the
// Chromium command line. Kept free of side effects so they are unit-tested.
import { existsSync, readFileSync, accessSync, constants } from 'node:fs';
import path from 'node:path';
import { storeEngineArgs } from './store-engine.mjs';

export const MODES = Object.freeze(['electron', 'chromium', 'serve']);
export const DEFAULT_PORT = 5178;

/**
 * Picks the mode. `requested` is HEED_MODE (may be empty). An explicit mode that cannot run is an
 * error with a message, never a silent fallback; with no request the best available mode wins:
 * Electron, then a Chromium app window, then serve-only (no display, or no browser found).
 * @param {{ requested?: string; electronUsable: boolean; chromium: string | null; hasDisplay: boolean }} facts
 * @returns {{ ok: true; mode: 'electron' | 'chromium' | 'serve'; reason: string } | { ok: false; error: string }}
 */
export const chooseMode = ({ requested, electronUsable, chromium, hasDisplay }) => {
  const want = (requested ?? '').trim().toLowerCase();
  if (want !== '' && !MODES.includes(want)) {
    return { ok: false, error: `HEED_MODE="${requested}" is not one of ${MODES.join(', ')}` };
  }
  if (want === 'serve') return { ok: true, mode: 'serve', reason: 'HEED_MODE=serve' };
  if (want === 'electron') {
    if (!electronUsable) return { ok: false, error: 'HEED_MODE=electron, but the Electron binary is not installed (node_modules/electron/dist is missing)' };
    if (!hasDisplay) return { ok: false, error: 'HEED_MODE=electron, but there is no display (neither DISPLAY nor WAYLAND_DISPLAY is set)' };
    return { ok: true, mode: 'electron', reason: 'HEED_MODE=electron' };
  }
  if (want === 'chromium') {
    if (chromium === null) return { ok: false, error: 'HEED_MODE=chromium, but no Chromium was found (set HEED_CHROMIUM to its path)' };
    if (!hasDisplay) return { ok: false, error: 'HEED_MODE=chromium, but there is no display (neither DISPLAY nor WAYLAND_DISPLAY is set)' };
    return { ok: true, mode: 'chromium', reason: 'HEED_MODE=chromium' };
  }
  if (!hasDisplay) return { ok: true, mode: 'serve', reason: 'no display (neither DISPLAY nor WAYLAND_DISPLAY is set)' };
  if (electronUsable) return { ok: true, mode: 'electron', reason: 'the Electron binary is installed' };
  if (chromium !== null) return { ok: true, mode: 'chromium', reason: `the Electron binary is not installed; using ${chromium}` };
  return { ok: true, mode: 'serve', reason: 'neither the Electron binary nor a Chromium was found' };
};

/** True when a graphical session is reachable. */
export const hasDisplay = (env) => Boolean(env.DISPLAY || env.WAYLAND_DISPLAY);

/**
 * Parses HEED_PORT / HEED_DEBUG_PORT: empty means "not given" (null); anything but an integer in
 * 1..65535 is an error naming the variable.
 */
export const parsePort = (name, value) => {
  if (value === undefined || value.trim() === '') return { ok: true, port: null };
  const text = value.trim();
  const n = Number(text);
  if (!/^\d+$/.test(text) || n < 1 || n > 65535) return { ok: false, error: `${name}="${value}" is not a port number (1-65535)` };
  return { ok: true, port: n };
};

/**
 * The address the launcher opens: the served root with the launch mode (and, for the Chromium
 * window, its profile folder) in the query string, so the start screen can say where this
 * window's data lives. The query does not change the origin, so the database is the same.
 * `backupSecret`, when given, lets the page write backups through the launcher (backup-endpoint.mjs);
 * `engine`, the Chromium window's IndexedDB engine, which the start screen names.
 * @param {string} url @param {'chromium' | 'serve'} mode @param {string | null} profileDir @param {string | null} [backupSecret] @param {'sqlite' | 'leveldb' | null} [engine]
 */
export const appUrl = (url, mode, profileDir, backupSecret = null, engine = null) => {
  const address = new URL(url);
  address.searchParams.set('mode', mode);
  if (profileDir !== null) address.searchParams.set('profile', profileDir);
  if (engine !== null) address.searchParams.set('store', engine);
  if (backupSecret !== null) address.searchParams.set('backup', backupSecret);
  return address.href;
};

/**
 * The persistent Chromium profile: <config>/heed/chromium-profile where <config> is
 * $XDG_CONFIG_HOME when it is an absolute path (the XDG spec says relative values are ignored),
 * else ~/.config. The profile keeps the IndexedDB database between launches.
 */
export const chromiumProfileDir = (env, home) => {
  const xdg = env.XDG_CONFIG_HOME;
  const config = xdg && path.isAbsolute(xdg) ? xdg : path.join(home, '.config');
  return path.resolve(config, 'heed', 'chromium-profile');
};

/**
 * Chromium's command line for an app window on `url`. Background services that would reach the
 * network are switched off. `--no-sandbox` only as root, where Chromium refuses to start otherwise.
 * `engine` is the profile's IndexedDB engine (store-engine.mjs).
 *
 * BackgroundResourceFetch is switched off so a relaunch runs the app's scripts from V8's code cache:
 * with it (Chromium 156), module scripts are always parsed again from source, although Chromium
 * writes their code cache at the second launch (bench/README.md, "Cold start, sixth session").
 * It is the only --disable-features switch here: Chromium keeps the last one given.
 * @param {{ url: string; profileDir: string; isRoot: boolean; debugPort: number | null; engine: 'sqlite' | 'leveldb' }} o
 */
export const DISABLED_FEATURES = Object.freeze(['BackgroundResourceFetch']);

export const chromiumArgs = ({ url, profileDir, isRoot, debugPort, engine }) => [
  `--app=${url}`,
  `--user-data-dir=${profileDir}`,
  '--no-first-run',
  '--no-default-browser-check',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--disable-quic',
  `--disable-features=${DISABLED_FEATURES.join(',')}`,
  ...storeEngineArgs(engine),
  ...(isRoot ? ['--no-sandbox'] : []),
  ...(debugPort !== null ? [`--remote-debugging-port=${debugPort}`] : []),
];

/**
 * The Electron executable if it was really installed. Reads the package's path.txt and checks the
 * file, without require('electron'), which would try to download it.
 */
export const electronBinary = (root) => {
  const pkg = path.join(root, 'node_modules', 'electron');
  try {
    const rel = readFileSync(path.join(pkg, 'path.txt'), 'utf8').trim();
    const bin = path.join(pkg, 'dist', rel);
    accessSync(bin, constants.X_OK);
    return bin;
  } catch {
    return null;
  }
};

const CHROMIUM_NAMES = ['chromium', 'chromium-browser', 'google-chrome', 'google-chrome-stable'];

/** HEED_CHROMIUM if it exists, else the first known Chromium name found on PATH. */
export const findChromium = (env) => {
  if (env.HEED_CHROMIUM) return existsSync(env.HEED_CHROMIUM) ? env.HEED_CHROMIUM : null;
  for (const dir of (env.PATH ?? '').split(path.delimiter).filter(Boolean)) {
    for (const name of CHROMIUM_NAMES) {
      const candidate = path.join(dir, name);
      try {
        accessSync(candidate, constants.X_OK);
        return candidate;
      } catch {
        // not here
      }
    }
  }
  return null;
};
