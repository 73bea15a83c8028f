// Builds dist-electron/ with the real build script and runs the bundled main process under Node
// with a stand-in 'electron' module, to catch bundling mistakes the typecheck cannot see.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';

const out = path.resolve('dist-electron');
let dir: string;

beforeAll(() => {
  const build = spawnSync(process.execPath, ['scripts/build-electron.mjs'], { encoding: 'utf8', timeout: 60_000 });
  expect(build.status, build.stderr).toBe(0);
  dir = mkdtempSync(path.join(tmpdir(), 'heed-bundle-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('the Electron bundle', () => {
  it('has a CommonJS preload that requires nothing but electron (sandboxed preloads can do no more)', () => {
    const preload = readFileSync(path.join(out, 'preload.cjs'), 'utf8');
    const required = [...preload.matchAll(/require\(["']([^"']+)["']\)/g)].map((m) => m[1]);
    expect(required).toEqual(['electron']);
    expect(preload).not.toMatch(/^\s*import\s/m);
    expect(preload).toContain('exposeInMainWorld("heedHost"');
  });

  it('starts under a stand-in electron: privileged scheme before ready, then the window', () => {
    const stub = path.join(dir, 'electron-stub.mjs');
    writeFileSync(stub, `
const log = (...a) => console.log(JSON.stringify(a));
const listeners = {};
export const app = {
  enableSandbox: () => log('enableSandbox'),
  requestSingleInstanceLock: () => true,
  quit: () => log('quit'),
  on: (n, f) => { listeners[n] = f; },
  whenReady: () => Promise.resolve().then(() => log('ready')),
  commandLine: { appendSwitch: (...a) => log('switch', ...a) },
  getPath: (name) => name === 'userData' ? ${JSON.stringify(path.join(dir, 'user-data'))} : '/nonexistent',
};
export const protocol = {
  registerSchemesAsPrivileged: (s) => log('privileged', s),
  handle: (scheme) => log('handle', scheme),
};
export const ipcMain = { handle: (c) => log('ipc', c) };
export const session = { defaultSession: {
  webRequest: { onHeadersReceived: () => log('csp-hook') },
  setPermissionRequestHandler: () => log('permission-hook'),
  setPermissionCheckHandler: () => {},
  setDevicePermissionHandler: () => {},
} };
export class BrowserWindow {
  constructor(o) { log('window', o.webPreferences); this.webContents = {}; }
  once() {}
  loadURL(u) { log('load', u); return Promise.resolve(); }
  static fromWebContents() { return null; }
}
export const dialog = {};
export const shell = {};
`);
    const hooks = path.join(dir, 'hooks.mjs');
    writeFileSync(hooks, `export const resolve = (spec, ctx, next) => spec === 'electron' ? { url: ${JSON.stringify(pathToFileURL(stub).href)}, shortCircuit: true } : next(spec, ctx);`);
    const register = path.join(dir, 'register.mjs');
    writeFileSync(register, `import { register } from 'node:module'; register(${JSON.stringify(pathToFileURL(hooks).href)});`);
    const run = spawnSync(process.execPath, ['--import', pathToFileURL(register).href, path.join(out, 'main.js')], {
      encoding: 'utf8', timeout: 30_000, env: { ...process.env, HEED_DEBUG_PORT: '9555' },
    });
    expect(run.status, run.stderr).toBe(0);
    const calls = run.stdout.trim().split('\n').map((l) => JSON.parse(l) as unknown[]);
    const names = calls.map((c) => c[0]);
    expect(names.indexOf('privileged')).toBeLessThan(names.indexOf('ready'));
    expect(calls.find((c) => c[0] === 'privileged')?.[1]).toEqual([{ scheme: 'heed', privileges: expect.objectContaining({ standard: true, secure: true }) }]);
    expect(calls).toContainEqual(['switch', 'remote-debugging-port', '9555']);
    expect(calls).toContainEqual(['switch', 'enable-features', 'IdbSqliteBackingStore']); // a new user-data folder
    expect(names.filter((n) => n === 'ipc')).toHaveLength(8); // one per IPC channel (electron/channels.ts)
    expect(calls).toContainEqual(['handle', 'heed']);
    expect(calls).toContainEqual(['load', 'heed://app/index.html?store=sqlite']);
    const prefs = calls.find((c) => c[0] === 'window')?.[1];
    expect(prefs).toMatchObject({ sandbox: true, contextIsolation: true, nodeIntegration: false, preload: path.join(out, 'preload.cjs') });
    expect(names.indexOf('csp-hook')).toBeLessThan(names.indexOf('window'));
  });
});
