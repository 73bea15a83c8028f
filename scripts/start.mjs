#!/usr/bin/env node
// `npm start`: build what is stale, then run Heed in the Electron shell when its binary is
// installed, else in a Chromium app window on a local static server, else serve only.
// Options (environment): HEED_MODE=electron|chromium|serve, HEED_PORT, HEED_DEBUG_PORT,
// HEED_CHROMIUM (path to a Chromium), HEED_VERBOSE=1 (show Chromium's own log). Heed is a research and training tool, not a medical device.
import { spawn, spawnSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { homedir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import {
  DEFAULT_PORT, appUrl, chooseMode, chromiumArgs, chromiumProfileDir, electronBinary, findChromium, hasDisplay, parsePort,
} from './lib/launch-plan.mjs';
import { ELECTRON, RENDERER, targetIsStale } from './lib/freshness.mjs';
import { profileToken, provesHeed } from './lib/launch-token.mjs';
import { acquireLaunchLock } from './lib/launch-lock.mjs';
import { settleStoreEngine, storeEngineNote } from './lib/store-engine.mjs';
import { startStaticServer } from './lib/static-server.mjs';
import { backupSecretFor, createBackupFolder, defaultBackupRoot } from './lib/backup-folder.mjs';

const HANDOFF_MS = 3000;
const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const env = process.env;
const say = (line) => console.log(`heed: ${line}`);
const fail = (line) => {
  console.error(`heed: ${line}`);
  process.exit(1);
};

const run = (label, args) => {
  say(`building ${label}...`);
  const result = spawnSync(process.execPath, args, { cwd: root, stdio: 'inherit' });
  if (result.status !== 0) fail(`building ${label} failed (exit ${result.status ?? result.signal})`);
};

const port = parsePort('HEED_PORT', env.HEED_PORT);
if (!port.ok) fail(port.error);
const debugPort = parsePort('HEED_DEBUG_PORT', env.HEED_DEBUG_PORT);
if (!debugPort.ok) fail(debugPort.error);

const electron = electronBinary(root);
const chromium = findChromium(env);
const choice = chooseMode({ requested: env.HEED_MODE, electronUsable: electron !== null, chromium, hasDisplay: hasDisplay(env) });
if (!choice.ok) fail(choice.error);
say(`mode ${choice.mode} (${choice.reason})`);

// One launcher per profile (Electron has its own single-instance lock): a second start would open
// a second window on the same database. Checked before any build, which would change dist/ under
// the running server.
const profileDir = chromiumProfileDir(env, homedir());
let launchLock = null;
if (choice.mode !== 'electron') {
  const token = profileToken(profileDir);
  const lock = await acquireLaunchLock({ dir: profileDir, mode: choice.mode, proves: (url) => provesHeed(url, token) });
  if (!lock.ok) {
    const { holder } = lock;
    const where = holder.url === null ? 'it is still starting' : `it serves ${holder.url}`;
    const window = holder.mode === 'chromium' ? 'Switch to its Chromium window' : `Open ${holder.url ?? 'its address'} in Chromium`;
    say(`Heed is already running with this profile (launcher process ${holder.pid}, started ${new Date(holder.startedAt).toISOString()}, mode ${holder.mode}; ${where}). ${window}; no second window was opened. To start afresh, close that Heed first (Ctrl+C in its terminal).`);
    process.exit(0);
  }
  if (lock.took !== null) say(`took over a stale launcher lock (${lock.took})`);
  launchLock = lock;
  process.on('exit', () => launchLock?.release());
}

if (targetIsStale(root, RENDERER)) run('the renderer (vite build)', [path.join(root, 'node_modules', 'vite', 'bin', 'vite.js'), 'build']);
else say('renderer is up to date (dist/)');

// Stops the child on Ctrl+C / SIGTERM; a stop we asked for counts as a clean exit.
const forward = (child, onGone) => {
  let stopping = false;
  const stop = () => {
    stopping = true;
    child.kill('SIGTERM');
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
  child.on('exit', (code, signal) => onGone(stopping ? 0 : code ?? (signal ? 1 : 0), stopping));
  child.on('error', (error) => {
    console.error(`heed: could not start ${child.spawnfile}: ${error.message}`);
    onGone(1, false);
  });
};

/** Keeps the last lines a child wrote, to show them only if it fails (Chromium logs harmless noise). */
const tail = (stream, keep = 25) => {
  const lines = [];
  let partial = '';
  stream.setEncoding('utf8');
  stream.on('data', (text) => {
    const parts = (partial + text).split('\n');
    partial = parts.pop() ?? '';
    lines.push(...parts);
    if (lines.length > keep) lines.splice(0, lines.length - keep);
  });
  return () => [...lines, partial].filter((l) => l.trim() !== '');
};

if (choice.mode === 'electron') {
  if (targetIsStale(root, ELECTRON)) run('the Electron main and preload', [path.join(root, 'scripts', 'build-electron.mjs')]);
  const child = spawn(electron, [root], { cwd: root, stdio: 'inherit', env });
  forward(child, (code) => process.exit(code));
} else {
  // The profile's secret token: a server holding it proves it is this Heed (a page title proves
  // nothing: a squatter on the port would otherwise be handed the whole profile).
  const token = profileToken(profileDir);
  // Backups go through this server; the page proves it is ours with a secret derived from the
  // token, so a window opened on a server reused from an earlier launch can back up too.
  const backupSecret = backupSecretFor(token);
  const backups = { folder: createBackupFolder({ root: defaultBackupRoot(env, homedir()) }), secret: backupSecret };
  const listen = async () => {
    const dist = path.join(root, 'dist');
    if (port.port !== null) return startStaticServer({ root: dist, port: port.port, token, backups });
    try {
      return await startStaticServer({ root: dist, port: DEFAULT_PORT, token, backups });
    } catch (error) {
      if (error?.code !== 'EADDRINUSE') throw error;
      // IndexedDB is kept per origin: another port would open another, empty database. So reuse a
      // Heed already serving on the usual port, and otherwise stop rather than hide the data.
      const url = `http://127.0.0.1:${DEFAULT_PORT}/`;
      if (await provesHeed(url, token)) {
        say(`Heed is already being served at ${url}; using it`);
        return { url, port: DEFAULT_PORT, reused: true, close: async () => undefined };
      }
      fail(`port ${DEFAULT_PORT} is taken by a program that cannot prove it is this Heed (it does not hold this profile's token). Heed keeps its data per address, so stop that program, or choose HEED_PORT=<port> knowing that address starts with an empty database.`);
    }
  };
  let server;
  try {
    server = await listen();
  } catch (error) {
    fail(`could not serve dist/ on 127.0.0.1${port.port ? `:${port.port}` : ''}: ${error.message}`);
  }
  if (server.reused && choice.mode === 'serve') process.exit(0);
  launchLock?.setUrl(server.url);
  if (!server.reused) say(`serving dist/ at ${server.url} (127.0.0.1 only); backups go to ${backups.folder.root}`);
  const shutdown = async (code) => {
    await server.close();
    process.exit(code);
  };
  if (choice.mode === 'serve') {
    say(`open ${appUrl(server.url, 'serve', null, backupSecret)} in Chromium; press Ctrl+C to stop`);
    process.on('SIGINT', () => shutdown(0));
    process.on('SIGTERM', () => shutdown(0));
  } else {
    mkdirSync(profileDir, { recursive: true });
    const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
    const store = settleStoreEngine(profileDir);
    const args = chromiumArgs({ url: appUrl(server.url, 'chromium', profileDir, backupSecret, store.engine), profileDir, isRoot, debugPort: debugPort.port, engine: store.engine });
    say(`opening a Chromium app window (profile ${profileDir})`);
    say(`${storeEngineNote(store.engine, profileDir)} (${store.reason})`);
    const verbose = Boolean(env.HEED_VERBOSE);
    const child = spawn(chromium, args, { stdio: ['ignore', verbose ? 'inherit' : 'ignore', verbose ? 'inherit' : 'pipe'], env });
    const lastLines = child.stderr ? tail(child.stderr) : () => [];
    const launchedAt = Date.now();
    forward(child, (code, stopped) => {
      // A Chromium already running on this profile takes the window over and the new one exits at
      // once; that window still needs the server.
      if (code === 0 && !stopped && Date.now() - launchedAt < HANDOFF_MS) {
        say('Chromium passed the window to a Chromium already running with Heed\'s profile; the server stays up, press Ctrl+C to stop');
        process.on('SIGINT', () => shutdown(0));
        process.on('SIGTERM', () => shutdown(0));
        return;
      }
      if (code !== 0 && !stopped) {
        console.error(`heed: Chromium exited with code ${code}; its last output:`);
        for (const line of lastLines()) console.error(`  ${line}`);
      }
      say('Chromium closed; stopping the server');
      void shutdown(code);
    });
  }
}
