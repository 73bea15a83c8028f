#!/usr/bin/env node
// `npm start`: build what is stale, then run Heed in the Electron shell when its binary is
// installed, else in a Chromium app window on a local static server, else serve only.
// Options (environment): HEED_MODE=electron|chromium|serve, HEED_PORT, HEED_DEBUG_PORT,
// HEED_CHROMIUM (path to a Chromium). Heed is a research and training tool, not a medical device.
import { spawn, spawnSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { homedir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import {
  DEFAULT_PORT, chooseMode, chromiumArgs, chromiumProfileDir, electronBinary, findChromium, hasDisplay, parsePort,
} from './lib/launch-plan.mjs';
import { ELECTRON, RENDERER, targetIsStale } from './lib/freshness.mjs';
import { startStaticServer } from './lib/static-server.mjs';

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

if (targetIsStale(root, RENDERER)) run('the renderer (vite build)', [path.join(root, 'node_modules', 'vite', 'bin', 'vite.js'), 'build']);
else say('renderer is up to date (dist/)');

const forward = (child, onGone) => {
  const stop = () => child.kill('SIGTERM');
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
  child.on('exit', (code, signal) => onGone(code ?? (signal ? 1 : 0)));
  child.on('error', (error) => {
    console.error(`heed: could not start ${child.spawnfile}: ${error.message}`);
    onGone(1);
  });
};

if (choice.mode === 'electron') {
  if (targetIsStale(root, ELECTRON)) run('the Electron main and preload', [path.join(root, 'scripts', 'build-electron.mjs')]);
  const child = spawn(electron, [root], { cwd: root, stdio: 'inherit', env });
  forward(child, (code) => process.exit(code));
} else {
  const listen = async () => {
    const dist = path.join(root, 'dist');
    if (port.port !== null) return startStaticServer({ root: dist, port: port.port });
    try {
      return await startStaticServer({ root: dist, port: DEFAULT_PORT });
    } catch (error) {
      if (error?.code !== 'EADDRINUSE') throw error;
      const server = await startStaticServer({ root: dist, port: 0 });
      // IndexedDB is kept per origin, so another port means another (empty) database.
      say(`port ${DEFAULT_PORT} is busy, so using ${server.port}; data saved at this address is kept apart from the usual ${DEFAULT_PORT}`);
      return server;
    }
  };
  let server;
  try {
    server = await listen();
  } catch (error) {
    fail(`could not serve dist/ on 127.0.0.1${port.port ? `:${port.port}` : ''}: ${error.message}`);
  }
  say(`serving dist/ at ${server.url} (127.0.0.1 only)`);
  const shutdown = async (code) => {
    await server.close();
    process.exit(code);
  };
  if (choice.mode === 'serve') {
    say('open that address in Chromium; press Ctrl+C to stop');
    process.on('SIGINT', () => shutdown(0));
    process.on('SIGTERM', () => shutdown(0));
  } else {
    const profileDir = chromiumProfileDir(env, homedir());
    mkdirSync(profileDir, { recursive: true });
    const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
    const args = chromiumArgs({ url: server.url, profileDir, isRoot, debugPort: debugPort.port });
    say(`opening a Chromium app window (profile ${profileDir})`);
    const child = spawn(chromium, args, { stdio: ['ignore', 'inherit', 'inherit'], env });
    forward(child, (code) => {
      say('Chromium closed; stopping the server');
      void shutdown(code);
    });
  }
}
