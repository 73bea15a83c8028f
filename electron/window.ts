// The one window factory, and the policies every web contents and the session share: sandboxed
// renderer, no navigation away from the app, no new windows, strict CSP, permissions denied.
import { BrowserWindow } from 'electron';
import type { Session, WebContents } from 'electron';
import { CONTENT_SECURITY_POLICY } from '../scripts/lib/web-policy.mjs';
import type { StoreEngine } from '../scripts/lib/store-engine.mjs';
import { APP_URL, isAppUrl } from './app-protocol';

type NavigationEvent = { url: string; preventDefault(): void };

/** Lets a navigation or redirect through only when it stays inside heed://app/. */
export const blockForeignNavigation = (event: NavigationEvent): void => {
  if (!isAppUrl(event.url)) event.preventDefault();
};

/** The shared handler for every web contents: blocks navigation, denies new windows and webviews. */
export const guardContents = (contents: WebContents): void => {
  contents.on('will-navigate', (event) => blockForeignNavigation(event));
  contents.on('will-frame-navigate', (event) => blockForeignNavigation(event));
  contents.on('will-redirect', (event) => blockForeignNavigation(event));
  contents.on('will-attach-webview', (event) => event.preventDefault());
  contents.setWindowOpenHandler(() => ({ action: 'deny' }));
};

/** CSP on every response, and every permission (camera, notifications, ...) refused. */
export const applySessionPolicy = (session: Session): void => {
  session.webRequest.onHeadersReceived((details, callback) => {
    callback({ responseHeaders: { ...details.responseHeaders, 'Content-Security-Policy': [CONTENT_SECURITY_POLICY] } });
  });
  // Only full screen (the reading view's F key) is granted, and only to Heed's own page.
  session.setPermissionRequestHandler((contents, permission, callback) => callback(permission === 'fullscreen' && isAppUrl(contents.getURL())));
  session.setPermissionCheckHandler((_contents, permission, origin) => permission === 'fullscreen' && isAppUrl(origin));
  session.setDevicePermissionHandler(() => false);
};

/**
 * Opens Heed's window on heed://app/index.html; shown once the first frame is ready. The guards of
 * guardContents reach it through main's 'web-contents-created' hook, like every other contents.
 * The renderer's settings are written here as a literal, so a security scanner reading this file
 * sees them: sandboxed, isolated, no Node, web security on, our preload only. A packaged build
 * (`packaged`) has no DevTools and no menu (so no Reload or Toggle Developer Tools items either).
 */
export const createMainWindow = (preload: string, packaged = false, engine: StoreEngine | null = null): BrowserWindow => {
  const window = new BrowserWindow({
    width: 1400,
    height: 900,
    minWidth: 960,
    minHeight: 640,
    show: false,
    backgroundColor: '#101214',
    title: 'Heed',
    webPreferences: {
      preload,
      sandbox: true,
      contextIsolation: true,
      nodeIntegration: false,
      nodeIntegrationInWorker: false,
      nodeIntegrationInSubFrames: false,
      webSecurity: true,
      allowRunningInsecureContent: false,
      webviewTag: false,
      navigateOnDragDrop: false,
      spellcheck: false,
      // A middle click would otherwise open links in a new window (denied anyway by guardContents).
      disableBlinkFeatures: 'Auxclick',
      devTools: !packaged,
    },
  });
  if (packaged) window.removeMenu();
  window.once('ready-to-show', () => window.show());
  // the start screen names the storage engine chosen for this profile (scripts/lib/store-engine.mjs)
  void window.loadURL(engine === null ? APP_URL : `${APP_URL}?store=${engine}`);
  return window;
};
