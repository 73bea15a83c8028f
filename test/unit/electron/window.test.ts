import { EventEmitter } from 'node:events';

const electron = vi.hoisted(() => {
  const created: { options: unknown; loaded: string[]; once: Map<string, () => void>; shown: number; menuRemoved?: boolean }[] = [];
  class BrowserWindow {
    webContents = {};
    record: (typeof created)[number];
    constructor(options: unknown) {
      this.record = { options, loaded: [], once: new Map(), shown: 0 };
      created.push(this.record);
    }
    loadURL(url: string) { this.record.loaded.push(url); return Promise.resolve(); }
    once(event: string, fn: () => void) { this.record.once.set(event, fn); }
    show() { this.record.shown += 1; }
    removeMenu() { this.record.menuRemoved = true; }
  }
  return { created, BrowserWindow };
});
vi.mock('electron', () => ({ BrowserWindow: electron.BrowserWindow }));

import type { Session, WebContents } from 'electron';
import { CONTENT_SECURITY_POLICY } from '../../../scripts/lib/web-policy.mjs';
import { applySessionPolicy, createMainWindow, guardContents } from '../../../electron/window';

describe('createMainWindow', () => {
  it('builds the one window sandboxed, isolated, without Node, on heed://app', () => {
    createMainWindow('/app/dist-electron/preload.cjs');
    const record = electron.created.at(-1);
    expect(record?.options).toMatchObject({
      show: false,
      webPreferences: {
        sandbox: true, contextIsolation: true, nodeIntegration: false, webSecurity: true,
        nodeIntegrationInSubFrames: false, webviewTag: false, allowRunningInsecureContent: false,
        disableBlinkFeatures: 'Auxclick',
        preload: '/app/dist-electron/preload.cjs',
      },
    });
    expect(record?.loaded).toEqual(['heed://app/index.html']);
    record?.once.get('ready-to-show')?.();
    expect(record?.shown).toBe(1);
  });

  it('keeps DevTools and the menu in a development run', () => {
    createMainWindow('/p');
    const record = electron.created.at(-1);
    expect(record?.options).toMatchObject({ webPreferences: { devTools: true, sandbox: true } });
    expect(record?.menuRemoved).toBeUndefined();
  });

  it('takes DevTools and the menu (Reload, Toggle Developer Tools) away in a packaged build', () => {
    createMainWindow('/p', true);
    const record = electron.created.at(-1);
    expect(record?.options).toMatchObject({ webPreferences: { devTools: false, sandbox: true, contextIsolation: true, nodeIntegration: false } });
    expect(record?.menuRemoved).toBe(true);
  });
});

type Prevented = { url: string; prevented: boolean; preventDefault(): void };
const navEvent = (url: string): Prevented => ({ url, prevented: false, preventDefault() { this.prevented = true; } });

const fakeContents = () => {
  const emitter = new EventEmitter();
  let openHandler: ((details: { url: string }) => unknown) | null = null;
  const contents = Object.assign(emitter, {
    setWindowOpenHandler: (fn: (details: { url: string }) => unknown) => { openHandler = fn; },
  });
  return { contents, openHandler: () => openHandler };
};

describe('guardContents', () => {
  it.each(['will-navigate', 'will-frame-navigate', 'will-redirect'])('%s blocks other origins and lets the app through', (name) => {
    const { contents } = fakeContents();
    guardContents(contents satisfies object as unknown as WebContents);
    for (const url of ['https://example.org/', 'file:///etc/passwd', 'heed://evil/index.html', 'http://127.0.0.1:5178/']) {
      const event = navEvent(url);
      contents.emit(name, event);
      expect(event.prevented, url).toBe(true);
    }
    const inside = navEvent('heed://app/index.html#/study/1');
    contents.emit(name, inside);
    expect(inside.prevented).toBe(false);
  });

  it('denies every new window and webview', () => {
    const { contents, openHandler } = fakeContents();
    guardContents(contents satisfies object as unknown as WebContents);
    expect(openHandler()?.({ url: 'heed://app/index.html' })).toEqual({ action: 'deny' });
    expect(openHandler()?.({ url: 'https://example.org/' })).toEqual({ action: 'deny' });
    const webview = navEvent('');
    contents.emit('will-attach-webview', webview);
    expect(webview.prevented).toBe(true);
  });
});

describe('applySessionPolicy', () => {
  const fakeSession = () => {
    const hooks: Record<string, (...args: never[]) => unknown> = {};
    const session = {
      webRequest: { onHeadersReceived: (fn: (...args: never[]) => unknown) => { hooks.headers = fn; } },
      setPermissionRequestHandler: (fn: (...args: never[]) => unknown) => { hooks.request = fn; },
      setPermissionCheckHandler: (fn: (...args: never[]) => unknown) => { hooks.check = fn; },
      setDevicePermissionHandler: (fn: (...args: never[]) => unknown) => { hooks.device = fn; },
    };
    applySessionPolicy(session satisfies object as unknown as Session);
    return hooks;
  };

  it('adds the CSP to every response and keeps the other headers', () => {
    const hooks = fakeSession();
    let answer: unknown;
    const onHeaders = hooks.headers as (d: unknown, cb: (r: unknown) => void) => void;
    onHeaders({ responseHeaders: { 'Content-Type': ['text/html'] } }, (r) => { answer = r; });
    expect(answer).toEqual({ responseHeaders: { 'Content-Type': ['text/html'], 'Content-Security-Policy': [CONTENT_SECURITY_POLICY] } });
  });

  it.each(['media', 'geolocation', 'notifications', 'clipboard-read', 'openExternal'])('denies the %s permission', (permission) => {
    const hooks = fakeSession();
    const granted: boolean[] = [];
    (hooks.request as (wc: unknown, p: string, cb: (g: boolean) => void) => void)({}, permission, (g) => granted.push(g));
    expect(granted).toEqual([false]);
    expect((hooks.check as (wc: unknown, p: string) => boolean)({}, permission)).toBe(false);
    expect((hooks.device as () => boolean)()).toBe(false);
  });

  it('grants full screen to Heed\'s own page only', () => {
    const hooks = fakeSession();
    const request = hooks.request as (wc: unknown, p: string, cb: (g: boolean) => void) => void;
    const granted: boolean[] = [];
    request({ getURL: () => 'heed://app/index.html' }, 'fullscreen', (g) => granted.push(g));
    request({ getURL: () => 'https://example.org/' }, 'fullscreen', (g) => granted.push(g));
    expect(granted).toEqual([true, false]);
    const check = hooks.check as (wc: unknown, p: string, origin: string) => boolean;
    expect(check({}, 'fullscreen', 'heed://app')).toBe(true);
    expect(check({}, 'fullscreen', 'http://127.0.0.1:5178')).toBe(false);
  });
});
