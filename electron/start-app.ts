// Wires the Electron app: privileged heed:// scheme, session policy, guards on every web
// contents, IPC handlers, then the one window. Heed is a research and training tool, not a
// medical device.
import { mkdirSync } from 'node:fs';
import { app, ipcMain, protocol, session } from 'electron';
import { DISABLED_FEATURES } from '../scripts/lib/launch-plan.mjs';
import { settleStoreEngine, SQLITE_FEATURE } from '../scripts/lib/store-engine.mjs';
import { APP_SCHEME, APP_SCHEME_PRIVILEGES, appResponse } from './app-protocol';
import { registerIpc } from './ipc-main';
import { applySessionPolicy, createMainWindow, guardContents } from './window';

export type AppPaths = { distRoot: string; preload: string };

/** A remote-debugging port from HEED_DEBUG_PORT (used to measure start-up), or null. */
export const debugPortFrom = (value: string | undefined): number | null => {
  if (value === undefined || !/^\d+$/.test(value.trim())) return null;
  const port = Number(value.trim());
  return port >= 1 && port <= 65535 ? port : null;
};

export const startApp = ({ distRoot, preload }: AppPaths, env: Record<string, string | undefined> = process.env): void => {
  // Must happen before 'ready': gives heed://app a stable, secure origin (IndexedDB lives there).
  protocol.registerSchemesAsPrivileged([{ scheme: APP_SCHEME, privileges: APP_SCHEME_PRIVILEGES }]);
  app.enableSandbox();
  const debugPort = debugPortFrom(env.HEED_DEBUG_PORT);
  // Remote debugging only for measuring a development build, never in a packaged app.
  if (debugPort !== null && !app.isPackaged) app.commandLine.appendSwitch('remote-debugging-port', String(debugPort));

  // One Heed per user: two windows writing one IndexedDB would fight over a reading session.
  if (!app.requestSingleInstanceLock()) {
    app.quit();
    return;
  }
  // Chromium's SQLite IndexedDB engine for a new profile: its default engine can delete the whole
  // database after a crash (scripts/lib/store-engine.mjs). Unverified in Electron here: its binary
  // cannot be downloaded on these machines, and a Chromium without the feature ignores the switch.
  const userData = app.getPath('userData');
  mkdirSync(userData, { recursive: true });
  const { engine } = settleStoreEngine(userData);
  if (engine === 'sqlite') app.commandLine.appendSwitch('enable-features', SQLITE_FEATURE);
  // As the launcher's app window: with BackgroundResourceFetch on, Chromium 156 parsed the app's
  // module scripts from source at every launch instead of using their code cache (bench/README.md,
  // "Cold start, sixth session"; measured in Chromium, not in Electron, which cannot run here).
  app.commandLine.appendSwitch('disable-features', DISABLED_FEATURES.join(','));
  app.on('web-contents-created', (_event, contents) => guardContents(contents));
  app.on('window-all-closed', () => app.quit());

  void app.whenReady().then(() => {
    applySessionPolicy(session.defaultSession);
    protocol.handle(APP_SCHEME, (request) => appResponse(distRoot, request.url));
    registerIpc(ipcMain);
    const window = createMainWindow(preload, app.isPackaged, engine);
    app.on('second-instance', () => {
      if (window.isMinimized()) window.restore();
      window.focus();
    });
  });
};
