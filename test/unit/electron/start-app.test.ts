const electron = vi.hoisted(() => {
  const userData = { dir: '' };
  const listeners = new Map<string, (...args: unknown[]) => void>();
  let resolveReady: () => void = () => {};
  const ready = new Promise<void>((r) => { resolveReady = r; });
  return {
    listeners,
    userData,
    fireReady: () => resolveReady(),
    app: {
      enableSandbox: vi.fn(),
      requestSingleInstanceLock: vi.fn(() => true),
      quit: vi.fn(),
      on: vi.fn((name: string, fn: (...args: unknown[]) => void) => { listeners.set(name, fn); }),
      whenReady: vi.fn(() => ready),
      commandLine: { appendSwitch: vi.fn() },
      getPath: vi.fn(() => userData.dir),
      isPackaged: false,
    },
    protocol: { registerSchemesAsPrivileged: vi.fn(), handle: vi.fn() },
    ipcMain: { handle: vi.fn() },
    session: { defaultSession: { tag: 'default' } },
  };
});
vi.mock('electron', () => ({ app: electron.app, protocol: electron.protocol, ipcMain: electron.ipcMain, session: electron.session }));
const window = vi.hoisted(() => ({
  applySessionPolicy: vi.fn(),
  guardContents: vi.fn(),
  createMainWindow: vi.fn(() => ({ isMinimized: () => false, restore: vi.fn(), focus: vi.fn() })),
}));
vi.mock('../../../electron/window', () => window);

import { mkdirSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { CHANNELS } from '../../../electron/channels';
import { debugPortFrom, startApp } from '../../../electron/start-app';

describe('startApp', () => {
  beforeEach(() => { electron.userData.dir = mkdtempSync(path.join(tmpdir(), 'heed-userdata-')); });
  afterEach(() => rmSync(electron.userData.dir, { recursive: true, force: true }));

  it('registers heed:// as privileged before ready, then wires policy, scheme, IPC and the window', async () => {
    startApp({ distRoot: '/app/dist', preload: '/app/dist-electron/preload.cjs' }, { HEED_DEBUG_PORT: '9444' });
    expect(electron.protocol.registerSchemesAsPrivileged).toHaveBeenCalledWith([
      { scheme: 'heed', privileges: expect.objectContaining({ standard: true, secure: true }) },
    ]);
    expect(electron.app.enableSandbox).toHaveBeenCalled();
    expect(electron.app.commandLine.appendSwitch).toHaveBeenCalledWith('remote-debugging-port', '9444');
    // Nothing that needs the app ready has run yet.
    expect(electron.protocol.handle).not.toHaveBeenCalled();
    expect(window.createMainWindow).not.toHaveBeenCalled();

    // Every web contents gets the shared guards.
    const contents = { id: 1 };
    electron.listeners.get('web-contents-created')?.({}, contents);
    expect(window.guardContents).toHaveBeenCalledWith(contents);

    electron.fireReady();
    await vi.waitFor(() => expect(window.createMainWindow).toHaveBeenCalledWith('/app/dist-electron/preload.cjs', false, 'sqlite'));
    expect(window.applySessionPolicy).toHaveBeenCalledWith(electron.session.defaultSession);
    expect(electron.protocol.handle).toHaveBeenCalledWith('heed', expect.any(Function));
    expect(electron.ipcMain.handle.mock.calls.map((c) => c[0]).sort()).toEqual(Object.values(CHANNELS).sort());
    expect(electron.listeners.has('window-all-closed')).toBe(true);
  });

  it('quits without a window when another Heed already runs', () => {
    vi.clearAllMocks();
    electron.app.requestSingleInstanceLock.mockReturnValueOnce(false);
    startApp({ distRoot: '/d', preload: '/p' }, {});
    expect(electron.app.quit).toHaveBeenCalled();
    expect(electron.app.commandLine.appendSwitch).not.toHaveBeenCalled();
    expect(electron.app.on).not.toHaveBeenCalled();
  });
});

describe('the IndexedDB engine', () => {
  beforeEach(() => { vi.clearAllMocks(); electron.userData.dir = mkdtempSync(path.join(tmpdir(), 'heed-userdata-')); });
  afterEach(() => rmSync(electron.userData.dir, { recursive: true, force: true }));

  it('turns on Chromium\'s SQLite engine for a new user-data folder, and records it', () => {
    startApp({ distRoot: '/d', preload: '/p' }, {});
    expect(electron.app.commandLine.appendSwitch).toHaveBeenCalledWith('enable-features', 'IdbSqliteBackingStore');
    // the code cache of the app's scripts, as in the launcher's window (scripts/lib/launch-plan.mjs)
    expect(electron.app.commandLine.appendSwitch).toHaveBeenCalledWith('disable-features', 'BackgroundResourceFetch');
    expect(readFileSync(path.join(electron.userData.dir, 'heed-store-engine'), 'utf8')).toBe('sqlite\n');
  });

  it('leaves a user-data folder that holds LevelDB data on LevelDB', () => {
    mkdirSync(path.join(electron.userData.dir, 'IndexedDB', 'heed_app_0.indexeddb.leveldb'), { recursive: true });
    startApp({ distRoot: '/d', preload: '/p' }, {});
    expect(electron.app.commandLine.appendSwitch).not.toHaveBeenCalledWith('enable-features', expect.anything());
  });
});

describe('debugPortFrom', () => {
  it('takes a valid port only', () => {
    expect(debugPortFrom('9222')).toBe(9222);
    expect(debugPortFrom(undefined)).toBeNull();
    expect(debugPortFrom('')).toBeNull();
    expect(debugPortFrom('0')).toBeNull();
    expect(debugPortFrom('70000')).toBeNull();
    expect(debugPortFrom('92x')).toBeNull();
  });
});
